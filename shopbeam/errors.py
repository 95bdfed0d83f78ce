"""Errors a user can act on: what is wrong, where (file, key path, line) and what to do.

Everything a user typed or saved that shopbeam cannot use raises `InputError` (or a list of
them in `InputErrors`); the CLI prints them as one block and exits 2, never a traceback.
"""

from __future__ import annotations

from dataclasses import dataclass


@dataclass
class Problem:
    """One problem with the input, located as precisely as the input allows."""

    message: str
    key: str = ""
    file: str = ""
    line: int | None = None
    warning: bool = False

    def located(self) -> str:
        where = self.file or ""
        if self.line is not None and where:
            where += f":{self.line}"
        elif self.line is not None:
            where = f"line {self.line}"
        parts = [p for p in (where, self.key) if p]
        prefix = ": ".join(parts)
        kind = "warning: " if self.warning else ""
        from shopbeam.escapes import shown  # keys and values echoed from a file

        text = f"{prefix}: {kind}{self.message}" if prefix else f"{kind}{self.message}"
        return shown(text, keep="\n")


class InputError(Exception):
    """A single problem with user input (job file, designation, command-line value)."""

    def __init__(self, message: str, key: str = "", file: str = "", line: int | None = None):
        super().__init__(message)
        self.problem = Problem(message, key, file, line)

    def __str__(self) -> str:
        return self.problem.located()


class InputErrorGroup(InputError):
    """Several independent problems in one table (each key of a typed-in section): raised as
    its first problem, so any caller that handles an `InputError` still can, while a job
    reader lists them all (`more`) in one pass."""

    def __init__(self, errors: list[InputError]):
        first = errors[0].problem
        super().__init__(first.message, first.key, first.file, first.line)
        self.more = [e.problem for e in errors[1:]]

    def __str__(self) -> str:
        return "\n".join([self.problem.located()] + [p.located() for p in self.more])


def raise_all(errors: list[InputError]) -> None:
    """Raise every problem of one table at once: the one alone, several as a group; nothing
    when there are none."""
    if len(errors) == 1:
        raise errors[0]
    if errors:
        raise InputErrorGroup(errors)


class InputErrors(Exception):
    """Several problems found in one pass over a job file."""

    def __init__(self, problems: list[Problem]):
        super().__init__("; ".join(p.located() for p in problems))
        self.problems = problems

    def __str__(self) -> str:
        n = sum(not p.warning for p in self.problems)
        w = len(self.problems) - n
        head = (f"{n} problem{'s' if n != 1 else ''} in the job"
                + (f" (and {w} warning{'s' if w != 1 else ''}):" if w else ":"))
        return "\n".join([head] + ["  " + p.located() for p in self.problems])


class UnstableBeam(Exception):
    """The supports and hinges let the beam move as a rigid body or a mechanism."""

    def __init__(self, message: str, file: str = "", line: int | None = None):
        super().__init__(message)
        self.file = file
        self.line = line  # the first [[supports]] header's line, where the layout starts

    def __str__(self) -> str:
        msg = super().__str__()
        at = f":{self.line}" if self.line is not None and self.file else ""
        where = f"{self.file}{at}: supports: " if self.file else ""
        return f"{where}unstable beam: {msg}"
