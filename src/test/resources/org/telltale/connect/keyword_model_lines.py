# keyword_model_lines.py - the same toy model as an exec: subprocess (Python 3, stdlib only).
import json, sys

LABELS = ["billing", "other"]

def predict(text):  # replace with your model: one probability per label, in LABELS order
    p = 0.9 if "invoice" in text.lower() or "refund" in text.lower() else 0.2
    return [p, 1 - p]

for line in sys.stdin:  # one request per line; answer one line each; logs go to stderr
    texts = json.loads(line)["texts"]
    print(json.dumps({"labels": LABELS, "scores": [predict(t) for t in texts]}), flush=True)
