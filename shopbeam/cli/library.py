"""`shopbeam library list|show|copy|check` and `shopbeam new`: the preset library and new job
files from the command line (the library itself is `shopbeam.jobs.library`)."""

from __future__ import annotations

import argparse
import re
import shlex
import textwrap
from pathlib import Path

from shopbeam import cautions
from shopbeam.cli.common import guarded
from shopbeam.errors import InputError
from shopbeam.escapes import shown
from shopbeam.jobs import storage
from shopbeam.jobs.jobdoc import new_job_text
from shopbeam.jobs.library import (ENV_SHOP, ENV_USER, ORIGINS, copy, entries, find, place,
                                   places, safe_library_name)



def _banner(tags=(), lifting: bool = False) -> str:
    return cautions.banner(tags, lifting)


def _table(rows: list[list[str]], headers: list[str]) -> str:
    widths = [max(len(r[i]) for r in rows + [headers]) for i in range(len(headers))]
    lines = ["  ".join(h.ljust(w) for h, w in zip(headers, widths)).rstrip()]
    lines.append("  ".join("-" * w for w in widths))
    lines += ["  ".join(c.ljust(w) for c, w in zip(r, widths)).rstrip() for r in rows]
    return "\n".join(lines)


def _library_list(args) -> int:
    found = entries(getattr(args, "library", None), tag=args.tag, search=args.search)
    pls = places(getattr(args, "library", None))
    for pl in pls:
        state = "" if pl.folder.is_dir() else " (empty: not created yet)"
        ro = " (read-only)" if not pl.writable else ""
        print(f"{pl.origin:8} {pl.folder}{ro}{state}")
    print()
    if not found:
        what = " and ".join(x for x in (f"tag '{args.tag}'" if args.tag else "",
                                        f"text '{args.search}'" if args.search else "") if x)
        print(f"No jobs found{' with ' + what if what else ''}.")
    else:
        rows = []
        for e in found:
            title = e.title + (f"  [hidden by {e.shadowed_by}]" if e.shadowed_by else "")
            title += f"  [problem: {e.problem.splitlines()[0]}]" if e.problem else ""
            rows.append([shown(e.name), e.origin, shown(",".join(e.tags)), shown(title)])
        print(_table(rows, ["NAME", "ORIGIN", "TAGS", "TITLE"]))
    print()
    print(_banner(tuple(t for e in found for t in e.tags), any(e.lifting for e in found)))
    return 0


def _library_show(args) -> int:
    e = find(args.name, getattr(args, "library", None))
    print(f"# {e.label}  ({e.path}){'  read-only' if e.read_only else ''}")
    if e.shadowed_by:
        print(f"# note: hidden by a job of the same name in the {e.shadowed_by} library")
    if e.problem and not e.text:
        raise InputError(f"cannot show '{e.label}': {e.problem}", file=str(e.path))
    text = e.text or storage.open_text(e.path).text
    print(shown(text.rstrip("\n"), keep="\n\t"))
    print()
    print(f"# {_banner(e.tags, e.lifting)}")
    return 0


def _library_copy(args) -> int:
    target = copy(args.name, to=args.to, library_dir=getattr(args, "library", None),
                  new_name=args.as_name, overwrite=args.overwrite)
    print(f"Copied to {target}")
    return 0


@guarded
def cmd_library(args) -> int:
    """`shopbeam library list|show|copy ...`."""
    action = getattr(args, "library_cmd", None)
    if action == "check":  # the design modules: imported for this one (start-up speed)
        from shopbeam.cli.proof import cmd_library_check  # noqa: PLC0415 - startup

        return cmd_library_check(args)
    handlers = {"list": _library_list, "show": _library_show, "copy": _library_copy}
    if action not in handlers:
        raise InputError("say what to do: list, show NAME, copy NAME or check (see shopbeam "
                         "library --help)", key="library")
    return handlers[action](args)


@guarded
def cmd_new(args) -> int:
    """`shopbeam new NAME [--to user|shop|PATH.toml]`: a commented template job."""
    lib = getattr(args, "library", None)
    name = args.name
    to = args.to
    stem = None
    if to is not None and to not in ("user", "shop"):
        if not to.lower().endswith(storage.SUFFIX):
            raise InputError(f"--to {to!r}: give user, shop or a file path ending in .toml",
                             key="--to")
        safe_library_name(name)
        target = Path(to)
    elif to is None and name.lower().endswith(storage.SUFFIX):
        target = Path(name)  # a file the user names on their own disk: `shopbeam new arm.toml`
    else:
        dest = place(to or "user", lib)
        stem = safe_library_name(name)
        target = storage.path_in(dest.folder, stem)
        dest.folder.mkdir(parents=True, exist_ok=True)
    if not target.parent.is_dir():
        raise InputError(f"the folder {target.parent} does not exist; nothing was written. "
                         "Make the folder first, or copy to a folder that exists", key="--to")
    if re.search(r"[\x00-\x1f\x7f-\x9f\u202a-\u202e\u2066-\u2069]", target.name):
        raise InputError(f"the file name {shown(target.name)} holds control characters (a "
                         "line break, an escape or a direction mark), which would hide or "
                         "garble it in listings: give a plain name",
                         key="--to" if to is not None else "NAME")
    title = args.title or storage.suggest_name(Path(name).stem).replace("-", " ").capitalize()
    tags = [t.strip() for t in (args.tags or "").split(",") if t.strip()]
    storage.save_text(target, new_job_text(title, tags=tags), None, overwrite=args.overwrite)
    print(f"Wrote {target}")
    if stem is not None:
        made = f" (made safe from {name.strip()!r})" if stem != name.strip() else ""
        print(f"Library name: {stem}{made}")
        print(f"Edit it, then: shopbeam check {stem}   and   shopbeam solve {stem}")
    else:
        print(f"Edit it, then: shopbeam check {shlex.quote(str(target))}   and   "
              f"shopbeam solve {shlex.quote(str(target))}")
    return 0


def add_parsers(subparsers) -> None:
    """Register `library` and `new`."""

    def command(sub, name, summary, description, examples):
        return sub.add_parser(name, help=summary, description=textwrap.fill(description, 78),
                              epilog="examples:\n" + "\n".join(f"  {e}" for e in examples),
                              formatter_class=argparse.RawDescriptionHelpFormatter)

    def lib_opt(p):
        p.add_argument("--library", metavar="DIR", default=argparse.SUPPRESS,
                       help=f"the shop library folder (default: ${ENV_SHOP})")

    lib = command(subparsers, "library", "list, show, copy and re-check saved and bundled jobs",
                  "Jobs in the shop library (--library DIR or $SHOPBEAM_LIBRARY), your own "
                  f"library (${ENV_USER} or the platform's user data folder) and the bundled "
                  "presets, searched in that order. Name one as shop:NAME, user:NAME, "
                  "bundled:NAME or a bare NAME (the first found).",
                  ["shopbeam library list --tag rack", "shopbeam library show bundled:jib-arm",
                   "shopbeam library copy bundled:pallet-rack-beam-pair --as bay-a-level-2",
                   "shopbeam library check --from shop --csv > recheck.csv"])
    lib_opt(lib)
    lsub = lib.add_subparsers(dest="library_cmd", metavar="{list,show,copy,check}")
    p = command(lsub, "list", "list jobs with their origin",
                "Every job of the three libraries with its origin, tags and title; a job "
                "hidden by one of the same name found earlier is marked.",
                ["shopbeam library list", "shopbeam library list --tag lifting",
                 "shopbeam library list --search \"pallet 96\""])
    lib_opt(p)
    p.add_argument("--tag", help="only jobs with this tag, e.g. rack or lifting")
    p.add_argument("--search", metavar="TEXT", help="only jobs whose title, tags or text "
                                                    "contain every word of TEXT")
    p = command(lsub, "show", "print a job file",
                "Print a job file exactly as it is saved, with where it is.",
                ["shopbeam library show demo", "shopbeam library show user:bay-3-arm"])
    lib_opt(p)
    p.add_argument("name", help="job name (user:NAME, shop:NAME or bundled:NAME to pick one)")
    p = command(lsub, "copy", "copy a job into your library or the shop library",
                "Copy a job's file, comments and all, into your user library or the shop "
                "library. An existing job of that name is never replaced without --overwrite.",
                ["shopbeam library copy bundled:jib-arm",
                 "shopbeam library copy demo --as loft-beam --to shop --library /srv/shopbeam"])
    lib_opt(p)
    p.add_argument("name", help="the job to copy (user:NAME, shop:NAME, bundled:NAME or NAME)")
    p.add_argument("--to", choices=("user", "shop"), default="user",
                   help="the library to copy into (default user)")
    p.add_argument("--as", dest="as_name", metavar="NEWNAME", help="name of the copy")
    p.add_argument("--overwrite", action="store_true",
                   help="replace a job of that name that already exists there")
    p = command(lsub, "check", "re-check every job of a library: one line per job",
                "Read, solve, check and rate every job again and print one line per job: "
                "title, governing check, ratio, PASS/FAIL and the rated load (or why it could "
                "not be checked). What to run after a change of code, stock or presets.",
                ["shopbeam library check", "shopbeam library check --from bundled",
                 "shopbeam library check --from shop --library /srv/shopbeam --csv > jobs.csv"])
    lib_opt(p)
    p.add_argument("--from", dest="origin", choices=ORIGINS, default=None,
                   help="only this library (default: all three, each name once)")
    p.add_argument("--csv", action="store_true", help="print CSV for a spreadsheet")
    lib.set_defaults(func=cmd_library)

    new = command(subparsers, "new", "start a job file from a commented template",
                  "Write a commented template job to fill in. A name goes to your user "
                  "library (or --to shop); spaces and odd characters are made safe "
                  "(\"bay 4 arm\" -> bay-4-arm) and the file written is named. A name ending "
                  "in .toml is a file in the current folder.",
                  ["shopbeam new \"bay 4 arm\" --tags rack,arm",
                   "shopbeam new shelf-2 --to shop --library /srv/shopbeam",
                   "shopbeam new arm.toml --title \"Bay 3 arm\""])
    lib_opt(new)
    new.add_argument("name", help="a library name, or a path ending in .toml")
    new.add_argument("--to", metavar="user|shop|PATH.toml", default=None,
                     help="where to write it (default: your user library)")
    new.add_argument("--title", help="the job's title (default: from the name)")
    new.add_argument("--tags", help="comma-separated tags, e.g. rack,shelf")
    new.add_argument("--overwrite", action="store_true",
                     help="replace an existing file of that name")
    new.set_defaults(func=cmd_new)
