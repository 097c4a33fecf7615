## -*- texinfo -*-
## @deftypefn {} {@var{u} =} build_unit (@var{name}, @var{kind}, @var{from}, @var{to}, @var{par}, @var{table}, @var{aux})
## Make one checked unit, fields in the order of doc/internals.md section 1.
## Its numeric options are checked against the core's ranges here.
## @end deftypefn

function u = build_unit (name, kind, from, to, par, table, aux)
  build_check_range (["vn_" kind], sprintf ("%s \"%s\"", kind, name), kind,
                     par);
  u = struct ("name", name, "kind", kind, "from", from, "to", to,
              "par", [], "table", table, "aux", []);
  ## Assigned after struct () so that struct values are not taken as arrays.
  u.par = par;
  u.aux = aux;
endfunction

%!test
%! u = build_unit ("O1", "orifice", "T1", "", struct ("coeff", 0.01), [], struct ());
%! assert (fieldnames (u), {"name"; "kind"; "from"; "to"; "par"; "table"; "aux"});
%! assert ({u.name, u.kind, u.from, u.to}, {"O1", "orifice", "T1", ""});
%! assert (u.par.coeff, 0.01);
%! assert (size (u), [1 1]);
