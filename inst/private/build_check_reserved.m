## -*- texinfo -*-
## @deftypefn {} {} build_check_reserved (@var{fn}, @var{label}, @var{name})
## Refuse a unit name that results use as a field (build_reserved_names).
## @end deftypefn

function build_check_reserved (fn, label, name)
  reserved = build_reserved_names ();
  if (any (strcmp (name, reserved)))
    build_error (fn, label, ["NAME \"%s\" is reserved: results carry a ", ...
                             "field of that name, which the unit would ", ...
                             "overwrite; reserved names: %s"],
                 name, strjoin (reserved, ", "));
  endif
endfunction

%!error <vn_tank: tank "stats": NAME "stats" is reserved.*reserved names: .*events> build_check_reserved ("vn_tank", "tank \"stats\"", "stats")
%!test
%! build_check_reserved ("vn_tank", "tank \"T1\"", "T1");
