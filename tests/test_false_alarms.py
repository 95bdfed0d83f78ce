"""Correct shop jobs that the word and unit rules must not hold back (a false alarm costs the
shop's trust in every other message), each beside the slip the same rule still catches."""

from __future__ import annotations

import pytest

from shopbeam.design.capacity import capacity
from shopbeam.jobs.jobfile import parse_job_text

HOIST = """schema = 1
title = "{title}"
notes = "{notes}"
units = "{system}"
tags = ["lifting", "monorail"]
[beam]
length = "{length}"
section = "{section}"
material = "{material}"
[[supports]]
at = "0 {u}"
type = "pin"
brace = true
{extra}
[[supports]]
at = "{length}"
type = "roller"
brace = true
{extra}
[[loads]]
type = "point"
at = "{mid}"
value = "{live}"
label = "rated load"
flange = "bottom"
[[loads]]
type = "point"
at = "{mid}"
value = "{dead}"
label = "{dead_label}"
case = "dead"
flange = "bottom"
[criteria]
lifting = "hand-geared-monorail"
"""


def hoist(**kw) -> str:
    us = dict(title="Monorail, W8x18, 16 ft", notes="End stops at both ends.", system="us",
              length="16 ft", section="W8x18", material="A992", u="ft", extra="", mid="8 ft",
              live="-2000 lbf", dead="-50 lbf", dead_label="hoist and trolley")
    return HOIST.format(**{**us, **kw})


def held(text: str, words: str) -> list[str]:
    return [r for r in capacity(parse_job_text(text)).not_rated if words in r]


def test_a_hanger_rod_key_on_a_support_is_not_a_settlement():
    # "hanger_drop": how far the beam hangs below the joists, not a drop of the support
    text = hoist(extra='hanger_drop = "24 in"')
    job = parse_job_text(text)
    assert not held(text, "settlement")
    assert [w for w in job.warnings if "unknown key 'hanger_drop'" in w.message]


def test_a_settlement_key_holds_only_where_a_settlement_adds_moment():
    # two pins, no fixed end: a settlement only tilts the member (statics), so it is warned;
    # a third support (or a fixed end) makes it add moment, and it is held
    two = hoist(extra='settlement = "1/4 in"')
    assert not held(two, "settlement")
    assert [w for w in parse_job_text(two).warnings if "only tilts it" in w.message]
    three = two.replace('[[loads]]', '[[supports]]\nat = "12 ft"\ntype = "roller"\n'
                        'brace = true\n[[loads]]', 1)
    assert held(three, "settlement")


def test_a_kg_hoist_weight_on_a_us_job_is_warned_not_held_and_n_for_lbf_still_is():
    # 24 kg typed for 24 lb reads 2.2 times heavier: a dead load held fixed errs on the safe
    # side (the label names the same 24 kg); N for lbf reads 4.45 times lighter: held
    kg = hoist(dead="-24 kg", dead_label="hoist and trolley (24 kg)")
    assert not held(kg, "metric units")
    said = [w for w in parse_job_text(kg).warnings if "metric units" in w.message]
    assert said and "safe side" in said[0].message and "52.91 lbf" in said[0].message
    assert held(hoist(dead="-200 N"), "metric units")


def test_a_chain_block_in_n_whose_label_gives_its_mass_is_not_held():
    # 9 kg x 9.81 = 88.3 N: "-90 N" beside a 4.905 kN hook load is the block's weight as
    # its label says; the same figure with no mass in the label is held (kg typed as N?)
    si = dict(system="si", length="4 m", section="IPE200", material="S275", u="m",
              mid="2 m", live="-4.905 kN")
    named = hoist(**si, dead="-90 N", dead_label="chain block, 9 kg")
    assert not held(named, "dead load in N")
    assert held(hoist(**si, dead="-90 N", dead_label="chain block"), "dead load in N")
    # a label whose mass does not match the newtons is no help
    assert held(hoist(**si, dead="-90 N", dead_label="chain block, 90 kg"), "dead load in N")


RACKISH = """schema = 1
title = "{title}"
notes = "{notes}"
units = "us"
tags = {tags}
[beam]
length = "7 ft"
section = "C6x8.2"
material = "A36"
restrained = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "7 ft"
type = "roller"
[[loads]]
type = "point"
at = "2 ft"
value = "-450 lbf"
label = "{label}"
case = "dead"
[[loads]]
type = "point"
at = "3 ft 6 in"
value = "-250 lbf"
label = "mechanic standing on it"
"""


@pytest.mark.parametrize("title, notes, tags, label, rack", [
    # an equipment skid named once: its other "skid" words are that skid
    ("Compressor skid side rail", "mechanic standing on the skid", '["skid"]',
     "compressor foot", False),
    ("Compressor skid side rail", "Each skid rail sits on two isolator pads", '["skid"]',
     "compressor foot", False),
    # where the racks are is not what the member is
    ("Lean-to rafter", "Lean-to over the lumber racks", "[]", "roofing", False),
    ("Walkway beam", "runs beside the pallet racks", "[]", "grating", False),
    # a member of a vehicle
    ("Flatbed headache rack crossbar", "", "[]", "rack tube", False),
    # still a rack
    ("Lumber rack arm", "", "[]", "lumber", True),
    ("Storage beam", "pallets two high", "[]", "pallet", True),
    ("Skid rail", "skids of castings stored here", "[]", "skid", True),
])
def test_rack_words_that_name_a_place_a_plant_skid_or_a_vehicle_do_not_hold(
        title, notes, tags, label, rack):
    text = RACKISH.format(title=title, notes=notes, tags=tags, label=label)
    assert bool(held(text, "storage rack")) == rack


def test_a_lifting_job_is_not_held_as_an_untagged_storage_rack():
    text = hoist(title="Die rack monorail, W8x18, 16 ft")
    assert not held(text, "storage rack")


@pytest.mark.parametrize("notes, cut", [
    ("Arm bolted to the column through slotted holes in the column flange.", False),
    ("Bolted through slotted holes in the cap plate.", False),
    ("Slotted holes in the arm for the stop pin.", True),
    ("Coped end at the column.", True),
])
def test_holes_in_what_the_member_is_fixed_to_do_not_make_it_a_cut_member(notes, cut):
    text = RACKISH.format(title="Machine base rail", notes=notes, tags='["not-rack"]',
                          label="machine foot")
    assert bool(held(text, "cut member")) == cut


ROOF = """schema = 1
title = "Rafter over the lean-to, 2x8 SYP"
units = "us"
tags = ["roof"]
[beam]
length = "10 ft"
section = "2x8"
material = "SYP-2"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-20 psf"
width = "24 in"
label = "{label}"
[[loads]]
type = "uniform"
value = "-5 psf"
width = "24 in"
label = "roofing"
case = "dead"
[criteria]
duration = "{duration}"
"""


@pytest.mark.parametrize("label, duration, hold", [
    ("snow", "two-months", False),          # NDS 2018 Table 2.3.2: CD 1.15 is for snow
    ("ground snow drift", "two-months", False),
    ("stored lumber", "two-months", True),  # a posted load left on the member: ten years
    ("snow", "ten-minutes", True),          # CD 1.6 is for wind or earthquake, not snow
    ("wind uplift", "ten-minutes", False),
])
def test_a_duration_over_ten_years_rates_where_every_live_load_is_that_short_load(
        label, duration, hold):
    text = ROOF.format(label=label, duration=duration)
    assert bool(held(text, f'duration = "{duration}"')) == hold


BRACKET = """schema = 1
title = "{title}"
notes = "{notes}"
units = "us"
tags = ["bracket", "cantilever"]
[beam]
length = "20 in"
section = "{section}"
material = "A36"
restrained = true
[[supports]]
at = "0 in"
type = "fixed"
[[loads]]
type = "point"
at = "18 in"
value = "-120 lbf"
label = "{label}"
"""


@pytest.mark.parametrize("notes, lifting", [
    ("Two ladders hung on the hook at the tip.", False),
    ("Hoses stored on a hook at the tip.", False),
    ("Chain hoist hangs here; the load on the hook is 120 lb.", True),
])
def test_a_storage_hook_is_not_a_lifting_device(notes, lifting):
    text = BRACKET.format(title="Ladder storage bracket", notes=notes, section="HSS2x2x1/8",
                          label="ladders").replace('"A36"', '"A500-C"')
    assert bool(held(text, "lifting device")) == lifting


def test_a_bar_said_to_stand_on_edge_but_read_flat_is_told_which_way_it_is_read():
    # "3/8 x 3" is read 3/8 in deep, flat: several times weaker than on edge (S = b h^2 / 6:
    # 0.0703 in^3 against 0.5625 in^3), on the safe side but far from what was meant
    text = BRACKET.format(title="Hose reel bracket", notes="3/8 x 3 flat bar standing on edge.",
                          section="rect-bar 3/8 x 3", label="hose reel")
    said = [w for w in parse_job_text(text).warnings if "read FLAT" in w.message]
    assert said and "3 in deep by 0.375 in wide" in said[0].message
    # written depth first: on edge, nothing to say
    edge = text.replace("rect-bar 3/8 x 3", "rect-bar 3 x 3/8")
    assert not [w for w in parse_job_text(edge).warnings if "read FLAT" in w.message]


TROLLEY = """schema = 1
title = "Press die hoist beam, W8x18, 12 ft, short travel"
notes = "{notes}"
units = "us"
tags = ["lifting", "hoist"]
[beam]
length = "12 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
brace = true
[[supports]]
at = "12 ft"
type = "roller"
brace = true
[[moving]]
label = "push trolley"
loads = ["-1000 lbf", "-1000 lbf"]
dead = ["-50 lbf", "-50 lbf"]
spacing = ["6 in"]
travel = ["57 in", "87 in"]
[criteria]
lifting = "hand-geared-monorail"
"""


@pytest.mark.parametrize("notes, slip", [
    ("Trolley stops bolted at 57 in and 87 in keep the hoist over the die area.", False),
    ("Trolley stops keep the hoist over the die area.", True),  # inches for feet?
])
def test_a_short_travel_in_inches_that_the_words_give_in_inches_is_meant(notes, slip):
    assert bool(held(TROLLEY.format(notes=notes), "feet meant")) == slip


CUSTOM_WOOD = """schema = 1
title = "Drying shed shelf joist, western red cedar 2x6"
notes = "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors."
units = "us"
tags = ["shelf"]
[beam]
length = "6 ft"
section = "2x6"
repetitive = true
braced = true
{material}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "6 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-40 psf"
width = "16 in"
label = "parts"
[criteria]
duration = "ten-years"
"""


def test_typed_in_wood_values_are_the_grade_the_notes_name():
    typed = ('[beam.material]\nkind = "lumber"\ne = "1000000 psi"\nfb = "700 psi"\n'
             'fv = "155 psi"\nfc_perp = "425 psi"\ndensity = "23 lb/ft^3"')
    assert not held(CUSTOM_WOOD.format(material=typed), "grade")
    # a catalogue grade that disagrees with the notes is still held
    assert held(CUSTOM_WOOD.format(material='material = "DF-L-SS"'), "grade")


@pytest.mark.parametrize("notes, hot", [
    ("The heat-treat oven is on the far wall, 40 ft away.", False),
    ("The heat-treat oven is 40 ft away.", False),
    ("Loft over the heat-treat oven, near the door.", True),
    ("Over the oven, 3 ft away.", True),
])
def test_a_distance_from_the_heat_after_a_comma_is_said_of_that_heat(notes, hot):
    text = CUSTOM_WOOD.format(material='material = "DF-L-2"').replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.", notes)
    assert bool(held(text, "temperature")) == hot


CATWALK = """schema = 1
title = "{title}"
notes = "{notes}"
units = "us"
tags = {tags}
[beam]
length = "6 ft"
section = "C4x5.4"
material = "A36"
braced = true
restrained = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "6 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-50 psf"
width = "30 in"
label = "people and tools"
[[loads]]
type = "uniform"
value = "-1 psf"
width = "30 in"
label = "{deck}"
case = "dead"
"""


@pytest.mark.parametrize("deck, warned", [("expanded metal deck", False),
                                          ("bar grating deck", True),  # 3 to 10 psf
                                          ("plywood deck", True),  # 1 psf: a slip for 10?
                                          ("deck", True)])
def test_a_steel_catwalk_deck_lighter_than_plywood_is_real(deck, warned):
    # flattened 3/4 #9 expanded metal weighs about 0.86 psf (maker's tables, from memory)
    text = CATWALK.format(title="Catwalk joist over the paint booth", notes="",
                          tags='["catwalk"]', deck=deck)
    said = [w for w in parse_job_text(text).warnings if "lighter than a 1/2 in plywood" in
            w.message]
    assert bool(said) == warned


def test_a_trailer_deck_is_not_a_building_floor():
    # IBC Table 1604.3's floor limits are for buildings: no L/360 under live load added
    text = CATWALK.format(title="Trailer cross member under the deck boards",
                          notes="Utility trailer, 6 ft wide.", tags='["not-rack"]',
                          deck="deck boards").replace('[[loads]]', '[criteria]\n'
                                                      'impact = "100%"\n[[loads]]', 1)
    job = parse_job_text(text)
    assert not [w for w in job.warnings if "read as a floor" in w.message]
    mezz = parse_job_text(text.replace("Trailer cross member under the deck boards",
                                       "Mezzanine floor joist").replace(
        "Utility trailer, 6 ft wide.", ""))
    assert [w for w in mezz.warnings if "read as a floor" in w.message]


@pytest.mark.parametrize("title, floor", [
    ("Platform trailer cross member under the deck boards", False),  # a flatbed
    ("Platform truck bed cross member under the deck boards", False),
    ("Platform beam over the truck bays, deck boards", True)])  # a building's platform
def test_a_platform_trailer_is_a_vehicle_not_a_building_floor(title, floor):
    from shopbeam.design.analysis import analyze
    text = CATWALK.format(title=title, notes="16 ft deck, cross members 24 in o.c.",
                          tags='["not-rack"]', deck="deck boards").replace(
        '[[loads]]', '[criteria]\nimpact = "100%"\n[[loads]]', 1)
    job = parse_job_text(text)
    assert bool([w for w in job.warnings if "read as a floor" in w.message]) == floor
    # nor is the walking vibration of a floor named as not checked on the vehicle
    assert bool([u for u in analyze(job).unchecked if "vibration" in u.name]) == floor


@pytest.mark.parametrize("material, hold", [("SP-2", False), ("DF-L-2", True), ("HF-2", True)])
def test_treated_southern_pine_is_warned_of_incising_and_the_firs_are_held(material, hold):
    # Southern Pine takes preservative without incising as a rule; Hem-Fir and Douglas
    # Fir-Larch are nearly always incised (NDS 4.3.8's Ci, from memory)
    text = CUSTOM_WOOD.format(material=f'material = "{material}"').replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.",
        "Pressure treated 2x6 shelf, indoors.").replace(", western red cedar 2x6", "")
    assert bool(held(text, "incis")) == hold
    if not hold:
        assert [w for w in parse_job_text(text).warnings if "seldom incised" in w.message]


# ---------------------------------------------------------------- the slips still caught
# (each beside the false alarm above that the same rule now lets through)

def simple(title, notes, beam, loads, tags='["not-lifting"]', criteria="", supports=None):
    sup = supports or ('[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
                       'at = "{L}"\ntype = "roller"\n')
    length = next(ln.split('"')[1] for ln in beam.splitlines() if ln.startswith("length"))
    return (f'schema = 1\ntitle = "{title}"\nnotes = "{notes}"\nunits = "us"\ntags = {tags}\n'
            f'[beam]\n{beam}\n' + sup.format(L=length) + loads
            + (f"[criteria]\n{criteria}\n" if criteria else ""))


WOOD_BEAM = 'length = "10 ft"\nsection = "2x10"\nmaterial = "DF-L-2"\nbraced = true'
UNIFORM = '[[loads]]\ntype = "uniform"\nvalue = "-60 lbf/ft"\nlabel = "{label}"\n'


@pytest.mark.parametrize("label, duration", [
    ("stored snow blower", "two-months"), ("snow tires", "two-months"),
    ("earthquake kit water jugs", "ten-minutes"),
    ("construction adhesive pails", "seven-days")])
def test_goods_named_like_a_short_load_do_not_get_its_duration(label, duration):
    # a snow blower stored on a loft stays there: CD 1.15 would rate it 15 % high
    text = simple("Garage loft beam", "Loft for stored goods.", WOOD_BEAM,
                  UNIFORM.format(label=label), '["shelf"]', f'duration = "{duration}"')
    assert held(text, f'duration = "{duration}"')


@pytest.mark.parametrize("key", ["elevation_drop", "level_drop", "settlement_length",
                                 "sag_height", "hanger_settlement"])
def test_a_settlement_by_any_name_on_a_propped_cantilever_is_held(key):
    # a fixed end and a roller whose footing settled 1/2 in: the drop adds moment at the
    # fixed end (by hand about 48 % here), so a key that reads as a settlement is held
    text = simple("Pipe rack beam welded to a column", "", 'length = "10 ft"\n'
                  'section = "W8x18"\nmaterial = "A992"\nbraced = true',
                  UNIFORM.format(label="pipes"),
                  supports='[[supports]]\nat = "0 ft"\ntype = "fixed"\n[[supports]]\n'
                           f'at = "{{L}}"\ntype = "roller"\n{key} = "0.5 in"\n')
    assert held(text, "settlement")


@pytest.mark.parametrize("title, notes, label", [
    ("Level beam between the two storage racks", "Adds a level across the gap.", "parts"),
    ("Storage beam over the compressor skid", "Holds two skids of filter media above the "
     "compressor skid.", "skids of filter media")])
def test_a_real_rack_beam_named_by_where_it_is_is_still_a_rack(title, notes, label):
    text = simple(title, notes, 'length = "8 ft"\nsection = "HSS4x2x1/4"\n'
                  'material = "A500-C"', UNIFORM.format(label=label), "[]")
    assert held(text, "storage rack")


@pytest.mark.parametrize("notes", ["Rails punched with holes in the angle for the bolts.",
                                   "Slots in the angles for the shelf clips.",
                                   "Holes in the column end of the arm for the bolts."])
def test_holes_in_the_member_itself_still_make_it_cut(notes):
    text = simple("Wall shelf rail", notes, 'length = "6 ft"\nsection = "L2x2x3/16"\n'
                  'material = "A36"\nrestrained = true', UNIFORM.format(label="bins"),
                  '["not-rack"]')
    assert held(text, "cut member")


def test_a_dead_load_in_kpa_holding_a_purlin_down_against_uplift_is_held():
    # 3 kPa typed for 3 psf reads 21 times heavier, and against wind uplift a heavier dead
    # load raises the rating (by hand 188 psf of uplift instead of 128): not the safe side
    text = simple("Shed roof purlin, wind uplift", "", 'length = "12 ft"\n'
                  'section = "HSS6x3x3/16"\nmaterial = "A500-C"\nbraced = true',
                  '[[loads]]\ntype = "uniform"\nvalue = "-3 kPa"\nwidth = "5 ft"\n'
                  'label = "roof panels"\ncase = "dead"\n[[loads]]\ntype = "uniform"\n'
                  'value = "25 psf"\nwidth = "5 ft"\nlabel = "wind uplift"\nuplift = true\n',
                  '["roof"]')
    assert held(text, "metric units")


def test_a_short_travel_whose_inches_the_words_measure_from_the_other_end_is_held():
    # "stops 6 in from the left end and 30 in from the right end" on a 16 ft runway: the
    # travel is 6 in to 14 ft 6 in, not ["6 in", "30 in"]
    text = TROLLEY.format(notes="End stops bolted 6 in from the left end and 30 in from the "
                                "right end.").replace('["57 in", "87 in"]', '["6 in", "30 in"]')
    assert held(text, "feet meant")


def test_typed_in_wood_values_above_the_grade_the_words_name_are_held():
    # "DF-L No.2, stamped" with Select Structural's Fb 1500 psi typed: 39 % high (NDS
    # Supplement Table 4A, from memory: No.2 Fb 900 psi, E 1,600,000 psi)
    typed = ('[beam.material]\nkind = "lumber"\ne = "1900000 psi"\nfb = "1500 psi"\n'
             'fv = "180 psi"\nfc_perp = "625 psi"\ndensity = "34 lb/ft^3"')
    text = CUSTOM_WOOD.format(material=typed).replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.",
        "Stock from the yard: DF-L No.2, stamped.")
    why = held(text, "above those of DF-L-2")
    assert why and "1,500 psi against 900 psi" in why[0]


def test_a_distance_from_something_else_does_not_cancel_the_heat():
    text = CUSTOM_WOOD.format(material='material = "DF-L-2"').replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.",
        "Drying shelf above the curing oven, about 20 ft away from the spray booth.")
    assert held(text, "temperature")


@pytest.mark.parametrize("tags", ['[]', '["not-vehicle"]'])
def test_a_floor_over_the_van_bays_is_still_a_floor(tags):
    text = simple("Mezzanine floor joist over the van bays", "Parts mezzanine above where "
                  "the service vans park.", 'length = "12 ft"\nsection = "C6x8.2"\n'
                  'material = "A36"\nbraced = true\nrestrained = true',
                  '[[loads]]\ntype = "uniform"\nvalue = "-125 psf"\nwidth = "24 in"\n'
                  'label = "storage"\n', tags, 'deflection = "L/240"')
    assert [w for w in parse_job_text(text).warnings if "read as a floor" in w.message]


def test_pt_hem_fir_words_on_a_southern_pine_key_are_held_for_incising():
    text = CUSTOM_WOOD.format(material='material = "SP-2"').replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.",
        "PT Hem-Fir No.2 2x6, under the deck.")
    assert held(text, "incis")


def test_a_joist_spacing_given_as_a_girder_s_width_is_held():
    # the joists at 24 in o.c. bear on this platform beam: its tributary width is half the
    # joists' spans each side (6 ft here), not their spacing (it would post 460 psf for 143)
    text = simple("Overhead storage platform beam, W8x18", "", 'length = "14 ft"\n'
                  'section = "W8x18"\nmaterial = "A992"\nbraces = ["2 ft", "4 ft", "6 ft"]\n'
                  'braces_flange = "top"', '[[loads]]\ntype = "uniform"\nvalue = "-125 psf"\n'
                  'width = "24 in o.c."\nlabel = "storage"\n', '["platform"]')
    assert held(text, "is a spacing")
    joist = text.replace("Overhead storage platform beam", "Platform joist")
    assert not held(joist, "is a spacing")


def test_an_engine_hung_on_the_hook_is_a_lifting_device():
    text = simple("Shop beam, W8x18", "Engine hung on the hook at mid-span while it is pulled "
                  "from the car.", 'length = "12 ft"\nsection = "W8x18"\nmaterial = "A992"',
                  '[[loads]]\ntype = "point"\nat = "6 ft"\nvalue = "-600 lbf"\nlabel = "engine"'
                  '\n', "[]")
    assert held(text, "lifting device")


@pytest.mark.parametrize("dead, hold", [("-88 N", True), ("-196 N", False)])
def test_a_label_with_two_masses_is_compared_with_their_sum(dead, hold):
    # "chain block 9 kg, trolley 11 kg": 20 kg is 196 N; 88 N is the block alone
    si = dict(system="si", length="4 m", section="IPE200", material="S275", u="m",
              mid="2 m", live="-4.905 kN")
    text = hoist(**si, dead=dead, dead_label="chain block 9 kg, trolley 11 kg")
    assert bool(held(text, "dead load in N")) == hold


@pytest.mark.parametrize("dead, label, hold", [
    ("-88 N", "two chain blocks, 9 kg each", True),  # one block's weight for two
    ("-177 N", "two chain blocks, 9 kg each", False),  # 2 x 9 kg x 9.81 = 176.5 N
    ("-177 N", "2 blocks, 9 kg apiece", False),
    ("-88 N", "chain blocks, 9 kg each", True)])  # how many is not said: the total unknown
def test_a_mass_given_each_is_taken_times_the_count(dead, label, hold):
    si = dict(system="si", length="4 m", section="IPE200", material="S275", u="m",
              mid="2 m", live="-4.905 kN")
    assert bool(held(hoist(**si, dead=dead, dead_label=label), "dead load in N")) == hold


@pytest.mark.parametrize("label, duration", [("snow-melt salt", "two-months"),
                                             ("construction: drywall mud pails",
                                              "seven-days")])
def test_goods_whose_label_starts_with_a_load_word_do_not_get_its_duration(label, duration):
    text = simple("Garage shelf beam", "Stored goods.", WOOD_BEAM,
                  UNIFORM.format(label=label), '["shelf"]', f'duration = "{duration}"')
    assert held(text, f'duration = "{duration}"')


def test_a_hanger_key_that_says_the_end_dropped_is_a_settlement():
    text = simple("Pipe rack beam welded to a column", "", 'length = "10 ft"\n'
                  'section = "W8x18"\nmaterial = "A992"\nbraced = true',
                  UNIFORM.format(label="pipes"),
                  supports='[[supports]]\nat = "0 ft"\ntype = "fixed"\n[[supports]]\n'
                           'at = "{L}"\ntype = "roller"\nhanger_rod_drop = "0.5 in"\n')
    assert held(text, "settlement")


@pytest.mark.parametrize("notes, rack", [
    ("Holds a skid of spare filter media above the pump skid.", True),
    ("Walkway beam by the pallet racks.", False)])
def test_a_skid_of_goods_stays_a_rack_word_and_by_the_racks_is_a_place(notes, rack):
    text = simple("Beam over the pump skid" if rack else "Walkway beam", notes,
                  'length = "8 ft"\nsection = "HSS4x2x1/4"\nmaterial = "A500-C"',
                  UNIFORM.format(label="load"), "[]")
    assert bool(held(text, "storage rack")) == rack


@pytest.mark.parametrize("notes", ["Holes in the column side of the arm for the bolts.",
                                   "Bolted through the post end of the arm.",
                                   "Slots in the post end of the arm."])
def test_a_part_of_the_arm_named_by_the_column_it_meets_is_still_cut(notes):
    text = simple("Bar rack arm", notes.replace("Bolted through", "Holes drilled through"),
                  'length = "30 in"\nsection = "HSS4x2x1/4"\nmaterial = "A500-C"',
                  UNIFORM.format(label="bar stock"), '["not-rack"]',
                  supports='[[supports]]\nat = "0 in"\ntype = "fixed"\n')
    assert held(text, "cut member")


@pytest.mark.parametrize("notes, slip", [
    ("End stops at 6 in and 30 in from the ends of the beam.", True),
    ("Trolley stops at 6 in and 30 in from each end.", True),
    ("Short travel over the press only: stops at 6 in and 30 in from the left hanger.", False)])
def test_an_inch_travel_measured_from_the_ends_is_not_the_travel_typed(notes, slip):
    text = TROLLEY.format(notes=notes).replace('["57 in", "87 in"]', '["6 in", "30 in"]')
    assert bool(held(text, "feet meant")) == slip


def test_fir_larch_named_with_its_grade_is_compared_with_typed_values():
    typed = ('[beam.material]\nkind = "lumber"\ne = "1900000 psi"\nfb = "1500 psi"\n'
             'fv = "180 psi"\nfc_perp = "625 psi"\ndensity = "34 lb/ft^3"')
    text = CUSTOM_WOOD.format(material=typed).replace(
        "Cedar 2x6 No.2 (NDS values typed in). Shelf for finished parts, indoors.",
        "Stock from the yard: Fir-Larch No.2, stamped.").replace(", western red cedar 2x6", "")
    assert held(text, "above those of DF-L-2")


def test_a_girder_whose_notes_name_the_joists_it_carries_is_held_for_an_o_c_width():
    text = simple("Overhead storage platform beam, W8x18", "Carries the 2x10 floor joists.",
                  'length = "14 ft"\nsection = "W8x18"\nmaterial = "A992"\nbraced = true',
                  '[[loads]]\ntype = "uniform"\nvalue = "-125 psf"\nwidth = "24 in o.c."\n'
                  'label = "storage"\n', '["platform"]')
    assert held(text, "is a spacing")
    carried = text.replace("Overhead storage platform beam, W8x18",
                           "Platform beam carrying the joists")
    assert held(carried, "is a spacing")


def test_goods_named_in_a_sentence_about_a_lift_are_not_a_storage_hook():
    text = simple("Shop beam, W8x18", "Engine, with its hoses still on, hung on the hook at "
                  "mid-span while it is pulled.", 'length = "12 ft"\nsection = "W8x18"\n'
                  'material = "A992"', '[[loads]]\ntype = "point"\nat = "6 ft"\n'
                  'value = "-600 lbf"\nlabel = "engine"\n', "[]")
    assert held(text, "lifting device")


def test_a_mesh_deck_over_plywood_is_not_excused_as_light():
    text = CATWALK.format(title="Catwalk joist", notes="", tags='["catwalk"]',
                          deck="welded wire mesh deck over 3/4 in plywood")
    assert [w for w in parse_job_text(text).warnings if "lighter than a 1/2 in plywood" in
            w.message]


def test_a_label_giving_masses_and_their_total_is_read_as_the_total():
    si = dict(system="si", length="4 m", section="IPE200", material="S275", u="m",
              mid="2 m", live="-4.905 kN")
    text = hoist(**si, dead="-196 N", dead_label="block and trolley, 9 kg + 11 kg = 20 kg")
    assert not held(text, "dead load in N")


def test_a_platform_tagged_beside_a_trailer_is_the_trailers_deck():
    from shopbeam.design.analysis import analyze
    text = CATWALK.format(title="Cross member", notes="", tags='["platform", "trailer"]',
                          deck="deck boards").replace(
        '[[loads]]', '[criteria]\nimpact = "100%"\n[[loads]]', 1)
    job = parse_job_text(text)
    assert not [w for w in job.warnings if "read as a floor" in w.message]
    assert not [u for u in analyze(job).unchecked if "vibration" in u.name]
    # a platform tag alone is still a building's
    bare = parse_job_text(text.replace('["platform", "trailer"]', '["platform"]'))
    assert [w for w in bare.warnings if "read as a floor" in w.message]
