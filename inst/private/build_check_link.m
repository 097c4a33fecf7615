## -*- texinfo -*-
## @deftypefn {} {} build_check_link (@var{fn}, @var{label}, @var{net}, @var{from}, @var{to})
## Check the ends of a flow element (orifice, resistance, valve, pump).
##
## The source must be a declared tank or boundary; the destination a tank,
## a boundary or "" (free discharge); the two must differ.
## @end deftypefn

function build_check_link (fn, label, net, from, to)
  ends = {"tank", "boundary"};
  if (ischar (from) && ischar (to) && ! isempty (from) && strcmp (from, to))
    build_error (fn, label, ["FROM and TO are both \"%s\"; a flow element ", ...
                             "must join two different units"], from);
  endif
  build_check_ref (fn, label, net, "FROM", from, ends);
  if (! (ischar (to) && rows (to) <= 1))
    build_error (fn, label, ["TO must be the name of a declared tank or ", ...
                             "boundary, or \"\" for free discharge, got %s"],
                 build_value_str (to));
  endif
  if (! isempty (to))
    build_check_ref (fn, label, net, "TO", to, ends);
  endif
endfunction
