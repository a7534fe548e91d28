#!/usr/bin/env bash
# Writes the git commit of the source tree (and whether it had uncommitted changes) into a
# properties file for the campaign provenance. Writes nothing when git or a work tree is absent
# (for example in a source copy): the provenance then names the build's version instead.
set -u
out="$1"
cd "$(dirname "$0")/.." || exit 0
commit=$(git rev-parse HEAD 2>/dev/null) || exit 0
dirty=false
if [ -n "$(git status --porcelain --untracked-files=no 2>/dev/null)" ]; then dirty=true; fi
mkdir -p "$(dirname "$out")"
printf 'git.commit.id=%s\ngit.dirty=%s\n' "$commit" "$dirty" > "$out"
