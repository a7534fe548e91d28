#!/usr/bin/env bash
# Regenerates the ground fuzz corpus (ground-sim/src/test/resources/fuzz/) from its generator
# (ground-sim/src/test/java/org/eigenzeit/ground/fuzz/FuzzCorpusGenerator.java), then runs it.
# Needs Java 17 and Maven; see DEVELOPERS.md, "The fuzz corpus".
set -euo pipefail
here="$(cd "$(dirname "$0")/.." && pwd)"
cd "$here"
mvn -B -ntp -q -pl ground-sim -am test -Dtest=FuzzCorpusGeneratorTest -Dsurefire.failIfNoSpecifiedTests=false \
  -Dfuzz.write="$here/ground-sim/src/test/resources/fuzz" -Djacoco.skip=true -Dspotbugs.skip=true
mvn -B -ntp -q -pl ground-sim -am test -Dtest='FuzzCorpusTest,FuzzCorpusGeneratorTest' \
  -Dsurefire.failIfNoSpecifiedTests=false -Djacoco.skip=true -Dspotbugs.skip=true | grep -E 'fuzz corpus|evidence: fuzz'
