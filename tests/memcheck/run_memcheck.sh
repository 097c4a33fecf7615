#!/bin/bash
# Valgrind's memcheck over the Octave calls of tests/memcheck/memcheck_calls.m.
#
# Usage: tests/memcheck/run_memcheck.sh OCTDIR OUTDIR
# Octave itself and the libraries it loads report things vesselnet cannot
# change, so only reports with a stack frame inside vesselnet count: a
# frame in one of OCTDIR's oct-files (the gateways with the core linked
# in), or in a vesselnet core or gateway function.  Those reports are
# printed in full; any of them, or calls that did not finish, fail.
set -euo pipefail

octdir=$(cd "${1:?usage: run_memcheck.sh OCTDIR OUTDIR}" && pwd)
out=${2:?usage: run_memcheck.sh OCTDIR OUTDIR}
here=$(cd "$(dirname "$0")/../.." && pwd)
mkdir -p "$out"
vlog="$out/valgrind.log"
olog="$out/octave.log"

if ! command -v valgrind >/dev/null; then
  echo "memcheck: skipped: valgrind is not installed (Debian: valgrind)"
  exit 0
fi

echo "memcheck: valgrind over tests/memcheck/memcheck_calls.m (a few minutes)"
rc=0
env -u DISPLAY QT_QPA_PLATFORM=offscreen \
  OCTAVE_PATH="$here/inst:$octdir" \
  valgrind --tool=memcheck --leak-check=full \
    --show-leak-kinds=definite,indirect \
    --errors-for-leak-kinds=definite,indirect \
    --num-callers=50 --keep-debuginfo=yes --log-file="$vlog" \
    octave-cli --no-gui --norc -q "$here/tests/memcheck/memcheck_calls.m" \
    >"$olog" 2>&1 || rc=$?
grep '^memcheck:' "$olog" || true

# Split the log into reports (blank "==PID==" lines separate them) and keep
# those with a vesselnet frame.
ours=$(awk -v oct="$octdir/" '
  function flush() {
    if (block != "" && head ~ /(Invalid|uninitialised|Conditional jump|lost in|Mismatched|overlap|Syscall param|Argument .* of function)/) {
      total++
      if (index(block, oct) || block ~ /[ :](vn|vn_gw)_[a-z_]+ \(/) {
        n++
        printf "%s\n", block > "/dev/stderr"
      }
    }
    block = ""; head = ""
  }
  /^==[0-9]+== *$/ { flush(); next }
  {
    line = $0; sub(/^==[0-9]+== /, "", line)
    if (block == "") head = line
    block = block "\n  " line
  }
  END { flush(); printf "%d %d\n", n + 0, total + 0 }
' "$vlog" 2>"$out/ours.txt")
read -r nours ntotal <<<"$ours"
summary=$(grep -E 'ERROR SUMMARY|definitely lost:|indirectly lost:' "$vlog" | sed 's/^==[0-9]*== /  /' || true)
echo "$summary"
echo "memcheck: $ntotal reports in all, $nours with a vesselnet frame"
if [ "$nours" -gt 0 ]; then
  echo "memcheck: reports inside vesselnet:"
  cat "$out/ours.txt"
fi
if ! grep -q '^memcheck: all calls done' "$olog"; then
  echo "memcheck: the calls did not finish (octave-cli exit $rc); end of its output:"
  tail -n 20 "$olog"
  exit 1
fi
[ "$nours" -eq 0 ]
