"""Job-file text shared by the tests: one custom member (a 4x4 tube's properties typed in,
an inline steel), so a test says only what it is about (span, supports, loads)."""

CUSTOM_MEMBER = """[beam.section]
shape = "custom"
area = "3.37 in^2"
ix = "7.80 in^4"
sx = "3.90 in^3"
[beam.material]
e = "29000 ksi"
fy = "46 ksi"
density = "490 lb/ft^3"
"""


def point_load(at_ft: float, value: str = "-100 lbf") -> str:
    return f'[[loads]]\ntype = "point"\nat = "{at_ft:g} ft"\nvalue = "{value}"\n'


def uniform_load(end_ft: float, value: str = "-100 lbf/ft") -> str:
    return f'[[loads]]\ntype = "uniform"\nstart = "0 ft"\nend = "{end_ft:g} ft"\nvalue = "{value}"\n'


def simple_span(beam: str, span_ft: float = 6, load: str | None = None,
                title: str = "shop member") -> str:
    """A job on a pin and a roller at the ends. `beam`: the lines under [beam] after the length
    (plain keys first, then any [beam.section] / [beam.material] table); `load`: [[loads]]
    text (default 100 lbf down at mid-span)."""
    load = point_load(span_ft / 2) if load is None else load
    return (f'schema = 1\ntitle = "{title}"\n[beam]\nlength = "{span_ft:g} ft"\n{beam}\n'
            f'[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "{span_ft:g} ft"\n'
            f'type = "roller"\n{load}')


def demo_reactions_without_offcuts() -> tuple[float, float]:
    """The demo's reactions (lbf) with its pipe offcuts left out, by statics: deck 90 lbf/ft
    and the W8X18's own weight (A 5.26 in^2, AISC Shapes Database v15.0, x 490 lb/ft^3) over
    15 ft, stock 300 lbf/ft over the 12 ft span, the stair's 1200 lbf at the 15 ft tip;
    moments about the pin at 0 give the roller at 12 ft."""
    w = 90 + 5.26 * 490 / 144
    r2 = (w * 15 * 7.5 + 300 * 12 * 6 + 1200 * 15) / 12
    return w * 15 + 300 * 12 + 1200 - r2, r2
