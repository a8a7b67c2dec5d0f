# feedback_pipeline.py - a toy feedback triage model for an invented ferry line, answering in the
# text-classification pipeline shape (Python 3, stdlib only): {"inputs": [...]} -> per text a
# list of {"label", "score"}, highest score first.
import json, sys
from http.server import BaseHTTPRequestHandler, ThreadingHTTPServer

def classify(text):  # replace with your model: a score per label
    t = text.lower()
    late = 0.7 if "late" in t or "delay" in t else 0.1
    thanks = 0.6 if "thank" in t else 0.1
    scores = {"delay": late, "praise": thanks, "other": 1.0}
    total = sum(scores.values())
    ranked = sorted(scores.items(), key=lambda kv: -kv[1])
    return [{"label": k, "score": v / total} for k, v in ranked]

class Handler(BaseHTTPRequestHandler):
    def do_POST(self):
        inputs = json.loads(self.rfile.read(int(self.headers["Content-Length"])))["inputs"]
        body = json.dumps([classify(t) for t in inputs]).encode()
        self.send_response(200)
        self.send_header("Content-Type", "application/json")
        self.send_header("Content-Length", str(len(body)))
        self.end_headers()
        self.wfile.write(body)

server = ThreadingHTTPServer(("127.0.0.1", int(sys.argv[1]) if len(sys.argv) > 1 else 8000), Handler)
print("listening on http://127.0.0.1:%d" % server.server_port, flush=True)
server.serve_forever()
