"""Command-line handlers for the proof to file with a job: `report` (the calc package),
`rating` (the label and the full-page plaque) and `library check`.

They resolve the job by the one rule (`jobs.library.resolve_job`), call the output layer, and
print one line saying what was written and how. Bad input raises InputError (one message,
exit 2, from the caller).
"""

from __future__ import annotations

import sys
from pathlib import Path

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.cli.common import TITLE_OPTIONS, add_title_options  # noqa: F401
from shopbeam.errors import InputError
from shopbeam.jobs.jobfile import load_job
from shopbeam.output import calcpackage as cp
from shopbeam.output import label
from shopbeam.output.pdf import NoBrowser, PrintFailed, find_browser, print_pdf



def job_path(args) -> Path:
    """The file of the job named on the command line (path or library name)."""
    from shopbeam.jobs.library import resolve_job  # noqa: PLC0415 - startup

    return resolve_job(args.job, getattr(args, "library", None))


def _read(args):
    path = job_path(args)
    try:
        raw = path.read_bytes()
    except OSError:
        raw = b""
    return path, raw, load_job(path)


def _pdf_error(exc) -> InputError:
    return InputError(f"cannot make the PDF: {exc}", key="-o")


def cmd_report(args) -> int:
    """`shopbeam report JOB [-o FILE.html|.md|.pdf] [title-block options]`."""
    path, raw, job = _read(args)
    for w in job.warnings:
        print(w.located(), file=sys.stderr)
    fields = {("job" if key == "job_number" else key): getattr(args, key, None)
              for key, _, _ in TITLE_OPTIONS}
    pkg = cp.build(analyze(job), input_bytes=raw, input_name=str(path), fields=fields,
                   paper=getattr(args, "paper", None))
    out = getattr(args, "output", None)
    if out is not None and not out.strip():
        raise InputError("it names no file (it is empty): give the file to write, or leave "
                         "-o out to print the package", key="-o")
    if not out:
        print(cp.to_markdown(pkg), end="")
        return 0
    kind = cp.format_of(out)
    try:
        cp.write(pkg, out, overwrite=getattr(args, "overwrite", False))
    except (NoBrowser, PrintFailed) as exc:
        raise _pdf_error(exc) from None
    how = {"html": "self-contained HTML; print it from any browser (letter or A4, sheets "
                   "numbered)",
           "markdown": "Markdown (the same content, for diffs and e-mail; the diagrams are in "
                       "the HTML)",
           "pdf": f"PDF printed from the HTML by headless Chromium ({find_browser()})"}[kind]
    print(f"Wrote {out}: calc package of {path}, {how}")
    print(f"Input SHA-256 {pkg.input_sha256}")
    return 0


def cmd_rating(args) -> int:
    """`shopbeam rating JOB [--width N] [--plaque [-o FILE]]`."""
    _, _, job = _read(args)
    unchecked = analyze(job).unchecked  # first: a job it refuses is refused as solve does
    r = label.rating(capacity(job), unchecked)
    out = getattr(args, "output", None)
    if out is not None and not out.strip():
        raise InputError("it names no file (it is empty): give the file to write, or leave "
                         "-o out to print the plaque", key="-o")
    if out and not getattr(args, "plaque", False):
        raise InputError("-o writes the full-page plaque: add --plaque (the 40-column label "
                         "prints to the screen; redirect it: > label.txt)", key="-o")
    if not getattr(args, "plaque", False):
        print(label.label_text(r, getattr(args, "width", 40)), end="")
        return 0
    if not out:
        print(label.plaque_text(r), end="")
        return 0
    return _write_plaque(r, Path(out), getattr(args, "paper", None) or
                         ("a4" if job.units == "si" else "letter"),
                         getattr(args, "overwrite", False))


def _write_plaque(r, out: Path, paper: str, overwrite: bool) -> int:
    suffix = out.suffix.lower()
    if suffix not in (".html", ".htm", ".pdf", ".txt"):
        raise InputError(f"{str(out)!r}: the plaque is written as .html, .pdf or .txt (by the "
                         "file's suffix)", key="-o")
    cp.check_out(out, overwrite)
    if suffix == ".txt":
        data = label.plaque_text(r).encode("utf-8")
    else:
        html = label.plaque_html(r, paper)
        try:
            data = print_pdf(html) if suffix == ".pdf" else html.encode("utf-8")
        except (NoBrowser, PrintFailed) as exc:
            raise _pdf_error(exc) from None
    cp.write_out(out, data)
    print(f"Wrote {out}: full-page rating plaque ({'NOT RATED' if r.status != 'rated' else 'rated'})")
    return 0


def cmd_library_check(args) -> int:
    """`shopbeam library check [--from shop|user|bundled] [--csv]`."""
    from shopbeam.output import librarycheck as lc  # noqa: PLC0415 - startup: brings the library

    origin = getattr(args, "origin", None)
    lib = getattr(args, "library", None)
    if origin == "shop":
        from shopbeam.jobs.library import place  # noqa: PLC0415 - startup

        place("shop", lib)  # says how to set the shop library when none is
    rows = lc.check_library(lib, origin)
    print(lc.to_csv(rows) if getattr(args, "csv", False) else lc.to_text(rows), end="")
    return 0

