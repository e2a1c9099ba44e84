"""OLS on the Longley (1967) data, as shipped in statsmodels.datasets.longley."""
import numpy as np
from statsmodels.datasets import longley
from statsmodels.regression.linear_model import OLS
from statsmodels.tools.tools import add_constant

LONGLEY_REGRESSORS = ["GNPDEFL", "GNP", "UNEMP", "ARMED", "POP", "YEAR"]


def longley_series():
    """TOTEMP and the six regressors, ids prefixed with longley_."""
    d = longley.load_pandas()
    out = {"longley_TOTEMP": np.asarray(d.endog, dtype=float)}
    for name in LONGLEY_REGRESSORS:
        out[f"longley_{name}"] = np.asarray(d.exog[name], dtype=float)
    return out


def ols_cases(series):
    y = series["longley_TOTEMP"]
    X = add_constant(np.column_stack([series[f"longley_{n}"] for n in LONGLEY_REGRESSORS]),
                     prepend=True)
    r = OLS(y, X).fit()
    return [{
        "y": "longley_TOTEMP",
        "x": [f"longley_{n}" for n in LONGLEY_REGRESSORS],
        "regressors": ["const"] + LONGLEY_REGRESSORS,
        "params": r.params, "bse": r.bse, "tvalues": r.tvalues, "pvalues": r.pvalues,
        "ssr": r.ssr, "scale": r.scale, "llf": r.llf, "aic": r.aic, "bic": r.bic,
        "rsquared": r.rsquared, "rsquaredAdj": r.rsquared_adj,
        "fStatistic": r.fvalue, "fPValue": r.f_pvalue,
        "nobs": int(r.nobs), "dfResid": int(r.df_resid), "dfModel": int(r.df_model),
        "covParams": [row for row in r.cov_params()],
        "conditionNumber": r.condition_number,
    }]
