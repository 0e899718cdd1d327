"""The kernels' block-wise path gives the numbers of one whole-array evaluation.

:func:`fitcheck.core.pressfit.evaluate` and :func:`fitcheck.core.din743.press_fit_seat` work
through long arrays in blocks of ``CHUNK`` joints. The check: random joints (elastic and
elastic-plastic design, every operating state, brittle parts, infinite hubs, clearance fits,
joints at standstill) at sizes around the block boundaries, against the block worker run once
on the whole array. Elementwise arithmetic is the same in both, so the elastic results agree
exactly; the elastic-plastic hub's iterative solution may take one more Newton step in a
different block, hence the relative tolerance of 1e-12 there. Verdicts and governing states
must agree exactly.
"""

from __future__ import annotations

import inspect

import numpy as np
import pytest

from fitcheck.core import din743
from fitcheck.core import pressfit as core

DEFAULTS = {name: p.default for name, p in inspect.signature(core.evaluate).parameters.items()
            if p.default is not inspect.Parameter.empty}


def _joints(n: int, design: str, seed: int) -> dict:
    rng = np.random.default_rng(seed)
    d = rng.uniform(5.0, 60.0, n)
    omega = np.where(rng.uniform(size=n) < 0.3, 0.0, rng.uniform(0.0, 3000.0, n))
    Do = np.where(rng.uniform(size=n) < 0.15, np.inf, d * rng.uniform(1.2, 3.0, n))
    di = np.where(rng.uniform(size=n) < 0.5, 0.0, d * rng.uniform(0.0, 0.8, n))
    x = rng.uniform(-0.02, 0.12, n)
    return dict(interference_min=x, interference_max=x + rng.uniform(0.0, 0.05, n), d=d, L=0.8 * d,
                Do=Do, di=di, Es=210000.0, nus=0.3, Rps=490.0, Eh=rng.uniform(60e3, 210e3, n), nuh=0.3,
                Rph=rng.uniform(150.0, 600.0, n), mu_slip=0.1, omega=omega,
                torque=rng.uniform(0.0, 1e5, n), axial_force=rng.uniform(0.0, 1e3, n),
                T_shaft=rng.uniform(-20.0, 90.0, n), T_hub=rng.uniform(-20.0, 120.0, n),
                T_min=-40.0, T_max=110.0,
                brittle_hub=(rng.uniform(size=n) < 0.3) if design == "elastic" else False,
                brittle_shaft=rng.uniform(size=n) < 0.1, Rmh=250.0, Rms=600.0, design=design,
                shrink=rng.uniform(size=n) < 0.5, press_force_limit=5e4, max_heating=300.0)


def _assert_same(blocked: dict, direct: dict, n: int, rtol: float) -> None:
    assert set(blocked) == set(core.OUTPUT_KEYS)
    for k in core.OUTPUT_KEYS:
        b, w = blocked[k], np.broadcast_to(direct[k], (n,))
        assert b.shape == (n,), k
        if b.dtype.kind in "bi" or rtol == 0.0:
            np.testing.assert_array_equal(b, w, err_msg=k)
        else:
            np.testing.assert_allclose(b, w, rtol=rtol, atol=0.0, err_msg=k)


@pytest.mark.parametrize("design, rtol", [("elastic", 0.0), ("elastic-plastic", 1e-12)])
@pytest.mark.parametrize("extra", [1, 2, 3])  # n = 2·CHUNK + 1 (first blocked size), 3·CHUNK, 3·CHUNK + 1
def test_blocks_equal_one_evaluation(monkeypatch, design, rtol, extra):
    monkeypatch.setattr(core, "CHUNK", 997)  # small blocks keep the test fast; many boundaries
    n = {1: 2 * 997 + 1, 2: 3 * 997, 3: 3 * 997 + 1}[extra]
    kw = _joints(n, design, seed=extra)
    blocked = core.evaluate(**kw)
    direct = core._block(**{**DEFAULTS, **kw})
    _assert_same(blocked, direct, n, rtol)
    if design == "elastic-plastic":  # most of these hubs yield: the plastic path is exercised
        assert np.mean(blocked["plastic_zone_diameter_max"] > kw["d"]) > 0.3


def test_blocks_equal_at_the_real_block_size():
    n = 2 * core.CHUNK + 7
    kw = _joints(n, "elastic-plastic", seed=11)
    _assert_same(core.evaluate(**kw), core._block(**{**DEFAULTS, **kw}), n, 1e-12)


def test_blocks_keep_scalar_geometry():
    """A tolerance study: interferences sampled, geometry and materials scalar (the bench's case)."""
    n = 2 * core.CHUNK + 3
    rng = np.random.default_rng(3)
    imin = rng.normal(0.060, 0.012, n)
    kw = dict(interference_min=imin, interference_max=imin + 0.02, d=20.0, L=16.0, Do=56.25, Es=210000.0,
              nus=0.3, Rps=490.0, Eh=70000.0, nuh=0.33, alphah=23.4e-6, Rph=260.0, rhoh=2.7e-9,
              mu_slip=0.1, omega=314.0, T_shaft=60.0, T_hub=70.0, torque=12000.0, design="elastic-plastic")
    _assert_same(core.evaluate(**kw), core._block(**{**DEFAULTS, **kw}), n, 1e-12)


@pytest.mark.parametrize("n", [2 * 997 + 1, 3 * 997, 3 * 997 + 1])
def test_din743_blocks_equal_one_evaluation(monkeypatch, n):
    monkeypatch.setattr(din743, "CHUNK", 997)
    rng = np.random.default_rng(n)
    d = rng.uniform(8.0, 120.0, n)
    kw = dict(d=d, di=np.where(rng.uniform(size=n) < 0.5, 0.0, 0.5 * d), sigma_B_dB=rng.uniform(500, 1100, n),
              sigma_S_dB=400.0, rz_um=rng.uniform(0.5, 10.0, n), moment_amplitude=rng.uniform(0.0, 5e5, n),
              torque_mean=2e5, torque_amplitude=rng.uniform(0.0, 1e5, n), axial_mean=1000.0)
    blocked = din743.press_fit_seat(**kw)
    monkeypatch.setattr(din743, "CHUNK", 10 * n)  # one block: the whole-array evaluation
    direct = din743.press_fit_seat(**kw)
    assert blocked.keys() == direct.keys()
    for k in direct:
        assert np.shape(blocked[k]) == np.shape(direct[k]), k
        np.testing.assert_array_equal(blocked[k], direct[k], err_msg=k)


def test_din743_blocks_keep_scalars_scalar(monkeypatch):
    """Seat diameter scalar, moment sampled (the bench's study): the factors stay scalars."""
    monkeypatch.setattr(din743, "CHUNK", 997)
    n = 3 * 997 + 1
    M = np.random.default_rng(1).uniform(5e3, 3e4, n)
    kw = dict(d=20.0, sigma_B_dB=700.0, sigma_S_dB=490.0, rz_um=4.0, moment_amplitude=M,
              torque_mean=6000.0, torque_amplitude=6000.0, axial_mean=300.0)
    blocked = din743.press_fit_seat(**kw)
    monkeypatch.setattr(din743, "CHUNK", 10 * n)
    direct = din743.press_fit_seat(**kw)
    for k in direct:
        assert np.shape(blocked[k]) == np.shape(direct[k]), k
        np.testing.assert_array_equal(blocked[k], direct[k], err_msg=k)
    assert np.ndim(blocked["K1"]) == 0 and np.shape(blocked["fatigue_safety"]) == (n,)
