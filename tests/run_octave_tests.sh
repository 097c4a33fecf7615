#!/bin/bash
# Run the Octave tests, one octave-cli process per file so that a crash or
# hang in one oct-file costs one file, not the whole run.
#
# Usage: tests/run_octave_tests.sh RESULTDIR [FILE...]
# Without FILEs: every inst/*.m and inst/private/*.m with test blocks,
# every src/gateway/*.cc with test blocks, and every tests/octave/*.m.
# Environment: VN_OCTDIR (oct-files, default build/oct), TEST_JOBS
# (parallel processes, default nproc), TEST_TIMEOUT (s per file, 1800).
set -euo pipefail

here=$(cd "$(dirname "$0")/.." && pwd)
cd "$here"

if [ "${1:-}" = "--one" ]; then
  # One file: called by xargs below.
  resdir=$2
  file=$3
  name=${file//\//__}
  out="$resdir/$name.out"
  rc=0
  env -u DISPLAY QT_QPA_PLATFORM=offscreen \
    timeout "${TEST_TIMEOUT:-1800}" \
    octave-cli --no-gui --norc --no-history -q tests/run_octave_tests.m "$resdir" "$file" \
    >"$out" 2>&1 || rc=$?
  grep -E '^  (ok  |FAIL) ' "$out" || true
  if [ ! -s "$resdir/$name.res" ] || [ "$rc" -ne 0 ]; then
    # No result line, or Octave died after writing one: a failure either way.
    if [ "$rc" -eq 124 ]; then
      why="timed out after ${TEST_TIMEOUT:-1800} s"
    else
      why="octave-cli exited with status $rc"
    fi
    p=0; f=0; s=0
    if [ -s "$resdir/$name.res" ]; then
      read -r p f s _ <"$resdir/$name.res"
    fi
    [ "$f" -gt 0 ] || f=1
    echo "$p $f $s $file $out $why" >"$resdir/$name.res"
    echo "  FAIL $file: $why"
  fi
  exit 0
fi

resdir=${1:?usage: tests/run_octave_tests.sh RESULTDIR [FILE...]}
shift
mkdir -p "$resdir"

has_tests() {
  grep -qE '^%!(test|assert|error|fail|warning|xtest)' "$1"
}

files=()
if [ "$#" -gt 0 ]; then
  files=("$@")
else
  shopt -s nullglob
  for f in inst/*.m inst/private/*.m src/gateway/*.cc; do
    if has_tests "$f"; then
      files+=("$f")
    fi
  done
  # Files here are meant to be tests; say so when one holds none.
  for f in tests/octave/*.m; do
    if has_tests "$f"; then
      files+=("$f")
    else
      echo "octave tests: $f has no test blocks (helper?), not run"
    fi
  done
  shopt -u nullglob
fi

if [ "${#files[@]}" -eq 0 ]; then
  echo "octave tests: no files with test blocks found"
  exit 0
fi

echo "octave tests: ${#files[@]} file(s)"
jobs=${TEST_JOBS:-$(nproc 2>/dev/null || echo 1)}
printf '%s\0' "${files[@]}" |
  xargs -0 -n 1 -P "$jobs" bash "$0" --one "$resdir"
