"""Regenerate the screenshots of the text UI from the bundled demo jobs.

    python screenshots/make_screenshots.py [--size 100x32] [--out screenshots]

Writes one SVG per main view (and a PNG beside it when rsvg-convert, cairosvg or
ImageMagick is available). The user library is pointed at an empty temporary folder so the
pictures show only the bundled presets.
"""

from __future__ import annotations

import argparse
import asyncio
import os
import shutil
import subprocess
import sys
import tempfile
from pathlib import Path

HERE = Path(__file__).resolve().parent
PRESETS = HERE.parent / "presets"

# (file name, job (None: start as `shopbeam` does), keys to press before the picture)
SHOTS = [
    ("library", None, []),
    ("job", "demo", []),
    ("span", "demo", ["escape", "2"]),
    ("loads", "demo", ["escape", "3"]),
    ("section", "demo", ["escape", "4"]),
    ("material", "demo", ["escape", "5"]),
    ("criteria", "demo", ["escape", "6"]),
    ("results", "demo", ["escape", "7"]),
    ("plots", "demo", ["escape", "8"]),
    ("calc", "demo", ["escape", "9"]),
    ("rating", "demo", ["escape", "0"]),
    ("sizing", "demo", ["escape", "s", "r"]),
    ("help", "demo", ["f1"]),
    ("lifting-results", "jib-arm", ["escape", "7"]),
]


def to_png(svg: Path) -> Path | None:
    png = svg.with_suffix(".png")
    if shutil.which("rsvg-convert"):
        # rsvg draws the no-break spaces of the export narrower than a cell: give it plain
        # spaces it must keep instead
        text = svg.read_text(encoding="utf-8").replace("&#160;", " ")
        text = text.replace("<svg ", '<svg xml:space="preserve" ', 1)
        with tempfile.NamedTemporaryFile("w", suffix=".svg", delete=False,
                                         encoding="utf-8") as tmp:
            tmp.write(text)
        try:
            subprocess.run(["rsvg-convert", "-o", str(png), tmp.name], check=True)
        finally:
            os.unlink(tmp.name)
        return png
    try:
        import cairosvg  # type: ignore

        cairosvg.svg2png(url=str(svg), write_to=str(png))
        return png
    except ImportError:
        pass
    magick = shutil.which("magick") or shutil.which("convert")
    if magick:
        done = subprocess.run([magick, str(svg), str(png)], capture_output=True)
        if done.returncode == 0 and png.exists():
            return png
    return None


async def shoot(name, job, keys, size, out: Path) -> Path:
    from shopbeam.tui.app import make_app

    path = None if job is None else PRESETS / f"{job}.toml"
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=size) as pilot:
        await pilot.pause()
        for _ in range(200):  # the first solve starts after the first paint: wait for it
            js = getattr(app, "job_screen", None)
            if js is not None and not js.session.stale:
                break
            await pilot.pause(0.05)
        await app.workers.wait_for_complete()
        for k in keys:
            await pilot.press(k)
            await pilot.pause()
        # let workers (calc sheet, rating, sizing) finish
        await app.workers.wait_for_complete()
        await pilot.pause(0.2)
        svg = out / f"{name}.svg"
        app.save_screenshot(filename=svg.name, path=str(out))
    return svg


def main(argv=None) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--size", default="100x32",
                    help="terminal size WxH (default 100x32); 80x24 pictures go in "
                         "screenshots/80x24 (python screenshots/make_screenshots.py --size "
                         "80x24 --out screenshots/80x24)")
    ap.add_argument("--out", default=str(HERE), help="folder for the pictures")
    ap.add_argument("--only", default=None, help="comma-separated shot names")
    args = ap.parse_args(argv)
    w, h = (int(v) for v in args.size.lower().split("x"))
    out = Path(args.out)
    out.mkdir(parents=True, exist_ok=True)
    os.environ["SHOPBEAM_USER_DIR"] = tempfile.mkdtemp(prefix="shopbeam-shots-")
    os.environ.pop("SHOPBEAM_LIBRARY", None)
    wanted = set(args.only.split(",")) if args.only else None
    for name, job, keys in SHOTS:
        if wanted and name not in wanted:
            continue
        svg = asyncio.run(shoot(name, job, keys, (w, h), out))
        png = to_png(svg)
        print(f"{svg}" + (f"  {png}" if png else "  (no PNG converter found)"))
    return 0


if __name__ == "__main__":
    sys.exit(main())
