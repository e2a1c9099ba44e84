"""Input series for the reference fixtures: seeded simulations and the two open datasets.

Every simulated family draws from its own numpy Generator (default_rng with a fixed
seed), so adding or changing one family never shifts the numbers of another. Each
series is stored in the fixture files next to the cases that use it, so the
TypeScript tests read exactly these values and never re-simulate.
"""
import csv
import os

import numpy as np

DATA_DIR = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), "data")

# Burn-in for stationary recursions, so the kept part does not depend on the zero start.
BURN_IN = 200


def _ar1(rng, phi, n, scale=1.0):
    """AR(1) path u_t = phi u_{t-1} + e_t with N(0, scale^2) shocks, burn-in discarded."""
    e = rng.standard_normal(n + BURN_IN) * scale
    u = np.zeros(n + BURN_IN)
    for t in range(1, n + BURN_IN):
        u[t] = phi * u[t - 1] + e[t]
    return u[BURN_IN:]


def _walk(rng, n, drift=0.0):
    """Random walk: running sum of drift + N(0, 1) shocks, starting at the first shock."""
    return np.cumsum(drift + rng.standard_normal(n))


def simulated_series():
    """Returns (series dict, seed table) for all simulated inputs, in a fixed order."""
    s = {}
    seeds = {}

    def family(name, seed):
        seeds[name] = seed
        return np.random.default_rng(seed)

    # Univariate unit-root and stationarity inputs.
    for n, seed in ((60, 101), (150, 102), (400, 103)):
        s[f"rw_{n}"] = _walk(family(f"rw_{n}", seed), n)
    s["rw_drift_200"] = _walk(family("rw_drift_200", 104), 200, drift=0.3)
    s["ar1_phi050_250"] = _ar1(family("ar1_phi050_250", 105), 0.5, 250)
    s["ar1_phi090_250"] = _ar1(family("ar1_phi090_250", 106), 0.9, 250)
    rng = family("trend_stationary_300", 107)
    t = np.arange(1, 301, dtype=float)
    s["trend_stationary_300"] = 1.0 + 0.05 * t + _ar1(rng, 0.5, 300)
    rng = family("i2_200", 108)
    s["i2_200"] = np.cumsum(np.cumsum(rng.standard_normal(200)))

    # Cointegrated pair: y = 1 + 2x + u, x a random walk, u AR(1) with phi 0.6.
    rng = family("pair", 201)
    x = _walk(rng, 300)
    s["pair_x"] = x
    s["pair_y"] = 1.0 + 2.0 * x + _ar1(rng, 0.6, 300)

    # Cointegrated triple: y = 0.5 + x1 - 0.5 x2 + u, x1 and x2 independent walks.
    rng = family("triple", 202)
    x1 = _walk(rng, 300)
    x2 = _walk(rng, 300)
    s["triple_y"] = 0.5 + 1.0 * x1 - 0.5 * x2 + _ar1(rng, 0.5, 300)
    s["triple_x1"] = x1
    s["triple_x2"] = x2

    # Two independent random walks (no cointegration, no causality).
    rng = family("indep", 203)
    s["indep_a"] = _walk(rng, 300)
    s["indep_b"] = _walk(rng, 300)

    # Three variables, two common stochastic trends, so cointegrating rank 1:
    # y1 - 0.8 y2 + 0.4 y3 - 2 is stationary.
    rng = family("sys3", 204)
    w1 = _walk(rng, 300)
    w2 = _walk(rng, 300)
    y2 = w1 + 0.5 * rng.standard_normal(300)
    y3 = w2 + 0.5 * rng.standard_normal(300)
    s["sys3_y1"] = 2.0 + 0.8 * y2 - 0.4 * y3 + _ar1(rng, 0.5, 300)
    s["sys3_y2"] = y2
    s["sys3_y3"] = y3

    # Four variables, two common stochastic trends, so cointegrating rank 2:
    # y3 - 0.5 y1 - 1 and y4 - y1 + y2 + 1 are stationary.
    rng = family("sys4", 205)
    w1 = _walk(rng, 300)
    w2 = _walk(rng, 300)
    y1 = w1 + 0.5 * rng.standard_normal(300)
    y2 = w2 + 0.5 * rng.standard_normal(300)
    s["sys4_y1"] = y1
    s["sys4_y2"] = y2
    s["sys4_y3"] = 1.0 + 0.5 * y1 + _ar1(rng, 0.5, 300)
    s["sys4_y4"] = -1.0 + y1 - y2 + _ar1(rng, 0.5, 300)

    # Stationary bivariate VAR(2): x feeds y through its two lags, y never feeds x.
    # Shocks are N(0, [[1, 0.3], [0.3, 1]]).
    rng = family("var2", 206)
    n = 400 + BURN_IN
    chol = np.linalg.cholesky(np.array([[1.0, 0.3], [0.3, 1.0]]))
    e = rng.standard_normal((n, 2)) @ chol.T
    xv = np.zeros(n)
    yv = np.zeros(n)
    for k in range(2, n):
        xv[k] = 0.5 + 0.5 * xv[k - 1] - 0.2 * xv[k - 2] + e[k, 0]
        yv[k] = 1.0 + 0.3 * yv[k - 1] + 0.1 * yv[k - 2] + 0.4 * xv[k - 1] + 0.2 * xv[k - 2] + e[k, 1]
    s["var2_x"] = xv[BURN_IN:]
    s["var2_y"] = yv[BURN_IN:]

    # Structural-break inputs (T = 250, 0-based index 150 is the first post-break point).
    s["za_rw_250"] = _walk(family("za_rw_250", 301), 250)
    rng = family("za_level_break_250", 302)
    idx = np.arange(250, dtype=float)
    s["za_level_break_250"] = 1.0 + 4.0 * (idx >= 150) + _ar1(rng, 0.5, 250)
    rng = family("za_slope_break_250", 303)
    s["za_slope_break_250"] = (
        0.5 + 0.02 * idx + 0.08 * np.maximum(idx - 149.0, 0.0) + _ar1(rng, 0.5, 250)
    )
    return s, seeds


def _read_csv(name, encoding):
    with open(os.path.join(DATA_DIR, name), newline="", encoding=encoding) as f:
        rows = list(csv.DictReader(f))
    return rows


def dataset_series():
    """Series taken from the two copied datasets (see tests/reference/data/README.md)."""
    s = {}
    macro = _read_csv("macrodata.csv", "utf-8")
    col = {k: np.array([float(r[k]) for r in macro]) for k in macro[0].keys()}
    for name in ("realgdp", "realcons", "realinv", "cpi", "m1"):
        s[f"macro_log_{name}"] = np.log(col[name])
    # infl and realint hold a placeholder 0 in 1959Q1 (no previous quarter): drop that row.
    s["macro_infl"] = col["infl"][1:]
    s["macro_realint"] = col["realint"][1:]
    s["macro_tbilrate"] = col["tbilrate"]
    s["macro_dlog_realgdp"] = np.diff(np.log(col["realgdp"]))
    s["macro_dlog_realcons"] = np.diff(np.log(col["realcons"]))
    # The levels as the file gives them, for the plain F test on the values as given.
    s["macro_realgdp"] = col["realgdp"]
    s["macro_realcons"] = col["realcons"]
    # The Danish file starts with a UTF-8 byte-order mark; utf-8-sig strips it.
    danish = _read_csv("danish-money-demand.csv", "utf-8-sig")
    assert list(danish[0].keys())[0] == "period", "BOM not stripped from the Danish header"
    for name in ("lrm", "lry", "lpy", "ibo", "ide"):
        s[f"dk_{name}"] = np.array([float(r[name]) for r in danish])
    assert len(s["macro_log_realgdp"]) == 203 and len(s["dk_lrm"]) == 55
    return s


def all_series():
    """Simulated plus dataset series, and the seed table for the simulated ones."""
    sim, seeds = simulated_series()
    data = dataset_series()
    overlap = set(sim) & set(data)
    assert not overlap, overlap
    return {**sim, **data}, seeds


# Univariate inputs for the ADF and KPSS fixtures, in output order.
UNIVARIATE = [
    "rw_60", "rw_150", "rw_400", "rw_drift_200", "ar1_phi050_250", "ar1_phi090_250",
    "trend_stationary_300", "i2_200",
    "macro_log_realgdp", "macro_log_realcons", "macro_log_realinv", "macro_log_cpi",
    "macro_log_m1", "macro_infl", "macro_realint", "macro_tbilrate",
    "dk_lrm", "dk_lry", "dk_lpy", "dk_ibo", "dk_ide",
]
