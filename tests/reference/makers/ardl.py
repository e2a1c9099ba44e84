"""The bounds test of Pesaran, Shin & Smith (2001) in its error-correction (UECM) form.

For each case 1..5 and several inputs with fixed orders (P lags of y in levels, Q_j of each x),
the library's UECM fit gives the coefficients, the t-ratio of y's lagged level, the long-run
coefficients with their delta-method standard errors (ci_params, ci_bse), and bounds_test gives
the F statistic. The library's reported bounds and p-values are kept too, with the key it looked
them up at: 0.13.5 passes the number of level variables including y (k + 1) where its tables
are keyed by the number of regressors k, so the reported bounds belong to one regressor more.
The bounds of its own tables at the right key (k) are kept beside them.
"""
import numpy as np
import pandas as pd
from statsmodels.tsa.ardl import UECM, pss_critical_values

ARDL_SEED = 401
ARDL_N = 200

# (y, [x...], P, [Q...])
ARDL_INPUTS = [
    ("pair_y", ["pair_x"], 2, [2]),
    ("ardl_y", ["ardl_x1", "ardl_x2"], 3, [1, 2]),
    ("indep_a", ["indep_b"], 1, [1]),
    ("ardl_short_y", ["ardl_short_x1"], 2, [1]),
]


def ardl_series():
    """A mixed pair: x1 a random walk, x2 a stationary AR(1) (phi 0.5), and y adjusting to
    2 + 0.8 x1 + 0.5 x2 at speed 0.3 per row."""
    rng = np.random.default_rng(ARDL_SEED)
    n = ARDL_N
    x1 = np.cumsum(rng.standard_normal(n))
    x2 = np.zeros(n)
    y = np.zeros(n)
    e = rng.standard_normal((n, 2))
    for t in range(1, n):
        x2[t] = 0.5 * x2[t - 1] + e[t, 0]
        y[t] = y[t - 1] - 0.3 * (y[t - 1] - 2.0 - 0.8 * x1[t - 1] - 0.5 * x2[t - 1]) + 0.5 * e[t, 1]
    # a short sample (45 rows), where Mooring reads its small-sample bounds
    return {"ardl_y": y, "ardl_x1": x1, "ardl_x2": x2, "ardl_short_y": y[:45], "ardl_short_x1": x1[:45]}


TREND_OF_CASE = {1: "n", 2: "c", 3: "c", 4: "ct", 5: "ct"}


def ardl_cases(series):
    cases = []
    for y_id, x_ids, p, q in ARDL_INPUTS:
        y = pd.Series(np.asarray(series[y_id], dtype=float), name=y_id)
        exog = pd.DataFrame({x: np.asarray(series[x], dtype=float) for x in x_ids})
        k = len(x_ids)
        for case in (1, 2, 3, 4, 5):
            order = {x: q[j] for j, x in enumerate(x_ids)}
            res = UECM(y, p, exog, order, trend=TREND_OF_CASE[case]).fit()
            bt = res.bounds_test(case)
            ndet = res.model._blocks["deterministic"].shape[1]
            level_y = ndet
            reported_key = len(res.model.ardl_order)
            crit = bt.crit_vals
            cases.append({
                "y": y_id,
                "x": x_ids,
                "case": case,
                "lags": p,
                "order": q,
                "nobs": int(res.nobs),
                "names": list(res.model.exog_names),
                "params": np.asarray(res.params),
                "bse": np.asarray(res.bse),
                "fStatistic": float(bt.stat),
                "tStatistic": float(np.asarray(res.tvalues)[level_y]),
                "speed": float(np.asarray(res.params)[level_y]),
                "speedSe": float(np.asarray(res.bse)[level_y]),
                # ci_params = levels / pi_y: the x entries are minus the long-run coefficients
                "ciParams": np.asarray(res.ci_params),
                "ciBse": np.asarray(res.ci_bse),
                "libraryKey": reported_key,
                "libraryCriticalPercentiles": list(pss_critical_values.crit_percentiles),
                "libraryReportedLower": np.asarray(crit["lower"]),
                "libraryReportedUpper": np.asarray(crit["upper"]),
                "libraryReportedPValues": [float(bt.p_values["lower"]), float(bt.p_values["upper"])],
                "libraryRightKeyLower": np.asarray(pss_critical_values.crit_vals[(k, case, False)]),
                "libraryRightKeyUpper": np.asarray(pss_critical_values.crit_vals[(k, case, True)]),
            })
    return cases
