## -*- texinfo -*-
## @deftypefn  {} {[@var{v}, @var{label}] =} units_display (@var{net}, @var{si_unit}, @var{v})
## @deftypefnx {} {[@var{v}, @var{label}] =} units_display (@var{net}, @var{si_unit}, @var{v}, @var{name})
## Convert values for display in the units the network's "display" option
## asks for.
##
## @var{v} holds values in @var{si_unit}, the SI unit as the schema writes
## it ("m3/s", "m", "degC", "W", "Pa", "s", "1").  @var{name}, optional, is
## the quantity ("T2.level") or variable ("level") the values belong to.
## The unit shown is chosen from @code{@var{net}.options.display} (rows
## @{key, unit@}, see @code{vn_network}), most specific key first:
## @enumerate
## @item a quantity key equal to @var{name} ("T2.level");
## @item a variable key equal to the variable of @var{name} ("level");
## @item a dimension key for the dimension of @var{si_unit} ("flow",
## "length").
## @end enumerate
## Without a matching key, or when @var{si_unit} is not the SI unit of a
## dimension in the table, @var{v} is returned unchanged with
## @var{label} = @var{si_unit}.  A valve's "kv" (schema unit "m3/h") is a
## valve coefficient: @var{name} "V1.kv" with a key
## @{"kv", "Cv"@} shows Cv.
## @end deftypefn

function [v, label] = units_display (net, si_unit, v, name)
  label = si_unit;
  if (! (isstruct (net) && isfield (net, "options")
         && isfield (net.options, "display") && ! isempty (net.options.display)
         && ischar (si_unit)))
    return;
  endif
  if (nargin < 4 || ! ischar (name))
    name = "";
  endif
  var = name;
  dot = find (name == ".", 1, "last");
  if (! isempty (dot))
    var = name(dot+1:end);
  endif
  t = units_table ();
  if (strcmp (var, "kv") && strcmp (si_unit, "m3/h"))
    si = "Kv";
  else
    si = si_unit;
  endif
  k = find (strcmp ({t.dims.si}, si), 1);
  if (isempty (k))
    return;
  endif
  keys = net.options.display(:,1);
  r = [];
  if (! isempty (name))
    r = find (strcmp (keys, name), 1);
    if (isempty (r))
      r = find (strcmp (keys, var), 1);
    endif
  endif
  if (isempty (r))
    r = find (strcmp (keys, t.dims(k).name), 1);
  endif
  if (isempty (r))
    return;
  endif
  j = units_find (net.options.display{r,2});
  if (j == 0 || t.dim(j) != k)
    return;     # a key of another dimension: show SI rather than guess
  endif
  v = (v - t.offset(j)) / t.factor(j);
  label = t.unit{j};
endfunction

%!shared net
%! net.options.display = {"flow", "m3/h"; "level", "mm"; "T2.level", "ft"; "kv", "Cv"; "temperature", "degF"};

%!test
%! [v, l] = units_display (net, "m3/s", [0.01 0.02]);
%! assert (v, [36 72], 1e-12);
%! assert (l, "m3/h");
%!test
%! [v, l] = units_display (net, "m", 1.2);                # no name: no length key
%! assert ({v, l}, {1.2, "m"});
%! [v, l] = units_display (net, "m", 1.2, "T1.level");
%! assert (v, 1200, 1e-9);
%! assert (l, "mm");
%! [v, l] = units_display (net, "m", 0.3048, "T2.level"); # quantity beats variable
%! assert (v, 1, 1e-12);
%! assert (l, "ft");
%! [v, l] = units_display (net, "m", 2, "T1.head");
%! assert ({v, l}, {2, "m"});
%!test
%! [v, l] = units_display (net, "degC", 100);
%! assert (v, 212, 1e-12);
%! assert (l, "degF");
%! [v, l] = units_display (net, "m3/h", 40, "V1.kv");
%! assert (v, 40 * 1.156, 0.01);                           # Cv = 1.156 Kv (common practice)
%! assert (l, "Cv");
%! [v, l] = units_display (net, "m3/h", 40);               # not SI: unchanged
%! assert ({v, l}, {40, "m3/h"});
%!test
%! [v, l] = units_display (struct ("options", struct ()), "m3/s", 0.01);
%! assert ({v, l}, {0.01, "m3/s"});
%! [v, l] = units_display (net, "W", 5);
%! assert ({v, l}, {5, "W"});
