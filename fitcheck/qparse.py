"""The restricted grammar of quantity strings, checked before pint sees the text.

pint evaluates what it parses: ``"9**9**9 mm"`` is an arithmetic expression whose
evaluation runs for minutes, and long texts cost pint's tokenizer time that grows
faster than their length. Every quantity string a user can type therefore passes
:func:`check` first, a linear scan that accepts only

* an optional number: optional sign, digits with an optional decimal point, an
  optional exponent of at most three digits (``25``, ``0.984``, ``-1.5e-6``, ``.5``);
* an optional unit expression: unit names (letters, digits after the first letter,
  ``_``; ``°C``, ``°F``, ``µm``, ``%``) joined by ``*``, ``/`` or a space, each with an
  optional small integer power (``**3``, ``^2``, ``**-1``, ``²``, ``³``; at most
  :data:`MAX_POWER` in size); a factor may be ``1`` as in ``1/degC``;
* at most :data:`MAX_FACTORS` unit names and :data:`MAX_CHARS` characters in all
  (the length is checked first).

Nothing else (brackets, repeated powers, powers of numbers, a number after the
unit) reaches pint, so the text is refused in microseconds with the usual
field / value / allowed message. The text that passes is handed to pint unchanged,
so every string accepted before reads to exactly the same quantity.

>>> check("25 mm"), check("23e-6 1/degC"), check("7850 kg/m**3"), check("°C")
(None, None, None, None)
>>> check("9**9**9 mm")
'a power of a number at character 2; write the value as one number'
"""

from __future__ import annotations

from .errors import InputError

#: Longest quantity text read (characters); longer text is refused before anything else.
MAX_CHARS = 100
#: Most unit names in one quantity (``tonne/mm**3`` has two; pint's time grows with each).
MAX_FACTORS = 6
#: Largest power of a unit name (``m**3``; a second moment of area needs 4).
MAX_POWER = 6

ALLOWED = ("a number and a unit, e.g. '25 mm', '30 N*m' or '11.5e-6 1/K' "
           f"(at most {MAX_FACTORS} unit names joined by * or /, powers up to {MAX_POWER}, "
           f"at most {MAX_CHARS} characters)")

_SUPERSCRIPTS = "²³"
_DIGITS = "0123456789"
_WS = " \t"


def normalise(text: str) -> str:
    """The text as the parser reads it: stripped, ``·`` and ``×`` as ``*``, ``Ø`` dropped."""
    return text.strip().replace("·", "*").replace("×", "*").replace("Ø", "")


def check(text: str) -> str | None:  # noqa: C901 - one linear scanner, clearest in one piece
    """``None`` when ``text`` follows the grammar, else the problem in words.

    ``text`` should already be :func:`normalise`\\ d. The scan is linear and reads at most
    :data:`MAX_CHARS` characters.
    """
    n = len(text)
    if n > MAX_CHARS:
        return f"{n} characters, more than {MAX_CHARS}"
    if not n:
        return "an empty text"

    def at(j: int) -> str:
        return f"at character {j + 1}"

    def skip_ws(j: int) -> int:
        while j < n and text[j] in _WS:
            j += 1
        return j

    def is_power(j: int) -> bool:
        return j < n and (text[j] == "^" or text.startswith("**", j) or text[j] in _SUPERSCRIPTS)

    # ---- the number
    i = 1 if text[0] in "+-" else 0
    start = i
    while i < n and text[i] in _DIGITS:
        i += 1
    had_number = i > start
    if i < n and text[i] == ".":
        i += 1
        frac = i
        while i < n and text[i] in _DIGITS:
            i += 1
        if not had_number and i == frac:
            return f"a lone '.' {at(i - 1)}"
        had_number = True
    if had_number and i + 1 < n and text[i] in "eE" and (
            text[i + 1] in _DIGITS or (text[i + 1] in "+-" and i + 2 < n and text[i + 2] in _DIGITS)):
        i += 2 if text[i + 1] in "+-" else 1
        e0 = i
        while i < n and text[i] in _DIGITS:
            i += 1
        if i - e0 > 3:
            return f"an exponent of more than three digits {at(e0)}"
    if start and not had_number:
        return f"a sign without a number {at(0)}"
    i = skip_ws(i)
    if had_number and is_power(i):
        return f"a power of a number {at(i)}; write the value as one number"
    # ---- the unit expression: factors joined by '*', '/' or a space
    want = False      # an operator was read and a factor must follow
    factors = 0
    while i < n:
        c = text[i]
        if c in _WS:
            i += 1
            continue
        if c in "*/":
            if is_power(i):
                return f"a power may follow a unit name only {at(i)}"
            if want or (factors == 0 and not had_number):
                return f"'{c}' without a unit before it {at(i)}"
            want = True
            i += 1
            continue
        if is_power(i):
            return f"a power may follow a unit name only {at(i)}"
        f0 = i
        if c == "1" and (i + 1 == n or text[i + 1] in _WS or text[i + 1] in "*/"):
            i += 1
        elif c == "%":
            i += 1
        else:
            if c == "°":
                i += 1
            if i < n and (text[i].isalpha() or text[i] == "_"):
                i += 1
                while i < n and (text[i].isalnum() or text[i] == "_") and text[i] not in _SUPERSCRIPTS:
                    i += 1
            elif c != "°":
                what = "a control character" if not c.isprintable() else repr(c)
                return f"{what} {at(i)}; a unit name is made of letters, digits and '_'"
        factors += 1
        if factors > MAX_FACTORS:
            return f"more than {MAX_FACTORS} unit names {at(f0)}"
        want = False
        # an optional power: '**3', '^-1', '²'
        j = skip_ws(i)
        if j < n and text[j] in _SUPERSCRIPTS:
            i = j + 1
        elif is_power(j):
            if text[f0:i] == "1":
                return f"a power of the number 1 {at(j)}"
            j = skip_ws(j + (1 if text[j] == "^" else 2))
            if j < n and text[j] in "+-":
                j += 1
            p0 = j
            while j < n and text[j] in _DIGITS:
                j += 1
            if j == p0:
                return f"a power that is not a whole number {at(p0)}"
            if j - p0 > 1 or int(text[p0:j]) > MAX_POWER:
                return f"a power larger than {MAX_POWER} {at(p0)}"
            i = j
        if is_power(skip_ws(i)):
            return f"a repeated power {at(skip_ws(i))}"
    if want:
        return "an operator without a unit after it at the end"
    return None


def parse(value: str, field: str, unreadable: str = "a number with a known unit, e.g. '25 mm'"):
    """Read a quantity string into a pint quantity of :data:`fitcheck.units.ureg`.

    The text is checked against the grammar first; anything outside it, and
    anything pint cannot read, is an :class:`~fitcheck.errors.InputError`
    (``unreadable``: what the field takes, said when pint cannot read the text).
    """
    from .units import ureg

    text = normalise(value)
    if not text:
        raise InputError(field, value, "a number with a unit, e.g. '25 mm'")
    problem = check(text)
    if problem is not None:
        raise InputError(field, value, ALLOWED, f"not read: {problem}")
    try:
        return ureg.Quantity(text)
    except Exception as exc:  # pint raises several unrelated types here
        raise InputError(field, value, unreadable, f"could not read it: {type(exc).__name__}") from None


def quantity_or_none(value):
    """The quantity a string reads to, or ``None`` for anything the grammar or pint refuses."""
    if not isinstance(value, str):
        return None
    try:
        return parse(value, "value")
    except InputError:
        return None
