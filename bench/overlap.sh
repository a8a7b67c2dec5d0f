#!/usr/bin/env bash
# Benchmark of `telltale overlap`: generates a seeded synthetic corpus of short invented support
# tickets with planted near duplicates (bench/OverlapBench.java), runs overlap on it under
# /usr/bin/time, and scores recall against the planted truth. Figures go to docs/performance.md.
#
#   bench/overlap.sh [TRAIN [TEST [PLANTED [SEED]]]]     default: 800000 200000 20000 20260301
#
# Files are written to target/bench-overlap (about 300 MB for a million documents).
set -euo pipefail
cd "$(dirname "$0")/.."
TRAIN=${1:-800000}
TEST=${2:-200000}
PLANTED=${3:-20000}
SEED=${4:-20260301}
THRESHOLD=${THRESHOLD:-0.8}
HEAP=${HEAP:-6g}
OUT=target/bench-overlap
JAR=target/telltale.jar
[ -f "$JAR" ] || mvn -q -o -B -DskipTests package
mkdir -p "$OUT"
if [ ! -f "$OUT/truth.tsv" ] || [ "$(cat "$OUT/params" 2>/dev/null)" != "$TRAIN $TEST $PLANTED $SEED" ]; then
  echo "generating $TRAIN train and $TEST test documents ($PLANTED planted copies), seed $SEED" >&2
  java -cp "$JAR" bench/OverlapBench.java generate "$OUT" "$TRAIN" "$TEST" "$PLANTED" "$SEED"
  echo "$TRAIN $TEST $PLANTED $SEED" > "$OUT/params"
fi
ls -l "$OUT"/train.jsonl "$OUT"/test.jsonl >&2
echo "command: java -Xmx$HEAP -jar $JAR overlap --train $OUT/train.jsonl --test $OUT/test.jsonl --threshold $THRESHOLD --json $OUT/overlap.json" >&2
/usr/bin/time -v java -Xmx"$HEAP" -jar "$JAR" overlap --train "$OUT/train.jsonl" --test "$OUT/test.jsonl" \
  --threshold "$THRESHOLD" --json "$OUT/overlap.json" > "$OUT/summary.txt" 2> "$OUT/stderr.txt"
cat "$OUT/summary.txt"
grep -v '^\s*$' "$OUT/stderr.txt" | grep -E 'signed|banding|verification|candidate|Elapsed|Maximum resident|Percent of CPU'
java -cp "$JAR" bench/OverlapBench.java score "$OUT" "$THRESHOLD"
