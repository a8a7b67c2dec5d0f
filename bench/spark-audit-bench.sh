#!/usr/bin/env bash
# Benchmark of SparkAudit in local mode against a model service of known capacity: the demo
# corpus (2,000 invented support messages) audited through bench/capacity_service.py (every
# request LATENCY_MS, at most SLOTS at once, the rest queue), with local[1] and then local[2]
# (one and two task slots; each task opens its own connector with --parallel 4). Prints, per
# run, the wall time, the requests served and the service's slot utilization; the throughput
# ratio is that of the wall times for the same work. Figures go to docs/performance.md.
#
#   bench/spark-audit-bench.sh [LATENCY_MS [SLOTS]]       default: 20 8; SAMPLE=100 PROBES=1000
#
# Needs target/telltale-spark.jar and target/spark-classpath.txt (mvn -q -Pspark -DskipTests
# package). Splits of 64 kB read the corpus in 14 partitions, so both task slots have work.
# Run on an idle machine.
set -euo pipefail
cd "$(dirname "$0")/.."
LATENCY=${1:-20}
SLOTS=${2:-8}
SAMPLE=${SAMPLE:-100}
PROBES=${PROBES:-1000}
WORK=$(mktemp -d)
PID=""
cleanup() { [ -n "$PID" ] && kill "$PID" 2>/dev/null || true; rm -rf "$WORK"; }
trap cleanup EXIT
wait_port() { for _ in $(seq 1 100); do (echo > "/dev/tcp/127.0.0.1/$1") 2>/dev/null && return 0; sleep 0.1; done; echo "port $1 not ready"; return 1; }
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg)"
for master in 'local[1]' 'local[2]'; do
  port=$((20000 + RANDOM % 20000))
  python3 bench/capacity_service.py "$port" "$LATENCY" "$SLOTS" queue &
  PID=$!
  wait_port "$port"
  start=$(date +%s.%N)
  JAVA_OPTS="-Dspark.sql.files.maxPartitionBytes=65536" bench/spark-local.sh SparkAudit --master "$master" \
    --corpus corpora-demo/support-leaky.jsonl --model "http://127.0.0.1:$port/score" --parallel 4 \
    --sample "$SAMPLE" --probes "$PROBES" --out "$WORK/audit-$master" --fail-on never --quiet \
    > "$WORK/out" 2> "$WORK/err" || { echo "SparkAudit failed:"; tail -5 "$WORK/err"; }
  end=$(date +%s.%N)
  curl -s "http://127.0.0.1:$port/stats" > "$WORK/stats.json"
  kill "$PID"; wait "$PID" 2>/dev/null || true; PID=""
  python3 - "$WORK/stats.json" "$master" "$start" "$end" <<'PY'
import json, sys
s = json.load(open(sys.argv[1]))
wall = float(sys.argv[4]) - float(sys.argv[3])
print("%-9s wall %6.1f s; %5d requests, %6.1f requests/s over the run; service window %.1f s, slot utilization %5.1f %%, most held %d"
      % (sys.argv[2], wall, s["served"], s["served"] / wall, s["window_s"], 100 * s["utilization"], s["max_held"]))
PY
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
