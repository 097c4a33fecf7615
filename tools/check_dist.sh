#!/bin/bash
# Check that a vesselnet tarball installs with Octave's "pkg install" and
# that "pkg load vesselnet" puts every command and every oct-file on the
# path.  Installs into a scratch prefix, so the user's packages are untouched.
#
# Usage: tools/check_dist.sh vesselnet-VERSION.tar.gz
set -euo pipefail

tarball=$(cd "$(dirname "${1:?usage: tools/check_dist.sh TARBALL}")" && pwd)/$(basename "$1")
scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT

# What the package should provide, read from the tarball itself.
listing=$(tar -tzf "$tarball")
top=$(printf '%s\n' "$listing" | head -n 1 | cut -d/ -f1)
for f in DESCRIPTION COPYING NEWS INDEX src/Makefile; do
  if ! printf '%s\n' "$listing" | grep -qx "$top/$f"; then
    echo "distcheck: $tarball lacks $top/$f" >&2
    exit 1
  fi
done
mfiles=$(printf '%s\n' "$listing" | sed -n "s,^$top/inst/\([^/]*\)\.m$,\1,p" | tr '\n' ' ')
octs=$(printf '%s\n' "$listing" | sed -n "s,^$top/src/gateway/\([^/]*\)\.cc$,\1,p" | tr '\n' ' ')

cd "$scratch"
env -u DISPLAY octave-cli --no-gui --norc --no-history -q --eval "
  pkg prefix '$scratch/pkg' '$scratch/arch';
  pkg local_list '$scratch/octave_packages';
  pkg install -local '$tarball';
  pkg load vesselnet;
  bad = 0;
  for n = strsplit (strtrim ('$mfiles'))
    if (! isempty (n{1}) && exist (n{1}) != 2)
      printf ('distcheck: command %s not on the path\n', n{1}); bad = 1;
    endif
  endfor
  for n = strsplit (strtrim ('$octs'))
    if (! isempty (n{1}) && exist (n{1}) != 3)
      printf ('distcheck: oct-file %s not on the path\n', n{1}); bad = 1;
    endif
  endfor
  p = pkg ('list', 'vesselnet');
  printf ('distcheck: installed %s %s in %s\n', p{1}.name, p{1}.version, p{1}.dir);
  printf ('distcheck: commands: %s\n', strtrim ('$mfiles'));
  printf ('distcheck: oct-files: %s\n', strtrim ('$octs'));
  pkg unload vesselnet;
  exit (bad);
" 2>&1 | grep -v "ignoring const execution_exception& while preparing to exit"
echo "distcheck: $tarball installs and loads"
