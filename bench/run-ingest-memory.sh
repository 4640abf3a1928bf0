#!/usr/bin/env bash
# Memory check: generates a >= 5 GB netCDF wind file in /tmp (0.25 deg global, 1300 steps, ~5.4 GB), streams it
# through the Java ingest benchmark with -Xmx512m, reports peak RSS, and deletes the file.
# Usage: bench/run-ingest-memory.sh [steps=1300]
set -euo pipefail
cd "$(dirname "$0")/.."
STEPS="${1:-1300}"
FILE="${TMPDIR:-/tmp}/gyreplan-ingest-5gb-$$.nc"
trap 'rm -f "$FILE"' EXIT
mvn -B -q -ntp -pl bench -am package -DskipTests
CP="bench/target/classes:$(ls bench/target/lib/*.jar | tr '\n' ':')"
java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.WindFileGenerator "$FILE" 0.25 "$STEPS" 6
ls -l "$FILE"
/usr/bin/time -v java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" 1 reuse 2>&1 \
  | grep -E "java|Maximum resident|Elapsed|Exit status" | grep -v SLF4J
