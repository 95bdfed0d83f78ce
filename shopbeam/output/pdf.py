"""A PDF of an HTML calc package, printed by a headless Chromium where the machine has one.

How: the HTML is written to a new temporary folder and Chromium prints it with
``--headless --print-to-pdf`` (its own page header and footer turned off: the package's print
stylesheet numbers the sheets). The browser is ``$SHOPBEAM_BROWSER`` if set, else the first of
chromium, chromium-browser, google-chrome, google-chrome-stable found on PATH. It runs with a
fresh profile folder, no network services, and a time limit. With no browser, `find_browser`
returns None and `print_pdf` raises `NoBrowser` with what to do instead.
"""

from __future__ import annotations

import os
import shutil
import subprocess
import tempfile
from pathlib import Path

BROWSERS = ("chromium", "chromium-browser", "google-chrome", "google-chrome-stable")
ENV_BROWSER = "SHOPBEAM_BROWSER"
FLAGS = ("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
         "--disable-background-networking", "--disable-component-update", "--disable-sync",
         "--disable-extensions", "--mute-audio")
TIMEOUT = 120.0


class NoBrowser(Exception):
    """No headless browser to print a PDF with."""


class PrintFailed(Exception):
    """The browser ran but did not make a PDF."""


def find_browser() -> str | None:
    given = os.environ.get(ENV_BROWSER)
    if given:
        return shutil.which(given) or (given if Path(given).is_file() else None)
    for name in BROWSERS:
        found = shutil.which(name)
        if found:
            return found
    return None


NO_BROWSER_HELP = ("no Chromium or Chrome was found to print the PDF with. Install one "
                   "(Debian/Ubuntu: apt-get install chromium) or name it in $SHOPBEAM_BROWSER; "
                   "or write the package as .html (-o FILE.html) and print it to PDF from any "
                   "browser: its print stylesheet numbers the sheets")


def browser_command(browser: str, profile: str | os.PathLike, *extra: str) -> list[str]:
    return [browser, *FLAGS, f"--user-data-dir={profile}", *extra]


def print_pdf(html: str, browser: str | None = None, timeout: float = TIMEOUT) -> bytes:
    """The PDF bytes of `html`, printed by a headless Chromium. Raises NoBrowser, PrintFailed."""
    browser = browser or find_browser()
    if not browser:
        raise NoBrowser(NO_BROWSER_HELP)
    with tempfile.TemporaryDirectory(prefix="shopbeam-pdf-") as tmp:
        page = Path(tmp) / "package.html"
        page.write_text(html, encoding="utf-8")
        out = Path(tmp) / "package.pdf"
        profile = Path(tmp) / "profile"
        profile.mkdir()
        cmd = browser_command(browser, profile, "--no-pdf-header-footer",
                              f"--print-to-pdf={out}", page.as_uri())
        try:
            run = subprocess.run(cmd, capture_output=True, text=True, timeout=timeout,
                                 stdin=subprocess.DEVNULL)
        except subprocess.TimeoutExpired:
            raise PrintFailed(f"the browser ({browser}) did not finish printing within "
                              f"{timeout:.0f} s") from None
        except OSError as exc:
            raise PrintFailed(f"cannot run the browser {browser}: {exc.strerror or exc}") from None
        if not out.is_file() or out.read_bytes()[:5] != b"%PDF-":
            last = (run.stderr or "").strip().splitlines()[-3:]
            raise PrintFailed(f"the browser ({browser}) made no PDF (exit {run.returncode})"
                              + (": " + " | ".join(last) if last else ""))
        return out.read_bytes()
