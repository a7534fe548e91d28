#!/usr/bin/env bash
# Builds a minimal Java runtime image that holds only java.base, the onboard core's module and the
# example host loop, runs the host loop on it, and reports the image size. Expects the module jars
# to be built (mvn package, or scripts/test-all.sh); builds them if they are missing.
set -euo pipefail
cd "$(dirname "$0")/.."
core=onboard-core/target/onboard-core-0.1.0-SNAPSHOT.jar
host=host-example/target/host-example-0.1.0-SNAPSHOT.jar
if [ ! -f "$core" ] || [ ! -f "$host" ]; then
  mvn -B -q -ntp -pl host-example -am package -DskipTests -Dspotbugs.skip=true -Djacoco.skip=true
fi
image=host-example/target/host-image
rm -rf "$image"
jlink --module-path "$core:$host" --add-modules org.eigenzeit.hostexample \
  --strip-debug --no-header-files --no-man-pages --compress=2 --output "$image" 2>/dev/null \
  || jlink --module-path "$core:$host" --add-modules org.eigenzeit.hostexample \
       --strip-debug --no-header-files --no-man-pages --output "$image"
echo "jlink image modules:"
"$image/bin/java" --list-modules
"$image/bin/java" -m org.eigenzeit.hostexample/org.eigenzeit.hostexample.HostLoop | tail -3
echo "jlink image size: $(du -sh "$image" | cut -f1) ($(du -sb "$image" | cut -f1) bytes)"
