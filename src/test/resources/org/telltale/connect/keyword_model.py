# keyword_model.py - a toy model behind Telltale's scoring protocol (Python 3, stdlib only).
import json, sys
from http.server import BaseHTTPRequestHandler, ThreadingHTTPServer

LABELS = ["billing", "other"]

def predict(text):  # replace with your model: one probability per label, in LABELS order
    p = 0.9 if "invoice" in text.lower() or "refund" in text.lower() else 0.2
    return [p, 1 - p]

class Handler(BaseHTTPRequestHandler):
    def do_POST(self):
        texts = json.loads(self.rfile.read(int(self.headers["Content-Length"])))["texts"]
        body = json.dumps({"labels": LABELS, "scores": [predict(t) for t in texts]}).encode()
        self.send_response(200)
        self.send_header("Content-Type", "application/json")
        self.send_header("Content-Length", str(len(body)))
        self.end_headers()
        self.wfile.write(body)

server = ThreadingHTTPServer(("127.0.0.1", int(sys.argv[1]) if len(sys.argv) > 1 else 8000), Handler)
print("listening on http://127.0.0.1:%d" % server.server_port, flush=True)
server.serve_forever()
