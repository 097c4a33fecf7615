## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_bulk (@var{fn}, @var{kind}, @var{net}, @var{names}, @var{fixed}, @var{fixnames}, @var{args}, @var{spec}, @var{one})
## Add many units of one kind in one call: the bulk form of the builders.
##
## @var{names} is a cell array of unit names.  @var{fixed} holds the
## positional arguments after the name (FROM, TO or TANK), each one name
## for all units or a cell array of one name per unit; @var{fixnames} are
## their names for messages.  In @var{args} (name/value options, rows of
## @var{spec} as in build_options) a value is one for all units or, for a
## scalar option, a numeric vector or cell array of one value per unit;
## matrix, name and choice options take a cell array of one per unit.
##
## Unit @var{i} is checked by @code{@var{one} (@var{fn}, @var{net},
## @var{name}, @var{fixed}, @var{args}, @var{spec})} against the network
## holding every unit before it, as a loop of single calls would be, so the
## checks and messages are those of the single form.  The units are
## appended to a local copy of the network, which is copied once per call
## rather than once per unit.
## @end deftypefn

function net = build_bulk (fn, kind, net, names, fixed, fixnames, args, spec, one)
  build_check_net (fn, net);
  n = numel (names);
  if (! iscellstr (names) || n == 0)
    build_error (fn, kind, ["NAME must be a char identifier or a non-empty ", ...
                            "cell array of them, got %s"], build_value_str (names));
  endif
  if (n == 1)
    label = sprintf ("%s \"%s\"", kind, names{1});
  else
    label = sprintf ("%s \"%s\" to \"%s\"", kind, names{1}, names{end});
  endif
  names = names(:).';
  fix = cell (numel (fixed), n);
  for j = 1:numel (fixed)
    fix(j,:) = per_unit (fn, label, upper (fixnames{j}), fixed{j}, n, false);
  endfor
  vals = cell (numel (args), n);
  for j = 1:numel (args)
    vals(j,:) = {args{j}};
  endfor
  ## Options are split per unit only where they are well formed; anything
  ## else goes to every unit unchanged, for build_options to report.
  if (mod (numel (args), 2) == 0)
    for j = 1:2:numel (args)
      key = args{j};
      if (! (ischar (key) && rows (key) == 1))
        continue;
      endif
      k = find (strcmp (lower (key), spec(:,1)), 1);
      if (isempty (k))
        continue;
      endif
      scalar = ! any (strcmp (spec{k,2}, {"ref", "matrix", "choice", "names", "vector"}));
      vals(j+1,:) = per_unit (fn, label, upper (key), args{j+1}, n, scalar);
    endfor
  endif
  n0 = numel (net.units);
  for i = 1:n
    u = one (fn, net, names{i}, fix(:,i).', vals(:,i).', spec);
    ## Appended in place: NET is local here, so no copy per unit.
    if (n0 + i == 1)
      net.units = u;
    else
      net.units(n0+i) = u;
    endif
    net.index.(names{i}) = n0 + i;
  endfor
endfunction

## One value per unit: V itself, the elements of a cell of N, or for a
## scalar option the elements of a numeric or logical array of N.
function c = per_unit (fn, label, key, v, n, scalar)
  if (iscell (v) || (scalar && (isnumeric (v) || islogical (v))
                     && ! isscalar (v)))
    if (numel (v) != n)
      if (scalar)
        what = "a scalar, or a vector or cell array";
      else
        what = "one value, or a cell array";
      endif
      build_error (fn, label, "%s must be %s of one value per unit (%d), got %s",
                   key, what, n, build_value_str (v));
    endif
    if (iscell (v))
      c = v(:).';
    else
      c = num2cell (v(:).');
    endif
  else
    c = repmat ({v}, 1, n);
  endif
endfunction
