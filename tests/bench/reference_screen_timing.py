"""Times the reference library (Debian's python3-statsmodels) on the pair screen's work, so
`npm run bench` can print the ratio of the screen's time to its time.

Input: a JSON file {"series": [[...], ...], "pairs": [[y, x], ...], "totalPairs": 2450}: the
screen's series, a sample of directed pairs (indices of y and x), and how many directed
pairs the full screen tests. Each sampled pair is timed once with coint(y, x, trend="c",
autolag="aic") after one warm-up call; the full screen's time is extrapolated as the mean
time per pair times totalPairs (timing all 2,450 would take minutes).
Output: one JSON object on stdout. Only the benchmark runs this; tests and CI never do.
"""
import json
import sys
import time
import warnings

import numpy as np
from statsmodels.tsa.stattools import coint


def main():
    spec = json.load(open(sys.argv[1]))
    warnings.simplefilter("ignore")
    series = [np.asarray(s, dtype=float) for s in spec["series"]]
    pairs = spec["pairs"]
    y0, x0 = pairs[0]
    coint(series[y0], series[x0], trend="c", autolag="aic")
    times = []
    p_values = []
    for y, x in pairs:
        start = time.perf_counter()
        result = coint(series[y], series[x], trend="c", autolag="aic")
        times.append((time.perf_counter() - start) * 1000.0)
        p_values.append(float(result[1]))
    mean_ms = sum(times) / len(times)
    ordered = sorted(times)
    print(json.dumps({
        "sampledPairs": len(pairs),
        "meanMsPerPair": mean_ms,
        "medianMsPerPair": ordered[len(ordered) // 2],
        "totalPairs": spec["totalPairs"],
        "extrapolatedMs": mean_ms * spec["totalPairs"],
        "pValues": p_values,
    }))


if __name__ == "__main__":
    main()
