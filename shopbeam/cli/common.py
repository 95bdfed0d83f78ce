"""What every command shares: exit codes and the one way a problem is reported.

A handler raises `InputError`, `InputErrors`, `UnstableBeam`, `SaveConflict` or an `OSError`
for bad input; `report_error` prints it as one message on stderr and gives exit 2. `guarded`
wraps a handler so it reports the same way when it is called on its own (tests, `main`).
"""

from __future__ import annotations

import functools
import sys

from shopbeam.errors import InputError, InputErrors, UnstableBeam
from shopbeam.jobs.storage import SaveConflict, read_bytes

EXIT_OK, EXIT_INTERNAL, EXIT_INPUT = 0, 1, 2

# The title block of `report` and `rating --plaque` (here, not in proof.py: the parser of
# every command, the text UI's too, is built without the design modules).
TITLE_OPTIONS = (("shop", "--shop", "the shop's name"),
                 ("job_number", "--job-number", "the job or work-order number"),
                 ("member", "--member", "which member this is (default: section and material)"),
                 ("client", "--client", "the client"),
                 ("location", "--location", "where the member is"),
                 ("prepared_by", "--prepared-by", "who prepared the calculation"),
                 ("checked_by", "--checked-by", "who checked it"),
                 ("date", "--date", "the date on the title block (default: today)"),
                 ("revision", "--revision", "the revision, e.g. A"))


def add_title_options(p) -> None:
    g = p.add_argument_group("title block (override the job's [project] table)")
    for key, flag, words in TITLE_OPTIONS:
        g.add_argument(flag, dest=key, metavar="TEXT", default=None, help=words)


def err(message: str) -> None:
    print(message, file=sys.stderr)


def report_error(exc: BaseException, job=None) -> int:
    """Print a problem with the input as one message and return exit 2; re-raise a bug.
    `job` is the job file of the command, named in a refusal raised below the reader."""
    if isinstance(exc, (InputError, InputErrors, UnstableBeam)):
        name_the_file(exc, job)
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


def name_the_file(exc: BaseException, job) -> None:
    """A refusal raised below the reader (wheel sets, patterns, the solve) names the job
    file, and the line of its key when the key is known."""
    if not job:
        return
    probs = ([exc.problem] if isinstance(exc, InputError) else
             exc.problems if isinstance(exc, InputErrors) else [])
    if isinstance(exc, UnstableBeam) and not exc.file:
        exc.file = str(job)
    lines = None
    for p in probs:
        if p.file:
            continue
        p.file = str(job)
        if p.key and p.line is None:
            if lines is None:
                try:
                    from shopbeam.jobs.jobfile import key_lines  # noqa: PLC0415 - startup

                    lines = key_lines(read_bytes(job).decode("utf-8", "replace"))
                except Exception:  # noqa: BLE001 - the line is a courtesy
                    lines = {}
            k = p.key
            while k and k not in lines:
                k = k[: k.rfind("[")] if k.endswith("]") else k.rsplit(".", 1)[0] if "." in k else ""
            p.line = lines.get(k) if k else None


def guarded(handler):
    """A command handler that reports bad input by `report_error` (exit 2)."""

    @functools.wraps(handler)
    def run(args) -> int:
        try:
            return int(handler(args) or 0)
        except (InputError, InputErrors, UnstableBeam, SaveConflict) as exc:
            return report_error(exc, getattr(args, "job", None))
        except OSError as exc:
            if isinstance(exc, BrokenPipeError):
                raise
            return report_error(exc)

    return run


def load(path):
    """The job named on the command line, read and validated."""
    from shopbeam.jobs.jobfile import load_job

    return load_job(path)


def warnings_to_stderr(job) -> None:
    """With --json the report's INPUT WARNINGS are not printed: each goes to stderr (the
    contract's channel for messages; stdout stays the JSON alone) besides the JSON's own
    `warnings`, so a script that reads only the contract keys still sees an ignored key."""
    for p in getattr(job, "warnings", ()):
        print(p.located(), file=sys.stderr)
