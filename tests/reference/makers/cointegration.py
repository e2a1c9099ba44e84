"""Engle-Granger (coint) and Johansen (coint_johansen) reference cases."""
import numpy as np
from statsmodels.regression.linear_model import OLS
from statsmodels.tsa.stattools import adfuller, coint
from statsmodels.tsa.tsatools import add_trend
from statsmodels.tsa.vector_ar import vecm
from statsmodels.tsa.vector_ar.vecm import coint_johansen

COINT_TERMS = {"const": "c", "trend": "ct", "none": "n"}
COINT_LAG_RULES = (("aic", "aic", None), ("bic", "bic", None), ("tstat", "t-stat", None),
                   (2, None, 2))

# (dependent, [regressors]) for the Engle-Granger cases.
COINT_REGRESSIONS = [
    ("pair_y", ["pair_x"]),
    ("pair_x", ["pair_y"]),
    ("triple_y", ["triple_x1", "triple_x2"]),
    ("indep_a", ["indep_b"]),
    ("dk_lrm", ["dk_lry"]),
    ("macro_log_realcons", ["macro_log_realgdp"]),
    ("macro_log_realgdp", ["macro_log_realcons"]),
]

JOHANSEN_TERMS = {"none": -1, "constant": 0}
JOHANSEN_SYSTEMS = [
    ["sys3_y1", "sys3_y2", "sys3_y3"],
    ["sys4_y1", "sys4_y2", "sys4_y3", "sys4_y4"],
    ["indep_a", "indep_b"],
    ["dk_lrm", "dk_lry", "dk_lpy", "dk_ibo"],
    ["dk_lrm", "dk_lry", "dk_lpy", "dk_ibo", "dk_ide"],
]


def coint_cases(series):
    cases = []
    for dep, regs in COINT_REGRESSIONS:
        y = np.asarray(series[dep], dtype=float)
        X = np.column_stack([np.asarray(series[r], dtype=float) for r in regs])
        for ours, code in COINT_TERMS.items():
            for lags, autolag, maxlag in COINT_LAG_RULES:
                stat, p, crit = coint(y.copy(), X.copy(), trend=code, maxlag=maxlag,
                                      autolag=autolag)
                # Step 1 again by hand: regressors first, then constant, then trend 1..T.
                exog = X if code == "n" else add_trend(X, trend=code, prepend=False)
                step1 = OLS(y, exog).fit()
                adf = adfuller(step1.resid, maxlag=maxlag, autolag=autolag, regression="n")
                assert abs(adf[0] - stat) <= 1e-12 * max(1.0, abs(stat)), (dep, ours, lags)
                k = X.shape[1]
                params = step1.params
                cases.append({
                    "y": dep, "x": regs, "deterministic": ours, "lags": lags,
                    "maxLags": maxlag, "statistic": stat, "pValue": p,
                    "critical": {"1%": crit[0], "5%": crit[1], "10%": crit[2]},
                    "usedLags": adf[2], "nobs": adf[3],
                    "beta": params[:k],
                    "intercept": None if code == "n" else params[k],
                    "trendCoefficient": params[k + 1] if code == "ct" else None,
                    "residualSsr": step1.ssr,
                })
    return cases


def _levels(d):
    return {"10%": d[0], "5%": d[1], "1%": d[2]}


def _lag_one_form(data, det_order, k_ar_diff):
    """Eigenvalues and statistics with the level lagged one period (Lutkepohl 2005, ch. 7).

    coint_johansen pairs the differences with the level lagged k_ar_diff periods. For
    k_ar_diff >= 1 the lagged differences absorb the gap and the numbers agree with the
    usual y[t-1] form; for k_ar_diff = 0 it pairs dy[t] with y[t] itself and they do not
    (statsmodels issue 7459). statsmodels' VECM code builds the y[t-1] form; we read
    its eigenvalues from the same private helpers VECM.fit uses.
    """
    det = "n" if det_order == -1 else "co"  # "co": constant outside the cointegrating relation
    _, delta_y, y_lag1, delta_x = vecm._endog_matrices(data.T, None, None, k_ar_diff, det)
    eig = np.sort(np.real(vecm._sij(delta_x, delta_y, y_lag1)[5]))[::-1]
    t = y_lag1.shape[1]
    trace = np.array([-t * np.sum(np.log(1.0 - eig[i:])) for i in range(len(eig))])
    return {"eigenvalues": eig, "trace": trace, "maxEigen": -t * np.log(1.0 - eig),
            "nobs": t}


def johansen_cases(series):
    cases = []
    for ids in JOHANSEN_SYSTEMS:
        data = np.column_stack([np.asarray(series[i], dtype=float) for i in ids])
        for ours, det_order in JOHANSEN_TERMS.items():
            for k_ar_diff in (0, 1, 2):
                res = coint_johansen(data.copy(), det_order=det_order, k_ar_diff=k_ar_diff)
                eig = np.asarray(res.eig)
                evec = np.asarray(res.evec)
                assert np.all(np.isreal(eig)) and np.all(np.isreal(evec))
                eig, evec = eig.real, evec.real
                assert np.all(np.abs(evec[0, :]) > 1e-8), "first element too small to normalise"
                beta = evec / evec[0, :]
                nobs = res.rkt.shape[0]
                assert nobs == data.shape[0] - k_ar_diff - 1
                lag_one = _lag_one_form(data, det_order, k_ar_diff)
                agrees = bool(np.allclose(lag_one["eigenvalues"], eig, rtol=1e-8, atol=1e-12))
                assert agrees == (k_ar_diff >= 1), (ids, ours, k_ar_diff)
                cases.append({
                    "series": ids, "deterministic": ours, "lagDiffs": k_ar_diff,
                    "nobs": nobs, "eigenvalues": eig, "trace": res.lr1, "maxEigen": res.lr2,
                    "traceCritical": [_levels(row) for row in res.cvt],
                    "maxEigenCritical": [_levels(row) for row in res.cvm],
                    # beta[j] is the j-th eigenvector scaled so its first entry is 1.
                    "beta": [beta[:, j] for j in range(beta.shape[1])],
                    # as returned: columns scaled so that v' S11 v = 1, sign set by evec[0, 0].
                    "eigenvectors": [evec[:, j] for j in range(evec.shape[1])],
                    "levelLagOne": lag_one,
                    "sameAsLevelLagOne": agrees,
                })
    return cases
