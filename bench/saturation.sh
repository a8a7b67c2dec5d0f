#!/usr/bin/env bash
# How busy Telltale keeps a model service of known capacity: one 20,000-probe explanation
# (`telltale explain --probes 20000`, batch 64) against bench/capacity_service.py in four shapes
# (20 ms / 4 slots, 20 ms / 16 slots, 5 ms / 2 slots, each queueing what is over capacity, and
# 20 ms / 4 slots answering 429 + Retry-After: 1 above capacity). Prints one line per service with
# the service's own figures: slot utilization over the window, the most requests it held at once
# after its first 2 s, and the 429s; then the same for a plain reference client (bench/fixed_client.py)
# with as many keep-alive threads as the service has slots, and with twice as many.
# Usage: bench/saturation.sh [JAR] [extra model options…]   (default target/telltale.jar; run on an idle machine)
# JAVA_OPTS is passed to the JVM: JAVA_OPTS=-Dtelltale.turnaround=true also prints where each
# request's time went (connect/TurnaroundTrace).
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

# measure LABEL LATENCY_MS SLOTS MODE CLIENT…: start the service, run the client against it (the
# client's arguments may name the service's URL as @URL), then print the service's figures.
measure() {
  local label=$1 lat=$2 slots=$3 mode=$4 port=$((20000 + RANDOM % 20000))
  shift 4
  python3 bench/capacity_service.py "$port" "$lat" "$slots" "$mode" 1 &
  PID=$!
  wait_port "$port"
  local args=() a
  for a in "$@"; do args+=("${a//@URL/http://127.0.0.1:$port/score}"); done
  "${args[@]}" >/dev/null 2>"$WORK/err" || { echo "client failed:"; tail -5 "$WORK/err"; }
  curl -s "http://127.0.0.1:$port/stats" > "$WORK/stats.json"
  kill "$PID"; wait "$PID" 2>/dev/null || true; PID=""
  python3 - "$WORK/stats.json" "$lat" "$slots" "$mode" "$label" <<'EOF2'
import json, sys
s = json.load(open(sys.argv[1]))
print("%3s ms / %2s slots %-6s %-10s: %4d served, window %.2f s, utilization %5.1f %%, most held after 2 s %2d, "
      "in the second half %2d (all run %2d), "
      "429s %d (%.1f %% of requests after 2 s)" % (sys.argv[2], sys.argv[3], sys.argv[4], sys.argv[5], s["served"], s["window_s"],
      100 * s["utilization"], s["max_held_settled"], s["max_held_second_half"], s["max_held"], s["rejected"], 100 * s["rejected_share_settled"]))
EOF2
  grep -iE "^model: requests in flight|^turnaround" "$WORK/err" || true
}

run() { # latency_ms slots mode, then extra model options
  local lat=$1 slots=$2 mode=$3
  shift 3
  measure telltale "$lat" "$slots" "$mode" java ${JAVA_OPTS:-} -jar "$JAR" explain --model @URL --corpus corpora-demo/support-leaky.jsonl \
    --first 1 --probes 20000 --batch 64 --json "$WORK/out.json" --verbose "$@"
  # What a plain client with a fixed number of keep-alive threads reaches against the same service:
  # 300 batches of 64 probes of the same document, every body encoded before the first request.
  # (Against the 429 shape only as many as the slots: this client does not retry.)
  local n sizes=("$slots")
  [ "$mode" = queue ] && sizes+=($((2 * slots)))
  for n in "${sizes[@]}"; do
    measure "fixed $n" "$lat" "$slots" "$mode" python3 bench/fixed_client.py @URL corpora-demo/support-leaky.jsonl "$n"
  done
}

run 20 4 queue "$@"
run 20 16 queue "$@"
run 5 2 queue "$@"
run 20 4 reject "$@"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
