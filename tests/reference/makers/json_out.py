"""Writes fixture files: numpy values to plain JSON, NaN and infinities to null.

Floats are written with Python's shortest round-trip repr, so a JSON reader gets the
exact double statsmodels produced. Lists of plain numbers stay on one line, which keeps
the files small and their diffs readable.
"""
import json
import math
import os

import numpy as np
import scipy
import statsmodels

GENERATED_BY = "tests/reference/make_fixtures.py"
LIBRARY = "statsmodels 0.13.5, Debian python3-statsmodels"


def plain(v):
    """Converts numpy scalars/arrays, tuples and dicts into JSON-ready Python values."""
    if isinstance(v, dict):
        return {str(k): plain(x) for k, x in v.items()}
    if isinstance(v, (list, tuple)):
        return [plain(x) for x in v]
    if isinstance(v, np.ndarray):
        return [plain(x) for x in v.tolist()]
    if isinstance(v, (bool, np.bool_)):
        return bool(v)
    if isinstance(v, (int, np.integer)):
        return int(v)
    if isinstance(v, (float, np.floating)):
        f = float(v)
        return f if math.isfinite(f) else None
    if v is None or isinstance(v, str):
        return v
    raise TypeError(f"cannot write {type(v)!r} to a fixture")


def _is_scalar(v):
    return v is None or isinstance(v, (bool, int, float, str))


def _encode(v, depth):
    pad = " " * depth
    inner = " " * (depth + 1)
    if isinstance(v, dict):
        if not v:
            return "{}"
        items = [f"{inner}{json.dumps(k)}: {_encode(x, depth + 1)}" for k, x in v.items()]
        return "{\n" + ",\n".join(items) + "\n" + pad + "}"
    if isinstance(v, list):
        if all(_is_scalar(x) for x in v):
            return "[" + ", ".join(json.dumps(x, allow_nan=False) for x in v) + "]"
        items = [inner + _encode(x, depth + 1) for x in v]
        return "[\n" + ",\n".join(items) + "\n" + pad + "]"
    return json.dumps(v, allow_nan=False)


def write_fixture(out_dir, name, series, cases, extra=None):
    """Writes <out_dir>/<name>.json with the common header, the input series and the cases.

    Returns (path, size in bytes, number of cases).
    """
    doc = {
        "generatedBy": GENERATED_BY,
        "library": LIBRARY,
        "statsmodelsVersion": statsmodels.__version__,
        "numpy": np.__version__,
        "scipy": scipy.__version__,
    }
    if extra:
        doc.update(extra)
    doc["series"] = series
    doc["cases"] = cases
    text = _encode(plain(doc), 0) + "\n"
    json.loads(text)  # the file must parse back
    path = os.path.join(out_dir, f"{name}.json")
    with open(path, "w", encoding="utf-8", newline="\n") as f:
        f.write(text)
    return path, len(text.encode("utf-8")), len(cases)


def pick_series(all_series, ids):
    """The sub-dictionary of series a fixture uses, in first-use order."""
    out = {}
    for i in ids:
        if i not in out:
            out[i] = all_series[i]
    return out
