"""A fault-injecting model subprocess for Telltale's connector tests (Python 3, stdlib only).

Speaks the scoring protocol one JSON object per line: P(long) = len(text) / (len(text) + 10).
Usage: fault_model.py MODE [STATE_FILE]. Modes ending in "-once" misbehave on the first request
of the first process only (the state file remembers), so a restarted process behaves.
"""
import json
import os
import sys
import time

mode = sys.argv[1]
state = sys.argv[2] if len(sys.argv) > 2 else None


def first_time():
    if state is None or os.path.exists(state):
        return False
    with open(state, "w") as f:
        f.write("seen")
    return True


def answer(texts, labels=("short", "long")):
    rows = []
    for t in texts:
        p = len(t) / (len(t) + 10.0)
        rows.append([1 - p, p])
    return {"labels": list(labels), "scores": rows}


if mode == "exit-at-start":
    sys.stderr.write("model: cannot load weights.bin\n")
    sys.exit(4)

served = 0
for line in sys.stdin:
    texts = json.loads(line)["texts"]
    served += 1
    if mode == "crash-once" and first_time():
        sys.stderr.write("model: out of memory on batch\n")
        sys.exit(3)
    if mode == "crash-always":
        sys.stderr.write("model: fatal: tokenizer missing\n")
        sys.exit(2)
    if mode == "hang-once" and first_time():
        time.sleep(120)
    if mode == "hang-always":
        time.sleep(120)
    if mode == "garbage":
        print("Loading model... done")
        sys.stdout.flush()
        continue
    out = answer(texts)
    if mode == "nan":
        out["scores"][-1][0] = float("nan")
    if mode == "wrong-rows":
        out["scores"] = out["scores"][:-1]
    if mode == "labels-change" and served > 1:
        out = answer(texts, ("tiny", "huge"))
    if mode == "error":
        out = {"error": "model says no"}
    print(json.dumps(out))
    sys.stdout.flush()
