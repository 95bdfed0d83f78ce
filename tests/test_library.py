"""The preset library: three places in order, shown with their origin; copies and saves that
never overwrite silently and never write the bundled presets; the library and new commands."""

from __future__ import annotations

import argparse
import os
import subprocess
import sys
import tomllib
from pathlib import Path

import pytest

from shopbeam.cli import cmd_check, resolve_job_arg
from shopbeam.cli import library as cli_library
from shopbeam.jobs import library, storage
from shopbeam.errors import InputError

BUNDLED = Path(__file__).resolve().parent.parent / "presets"


@pytest.fixture
def places(tmp_path, monkeypatch):
    """A shop folder and a user folder in tmp; the environment points at them."""
    shop, user = tmp_path / "shop", tmp_path / "user"
    shop.mkdir()
    monkeypatch.setenv(library.ENV_USER, str(user))
    monkeypatch.delenv(library.ENV_SHOP, raising=False)
    return shop, user


def _job(title: str, tags=("shelf",)) -> str:
    tag_text = ", ".join(f'"{t}"' for t in tags)
    return f'schema = 1\ntitle = "{title}"\ntags = [{tag_text}]\n'


def test_places_in_order_with_origin(places, monkeypatch):
    shop, user = places
    assert [p.origin for p in library.places()] == ["user", "bundled"]
    got = library.places(shop)
    assert [(p.origin, p.folder, p.writable) for p in got] == [
        ("shop", shop, True), ("user", user, True), ("bundled", BUNDLED, False)]
    monkeypatch.setenv(library.ENV_SHOP, str(shop))
    assert library.places()[0] == library.Place("shop", shop, True)


def test_user_dir_defaults_to_platform_data_dir(monkeypatch):
    import platformdirs

    monkeypatch.delenv(library.ENV_USER, raising=False)
    assert library.user_dir() == Path(platformdirs.user_data_dir("shopbeam")) / "jobs"


def test_bundled_presets_are_listed_with_titles_and_tags(places):
    got = library.entries()
    names = {e.name for e in got}
    assert len(got) >= 12 and all(e.origin == "bundled" and e.read_only for e in got)
    assert {"demo", "monorail-hoist-beam", "jib-arm"} <= names
    assert all(e.title and not e.problem for e in got)
    jib = library.find("jib-arm")
    assert "lifting" in jib.tags and jib.path == BUNDLED / "jib-arm.toml"


def test_shop_first_then_user_then_bundled(places):
    shop, user = places
    user.mkdir()
    (shop / "jib-arm.toml").write_text(_job("shop's jib"), encoding="utf-8")
    (user / "jib-arm.toml").write_text(_job("my jib"), encoding="utf-8")
    assert library.find("jib-arm", shop).title == "shop's jib"
    assert library.find("jib-arm").title == "my jib"  # no shop library given
    assert library.find("user:jib-arm", shop).title == "my jib"
    assert library.find("bundled:jib-arm", shop).origin == "bundled"
    same = [e for e in library.entries(shop) if e.name == "jib-arm"]
    assert [(e.origin, e.shadowed_by) for e in same] == [
        ("shop", ""), ("user", "shop"), ("bundled", "shop")]


def test_search_and_tag_filters(places):
    shop, _ = places
    (shop / "bay-9.toml").write_text(_job("Bay 9 rack beam", ("rack", "bay9")) +
                                     'notes = "painted orange"\n', encoding="utf-8")
    assert [e.name for e in library.entries(shop, tag="BAY9")] == ["bay-9"]
    assert [e.name for e in library.entries(shop, search="orange")] == ["bay-9"]
    lifting = {e.name for e in library.entries(shop, tag="lifting")}
    assert lifting == {"jib-arm", "monorail-hoist-beam", "monorail-trolley"}
    assert {e.name for e in library.entries(shop, search="snow drift")} == {"awning-bracket"}
    assert library.entries(shop, search="no such words anywhere") == []


def test_broken_files_are_listed_with_their_problem_and_temps_are_skipped(places):
    shop, _ = places
    (shop / "broken.toml").write_text('title = "unterminated\n', encoding="utf-8")
    (shop / ".arm.toml.x1.saving").write_text("half a file", encoding="utf-8")
    (shop / "notes.txt").write_text("not a job", encoding="utf-8")
    mine = [e for e in library.entries(shop) if e.origin == "shop"]
    assert [e.name for e in mine] == ["broken"]
    assert mine[0].problem and mine[0].title == "(not valid TOML)"


def test_a_deeply_nested_or_huge_file_is_a_problem_row_not_a_crash(places):
    # one bad file in a shared folder must not take the listing down for everyone: nesting
    # past the reader's limit and a file past 1 MB are each a row with their problem
    shop, _ = places
    (shop / "deep.toml").write_text(_job("deep") + "x = " + "[" * 5000 + "]" * 5000 + "\n")
    (shop / "huge.toml").write_text(_job("huge") + "pad = [" + "1, " * 400_000 + "1]\n")
    (shop / "fine.toml").write_text(_job("fine"))
    mine = {e.name: e for e in library.entries(shop) if e.origin == "shop"}
    assert mine["deep"].problem and "nested" in mine["deep"].problem
    assert mine["huge"].problem and "larger than a job file" in mine["huge"].problem
    assert not mine["fine"].problem and mine["fine"].title == "fine"
    run = subprocess.run([sys.executable, "-m", "shopbeam", "library", "list", "--library",
                          str(shop)], capture_output=True, text=True, timeout=60)
    assert run.returncode == 0 and "deep" in run.stdout and "Traceback" not in run.stderr


def test_find_suggests_near_names(places):
    with pytest.raises(InputError) as info:
        library.find("jib-ram")
    assert "did you mean 'jib-arm'" in str(info.value)
    with pytest.raises(InputError, match="'pallet-rack-beam-pair'"):
        library.find("pallet")
    with pytest.raises(InputError, match="library list"):
        library.find("zzzzzz")
    with pytest.raises(InputError, match=r"'\.\.'"):
        library.find("../../etc/passwd")


def test_copy_to_user_and_shop(places):
    shop, user = places
    path = library.copy("jib-arm")
    assert path == (user / "jib-arm.toml").resolve()
    assert path.read_text(encoding="utf-8") == (BUNDLED / "jib-arm.toml").read_text(
        encoding="utf-8")  # exact text, comments and all
    with pytest.raises(InputError, match="already in the user library"):
        library.copy("jib-arm")  # finds the user's own copy first
    with pytest.raises(storage.NameTaken):
        library.copy("bundled:jib-arm")  # the name is taken in user: never silently replaced
    library.copy("bundled:jib-arm", overwrite=True)
    p2 = library.copy("jib-arm", to="shop", library_dir=shop, new_name="jib-bay2")
    assert p2 == (shop / "jib-bay2.toml").resolve()
    with pytest.raises(InputError, match="no shop library is set"):
        library.copy("jib-arm", to="shop")
    with pytest.raises(InputError, match="separator"):
        library.copy("jib-arm", new_name="sub/jib")


def test_save_on_a_bundled_preset_saves_a_copy_to_user(places):
    _, user = places
    src = BUNDLED / "sign-bracket.toml"
    before = src.read_bytes()
    opened = library.save_job(src.read_text(encoding="utf-8").replace("-75 lbf", "-90 lbf"),
                              path=src)
    assert src.read_bytes() == before  # bundled presets are never written
    assert opened.path == (user / "sign-bracket.toml").resolve()
    assert opened.text.count("-90 lbf") == 2
    with pytest.raises(storage.NameTaken):
        library.save_job("x", path=src)  # a second "save copy" would replace the first


def test_save_job_by_name_and_conflicts(places):
    shop, _ = places
    first = library.save_job(_job("bay 2"), name="bay-2", to="shop", library_dir=shop)
    with pytest.raises(storage.NameTaken):
        library.save_job(_job("other bay 2"), name="bay-2", to="shop", library_dir=shop)
    # someone else edits it on the server, then we save over our opened copy
    storage.atomic_write(first.path, _job("bay 2, edited"))
    with pytest.raises(storage.SaveConflict) as info:
        library.save_job(_job("bay 2, mine"), path=first.path, base=first)
    assert '+title = "bay 2, edited"' in info.value.diff
    library.save_job(_job("bay 2, mine"), path=first.path, base=first, overwrite=True)
    assert tomllib.loads(first.path.read_text(encoding="utf-8"))["title"] == "bay 2, mine"
    with pytest.raises(InputError, match="absolute path"):
        library.save_job("x", name="/etc/cron.d/x")


# ------------------------------------------------------------------ command line

def _parser():
    p = argparse.ArgumentParser(prog="shopbeam")
    sub = p.add_subparsers(dest="command")
    cli_library.add_parsers(sub)
    chk = sub.add_parser("check")  # as the real parser registers it
    chk.add_argument("job")
    chk.set_defaults(func=cmd_check)
    return p


def _run(argv, capsys):
    args = _parser().parse_args(argv)
    rc = args.func(args)
    out, err = capsys.readouterr()
    return rc, out, err


def test_cli_library_list_show_copy(places, capsys):
    shop, user = places
    rc, out, err = _run(["library", "list", "--library", str(shop)], capsys)
    assert rc == 0 and not err
    assert "NAME" in out and "ORIGIN" in out and "bundled" in out and "jib-arm" in out
    assert out.splitlines()[0].startswith("shop") and str(shop) in out
    assert "Screening check only" in out
    rc, out, _ = _run(["library", "list", "--tag", "lifting"], capsys)
    assert rc == 0 and "LIFTING DEVICE" in out and "pallet-rack" not in out
    rc, out, _ = _run(["library", "show", "demo"], capsys)
    assert rc == 0 and out.startswith("# bundled:demo") and "[[loads]]" in out
    rc, out, _ = _run(["library", "copy", "demo", "--as", "loft"], capsys)
    assert rc == 0 and (user / "loft.toml").exists()
    rc, out, err = _run(["library", "copy", "demo", "--as", "loft"], capsys)
    assert rc == 2 and "already exists" in err and "--overwrite" in err and not out
    rc, out, err = _run(["library", "show", "lofty"], capsys)
    assert rc == 2 and "did you mean 'loft'" in err
    rc, _, err = _run(["library", "copy", "demo", "--to", "shop"], capsys)
    assert rc == 2 and "SHOPBEAM_LIBRARY" in err
    rc, _, err = _run(["library"], capsys)
    assert rc == 2 and "list" in err


def test_cli_new_writes_a_template_and_never_overwrites(places, capsys, tmp_path):
    shop, user = places
    rc, out, err = _run(["new", "bay3-arm", "--title", "Bay 3 arm", "--tags", "rack,arm"], capsys)
    assert rc == 0, err
    data = tomllib.loads((user / "bay3-arm.toml").read_text(encoding="utf-8"))
    assert data["schema"] == 1 and data["title"] == "Bay 3 arm" and data["tags"] == ["rack", "arm"]
    rc, _, err = _run(["new", "bay3-arm"], capsys)
    assert rc == 2 and "already exists" in err
    assert tomllib.loads((user / "bay3-arm.toml").read_text(encoding="utf-8"))["title"] == \
        "Bay 3 arm"
    rc, _, _ = _run(["new", "shared", "--to", "shop", "--library", str(shop)], capsys)
    assert rc == 0 and (shop / "shared.toml").exists()
    target = tmp_path / "elsewhere.toml"
    rc, _, _ = _run(["new", "x", "--to", str(target)], capsys)
    assert rc == 0 and target.exists()
    for bad in ("../escape", "/etc/x"):
        rc, _, err = _run(["new", bad], capsys)
        assert rc == 2 and "use letters, digits" in err
    # a name with spaces is made safe, not refused, and the output says what was written
    rc, out, err = _run(["new", "bay 4 arm"], capsys)
    assert rc == 0, err
    assert (user / "bay-4-arm.toml").exists() and str(user / "bay-4-arm.toml") in out
    assert "bay-4-arm" in out and "made safe" in out
    assert tomllib.loads((user / "bay-4-arm.toml").read_text())["title"] == "Bay 4 arm"
    assert not (tmp_path / "escape.toml").exists()
    rc, _, err = _run(["new", "x", "--to", "somewhere"], capsys)
    assert rc == 2 and "ending in .toml" in err


def test_cli_check_reports_every_problem_with_line(places, capsys, tmp_path):
    bad = tmp_path / "bad.toml"
    bad.write_text('schema = 1\ntitle = "bad"\n\n[beam]\nlength = "8"\nsection = "HSS4x4x1/4"\n'
                   'material = "A500-C"\n\n[[supports]]\nat = "0 ft"\ntype = "fixed"\n\n'
                   '[[loads]]\ntype = "point"\nat = "20 ft"\nvalue = "-300 lbf"\nlabl = "x"\n',
                   encoding="utf-8")
    # `shopbeam check` (one handler: cli.cmd_check; the library's copy could never run)
    args = argparse.Namespace(job=str(bad))
    rc = cmd_check(args)
    out, err = capsys.readouterr()
    assert rc == 2 and not out
    assert "beam.length" in err and ":5" in err  # bare number, with its line
    assert "label" in err  # the typo's nearest known key
    good = tmp_path / "good.toml"
    good.write_text((BUNDLED / "jib-arm.toml").read_text(encoding="utf-8"), encoding="utf-8")
    rc = cmd_check(argparse.Namespace(job=str(good)))
    out, err = capsys.readouterr()
    assert rc == 0 and ": input OK (" in out and "not checked here" in out
    assert "licensed engineer" in out and "LIFTING DEVICE" in out  # the jib's caution
    args = argparse.Namespace(job="jib-arm")  # a library name works too
    resolve_job_arg(args)
    assert rc == 0 and cmd_check(args) == 0


def test_real_cli_library_commands(places, tmp_path):
    """Through the installed entry point: exit codes and no traceback."""
    env_run = dict(capture_output=True, text=True, timeout=60)
    ok = subprocess.run([sys.executable, "-m", "shopbeam", "library", "list", "--tag", "rack"],
                        **env_run)
    assert ok.returncode == 0 and "pallet-rack-beam-pair" in ok.stdout, ok.stderr
    bad = subprocess.run([sys.executable, "-m", "shopbeam", "library", "show", "../../etc/passwd"],
                         **env_run)
    assert bad.returncode == 2 and "Traceback" not in bad.stderr and "'..'" in bad.stderr


# ------------------------------------------------------------------ one way to name a job
def test_resolve_job_takes_paths_labels_and_bare_names(places, tmp_path, monkeypatch):
    shop, user = places
    user.mkdir()
    (user / "bay-4-arm.toml").write_text(_job("user arm"), encoding="utf-8")
    (shop / "bay-4-arm.toml").write_text(_job("shop arm"), encoding="utf-8")
    lib = str(shop)
    # the library order: shop first, then user, then bundled
    assert library.resolve_job("bay-4-arm", lib) == shop / "bay-4-arm.toml"
    assert library.resolve_job("user:bay-4-arm", lib) == user / "bay-4-arm.toml"
    assert library.resolve_job("bay 4 arm", lib) == shop / "bay-4-arm.toml"
    assert library.resolve_job("bundled:demo", lib).name == "demo.toml"
    assert library.resolve_job("demo", lib).name == "demo.toml"
    f = tmp_path / "mine.toml"
    f.write_text("x", encoding="utf-8")
    assert library.resolve_job(str(f), lib) == f


def test_resolve_job_near_misses_say_did_you_mean(places, tmp_path, monkeypatch):
    shop, user = places
    with pytest.raises(InputError, match=r"did you mean 'demo'"):
        library.resolve_job("dem", str(shop))
    with pytest.raises(InputError, match=r"did you mean 'bundled:demo'"):
        library.resolve_job("bundled:demoo", str(shop))
    (tmp_path / "bay3-arm.toml").write_text("x", encoding="utf-8")
    monkeypatch.chdir(tmp_path)
    with pytest.raises(InputError) as e:
        library.resolve_job("bay3-arn.toml", str(shop))
    assert "no such job file" in str(e.value) and "bay3-arm.toml" in str(e.value)
    with pytest.raises(InputError, match="outside the library folder"):
        library.resolve_job("shop:../x", str(shop))


def test_copy_as_a_name_with_spaces_makes_it_safe(places):
    shop, user = places
    target = library.copy("bundled:demo", new_name="loft beam 2")
    assert target.name == "loft-beam-2.toml" and target.parent.name == "user"
    assert library.find("loft beam 2").origin == "user"


def test_new_refuses_a_file_name_with_control_characters(tmp_path):
    # a line break or an escape in a file name garbles every listing it appears in
    here = str(Path(__file__).resolve().parents[1])
    run = subprocess.run([sys.executable, "-m", "shopbeam", "new", "bay\n4\x1b[8m.toml"],
                         capture_output=True, text=True, cwd=tmp_path,
                         env={**os.environ, "PYTHONPATH": here})
    assert run.returncode == 2 and "control characters" in run.stderr
    assert list(tmp_path.iterdir()) == []


def test_special_files_named_like_jobs_are_problem_rows_not_left_out(places):
    # a FIFO or a folder named NAME.toml in the shop folder had been left out of the list
    # without a word, then "no job named ..." with a wrong "did you mean"
    shop, _ = places
    if not hasattr(os, "mkfifo"):
        pytest.skip("no FIFOs here")
    os.mkfifo(shop / "pipe.toml")
    (shop / "folder.toml").mkdir()
    mine = {e.name: e for e in library.entries(shop) if e.origin == "shop"}
    assert "named pipe" in mine["pipe"].problem and "folder" in mine["folder"].problem
