#!/usr/bin/env bash
# Side-by-side benchmark of the gyre solver (Java) against scipy.sparse.linalg.spsolve on the SAME discretisation
# (bench/scripts/gyre_scipy.py). Prints wall time, CPU time and peak resident memory of each run and the ratios.
#
#   bash bench/run-gyre-bench.sh            # full set (SciPy at Stommel 1024² takes minutes and ~GBs)
#   QUICK=1 bash bench/run-gyre-bench.sh    # smaller sizes (Stommel 512², Munk 256²)
#
# Needs Debian's /usr/bin/python3 with python3-scipy (apt-get install python3-scipy) and /usr/bin/time.
set -euo pipefail
cd "$(dirname "$0")/.."
PY=/usr/bin/python3
TIME=/usr/bin/time
"$PY" -c "import scipy" 2>/dev/null || { echo "python3-scipy missing: apt-get install -y python3-scipy" >&2; exit 1; }
[ -x "$TIME" ] || { echo "/usr/bin/time missing: apt-get install -y time" >&2; exit 1; }

mvn -B -q -ntp -pl bench -am package -DskipTests
CP="bench/target/bench-0.1.0-SNAPSHOT.jar:bench/target/lib/*"
OUT=$(mktemp -d)
trap 'rm -rf "$OUT"' EXIT

NS=${NS:-1024}; NS2=${NS2:-2048}; NM=${NM:-512}; THREADS=${THREADS:-2}
if [ -n "${QUICK:-}" ]; then NS=512; NS2=1024; NM=256; fi

echo "machine: $(nproc) cores; load average at start: $(cut -d' ' -f1-3 /proc/loadavg)"
echo "java: $(java -version 2>&1 | head -1); scipy: $("$PY" -c 'import scipy; print(scipy.__version__)')"

# run_java NAME KIND N THREADS XMX OUTFILE → prints best wall, cpu, peak RSS
run_java() {
  local name=$1 kind=$2 n=$3 th=$4 xmx=$5 out=$6
  "$TIME" -f "%M" -o "$OUT/$name.rss" java -Xmx"$xmx" -XX:+UseSerialGC -cp "$CP" org.gyreplan.bench.gyre.GyreBench \
      "$kind" "$n" "$th" 3 "$out" > "$OUT/$name.log"
  local best cpu rss
  best=$(grep best_seconds "$OUT/$name.log" | cut -d= -f2)
  cpu=$(grep best_cpu_seconds "$OUT/$name.log" | cut -d= -f2)
  rss=$(tail -1 "$OUT/$name.rss")
  printf "%-28s best wall %8.3f s   cpu %8.3f s   peak RSS %6.0f MB   (%s)\n" "$name" "$best" "$cpu" "$(echo "$rss/1024" | bc -l)" \
      "$(grep '^rep 0' "$OUT/$name.log" | sed 's/.*iterations=/iterations=/')"
  echo "$best" > "$OUT/$name.best"
}

run_scipy() {
  local name=$1 kind=$2 n=$3 cmp=$4
  "$TIME" -f "%M" -o "$OUT/$name.rss" "$PY" bench/scripts/gyre_scipy.py "$kind" "$n" --compare "$cmp" > "$OUT/$name.log"
  local t rss d
  t=$(grep scipy_seconds "$OUT/$name.log" | cut -d= -f2)
  rss=$(tail -1 "$OUT/$name.rss")
  d=$(grep max_rel_difference "$OUT/$name.log" | cut -d= -f2)
  printf "%-28s wall %8.3f s   peak RSS %6.0f MB   max |ψ_java − ψ_scipy|/max|ψ| = %s\n" "$name" "$t" "$(echo "$rss/1024" | bc -l)" "$d"
  echo "$t" > "$OUT/$name.best"
}

echo "== Stommel ${NS}² (target ≤ 1 s wall on 2 cores, ≤ 400 MB)"
run_java "java stommel $NS t$THREADS" stommel "$NS" "$THREADS" 280m "$OUT/s1.f64"
run_java "java stommel $NS t1" stommel "$NS" 1 280m "$OUT/s1_t1.f64"
cmp -s "$OUT/s1.f64" "$OUT/s1_t1.f64" && echo "threads 1 vs $THREADS: bit-identical" || echo "threads 1 vs $THREADS: DIFFERENT"
if [ -z "${SKIP_SCIPY_STOMMEL:-}" ]; then
  run_scipy "scipy stommel $NS" stommel "$NS" "$OUT/s1.f64"
  echo "ratio scipy/java (wall): $(echo "$(cat "$OUT/scipy stommel $NS.best") / $(cat "$OUT/java stommel $NS t$THREADS.best")" | bc -l | cut -c1-6)"
fi
echo "== Stommel ${NS2}² (target ≤ 5 × the ${NS}² time)"
run_java "java stommel $NS2 t$THREADS" stommel "$NS2" "$THREADS" 1600m "$OUT/s2.f64"
echo "ratio ${NS2}²/${NS}² (wall): $(echo "$(cat "$OUT/java stommel $NS2 t$THREADS.best") / $(cat "$OUT/java stommel $NS t$THREADS.best")" | bc -l | cut -c1-6)"
echo "== Munk no-slip ${NM}² (target ≥ 10 × faster than SciPy)"
run_java "java munk $NM t$THREADS" munk "$NM" "$THREADS" 600m "$OUT/m1.f64"
run_java "java munk $NM t1" munk "$NM" 1 600m "$OUT/m1_t1.f64"
cmp -s "$OUT/m1.f64" "$OUT/m1_t1.f64" && echo "threads 1 vs $THREADS: bit-identical" || echo "threads 1 vs $THREADS: DIFFERENT"
run_scipy "scipy munk $NM" munk "$NM" "$OUT/m1.f64"
echo "ratio scipy/java (wall): $(echo "$(cat "$OUT/scipy munk $NM.best") / $(cat "$OUT/java munk $NM t$THREADS.best")" | bc -l | cut -c1-6)"
echo "load average at end: $(cut -d' ' -f1-3 /proc/loadavg)"
