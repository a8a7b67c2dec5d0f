#!/usr/bin/python3
"""Reference values for Telltale's fit and selection checks, from scikit-learn and NumPy.

Run with Debian's python3 (python3-sklearn, python3-numpy):
    /usr/bin/python3 src/test/reference/fit_references.py > src/test/resources/org/telltale/explain/fit-references.json

Only library outputs are written; the diabetes data stays in the installed sklearn package and
the Java tests read it from there.
"""
import json
import sys

import numpy as np
import sklearn
from sklearn.datasets import load_diabetes
from sklearn.linear_model import Ridge, lars_path

X, y = load_diabetes(return_X_y=True)  # scaled: centred columns of unit norm
yc = y - y.mean()

out = {
    "generator": "src/test/reference/fit_references.py",
    "sklearn": sklearn.__version__,
    "numpy": np.__version__,
    "python": sys.version.split()[0],
}

for method in ("lar", "lasso"):
    alphas, active, coefs = lars_path(X, yc, method=method)
    out["diabetes_" + method] = {
        "alphas": alphas.tolist(),
        "active": [int(a) for a in active],
        "coefs": coefs.T.tolist(),  # one row per knot
    }

# Weighted ridge with an unpenalised intercept; weights are a fixed pattern of the row number.
w = np.array([1.0 + (i % 7) / 3.0 for i in range(X.shape[0])])
for alpha in (0.01, 1.0):
    model = Ridge(alpha=alpha, fit_intercept=True, solver="cholesky").fit(X, y, sample_weight=w)
    out["diabetes_ridge_alpha_%g" % alpha] = {
        "alpha": alpha,
        "weights": "1 + (i mod 7) / 3 for row i counted from 0",
        "intercept": float(model.intercept_),
        "coef": model.coef_.tolist(),
    }

# Longley (1967) data, typed from memory of the NIST StRD certificate; a least-squares fit here
# must reproduce the certified coefficients, which checks the typing.
longley = np.array([
    [60323, 83.0, 234289, 2356, 1590, 107608, 1947],
    [61122, 88.5, 259426, 2325, 1456, 108632, 1948],
    [60171, 88.2, 258054, 3682, 1616, 109773, 1949],
    [61187, 89.5, 284599, 3351, 1650, 110929, 1950],
    [63221, 96.2, 328975, 2099, 3099, 112075, 1951],
    [63639, 98.1, 346999, 1932, 3594, 113270, 1952],
    [64989, 99.0, 365385, 1870, 3547, 115094, 1953],
    [63761, 100.0, 363112, 3578, 3350, 116219, 1954],
    [66019, 101.2, 397469, 2904, 3048, 117388, 1955],
    [67857, 104.6, 419180, 2822, 2857, 118734, 1956],
    [68169, 108.4, 442769, 2936, 2798, 120445, 1957],
    [66513, 110.8, 444546, 4681, 2637, 121950, 1958],
    [68655, 112.6, 482704, 3813, 2552, 123366, 1959],
    [69564, 114.2, 502601, 3931, 2514, 125368, 1960],
    [69331, 115.7, 518173, 4806, 2572, 127852, 1961],
    [70551, 116.9, 554894, 4007, 2827, 130081, 1962],
])
A = np.column_stack([np.ones(16), longley[:, 1:]])
beta, *_ = np.linalg.lstsq(A, longley[:, 0], rcond=None)
out["longley_numpy_lstsq"] = beta.tolist()

json.dump(out, sys.stdout, indent=1)
sys.stdout.write("\n")
