"""Times the reference library (Debian's python3-statsmodels) on the series the Mooring
benchmark hands it, so `npm run bench` can print the ratio of our time to its time.

Input: a JSON file {"adf": [[...series...]], "coint": [[y, x], ...], "johansen": [[[...], ...]],
"kalman": [[y, x]], "vecm": [[[...], ...]], "kpss": [[...]], "granger": [[cause, effect]],
"zivotAndrews": [[...]], "ardl": [[y, x]]}.
Output: one JSON object on stdout with the median milliseconds per call of each routine.
Only the benchmark runs this; tests and CI never do.
"""
import json
import sys
import time
import warnings

import numpy as np
from statsmodels.tsa.api import VAR
from statsmodels.tsa.ardl import UECM
from statsmodels.tsa.stattools import adfuller, coint, grangercausalitytests, kpss, zivot_andrews
from statsmodels.tsa.statespace.mlemodel import MLEModel
from statsmodels.tsa.vector_ar.vecm import VECM, coint_johansen


class WanderingLine(MLEModel):
    """y_t = a_t + b_t x_t + e_t, (a, b) random walks with covariance Q I, exact diffuse start
    (the model of tests/reference/makers/state_space.py); params (Q, R) in logs."""

    def __init__(self, y, x):
        super().__init__(y, k_states=2, k_posdef=2, initialization="diffuse")
        design = np.zeros((1, 2, len(y)))
        design[0, 0, :] = 1.0
        design[0, 1, :] = x
        self.ssm["design"] = design
        self.ssm["transition"] = np.eye(2)
        self.ssm["selection"] = np.eye(2)

    @property
    def start_params(self):
        return np.array([1e-4, 1.0])

    def transform_params(self, unconstrained):
        return np.exp(unconstrained)

    def untransform_params(self, constrained):
        return np.log(constrained)

    def update(self, params, **kwargs):
        params = super().update(params, **kwargs)
        self.ssm["state_cov"] = np.eye(2) * params[0]
        self.ssm["obs_cov"] = np.array([[params[1]]])


def median_ms(task, runs):
    task()
    times = []
    for _ in range(runs):
        start = time.perf_counter()
        task()
        times.append((time.perf_counter() - start) * 1000.0)
    times.sort()
    return times[len(times) // 2]


def main():
    spec = json.load(open(sys.argv[1]))
    out = {}
    warnings.simplefilter("ignore")
    if spec.get("adf"):
        x = np.asarray(spec["adf"][0])
        out["adfullerAicMs"] = median_ms(lambda: adfuller(x, regression="c", autolag="AIC"), 10)
    if spec.get("coint"):
        y, x = (np.asarray(v) for v in spec["coint"][0])
        out["cointAicMs"] = median_ms(lambda: coint(y, x, trend="c", autolag="aic"), 10)
    if spec.get("johansen"):
        block = np.column_stack([np.asarray(v) for v in spec["johansen"][0]])
        out["cointJohansenMs"] = median_ms(lambda: coint_johansen(block, 0, 2), 10)
    if spec.get("kalman"):
        y, x = (np.asarray(v) for v in spec["kalman"][0])
        # One maximum-likelihood fit from the default start, then the smoother at the estimate:
        # the work `movingHedge` does (ours also searches a grid first).
        model = WanderingLine(y, x)
        out["kalmanMlMs"] = median_ms(lambda: model.smooth(model.fit(disp=False).params), 5)
    if spec.get("vecm"):
        block = np.column_stack([np.asarray(v) for v in spec["vecm"][0]])
        # Fit and forecast, as vecmForecast does: K = 2, rank 1, constant outside ("co"), 20 steps.
        out["vecmForecastMs"] = median_ms(
            lambda: VECM(block, k_ar_diff=2, coint_rank=1, deterministic="co").fit().predict(steps=20, alpha=0.05), 10)
    if spec.get("kpss"):
        x = np.asarray(spec["kpss"][0])
        out["kpssAutoMs"] = median_ms(lambda: kpss(x, regression="c", nlags="auto"), 30)
    if spec.get("granger"):
        cause, effect = (np.asarray(v) for v in spec["granger"][0])
        data = np.column_stack([effect, cause])
        out["grangerLags1to4Ms"] = median_ms(lambda: grangercausalitytests(data, maxlag=4, verbose=False), 10)
        out["varOrderMs"] = median_ms(lambda: VAR(np.column_stack([cause, effect])).select_order(maxlags=27), 10)
    if spec.get("zivotAndrews"):
        x = np.asarray(spec["zivotAndrews"][0])
        out["zivotAndrewsMs"] = median_ms(lambda: zivot_andrews(x, trim=0.15, regression="c", autolag="AIC"), 3)
    if spec.get("ardl"):
        y, x = (np.asarray(v) for v in spec["ardl"][0])
        exog = x.reshape(-1, 1)
        # ARDL(2, 2) in levels, case 3 (a free constant): the fit and the bounds test, as
        # Mooring's ardlBoundsTest with --lags 2 --order 2 --case 3 does.
        out["uecmBoundsMs"] = median_ms(lambda: UECM(y, 2, exog, 2, trend="c").fit().bounds_test(3), 10)
    print(json.dumps(out))


if __name__ == "__main__":
    main()
