#!/usr/bin/env bash
# The steps of docs/integration.md, literally, in a fresh temporary folder: clone this checkout
# (committed files only), build the onboard-core jar with Maven (package, nothing installed into
# ~/.m2), compile docs/examples/tiny-host with plain javac against the jar on the class path and on
# the module path, run both and check their output, then build and run the example host loop on
# its own. Needs Java 17 and Maven (README.md, Prerequisites). EIGENZEIT_MVN_OPTS adds Maven
# options (e.g. -o once the dependencies are in ~/.m2). Exit code 0 when every step passed.
#
# The guide is written for the ClockCorrector API (org.eigenzeit.onboard.corrector). On a checkout
# whose core still has the older Timekeeper class the script translates the tiny host to it
# (package, class name and table calls) and says so, so that it also runs before that API lands.
set -euo pipefail
repo="$(cd "$(dirname "$0")/.." && pwd)"
work="$(mktemp -d "${TMPDIR:-/tmp}/eigenzeit-integration.XXXXXX")"
trap 'rm -rf "$work"' EXIT
mvn_opts=(-B -ntp -q ${EIGENZEIT_MVN_OPTS:-})
step() { echo "integration-check: $*"; }
fail() { echo "integration-check: FAILED: $*" >&2; exit 1; }

step "fresh clone in $work"
git clone -q "$repo" "$work/eigenzeit"
cd "$work/eigenzeit"

# Guide, "Build the core jar".
step "mvn -pl onboard-core -am package -DskipTests"
mvn "${mvn_opts[@]}" -pl onboard-core -am package -DskipTests >"$work/build-core.log" 2>&1 \
  || { sed 's/\x1b\[[0-9;]*m//g' "$work/build-core.log" | tail -30 >&2; fail "core build"; }
core="$(ls onboard-core/target/onboard-core-*.jar | grep -v -e '-sources' -e '-javadoc' | head -1)"
[ -f "$core" ] || fail "no onboard-core jar in onboard-core/target"
core="$work/eigenzeit/$core"
step "core jar $(basename "$core"), $(wc -c <"$core") bytes"

# Guide, "A host compiled with plain javac".
mkdir -p "$work/host/src/org/example/host"
cp docs/examples/tiny-host/TinyHost.java "$work/host/src/org/example/host/"
cp docs/examples/tiny-host/module-info.java "$work/host/src/"
if ! jar tf "$core" | grep -q '^org/eigenzeit/onboard/corrector/ClockCorrector.class$'; then
  step "this core has the older Timekeeper API: translating the tiny host to it"
  sed -i -e 's/org\.eigenzeit\.onboard\.corrector\./org.eigenzeit.onboard.timekeeper./' \
    -e 's/ClockCorrector/Timekeeper/g' -e '/import org.eigenzeit.onboard.table.TableId;/d' \
    -e 's/c\.loadTable(TableId\.SERVO, servoTable, 0, servoTable\.length)/c.parameters().load(servoTable, 0, servoTable.length)/' \
    -e 's/c\.activateTable(TableId\.SERVO)/c.parameters().activate()/' "$work/host/src/org/example/host/TinyHost.java"
fi
cd "$work/host"
step "javac --release 11 -cp onboard-core.jar (class path)"
javac --release 11 -Xlint:all -Werror -cp "$core" -d classes src/org/example/host/TinyHost.java
java -cp "$core:classes" org.example.host.TinyHost | tee out-classpath.txt
step "javac --release 11 --module-path onboard-core.jar (module path)"
javac --release 11 -Xlint:all -Werror --module-path "$core" -d mods/org.example.host src/module-info.java \
  src/org/example/host/TinyHost.java
java --module-path "$core:mods" -m org.example.host/org.example.host.TinyHost >out-modulepath.txt
cmp -s out-classpath.txt out-modulepath.txt || fail "class-path and module-path runs differ"
grep -Eq '^tiny-host: done, 1801 cycles, mode TRACK, orbit OK, measurements refused 0, ' out-classpath.txt \
  || fail "the tiny host did not end tracking with every status OK"

# Guide, "Run the example host loop on its own".
cd "$work/eigenzeit"
step "mvn -pl host-example -am package -DskipTests; java -m org.eigenzeit.hostexample/...HostLoop"
mvn "${mvn_opts[@]}" -pl host-example -am package -DskipTests >"$work/build-host.log" 2>&1 \
  || { sed 's/\x1b\[[0-9;]*m//g' "$work/build-host.log" | tail -30 >&2; fail "host-example build"; }
java --module-path "onboard-core/target/onboard-core-0.1.0-SNAPSHOT.jar:host-example/target/host-example-0.1.0-SNAPSHOT.jar" \
  -m org.eigenzeit.hostexample/org.eigenzeit.hostexample.HostLoop >"$work/hostloop.txt"
tail -2 "$work/hostloop.txt"
grep -q '^host: end, mode TRACK' "$work/hostloop.txt" || fail "the example host loop did not end in TRACK"
step "all steps passed"
