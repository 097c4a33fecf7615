## -*- texinfo -*-
## @deftypefn  {} {@var{si} =} units_of (@var{net}, @var{quantity}, @var{what}, @var{caller})
## @deftypefnx {} {@var{si} =} units_of ([], @var{variable})
## The SI unit of measure of a quantity, as @code{units_value} takes it.
##
## With a network, @var{quantity} "UNIT.VARIABLE" is resolved by
## @code{vn_quantity} as @var{what} ("input", "output" or "param").  With
## @code{[]}, @var{variable} is an input's variable name ("flow",
## "opening", "head"), looked up among the inputs of every kind; "" when
## kinds disagree or none has it.  A valve's kv is a valve coefficient
## ("Kv"); a dimensionless input is "1".
## @end deftypefn

function si = units_of (net, quantity, what, caller)
  if (isempty (net))
    var = quantity;
    s = vn_schema ();
    found = {};
    for kind = s.kinds(:).'
      k = s.(kind{1});
      j = find (strcmp (k.params, var) & k.isinput, 1);
      if (! isempty (j))
        found{end+1} = k.units{j};
      endif
    endfor
    found = unique (found);
    if (numel (found) == 1)
      si = found{1};
    else
      si = "";
    endif
  else
    q = vn_quantity (net, quantity, what, caller);
    si = q.unitofmeasure;
    var = q.var;
  endif
  if (strcmp (var, "kv"))
    si = "Kv";
  endif
endfunction

%!assert (units_of ([], "flow"), "m3/s")
%!assert (units_of ([], "opening"), "1")
%!assert (units_of ([], "head"), "m")
%!assert (units_of ([], "duty"), "W")
%!assert (units_of ([], "nothing"), "")
%!test
%! net = vn_valve (vn_tank (vn_network (), "T1", "area", 1), "V1", "T1", "", "kv", 10);
%! assert (units_of (net, "T1.level", "output", "f"), "m");
%! assert (units_of (net, "V1.kv", "param", "f"), "Kv");
%! assert (units_of (net, "V1.opening", "input", "f"), "1");
