"""Granger causality, VAR lag-order selection and Toda-Yamamoto Wald reference cases."""
import numpy as np
from scipy import stats
from statsmodels.tsa.stattools import grangercausalitytests
from statsmodels.tsa.vector_ar.var_model import VAR

# (cause, effect) pairs for grangercausalitytests, both directions.
GRANGER_PAIRS = [
    ("var2_x", "var2_y"), ("var2_y", "var2_x"),
    ("macro_dlog_realgdp", "macro_dlog_realcons"), ("macro_dlog_realcons", "macro_dlog_realgdp"),
]

# (cause, effect) pairs of wandering levels, as given in data/macrodata.csv (no logs, no
# differences): the plain F test on the values, whatever the series do. Each pair names the
# file's columns too, so the command line can be run on the file itself.
GRANGER_LEVEL_PAIRS = [
    ("macro_realgdp", "macro_realcons"), ("macro_realcons", "macro_realgdp"),
]
MACRO_COLUMNS = {"macro_realgdp": "realgdp", "macro_realcons": "realcons"}

VAR_SELECT_SYSTEMS = [
    (["var2_x", "var2_y"], 8),
    (["macro_dlog_realgdp", "macro_dlog_realcons"], 8),
    (["dk_lrm", "dk_lry", "dk_lpy", "dk_ibo"], 4),
]

# Level pairs (column order of the VAR) for the Toda-Yamamoto cases; both directions run.
WALD_PAIRS = [("indep_a", "indep_b"), ("pair_x", "pair_y"), ("dk_lrm", "dk_lry")]


def _col(series, i):
    return np.asarray(series[i], dtype=float)


def granger_cases(series, pairs=GRANGER_PAIRS):
    cases = []
    for cause, effect in pairs:
        data = np.column_stack([_col(series, effect), _col(series, cause)])
        res = grangercausalitytests(data, maxlag=4, verbose=False)
        per_lag = []
        for lag in range(1, 5):
            r = res[lag][0]
            f, fp, df_denom, df_num = r["ssr_ftest"]
            c2, c2p, c2df = r["ssr_chi2test"]
            lr, lrp, lrdf = r["lrtest"]
            restricted, unrestricted = res[lag][1][0], res[lag][1][1]
            per_lag.append({
                "lag": lag, "nobs": int(unrestricted.nobs),
                "fStatistic": f, "pValue": fp, "dfNum": int(df_num), "dfDenom": int(df_denom),
                "chi2": {"statistic": c2, "pValue": c2p, "df": int(c2df)},
                "lr": {"statistic": lr, "pValue": lrp, "df": int(lrdf)},
                "ssrRestricted": restricted.ssr, "ssrUnrestricted": unrestricted.ssr,
            })
        cases.append({"cause": cause, "effect": effect, "lags": per_lag})
    return cases


def granger_level_cases(series):
    """grangercausalitytests on the macro levels as given, with the CSV columns they came from."""
    cases = granger_cases(series, GRANGER_LEVEL_PAIRS)
    for c in cases:
        c["file"] = "tests/reference/data/macrodata.csv"
        c["columns"] = {"cause": MACRO_COLUMNS[c["cause"]], "effect": MACRO_COLUMNS[c["effect"]]}
    return cases


def var_select_cases(series):
    cases = []
    for ids, maxlags in VAR_SELECT_SYSTEMS:
        data = np.column_stack([_col(series, i) for i in ids])
        sel = VAR(data).select_order(maxlags=maxlags, trend="c")
        cases.append({
            "series": ids, "maxLags": maxlags, "trend": "const",
            "nobs": data.shape[0] - maxlags,
            "selected": {"aic": sel.aic, "bic": sel.bic, "hq": sel.hqic, "fpe": sel.fpe},
            "ics": {k: sel.ics[k] for k in ("aic", "bic", "hqic", "fpe")},
        })
    return cases


def _wald_on_lags(fit, cause, effect, lags):
    """Wald chi-square that lags 1..lags of `cause` are zero in `effect`'s equation.

    Uses vec(B) ordering of statsmodels: params row r (constant first, then lag 1 of
    every variable, lag 2, ...), equation e, sits at position r * K + e of cov_params().
    """
    k = fit.neqs
    rows = [1 + k * (j - 1) + cause for j in range(1, lags + 1)]
    pos = [r * k + effect for r in rows]
    b = np.asarray(fit.params)[rows, effect]
    v = np.asarray(fit.cov_params())[np.ix_(pos, pos)]
    stat = float(b @ np.linalg.solve(v, b))
    return stat, rows, pos, b


def var_wald_cases(series):
    cases = []
    dmax = 1
    for a, b in WALD_PAIRS:
        ids = [a, b]
        data = np.column_stack([_col(series, i) for i in ids])
        for cause, effect in ((0, 1), (1, 0)):
            for p in (1, 2):
                fit = VAR(data).fit(maxlags=p + dmax, trend="c")
                assert fit.k_ar == p + dmax
                stat, rows, pos, coefs = _wald_on_lags(fit, cause, effect, p)
                pvalue = stats.chi2.sf(stat, p)
                # Cross-check on a VAR(p): all p lags, via statsmodels' own Wald test.
                fit_p = VAR(data).fit(maxlags=p, trend="c")
                check = fit_p.test_causality(effect, cause, kind="wald")
                own, _, _, _ = _wald_on_lags(fit_p, cause, effect, p)
                assert abs(own - check.test_statistic) <= 1e-9 * max(1.0, own), (a, b, p)
                cases.append({
                    "series": ids, "cause": ids[cause], "effect": ids[effect],
                    "p": p, "dmax": dmax, "lagsFitted": p + dmax, "trend": "const",
                    "nobs": int(fit.nobs),
                    "restriction": {
                        "equation": ids[effect], "variable": ids[cause],
                        "lags": list(range(1, p + 1)), "paramsRows": rows, "vecIndex": pos,
                    },
                    "coefficients": coefs,
                    "statistic": stat, "df": p, "pValue": pvalue,
                    "allLagsCheck": {
                        "lagsFitted": p, "nobs": int(fit_p.nobs),
                        "statistic": check.test_statistic, "pValue": check.pvalue,
                        "df": int(check.df),
                    },
                })
    return cases
