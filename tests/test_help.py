"""`--help` is complete: every command and every argument says what it is, every command
shows an example, and the shape kinds are listed where a kind is asked for."""

from __future__ import annotations

import argparse
import subprocess
import sys

from shopbeam.cli import build_parser


def _commands(parser, prefix=()):
    for action in parser._actions:  # noqa: SLF001 - walking argparse's own tree
        if isinstance(action, argparse._SubParsersAction):  # noqa: SLF001
            for name, sub in action.choices.items():
                yield prefix + (name,), sub
                yield from _commands(sub, prefix + (name,))


def test_every_command_and_argument_has_help_and_an_example():
    parser = build_parser()
    seen = []
    for path, sub in _commands(parser):
        seen.append(" ".join(path))
        assert sub.epilog and "examples:" in sub.epilog, path
        assert any(f"shopbeam {' '.join(path)}" in line or (path == ("ui",) and "shopbeam" in line)
                   for line in sub.epilog.splitlines()), path
        assert sub.description, path
        for action in sub._actions:  # noqa: SLF001
            if isinstance(action, (argparse._HelpAction, argparse._SubParsersAction)):  # noqa: SLF001
                continue
            assert action.help and action.help.strip(), (path, action.dest)
    for name in ("solve", "check", "capacity", "rating", "report", "size", "section", "shapes",
                 "materials", "ui", "library", "library copy", "library check", "new"):
        assert name in seen


def test_shapes_help_lists_the_kinds():
    r = subprocess.run([sys.executable, "-m", "shopbeam", "shapes", "--help"],
                       capture_output=True, text=True, timeout=60)
    assert r.returncode == 0
    for kind in ("HSS-rect", "W", "lumber", "mech-tube", "UPN", "rect-tube", "i-beam",
                 "double-channel", "custom"):
        assert kind in r.stdout
    r = subprocess.run([sys.executable, "-m", "shopbeam", "section", "--help"],
                       capture_output=True, text=True, timeout=60)
    assert "rect-tube" in r.stdout and "examples:" in r.stdout


def test_an_unknown_option_is_said_with_the_commands_own_usage():
    # the top-level usage lists no command's options; the command's usage does
    import subprocess
    import sys
    from pathlib import Path
    demo = Path(__file__).resolve().parents[1] / "presets" / "demo.toml"
    run = subprocess.run([sys.executable, "-m", "shopbeam", "capacity", str(demo), "--nope"],
                         capture_output=True, text=True)
    assert run.returncode == 2 and "usage: shopbeam capacity" in run.stderr
    assert "unrecognized arguments: --nope" in run.stderr
