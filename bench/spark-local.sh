#!/usr/bin/env bash
# Runs a Telltale Spark front in local mode, without a Spark installation, on the jars that
# `mvn -q -Pspark -DskipTests package` leaves in target/:
#   bench/spark-local.sh SparkOverlap --master 'local[2]' --train a.jsonl --test b.jsonl
#   bench/spark-local.sh SparkAudit --master 'local[2]' --corpus c.jsonl --model m.json --out out/
# The first argument may also be a fully qualified class name. JAVA_OPTS adds JVM options (e.g.
# -Xmx4g, or -Dspark.* settings, which Spark reads as its configuration); EXTRA_CLASSPATH adds
# class path entries (e.g. hadoop-aws and its SDK for s3a:// paths). Spark logs warnings only
# (bench/spark-log4j2.properties). The module flags are those Spark 4.2.0's own launcher passes
# (org.apache.spark.launcher.JavaModuleOptions), less the two that only Java 23 and later know;
# without the --add-opens Spark fails on Java 17 with an IllegalAccessError or InaccessibleObjectException.
set -euo pipefail
here="$(cd "$(dirname "$0")/.." && pwd)"
jar="$here/target/telltale-spark.jar"
classpath="$here/target/spark-classpath.txt"
[ -f "$jar" ] && [ -f "$classpath" ] || { echo "spark-local.sh: build first: mvn -q -Pspark -DskipTests package" >&2; exit 2; }
[ $# -ge 1 ] || { echo "usage: spark-local.sh SparkAudit|SparkOverlap OPTIONS..." >&2; exit 2; }
main="$1"; shift
case "$main" in
  SparkAudit|SparkOverlap) main="org.telltale.spark.$main" ;;
  *.*) ;;
  *) echo "spark-local.sh: unknown front '$main' (expected SparkAudit or SparkOverlap)" >&2; exit 2 ;;
esac
opens=(
  -XX:+IgnoreUnrecognizedVMOptions
  --add-modules=jdk.incubator.vector
  --add-opens=java.base/java.lang=ALL-UNNAMED
  --add-opens=java.base/java.lang.invoke=ALL-UNNAMED
  --add-opens=java.base/java.lang.reflect=ALL-UNNAMED
  --add-opens=java.base/java.io=ALL-UNNAMED
  --add-opens=java.base/java.net=ALL-UNNAMED
  --add-opens=java.base/java.nio=ALL-UNNAMED
  --add-opens=java.base/java.util=ALL-UNNAMED
  --add-opens=java.base/java.util.concurrent=ALL-UNNAMED
  --add-opens=java.base/java.util.concurrent.atomic=ALL-UNNAMED
  --add-opens=java.base/jdk.internal.ref=ALL-UNNAMED
  --add-opens=java.base/sun.nio.ch=ALL-UNNAMED
  --add-opens=java.base/sun.nio.cs=ALL-UNNAMED
  --add-opens=java.base/sun.security.action=ALL-UNNAMED
  --add-opens=java.base/sun.util.calendar=ALL-UNNAMED
  --add-opens=java.security.jgss/sun.security.krb5=ALL-UNNAMED
  -Dio.netty.tryReflectionSetAccessible=true
)
# shellcheck disable=SC2086
exec java "${opens[@]}" -Dfile.encoding=UTF-8 -Dlog4j2.configurationFile="$here/bench/spark-log4j2.properties" \
  ${JAVA_OPTS:-} -cp "$jar:$(cat "$classpath")${EXTRA_CLASSPATH:+:$EXTRA_CLASSPATH}" "$main" "$@"
