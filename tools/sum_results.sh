#!/bin/bash
# Add up the per-file test results in RESULTDIR/*.res and report.
#
# Each .res file holds one line "PASSED FAILED SKIPPED FILE LOG NOTE...",
# written by tests/run_c_tests.sh, tests/run_octave_tests.m(.sh) or the
# build step of "make check".  The log of every failing file is printed,
# then the list of failing files, and last the line "N passed, N failed".
# Exit status: 0 when something passed and nothing failed, 1 otherwise.
set -euo pipefail

resdir=${1:?usage: tools/sum_results.sh RESULTDIR}
maxlines=${LOG_LINES:-200}

shopt -s nullglob
res=("$resdir"/*.res)
shopt -u nullglob

total_p=0; total_f=0; total_s=0; nfiles=0
failing=()
for r in "${res[@]}"; do
  read -r p f s file log note <"$r" || true
  nfiles=$((nfiles + 1))
  total_p=$((total_p + p))
  total_f=$((total_f + f))
  total_s=$((total_s + s))
  if [ "$f" -gt 0 ]; then
    failing+=("$file: $f failed${note:+ ($note)}")
    echo
    echo "==== FAIL $file: $f failed${note:+ ($note)} ===="
    # Octave's failing blocks first, then what the process printed.
    out=${log%.log}.out
    if [ -s "$log" ]; then
      head -n "$maxlines" "$log"
    fi
    if [ "$out" != "$log" ] && [ -s "$out" ]; then
      echo "---- output of the run (last $maxlines lines) ----"
      grep -vE "ignoring const execution_exception& while preparing to exit|^  (ok  |FAIL) " \
        "$out" | tail -n "$maxlines" || true
    fi
  fi
done

echo
echo "test files: $nfiles, skipped tests: $total_s"
if [ "${#failing[@]}" -gt 0 ]; then
  echo "failing files:"
  printf '  %s\n' "${failing[@]}"
fi
if [ $((total_p + total_f)) -eq 0 ]; then
  echo "no tests ran"
fi
echo "$total_p passed, $total_f failed"

if [ "$total_f" -gt 0 ] || [ $((total_p + total_f)) -eq 0 ]; then
  exit 1
fi
exit 0
