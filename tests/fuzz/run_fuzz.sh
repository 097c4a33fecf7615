#!/bin/bash
# Run the libFuzzer harness for SECONDS and report executions and crashes.
#
# Usage: tests/fuzz/run_fuzz.sh FUZZER WORKDIR SECONDS
# The working corpus is WORKDIR/corpus (new inputs land there), seeded from
# tests/fuzz/corpus; crashes are written as WORKDIR/crash-*.  One line per
# run is appended to WORKDIR/history.log.  Exit status 1 when the fuzzer
# found a crash: turn it into a regression input in tests/fuzz/regress
# (replayed by tests/c/test_fuzz_replay.c) and fix the core.
set -euo pipefail

fuzzer=${1:?usage: run_fuzz.sh FUZZER WORKDIR SECONDS}
work=${2:?usage: run_fuzz.sh FUZZER WORKDIR SECONDS}
secs=${3:?usage: run_fuzz.sh FUZZER WORKDIR SECONDS}
mkdir -p "$work/corpus"
log="$work/last-run.log"
shopt -s nullglob
findings() { local f=("$work"/crash-* "$work"/timeout-* "$work"/oom-* "$work"/leak-*); echo "${#f[@]}"; }
before=$(findings)

rc=0
# -timeout: one input running longer than this is a hang, reported as such;
# the harness bounds its own work far below it.
"$fuzzer" -max_total_time="$secs" -timeout=25 -rss_limit_mb=2048 \
  -print_final_stats=1 -artifact_prefix="$work/" \
  "$work/corpus" tests/fuzz/corpus >"$log" 2>&1 || rc=$?

execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log" | tail -n 1)
found=$(( $(findings) - before ))
corp=("$work"/corpus/*)
ncorp=${#corp[@]}
line="$(date -u +%Y-%m-%dT%H:%MZ) ${secs}s executions=${execs:-0} crashes=$found corpus=$ncorp exit=$rc"
echo "$line" >>"$work/history.log"
echo "fuzz: $line"
if [ "$rc" -ne 0 ] || [ "$found" -gt 0 ]; then
  echo "fuzz: the fuzzer stopped on a failure; the end of its log:" >&2
  grep -v '^#' "$log" | tail -n 40 >&2
  printf '%s\n' "$work"/crash-* "$work"/timeout-* "$work"/oom-* "$work"/leak-* >&2
  exit 1
fi
