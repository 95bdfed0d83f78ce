"""Helpers for driving the text UI with Pilot in tests."""

from __future__ import annotations

from textual.worker import WorkerCancelled


async def settle(pilot) -> None:
    """Let the screen catch up: solves and sheets run in workers."""
    app = pilot.app
    for _ in range(100):
        await pilot.pause()
        try:
            await app.workers.wait_for_complete()
        except WorkerCancelled:  # replaced by a newer one: wait for that
            continue
        await pilot.pause()
        if not any(w.is_running for w in app.workers):
            return
