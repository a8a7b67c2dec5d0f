# slow_model.py - a test model service for bench/explain-bench.sh (Python 3, stdlib only).
# Speaks Telltale's native protocol (docs/protocol.md): over HTTP on 127.0.0.1:PORT with
# "http PORT SLEEP_MS", or as JSON lines on stdin/stdout with "lines". Each batch sleeps
# SLEEP_MS, so its cost is known; scores come from a few invented keywords. Over HTTP,
# GET /stats answers {"batches": N}, the batches scored so far.
import json
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
    # Headers and body leave in one write with Nagle off, so no answer waits ~40 ms for the
    # client's delayed ACK: a batch costs SLEEP_MS and the scoring, nothing else.
    disable_nagle_algorithm = True
    wbufsize = 1 << 16
    sleep_ms = 0.0

    batches = 0
    lock = threading.Lock()

    def do_GET(self):
        with Handler.lock:
            batches = Handler.batches
        self.send_body(json.dumps({"batches": batches}).encode("utf-8"))

    def do_POST(self):
        texts = json.loads(self.rfile.read(int(self.headers["Content-Length"])))["texts"]
        body = answer(texts, self.sleep_ms).encode("utf-8")
        with Handler.lock:
            Handler.batches += 1
        self.send_body(body)

    def send_body(self, body):
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
        ThreadingHTTPServer(("127.0.0.1", int(sys.argv[2])), Handler).serve_forever()
