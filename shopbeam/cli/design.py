"""`shopbeam capacity` and `shopbeam size`: the design layer's answers, printed."""

from __future__ import annotations

from shopbeam import units
from shopbeam.cli.common import guarded, load
from shopbeam.design import capacity, sizing
from shopbeam.members.stock import load_stock
from shopbeam.output import capacityreport, sizingreport
from shopbeam.output.jsonout import dumps_finite


@guarded
def cmd_capacity(args) -> int:
    """`shopbeam capacity JOB [--json]`."""
    res = capacity.capacity(load(args.job))
    if args.json:
        print(dumps_finite(capacity.to_json(res), args.job))
    else:
        print(capacityreport.render(res), end="")
    return 0


@guarded
def cmd_size(args) -> int:
    """`shopbeam size JOB [--kind K] [--max-depth D] [--stock FILE] [--top N] [--json]`."""
    job = load(args.job)
    md = units.parse(args.max_depth, "length", "--max-depth", positive=True) \
        if args.max_depth else None
    stock = load_stock(args.stock) if args.stock else None
    res = sizing.size(job, args.kind, md, stock)
    if args.json:
        print(dumps_finite(sizing.to_json(res, args.top), args.job))
    else:
        print(sizingreport.render(res, args.top), end="")
    return 0
