## -*- texinfo -*-
## @deftypefn {} {[@var{lo}, @var{hi}, @var{unit}] =} loop_input_range (@var{net}, @var{input}, @var{caller})
## The range the schema allows for the input @var{input} ("UNIT.PARAM")
## that a controller or switch drives, and its unit of measure: a valve
## opening or pump speed is its physical travel.
## @end deftypefn

function [lo, hi, unit] = loop_input_range (net, input, caller)
  q = vn_quantity (net, input, "input", caller);
  k = vn_schema ().(q.kind);
  lo = k.lo(q.slot + 1);
  hi = k.hi(q.slot + 1);
  unit = k.units{q.slot + 1};
endfunction

%!test
%! net = vn_tank (vn_network ("w"), "T1", "area", 2);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30);
%! [lo, hi, u] = loop_input_range (net, "LV1.opening", "test");
%! assert ({lo, hi, u}, {0, 1, "1"});
