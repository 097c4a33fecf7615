#!/bin/bash
# Make sure the Debian packages vesselnet needs are installed.
# Usage: tools/deps.sh [PACKAGE...]   (default: the build and test set)
# As root, missing packages are installed (apt-get update runs once, first);
# otherwise the exact command to run is printed and the script fails.
set -euo pipefail

if [ "$#" -gt 0 ]; then
  pkgs=("$@")
else
  pkgs=(octave liboctave-dev libsundials-dev liblapack-dev libsuitesparse-dev
        octave-control octave-optim)
fi

if ! command -v dpkg-query >/dev/null 2>&1; then
  echo "deps: dpkg-query not found (not Debian?); not checking ${pkgs[*]}" >&2
  exit 0
fi

missing=()
for p in "${pkgs[@]}"; do
  status=$(dpkg-query -W -f='${db:Status-Status}' "$p" 2>/dev/null || true)
  if [ "$status" != "installed" ]; then
    missing+=("$p")
  fi
done

if [ "${#missing[@]}" -eq 0 ]; then
  exit 0
fi

cmd="apt-get install -y ${missing[*]}"
if [ "$(id -u)" -ne 0 ]; then
  echo "deps: missing Debian packages: ${missing[*]}" >&2
  echo "deps: run as root:" >&2
  echo "  apt-get update && DEBIAN_FRONTEND=noninteractive $cmd" >&2
  exit 1
fi

echo "deps: installing ${missing[*]}"
export DEBIAN_FRONTEND=noninteractive
apt-get update
$cmd
