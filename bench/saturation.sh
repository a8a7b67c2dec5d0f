#!/usr/bin/env bash
# How busy Telltale keeps a model service of known capacity: one 20,000-probe explanation
# (`telltale explain --probes 20000`, batch 64) against bench/capacity_service.py in four shapes
# (20 ms / 4 slots, 20 ms / 16 slots, 5 ms / 2 slots, each queueing what is over capacity, and
# 20 ms / 4 slots answering 429 + Retry-After: 1 above capacity). Prints one line per service with
# the service's own figures: slot utilization over the window, the most requests it held at once
# after its first 2 s, and the 429s.
# Usage: bench/saturation.sh [JAR] [extra model options…]   (default target/telltale.jar; run on an idle machine)
set -euo pipefail
cd "$(dirname "$0")/.."
JAR=${1:-target/telltale.jar}
shift || true
WORK=$(mktemp -d)
PID=""
cleanup() { [ -n "$PID" ] && kill "$PID" 2>/dev/null || true; rm -rf "$WORK"; }
trap cleanup EXIT
wait_port() { for _ in $(seq 1 100); do (echo > "/dev/tcp/127.0.0.1/$1") 2>/dev/null && return 0; sleep 0.1; done; echo "port $1 not ready"; return 1; }
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg)"

run() { # latency_ms slots mode, then extra model options
  local lat=$1 slots=$2 mode=$3 port=$((20000 + RANDOM % 20000))
  shift 3
  python3 bench/capacity_service.py "$port" "$lat" "$slots" "$mode" 1 &
  PID=$!
  wait_port "$port"
  local t0=$SECONDS
  java -jar "$JAR" explain --model "http://127.0.0.1:$port/score" --corpus corpora-demo/support-leaky.jsonl --first 1 \
    --probes 20000 --batch 64 --json "$WORK/out.json" --verbose "$@" >/dev/null 2>"$WORK/err" \
    || { echo "explain failed:"; tail -5 "$WORK/err"; }
  curl -s "http://127.0.0.1:$port/stats" > "$WORK/stats.json"
  kill "$PID"; wait "$PID" 2>/dev/null || true; PID=""
  python3 - "$WORK/stats.json" "$lat" "$slots" "$mode" "$((SECONDS - t0))" <<'EOF'
import json, sys
s = json.load(open(sys.argv[1]))
print("%3s ms / %2s slots %-6s: %4d served, window %.2f s, utilization %5.1f %%, most held after 2 s %2d (all run %2d), "
      "429s %d (%.1f %% of requests after 2 s)" % (sys.argv[2], sys.argv[3], sys.argv[4], s["served"], s["window_s"],
      100 * s["utilization"], s["max_held_settled"], s["max_held"], s["rejected"], 100 * s["rejected_share_settled"]))
EOF
  grep -i "in flight" "$WORK/err" | tail -1 || true
}

run 20 4 queue "$@"
run 20 16 queue "$@"
run 5 2 queue "$@"
run 20 4 reject "$@"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
