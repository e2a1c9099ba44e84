"""Benjamini-Hochberg (false-discovery-rate) reference cases: multipletests(p, method="fdr_bh").

Two vectors of raw p-values:
- "demo-screen-log": the Engle-Granger p-values of the pairs the screen ranks on the demo data
  in logs. The demo file (addin/demo/data/quennel-delta.csv, made by our seeded generator) has
  six series; TankPremium settles around its own mean (order 0), so the screen sets its pairs
  aside and ranks the 20 directed pairs of the other five. Each p-value comes from
  coint(y, x, trend="c", autolag="aic"), the screen's defaults, in the screen's pair order.
- "fixed-40": 40 fixed p-values from numpy.random.default_rng(401): 29 uniforms, 8 small ones
  (uniform times 0.01), a repeat of the fourth (a tie) and the bounds 0 and 1, shuffled.
"""
import csv
import os

import numpy as np
from statsmodels.stats.multitest import multipletests
from statsmodels.tsa.stattools import coint

HERE = os.path.dirname(os.path.abspath(__file__))
DEMO_CSV = os.path.join(HERE, "..", "..", "..", "addin", "demo", "data", "quennel-delta.csv")
DEMO_FILE = "addin/demo/data/quennel-delta.csv"
# The demo series the screen ranks with logs, in the file's column order (TankPremium is set aside).
DEMO_RANKED = ["GateGasoil", "DockDiesel", "HeavyFuel", "BunkerBlend", "BargeFreight"]
ALPHA = 0.05
FIXED_SEED = 401


def demo_log_series():
    """ln of each ranked demo column, ids demo_ln_<column>."""
    with open(DEMO_CSV, encoding="utf-8", newline="") as f:
        rows = list(csv.DictReader(f))
    return {f"demo_ln_{name}": np.log(np.array([float(r[name]) for r in rows])) for name in DEMO_RANKED}


def _directed_pairs(names):
    """The screen's order: unordered pairs (0,1), (0,2), ..., (1,2), ..., each as i on j then j on i."""
    out = []
    for i in range(len(names)):
        for j in range(i + 1, len(names)):
            out.append((names[i], names[j]))
            out.append((names[j], names[i]))
    return out


def _case(name, ids, pairs, p):
    p = np.asarray(p, dtype=float)
    reject, adjusted, _, _ = multipletests(p, alpha=ALPHA, method="fdr_bh")
    return {
        "name": name, "series": ids, "pairs": pairs, "method": "fdr_bh", "alpha": ALPHA,
        "pValues": p, "adjusted": adjusted, "rejected": reject,
    }


def fixed_p_values():
    """29 uniforms, 8 small values, a repeat of the fourth value (a tie), 0 and 1: 40, shuffled."""
    rng = np.random.default_rng(FIXED_SEED)
    p = np.concatenate([rng.uniform(size=29), 0.01 * rng.uniform(size=8)])
    return rng.permutation(np.concatenate([p, [p[3], 0.0, 1.0]]))


def fdr_cases():
    """Returns (series, cases): the inputs by id and one case per vector."""
    series = demo_log_series()
    pairs = _directed_pairs(DEMO_RANKED)
    p_demo = [coint(series[f"demo_ln_{y}"], series[f"demo_ln_{x}"], trend="c", autolag="aic")[1] for y, x in pairs]
    series["fdr_fixed_40"] = fixed_p_values()
    cases = [
        _case("demo-screen-log", [f"demo_ln_{n}" for n in DEMO_RANKED],
              [{"y": f"ln({y})", "x": f"ln({x})"} for y, x in pairs], p_demo),
        _case("fixed-40", ["fdr_fixed_40"], None, series["fdr_fixed_40"]),
    ]
    cases[0]["file"] = DEMO_FILE
    return series, cases
