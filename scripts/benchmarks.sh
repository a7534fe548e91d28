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
#   compare REV [ROUNDS] [PATCH]  this checkout against git revision REV, same machine, same session:
#          REV's benchmark jar is built in a temporary worktree (after `git apply PATCH` there when a
#          patch is given, e.g. to give REV today's benchmark bodies: benchmarks/compare/), then
#          ROUNDS rounds (default 10) each run
#          one fork of the floor, the J2 and degree-4 + tides model cycles and the J2 servo cycle,
#          first of REV then of this checkout, so drift of the machine hits both sides alike; prints
#          per benchmark the fork scores, their median and mean +- standard deviation per side and
#          the ratio to the floor; also target/benchmark-compare.md (about 2 min per round)
# The JVM is pinned to one processor with taskset when it is available (EIGENZEIT_BENCH_CPU picks
# which, default 0; EIGENZEIT_BENCH_PIN=0 turns pinning off): on the shared virtual machine the
# figures were taken on, unpinned runs land in a slower mode in some forks (docs/performance.md).
# Close other work first: nothing else should run during a benchmark.
set -euo pipefail
cd "$(dirname "$0")/.."
what="${1:-goals}"
forks="${2:-5}"
case "$what" in goals|all|soak|peer|cycles|ops|compare) ;; *)
  echo "usage: scripts/benchmarks.sh [goals|all|soak|peer|cycles|ops] [forks|repeats|cycles] | compare REV [ROUNDS] [PATCH]" >&2
  exit 2 ;;
esac
if [ "$what" = compare ]; then
  rev="${2:-}"
  rounds="${3:-10}"
  patch="${4:-}"
  [ -z "$patch" ] || [ -f "$patch" ] || { echo "benchmarks: no patch file '$patch'" >&2; exit 2; }
  [ -z "$patch" ] || patch="$(cd "$(dirname "$patch")" && pwd)/$(basename "$patch")"
  git rev-parse --verify -q "$rev^{commit}" >/dev/null || { echo "benchmarks: compare needs a git revision, found '$rev'" >&2; exit 2; }
  case "$rounds" in ''|*[!0-9]*|0) echo "benchmarks: ROUNDS must be a whole number above 0, found '$rounds'" >&2; exit 2 ;; esac
fi

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
  compare)
    tmp=$(mktemp -d)
    trap 'git worktree remove --force "$tmp/before" >/dev/null 2>&1 || true; rm -rf "$tmp"' EXIT
    git worktree add -q --detach "$tmp/before" "$rev"
    if [ -n "$patch" ]; then (cd "$tmp/before" && git apply "$patch") && echo "applied $patch to $rev"; fi
    (cd "$tmp/before" && mvn -B -ntp -q -pl benchmarks -am package -DskipTests -Dspotbugs.skip=true -Djacoco.skip=true)
    cp "$tmp/before/benchmarks/target/benchmarks.jar" "$tmp/before.jar"
    cp "$jar" "$tmp/now.jar"
    mkdir -p target
    benches=("FloorBenchmark.keplerianTerms" "CoreCycleBenchmark.modelCycle:j2" "CoreCycleBenchmark.modelCycle:deg4-tides"
      "CoreCycleBenchmark.servoCycle:j2")
    : > "$tmp/scores.txt"
    for r in $(seq 1 "$rounds"); do
      for side in before now; do
        for b in "${benches[@]}"; do
          name="${b%%:*}"; params=()
          [ "$name" != "$b" ] && params=(-p "level=${b#*:}")
          score=$("${pin[@]}" java -jar "$tmp/$side.jar" "^org\.eigenzeit\.bench\.$name\$" "${params[@]}" -f 1 -rf csv \
              -rff "$tmp/one.csv" >/dev/null && awk -F, 'NR == 2 { gsub(/"/, "", $5); print $5 }' "$tmp/one.csv")
          echo "$b $side $r $score" | tee -a "$tmp/scores.txt"
        done
      done
    done
    state="$(git rev-parse --short HEAD)"
    [ -n "$(git status --porcelain --untracked-files=no)" ] && state="$state+changes"
    [ -n "$patch" ] && rev="$rev+$(basename "$patch")"
    awk -v rev="$rev" -v now="$state" -f scripts/compare-summary.awk "$tmp/scores.txt" | tee target/benchmark-compare.md ;;
esac
