#!/usr/bin/python3
"""Reference accuracy, macro-F1 and confusion matrix from scikit-learn's metrics.

The gold labels and predictions are invented (a fictional support queue); they include a gold
label the classifier never predicts ("legal") and a prediction that is no gold label ("spam"),
so the zero-division conventions are exercised.

Run with Debian's python3-sklearn:  /usr/bin/python3 evaluation_reference.py > evaluation-reference.json
"""
import json
import sys

import sklearn
from sklearn.metrics import accuracy_score, confusion_matrix, f1_score

gold = ["billing", "billing", "billing", "outage", "outage", "account", "account", "account",
        "billing", "outage", "legal", "legal", "account", "billing", "outage", "outage"]
pred = ["billing", "billing", "outage", "outage", "outage", "account", "billing", "account",
        "billing", "account", "billing", "spam", "account", "spam", "outage", "billing"]
labels = sorted(set(gold) | set(pred))

json.dump({
    "source": "scikit-learn sklearn.metrics accuracy_score, f1_score(average='macro'), confusion_matrix",
    "sklearn": sklearn.__version__,
    "gold": gold,
    "predicted": pred,
    "labels": labels,
    "accuracy": accuracy_score(gold, pred),
    "macro_f1": f1_score(gold, pred, average="macro", zero_division=0),
    "per_label_f1": f1_score(gold, pred, average=None, labels=labels, zero_division=0).tolist(),
    "confusion": confusion_matrix(gold, pred, labels=labels).tolist(),
}, sys.stdout, indent=1)
sys.stdout.write("\n")
