## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_add_unit (@var{net}, @var{u})
## Append checked units (a struct array made by build_unit) to the
## network and index their names.
## @end deftypefn

function net = build_add_unit (net, u)
  n0 = numel (net.units);
  if (n0 == 0)
    net.units = u(:).';
  else
    ## Indexed assignment matches fields by name, whatever their order.
    net.units(n0+1:n0+numel (u)) = u;
  endif
  for i = 1:numel (u)
    net.index.(u(i).name) = n0 + i;
  endfor
  net = build_bump (net, numel (u));
endfunction

%!test
%! net = vn_tank (vn_network (), "T1", "area", 1);
%! u = [build_unit("O1", "orifice", "T1", "", struct ("coeff", 0.01), [], struct ()), ...
%!      build_unit("O2", "orifice", "T1", "", struct ("coeff", 0.02), [], struct ())];
%! net = build_add_unit (net, u);
%! assert ({net.units.name}, {"T1", "O1", "O2"});
%! assert ([net.index.T1, net.index.O1, net.index.O2], [1 2 3]);
%! assert (net.units(3).par.coeff, 0.02);
