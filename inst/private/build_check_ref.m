## -*- texinfo -*-
## @deftypefn {} {@var{idx} =} build_check_ref (@var{fn}, @var{label}, @var{net}, @var{field}, @var{ref}, @var{kinds})
## Check that @var{ref} names a declared unit of one of @var{kinds}.
##
## Returns the unit's position in @code{net.units}.  @var{field} is the
## argument's name for the message (FROM, TO, TANK, SPILL).
## @end deftypefn

function idx = build_check_ref (fn, label, net, field, ref, kinds)
  if (! (ischar (ref) && rows (ref) <= 1) || isempty (ref))
    build_error (fn, label, "%s must be the name of a declared %s, got %s",
                 field, strjoin (kinds, " or "), build_value_str (ref));
  endif
  idx = build_find_unit (net, ref);
  if (idx == 0)
    build_error (fn, label, ["%s names unit \"%s\", which network \"%s\" ", ...
                             "does not hold; declare the %s first"],
                 field, ref, net.name, strjoin (kinds, " or "));
  endif
  kind = net.units(idx).kind;
  if (! any (strcmp (kind, kinds)))
    build_error (fn, label, "%s \"%s\" is a %s; it must be a %s",
                 field, ref, kind, strjoin (kinds, " or "));
  endif
endfunction
