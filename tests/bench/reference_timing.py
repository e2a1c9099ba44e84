"""Times the reference library (Debian's python3-statsmodels) on the series the Mooring
benchmark hands it, so `npm run bench` can print the ratio of our time to its time.

Input: a JSON file {"adf": [[...series...]], "coint": [[y, x], ...], "johansen": [[[...], ...]]}.
Output: one JSON object on stdout with the median milliseconds per call of each routine.
Only the benchmark runs this; tests and CI never do.
"""
import json
import sys
import time
import warnings

import numpy as np
from statsmodels.tsa.stattools import adfuller, coint
from statsmodels.tsa.vector_ar.vecm import coint_johansen


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
    print(json.dumps(out))


if __name__ == "__main__":
    main()
