#!/usr/bin/env bash
# Benchmark of SparkAudit in local mode against a model service of known capacity: the demo
# corpus (2,000 invented support messages) audited through bench/slow_model.py, which sleeps
# SLEEP_MS per batch and serves at most SLOTS batches at once, with local[1] and then local[2]
# (one and two task slots, each task with its own connector, --parallel 4). Prints the wall time
# of each run and the batches the service served; figures go to docs/performance.md.
#
#   bench/spark-audit-bench.sh [SLEEP_MS [SLOTS]]        default: 20 8
#
# Needs target/telltale-spark.jar and target/spark-classpath.txt (mvn -q -Pspark -DskipTests package).
# Corpus splits of 64 kB give the corpus 14 partitions, so both task slots have work.
set -euo pipefail
cd "$(dirname "$0")/.."
SLEEP=${1:-20}
SLOTS=${2:-8}
SAMPLE=${SAMPLE:-100}
PROBES=${PROBES:-1000}
OUT=target/bench-spark-audit
mkdir -p "$OUT"
PORT=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])')
echo "load before: $(uptime)" >&2
for master in 'local[1]' 'local[2]'; do
  python3 bench/slow_model.py http "$PORT" "$SLEEP" "$SLOTS" 2> "$OUT/service.txt" &
  service=$!
  sleep 1
  rm -rf "$OUT/audit"
  start=$(date +%s.%N)
  JAVA_OPTS="-Dspark.sql.files.maxPartitionBytes=65536" bench/spark-local.sh SparkAudit --master "$master" \
    --corpus corpora-demo/support-leaky.jsonl --model "http://127.0.0.1:$PORT/score" --parallel 4 \
    --sample "$SAMPLE" --probes "$PROBES" --out "$OUT/audit" --fail-on never --quiet > "$OUT/stdout.txt" 2> "$OUT/stderr.txt"
  end=$(date +%s.%N)
  kill -TERM "$service"; wait "$service" || true
  printf '%s\twall %s s\t%s\n' "$master" "$(python3 -c "print(f'{$end - $start:.1f}')")" "$(cat "$OUT/service.txt")"
done
echo "load after: $(uptime)" >&2
