#!/usr/bin/env bash
# Ingest benchmark: Java (GriddedSeries + the solver's SurfaceResponse) side by side with NumPy/SciPy on the same
# generated file, one thread each. Each repetition runs, in turn and each in a fresh process: Java "pipeline"
# mode (the study pipeline's calls, new arrays per step), Java "reuse" mode (reused buffers), NumPy. Interleaving
# exposes all three to the same machine load. Prints every run, then medians and the Java/NumPy ratios.
# Usage: bench/run-ingest-bench.sh [spacingDeg=1.0] [steps=1096] [repetitions=3]
# Needs Debian's /usr/bin/python3 with python3-numpy and python3-scipy (tools/fetch-test-deps.sh).
set -euo pipefail
cd "$(dirname "$0")/.."
SPACING="${1:-1.0}"; STEPS="${2:-1096}"; REPS="${3:-3}"
FILE="${TMPDIR:-/tmp}/gyreplan-ingest-bench-$$.nc"
LOG="${TMPDIR:-/tmp}/gyreplan-ingest-bench-$$.log"
trap 'rm -f "$FILE" "$LOG"' EXIT
mvn -B -q -ntp -pl bench -am package -DskipTests
CP="bench/target/classes:$(ls bench/target/lib/*.jar | tr '\n' ':')"
java -cp "$CP" org.gyreplan.bench.ingest.WindFileGenerator "$FILE" "$SPACING" "$STEPS" 24
echo "NumPy $(/usr/bin/python3 -c 'import numpy, scipy; print(numpy.__version__, "/ SciPy", scipy.__version__)'); java $(java -version 2>&1 | head -1)"
for r in $(seq 1 "$REPS"); do
  echo "== repetition $r/$REPS, load: $(uptime | sed 's/.*load average: //')" | tee -a "$LOG"
  java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" 1 pipeline 2>/dev/null | tee -a "$LOG"
  java -Xmx512m -cp "$CP" org.gyreplan.bench.ingest.IngestBenchmark "$FILE" 1 reuse 2>/dev/null | tee -a "$LOG"
  /usr/bin/python3 -W ignore bench/scripts/ingest_numpy.py "$FILE" 1 | tee -a "$LOG"
done
echo "== load at the end: $(uptime | sed 's/.*load average: //')"
/usr/bin/python3 - "$LOG" <<'PY'
import re, statistics, sys
runs = {}
for line in open(sys.argv[1]):
    m = re.match(r"(java pipeline|java reuse|numpy): .* ([0-9.e+-]+) cell-steps/s wall, ([0-9.e+-]+) per CPU-s", line)
    if m:
        runs.setdefault(m.group(1), []).append((float(m.group(2)), float(m.group(3))))
med = {k: (statistics.median(w for w, _ in v), statistics.median(c for _, c in v)) for k, v in runs.items()}
print("median over %d repetitions:  cell-steps/s wall | per CPU-s | ratio to NumPy (wall | CPU)" % len(runs.get("numpy", [])))
for k in ("java pipeline", "java reuse", "numpy"):
    if k in med:
        w, c = med[k]
        nw, nc = med.get("numpy", (float("nan"), float("nan")))
        print("  %-14s %10.3g | %10.3g | %5.2f | %5.2f" % (k, w, c, w / nw, c / nc))
PY
echo "(checksum lines must agree between Java and NumPy to ~9 digits)"
