"""Helpers for driving the text UI with Pilot in tests."""

from __future__ import annotations

import asyncio
import functools

import pytest
from textual.worker import WorkerCancelled


@pytest.fixture(autouse=True)
def _own_library(tmp_path, monkeypatch):
    """Each test's own user library (and no shop library): saves never touch the real ones.
    Autouse wherever it is imported."""
    user = tmp_path / "user"
    user.mkdir()
    monkeypatch.setenv("SHOPBEAM_USER_DIR", str(user))
    monkeypatch.delenv("SHOPBEAM_LIBRARY", raising=False)
    return user


def sync(fn):
    """Run an async test body in its own event loop (no async plugin needed)."""

    @functools.wraps(fn)
    def run(*args, **kwargs):
        return asyncio.run(fn(*args, **kwargs))

    return run


async def settle(pilot) -> None:
    """Let the screen catch up: solves and sheets run in workers."""
    app = pilot.app
    for _ in range(100):
        await pilot.pause()
        if getattr(app, "_held_letter", None) is not None:
            await pilot.pause(0.35)  # a letter on a choice picks once nothing follows it
            continue
        try:
            await app.workers.wait_for_complete()
        except WorkerCancelled:  # replaced by a newer one: wait for that
            continue
        await pilot.pause()
        js = getattr(app, "job_screen", None)
        if js is not None and js.session.stale:
            continue  # the solve starts after the first paint: not asked for yet
        if not any(w.is_running for w in app.workers):
            return
