"""ADF, KPSS and Zivot-Andrews reference cases from statsmodels 0.13.5."""
import warnings

import numpy as np
from statsmodels.tools.sm_exceptions import InterpolationWarning
from statsmodels.tsa.stattools import adfuller, kpss, zivot_andrews

# Our names for the deterministic terms and lag rules, mapped to statsmodels' codes.
ADF_TERMS = {"none": "n", "const": "c", "trend": "ct"}
LAG_RULES = {"aic": "AIC", "bic": "BIC", "tstat": "t-stat"}
KPSS_TERMS = {"const": "c", "trend": "ct"}
# Zivot-Andrews: where the break is allowed (level, slope or both).
ZA_BREAKS = {"level": "c", "slope": "t", "both": "ct"}


def default_adf_ceiling(nobs, terms):
    """The lag ceiling adfuller uses when maxlag is None (Schwert's rule, capped)."""
    ntrend = {"n": 0, "c": 1, "ct": 2}[terms]
    ceiling = int(np.ceil(12.0 * np.power(nobs / 100.0, 1 / 4.0)))
    return min(nobs // 2 - ntrend - 1, ceiling)


def _crit3(d):
    return {"1%": d["1%"], "5%": d["5%"], "10%": d["10%"]}


def adf_cases(series, ids):
    cases = []
    for sid in ids:
        x = np.asarray(series[sid], dtype=float)
        for ours, code in ADF_TERMS.items():
            for rule, sm_rule in LAG_RULES.items():
                for maxlag in (None, 4):
                    stat, p, used, nobs, crit, icbest = adfuller(
                        x.copy(), maxlag=maxlag, regression=code, autolag=sm_rule
                    )
                    searched = default_adf_ceiling(len(x), code) if maxlag is None else maxlag
                    cases.append({
                        "series": sid, "deterministic": ours, "lags": rule,
                        "maxLags": maxlag, "maxLagsSearched": searched,
                        "statistic": stat, "pValue": p, "usedLags": used, "nobs": nobs,
                        "critical": _crit3(crit), "icBest": icbest,
                    })
            for lags in (0, 1, 3):
                stat, p, used, nobs, crit = adfuller(
                    x.copy(), maxlag=lags, regression=code, autolag=None
                )
                assert used == lags
                cases.append({
                    "series": sid, "deterministic": ours, "lags": lags,
                    "maxLags": None, "maxLagsSearched": None,
                    "statistic": stat, "pValue": p, "usedLags": used, "nobs": nobs,
                    "critical": _crit3(crit),
                })
    return cases


def kpss_cases(series, ids):
    cases = []
    for sid in ids:
        x = np.asarray(series[sid], dtype=float)
        for ours, code in KPSS_TERMS.items():
            for lags in ("auto", "legacy", 0, 4, 10):
                with warnings.catch_warnings(record=True) as caught:
                    warnings.simplefilter("always")
                    stat, p, bandwidth, crit = kpss(x.copy(), regression=code, nlags=lags)
                warned = any(issubclass(w.category, InterpolationWarning) for w in caught)
                table = [crit["10%"], crit["1%"]]
                beyond = bool(stat < table[0] or stat > table[1])
                # statsmodels warns when the interpolated p-value sits on a table end,
                # which includes a statistic exactly on an end point.
                assert warned == (beyond or stat in table), (sid, ours, lags)
                cases.append({
                    "series": sid, "deterministic": ours, "lags": lags,
                    "statistic": stat, "pValue": p, "pValueBeyondTable": beyond,
                    "bandwidth": bandwidth, "nobs": len(x),
                    "critical": {k: crit[k] for k in ("10%", "5%", "2.5%", "1%")},
                })
    return cases


def zivot_andrews_cases(series, ids):
    cases = []
    settings = (("aic", None), ("aic", 4), (2, 2))
    for sid in ids:
        x = np.asarray(series[sid], dtype=float)
        for ours, code in ZA_BREAKS.items():
            for lags, maxlag in settings:
                autolag = "AIC" if lags == "aic" else None
                # zivot_andrews rescales its input array in place: always pass a copy.
                stat, p, crit, used, bp = zivot_andrews(
                    x.copy(), trim=0.15, maxlag=maxlag, regression=code, autolag=autolag
                )
                cases.append({
                    "series": sid, "breakIn": ours, "trim": 0.15, "lags": lags,
                    "maxLags": maxlag, "statistic": stat, "pValue": p,
                    "critical": _crit3(crit), "usedLags": used, "breakIndex": bp,
                })
    return cases
