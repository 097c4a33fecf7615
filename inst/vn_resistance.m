## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_resistance (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"r"}, @var{r}, @dots{})
## @deftypefnx {} {@var{net} =} vn_resistance (@var{net}, @{@var{name1}, @dots{}@}, @var{from}, @var{to}, @dots{})
## Add a linear flow resistance from @var{from} to @var{to}.
##
## The flow is F = dH / @var{r}, @var{r} in s/m2 (required), dH the source
## head less the larger of the destination head and the inlet elevation.
## Ends and the @qcode{"outlet"} and @qcode{"inlet"} nozzle heights, m, are
## as for @code{vn_orifice}.
##
## Bulk form: given a cell array of names, one resistance is added per name in
## one call, with the same checks and messages as one call each;
## @var{from} and @var{to} are each one name for all or a cell array of
## one name per resistance, and a numeric option is a scalar or a vector of one
## value per resistance.
##
## @seealso{vn_orifice, vn_valve, vn_pump, vn_tank}
## @end deftypefn

function net = vn_resistance (net, name, from, to, varargin)
  if (nargin < 4)
    print_usage ();
  endif
  fn = "vn_resistance";
  build_check_net (fn, net);
  spec = [{"r", "positive", "s/m2", []}; build_nozzle_spec()];
  if (iscell (name))
    net = build_bulk (fn, "resistance", net, name, {from, to}, {"from", "to"},
                      varargin, spec, @resistance_unit);
  else
    net = build_add_unit (net, resistance_unit (fn, net, name, {from, to},
                                                varargin, spec));
  endif
endfunction

## Check one resistance against NET and make its unit.
function u = resistance_unit (fn, net, name, ends, args, spec)
  [from, to] = ends{:};
  label = build_check_name (fn, net, "resistance", name);
  build_check_link (fn, label, net, from, to);
  par = build_options (fn, label, args, spec);
  if (! isfield (par, "r"))
    build_error (fn, label, "R (s/m2) is required");
  endif
  build_check_inlet (fn, label, to, par);
  u = build_unit (name, "resistance", from, to, par, [], struct ());
endfunction

%!test
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T2", "area", 0.5);
%! net = vn_resistance (net, "R1", "T1", "T2", "r", 1800);
%! net = vn_resistance (net, "R2", "T2", "", "r", 7200, "outlet", 0.05);
%! u = net.units(3);
%! assert ({u.name, u.kind, u.from, u.to}, {"R1", "resistance", "T1", "T2"});
%! assert (u.par.r, 1800);
%! assert (net.units(4).par, struct ("r", 7200, "outlet", 0.05));

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T2", "area", 0.5);
%! loop = vn_resistance (vn_resistance (net, "R1", "T1", "T2", "r", 1800), "R2", "T2", "", "r", 7200);
%! bulk = vn_resistance (net, {"R1", "R2"}, {"T1", "T2"}, {"T2", ""}, "r", {1800, 7200});
%! assert (isequal (bulk, loop));

%!shared net
%! net = vn_tank (vn_network (), "T1", "area", 1);
%!error <Invalid call> vn_resistance (net, "R1", "T1")
%!error <vn_resistance: resistance "R1": R \(s/m2\) is required> vn_resistance (net, "R1", "T1", "")
%!error <vn_resistance: resistance "R1": R must be a positive finite scalar \(s/m2\), got 0> vn_resistance (net, "R1", "T1", "", "r", 0)
%!error <vn_resistance: resistance "R1": unknown option "k"; allowed: r, outlet, inlet> vn_resistance (net, "R1", "T1", "", "k", 3)
%!error <vn_resistance: resistance "R1": TO must be the name of a declared tank or boundary, or "" for free discharge, got 2> vn_resistance (net, "R1", "T1", 2, "r", 5)
%!error <vn_resistance: resistance "R1" to "R2": R must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x1 cell> vn_resistance (net, {"R1", "R2"}, "T1", "", "r", {5})
