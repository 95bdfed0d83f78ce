"""The bundled presets: written per the contract, commented, covering the shop's common jobs,
and each one solving cleanly with its statics matching a hand calculation.

The presets are invented demo data (an invented shop); the figures they are checked against
below are worked by hand from each file's own comments (statics, said so beside each), with
the closed forms named where one is used.
"""

from __future__ import annotations

import json
import re
import tomllib
from pathlib import Path

import pytest

from shopbeam import units

PRESET_DIR = Path(__file__).resolve().parent.parent / "presets"
PRESETS = sorted(PRESET_DIR.glob("*.toml"))
NAMES = {p.stem for p in PRESETS}

LBF, FT = 4.4482216152605, 0.3048

# The jobs the shop keeps presets for, each with the preset that covers it.
REQUIRED = {
    "pallet-rack beam pair": "pallet-rack-beam-pair",
    "cantilever rack arm for bar stock": "bar-stock-rack-arm",
    "lumber rack arm": "lumber-rack-arm",
    "wall shelf on brackets": "wall-shelf-brackets",
    "workbench top": "workbench-top",
    "mezzanine joist": "mezzanine-joist",
    "overhead storage platform beam": "storage-platform-beam",
    "monorail hoist beam": "monorail-hoist-beam",
    "jib arm": "jib-arm",
    "sign or awning bracket": "sign-bracket",
    "trailer cross member": "trailer-cross-member",
    "continuous shelf over three supports": "continuous-shelf",
}

DIMENSIONAL_KEYS = {"at", "start", "end", "value", "length", "width", "stiffness", "total",
                    "loads", "dead", "spacing", "travel"}


def _data(path: Path) -> dict:
    with open(path, "rb") as f:
        return tomllib.load(f)


def test_at_least_twelve_presets_cover_the_common_jobs():
    assert len(PRESETS) >= 13  # twelve jobs plus the demo
    for job, name in REQUIRED.items():
        assert name in NAMES, f"no preset for {job}"
    assert "demo" in NAMES


@pytest.mark.parametrize("path", PRESETS, ids=lambda p: p.stem)
def test_preset_is_written_per_the_contract(path):
    text = path.read_text(encoding="utf-8")
    data = _data(path)
    assert data["schema"] == 1
    assert isinstance(data["title"], str) and data["title"].strip()
    assert data.get("units", "us") in ("us", "si")
    assert data["tags"] and all(isinstance(t, str) for t in data["tags"])
    # a short comment says what the member is and where the loads come from, in the
    # invented shop (never a real company)
    head = text.split("\nschema = 1")[0].splitlines()
    assert len(head) >= 3 and all(ln.startswith("#") for ln in head)
    assert "Quillhaven Metal & Timber Works" in head[0]
    # every dimensional value is a string that carries its unit
    length = units.parse(data["beam"]["length"], "length", "beam.length")
    for table in [data["beam"]] + data["supports"] + data.get("loads", []) + data.get("moving", []):
        for key, value in table.items():
            if key not in DIMENSIONAL_KEYS:
                continue
            for v in value if isinstance(value, list) else [value]:
                assert isinstance(v, str) and re.search(r"[A-Za-z'\"]", v), (key, v)
    for s in data["supports"]:
        assert 0 <= units.parse(s["at"], "length", "at") <= length
    for ld in data.get("loads", []):
        kind = ld["type"]
        values = ld["value"] if isinstance(ld["value"], list) else [ld["value"]]
        if kind != "moment":  # gravity loads are negative (forces + up)
            assert all(v.strip().startswith(("-", "0")) for v in values), ld
            assert any(v.strip().startswith("-") for v in values), ld
        for key in ("at", "start", "end"):
            if key in ld:
                assert 0 <= units.parse(ld[key], "length", key) <= length + 1e-12


def test_lifting_devices_are_tagged_lifting():
    for name in ("monorail-hoist-beam", "monorail-trolley", "jib-arm"):
        assert "lifting" in _data(PRESET_DIR / f"{name}.toml")["tags"]
    others = [p for p in PRESETS if p.stem not in ("monorail-hoist-beam", "monorail-trolley", "jib-arm")]
    assert all("lifting" not in _data(p)["tags"] for p in others)


# ------------------------------------------------------------------ solving


def _solver():
    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import load_job

    return load_job, analyze


# name: (entered loads per member in lbf, hand-summed from the file's comments;
#        section area in in^2, column A of the AISC Shapes Database v15.0): the self-weight
#        is area x density (the job file's rule), steel 490 lb/ft^3 (AISC Manual)
HAND_TOTALS = {
    "pallet-rack-beam-pair": (2 * 600 * 40 / 12 / 2, 1.89),      # two pallets, half each
    "bar-stock-rack-arm": (706 * 34 / 12, 1.89),
    "lumber-rack-arm": (480 * 22 / 12, 1.54),
    "wall-shelf-brackets": (75 * 2 * 6 / 2, 0.722),             # 75 psf x 24 in x 6 ft / 2
    "workbench-top": (12.8 * 6 + 40 * 6 + 450, 1.19),
    "mezzanine-joist": ((125 + 12) * 2 * 12, 2.39),             # psf x 24 in x 12 ft
    "storage-platform-beam": ((750 + 90) * 14, 5.26),
    "monorail-hoist-beam": (2000 + 120, 5.40),
    # moving trolley: the state shown is the governing one, the axles (rated load and
    # trolley weight) with 25% impact (powered monorail, ASCE 7-16 4.9.2 and 4.9.3)
    "monorail-trolley": (2 * (1000 + 60) * 1.25, 7.45),
    "jib-arm": (1000 + 80, 4.43),
    "sign-bracket": (75 + 75 + 15, 1.19),
    "awning-bracket": (18 * 4 + 180 * 4 + 120 * 3 / 2 + 40, 1.54),
    "trailer-cross-member": ((84 + 6) * 80 / 12 + 750, 1.20),
    "continuous-shelf": (100 * 1.5 * 10 / 2, 0.608),           # 100 psf x 18 in x 10 ft / 2
    "demo": (90 * 15 + 300 * 12 + 200 * 6 / 2 + 1200, 5.26),
}
STEEL = 490 / 144  # lb/ft per in^2 of steel (490 lb/ft^3, AISC Manual)


@pytest.mark.parametrize("path", PRESETS, ids=lambda p: p.stem)
def test_preset_solves_cleanly_and_matches_hand_statics(path):
    load_job, analyze = _solver()
    job = load_job(path)
    assert not job.warnings, [w.located() for w in job.warnings]
    result = analyze(job)
    bad = [(d.name, d.detail) for d in result.solution.diagnostics if not d.ok]
    assert not bad, bad
    # each preset is a member that passes, and not absurdly oversized
    assert result.ok, [(c.name, c.ratio) for c in result.checks]
    assert 0.2 < result.governing.ratio <= 1.0
    # total support force = the loads worked by hand from the comments + self-weight
    # (statics, by hand; self-weight = area x 490 lb/ft^3 x length)
    entered, area = HAND_TOTALS[path.stem]
    total = entered + area * STEEL * job.length / FT
    got = sum(r.force for r in result.solution.reactions) / LBF
    assert got == pytest.approx(total, rel=3e-3)


def _analyzed(name):
    load_job, analyze = _solver()
    return analyze(load_job(PRESET_DIR / f"{name}.toml"))


def _w(name):
    """Self-weight of the preset's section, lbf/ft: area (AISC Shapes Database v15.0, column
    A) x 490 lb/ft^3."""
    return HAND_TOTALS[name][1] * STEEL


def test_monorail_midspan_moment_by_hand():
    # AISC Manual Table 3-23, cases 1 and 7: M = wL^2/8 + PL/4 at mid-span
    r = _analyzed("monorail-hoist-beam")
    m = r.solution.extremes()["moment"]
    hand = _w("monorail-hoist-beam") * 16**2 / 8 + 2120 * 16 / 4
    assert m.max / (LBF * FT) == pytest.approx(hand, rel=2e-3)
    assert m.max_at == pytest.approx(8 * FT)


def test_cantilever_presets_fixed_end_moment_by_hand():
    # statics by hand: the wall or post resists every load's moment about the support
    hands = {
        "jib-arm": 1080 * 9.5 + _w("jib-arm") * 10**2 / 2,
        "sign-bracket": 75 * 1.5 + 75 * 4.5 + 15 * 5 + _w("sign-bracket") * 5**2 / 2,
        # panels and snow at 2 ft, drift triangle's centroid 1 ft out, fascia at the tip,
        # and the fascia's clockwise couple of 20 lbf*ft
        "awning-bracket": (18 + 180) * 4 * 2 + 180 * 1 + 40 * 4 + 20
        + _w("awning-bracket") * 4**2 / 2,
        "bar-stock-rack-arm": 706 * (34 / 12) ** 2 / 2 + _w("bar-stock-rack-arm") * 3**2 / 2,
    }
    for name, hand in hands.items():
        (reaction,) = _analyzed(name).solution.reactions
        assert reaction.kind == "fixed"
        # + counterclockwise: the support turns the beam back up against gravity
        assert reaction.moment / (LBF * FT) == pytest.approx(hand, rel=2e-3), name


def test_continuous_shelf_middle_bracket_takes_five_eighths():
    # AISC Manual Table 3-23, case 29 (two equal spans, uniform load): R = 3/8, 10/8, 3/8 wl
    r = _analyzed("continuous-shelf")
    forces = [x.force for x in r.solution.reactions]
    total = sum(forces)
    assert [f / total for f in forces] == pytest.approx([3 / 16, 10 / 16, 3 / 16], rel=1e-6)
    m = r.solution.extremes()["moment"]
    assert m.min_at == pytest.approx(5 * FT)  # hogging over the middle bracket


def test_symmetric_presets_share_the_load_evenly():
    for name in ("pallet-rack-beam-pair", "wall-shelf-brackets", "mezzanine-joist"):
        a, b = (x.force for x in _analyzed(name).solution.reactions)
        assert a == pytest.approx(b, rel=1e-9), name


def test_demo_post_reaction_by_hand():
    # statics by hand, moments about the wall pocket (x = 0):
    # deck 1350 lb at 7.5 ft, stock 3600 lb at 6 ft, offcuts 600 lb at 2 + 2/3 x 6 = 6 ft,
    # stair 1200 lb at 15 ft, self-weight 15 w at 7.5 ft; the post is at 12 ft
    r = _analyzed("demo")
    post = r.solution.reactions[1]
    hand = (1350 * 7.5 + 3600 * 6 + 600 * 6 + 1200 * 15 + _w("demo") * 15 * 7.5) / 12
    assert post.at == pytest.approx(12 * FT)
    assert post.force / LBF == pytest.approx(hand, rel=2e-3)


def test_every_preset_through_the_cli_json(capsys):
    _solver()
    from shopbeam.cli import main

    for path in PRESETS:
        rc = main(["solve", str(path), "--json"])
        out, err = capsys.readouterr()
        assert rc == 0, (path.name, err)
        data = json.loads(out)
        assert data["schema"] == 1 and data["title"] == _data(path)["title"]
        assert all(d["ok"] for d in data["diagnostics"]), path.name
        assert data["cautions"]
        if "lifting" in _data(path)["tags"]:
            assert any("LIFTING" in c for c in data["cautions"]), path.name
