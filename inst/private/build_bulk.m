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
  net = build_bump (net, n);
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

%!test
%! ## Bulk calls and a loop of single calls give the same packed network.
%! loop = vn_boundary (vn_network ("b"), "R0", "head", 3);
%! lv = [0.5 1.5 2.5];
%! for i = 1:3
%!   loop = vn_tank (loop, sprintf ("T%d", i), "area", 2, "level", lv(i), "rim", 3);
%! endfor
%! loop = vn_feed (loop, "F1", "T1", "flow", 0.01);
%! loop = vn_feed (loop, "F2", "T2", "flow", -0.002);
%! loop = vn_orifice (loop, "O1", "T1", "T2", "coeff", 0.01);
%! loop = vn_orifice (loop, "O2", "T2", "", "diameter", 0.04);
%! loop = vn_resistance (loop, "R1", "R0", "T1", "r", 900);
%! loop = vn_valve (loop, "V1", "T3", "", "kv", 12, "characteristic", "equal");
%! loop = vn_valve (loop, "V2", "T3", "R0", "kv", 8, "characteristic", "linear");
%! loop = vn_pump (loop, "P1", "T2", "T3", "flow", 0.004);
%! loop = vn_pump (loop, "P2", "T3", "T1", "shutoff", 20, "k", 1e4);
%! bulk = vn_boundary (vn_network ("b"), {"R0"}, "head", 3);
%! bulk = vn_tank (bulk, {"T1", "T2", "T3"}, "area", 2, "level", lv, "rim", 3);
%! bulk = vn_feed (bulk, {"F1", "F2"}, {"T1", "T2"}, "flow", [0.01 -0.002]);
%! bulk = vn_orifice (bulk, {"O1"}, "T1", "T2", "coeff", 0.01);
%! bulk = vn_orifice (bulk, {"O2"}, {"T2"}, {""}, "diameter", 0.04);
%! bulk = vn_resistance (bulk, {"R1"}, "R0", "T1", "r", 900);
%! bulk = vn_valve (bulk, {"V1", "V2"}, "T3", {"", "R0"}, "kv", [12 8],
%!                  "characteristic", {"equal", "linear"});
%! bulk = vn_pump (bulk, {"P1"}, "T2", "T3", "flow", 0.004);
%! bulk = vn_pump (bulk, {"P2"}, "T3", "T1", "shutoff", 20, "k", 1e4);
%! a = vn_pack (loop);
%! b = vn_pack (bulk);
%! assert (isequaln (a, b));
%! assert (b.par(1,2:4), [0 0 0]);                 # prism shape code
%! j = find (strcmp (vn_schema ().valve.params, "char"));
%! assert (b.par([1 j],10:11), [12 8; 1 0]);       # kv; equal, linear
%! assert (double (b.ref(:,11).'), [3 0 -1 -1]);    # V2: T3 -> R0, 0-based
%! assert (double (b.ref(:,5).'), [-1 1 -1 -1]);    # F1 into T1

%!test
%! ## A spill into a tank declared earlier in the same call, and a table
%! ## per tank from a cell array.
%! tabs = {[0 0; 1 2], [0 0; 1 3; 2 7]};
%! net = vn_tank (vn_network (), {"A", "B"}, "table", tabs, "rim", [0.9 1.8],
%!                "spill", {"", "A"});
%! assert (net.units(2).to, "A");
%! assert (net.units(2).table, tabs{2});
%! assert ([net.index.A, net.index.B], [1 2]);

%!error <vn_tank: tank "B": SPILL names unit "C", which network "network" does not hold> vn_tank (vn_network (), {"A", "B", "C"}, "area", 1, "rim", 2, "spill", {"", "C", ""})
%!error <vn_tank: tank "T1" to "T3": LEVEL must be a scalar, or a vector or cell array of one value per unit \(3\), got a 1x2 double> vn_tank (vn_network (), {"T1", "T2", "T3"}, "area", 1, "level", [1 2])
%!error <vn_tank: tank "T2": NAME "T2" is already taken by a tank> vn_tank (vn_network (), {"T1", "T2", "T2"}, "area", 1)
%!error <vn_tank: tank "T2": AREA must be a positive finite scalar \(m2\), got -1> vn_tank (vn_network (), {"T1", "T2"}, "area", [1 -1])
%!error <vn_tank: tank: NAME must be a char identifier or a non-empty cell array of them, got an empty cell> vn_tank (vn_network (), {}, "area", 1)
