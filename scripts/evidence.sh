#!/usr/bin/env bash
# Writes the review evidence package (docs/verification.md, "The evidence package"):
#   1. a clean build running every test of every module (the Surefire reports carry the measured
#      values the tests print as "evidence: <key> = <value>") with JaCoCo on onboard-core;
#   2. PIT mutation testing of onboard-core (about 12 minutes on 2 cores; EIGENZEIT_SKIP_PIT=1
#      skips it and the mutation requirement then shows NOT MEASURED);
#   3. the package writer: requirements file + reports -> HTML, Markdown, CSV, plots,
#      environment, input checksums.
# Usage: scripts/evidence.sh [output-directory]   (default target/evidence)
# Exit status 0 only when every requirement passes.
set -euo pipefail
cd "$(dirname "$0")/.."
out="${1:-target/evidence}"

mvn -B -ntp clean verify
if [ -z "${EIGENZEIT_SKIP_PIT:-}" ]; then
  mvn -B -ntp -pl onboard-core test-compile org.pitest:pitest-maven:mutationCoverage -Djacoco.skip=true
fi

commit="unknown"; tree="unknown"
if git rev-parse HEAD >/dev/null 2>&1; then
  commit="$(git rev-parse HEAD)"
  if [ -z "$(git status --porcelain --untracked-files=no)" ]; then tree="clean"; else tree="modified"; fi
fi
maven="$(mvn -B -v 2>/dev/null | sed -n "1s/\x1b\[[0-9;]*m//gp" || true)"
java -cp "verification/target/classes:verification/target/lib/*" \
  org.eigenzeit.verification.evidence.EvidenceCommand \
  --root . --out "$out" --commit "$commit" --env "working tree=$tree" --env "build=$maven" \
  ${EIGENZEIT_EVIDENCE_TIME:+--generated-at "$EIGENZEIT_EVIDENCE_TIME"}
