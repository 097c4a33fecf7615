## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_add_unit (@var{net}, @var{name}, @var{kind}, @var{from}, @var{to}, @var{par}, @var{table}, @var{aux})
## Append one checked unit to the network and index its name.
##
## The fields follow doc/internals.md section 1, in that order.
## @end deftypefn

function net = build_add_unit (net, name, kind, from, to, par, table, aux)
  u = struct ("name", name, "kind", kind, "from", from, "to", to,
              "par", [], "table", table, "aux", []);
  ## Assigned after struct () so that struct values are not taken as arrays.
  u.par = par;
  u.aux = aux;
  if (isempty (net.units))
    net.units = u;
  else
    ## Indexed assignment matches fields by name, whatever their order.
    net.units(end+1) = u;
  endif
  net.index.(name) = numel (net.units);
endfunction
