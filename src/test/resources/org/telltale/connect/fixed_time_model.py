# A model subprocess whose every call takes the same time, for SubprocessAutoTest.
# Usage: fixed_time_model.py MILLIS STARTED_FILE [LOCK_FILE]
# Appends its pid to STARTED_FILE when it starts, then answers each request line in the native
# protocol after MILLIS. With LOCK_FILE, every call holds an exclusive lock on it, so however
# many processes run, one call happens at a time: more processes do not mean more throughput.
import fcntl
import json
import os
import sys
import time

millis, started = float(sys.argv[1]) / 1000.0, sys.argv[2]
lock = open(sys.argv[3], "a") if len(sys.argv) > 3 else None
with open(started, "a") as f:
    f.write("%d\n" % os.getpid())
for line in sys.stdin:
    texts = json.loads(line)["texts"]
    if lock:
        fcntl.flock(lock, fcntl.LOCK_EX)
    time.sleep(millis)
    if lock:
        fcntl.flock(lock, fcntl.LOCK_UN)
    sys.stdout.write(json.dumps({"labels": ["a", "b"], "scores": [[0.25, 0.75]] * len(texts)}) + "\n")
    sys.stdout.flush()
