"""Text from a job file shown safely on a terminal: control characters made visible.

A title, label, note or key in a job file can hold any character, including the escape
sequences a terminal obeys (``\\x1b[8m`` hides the text after it, so a report's FAIL lines
could vanish). Everything shopbeam prints that came from a file goes through `shown`, which
writes each control character as a visible escape (``\\x1b``, ``\\u202e``) and leaves all
other text alone. JSON output needs nothing more: JSON escapes control characters itself.
"""

from __future__ import annotations

import re

# C0 and C1 controls, DEL, and the Unicode format characters that reorder or hide text
# (bidirectional overrides and isolates, the line and paragraph separators, the invisible
# ones: soft hyphen, zero-width space, word joiner, byte-order mark; the zero-width joiners
# of emoji and scripts aside)
_CONTROL = re.compile("[\x00-\x1f\x7f-\x9f\u00ad\u061c\u200b\u200e\u200f\u2028\u2029\u202a-\u202e"
                      "\u2060-\u2064\u2066-\u2069\ufeff"
                      "\ufff9-\ufffb\U000e0000-\U000e007f]")
_NAMED = {"\t": "\\t", "\n": "\\n", "\r": "\\r"}


def _escape(m: re.Match) -> str:
    ch = m.group(0)
    if ch in _NAMED:
        return _NAMED[ch]
    code = ord(ch)
    return f"\\x{code:02x}" if code < 0x100 else (f"\\u{code:04x}" if code < 0x10000
                                                   else f"\\U{code:08x}")


def shown(text, keep: str = "") -> str:
    """`text` with every control character written as a visible escape; characters in
    `keep` (e.g. "\\n" for a multi-line report) pass through."""
    s = str(text)
    if not _CONTROL.search(s):
        return s
    if not keep:
        return _CONTROL.sub(_escape, s)
    return _CONTROL.sub(lambda m: m.group(0) if m.group(0) in keep else _escape(m), s)


class EscapingStream:
    """A text stream that passes everything written through `shown` (keeping newlines and
    tabs): the command line's stdout and stderr, so no control character from a job file
    reaches the terminal whatever path printed it."""

    def __init__(self, stream):
        self._stream = stream

    def write(self, s: str) -> int:
        self._stream.write(shown(s, keep="\n\t"))
        return len(s)

    def __getattr__(self, name):
        return getattr(self._stream, name)
