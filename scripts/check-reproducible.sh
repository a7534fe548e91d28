#!/usr/bin/env bash
# Proves that onboard-core builds reproducibly: two clean builds (fixed
# project.build.outputTimestamp) give byte-identical binary, sources and Javadoc jars. Builds in a
# scratch copy of the tracked files, so the working tree's target/ folders are left alone.
set -euo pipefail
cd "$(dirname "$0")/.."
scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT
git ls-files -z | xargs -0 cp --parents -t "$scratch"
build() {
  (cd "$scratch" && mvn -B -q -ntp -pl onboard-core clean package -DskipTests -Dspotbugs.skip=true -Djacoco.skip=true \
    && cd onboard-core/target && sha256sum onboard-core-*.jar)
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
