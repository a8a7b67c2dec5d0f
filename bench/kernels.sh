#!/usr/bin/env bash
# JMH kernels of the explanation engine (src/jmh/java, Maven profile `bench`).
# Usage: bench/kernels.sh [JMH options]   default: -f 1 -wi 2 -i 3 -w 1s -r 1s (short settings)
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -q -o -B -Pbench test-compile
mvn -q -o -B -Pbench dependency:build-classpath -Dmdep.outputFile=target/cp-bench.txt >/dev/null
if [ $# -eq 0 ]; then set -- -f 1 -wi 2 -i 3 -w 1s -r 1s; fi
exec java -cp "target/test-classes:target/classes:$(cat target/cp-bench.txt)" org.openjdk.jmh.Main "$@"
