"""What every command shares: exit codes and the one way a problem is reported.

A handler raises `InputError`, `InputErrors`, `UnstableBeam`, `SaveConflict` or an `OSError`
for bad input; `report_error` prints it as one message on stderr and gives exit 2. `guarded`
wraps a handler so it reports the same way when it is called on its own (tests, `main`).
"""

from __future__ import annotations

import functools
import sys

from shopbeam.errors import InputError, InputErrors, UnstableBeam
from shopbeam.jobs.storage import SaveConflict

EXIT_OK, EXIT_INTERNAL, EXIT_INPUT = 0, 1, 2


def err(message: str) -> None:
    print(message, file=sys.stderr)


def report_error(exc: BaseException) -> int:
    """Print a problem with the input as one message and return exit 2; re-raise a bug."""
    if isinstance(exc, (InputError, InputErrors, UnstableBeam)):
        err(f"shopbeam: {exc}")
        return EXIT_INPUT
    if isinstance(exc, SaveConflict):
        err(f"shopbeam: {exc.message()}")
        if exc.diff and exc.reason != "exists":
            err(exc.diff.rstrip("\n"))
        err("Nothing was written. Choose another name (library copy: --as NEWNAME), or "
            "add --overwrite to replace it.")
        return EXIT_INPUT
    if isinstance(exc, OSError) and not isinstance(exc, BrokenPipeError):
        where = f"{exc.filename}: " if exc.filename else ""
        err(f"shopbeam: {where}{exc.strerror or exc}")
        return EXIT_INPUT
    raise exc


def guarded(handler):
    """A command handler that reports bad input by `report_error` (exit 2)."""

    @functools.wraps(handler)
    def run(args) -> int:
        try:
            return int(handler(args) or 0)
        except (InputError, InputErrors, UnstableBeam, SaveConflict) as exc:
            return report_error(exc)
        except OSError as exc:
            if isinstance(exc, BrokenPipeError):
                raise
            return report_error(exc)

    return run


def load(path):
    """The job named on the command line, read and validated."""
    from shopbeam.jobs.jobfile import load_job

    return load_job(path)
