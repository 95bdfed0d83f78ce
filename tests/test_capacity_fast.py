"""The capacity search of patterned jobs reads each trial factor's governing ratio from the
envelopes (`loading.envelope_ratio`) and evaluates in full only at the answer: the ratio must
be the full evaluation's own number, and the factor the one the search finds by evaluating
every trial in full (the slow search is the oracle here)."""

from __future__ import annotations

from hypothesis import given, settings
from hypothesis import strategies as st

from shopbeam.design.capacity import _capacity
from shopbeam.design.checks import strengths
from shopbeam.design.loading import envelope_ratio, envelope_ratio_applies, evaluate, state_set
from shopbeam.jobs.jobfile import parse_job_text
from test_patterns import SETTINGS, patterned_jobs


@st.composite
def jobs(draw):
    """Patterned shelves (test_patterns; fewer floors), some on a tube (wall local checks),
    some with an interior support turned into a spring or a hinge added inside the first
    span."""
    text, _ = draw(patterned_jobs())
    if draw(st.integers(0, 3)):  # mostly without the floor rule, which it leaves to evaluate
        text = text.replace('[criteria]\ndeflection = "floor"\n', "")
    if draw(st.booleans()):
        text = text.replace('section = "W8x18"\nmaterial = "A992"',
                            'section = "HSS6x4x1/4"\nmaterial = "A500-C"')
    change = draw(st.sampled_from(["none", "none", "spring", "hinge"]))
    rollers = text.count('type = "roller"')
    if change == "spring" and rollers >= 2:
        text = text.replace('type = "roller"\n', 'type = "spring"\nstiffness = "4000 lbf/in"\n', 1)
    elif change == "hinge" and rollers >= 2:
        text = text.replace("[[loads]]", '[[supports]]\nat = "1 ft"\ntype = "hinge"\n[[loads]]', 1)
    return text


def _job(text):
    job = parse_job_text(text)
    ss = state_set(job)
    return job, ss, strengths(job, beam=ss.beam)


@settings(max_examples=60, **SETTINGS)
@given(jobs(), st.sampled_from([0.0, 0.37, 1.0, 2.5, 11.0]))
def test_envelope_ratio_is_the_full_evaluations_governing_ratio(text, k):
    job, ss, stg = _job(text)
    if not envelope_ratio_applies(job, ss, stg):
        # it must not claim jobs whose checks it does not read: floors' live-load deflection
        assert stg.live_ratio or not ss.parts.patterned
        return
    full = max(c.ratio for c in evaluate(job, k, None, ss, stg).checks)
    assert envelope_ratio(job, ss, k, stg) == full


@settings(max_examples=25, **SETTINGS)
@given(jobs())
def test_fast_capacity_equals_the_search_that_evaluates_every_trial(text):
    job, ss, stg = _job(text)
    fast = _capacity(job, None, ss, stg, fast=True)
    job2, ss2, stg2 = _job(text)  # fresh caches: the slow search shares nothing with it
    slow = _capacity(job2, None, ss2, stg2, fast=False)
    assert fast.factor == slow.factor
    assert (fast.method, fast.note) == (slow.method, slow.note)
    assert [c.as_dict() for c in fast.checks] == [c.as_dict() for c in slow.checks]


@settings(max_examples=20, **SETTINGS)
@given(jobs())
def test_with_nothing_fixed_the_ratio_at_zero_is_the_full_evaluations(text):
    # no self-weight and no dead load: the search's first trial (k = 0) is answered without
    # the envelopes; it must still be the full evaluation's number
    text = text.replace("[beam]\n", "[beam]\nself_weight = false\n", 1)
    text = "\n[[loads]]".join(block for block in text.split("\n[[loads]]")
                              if 'case = "dead"' not in block)
    if "[[loads]]" not in text:
        return
    job, ss, stg = _job(text)
    if not envelope_ratio_applies(job, ss, stg):
        return
    assert not any(ld.total_force for ld in ss.parts.fixed)
    full = max(c.ratio for c in evaluate(job, 0.0, None, ss, stg).checks)
    assert envelope_ratio(job, ss, 0.0, stg) == full
    fast = _capacity(job, None, ss, stg, fast=True)
    job2, ss2, stg2 = _job(text)
    assert fast.factor == _capacity(job2, None, ss2, stg2, fast=False).factor
