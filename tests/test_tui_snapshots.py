"""Snapshots of every view of the text UI at 100x32 and 80x24, on the bundled demo jobs.

No blinking cursor and a fixed rating-label date, so a picture changes only when the screen
does. Look at the report (``pytest --snapshot-report``) before ``--snapshot-update``.
"""

from __future__ import annotations

import datetime
from pathlib import Path

import pytest


from shopbeam.tui.app import make_app  # noqa: E402
from tuipilot import settle  # noqa: E402

PRESETS = Path(__file__).resolve().parents[1] / "presets"
DATE = datetime.date(2026, 1, 15)

# name -> (job, keys)
VIEWS = {
    "library": (None, []),
    "job": ("demo", []),
    "span": ("demo", ["escape", "2"]),
    "loads": ("demo", ["escape", "3"]),
    "section": ("demo", ["escape", "4"]),
    "material": ("demo", ["escape", "5"]),
    "criteria": ("demo", ["escape", "6"]),
    "results": ("demo", ["escape", "7"]),
    "plots": ("demo", ["escape", "8"]),
    "calc": ("demo", ["escape", "9"]),
    "rating": ("demo", ["escape", "0"]),
    "sizing": ("demo", ["escape", "s", "r"]),
    "help": ("demo", ["f1"]),
    "lifting": ("jib-arm", ["escape", "7"]),
    "bad-entry": ("demo", ["escape", "2", "tab", "end", "backspace",
                                "backspace", "backspace"]),
}
SIZES = {"100x32": (100, 32), "80x24": (80, 24)}


@pytest.fixture(autouse=True)
def _empty_user_library(tmp_path, monkeypatch):
    monkeypatch.setenv("SHOPBEAM_USER_DIR", str(tmp_path / "user"))
    monkeypatch.delenv("SHOPBEAM_LIBRARY", raising=False)


def _keys_then_settle(keys):
    async def run(pilot):
        await pilot.pause()
        for k in keys:
            await pilot.press(k)
            await settle(pilot)
        await settle(pilot)

    return run


@pytest.mark.parametrize("size", list(SIZES))
@pytest.mark.parametrize("view", list(VIEWS))
def test_view(snap_compare, view, size):
    job, keys = VIEWS[view]
    path = None if job is None else PRESETS / f"{job}.toml"
    app = make_app(path, cursor_blink=False, label_date=DATE)
    assert snap_compare(app, terminal_size=SIZES[size], run_before=_keys_then_settle(keys))
