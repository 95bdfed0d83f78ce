"""The `shopbeam` command line.

`shopbeam` (no arguments) or `shopbeam JOB.toml` opens the text UI; the subcommands print
reports, JSON, labels and listings. Bad input gives one clear message on stderr and exit 2,
never a traceback (set SHOPBEAM_DEBUG=1 to see one for an internal error).
"""

from __future__ import annotations

import argparse
import os
import sys
import textwrap

from pathlib import Path

from shopbeam import __version__
from shopbeam.cli.common import (EXIT_INPUT, EXIT_INTERNAL, EXIT_OK, add_title_options, guarded,
                                  load, report_error, warnings_to_stderr)
from shopbeam.output.jsonout import dumps_finite  # noqa: F401 (the name other code knew)

DESCRIPTION = """\
Beam checks for fabrication shops: reactions, shear, moment, slope and deflection of a
straight member, stress and deflection checks, safe load and rating labels, from plain-text
job files. A screening check only: storage racks, lifting devices and building members need
review by a licensed engineer, and local codes govern.

  shopbeam                      open the text UI on a demo job
  shopbeam JOB.toml             open a job in the text UI
  shopbeam solve JOB.toml       print the report (--json for scripts, --calc for the calc sheet)
  shopbeam report JOB -o F.pdf  write the calc package to file (.html, .md or .pdf)
  shopbeam rating JOB           print the rating label to post (--plaque for a full page)

A JOB is a file or a library name: bundled:demo, shop:NAME, user:NAME, or a bare NAME.
"""


@guarded
def cmd_solve(args) -> int:
    # the design modules are imported by the commands that use them: `shopbeam` (the text
    # UI) draws its first screen before they load
    from shopbeam.design.analysis import analyze, to_json  # noqa: PLC0415 - startup
    from shopbeam.output.report import render  # noqa: PLC0415 - startup

    job = load(args.job)
    result = analyze(job)
    if args.json:
        from shopbeam.design.capacity import solve_reasons  # noqa: PLC0415 - startup

        data = to_json(result)
        data["not_rated_reasons"] = solve_reasons(result)
        print(dumps_finite(data, args.job))
        warnings_to_stderr(job)
        return EXIT_OK
    if args.calc:
        from shopbeam.output.calcsheet import calc_sheet  # noqa: PLC0415 - startup: sympy

        print(calc_sheet(job, result), end="")
        return EXIT_OK
    print(render(result), end="")
    return EXIT_OK


@guarded
def cmd_check(args) -> int:
    from shopbeam.design.analysis import analyze  # noqa: PLC0415 - startup

    job = load(args.job)
    analyze(job)  # an unstable beam is an input problem too
    for p in job.warnings:
        print(p.located(), file=sys.stderr)
    from shopbeam.cautions import banner  # noqa: PLC0415 - startup

    def n(count, word):
        return f"{count} {word}{'' if count == 1 else 's'}"

    print(f"{args.job}: input OK ({n(len(job.supports), 'support')}, {n(len(job.loads), 'load')}"
          + (f", {n(len(job.warnings), 'warning')}" if job.warnings else "") + "); the member "
          "is not checked here: run shopbeam solve for its checks")
    print(banner(job.tags, bool(job.caution_lifting)))
    return EXIT_OK


def _at_least_one(text: str) -> int:
    """--top N: a whole number, 1 or more (argparse says what was wrong)."""
    try:
        n = int(text)
    except ValueError:
        raise argparse.ArgumentTypeError(f"{text!r} is not a whole number (e.g. --top 10)") from None
    if n < 1:
        raise argparse.ArgumentTypeError(f"{n} lists nothing: give 1 or more (e.g. --top 10)")
    return n


def _lazy(module: str, func: str):
    """The handler `func` of `module`, imported only when its command runs (start-up speed:
    `solve` need not import the catalog, the sizing sweep or the library)."""
    def run(args):
        import importlib

        return getattr(importlib.import_module(module), func)(args)

    return run


LIBRARY_COMMANDS = {"library": "list, show and copy saved and bundled jobs",
                    "new": "start a job file from a commented template"}


JOB_HELP = ("the job: a file (bay3-arm.toml) or a library name (bundled:demo, shop:NAME, "
            "user:NAME, or a bare NAME looked up shop -> user -> bundled; refused when "
            "./NAME.toml is here too)")


def command(sub, name: str, summary: str, description: str, examples: list[str]):
    """A subcommand whose --help says what it does and shows examples."""
    epilog = "examples:\n" + "\n".join(f"  {e}" for e in examples)
    return sub.add_parser(name, help=summary, description=textwrap.fill(description, 78),
                          epilog=epilog,
                          formatter_class=argparse.RawDescriptionHelpFormatter)


def _with_kinds(parser) -> None:
    """Append the catalog kinds and the shape kinds to a parser's --help (read from the
    catalog only when help is asked for, so other commands start fast)."""
    plain = parser.format_help

    def format_help():
        from shopbeam.members.catalog import KIND_INFO, SHAPE_KINDS  # noqa: PLC0415 - startup
        from shopbeam.members.sections import SHAPES  # noqa: PLC0415 - startup

        lines = ["", "catalog kinds (--kind):"]
        lines += [f"  {k:<11} {words}" for k, words in KIND_INFO.items()]
        lines += ["", "shape kinds (--kind also takes these; each stands for the catalog "
                  "kinds listed):"]
        lines += [f"  {k:<11} {', '.join(v)}" for k, v in SHAPE_KINDS.items()]
        lines += ["", "shapes for a [beam.section] table in a job file (shape = ...):"]
        lines += textwrap.wrap(", ".join(SHAPES), 78, initial_indent="  ",
                               subsequent_indent="  ")
        return plain() + "\n".join(lines) + "\n"

    parser.format_help = format_help


def build_parser(with_library: bool = True) -> argparse.ArgumentParser:
    """The argument parser. `with_library=False` registers `library` and `new` by name only,
    so commands that do not need the library (solve, check, ...) start without importing it."""
    p = argparse.ArgumentParser(
        prog="shopbeam", description=DESCRIPTION,
        epilog="`shopbeam COMMAND --help` shows each command's options with examples.",
        formatter_class=argparse.RawDescriptionHelpFormatter)
    p.add_argument("--version", action="version", version=f"shopbeam {__version__}")
    sub = p.add_subparsers(dest="command", metavar="COMMAND")

    def lib_opt(s):
        s.add_argument("--library", metavar="DIR", default=None,
                       help="the shop library folder to look job names up in "
                            "(default: $SHOPBEAM_LIBRARY)")

    s = command(sub, "solve", "solve a job and print the report",
                "Solve the member and print reactions, exact extremes of shear, moment, slope "
                "and deflection, every check with its ratio, the self-checks and the cautions.",
                ["shopbeam solve bay3-arm.toml", "shopbeam solve bundled:demo --json",
                 "shopbeam solve demo --calc"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    g = s.add_mutually_exclusive_group()
    g.add_argument("--json", action="store_true", help="print the contract JSON (SI units)")
    g.add_argument("--calc", action="store_true",
                   help="print the exact calc sheet (bracket expressions, exact reactions)")
    s.set_defaults(func=cmd_solve)

    s = command(sub, "check", "validate a job file (and that the beam is stable)",
                "Read a job and list every problem with its key and line (exit 2), or say OK; "
                "input warnings go to stderr.",
                ["shopbeam check bay3-arm.toml", "shopbeam check shop:bay3-arm"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    s.set_defaults(func=cmd_check)

    s = command(sub, "capacity", "largest multiplier of the live loads that passes every check",
                "The largest factor k on the live loads (dead loads and self-weight fixed) with "
                "every check passing, found exactly, and the load to post in the job's units.",
                ["shopbeam capacity bundled:pallet-rack-beam-pair",
                 "shopbeam capacity bay3-arm.toml --json"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    s.add_argument("--json", action="store_true",
                   help="print the JSON: the solve JSON's reactions and extremes for the "
                        "job as entered (k = 1), factor (k), and checks and governing at k "
                        "(input warnings also go to stderr)")
    s.set_defaults(func=_lazy("shopbeam.cli.design", "cmd_capacity"))

    s = command(sub, "rating", "print a rating label to post on the member",
                "The load to post in shop words: max uniform or point load, per level and per "
                "beam for racks and shelves, rounded down (and saying so), with every caution "
                "and every limit state not checked; NOT RATED and why when a rating cannot "
                "stand. A 40-column label, or a full-page plaque with --plaque.",
                ["shopbeam rating bundled:pallet-rack-beam-pair",
                 "shopbeam rating bay3-arm.toml --width 32 > label.txt",
                 "shopbeam rating bay3-arm.toml --plaque -o bay3-plaque.pdf"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    s.add_argument("--width", type=int, default=40, metavar="N",
                   help="label width in characters, 30 to 200 (default 40)")
    s.add_argument("--plaque", action="store_true",
                   help="the full-page plaque instead of the label (printed, or written with -o)")
    s.add_argument("-o", "--output", metavar="FILE", default=None,
                   help="with --plaque: write it to FILE.html, FILE.pdf (needs Chromium) or "
                        "FILE.txt")
    s.add_argument("--paper", choices=("letter", "a4"), default=None,
                   help="paper size of the plaque (default: letter for US units, A4 for SI)")
    s.add_argument("--overwrite", action="store_true",
                   help="replace FILE if it exists (otherwise nothing is written)")
    s.set_defaults(func=_lazy("shopbeam.cli.proof", "cmd_rating"))

    s = command(sub, "report", "write the calc package (HTML, Markdown or PDF)",
                "The calc package to file with the job: title block, design basis with code "
                "editions, a sketch of the member, load states, shear, moment, slope and "
                "deflection diagrams, every check with its clause, the self-checks, the "
                "cautions, what was not checked, and the program version with a SHA-256 of the "
                "input (the HTML embeds the input). The file's suffix picks the format: .html "
                "(self-contained, prints on letter or A4 with numbered sheets), .md (for diffs "
                "and e-mail), .pdf (printed from the HTML by a headless Chromium; set "
                "$SHOPBEAM_BROWSER to name one). Without -o the Markdown is printed.",
                ["shopbeam report bay3-arm.toml -o bay3-arm.html",
                 "shopbeam report bundled:demo -o demo.pdf --prepared-by \"R. Fitter\" "
                 "--revision A",
                 "shopbeam report shop:bay3-arm -o bay3-arm.md"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    s.add_argument("-o", "--output", metavar="FILE", default=None,
                   help="write the package to FILE.html, FILE.md or FILE.pdf")
    s.add_argument("--paper", choices=("letter", "a4"), default=None,
                   help="paper size (default: letter for US units, A4 for SI)")
    s.add_argument("--overwrite", action="store_true",
                   help="replace FILE if it exists (otherwise nothing is written)")
    add_title_options(s)
    s.set_defaults(func=_lazy("shopbeam.cli.proof", "cmd_report"))

    s = command(sub, "size", "catalog sections that pass, lightest first",
                "Sweep every section of one catalog kind (or a shop stock list) with the job's "
                "supports and loads, and list those that pass every check, lightest first.",
                ["shopbeam size bundled:storage-platform-beam --kind W",
                 "shopbeam size bay3-arm.toml --kind HSS-rect --max-depth \"4 in\"",
                 "shopbeam size bay3-arm.toml --stock presets/stock/quillhaven-stock.csv"])
    s.add_argument("job", help=JOB_HELP)
    lib_opt(s)
    s.add_argument("--kind", default=None,
                   help="catalog kind to sweep, e.g. W, HSS-rect, C, lumber, LVL, or all (every "
                        "kind of the job's material family) (default: the job's own; see "
                        "shopbeam shapes --help for the list); wood on a metal job, or metal on "
                        "a wood job, sweeps a stated default material of that family, and a "
                        "steel kind not made in the job's grade (bar on tube grade A500-C) "
                        "sweeps the grade it is bought in (A36), saying so")
    s.add_argument("--max-depth", default=None, metavar="LENGTH",
                   help="deepest section allowed, e.g. \"6 in\"")
    s.add_argument("--stock", default=None, metavar="FILE",
                   help="shop stock list (TOML or CSV, see docs/stock-list.md) to choose from")
    s.add_argument("--top", type=_at_least_one, default=15, metavar="N",
                   help="how many to list (default 15)")
    s.add_argument("--confirm", type=int, default=1, metavar="N",
                   help="when the sweep screens first (moving loads, springs, hung loads, "
                        "tees and angles): how many passing sections to check in full and "
                        "list, lightest first (default 1; each takes a full check)")
    s.add_argument("--json", action="store_true", help="print the JSON (SI units)")
    s.set_defaults(func=_lazy("shopbeam.cli.design", "cmd_size"))

    s = command(sub, "section", "properties of one catalog section",
                "The published or computed properties of one catalog section (area, I, S, Z, "
                "r, J, weight) with their source.",
                ["shopbeam section HSS6x4x1/4", "shopbeam section W8x18 --axis weak",
                 "shopbeam section \"rect-tube 2 x 1 x 14ga\" --units si --json"])
    s.add_argument("designation",
                   help="a catalog designation (HSS6x4x1/4, W8x18, C6x8.2, L2x2x3/16, 2x10) or "
                        "a description such as \"rect-tube 2 x 1 x 14ga\"")
    s.add_argument("--json", action="store_true", help="print the JSON (SI units)")
    s.add_argument("--units", choices=("us", "si"), default="us",
                   help="display units (default us)")
    s.add_argument("--axis", choices=("strong", "weak"), default=None,
                   help="bending axis (default strong; weak turns the section)")
    _with_kinds(s)
    s.set_defaults(func=_lazy("shopbeam.cli.members", "cmd_section"))

    s = command(sub, "materials", "list the built-in materials with their sources",
                "Every material key a job file may name, with E, Fy (or the wood stresses), "
                "density and where the figures come from.",
                ["shopbeam materials", "shopbeam materials --units si",
                 "shopbeam materials --json"])
    s.add_argument("--json", action="store_true", help="print the JSON (SI units)")
    s.add_argument("--units", choices=("us", "si"), default="us",
                   help="display units (default us)")
    s.set_defaults(func=_lazy("shopbeam.cli.members", "cmd_materials"))

    s = command(sub, "shapes", "list catalog sections",
                "The sections of the built-in catalog, by kind, optionally filtered by text.",
                ["shopbeam shapes --kind HSS --filter 4x4", "shopbeam shapes --kind channel",
                 "shopbeam shapes --kind SHS --units si", "shopbeam shapes --kind lumber --json"])
    s.add_argument("--kind", default=None,
                   help="one catalog kind or shape kind (listed below; default: all)")
    s.add_argument("--filter", default=None, metavar="TEXT",
                   help="only designations containing TEXT as whole sizes, e.g. 4x4 (W8X10 is "
                        "found by 8x10, not by 8x1)")
    s.add_argument("--json", action="store_true", help="print the JSON (SI units)")
    s.add_argument("--units", choices=("us", "si"), default="us",
                   help="display units (default us)")
    _with_kinds(s)
    s.set_defaults(func=_lazy("shopbeam.cli.members", "cmd_shapes"))

    if with_library:  # the library's commands import it (start-up speed: only when needed)
        from shopbeam.cli import library  # noqa: PLC0415 - startup

        library.add_parsers(sub)
    else:
        for name, words in LIBRARY_COMMANDS.items():
            sub.add_parser(name, help=words)

    s = command(sub, "ui", "open the text UI (same as giving no command)",
                "The keyboard-driven text UI: edit a job with its results following every "
                "change. With no job it opens the library with the demo job.",
                ["shopbeam ui", "shopbeam ui bay3-arm.toml", "shopbeam bundled:jib-arm"])
    s.add_argument("job", nargs="?", help=JOB_HELP + " (default: the demo job)")
    lib_opt(s)
    s.set_defaults(func=cmd_ui)
    return p


def has_terminal() -> bool:
    """Whether the keys come from a terminal and the screen goes to one (the text UI needs
    both; a script or a pipe gets the command-line answer instead)."""
    try:
        return sys.stdin.isatty() and sys.stdout.isatty()
    except (AttributeError, ValueError):  # closed or replaced streams
        return False


@guarded
def cmd_ui(args) -> int:
    if not has_terminal():
        # run from a script or with its output piped: the full-screen UI would wait for keys
        # that never come. A job named is read in full (its problems: exit 2, as any
        # command); either way the user is told what to run instead
        if args.job:
            from shopbeam.jobs.jobfile import load_job  # noqa: PLC0415 - startup

            load_job(args.job)
        print("shopbeam: the text UI needs a terminal (its keys and screen are not one "
              "here). From a script, use `shopbeam solve JOB` (or check, capacity, rating); "
              "run `shopbeam" + (f" {args.job}" if args.job else "") + "` in a terminal to "
              "edit the job.", file=sys.stderr)
        return EXIT_INPUT
    if args.job:
        # a file that is not TOML is refused with a clear message before the screen opens;
        # a job with problems opens, each problem shown beside its field, to be finished
        from shopbeam.jobs.jobdoc import load as open_doc  # noqa: PLC0415 - startup

        open_doc(args.job)
    from shopbeam.tui.app import make_app  # noqa: PLC0415 - startup: textual

    app = make_app(job_path=args.job, library=getattr(args, "library", None))
    app.run()
    if app.return_code:  # the app failed (Textual printed what): never exit 0 after that
        if app.recovered is not None:
            print(f"shopbeam: the unsaved job was written to {app.recovered}",
                  file=sys.stderr)
        return EXIT_INTERNAL
    return EXIT_OK


def resolve_job_arg(args) -> None:
    """One way to name a job for every command: `args.job` (a path, `bundled:NAME`,
    `shop:NAME`, `user:NAME` or a bare library name) becomes the file's path."""
    job = getattr(args, "job", None)
    if not job:
        return
    if Path(job).is_file():
        return
    from shopbeam.jobs.library import resolve_job  # noqa: PLC0415 - startup: library

    args.job = str(resolve_job(job, getattr(args, "library", None)))


def main(argv: list[str] | None = None) -> int:
    argv = list(sys.argv[1:] if argv is None else argv)
    light = bool(argv) and argv[0] in {"solve", "check", "capacity", "rating", "size",
                                       "section", "shapes", "materials", "report"}
    parser = build_parser(with_library=not light)
    commands = {a for a in parser._subparsers._group_actions[0].choices}  # noqa: SLF001
    if argv and argv[0] not in commands and not argv[0].startswith("-") and len(argv) > 1 \
            and not argv[1].startswith("-") and not os.path.exists(argv[0]) \
            and not argv[0].lower().endswith(".toml"):
        # "shopbeam solv job.toml": a slip of the command, not a job for the text UI
        import difflib  # noqa: PLC0415 - only on this slip

        near = difflib.get_close_matches(argv[0], sorted(commands - {"ui"}), n=1, cutoff=0.6)
        parser.error(f"{argv[0]!r} is not a command" + (f" (did you mean {near[0]!r}?)"
                                                        if near else "")
                     + "; commands are " + ", ".join(sorted(commands)))
    if not argv or (argv[0] not in commands and not argv[0].startswith("-")):
        argv = ["ui"] + argv
    args, extra = parser.parse_known_args(argv)
    if extra:
        # an option the command does not take: said with that command's own usage, which
        # lists its options (the top-level usage does not)
        chosen = parser._subparsers._group_actions[0].choices.get(  # noqa: SLF001
            getattr(args, "command", None))
        (chosen or parser).error(f"unrecognized arguments: {' '.join(extra)}")
    if not getattr(args, "func", None):
        parser.print_help()
        return EXIT_INPUT
    from shopbeam.escapes import EscapingStream

    saved = sys.stdout, sys.stderr
    if args.func is not cmd_ui:  # the text UI draws with escapes; Rich strips the file's
        sys.stdout, sys.stderr = EscapingStream(sys.stdout), EscapingStream(sys.stderr)
    try:
        resolve_job_arg(args)
        return int(args.func(args) or 0)
    except KeyboardInterrupt:
        return 130
    except BrokenPipeError:
        return EXIT_OK
    except Exception as exc:  # noqa: BLE001 - the last line of defence against tracebacks
        try:
            return report_error(exc, getattr(args, "job", None))
        except Exception:
            if os.environ.get("SHOPBEAM_DEBUG"):
                raise
            print(f"shopbeam: internal error: {type(exc).__name__}: {exc}. This is a bug in "
                  "shopbeam, not in your job; please report it with the job file "
                  "(SHOPBEAM_DEBUG=1 shows the details).", file=sys.stderr)
            return EXIT_INTERNAL
    finally:
        sys.stdout, sys.stderr = saved


if __name__ == "__main__":  # pragma: no cover
    sys.exit(main())
