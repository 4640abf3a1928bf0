#!/usr/bin/env bash
# Ingest benchmark: Java (GriddedSeries + solver stress/Ekman kernels) side by side with NumPy/SciPy on the same
# generated file. Usage: bench/run-ingest-bench.sh [spacingDeg=1.0] [steps=1096] [repeats=3]
# Needs Debian's /usr/bin/python3 with python3-numpy and python3-scipy (tools/fetch-test-deps.sh).
set -euo pipefail
cd "$(dirname "$0")/.."
SPACING="${1:-1.0}"; STEPS="${2:-1096}"; REPEATS="${3:-3}"
FILE="${TMPDIR:-/tmp}/gyreplan-ingest-bench-$$.nc"
trap 'rm -f "$FILE"' EXIT
mvn -B -q -ntp -pl bench -am package -DskipTests
CP="bench/target/classes:$(ls bench/target/lib/*.jar | tr '\n' ':')"
java -cp "$CP" org.gyreplan.bench.ingest.WindFileGenerator "$FILE" "$SPACING" "$STEPS" 24
echo "== Java, one thread (like NumPy), -Xmx512m"
java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" "$REPEATS" single 2>/dev/null
echo "== Java, read-ahead thread, -Xmx512m"
java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" "$REPEATS" readahead 2>/dev/null
echo "== Java, benchmark-only inline formulas (same numerics, one pass), -Xmx512m"
java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" "$REPEATS" inline 2>/dev/null
echo "== NumPy $(/usr/bin/python3 -c 'import numpy, scipy; print(numpy.__version__, "/ SciPy", scipy.__version__)')"
/usr/bin/python3 -W ignore bench/scripts/ingest_numpy.py "$FILE" "$REPEATS"
echo "(compare the checksum lines: both implementations must agree to ~9 digits)"
