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
