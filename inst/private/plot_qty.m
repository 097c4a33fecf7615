## -*- texinfo -*-
## @deftypefn {} {[@var{a}, @var{b}, @var{label}] =} plot_qty (@var{net}, @var{q}, @var{si})
## How to draw quantity @var{q} ("T1.level") given in SI unit @var{si}
## ("" to look it up in @var{net}): values are drawn as @code{a * v + b}
## in the display unit the network asks for (@code{units_display}), whose
## label is @var{label}; a dimensionless quantity is labelled
## @qcode{"fraction"}.  Without a network or a display key, @var{a} = 1,
## @var{b} = 0 and the label is @var{si}.
## @end deftypefn

function [a, b, label] = plot_qty (net, q, si)
  if (! isempty (net))
    [si0, q] = report_unit (net, q);
    if (isempty (si))
      si = si0;
    endif
  endif
  a = 1;
  b = 0;
  label = si;
  if (! isempty (net) && ! isempty (si))
    [v, label] = units_display (net, si, [0 1], q);
    b = v(1);
    a = v(2) - v(1);
  endif
  if (strcmp (label, "1"))
    label = "fraction";
  endif
endfunction
