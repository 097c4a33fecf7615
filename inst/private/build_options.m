## -*- texinfo -*-
## @deftypefn {} {[@var{par}, @var{aux}, @var{given}] =} build_options (@var{fn}, @var{label}, @var{args}, @var{spec})
## Parse and check the name/value options of a network builder.
##
## @var{spec} is an N x 4 cell, one row per allowed option:
## @{name, type, unit of measure, extra@}.  Option names are matched without
## regard to case.  Types:
##
## @table @asis
## @item "real"      finite real scalar
## @item "positive"  finite scalar > 0
## @item "nonneg"    finite scalar >= 0
## @item "rim"       scalar > 0, Inf allowed
## @item "fraction"  scalar in [0, 1]
## @item "cd"        scalar in (0, 1]
## @item "above1"    finite scalar greater than 1
## @item "count2"    0, 1 or 2
## @item "choice"    one of the strings in extra@{2@}; the code (0-based
##                   position) goes to par.(extra@{1@})
## @item "ref"       a unit name or "" (only in @var{given})
## @item "matrix"    a real matrix (only in @var{given}; checked by the caller)
## @item "logical"   true or false (only in @var{given})
## @item "names"     a cellstr or char of identifiers (only in @var{given})
## @item "vector"    a vector of finite values >= 0 (only in @var{given})
## @item "cell"      a cell array (only in @var{given}; checked by the caller)
## @end table
##
## Numeric scalars go to @var{par}, choices to @var{aux} (the string) and
## @var{par} (the code); @var{given} holds every value as given.
##
## A numeric option (real, positive, nonneg, rim, fraction, cd, above1,
## vector) may be given as a text "VALUE UNIT" ("36 m3/h", "2400 mm",
## "50 %"): it is converted by @code{units_value} to the option's unit of
## measure (the schema's), whose dimension the unit must share; an empty
## unit of measure means a fraction (1 or %), and "kv" is a valve
## coefficient (Kv or Cv).  The value converted is what is checked and
## stored.
## @end deftypefn

function [par, aux, given] = build_options (fn, label, args, spec)
  par = struct ();
  aux = struct ();
  given = struct ();
  if (mod (numel (args), 2) != 0)
    build_error (fn, label, ["options must come in name/value pairs, got ", ...
                             "%d arguments after the fixed ones"], numel (args));
  endif
  names = spec(:,1);
  for i = 1:2:numel (args)
    key = args{i};
    if (! (ischar (key) && rows (key) == 1))
      build_error (fn, label, "option names must be char, got %s; allowed: %s",
                   build_value_str (key), strjoin (names.', ", "));
    endif
    key = lower (key);
    k = find (strcmp (key, names), 1);
    if (isempty (k))
      build_error (fn, label, "unknown option \"%s\"; allowed: %s",
                   args{i}, strjoin (names.', ", "));
    endif
    if (isfield (given, key))
      build_error (fn, label, "option %s is given twice", upper (key));
    endif
    v = args{i+1};
    shown = build_value_str (v);
    if (ischar (v) && any (strcmp (spec{k,2}, {"real", "positive", "nonneg", ...
                                               "rim", "fraction", "cd", ...
                                               "above1", "vector"})))
      if (strcmp (key, "kv"))
        si = "Kv";
      elseif (isempty (spec{k,3}))
        si = "1";
      else
        si = spec{k,3};
      endif
      [~, ~, ok] = units_text (v);
      if (ok)
        v = units_value (fn, label, key, v, si);
        shown = sprintf ("%s (%.6g%s)", shown, v, with_space (spec{k,3}));
      else
        shown = sprintf ("%s (give a number, or a text \"VALUE UNIT\" in %s)",
                         shown, units_allowed (si));
      endif
    endif
    [ok, what] = check_value (v, spec{k,2}, spec{k,4});
    if (! ok)
      uom = spec{k,3};
      if (! isempty (uom))
        uom = [" (" uom ")"];
      endif
      build_error (fn, label, "%s must be %s%s, got %s",
                   upper (key), what, uom, shown);
    endif
    switch (spec{k,2})
      case {"ref", "matrix", "names", "cell"}
        given.(key) = v;
      case "logical"
        given.(key) = logical (v);
      case "vector"
        given.(key) = double (v(:).');
      case "choice"
        v = lower (v);
        given.(key) = v;
        aux.(key) = v;
        par.(spec{k,4}{1}) = find (strcmp (v, spec{k,4}{2})) - 1;
      otherwise
        given.(key) = double (v);
        par.(key) = double (v);
    endswitch
  endfor
endfunction

function u = with_space (u)
  if (! isempty (u))
    u = [" " u];
  endif
endfunction

## Check one value against its type; WHAT says what is allowed.
function [ok, what] = check_value (v, type, extra)
  num = (isnumeric (v) || islogical (v)) && isreal (v) && isscalar (v);
  if (num)
    v = double (v);
  endif
  switch (type)
    case "real"
      what = "a finite real scalar";
      ok = num && isfinite (v);
    case "positive"
      what = "a positive finite scalar";
      ok = num && isfinite (v) && v > 0;
    case "nonneg"
      what = "a non-negative finite scalar";
      ok = num && isfinite (v) && v >= 0;
    case "rim"
      what = "a positive scalar or Inf";
      ok = num && ! isnan (v) && v > 0;
    case "fraction"
      what = "a scalar in [0, 1]";
      ok = num && v >= 0 && v <= 1;
    case "cd"
      what = "a scalar in (0, 1]";
      ok = num && v > 0 && v <= 1;
    case "above1"
      what = "a finite scalar greater than 1";
      ok = num && isfinite (v) && v > 1;
    case "count2"
      what = "0, 1 or 2";
      ok = num && any (v == [0 1 2]);
    case "choice"
      what = ["one of \"" strjoin(extra{2}, "\", \"") "\""];
      ok = ischar (v) && rows (v) == 1 && any (strcmpi (v, extra{2}));
    case "ref"
      what = "a unit name or \"\"";
      ok = ischar (v) && rows (v) <= 1;
    case "matrix"
      what = "a real matrix";
      ok = isnumeric (v) && isreal (v);
    case "logical"
      what = "true or false";
      ok = num && (v == 0 || v == 1);
    case "names"
      what = "a cell array of identifiers";
      if (ischar (v) && rows (v) == 1)
        v = {v};
      endif
      ok = iscellstr (v) && all (cellfun (@isvarname, v(:)));
    case "vector"
      what = "a vector of non-negative finite values";
      ok = (isnumeric (v) && isreal (v) && (isvector (v) || isempty (v))
            && all (isfinite (v(:))) && all (v(:) >= 0));
    case "cell"
      what = "a cell array";
      ok = iscell (v);
    otherwise
      error ("build_options: unknown option type \"%s\"", type);
  endswitch
endfunction
