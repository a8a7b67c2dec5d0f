# capacity_service.py - a model service of known capacity for bench/saturation.sh (Python 3, stdlib only).
# Usage: capacity_service.py PORT LATENCY_MS SLOTS [queue|reject] [RETRY_AFTER_S]
# Speaks Telltale's native protocol on 127.0.0.1:PORT with HTTP/1.1 keep-alive. Every request
# takes LATENCY_MS whatever its size, at most SLOTS are served at once: "queue" makes the others
# wait for a slot, "reject" answers them 429 with Retry-After. GET /stats reports, as one JSON
# object, how busy the slots were over the window from the first service start to the last end,
# the most requests the service held at once after its first 2 seconds and in the second half of
# the window (a 300-batch run is shorter than 2 s), and the 429s.
import json
import sys
import threading
import time
from http.server import BaseHTTPRequestHandler, ThreadingHTTPServer

PORT, LATENCY, SLOTS = int(sys.argv[1]), float(sys.argv[2]) / 1000.0, int(sys.argv[3])
MODE = sys.argv[4] if len(sys.argv) > 4 else "queue"
RETRY_AFTER = sys.argv[5] if len(sys.argv) > 5 else "1"
SETTLE = 2.0  # seconds after the first request before "once settled" figures count

slots = threading.Semaphore(SLOTS)
lock = threading.Lock()
state = {"first": None, "last_end": 0.0, "busy": 0.0, "served": 0, "rejected": 0, "held": 0,
         "max_held": 0, "max_held_settled": 0, "requests_settled": 0, "rejected_settled": 0, "texts": 0}
arrivals = []  # (time, requests held then) per request, for the second half of the window


def settled(now):
    return state["first"] is not None and now - state["first"] >= SETTLE


class Handler(BaseHTTPRequestHandler):
    protocol_version = "HTTP/1.1"
    # Headers and body leave in one write with Nagle off, so no answer waits ~40 ms for the
    # client's delayed ACK: the service's latency is LATENCY_MS and nothing else.
    disable_nagle_algorithm = True
    wbufsize = 1 << 16

    def send_json(self, status, obj, extra=()):
        body = json.dumps(obj).encode("utf-8")
        self.send_response(status)
        self.send_header("Content-Type", "application/json")
        self.send_header("Content-Length", str(len(body)))
        for k, v in extra:
            self.send_header(k, v)
        self.end_headers()
        self.wfile.write(body)

    def do_GET(self):
        with lock:
            s = dict(state)
        window = s["last_end"] - s["first"] if s["first"] is not None else 0.0
        s["window_s"] = window
        s["utilization"] = s["busy"] / (SLOTS * window) if window > 0 else 0.0
        s["slots"], s["latency_ms"], s["mode"] = SLOTS, LATENCY * 1000, MODE
        half = s["first"] + window / 2 if s["first"] is not None else 0.0
        s["max_held_second_half"] = max([h for t, h in list(arrivals) if t >= half] or [0])
        s["rejected_share_settled"] = s["rejected_settled"] / s["requests_settled"] if s["requests_settled"] else 0.0
        self.send_json(200, s)

    def do_POST(self):
        texts = json.loads(self.rfile.read(int(self.headers["Content-Length"])))["texts"]
        now = time.monotonic()
        with lock:
            if state["first"] is None:
                state["first"] = now
            state["held"] += 1
            state["max_held"] = max(state["max_held"], state["held"])
            arrivals.append((now, state["held"]))
            if settled(now):
                state["requests_settled"] += 1
                state["max_held_settled"] = max(state["max_held_settled"], state["held"])
        held = [True]

        def answered():
            # A request is no longer held once its answer is about to be written: the client can
            # read it and send the next one before this thread runs again (one interpreter lock),
            # which counted one request too many at the service.
            if held[0]:
                held[0] = False
                with lock:
                    state["held"] -= 1

        try:
            if MODE == "reject":
                got = slots.acquire(blocking=False)
                if not got:
                    with lock:
                        state["rejected"] += 1
                        if settled(now):
                            state["rejected_settled"] += 1
                    answered()
                    self.send_json(429, {"error": "over capacity"}, [("Retry-After", RETRY_AFTER)])
                    return
            else:
                slots.acquire()
            start = time.monotonic()
            time.sleep(LATENCY)
            end = time.monotonic()
            slots.release()
            with lock:
                state["busy"] += end - start
                state["last_end"] = max(state["last_end"], end)
                state["served"] += 1
                state["texts"] += len(texts)
            answered()
            self.send_json(200, {"labels": ["a", "b"], "scores": [[0.5, 0.5]] * len(texts)})
        finally:
            answered()

    def log_message(self, *args):
        pass


class Server(ThreadingHTTPServer):
    daemon_threads = True
    request_queue_size = 128


if __name__ == "__main__":
    Server(("127.0.0.1", PORT), Handler).serve_forever()
