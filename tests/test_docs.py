"""The documentation stays inside the repository: every link in README.md, DEVELOPERS.md and
docs/ points at a file of the repository that exists, and no path names the outside."""

from __future__ import annotations

import re
from pathlib import Path

REPO = Path(__file__).resolve().parents[1]
DOCS = [REPO / "README.md", REPO / "DEVELOPERS.md", *sorted((REPO / "docs").glob("*.md"))]


def test_docs_exist():
    for name in ("job-file.md", "stock-list.md", "json.md"):
        assert (REPO / "docs" / name).is_file(), name
    readme = (REPO / "README.md").read_text()
    for name in ("docs/job-file.md", "docs/stock-list.md", "docs/json.md"):
        assert f"]({name})" in readme, name


def test_every_link_stays_inside_the_repository():
    for doc in DOCS:
        text = doc.read_text(encoding="utf-8")
        for target in re.findall(r"\]\(([^)\s]+)\)", text):
            assert not re.match(r"[a-z]+:", target), (doc.name, target)  # no outside URL
            path = (doc.parent / target.split("#")[0]).resolve()
            assert path.is_relative_to(REPO), (doc.name, target)
            assert path.exists(), (doc.name, target)
        assert "../shared" not in text, doc.name
