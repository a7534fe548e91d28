#!/usr/bin/env bash
# Builds the JMH benchmarks and runs them (docs/performance.md explains every figure).
# Usage: scripts/benchmarks.sh [goals|all|soak|peer|cycles|ops] [forks|repeats|cycles]
#   goals  (default) the benchmarks behind the performance goals, 5 forks each, with a verdict per
#          goal; the table is also written to target/benchmark-goals.md   (about 6 minutes)
#   all    every benchmark with the GC profiler, one fork each           (about 12 minutes)
#   soak   10^7 full core cycles with GC logging                         (a few seconds)
#   peer   the reference against Orekit doing the same work (LEO and MEO, degree 20 and 36), thread
#          CPU time, 2 alternating JVMs per side, median of 2 x 7 runs; also target/benchmark-peer.md
#          (about 4 min)
#   cycles per-cycle time distribution (median, p99, p99.9, max) of 10^7 model cycles per level
#          (point mass, J2, degree 36) with the timer's own bracket; one JVM per fork, default 5
#          forks (about 2 minutes per fork); also target/benchmark-cycles.md
#   ops    operations per core cycle by instrumented count (Java agent), per model level, tides,
#          servo; mean, median and worst cycle; deterministic; also target/benchmark-ops.md (< 1 min)
# The JVM is pinned to one processor with taskset when it is available (EIGENZEIT_BENCH_CPU picks
# which, default 0; EIGENZEIT_BENCH_PIN=0 turns pinning off): on the shared virtual machine the
# figures were taken on, unpinned runs land in a slower mode in some forks (docs/performance.md).
# Close other work first: nothing else should run during a benchmark.
set -euo pipefail
cd "$(dirname "$0")/.."
what="${1:-goals}"
forks="${2:-5}"

mvn -B -ntp -q -pl benchmarks -am package -DskipTests -Dspotbugs.skip=true -Djacoco.skip=true
jar=benchmarks/target/benchmarks.jar

pin=()
if [ "${EIGENZEIT_BENCH_PIN:-1}" != "0" ] && command -v taskset >/dev/null 2>&1; then
  pin=(taskset -c "${EIGENZEIT_BENCH_CPU:-0}")
  echo "pinned to processor ${EIGENZEIT_BENCH_CPU:-0} (taskset)"
fi

case "$what" in
  goals) mkdir -p target && "${pin[@]}" java -cp "$jar" org.eigenzeit.bench.GoalRun "$forks" target/benchmark-goals.md ;;
  all)   "${pin[@]}" java -jar "$jar" -prof gc ;;
  soak)  "${pin[@]}" java -Xlog:gc -cp "$jar" org.eigenzeit.bench.SoakRun ;;
  peer)  mkdir -p target && "${pin[@]}" java -cp "$jar" org.eigenzeit.bench.peer.PeerRun "${2:-7}" | tee target/benchmark-peer.md ;;
  cycles) mkdir -p target && : > target/benchmark-cycles.md
          for f in $(seq 1 "$forks"); do
            echo "fork $f" | tee -a target/benchmark-cycles.md
            "${pin[@]}" java -cp "$jar" org.eigenzeit.bench.CycleDistributionRun "${EIGENZEIT_BENCH_CYCLES:-10000000}" \
              | tee -a target/benchmark-cycles.md
          done ;;
  ops)   mkdir -p target && java -javaagent:"$jar" -cp "$jar" org.eigenzeit.bench.ops.OpsRun "${2:-3600}" | tee target/benchmark-ops.md ;;
  *) echo "usage: scripts/benchmarks.sh [goals|all|soak|peer|cycles|ops] [forks|repeats|cycles]" >&2; exit 2 ;;
esac
