## -*- texinfo -*-
## @deftypefn  {} {[@var{v}, @var{label}] =} report_qty (@var{net}, @var{q}, @var{v})
## @deftypefnx {} {[@var{v}, @var{label}] =} report_qty (@var{net}, @var{q}, @var{v}, @var{change})
## Values @var{v} (SI) of quantity or parameter @var{q} ("T1.level") in
## the display unit the network asks for (@code{units_display}), and the
## unit's label; a dimensionless quantity is labelled "fraction" (or as
## the display asks, e.g. "%").  With @var{change} true @var{v} are
## changes or spreads (step changes, standard errors), converted by the
## unit's scale only, without the offset of a temperature scale.
## @var{q} may also be an SI unit given as @{"UNIT"@} or
## @{"UNIT", "QUANTITY"@}.
## @end deftypefn

function [v, label] = report_qty (net, q, v, change)
  if (nargin < 4)
    change = false;
  endif
  if (iscell (q))
    si = q{1};
    name = "";
    if (numel (q) > 1)
      name = q{2};
    endif
  else
    [si, name] = report_unit (net, q);
  endif
  if (isempty (si) || strcmp (si, "conc"))
    label = si;
    return;
  endif
  if (change)
    [ab, label] = units_display (net, si, [0 1], name);
    v = v * (ab(2) - ab(1));
  else
    [v, label] = units_display (net, si, v, name);
  endif
  if (strcmp (label, "1"))
    label = "fraction";
  endif
endfunction

%!test
%! net = vn_network ("w", "display", {"level", "mm"; "temperature", "degF"});
%! net = vn_tank (net, "T1", "area", 4, "level", 2);
%! [v, l] = report_qty (net, "T1.level", 1.5);
%! assert (v, 1500, 1e-9);
%! assert (l, "mm");
%! [v, l] = report_qty (net, {"degC"}, 10, true);
%! assert (v, 18, 1e-9);
%! assert (l, "degF");
%! [v, l] = report_qty (net, {"degC"}, 10);
%! assert (v, 50, 1e-9);
%! [v, l] = report_qty (net, {"1"}, 0.5);
%! assert (l, "fraction");
%! [v, l] = report_qty ([], "T1.level", 1.5);
%! assert ([v, isempty(l)], [1.5, 1]);
