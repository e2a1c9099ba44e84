"""
The ADF regression (change on lagged level, an optional constant and lagged changes) fitted in
numpy's long double (64-bit mantissa on x86) by Cholesky of the cross products and six steps
of refinement from long-double residuals, to judge how far double-precision fits (the engine's
Householder QR and its refined cross-product route, addin/unitroot/adf-tau-gram.ts) are from
the exact least-squares answer where the lagged changes are strongly tied. Not run by CI.

  /usr/bin/python3 tests/reference/adf-long-double.py series.json
      series.json: {"x": [...], "lags": p, "deterministic": "none" | "const", optional
      "qr": {"tau", "gamma"} and "refined": {"tau", "gamma"} to compare}
  /usr/bin/python3 tests/reference/adf-long-double.py --csv file.csv column differences lags deterministic
      (the benchmark's 1,000,000-row pair: test-artifacts/large-pair.csv Anchor 2 120 const)
"""
import json
import sys

import numpy as np

LD = np.longdouble


def long_double_adf(values, p, deterministic):
    x = np.asarray(values, dtype=np.float64)
    dx = np.diff(x).astype(LD)  # the changes in double, as the engine forms them, then widened
    xl = x.astype(LD)
    a, b = p, len(x) - 2
    n = b - a + 1
    y = dx[a:b + 1]
    names = (['const'] if deterministic == 'const' else []) + list(range(1, p + 1)) + ['level']

    def col(name):
        if name == 'level':
            return xl[a:b + 1]
        if name == 'const':
            return np.ones(n, dtype=LD)
        return dx[a - name:b + 1 - name]

    k = len(names)
    gram = np.array([[(col(u) * col(v)).sum() for v in names] for u in names], dtype=LD)
    chol = np.zeros((k, k), dtype=LD)
    for j in range(k):
        chol[j, j] = np.sqrt(gram[j, j] - (chol[j, :j] ** 2).sum())
        for i in range(j + 1, k):
            chol[i, j] = (gram[i, j] - (chol[i, :j] * chol[j, :j]).sum()) / chol[j, j]

    def solve(v, m):
        v = v.copy()
        for i in range(m):
            v[i] = (v[i] - (chol[i, :i] * v[:i]).sum()) / chol[i, i]
        for i in range(m - 1, -1, -1):
            v[i] = (v[i] - (chol[i + 1:m, i] * v[i + 1:m]).sum()) / chol[i, i]
        return v

    def residual(target, coef, m):
        r = target.copy()
        for q in range(m):
            r -= coef[q] * col(names[q])
        return r

    def fit(target, m):
        coef = np.zeros(m, dtype=LD)
        for _ in range(6):
            r = residual(target, coef, m)
            coef += solve(np.array([(col(names[q]) * r).sum() for q in range(m)], dtype=LD), m)
        r = residual(target, coef, m)
        return coef, (r * r).sum()

    coef, ssr = fit(y, k)
    _, pivot = fit(xl[a:b + 1], k - 1)  # the level's residual on the other columns
    gamma = coef[k - 1]
    return gamma / np.sqrt(ssr / (n - k) / pivot), gamma


def main():
    if sys.argv[1] == '--csv':
        path, column, differences, lags, deterministic = sys.argv[2:7]
        header = open(path).readline().strip().split(',')
        x = np.loadtxt(path, delimiter=',', skiprows=1, usecols=header.index(column))
        for _ in range(int(differences)):
            x = np.diff(x)
        data = {'x': x, 'lags': int(lags), 'deterministic': deterministic}
    else:
        data = json.load(open(sys.argv[1]))
    tau, gamma = long_double_adf(data['x'], data['lags'], data['deterministic'])
    print('long double: tau', repr(tau), 'gamma', repr(gamma))
    for key in ('qr', 'refined'):
        if data.get(key):
            print(key, 'tau relative', float((data[key]['tau'] - tau) / abs(tau)), 'gamma relative', float((data[key]['gamma'] - gamma) / abs(gamma)))


if __name__ == '__main__':
    main()
