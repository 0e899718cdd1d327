"""The project's exceptions.

Every error that bad input can cause is an :class:`InputError` naming the
field, the offending value and what is allowed, so the CLI, the case loader and
the browser front end can show one clear line instead of a traceback.
Several problems found at once travel together in :class:`InputErrors`.
"""

from __future__ import annotations

import difflib
from collections.abc import Iterable

#: Problems listed one by one in an :class:`InputErrors` message (the rest are counted).
MAX_LISTED = 50
#: Longest shown form of a value in a message; longer values are cut and their length given.
MAX_SHOWN = 120
#: Names longer than this get no "did you mean" (the comparison grows with the square of the length).
MAX_SUGGEST = 64


def _short(value: object, limit: int = MAX_SHOWN, quote: bool = True) -> str:
    """``repr(value)`` (or ``str`` with ``quote=False``) cut to about ``limit`` characters.

    Control characters and bidi overrides show escaped, since ``repr`` escapes what is not
    printable; a long value is cut and its length named.

    >>> _short("x" * 500, 20)
    "'xxxxxxxxxxxxxxxx…' (500 characters)"
    """
    if isinstance(value, str) and len(value) > limit:
        head = value[: max(limit - 4, 1)]
        text = repr(head) if quote else head
        return (text[:-1] + "…" + text[-1:] if quote else text + "…") + f" ({len(value)} characters)"
    if isinstance(value, list | tuple | dict) and len(value) > 20:
        kind = "table" if isinstance(value, dict) else "array"
        return f"an {kind} of {len(value)} items" if kind == "array" else f"a table of {len(value)} keys"
    text = repr(value) if quote else str(value)
    if len(text) > limit:
        return text[: limit - 1] + "…"
    return text


class FitcheckError(Exception):
    """Base class of every error fitcheck raises on purpose."""


class InputError(FitcheckError, ValueError):
    """A value the user gave cannot be used.

    Parameters
    ----------
    field : str
        Where the value came from, e.g. ``"pressfit[gear].hub_outer_diameter"``.
    value : object
        The value as given.
    allowed : str
        What would have been accepted, in words.
    hint : str, optional
        An extra sentence, e.g. a "did you mean" suggestion.

    Examples
    --------
    >>> e = InputError("length", "-3 mm", "a length > 0")
    >>> str(e)
    "length: got '-3 mm'; allowed: a length > 0"
    """

    def __init__(self, field: str, value: object, allowed: str, hint: str = "") -> None:
        self.field = field
        self.value = value
        self.allowed = allowed
        self.hint = hint
        super().__init__(self.message)

    @property
    def message(self) -> str:
        msg = f"{_short(self.field, 200, quote=False)}: got {_short(self.value)}; allowed: {self.allowed}"
        if self.hint:
            msg += f" ({self.hint})"
        return msg

    def within(self, prefix: str) -> InputError:
        """The same error with its field placed under ``prefix`` (e.g. a case-file table)."""
        field = f"{prefix}.{self.field}" if prefix else self.field
        return InputError(field, self.value, self.allowed, self.hint)


class InputErrors(FitcheckError, ValueError):
    """Several :class:`InputError` found in one pass (a whole case file, say)."""

    def __init__(self, errors: Iterable[InputError]) -> None:
        self.errors = list(errors)
        super().__init__(self.message)

    @property
    def message(self) -> str:
        n = len(self.errors)
        head = f"{n} problem{'s' if n != 1 else ''} in the input"
        shown = [f"  - {e.message}" for e in self.errors[:MAX_LISTED]]
        if n > MAX_LISTED:
            shown.append(f"  - … and {n - MAX_LISTED} more")
        return head + ":\n" + "\n".join(shown)


class MethodRangeWarning(UserWarning):
    """An input lies outside the range in which a method is valid (the result is still given)."""


def did_you_mean(word: str, choices: Iterable[str], n: int = 3) -> str:
    """A "did you mean …" hint for an unknown name, or an empty string.

    >>> did_you_mean("C45", ["C45E", "42CrMo4", "16MnCr5"])
    "did you mean 'C45E'?"
    """
    if len(str(word)) > MAX_SUGGEST:
        return ""
    choices = list(choices)
    lowered = {c.lower(): c for c in choices}
    close = difflib.get_close_matches(str(word).lower(), list(lowered), n=n, cutoff=0.5)
    if not close:
        return ""
    names = " or ".join(repr(lowered[c]) for c in close)
    return f"did you mean {names}?"


class ErrorCollector:
    """Gather input errors and raise them together.

    >>> c = ErrorCollector()
    >>> with c.field("a"):
    ...     raise InputError("x", 1, "2")
    >>> len(c.errors)
    1
    """

    def __init__(self) -> None:
        self.errors: list[InputError] = []

    def add(self, err: InputError | InputErrors, prefix: str = "") -> None:
        """Collect ``err`` (under ``prefix``); a problem already collected word for word is not
        listed twice (two parsers may read the same key, e.g. a gear's helix angle).

        >>> c = ErrorCollector()
        >>> for _ in range(2):
        ...     c.add(InputError("beta", "95 deg", "an angle <= 45 deg"), "pressfit[g]")
        >>> [e.message for e in c.errors]
        ["pressfit[g].beta: got '95 deg'; allowed: an angle <= 45 deg"]
        """
        items = err.errors if isinstance(err, InputErrors) else [err]
        seen = {e.message for e in self.errors}
        for e in items:
            e = e.within(prefix) if prefix else e
            if e.message not in seen:
                seen.add(e.message)
                self.errors.append(e)

    def field(self, prefix: str = ""):
        collector = self

        class _Ctx:
            def __enter__(self):
                return self

            def __exit__(self, et, ev, tb):
                if et is not None and issubclass(et, InputError | InputErrors):
                    collector.add(ev, prefix)
                    return True
                return False

        return _Ctx()

    def raise_if_any(self) -> None:
        if len(self.errors) == 1:
            raise self.errors[0]
        if self.errors:
            raise InputErrors(self.errors)
