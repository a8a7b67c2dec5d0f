# fixed_client.py - a plain reference client for bench/saturation.sh (Python 3, stdlib only).
# Usage: fixed_client.py URL CORPUS THREADS [BATCHES] [BATCH] [SEED]
# Sends BATCHES (default 300) batches of BATCH (default 64) texts in Telltale's native protocol,
# each text the corpus's first document with a seeded random share of its words removed (what an
# explanation's probes look like), from THREADS threads that each keep one HTTP/1.1 keep-alive
# connection and send their next batch as soon as the last is answered. Every body is encoded
# before the first request, so the client does nothing between an answer and the next request
# but read the answer: what a fixed number of requests in flight can reach against the service.
import http.client
import json
import random
import sys
import threading
import urllib.parse

url = urllib.parse.urlsplit(sys.argv[1])
corpus, threads = sys.argv[2], int(sys.argv[3])
batches = int(sys.argv[4]) if len(sys.argv) > 4 else 300
size = int(sys.argv[5]) if len(sys.argv) > 5 else 64
rng = random.Random(int(sys.argv[6]) if len(sys.argv) > 6 else 1)

with open(corpus, encoding="utf-8") as f:
    words = json.loads(f.readline())["text"].split(" ")


def probe():
    keep = rng.random()
    return " ".join(w for w in words if rng.random() < keep)


bodies = [json.dumps({"texts": [probe() for _ in range(size)]}).encode("utf-8") for _ in range(batches)]
lock = threading.Lock()
next_batch = [0]
failed = [0]


def work():
    conn = http.client.HTTPConnection(url.hostname, url.port)
    while True:
        with lock:
            i = next_batch[0]
            next_batch[0] += 1
        if i >= batches:
            break
        conn.request("POST", url.path, bodies[i], {"Content-Type": "application/json"})
        answer = conn.getresponse()
        answer.read()
        if answer.status != 200:
            with lock:
                failed[0] += 1
    conn.close()


workers = [threading.Thread(target=work) for _ in range(threads)]
for w in workers:
    w.start()
for w in workers:
    w.join()
if failed[0]:
    print("%d batches failed" % failed[0], file=sys.stderr)
    sys.exit(1)
