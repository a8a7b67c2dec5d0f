# slow_model.py - a test model service for bench/explain-bench.sh (Python 3, stdlib only).
# Speaks Telltale's native protocol (docs/protocol.md): over HTTP on 127.0.0.1:PORT with
# "http PORT SLEEP_MS", or as JSON lines on stdin/stdout with "lines". Each batch sleeps
# SLEEP_MS, so its cost is known; scores come from a few invented keywords. "http PORT SLEEP_MS
# SLOTS" serves at most SLOTS batches at once (a service of known capacity: the others wait), and
# prints how many batches it served when it is stopped (SIGTERM).
import json
import signal
import sys
import threading
import time
from http.server import BaseHTTPRequestHandler, ThreadingHTTPServer

LABELS = ["billing", "outage", "other"]
KEYWORDS = {"charged": 0, "invoice": 0, "refund": 0, "down": 1, "connection": 1, "outage": 1}


def predict(text):
    counts = [1.0, 1.0, 1.0]
    for word in text.lower().split():
        counts[KEYWORDS.get(word.strip(".,!?"), 2)] += 1.0
    total = sum(counts)
    return [c / total for c in counts]


def answer(texts, sleep_ms):
    if sleep_ms > 0:
        time.sleep(sleep_ms / 1000.0)
    return json.dumps({"labels": LABELS, "scores": [predict(t) for t in texts]})


class Handler(BaseHTTPRequestHandler):
    protocol_version = "HTTP/1.1"
    sleep_ms = 0.0
    slots = None
    served = 0
    lock = threading.Lock()

    def do_POST(self):
        texts = json.loads(self.rfile.read(int(self.headers["Content-Length"])))["texts"]
        if self.slots is None:
            body = answer(texts, self.sleep_ms).encode("utf-8")
        else:
            with self.slots:
                body = answer(texts, self.sleep_ms).encode("utf-8")
        with Handler.lock:
            Handler.served += 1
        self.send_response(200)
        self.send_header("Content-Type", "application/json")
        self.send_header("Content-Length", str(len(body)))
        self.end_headers()
        self.wfile.write(body)

    def log_message(self, *args):
        pass


if __name__ == "__main__":
    if sys.argv[1] == "lines":
        for line in sys.stdin:
            print(answer(json.loads(line)["texts"], 0), flush=True)
    else:
        Handler.sleep_ms = float(sys.argv[3])
        if len(sys.argv) > 4:
            Handler.slots = threading.BoundedSemaphore(int(sys.argv[4]))

        def stop(signum, frame):
            print("served %d batches" % Handler.served, file=sys.stderr, flush=True)
            sys.exit(0)

        signal.signal(signal.SIGTERM, stop)
        ThreadingHTTPServer(("127.0.0.1", int(sys.argv[2])), Handler).serve_forever()
