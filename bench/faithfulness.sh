#!/usr/bin/env bash
# Faithfulness experiment (Ribeiro, Singh & Guestrin 2016, §5.2) on a generated corpus, plus
# calls of the adaptive budget against fixed budgets; "hard" runs the harder benchmark (HardBench) for
# each variant ("key=value,...;..."); "long", "auto", "demo" and "nb" the stability measures (StabilityBench).
# Usage: bench/faithfulness.sh [documents] [seed] [easy|hard|long|auto|demo|nb] [variants]
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -o -B test-compile
mvn -q -o -B org.apache.maven.plugins:maven-dependency-plugin:3.8.1:build-classpath -Dmdep.outputFile=target/cp.txt >/dev/null
exec java -Xmx1g -cp "target/test-classes:target/classes:$(cat target/cp.txt)" \
  org.telltale.bench.FaithfulnessBench "${1:-100}" "${2:-20261201}" "${3:-easy}" ${4:+"$4"}
