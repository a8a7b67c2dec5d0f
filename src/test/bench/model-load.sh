#!/usr/bin/env bash
# Benchmark: load time of a 50,000-term built-in model (5 labels, bigrams), cold JVM and warm.
# Usage: src/test/bench/model-load.sh   (after `mvn -q -o test-compile`)
set -euo pipefail
cd "$(dirname "$0")/../../.."
cp_file=target/bench-classpath.txt
mvn -q -o dependency:build-classpath -Dmdep.outputFile="$cp_file" >/dev/null
cp="target/classes:target/test-classes:$(cat "$cp_file")"
model=target/bench-model-50k.json
java -cp "$cp" org.telltale.model.ModelLoadBenchmark write "$model" 50000 5
echo "load average: $(cut -d" " -f1-3 /proc/loadavg)"
java -cp "$cp" org.telltale.model.ModelLoadBenchmark load "$model" 10
echo "end to end: java -jar target/telltale.jar score on one document with this model"
if [ -f target/telltale.jar ]; then
  printf '{"id":"b1","text":"term1 pair1 term2"}\n' > target/bench-one.jsonl
  /usr/bin/time -f "%e s wall for the whole command (JVM start, load, score)" \
    java -jar target/telltale.jar score --model "$model" --corpus target/bench-one.jsonl >/dev/null
fi
