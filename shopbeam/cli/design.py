"""`shopbeam capacity` and `shopbeam size`: the design layer's answers, printed."""

from __future__ import annotations

from shopbeam import units
from shopbeam.cli.common import guarded, load, warnings_to_stderr
from shopbeam.design import capacity, sizing
from shopbeam.errors import InputError
from shopbeam.members.stock import load_stock
from shopbeam.output import capacityreport, sizingreport
from shopbeam.output.jsonout import dumps_finite


def _sound(job):
    """The job, once its own solve passes its self-checks (exact fallback included): a job
    whose answer fails them is refused here as `solve` refuses it, not rated and sized on it."""
    from shopbeam.design.analysis import sound_solution

    sound_solution(job)  # refused as solve refuses it, with the file and the supports' line
    return job


@guarded
def cmd_capacity(args) -> int:
    """`shopbeam capacity JOB [--json]`."""
    res = capacity.capacity(_sound(load(args.job)))
    if args.json:
        print(dumps_finite(capacity.to_json(res), args.job))
        warnings_to_stderr(res.job)
    else:
        print(capacityreport.render(res), end="")
    return 0


@guarded
def cmd_size(args) -> int:
    """`shopbeam size JOB [--kind K] [--max-depth D] [--stock FILE] [--top N] [--confirm N]
    [--json]`."""
    job = _sound(load(args.job))
    md = units.parse(args.max_depth, "length", "--max-depth", positive=True) \
        if args.max_depth else None
    stock = load_stock(args.stock) if args.stock else None
    if args.confirm < 1:
        raise InputError(f"--confirm {args.confirm}: give 1 or more (how many passing "
                         "sections to check in full)", "--confirm")
    res = sizing.size(job, args.kind, md, stock, confirm=min(args.confirm, max(1, args.top)))
    if args.json:
        print(dumps_finite(sizing.to_json(res, args.top), args.job))
        warnings_to_stderr(res.job)
    else:
        print(sizingreport.render(res, args.top), end="")
    return 0
