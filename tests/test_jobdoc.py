"""Editing job files as text: one edited load is one changed line, comments survive, and
the template `shopbeam new` writes is valid, commented and says the sign convention."""

from __future__ import annotations

import difflib
import tomllib
from pathlib import Path

import pytest

from shopbeam.jobs import jobdoc, storage
from shopbeam.errors import InputError

PRESETS = sorted((Path(__file__).resolve().parent.parent / "presets").glob("*.toml"))


def changed_lines(old: str, new: str) -> list[str]:
    """The -/+ lines of a unified diff (what `git diff` would show)."""
    return [ln for ln in difflib.unified_diff(old.splitlines(), new.splitlines(), lineterm="")
            if ln[:1] in "+-" and not ln.startswith(("+++", "---"))]


@pytest.mark.parametrize("path", PRESETS, ids=lambda p: p.stem)
def test_preset_round_trips_byte_for_byte(path):
    text = path.read_text(encoding="utf-8")
    assert jobdoc.parse(text).text() == text


WITH_LOADS = [p for p in PRESETS if "[[loads]]" in p.read_text(encoding="utf-8")]


@pytest.mark.parametrize("path", WITH_LOADS, ids=lambda p: p.stem)
def test_edit_one_load_then_save_changes_exactly_one_line(path, tmp_path):
    copy = tmp_path / path.name
    copy.write_text(path.read_text(encoding="utf-8"), encoding="utf-8")
    before = copy.read_text(encoding="utf-8")
    doc = jobdoc.load(copy)
    last = len(doc.loads()) - 1
    old_value = doc.loads()[last]["value"]
    new_value = (["-1 lbf/ft", "-2 lbf/ft"] if isinstance(old_value, list) else "-123 lbf")
    doc.set_load(last, value=new_value)
    doc.save()
    after = copy.read_text(encoding="utf-8")
    diff = changed_lines(before, after)
    assert len(diff) == 2, diff  # one line out, one line in
    assert diff[0].startswith("-value = ") and diff[1].startswith("+value = ")
    # the inline comment after the value is kept
    if "#" in diff[0]:
        assert diff[0].split("#", 1)[1] == diff[1].split("#", 1)[1]
    assert tomllib.loads(after)["loads"][last]["value"] == new_value


def test_comments_and_order_survive_several_edits():
    text = (PRESETS[0].parent / "awning-bracket.toml").read_text(encoding="utf-8")
    doc = jobdoc.parse(text)
    doc.set_title("Awning bracket, 5 ft")
    doc.set_length("5 ft")
    doc.set_criteria(deflection="L/240")
    out = doc.text()
    diff = changed_lines(text, out)
    assert len(diff) == 6
    assert [ln for ln in out.splitlines() if ln.startswith("#")] == \
        [ln for ln in text.splitlines() if ln.startswith("#")]
    assert '+title = "Awning bracket, 5 ft"' in diff and '+length = "5 ft"' in diff
    keys = list(tomllib.loads(out))
    assert keys == list(tomllib.loads(text))


def test_add_and_remove_loads_and_supports():
    text = jobdoc.new_job_text("Shelf", length="6 ft")
    doc = jobdoc.parse(text)
    i = doc.add_load("point", at="2 ft", value="-150 lbf", label="box")
    assert i == 1
    j = doc.add_support("roller", at="3 ft")
    assert j == 2
    data = tomllib.loads(doc.text())
    assert data["loads"][1] == {"type": "point", "at": "2 ft", "value": "-150 lbf",
                                "label": "box"}
    assert data["supports"][2] == {"at": "3 ft", "type": "roller"}
    # adding only adds lines (plus blank lines), nothing of the old text changes
    assert all(ln.startswith("+") for ln in changed_lines(text, doc.text()))
    doc.remove_load(1)
    doc.remove_support(2)
    assert tomllib.loads(doc.text()) == tomllib.loads(text)
    doc.remove_load(0)
    assert "loads" not in tomllib.loads(doc.text())  # no "loads = []" left behind


def test_first_load_in_a_job_without_loads():
    doc = jobdoc.parse('schema = 1\ntitle = "x"\n\n[beam]\nlength = "4 ft"\n')
    doc.add_load("uniform", start="0 ft", end="4 ft", value="-20 lbf/ft")
    doc.add_load("linear", start="0 ft", end="2 ft", value=["0 lbf/ft", "-10 lbf/ft"])
    out = doc.text()
    assert tomllib.loads(out)["loads"][1]["value"] == ["0 lbf/ft", "-10 lbf/ft"]
    assert "\n\n[[loads]]\n" in out and "\n\n\n" not in out.rstrip("\n")


def test_inline_section_and_back():
    doc = jobdoc.parse(jobdoc.new_job_text("Arm"))
    doc.set_section({"shape": "custom", "area": "3.37 in^2", "ix": "7.80 in^4",
                     "sx": "3.90 in^3"})
    data = tomllib.loads(doc.text())
    assert data["beam"]["section"] == {"shape": "custom", "area": "3.37 in^2",
                                       "ix": "7.80 in^4", "sx": "3.90 in^3"}
    assert "[beam.section]" in doc.text()
    doc.set_section("W8x18")
    doc.set_material({"e": "29000 ksi", "fy": "36 ksi", "density": "490 lb/ft^3"})
    data = tomllib.loads(doc.text())
    assert data["beam"]["section"] == "W8x18" and data["beam"]["material"]["fy"] == "36 ksi"
    assert data["beam"]["length"] == "8 ft"


def test_bare_numbers_and_bad_indices_are_refused():
    doc = jobdoc.parse(jobdoc.new_job_text("Arm"))
    with pytest.raises(InputError, match="needs its unit") as info:
        doc.set_load(0, value=-300)
    assert info.value.problem.key == "loads[0].value"
    with pytest.raises(InputError, match="needs its unit"):
        doc.add_load("point", at=4, value="-1 lbf")
    with pytest.raises(InputError, match="indices 0 to 0"):
        doc.set_load(3, value="-1 lbf")
    with pytest.raises(InputError, match="has no supports"):
        jobdoc.parse('title = "x"\n').set_support(0, at="1 ft")


def test_not_toml_is_one_clear_error():
    with pytest.raises(InputError) as info:
        jobdoc.parse('title = "x\n', "bad.toml")
    assert "not valid TOML" in str(info.value) and info.value.problem.line == 1


def test_save_refuses_when_someone_else_changed_the_file(tmp_path):
    path = tmp_path / "arm.toml"
    path.write_text(jobdoc.new_job_text("Arm"), encoding="utf-8")
    doc = jobdoc.load(path)
    other = jobdoc.load(path)
    other.set_title("Arm, edited by the other fitter")
    other.save()
    doc.set_load(0, value="-70 lbf/ft")
    with pytest.raises(storage.SaveConflict) as info:
        doc.save()
    assert '+title = "Arm, edited by the other fitter"' in info.value.diff
    assert "edited by the other fitter" in path.read_text(encoding="utf-8")
    # save as a new name instead: allowed, and the new file becomes the document's file
    doc.save(tmp_path / "arm-mine.toml")
    assert doc.path == tmp_path / "arm-mine.toml"
    assert '"-70 lbf/ft"' in (tmp_path / "arm-mine.toml").read_text(encoding="utf-8")
    # saving to another existing file is a new file there: refused unless overwrite
    with pytest.raises(storage.NameTaken):
        doc.save(path)


def test_writers_always_write_schema_1(tmp_path):
    doc = jobdoc.parse('# a note\n\ntitle = "no schema yet"\n')
    doc.save(tmp_path / "x.toml")
    text = (tmp_path / "x.toml").read_text(encoding="utf-8")
    assert tomllib.loads(text)["schema"] == 1
    assert text.startswith("# a note\n")


# ------------------------------------------------------------------ the template

def test_template_is_valid_commented_and_states_the_signs():
    text = jobdoc.new_job_text('Rack arm "B" \\ bay 3', tags=["rack", "lifting"])
    data = tomllib.loads(text)
    assert data["schema"] == 1
    assert data["title"] == 'Rack arm "B" \\ bay 3'
    assert data["tags"] == ["rack", "lifting"]
    header = text.split("\nschema")[0].lower()
    assert header.count("\n") >= 4 and all(ln.startswith("#") for ln in header.splitlines())
    for words in ("+ up", "negative", "counterclockwise", "unit"):
        assert words in header, words
    # every dimensional value is a string with its unit, gravity loads negative
    beam, load = data["beam"], data["loads"][0]
    assert beam["length"] == "8 ft" and load["value"].startswith("-")
    for table in data["supports"] + data["loads"]:
        for key in ("at", "start", "end", "value"):
            if key in table:
                assert isinstance(table[key], str) and any(c.isalpha() for c in table[key])


def test_template_reads_with_the_job_reader():
    from shopbeam.jobs.jobfile import parse_job_text

    job = parse_job_text(jobdoc.new_job_text("Template", length="10 ft"), "new.toml")
    assert job.length == pytest.approx(3.048)  # 10 ft, exact by definition
    assert [s.kind for s in job.supports] == ["pin", "roller"]
    assert job.loads[0].w1 == pytest.approx(-50 * 4.4482216152605 / 0.3048)
    assert not job.warnings


def test_saving_a_bundled_preset_saves_a_copy_to_user(tmp_path, monkeypatch):
    monkeypatch.setenv("SHOPBEAM_USER_DIR", str(tmp_path / "user"))
    src = PRESETS[0]
    before = src.read_bytes()
    doc = jobdoc.load(src)
    doc.set_title("my copy")
    saved = doc.save()
    assert src.read_bytes() == before
    assert saved == (tmp_path / "user" / src.name).resolve()
    assert tomllib.loads(saved.read_text(encoding="utf-8"))["title"] == "my copy"
    doc.set_title("my copy, again")
    doc.save()  # now it is the user's own file: a normal save
    assert "again" in saved.read_text(encoding="utf-8") and src.read_bytes() == before


def test_notes_with_line_breaks_are_saved_as_a_multi_line_string(tmp_path):
    text = next(p for p in PRESETS if p.stem == "demo").read_text(encoding="utf-8")
    line = next(ln for ln in text.splitlines() if ln.startswith("notes = "))
    text = text.replace(line, 'notes = """\nLine one.\nLine two\twith a tab, "quoted".\n\nLast."""')
    doc = jobdoc.JobDoc.parse(text)
    value = doc.get("notes") + " added"
    doc.set_notes(value)
    out = doc.text()
    assert tomllib.loads(out)["notes"] == value  # the value exactly
    assert 'notes = """' in out and "\\n" not in out.split('notes = """')[1].split('"""')[0]
    assert out.count("\n") == text.count("\n") - 1  # one line fewer: the leading break only


def test_removing_the_last_load_leaves_no_empty_list_at_the_top():
    # "loads = []" went to line 1, above the header comments; a [[loads]] table then added by
    # hand below made the file invalid TOML
    text = ('# header comment\nschema = 1\ntitle = "odd job"\n\n[beam]\nlength = "10 ft"\n\n'
            '[[supports]]\nat = "0 ft"\ntype = "pin"\n\n[[supports]]\nat = "10 ft"\n'
            'type = "roller"\n\n# the one load\n[[loads]]\ntype = "point"\nat = "5 ft"\n'
            'value = "-300 lbf"\n')
    doc = jobdoc.parse(text)
    doc.remove_load(0)
    out = doc.text()
    assert out.startswith("# header comment\n") and "loads" not in out
    again = out + '\n[[loads]]\ntype = "point"\nat = "4 ft"\nvalue = "-100 lbf"\n'
    assert tomllib.loads(again)["loads"][0]["at"] == "4 ft"
    doc.add_load("point", at="3 ft", value="-50 lbf")
    assert tomllib.loads(doc.text())["loads"] == [{"type": "point", "at": "3 ft",
                                                   "value": "-50 lbf"}]
