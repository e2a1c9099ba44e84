#!/usr/bin/python3
"""Checks the committed fixtures: reloads each JSON file, repeats a few cases with fresh
statsmodels calls on the series read back from the JSON, and re-derives the conventions
described in tests/reference/README.md with plain numpy least squares.

Run after `npm run fixtures`: /usr/bin/python3 tests/reference/check_fixtures.py
Prints one line per check and exits non-zero on the first mismatch.
"""
import json
import os
import sys
import warnings

import numpy as np
from scipy import stats
from statsmodels.tsa.adfvalues import mackinnoncrit
from statsmodels.tsa.stattools import (adfuller, coint, grangercausalitytests, kpss,
                                       zivot_andrews)
from statsmodels.tsa.vector_ar.var_model import VAR
from statsmodels.tsa.vector_ar.vecm import coint_johansen
from statsmodels.datasets import longley
from statsmodels.regression.linear_model import OLS
from statsmodels.tools.tools import add_constant

HERE = os.path.dirname(os.path.abspath(__file__))
ADF = {"none": "n", "const": "c", "trend": "ct"}
RULE = {"aic": "AIC", "bic": "BIC", "tstat": "t-stat"}


def load(name):
    with open(os.path.join(HERE, "fixtures", f"{name}.json"), encoding="utf-8") as f:
        doc = json.load(f)
    assert doc["generatedBy"] == "tests/reference/make_fixtures.py"
    return doc, {k: np.array(v, dtype=float) for k, v in doc["series"].items()}


def same(label, got, want, rel=0.0):
    got, want = np.asarray(got, dtype=float), np.asarray(want, dtype=float)
    ok = np.allclose(got, want, rtol=rel, atol=0.0, equal_nan=True) if rel else \
        np.array_equal(got, want, equal_nan=True)
    print(f"{'ok ' if ok else 'BAD'} {label}")
    if not ok:
        sys.exit(f"mismatch in {label}: {got} vs {want}")


def spot(cases):
    return [cases[0], cases[len(cases) // 2], cases[-1]]


def ols(y, X):
    b, *_ = np.linalg.lstsq(X, y, rcond=None)
    e = y - X @ b
    n, k = X.shape
    s2 = e @ e / (n - k)
    se = np.sqrt(np.diag(s2 * np.linalg.inv(X.T @ X)))
    return b, e, b / se


def adf_design(x, lags, nobs, terms):
    """ADF regression on the last `nobs` differences: [level, lagged diffs, terms]."""
    dx = np.diff(x)
    T1 = len(dx)
    rows = np.arange(T1 - nobs, T1)
    cols = [x[rows]] + [dx[rows - j] for j in range(1, lags + 1)]
    if terms in ("c", "ct"):
        cols.append(np.ones(nobs))
    if terms == "ct":
        cols.append(np.arange(1.0, nobs + 1))
    return dx[rows], np.column_stack(cols)


def check_adf():
    doc, s = load("adf")
    for c in spot(doc["cases"]):
        lags = c["lags"]
        out = adfuller(s[c["series"]], maxlag=lags if isinstance(lags, int) else c["maxLags"],
                       regression=ADF[c["deterministic"]],
                       autolag=None if isinstance(lags, int) else RULE[lags])
        same(f"adf {c['series']} {c['deterministic']} {lags}: fresh call",
             [out[0], out[1], out[2], out[3]], [c["statistic"], c["pValue"], c["usedLags"], c["nobs"]])
    # t-stat rule and common sample, re-derived by hand for every "tstat" case.
    n_checked = 0
    for c in doc["cases"]:
        if c["lags"] != "tstat":
            continue
        x, code, M = s[c["series"]], ADF[c["deterministic"]], c["maxLagsSearched"]
        common = len(x) - 1 - M
        chosen = 0
        for L in range(M, 0, -1):
            _, X = adf_design(x, L, common, code)
            _, _, t = ols(adf_design(x, L, common, code)[0], X)
            if abs(t[L]) >= 1.6448536269514722:
                chosen = L
                break
        y, X = adf_design(x, chosen, len(x) - 1 - chosen, code)
        _, _, t = ols(y, X)
        assert chosen == c["usedLags"], (c, chosen)
        assert abs(t[0] - c["statistic"]) < 1e-9 * abs(t[0])
        n_checked += 1
    print(f"ok  adf t-stat rule (downward search, common sample) re-derived on {n_checked} cases")


def kpss_auto_bandwidth(e):
    n = len(e)
    m = int(n ** (2.0 / 9.0))
    g = [e[i:] @ e[:n - i] / n for i in range(m + 1)]
    s0 = g[0] + 2 * sum(g[1:])
    s1 = 2 * sum(i * g[i] for i in range(1, m + 1))
    return min(int(1.1447 * ((s1 / s0) ** 2) ** (1 / 3) * n ** (1 / 3)), n - 1)


def check_kpss():
    doc, s = load("kpss")
    for c in spot(doc["cases"]):
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            out = kpss(s[c["series"]], regression={"const": "c", "trend": "ct"}[c["deterministic"]],
                       nlags=c["lags"])
        same(f"kpss {c['series']} {c['deterministic']} {c['lags']}: fresh call",
             out[:3], [c["statistic"], c["pValue"], c["bandwidth"]])
    for c in doc["cases"]:
        x = s[c["series"]]
        n = len(x)
        if c["deterministic"] == "const":
            e = x - x.mean()
        else:
            e = ols(x, np.column_stack([np.ones(n), np.arange(1.0, n + 1)]))[1]
        if c["lags"] == "auto":
            assert kpss_auto_bandwidth(e) == c["bandwidth"], c
        if c["lags"] == "legacy":
            assert c["bandwidth"] == min(int(np.ceil(12 * (n / 100) ** 0.25)), n - 1), c
    print("ok  kpss auto bandwidth and legacy (ceil) rule re-derived on all cases")


def check_ols():
    doc, s = load("ols-longley")
    c = doc["cases"][0]
    X = add_constant(np.column_stack([s[i] for i in c["x"]]), prepend=True)
    r = OLS(s[c["y"]], X).fit()
    same("ols-longley: fresh fit on the JSON series", [r.params, r.bse], [c["params"], c["bse"]])
    same("ols-longley: cov_params", r.cov_params(), c["covParams"])
    # The same fit from the dataset's own arrays: memory layout changes the last bits
    # on these near-collinear data, so this comparison allows 1e-10 relative.
    d = longley.load_pandas()
    assert np.array_equal(np.asarray(d.exog, dtype=float), np.column_stack([s[i] for i in c["x"]]))
    r2 = OLS(np.asarray(d.endog), add_constant(np.asarray(d.exog), prepend=True)).fit()
    same("ols-longley: fit on statsmodels.datasets.longley arrays (rel 1e-10)",
         r2.cov_params(), c["covParams"], rel=1e-10)


def check_coint():
    doc, s = load("coint")
    for c in spot(doc["cases"]):
        X = np.column_stack([s[i] for i in c["x"]])
        out = coint(s[c["y"]], X, trend={"const": "c", "trend": "ct", "none": "n"}[c["deterministic"]],
                    maxlag=c["maxLags"], autolag=None if isinstance(c["lags"], int) else
                    {"aic": "aic", "bic": "bic", "tstat": "t-stat"}[c["lags"]])
        same(f"coint {c['y']} on {c['x']} {c['deterministic']} {c['lags']}: fresh call",
             [out[0], out[1]], [c["statistic"], c["pValue"]])
    for c in doc["cases"]:
        if c["deterministic"] != "none":
            T, k = len(s[c["y"]]), len(c["x"]) + 1
            crit = mackinnoncrit(N=k, regression={"const": "c", "trend": "ct"}[c["deterministic"]],
                                 nobs=T - 1)
            assert np.array_equal(crit, [c["critical"]["1%"], c["critical"]["5%"], c["critical"]["10%"]])
    print("ok  coint critical values use nobs = T - 1 on all cases")


def johansen_eigenvalues(y, K, level_lag, constant):
    """Reduced-rank regression of dy[t] on y[t - level_lag], after partialling out the
    K lagged differences and (if `constant`) a constant from both blocks."""
    dy = np.diff(y, axis=0)
    T = dy.shape[0] - K
    cols = [dy[K - j:K - j + T] for j in range(1, K + 1)] + ([np.ones((T, 1))] if constant else [])
    Z = np.column_stack(cols) if cols else np.zeros((T, 0))
    def resid(A):
        return A - Z @ np.linalg.lstsq(Z, A, rcond=None)[0] if Z.shape[1] else A
    t = np.arange(K + 1, y.shape[0])  # time index of each dy[t] kept
    r0, r1 = resid(dy[K:]), resid(y[t - level_lag])
    s00, s11, s01 = r0.T @ r0 / T, r1.T @ r1 / T, r0.T @ r1 / T
    m = np.linalg.solve(s11, s01.T @ np.linalg.solve(s00, s01))
    return np.sort(np.linalg.eigvals(m).real)[::-1]


def check_johansen():
    doc, s = load("johansen")
    for c in spot(doc["cases"]):
        y = np.column_stack([s[i] for i in c["series"]])
        r = coint_johansen(y, {"none": -1, "constant": 0}[c["deterministic"]], c["lagDiffs"])
        same(f"johansen {len(c['series'])} vars {c['deterministic']} K={c['lagDiffs']}: fresh call",
             [r.lr1, r.lr2], [c["trace"], c["maxEigen"]])
    for c in doc["cases"]:
        y = np.column_stack([s[i] for i in c["series"]])
        K, const = c["lagDiffs"], c["deterministic"] == "constant"
        # coint_johansen: level lagged K periods (y[t] itself when K = 0).
        assert np.allclose(johansen_eigenvalues(y, K, K, const), c["eigenvalues"], rtol=1e-7, atol=1e-10)
        # levelLagOne: the usual y[t-1] form.
        assert np.allclose(johansen_eigenvalues(y, K, 1, const), c["levelLagOne"]["eigenvalues"],
                           rtol=1e-7, atol=1e-10)
        assert c["sameAsLevelLagOne"] == (K >= 1)
    print(f"ok  johansen: constant partialled out of both blocks; level lagged K periods "
          f"(K = 0 pairs dy[t] with y[t]); levelLagOne uses y[t-1]; {len(doc['cases'])} cases")


def check_granger(name="granger"):
    doc, s = load(name)
    c = doc["cases"][0]
    r = grangercausalitytests(np.column_stack([s[c["effect"]], s[c["cause"]]]), maxlag=4, verbose=False)
    same(f"granger {c['cause']} -> {c['effect']}: fresh call",
         [r[L][0]["ssr_ftest"][0] for L in range(1, 5)], [x["fStatistic"] for x in c["lags"]])
    for c in doc["cases"]:
        e, g = s[c["effect"]], s[c["cause"]]
        for x in c["lags"]:
            L, T = x["lag"], len(e)
            own = [e[L - j:T - j] for j in range(1, L + 1)]
            other = [g[L - j:T - j] for j in range(1, L + 1)]
            y = e[L:]
            ssr_r = np.sum(ols(y, np.column_stack(own + [np.ones(T - L)]))[1] ** 2)
            ssr_u = np.sum(ols(y, np.column_stack(own + other + [np.ones(T - L)]))[1] ** 2)
            f = (ssr_r - ssr_u) / L / (ssr_u / (T - L - 2 * L - 1))
            assert abs(f - x["fStatistic"]) < 1e-8 * max(1, f), (c["cause"], L)
    print(f"ok  {name}: each lag order on its own sample of T - p rows, re-derived")


def check_granger_levels():
    check_granger("granger-levels")


def check_var_select():
    doc, s = load("var-select")
    c = doc["cases"][-1]
    sel = VAR(np.column_stack([s[i] for i in c["series"]])).select_order(c["maxLags"], trend="c")
    same(f"var-select {c['series']}: fresh call aic", sel.ics["aic"], c["ics"]["aic"])
    for c in doc["cases"]:
        y = np.column_stack([s[i] for i in c["series"]])
        M, K = c["maxLags"], y.shape[1]
        n = y.shape[0] - M  # every order is fitted on the same last T - M rows
        for p in range(0, M + 1):
            X = np.column_stack([np.ones(n)] + [y[M - j:M - j + n] for j in range(1, p + 1)])
            E = y[M:] - X @ np.linalg.lstsq(X, y[M:], rcond=None)[0]
            ld = np.linalg.slogdet(E.T @ E / n)[1]
            free = p * K * K + K
            aic, bic = ld + 2 * free / n, ld + np.log(n) * free / n
            hq = ld + 2 * np.log(np.log(n)) * free / n
            fpe = ((n + K * p + 1) / (n - K * p - 1)) ** K * np.exp(ld)
            got = [c["ics"][k][p] for k in ("aic", "bic", "hqic", "fpe")]
            assert np.allclose(got, [aic, bic, hq, fpe], rtol=1e-9), (c["series"], p)
    print("ok  var-select criteria re-derived: common sample of T - maxLags rows, p = 0..maxLags")


def check_var_wald():
    doc, s = load("var-wald")
    c = doc["cases"][-1]
    fit = VAR(np.column_stack([s[i] for i in c["series"]])).fit(c["lagsFitted"], trend="c")
    idx = c["restriction"]["vecIndex"]
    b = np.asarray(fit.params).T.ravel(order="F")[idx]  # vec(B) with B = params.T
    stat = b @ np.linalg.solve(np.asarray(fit.cov_params())[np.ix_(idx, idx)], b)
    same(f"var-wald {c['cause']} -> {c['effect']} p={c['p']}: fresh fit", [stat, stats.chi2.sf(stat, c["df"])],
         [c["statistic"], c["pValue"]], rel=1e-12)


def za_by_hand(x, lags, kind, trim=0.15):
    """Own Zivot-Andrews search; dummies use the break index as the last pre-break point."""
    n = len(x)
    dx = np.diff(x)
    t_idx = np.arange(lags + 1, n)  # time index of each left-hand Δx_t
    best = (np.inf, None)
    for tb in range(int(n * trim), n - int(n * trim)):
        cols = [np.ones(len(t_idx)), t_idx.astype(float), x[t_idx - 1]]
        if kind in ("level", "both"):
            cols.append((t_idx > tb).astype(float))
        if kind in ("slope", "both"):
            cols.append(np.maximum(t_idx - tb, 0).astype(float))
        cols += [dx[t_idx - 1 - j] for j in range(1, lags + 1)]
        tstat = ols(dx[t_idx - 1], np.column_stack(cols))[2][2]
        if tstat < best[0]:
            best = (tstat, tb)
    return best


def check_zivot_andrews():
    doc, s = load("zivot-andrews")
    for c in spot(doc["cases"]):
        out = zivot_andrews(s[c["series"]].copy(), trim=c["trim"], maxlag=c["maxLags"],
                            regression={"level": "c", "slope": "t", "both": "ct"}[c["breakIn"]],
                            autolag="AIC" if c["lags"] == "aic" else None)
        same(f"zivot-andrews {c['series']} {c['breakIn']} {c['lags']}: fresh call",
             [out[0], out[1], out[4]], [c["statistic"], c["pValue"], c["breakIndex"]])
    for c in doc["cases"]:
        if c["lags"] != 2:
            continue
        stat, tb = za_by_hand(s[c["series"]], 2, c["breakIn"])
        shift = 1 if c["breakIn"] == "slope" else 0
        assert abs(stat - c["statistic"]) < 1e-8 * abs(stat), (c, stat)
        assert tb + shift == c["breakIndex"], (c, tb)
    print("ok  zivot-andrews break dummies re-derived (slope model reports last pre-break point + 1)")


if __name__ == "__main__":
    for check in (check_adf, check_kpss, check_ols, check_coint, check_johansen, check_granger, check_granger_levels,
                  check_var_select, check_var_wald, check_zivot_andrews):
        check()
    print("all fixture checks passed")
