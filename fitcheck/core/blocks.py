"""Long arrays through an elementwise kernel in cache-sized blocks.

A kernel of numpy ufuncs on whole arrays of 10⁶ joints makes every temporary a fresh memory
mapping (page faults, system time) that spills out of the CPU caches. Worked through in blocks of
about 16 000 joints (arrays of 125 kB, below the C library's 128 KiB mapping threshold), the same
elementwise arithmetic gives the very same numbers in about half the time. Used by
:func:`fitcheck.core.pressfit.evaluate` and :func:`fitcheck.core.din743.press_fit_seat`.
"""

from __future__ import annotations

from collections.abc import Callable

import numpy as np

__all__ = ["CHUNK", "in_blocks", "empty_aligned"]

#: joints per block: arrays of 125 kB stay in the CPU caches and below the C library's threshold
#: for mapping fresh memory (no page faults per temporary)
CHUNK = 16000
#: long output arrays start at a multiple of the 2 MiB huge page and own every huge page they touch,
#: so that the operating system can back all of an array with huge pages (numpy asks for them on
#: large allocations). Of an 8 MB array from plain ``np.empty`` about a quarter lies in partial
#: huge pages at its ends, backed with 4 kB pages; faulting those in cost more than zeroing the rest.
ALIGN = 2 << 20


def empty_aligned(n: int, dtype=np.float64) -> np.ndarray:
    """An uninitialised 1-D array of ``n`` elements starting at a multiple of :data:`ALIGN` bytes.

    Arrays below ``2·ALIGN`` bytes (numpy's own threshold for asking for huge pages is 4 MiB) are
    a plain :func:`numpy.empty`. The result is a view into a buffer that reaches from below its
    start to the end of its last ``ALIGN`` block; the untouched head costs address space, not
    memory, but the last huge page is whole: up to ``ALIGN`` bytes more memory per array (5 % at
    10⁶ float64 values) for far fewer page faults.

    >>> a = empty_aligned(1_000_000)
    >>> a.shape, a.dtype, a.ctypes.data % ALIGN
    ((1000000,), dtype('float64'), 0)
    """
    dtype = np.dtype(dtype)
    size = n * dtype.itemsize
    if size < 2 * ALIGN:
        return np.empty(n, dtype=dtype)
    buf = np.empty(-(-size // ALIGN) * ALIGN + ALIGN, dtype=np.uint8)
    start = -buf.ctypes.data % ALIGN
    return buf[start:start + size].view(dtype)


def in_blocks(kernel: Callable[..., dict], kw: dict, chunk: int = CHUNK, *,
              full_outputs: bool = True, direct: bool = False) -> dict:
    """``kernel(**kw)`` (a dict of outputs), evaluated block by block over long arrays.

    The array values of ``kw`` (``None`` and scalars pass through) are broadcast to one shape; up
    to ``2·chunk`` elements the kernel runs once on the whole arrays, beyond that on flat blocks of
    ``chunk`` elements whose outputs are put back together in that shape. ``kernel`` must be
    elementwise (no reduction over the joints), so blocks change no number. With
    ``full_outputs`` every output has the full shape (a scalar output is broadcast); without, an
    output that is a scalar in the kernel stays a scalar.

    With ``direct`` the kernel takes a keyword ``out``: a dict of the block's slices of the array
    outputs, into which it may write its results (``out=`` of its last ufunc) and return them,
    which saves a copy of every output. An output it returns as another array is copied as
    usual. The outputs are allocated after a first evaluation on one joint; then, and for short
    arrays, ``out`` is ``None``.

    >>> k = lambda a, b: {"s": a + b, "c": 2.0}
    >>> r = in_blocks(k, {"a": np.arange(7.0), "b": 1.0}, chunk=2)
    >>> r["s"].tolist(), r["c"].shape
    ([1.0, 2.0, 3.0, 4.0, 5.0, 6.0, 7.0], (7,))
    >>> in_blocks(k, {"a": np.arange(7.0), "b": 1.0}, chunk=2, full_outputs=False)["c"]
    2.0
    """
    shapes = [np.shape(v) for v in kw.values() if v is not None and np.ndim(v) > 0]
    shape = np.broadcast_shapes(*shapes) if shapes else ()
    n = int(np.prod(shape)) if shape else 1
    if n <= 2 * chunk:
        out = kernel(**kw)
        if not full_outputs:
            return out
        full = np.broadcast_shapes(*(np.shape(v) for v in out.values()))
        return {k: (v if np.shape(v) == full else np.broadcast_to(v, full)) for k, v in out.items()}
    flat = {k: (np.broadcast_to(np.asarray(v, dtype=bool if np.asarray(v).dtype == bool else np.float64),
                                shape).reshape(-1) if v is not None and np.ndim(v) > 0 else v)
            for k, v in kw.items()}
    out: dict = {}
    dest = None
    if direct:  # the outputs' names, kinds and types from the first joint, then every block straight into them
        part = kernel(**{k: (v[:1] if isinstance(v, np.ndarray) and v.ndim == 1 else v) for k, v in flat.items()},
                      out=None)
        out = {k: (empty_aligned(n, np.asarray(v).dtype) if full_outputs or np.ndim(v) else v)
               for k, v in part.items()}
    for start in range(0, n, chunk):
        sl = slice(start, min(start + chunk, n))
        args = {k: (v[sl] if isinstance(v, np.ndarray) and v.ndim == 1 else v) for k, v in flat.items()}
        if direct:
            dest = {k: v[sl] for k, v in out.items() if np.ndim(v)}
            args["out"] = dest
        part = kernel(**args)
        if not out:
            out = {k: (empty_aligned(n, np.asarray(v).dtype) if full_outputs or np.ndim(v) else v)
                   for k, v in part.items()}
        for k, v in part.items():
            if (full_outputs or np.ndim(v)) and (dest is None or v is not dest.get(k)):
                out[k][sl] = v
    return {k: (v.reshape(shape) if np.ndim(v) else v) for k, v in out.items()}
