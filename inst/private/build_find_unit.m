## -*- texinfo -*-
## @deftypefn {} {@var{idx} =} build_find_unit (@var{net}, @var{name})
## Position of unit @var{name} in @code{net.units}, 0 when there is none.
##
## A field read of @code{net.index} is used rather than @code{isfield}:
## in Octave 7 @code{isfield} converts the whole index struct first, which
## costs time in proportion to the number of units on every call.
## @end deftypefn

function idx = build_find_unit (net, name)
  idx = 0;
  if (! (ischar (name) && rows (name) == 1 && ! isempty (name)))
    return;
  endif
  try
    idx = net.index.(name);
  catch
    idx = 0;
  end_try_catch
endfunction

%!test
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T2", "area", 1);
%! assert (build_find_unit (net, "T2"), 2);
%! assert (build_find_unit (net, "T1"), 1);
%! assert (build_find_unit (net, "T3"), 0);
%! assert (build_find_unit (net, ""), 0);
%! assert (build_find_unit (net, "1T"), 0);
%! assert (build_find_unit (net, 3), 0);
