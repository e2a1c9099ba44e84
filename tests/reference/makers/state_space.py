"""The regression with a wandering intercept and slope: statsmodels' linear Gaussian state-space
model with a time-varying design [1, x_t], identity transition, state covariance Q I, observation
variance R and the exact diffuse initialisation (Durbin & Koopman 2012, ch. 5).

Fixed-variance cases give the filtered and smoothed states with their standard deviations, the
one-step-ahead errors and their variances, and the log-likelihood. Estimated cases give the
library's maximum of the log-likelihood over (Q, R), the best of several starting points.
"""
import numpy as np
from statsmodels.tsa.statespace.mlemodel import MLEModel

# (y, x, [(Q, R), ...]): fixed variances, then one estimated case per pair.
KALMAN_PAIRS = [
    ("macro_log_realcons", "macro_log_realgdp", [(1e-5, 1e-4), (1e-7, 1e-5)]),
    ("pair_y", "pair_x", [(1e-3, 1.0), (0.05, 0.5)]),
    ("dk_lrm", "dk_lry", [(1e-4, 1e-3)]),
]


class WanderingLine(MLEModel):
    """y_t = a_t + b_t x_t + e_t; (a, b) random walks with covariance Q I; params (Q, R)."""

    def __init__(self, y, x):
        super().__init__(np.asarray(y, dtype=float), k_states=2, k_posdef=2,
                         initialization="diffuse")
        n = len(y)
        design = np.zeros((1, 2, n))
        design[0, 0, :] = 1.0
        design[0, 1, :] = np.asarray(x, dtype=float)
        self.ssm["design"] = design
        self.ssm["transition"] = np.eye(2)
        self.ssm["selection"] = np.eye(2)

    @property
    def start_params(self):
        return np.array([1e-4, 1e-2])

    @property
    def param_names(self):
        return ["stateVar", "obsVar"]

    def transform_params(self, unconstrained):
        return np.exp(unconstrained)

    def untransform_params(self, constrained):
        return np.log(constrained)

    def update(self, params, **kwargs):
        params = super().update(params, **kwargs)
        self.ssm["state_cov"] = np.eye(2) * params[0]
        self.ssm["obs_cov"] = np.array([[params[1]]])


def _std(covs):
    """sqrt of the diagonal of a (2, 2, n) covariance array, as (2, n)."""
    return np.sqrt(np.maximum(np.stack([covs[0, 0, :], covs[1, 1, :]]), 0.0))


def _fixed_case(series, y_id, x_id, q, r):
    mod = WanderingLine(series[y_id], series[x_id])
    res = mod.smooth(np.array([q, r]))
    return {
        "y": y_id, "x": x_id, "kind": "fixed", "stateVar": q, "obsVar": r,
        "logLikelihood": res.llf,
        "nobsDiffuse": int(res.filter_results.nobs_diffuse),
        "filteredIntercept": res.filtered_state[0], "filteredSlope": res.filtered_state[1],
        "filteredInterceptStd": _std(res.filtered_state_cov)[0],
        "filteredSlopeStd": _std(res.filtered_state_cov)[1],
        "smoothedIntercept": res.smoothed_state[0], "smoothedSlope": res.smoothed_state[1],
        "smoothedInterceptStd": _std(res.smoothed_state_cov)[0],
        "smoothedSlopeStd": _std(res.smoothed_state_cov)[1],
        "forecastError": res.forecasts_error[0],
        "forecastErrorVar": res.forecasts_error_cov[0, 0, :],
    }


def _estimated_case(series, y_id, x_id):
    mod = WanderingLine(series[y_id], series[x_id])
    y = np.asarray(series[y_id], dtype=float)
    scale = np.var(np.diff(y))
    best = None
    # Several starts over four orders of magnitude of the ratio Q / R; Nelder-Mead, then BFGS.
    for ratio in (1e-6, 1e-4, 1e-2, 1.0):
        for share in (0.1, 1.0):
            start = np.array([ratio * share * scale, share * scale])
            fit = mod.fit(start_params=start, method="nm", maxiter=4000, disp=False)
            fit = mod.fit(start_params=fit.params, method="bfgs", maxiter=2000, disp=False)
            if best is None or fit.llf > best.llf:
                best = fit
    return {"y": y_id, "x": x_id, "kind": "estimated", "stateVar": best.params[0],
            "obsVar": best.params[1], "logLikelihood": best.llf}


def kalman_cases(series):
    cases = []
    for y_id, x_id, fixed in KALMAN_PAIRS:
        for q, r in fixed:
            cases.append(_fixed_case(series, y_id, x_id, q, r))
        cases.append(_estimated_case(series, y_id, x_id))
    return cases
