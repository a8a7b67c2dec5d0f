#!/usr/bin/env bash
# Times `telltale explain` on an invented 281-word support message with 2,000 probes, against a
# logistic model trained on the demo corpus. Run after `mvn -q -o -DskipTests package`.
set -euo pipefail
cd "$(dirname "$0")/../../.."
dir=$(mktemp -d)
trap 'rm -rf "$dir"' EXIT
java -jar target/telltale.jar train --corpus corpora-demo/support-leaky.jsonl --algorithm logistic \
  --out "$dir/model.json" >/dev/null
text=$(cat src/test/resources/org/telltale/explain/ticket-281-words.txt)
uptime
for run in 1 2 3; do
  /usr/bin/time -f "run $run: %e s wall, %U s user CPU, %S s system CPU" \
    java -jar target/telltale.jar explain --model "$dir/model.json" --text "$text" --probes 2000 \
    --json "$dir/out.json" >/dev/null
  grep -o '"model_ms" : [0-9]*\|"total_ms" : [0-9]*\|"units" : [0-9]*\|"calls" : [0-9]*' "$dir/out.json" | tr '\n' ' '
  echo
done
