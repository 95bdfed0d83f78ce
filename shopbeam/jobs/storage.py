"""Saving job files so that nothing is lost and nobody is overwritten.

Every write is atomic: the new text goes to a temp file in the same folder, is flushed and
fsynced, then renamed over the old file (and the folder is fsynced), so a crash or a kill
mid-save leaves either the old file or the new one, never a torn one. Writes to a folder
several people share (the shop library) hold a file lock, and a save remembers what the file
looked like when it was opened (`Opened`, a sha256 and mtime fingerprint): saving over a file
that someone changed since is refused with `SaveConflict`, which carries a unified diff of
what changed on disk so the caller can offer "save as a new name" or "overwrite after seeing
the changes". Saving to a name that already exists is refused (`NameTaken`) unless the caller
says overwrite. Names typed by users go through `safe_name`, so they cannot leave the folder.
"""

from __future__ import annotations

import difflib
import hashlib
import os
import re
import tempfile
import time
from contextlib import contextmanager
from dataclasses import dataclass
from pathlib import Path

from shopbeam.errors import InputError

SUFFIX = ".toml"
LOCK_TIMEOUT = 10.0  # seconds to wait for another writer before giving up
_CHUNK = 1 << 20
_TEMP_PREFIX = "."
_TEMP_SUFFIX = ".saving"

# Letters, digits, '-', '_' and '.' inside; starts with a letter or digit; at most 64 long.
_NAME_RE = re.compile(r"^[A-Za-z0-9][A-Za-z0-9._-]{0,63}$")
_WINDOWS_RESERVED = {"con", "prn", "aux", "nul"} | {f"com{i}" for i in range(1, 10)} | {
    f"lpt{i}" for i in range(1, 10)}


# --------------------------------------------------------------------------- names

def suggest_name(text: str) -> str:
    """A safe name close to what the user typed: 'Bay 3 / arm' -> 'bay-3-arm'."""
    stem = Path(str(text).replace("\\", "/")).name
    if stem.lower().endswith(SUFFIX):
        stem = stem[: -len(SUFFIX)]
    out = re.sub(r"[^A-Za-z0-9._-]+", "-", stem).strip("-._").lower()
    out = re.sub(r"\.{2,}", ".", out)
    out = out[:64] or "job"
    if out.split(".")[0] in _WINDOWS_RESERVED:
        out = out + "-job"
    return out


def safe_name(name: str, key: str = "name") -> str:
    """Check a job name a user typed and return its stem (without `.toml`).

    Refuses anything that could point outside the library folder or that shells and file
    systems handle badly: separators, `..`, absolute paths, drive letters, control or other
    odd characters, leading dots, reserved device names, and names over 64 characters.
    """
    raw = str(name) if name is not None else ""
    text = raw.strip()
    hint = (f"use letters, digits, '-', '_' and '.' only (at most 64), "
            f"for example '{suggest_name(raw)}'")
    if not text:
        raise InputError("a job name is required; " + hint, key=key)
    if os.path.isabs(text) or re.match(r"^[A-Za-z]:", text):
        raise InputError(f"the name '{raw}' is an absolute path; " + hint, key=key)
    if ".." in text:
        raise InputError(f"the name '{raw}' contains '..', which could point outside the "
                         "library folder; " + hint, key=key)
    if "/" in text or "\\" in text or os.sep in text or (os.altsep and os.altsep in text):
        raise InputError(f"the name '{raw}' contains a folder separator; a library name is "
                         "a plain name, not a path; " + hint, key=key)
    stem = text[: -len(SUFFIX)] if text.lower().endswith(SUFFIX) else text
    if not _NAME_RE.match(stem):
        odd = sorted({c for c in stem if not re.match(r"[A-Za-z0-9._-]", c)})
        why = (f"has characters that are not allowed ({' '.join(repr(c) for c in odd)})" if odd
               else "must start with a letter or digit and be at most 64 characters")
        raise InputError(f"the name '{raw}' {why}; " + hint, key=key)
    if stem.split(".")[0].lower() in _WINDOWS_RESERVED:
        raise InputError(f"the name '{raw}' is a reserved device name on Windows; " + hint,
                         key=key)
    return stem


def path_in(folder: str | os.PathLike, name: str, key: str = "name") -> Path:
    """The file for library name `name` inside `folder`, proven to stay inside it."""
    stem = safe_name(name, key=key)
    base = Path(folder).resolve()
    target = (base / (stem + SUFFIX)).resolve()
    if target.parent != base:  # a symlink or an odd file system; refuse rather than guess
        raise InputError(f"the name '{name}' resolves outside the library folder {base}",
                         key=key)
    return target


# --------------------------------------------------------------------------- fingerprints

@dataclass(frozen=True)
class Fingerprint:
    """What a file looked like: its content hash, modification time and size."""

    sha256: str
    mtime_ns: int
    size: int

    def same_content(self, other: "Fingerprint | None") -> bool:
        return other is not None and other.sha256 == self.sha256


@dataclass(frozen=True)
class Opened:
    """A file as it was read: its path, text and fingerprint (the base for a later save)."""

    path: Path
    text: str
    fingerprint: Fingerprint | None  # None: the file did not exist (a new file)


def _fingerprint_bytes(data: bytes, st: os.stat_result) -> Fingerprint:
    return Fingerprint(hashlib.sha256(data).hexdigest(), st.st_mtime_ns, st.st_size)


def _read(path: Path) -> tuple[bytes, Fingerprint] | None:
    try:
        with open(path, "rb") as f:
            data = f.read()
            st = os.fstat(f.fileno())
    except FileNotFoundError:
        return None
    return data, _fingerprint_bytes(data, st)


def fingerprint(path: str | os.PathLike) -> Fingerprint | None:
    """The file's fingerprint now, or None when it does not exist."""
    got = _read(Path(path))
    return got[1] if got else None


def _decode(data: bytes, path: Path) -> str:
    try:
        return data.decode("utf-8")
    except UnicodeDecodeError as exc:
        raise InputError(f"the file is not UTF-8 text (byte {exc.start}); save it as UTF-8",
                         file=str(path)) from None


def open_text(path: str | os.PathLike) -> Opened:
    """Read a job file and remember its fingerprint for conflict detection on save."""
    p = Path(path)
    try:
        got = _read(p)
    except IsADirectoryError:
        raise InputError("this is a folder, not a job file", file=str(p)) from None
    except PermissionError:
        raise InputError("cannot read the file (permission denied)", file=str(p)) from None
    if got is None:
        raise InputError("no such file", file=str(p))
    data, fp = got
    return Opened(p, _decode(data, p), fp)


# --------------------------------------------------------------------------- conflicts

class SaveConflict(Exception):
    """A save was refused because the file on disk is not what the caller expects.

    `reason` is "changed" (someone changed the file since it was opened), "deleted"
    (someone removed it since) or "exists" (saving a new file to a name that is taken).
    `diff` is a unified diff from the text the caller opened to the text on disk now
    (for "exists", from nothing to the file on disk). The caller can offer to save under a
    new name, or to overwrite after the user has seen the diff (`overwrite=True`).
    """

    def __init__(self, path: Path, reason: str, diff: str, on_disk: str | None,
                 on_disk_fingerprint: Fingerprint | None):
        self.path = Path(path)
        self.reason = reason
        self.diff = diff
        self.on_disk = on_disk
        self.on_disk_fingerprint = on_disk_fingerprint
        super().__init__(self.message())

    def message(self) -> str:
        if self.reason == "exists":
            what = "a job with this name already exists"
        elif self.reason == "deleted":
            what = "the file was deleted by someone else since you opened it"
        else:
            what = "the file was changed by someone else since you opened it"
        return (f"{self.path}: not saved: {what}. Save under a new name, or overwrite "
                "after reviewing what changed.")

    def __str__(self) -> str:
        return self.message() + ("\n" + self.diff if self.diff else "")


class NameTaken(SaveConflict):
    """Saving a new file to a name that already exists (refused unless overwrite)."""


def unified_diff(old: str, new: str, old_label: str, new_label: str) -> str:
    lines = difflib.unified_diff(old.splitlines(keepends=True), new.splitlines(keepends=True),
                                 fromfile=old_label, tofile=new_label)
    out = []
    for line in lines:
        out.append(line if line.endswith("\n") else line + "\n\\ No newline at end of file\n")
    return "".join(out)


# --------------------------------------------------------------------------- locking

def lock_path(path: str | os.PathLike) -> Path:
    p = Path(path)
    return p.with_name(f".{p.name}.lock")


@contextmanager
def locked(path: str | os.PathLike, timeout: float | None = None):
    """Hold the write lock for `path` (a `.NAME.lock` file beside it) while inside."""
    from filelock import FileLock, Timeout

    timeout = LOCK_TIMEOUT if timeout is None else timeout
    lp = lock_path(path)
    lock = FileLock(str(lp), timeout=timeout)
    try:
        lock.acquire()
    except Timeout:
        raise InputError(f"someone else is saving this file right now (lock {lp} held for "
                         f"over {timeout:g} s); try again in a moment", file=str(path)) from None
    try:
        yield
    finally:
        lock.release()


# --------------------------------------------------------------------------- writing

def _fsync_dir(folder: Path) -> None:
    try:
        fd = os.open(folder, os.O_RDONLY)
    except OSError:  # not every platform can open a folder (Windows); the rename stands
        return
    try:
        os.fsync(fd)
    except OSError:
        pass
    finally:
        os.close(fd)


def _new_file_mode(existing: Path) -> int:
    try:
        return os.stat(existing).st_mode & 0o777
    except FileNotFoundError:
        umask = os.umask(0)
        os.umask(umask)
        return 0o666 & ~umask


def atomic_write(path: str | os.PathLike, text: str | bytes) -> Fingerprint:
    """Write `text` to `path` atomically and durably; return the new file's fingerprint.

    Temp file in the same folder, written in full, flushed and fsynced, then `os.replace`d
    over the target and the folder fsynced. A kill at any point leaves the old file whole
    (at worst a stale `.NAME.*.saving` temp file stays behind; `clean_stale_temps` removes
    those). Keeps the old file's permission bits.
    """
    p = Path(path)
    folder = p.parent if str(p.parent) else Path(".")
    data = text.encode("utf-8") if isinstance(text, str) else bytes(text)
    mode = _new_file_mode(p)
    fd, tmp = tempfile.mkstemp(dir=folder, prefix=f"{_TEMP_PREFIX}{p.name}.",
                               suffix=_TEMP_SUFFIX)
    try:
        view = memoryview(data)
        while view:
            n = os.write(fd, view[:_CHUNK])
            view = view[n:]
        if hasattr(os, "fchmod"):
            os.fchmod(fd, mode)
        os.fsync(fd)
        os.close(fd)
        fd = -1
        os.replace(tmp, p)
    except BaseException:
        if fd >= 0:
            os.close(fd)
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise
    _fsync_dir(folder)
    st = os.stat(p)
    return _fingerprint_bytes(data, st)


def clean_stale_temps(folder: str | os.PathLike, older_than: float = 3600.0) -> list[Path]:
    """Remove temp files left by saves that were killed over `older_than` seconds ago."""
    removed = []
    now = time.time()
    for tmp in Path(folder).glob(f"{_TEMP_PREFIX}*{_TEMP_SUFFIX}"):
        try:
            if now - tmp.stat().st_mtime > older_than:
                tmp.unlink()
                removed.append(tmp)
        except OSError:
            pass
    return removed


def save_text(path: str | os.PathLike, text: str, base: Opened | None = None, *,
              overwrite: bool = False, lock: bool = True) -> Opened:
    """Save `text` to `path` and return the new `Opened` (the base for the next save).

    base None: `path` must not exist yet (else `NameTaken`) unless `overwrite`.
    base given: the file on disk must still have the content it had when `base` was read
    (else `SaveConflict` with a diff), unless `overwrite` (the user saw the changes). A file
    whose mtime changed but whose content did not is not a conflict: nothing would be lost.
    The check and the write happen under the file's lock, so two savers cannot both pass
    the check and then overwrite each other.
    """
    p = Path(path)
    ctx = locked(p) if lock else _nolock()
    with ctx:
        if not overwrite:
            _check(p, base)
        fp = atomic_write(p, text)
    return Opened(p, text, fp)


def update_text(path: str | os.PathLike, change, *, create: str | None = None) -> Opened:
    """Read-modify-write under the lock: `change(old_text) -> new_text`, saved atomically.

    For edits several people may make at once (no lost update). `create` is the text to
    start from when the file does not exist yet (else the missing file is an error).
    """
    p = Path(path)
    with locked(p):
        got = _read(p)
        if got is None:
            if create is None:
                raise InputError("no such file", file=str(p))
            old = create
        else:
            old = _decode(got[0], p)
        new = change(old)
        fp = atomic_write(p, new)
    return Opened(p, new, fp)


@contextmanager
def _nolock():
    yield


def _check(p: Path, base: Opened | None) -> None:
    got = _read(p)
    if base is None or base.fingerprint is None:
        if got is not None:
            on_disk = got[0].decode("utf-8", "replace")
            raise NameTaken(p, "exists", unified_diff("", on_disk, "/dev/null", str(p)),
                            on_disk, got[1])
        return
    if got is None:
        raise SaveConflict(p, "deleted", unified_diff(base.text, "", f"{p} (when opened)",
                                                      "/dev/null"), None, None)
    if not base.fingerprint.same_content(got[1]):
        on_disk = got[0].decode("utf-8", "replace")
        raise SaveConflict(p, "changed",
                           unified_diff(base.text, on_disk, f"{p} (when opened)",
                                        f"{p} (on disk now)"), on_disk, got[1])
