#!/usr/bin/env bash
# Reproduces the per-level error budget table of docs/algorithms.md: the onboard core at each
# model level against the ground reference along the same one-day trajectory (needs python3 to
# format the JSON).
set -euo pipefail
cd "$(dirname "$0")/.."
orbits=(
"LEO-550 --sma-km 6928.137 --ecc 0.0012 --inc-deg 97.6 --raan-deg 30 --argp-deg 90"
"MEO-GPS --sma-km 26561.75 --ecc 0.01 --inc-deg 55 --raan-deg 120 --argp-deg 40"
"HEO-e0.16 --sma-km 26000 --ecc 0.16 --inc-deg 50 --raan-deg 200 --argp-deg 270"
"GEO --sma-km 42164.17 --ecc 0.0002 --inc-deg 0.05 --anomaly-deg 75"
)
levels=("point-mass false 0" "j2 false 0" "harmonics false 8" "harmonics true 8" "harmonics true 20" "harmonics true 36")
for o in "${orbits[@]}"; do set -- $o; name=$1; shift; args="$*"
  for l in "${levels[@]}"; do set -- $l
    ./eigenzeit budget $args --core-level $1 --core-tides $2 --degree $3 --json | python3 -c "
import json,sys; j=json.load(sys.stdin); print('%-10s %-10s tides=%-5s deg=%-2s  dy=%9.2e  maxdiff=%10.3f ps' % ('$name','$1','$2','$3', j['coreMinusReferenceRate'], j['maxOffsetDifferenceS']*1e12))"
  done; done
for l in "point-mass false 0" "j2 false 0" "j2 true 0"; do set -- $l
  ./eigenzeit budget --body moon --sma-km 1838 --ecc 0.01 --inc-deg 90 --core-level $1 --core-tides $2 --json | python3 -c "
import json,sys; j=json.load(sys.stdin); print('%-10s %-10s tides=%-5s deg=--  dy=%9.2e  maxdiff=%10.3f ps' % ('LUNAR-100','$1','$2', j['coreMinusReferenceRate'], j['maxOffsetDifferenceS']*1e12))"
done
