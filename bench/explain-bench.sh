#!/usr/bin/env bash
# End-to-end explanation throughput of the shaded jar: probes/s in-process (built-in model
# trained on corpora-demo/support-leaky.jsonl), over HTTP to `telltale serve` with --parallel
# 1, 2, 4, through exec: (bench/slow_model.py lines), and the JVM's CPU share of wall time
# against an HTTP service that sleeps 5 ms per batch. Needs target/telltale.jar (mvn package).
# Usage: bench/explain-bench.sh [documents]   (default 20; everything stays on 127.0.0.1)
#        JAR=/tmp/other.jar bench/explain-bench.sh 20   (another build of the jar, e.g. for "before")
set -euo pipefail
cd "$(dirname "$0")/.."
DOCS=${1:-20}
JAR=${JAR:-target/telltale.jar}
WORK=$(mktemp -d)
PIDS=()
cleanup() { for p in "${PIDS[@]}"; do kill "$p" 2>/dev/null || true; done; rm -rf "$WORK"; }
trap cleanup EXIT
CORPUS=corpora-demo/support-leaky.jsonl

java -jar "$JAR" train --corpus "$CORPUS" --out "$WORK/model.json" >/dev/null 2>&1

# probes/s while explaining: the probes over the wall time from the first document's start to the
# last one's end, as `telltale explain` reports it on stderr (documents are explained several at a
# time, so the explanations' own total_ms overlap); JVM start and model loading are left out. CPU
# share is measured on the whole process. Jars older than that line explained one document after
# another, so for them the sum of total_ms is the same wall time.
explained_ms() {
  python3 - "$1" "$2" <<'PY'
import json, re, sys
e = json.load(open(sys.argv[1]))["explanations"]
m = re.search(r"explained \d+ documents \((\d+) probes\) in (\d+) ms", open(sys.argv[2]).read())
p = sum(x["probes"] for x in e)
print(p, int(m.group(2)) if m else sum(x["timing"]["total_ms"] for x in e))
PY
}
rate() {
  read -r p t < <(explained_ms "$1" "$2")
  python3 -c 'import sys; p, t = int(sys.argv[1]), int(sys.argv[2]); print("%d probes in %d ms: %.0f probes/s" % (p, t, 1000.0 * p / max(t, 1)))' "$p" "$t"
}
explain() { # name, then model options
  local name=$1; shift
  local f="$WORK/${name//[^a-z0-9]/_}"
  /usr/bin/time -f "%U %S %e" -o "$f.time" \
    java -jar "$JAR" explain --corpus "$CORPUS" --first "$DOCS" --json "$f.json" "$@" >/dev/null 2>"$f.err" \
    || { echo "$name failed:"; tail -5 "$f.err"; return 1; }
  read -r user sys wall < "$f.time"
  printf '%-30s %s; process CPU %.1f s of %.1f s wall (%.0f %%)\n' "$name" "$(rate "$f.json" "$f.err")" \
    "$(echo "$user + $sys" | bc)" "$wall" "$(echo "100 * ($user + $sys) / $wall" | bc -l)"
}
wait_port() { for _ in $(seq 1 100); do (echo > "/dev/tcp/127.0.0.1/$1") 2>/dev/null && return 0; sleep 0.1; done; echo "port $1 not ready"; return 1; }

explain in-process --model "$WORK/model.json"

PORT=$((20000 + RANDOM % 20000))
java -jar "$JAR" serve --model "$WORK/model.json" --port "$PORT" >/dev/null 2>&1 &
PIDS+=($!)
wait_port "$PORT"
for n in 1 2 4; do
  explain "http serve --parallel $n" --model "http://127.0.0.1:$PORT/score" --parallel "$n"
done

explain "exec python lines" --model "exec:python3 bench/slow_model.py lines"

SLOW=$((PORT + 1))
python3 bench/slow_model.py http "$SLOW" 5 &
PIDS+=($!)
wait_port "$SLOW"
explain "http 5 ms/batch --parallel 4" --model "http://127.0.0.1:$SLOW/score" --parallel 4
# The service's own ideal: every batch it scored, 5 ms each, 4 at a time.
read -r _ ms < <(explained_ms "$WORK/http_5_ms_batch___parallel_4.json" "$WORK/http_5_ms_batch___parallel_4.err")
python3 - "http://127.0.0.1:$SLOW/stats" "$ms" <<'PY'
import json, sys, urllib.request
batches = json.load(urllib.request.urlopen(sys.argv[1]))["batches"]
ms = int(sys.argv[2])
ideal = batches * 5 / 4
print("  against the 5 ms service: %d batches, ideal %.0f ms, explained in %d ms: %.2f x the ideal" % (batches, ideal, ms, ms / ideal))
PY
