#!/usr/bin/python3
"""Generates Mooring's reference fixtures from Debian's python3-statsmodels 0.13.5.

Run with `npm run fixtures` (or /usr/bin/python3 tests/reference/make_fixtures.py).
Reads the two datasets in tests/reference/data/, simulates the seeded series, calls
statsmodels and writes one JSON file per test family into tests/reference/fixtures/.
The output is the same on every run. See tests/reference/README.md for the contract.
"""
import os
import sys
import time

sys.dont_write_bytecode = True  # keep __pycache__ out of the source tree

import statsmodels  # noqa: E402

from makers import ardl, causality, cointegration, forecast, multitest, regression, state_space, unit_root  # noqa: E402
from makers.json_out import pick_series, write_fixture  # noqa: E402
from makers.series import UNIVARIATE, all_series  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
OUT_DIR = os.path.join(HERE, "fixtures")

ZA_SERIES = ["za_rw_250", "za_level_break_250", "za_slope_break_250"]


def _ids_from(cases, *keys):
    ids = []
    for c in cases:
        for k in keys:
            v = c[k]
            ids.extend(v if isinstance(v, list) else [v])
    return ids


def main():
    if not statsmodels.__version__.startswith("0.13.5"):
        sys.exit(f"expected statsmodels 0.13.5, found {statsmodels.__version__}: "
                 "apt-get install -y python3-statsmodels and run with /usr/bin/python3")
    os.makedirs(OUT_DIR, exist_ok=True)
    series, seeds = all_series()
    started = time.perf_counter()
    written = []

    def emit(name, cases, keys, source=None, extra=None):
        src = source if source is not None else series
        used = pick_series(src, _ids_from(cases, *keys))
        written.append(write_fixture(OUT_DIR, name, used, cases, extra))

    sim_seeds = {"seeds": seeds}
    emit("adf", unit_root.adf_cases(series, UNIVARIATE), ["series"], extra=sim_seeds)
    emit("kpss", unit_root.kpss_cases(series, UNIVARIATE), ["series"], extra=sim_seeds)
    longley = regression.longley_series()
    emit("ols-longley", regression.ols_cases(longley), ["y", "x"], source=longley)
    emit("coint", cointegration.coint_cases(series), ["y", "x"], extra=sim_seeds)
    emit("johansen", cointegration.johansen_cases(series), ["series"], extra=sim_seeds)
    emit("granger", causality.granger_cases(series), ["effect", "cause"], extra=sim_seeds)
    emit("granger-levels", causality.granger_level_cases(series), ["effect", "cause"])
    emit("var-select", causality.var_select_cases(series), ["series"], extra=sim_seeds)
    emit("var-wald", causality.var_wald_cases(series), ["series"], extra=sim_seeds)
    emit("zivot-andrews", unit_root.zivot_andrews_cases(series, ZA_SERIES), ["series"],
         extra=sim_seeds)
    emit("kalman", state_space.kalman_cases(series), ["y", "x"], extra=sim_seeds)
    emit("vecm-forecast", forecast.forecast_cases(series), ["series"], extra=sim_seeds)
    ardl_source = {**series, **ardl.ardl_series()}
    emit("ardl-bounds", ardl.ardl_cases(ardl_source), ["y", "x"], source=ardl_source,
         extra={"seeds": {**seeds, "ardl": ardl.ARDL_SEED}})
    fdr_series, fdr_cases = multitest.fdr_cases()
    emit("fdr-bh", fdr_cases, ["series"], source=fdr_series,
         extra={"seeds": {"fdr_fixed_40": multitest.FIXED_SEED}})

    for path, size, n in written:
        print(f"{os.path.relpath(path, HERE):32s} {size:>9,d} bytes {n:>5d} cases")
    print(f"done in {time.perf_counter() - started:.1f} s")


if __name__ == "__main__":
    main()
