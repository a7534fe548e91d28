#!/usr/bin/env bash
# Seeded-fault check (docs/verification.md, "Seeded faults"): every fault of verification/faults.yaml
# is applied, one at a time, to a scratch copy of the tracked (and new, not ignored) files; the
# tests named to catch it are run and must FAIL. The working tree is never touched.
#   1. copy the files to a scratch directory and build it once (test-compile of every module, and
#      each module's test class path), about 1.5 minutes;
#   2. per fault: check its snippet occurs exactly once (else STALE), apply it, recompile with the
#      JDK's compiler (no Error Prone, SpotBugs or JaCoCo), run only the named tests in a fresh JVM,
#      restore the file.
# Prints a table (fault, tests, CAUGHT / NOT CAUGHT / STALE / ...), writes fault-check.csv and
# fault-check.md into the output directory, and exits non-zero unless every fault is caught.
# Usage: scripts/fault-check.sh [output-directory] [fault-id,...]     (default target/fault-check)
#        scripts/fault-check.sh --write-docs    (regenerate the table in docs/verification.md)
set -euo pipefail
cd "$(dirname "$0")/.."
here="$(pwd)"
scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT
git ls-files -z --cached --others --exclude-standard | while IFS= read -r -d '' f; do
  [ -e "$f" ] && printf '%s\0' "$f"
done | xargs -0 cp --parents -t "$scratch"
modules=onboard-core,ground-sim,verification,host-example
[ "${1:-}" = "--write-docs" ] && modules=onboard-core,ground-sim,verification
(cd "$scratch" && mvn -B -ntp -q -pl "$modules" test-compile \
  dependency:build-classpath -Dmdep.outputFile=target/fault-classpath.txt -Dmdep.includeScope=test \
  -Djacoco.skip=true -Dspotbugs.skip=true)
cp_file="$scratch/verification/target/fault-classpath.txt"
run=(java -cp "$scratch/verification/target/classes:$(cat "$cp_file")" org.eigenzeit.verification.faults.FaultCheck
  --root "$scratch")
if [ "${1:-}" = "--write-docs" ]; then
  "${run[@]}" --faults "$here/verification/faults.yaml" --write-docs "$here/docs/verification.md"
  exit 0
fi
out="${1:-target/fault-check}"
case "$out" in /*) ;; *) out="$here/$out" ;; esac
"${run[@]}" --out "$out" ${2:+--only "$2"}
