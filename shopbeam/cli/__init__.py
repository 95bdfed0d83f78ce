"""The `shopbeam` command line.

`shopbeam` (no arguments) or `shopbeam JOB.toml` opens the text UI; the subcommands print
reports, JSON, labels and listings. Bad input gives one clear message on stderr and exit 2,
never a traceback (set SHOPBEAM_DEBUG=1 to see one for an internal error).
"""

from __future__ import annotations

import argparse
import json
import os
import sys

from shopbeam import __version__

EXIT_OK, EXIT_INTERNAL, EXIT_INPUT = 0, 1, 2

DESCRIPTION = """\
Beam checks for fabrication shops: reactions, shear, moment, slope and deflection of a
straight member, stress and deflection checks, safe load and rating labels, from plain-text
job files. A screening check only: storage racks, lifting devices and building members need
review by a licensed engineer, and local codes govern.

  shopbeam                      open the text UI on a demo job
  shopbeam JOB.toml             open a job in the text UI
  shopbeam solve JOB.toml       print the report (--json for scripts, --calc for the calc sheet)
"""


def _load(path):
    from shopbeam.jobs.jobfile import load_job

    return load_job(path)


def cmd_solve(args) -> int:
    from shopbeam.design.analysis import analyze, to_json

    job = _load(args.job)
    result = analyze(job)
    if args.json:
        print(dumps_finite(to_json(result), args.job))
        return EXIT_OK
    if args.calc:
        from shopbeam.output.calcsheet import calc_sheet

        print(calc_sheet(job, result), end="")
        return EXIT_OK
    from shopbeam.output.report import render

    print(render(result), end="")
    return EXIT_OK


def dumps_finite(data, job_path="") -> str:
    """JSON text; a number that overflowed is bad input, never the non-JSON token Infinity."""
    try:
        return json.dumps(data, indent=2, allow_nan=False)
    except ValueError:
        from shopbeam.errors import InputError

        raise InputError("the answer has numbers too large to be real (an overflow): check the "
                         "section properties, loads and their units", file=str(job_path)) from None


def cmd_check(args) -> int:
    job = _load(args.job)
    from shopbeam.design.analysis import analyze

    analyze(job)  # an unstable beam is an input problem too
    for p in job.warnings:
        print(p.located(), file=sys.stderr)
    print(f"{args.job}: OK ({len(job.supports)} supports, {len(job.loads)} loads"
          + (f", {len(job.warnings)} warnings" if job.warnings else "") + ")")
    return EXIT_OK


def _lazy(module: str, func: str):
    def run(args):
        import importlib

        return getattr(importlib.import_module(module), func)(args)

    return run


LIBRARY_COMMANDS = {"library": "list, show and copy saved and bundled jobs",
                    "new": "start a job file from a commented template"}


def build_parser(with_library: bool = True) -> argparse.ArgumentParser:
    """The argument parser. `with_library=False` registers `library` and `new` by name only,
    so commands that do not need the library (solve, check, ...) start without importing it."""
    p = argparse.ArgumentParser(
        prog="shopbeam", description=DESCRIPTION,
        formatter_class=argparse.RawDescriptionHelpFormatter)
    p.add_argument("--version", action="version", version=f"shopbeam {__version__}")
    sub = p.add_subparsers(dest="command", metavar="COMMAND")

    s = sub.add_parser("solve", help="solve a job and print the report")
    s.add_argument("job", help="job file (TOML)")
    g = s.add_mutually_exclusive_group()
    g.add_argument("--json", action="store_true", help="print the contract JSON (SI units)")
    g.add_argument("--calc", action="store_true",
                   help="print the exact calc sheet (bracket expressions, exact reactions)")
    s.set_defaults(func=cmd_solve)

    s = sub.add_parser("check", help="validate a job file (and that the beam is stable)")
    s.add_argument("job")
    s.set_defaults(func=cmd_check)

    s = sub.add_parser("capacity", help="largest multiplier of the live loads that passes every check")
    s.add_argument("job")
    s.add_argument("--json", action="store_true")
    s.set_defaults(func=_lazy("shopbeam.design.capacity", "cmd_capacity"))

    s = sub.add_parser("rating", help="print a rating label to post on the member")
    s.add_argument("job")
    s.add_argument("--width", type=int, default=40, help="label width in characters (default 40)")
    s.add_argument("--plaque", action="store_true", help="the full-page plaque instead of the label")
    s.add_argument("-o", "--output", metavar="FILE", default=None,
                   help="with --plaque: write it to FILE.html, FILE.pdf or FILE.txt")
    s.add_argument("--paper", choices=("letter", "a4"), default=None)
    s.add_argument("--overwrite", action="store_true")
    s.set_defaults(func=_lazy("shopbeam.cli.proof", "cmd_rating"))

    s = sub.add_parser("report", help="write the calc package (HTML, Markdown or PDF)")
    s.add_argument("job")
    s.add_argument("-o", "--output", metavar="FILE", default=None)
    s.add_argument("--paper", choices=("letter", "a4"), default=None)
    s.add_argument("--overwrite", action="store_true")
    from shopbeam.cli.proof import add_title_options

    add_title_options(s)
    s.set_defaults(func=_lazy("shopbeam.cli.proof", "cmd_report"))

    s = sub.add_parser("size", help="catalog sections that pass, lightest first")
    s.add_argument("job")
    s.add_argument("--kind", default=None, help="catalog kind to sweep (default: the job's own)")
    s.add_argument("--max-depth", default=None, help="deepest section allowed, e.g. \"6 in\"")
    s.add_argument("--stock", default=None, help="shop stock list (TOML or CSV) to choose from")
    s.add_argument("--top", type=int, default=15, help="how many to list (default 15)")
    s.add_argument("--json", action="store_true")
    s.set_defaults(func=_lazy("shopbeam.design.sizing", "cmd_size"))

    s = sub.add_parser("section", help="properties of one catalog section")
    s.add_argument("designation")
    s.add_argument("--json", action="store_true")
    s.add_argument("--units", choices=("us", "si"), default="us")
    s.add_argument("--axis", choices=("strong", "weak"), default=None,
                   help="bending axis (default strong; weak turns the section)")
    s.set_defaults(func=_lazy("shopbeam.members.catalog", "cmd_section"))

    s = sub.add_parser("materials", help="list the built-in materials with their sources")
    s.add_argument("--json", action="store_true")
    s.set_defaults(func=_lazy("shopbeam.members.materials", "cmd_materials"))

    s = sub.add_parser("shapes", help="list catalog sections")
    s.add_argument("--kind", default=None)
    s.add_argument("--filter", default=None)
    s.add_argument("--json", action="store_true")
    s.set_defaults(func=_lazy("shopbeam.members.catalog", "cmd_shapes"))

    if with_library:
        from shopbeam.jobs import library

        library.add_parsers(sub)
    else:
        for name, words in LIBRARY_COMMANDS.items():
            sub.add_parser(name, help=words)

    s = sub.add_parser("ui", help="open the text UI (same as giving no command)")
    s.add_argument("job", nargs="?")
    s.add_argument("--library", default=None)
    s.set_defaults(func=cmd_ui)
    return p


def cmd_ui(args) -> int:
    if args.job:
        _load(args.job)  # refuse a broken file with a clear message before the screen opens
    from shopbeam.tui.app import make_app

    app = make_app(job_path=args.job, library=getattr(args, "library", None))
    app.run()
    return EXIT_OK


def resolve_job_arg(args) -> None:
    """One way to name a job for every command: `args.job` (a path, `bundled:NAME`,
    `shop:NAME`, `user:NAME` or a bare library name) becomes the file's path."""
    job = getattr(args, "job", None)
    if not job:
        return
    from pathlib import Path

    if Path(job).is_file():
        return
    from shopbeam.jobs.library import resolve_job

    args.job = str(resolve_job(job, getattr(args, "library", None)))


def _report_error(exc: BaseException) -> int:
    from shopbeam.errors import InputError, InputErrors, UnstableBeam

    if isinstance(exc, (InputError, InputErrors, UnstableBeam)):
        print(f"shopbeam: {exc}", file=sys.stderr)
        return EXIT_INPUT
    raise exc


def main(argv: list[str] | None = None) -> int:
    argv = list(sys.argv[1:] if argv is None else argv)
    light = bool(argv) and argv[0] in {"solve", "check", "capacity", "rating", "size",
                                       "section", "shapes", "materials", "report"}
    parser = build_parser(with_library=not light)
    commands = {a for a in parser._subparsers._group_actions[0].choices}  # noqa: SLF001
    if not argv or (argv[0] not in commands and not argv[0].startswith("-")):
        argv = ["ui"] + argv
    args = parser.parse_args(argv)
    if not getattr(args, "func", None):
        parser.print_help()
        return EXIT_INPUT
    try:
        resolve_job_arg(args)
        return int(args.func(args) or 0)
    except KeyboardInterrupt:
        return 130
    except BrokenPipeError:
        return EXIT_OK
    except Exception as exc:  # noqa: BLE001 - the last line of defence against tracebacks
        try:
            return _report_error(exc)
        except Exception:
            if os.environ.get("SHOPBEAM_DEBUG"):
                raise
            print(f"shopbeam: internal error: {type(exc).__name__}: {exc}. This is a bug in "
                  "shopbeam, not in your job; please report it with the job file "
                  "(SHOPBEAM_DEBUG=1 shows the details).", file=sys.stderr)
            return EXIT_INTERNAL


if __name__ == "__main__":  # pragma: no cover
    sys.exit(main())
