"""Comment-keeping edits on the layouts people write by hand: a byte-order mark, comments
above each load, comments inside a multi-line value, dotted keys."""

from __future__ import annotations

from shopbeam.jobs import jobdoc
from shopbeam.jobs.jobfile import load_job

TEXT = '''schema = 1
title = "x"
units = "us"
beam.length = "10 ft"   # overall
beam.section = "W8x18"
beam.material = "A992"

[[supports]]
at = "0 ft"
type = "pin"

[[supports]]
at = "10 ft"
type = "roller"

# stair stringer
[[loads]]
type = "point"
at = "2 ft"
value = "-100 lbf"

# pipe rack
[[loads]]
type = "linear"
start = "0 ft"
end = "4 ft"
value = [
  "0 lbf/ft",    # nothing at the wall
  "-60 lbf/ft",  # full pile
]

# hoist hook
[[loads]]
type = "point"
at = "8 ft"
value = "-50 lbf"
'''


def test_byte_order_mark_opens_edits_saves_and_is_kept(tmp_path):
    p = tmp_path / "bom.toml"
    p.write_bytes(b"\xef\xbb\xbf" + TEXT.encode())
    doc = jobdoc.load(p)
    doc.set_title("with a mark")
    doc.save()
    raw = p.read_bytes()
    assert raw.startswith(b"\xef\xbb\xbf") and raw.count(b"\xef\xbb\xbf") == 1
    assert load_job(p).title == "with a mark"  # the reader takes it too


def test_removing_a_load_keeps_the_next_loads_comment():
    doc = jobdoc.parse(TEXT)
    doc.remove_load(0)
    text = doc.text()
    assert "# stair stringer" not in text
    assert "# pipe rack\n[[loads]]\ntype = \"linear\"" in text
    assert "# hoist hook\n[[loads]]" in text
    doc = jobdoc.parse(TEXT)
    doc.remove_load(1)
    text = doc.text()
    assert "# pipe rack" not in text and "# nothing at the wall" not in text
    assert "# hoist hook\n[[loads]]\ntype = \"point\"\nat = \"8 ft\"" in text
    assert "# stair stringer\n[[loads]]\ntype = \"point\"\nat = \"2 ft\"" in text
    assert [ld["at"] for ld in doc.loads()] == ["2 ft", "8 ft"]


def test_comments_inside_a_multi_line_value_survive_an_edit_of_it():
    doc = jobdoc.parse(TEXT)
    doc.set_load(1, value=["0 lbf/ft", "-80 lbf/ft"])
    text = doc.text()
    assert '"0 lbf/ft",    # nothing at the wall' in text
    assert '"-80 lbf/ft",  # full pile' in text
    doc.set_load(1, value=["0 lbf/ft", "-80 lbf/ft"], label="pipes")  # same value again
    assert '"-80 lbf/ft",  # full pile' in doc.text()


def test_dotted_keys_edit_in_place():
    doc = jobdoc.parse(TEXT)
    doc.set_length("12 ft")
    doc.set_value("beam.section", "W10x22")
    text = doc.text()
    assert 'beam.length = "12 ft"   # overall' in text
    assert 'beam.section = "W10x22"' in text
    assert doc.get("beam.length") == "12 ft"
