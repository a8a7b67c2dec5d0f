#!/usr/bin/python3
"""Reference coefficients for Telltale's multinomial logistic regression, from scikit-learn.

Reads support-counts.csv (invented term counts of a fictional support queue), applies
log(1 + count) as Telltale's logistic model does, and fits scikit-learn's multinomial
LogisticRegression with the newton-cg solver (a different optimiser from ours, run to a
gradient far below our tolerance) for a few values of C. scikit-learn minimises
    (1/2) ||W||^2 + C * sum_i loss_i        (intercepts unpenalised with newton-cg and lbfgs)
which has the same minimiser as Telltale's
    (1/n) sum_i loss_i + (l2/2) ||W||^2     with l2 = 1 / (C n).
Intercepts are identified only up to a common shift, so they are centred to mean zero.

Run with Debian's python3-sklearn:  /usr/bin/python3 fit_logistic.py > logistic-reference.json
"""
import csv
import json
import sys

import numpy as np
import scipy
import sklearn
from sklearn.linear_model import LogisticRegression

HERE = __file__.rsplit("/", 1)[0] if "/" in __file__ else "."

with open(f"{HERE}/support-counts.csv", newline="", encoding="utf-8") as f:
    reader = csv.reader(f)
    header = next(reader)
    rows = list(reader)
terms = header[1:]
labels = [r[0] for r in rows]
X = np.log1p(np.array([[float(v) for v in r[1:]] for r in rows]))
n = X.shape[0]

fits = []
for C in (1.0, 0.1):
    model = LogisticRegression(C=C, solver="newton-cg", multi_class="multinomial", tol=1e-8, max_iter=1000)
    model.fit(X, labels)
    intercept = model.intercept_ - model.intercept_.mean()
    # Gradient of Telltale's objective at scikit-learn's solution: how exact the reference is.
    Y = (np.array(labels)[:, None] == model.classes_[None, :]).astype(float)
    residual = (model.predict_proba(X) - Y) / n
    gradient = np.concatenate([(residual.T @ X + model.coef_ / (C * n)).ravel(), residual.sum(axis=0)])
    fits.append({
        "C": C,
        "l2": 1.0 / (C * n),
        "iterations": int(model.n_iter_[0]),
        "gradient_norm": float(np.abs(gradient).max()),
        "classes": [str(c) for c in model.classes_],
        "intercepts": intercept.tolist(),
        "weights": model.coef_.tolist(),
        "probabilities": model.predict_proba(X).tolist(),
    })

json.dump({
    "source": "scikit-learn LogisticRegression(solver='newton-cg', multi_class='multinomial', tol=1e-8)",
    "sklearn": sklearn.__version__,
    "numpy": np.__version__,
    "scipy": scipy.__version__,
    "data": "support-counts.csv",
    "features": "log1p-counts",
    "terms": terms,
    "documents": n,
    "fits": fits,
}, sys.stdout, indent=1)
sys.stdout.write("\n")
