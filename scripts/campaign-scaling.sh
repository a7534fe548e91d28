#!/usr/bin/env bash
# Measures campaign wall time against runs and cores: the local runner on 1 and 2 threads and Spark
# in local[1] and local[2] (org.eigenzeit.spark.Scaling). Run it on a quiet machine (the first
# figure of /proc/loadavg below 0.7). Arguments: span in hours per run, then run counts.
#   scripts/campaign-scaling.sh 6 4 8 16
set -euo pipefail
cd "$(dirname "$0")/.."
mvn -B -q -ntp -pl campaign-spark -am package dependency:build-classpath -DskipTests -Dspotbugs.skip=true \
  -Djacoco.skip=true -Dmdep.includeScope=test -Dmdep.outputFile=target/classpath.txt
flags=$(sed -n 's:.*<spark.jvm.flags>\(.*\)</spark.jvm.flags>.*:\1:p' campaign-spark/pom.xml)
echo "load before: $(cat /proc/loadavg)"
# shellcheck disable=SC2086
java $flags -cp "campaign-spark/target/classes:$(cat campaign-spark/target/classpath.txt)" org.eigenzeit.spark.Scaling "$@"
echo "load after: $(cat /proc/loadavg)"
