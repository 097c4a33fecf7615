#!/bin/bash
# Run the C unit tests of the core: each tests/c/NAME.c is one program,
# built by the top Makefile as BINDIR/NAME, whose last output line is
# "N passed, N failed".
#
# Usage: tests/run_c_tests.sh BINDIR RESULTDIR [LABEL]
# Writes RESULTDIR/[LABEL__]tests__c__NAME.c.{log,res}; the .res line is
# "PASSED FAILED SKIPPED FILE LOG NOTE" (see tools/sum_results.sh), FILE
# being [LABEL:]tests/c/NAME.c.  LABEL names a second build of the same
# programs ("sanitize"): a sanitizer report in the log is a failure.
# A program that did not build, crashed, hung (TEST_TIMEOUT s, default 600),
# exited non-zero or printed no summary line counts as at least one failure.
set -euo pipefail

bindir=${1:?usage: tests/run_c_tests.sh BINDIR RESULTDIR}
resdir=${2:?usage: tests/run_c_tests.sh BINDIR RESULTDIR [LABEL]}
label=${3:-}
mkdir -p "$resdir"

shopt -s nullglob
srcs=(tests/c/*.c)
shopt -u nullglob
if [ "${#srcs[@]}" -eq 0 ]; then
  echo "c tests: no tests/c/*.c files found"
  exit 0
fi
echo "c tests${label:+ ($label)}: ${#srcs[@]} program(s)"

for src in "${srcs[@]}"; do
  name=$(basename "$src" .c)
  key=${label:+${label}__}${src//\//__}
  shown=${label:+$label:}$src
  log="$resdir/$key.log"
  bin="$bindir/$name"
  p=0; f=0; note=""
  if [ ! -x "$bin" ]; then
    f=1
    note="did not build"
    if [ -s "$bin.build.log" ]; then
      cp "$bin.build.log" "$log"
    else
      echo "$src: no program $bin (the core library may have failed)" >"$log"
    fi
  else
    rc=0
    timeout "${TEST_TIMEOUT:-600}" "$bin" >"$log" 2>&1 || rc=$?
    last=$(grep -v '^[[:space:]]*$' "$log" | tail -n 1 || true)
    if [[ "$last" =~ ^([0-9]+)\ passed,\ ([0-9]+)\ failed$ ]]; then
      p=${BASH_REMATCH[1]}
      f=${BASH_REMATCH[2]}
    else
      f=1
      note="no final 'N passed, N failed' line"
    fi
    if [ "$rc" -eq 124 ]; then
      note="timed out after ${TEST_TIMEOUT:-600} s"
      [ "$f" -gt 0 ] || f=1
    elif [ "$rc" -ne 0 ]; then
      [ "$rc" -gt 128 ] && note="killed by signal $((rc - 128)) ${note}" \
                        || note="exit status $rc ${note}"
      [ "$f" -gt 0 ] || f=1
    fi
  fi
  if [ -s "$log" ] && grep -qE 'ERROR: (Address|Leak)Sanitizer|runtime error:' "$log"; then
    note="sanitizer report ${note}"
    [ "$f" -gt 0 ] || f=1
  fi
  echo "$p $f 0 $shown $log $note" >"$resdir/$key.res"
  if [ "$f" -gt 0 ]; then status="FAIL"; else status="ok  "; fi
  printf '  %s %-40s %3d passed, %d failed %s\n' "$status" "$shown" "$p" "$f" "$note"
done
