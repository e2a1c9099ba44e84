"""VECM forecasts: statsmodels' VECM (Johansen's maximum likelihood) fitted and run forward with
95% intervals, for each of Johansen's five deterministic cases.

Our case names map to statsmodels' `deterministic` codes as follows (co = constant outside the
relations, ci = constant inside, lo = linear trend outside, li = linear trend inside):
  none -> "n", restricted-constant -> "ci", constant -> "co",
  restricted-trend -> "coli" (constant outside, trend inside), trend -> "colo".
"""
import numpy as np
from statsmodels.tsa.vector_ar.vecm import VECM

CASE_CODES = {"none": "n", "restricted-constant": "ci", "constant": "co",
              "restricted-trend": "coli", "trend": "colo"}

# (series, lags K = k_ar_diff, rank, horizon)
FORECAST_SYSTEMS = [
    (["sys3_y1", "sys3_y2", "sys3_y3"], 1, 1, 8),
    (["sys3_y1", "sys3_y2", "sys3_y3"], 2, 1, 8),
    (["sys4_y1", "sys4_y2", "sys4_y3", "sys4_y4"], 1, 2, 6),
    (["dk_lrm", "dk_lry", "dk_lpy", "dk_ibo"], 1, 1, 8),
]


def forecast_cases(series):
    cases = []
    for ids, lags, rank, horizon in FORECAST_SYSTEMS:
        endog = np.column_stack([np.asarray(series[i], dtype=float) for i in ids])
        for ours, code in CASE_CODES.items():
            res = VECM(endog, k_ar_diff=lags, coint_rank=rank, deterministic=code).fit()
            fc, lower, upper = res.predict(steps=horizon, alpha=0.05)
            cases.append({
                "series": ids, "case": ours, "statsmodelsDeterministic": code, "lags": lags,
                "rank": rank, "horizon": horizon,
                "forecast": fc, "lower": lower, "upper": upper,
                "sigmaU": res.sigma_u, "alpha": res.alpha, "beta": res.beta,
                "gamma": res.gamma, "llf": res.llf,
            })
    return cases
