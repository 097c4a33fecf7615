## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_orifice (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"coeff"}, @var{c}, @dots{})
## @deftypefnx {} {@var{net} =} vn_orifice (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"diameter"}, @var{d}, @qcode{"cd"}, @var{Cd}, @dots{})
## @deftypefnx {} {@var{net} =} vn_orifice (@var{net}, @{@var{name1}, @dots{}@}, @var{from}, @var{to}, @dots{})
## Add an orifice (square-root flow law) from @var{from} to @var{to}.
##
## The flow is F = @var{c} sqrt (dH), with @var{c} in m2.5/s, or by
## Torricelli F = @var{Cd} (pi @var{d}^2/4) sqrt (2 g dH) from the bore
## @var{d}, m, and the discharge coefficient @var{Cd} (default 0.61, common
## practice for sharp-edged orifices).  dH is the source head less the
## larger of the destination head and the inlet elevation.  @var{from} is a
## declared tank or boundary; @var{to} a tank, a boundary or @qcode{""} for
## free discharge.  Options @qcode{"outlet"} and @qcode{"inlet"} set the
## nozzle heights, m, above the base of the source and destination.
##
## Bulk form: given a cell array of names, one orifice is added per name in
## one call, with the same checks and messages as one call each;
## @var{from} and @var{to} are each one name for all or a cell array of
## one name per orifice, and a numeric option is a scalar or a vector of one
## value per orifice.
##
## @seealso{vn_resistance, vn_valve, vn_pump, vn_tank}
## @end deftypefn

function net = vn_orifice (net, name, from, to, varargin)
  if (nargin < 4)
    print_usage ();
  endif
  fn = "vn_orifice";
  build_check_net (fn, net);
  spec = [{"coeff",    "positive", "m2.5/s", [];
           "cd",       "cd",       "",       [];
           "diameter", "positive", "m",      []};
          build_nozzle_spec()];
  if (iscell (name))
    net = build_bulk (fn, "orifice", net, name, {from, to}, {"from", "to"},
                      varargin, spec, @orifice_unit);
  else
    net = build_add_unit (net, orifice_unit (fn, net, name, {from, to},
                                             varargin, spec));
  endif
endfunction

## Check one orifice against NET and make its unit.
function u = orifice_unit (fn, net, name, ends, args, spec)
  [from, to] = ends{:};
  label = build_check_name (fn, net, "orifice", name);
  build_check_link (fn, label, net, from, to);
  par = build_options (fn, label, args, spec);
  hasc = isfield (par, "coeff");
  hasd = isfield (par, "diameter");
  if (hasc && hasd)
    build_error (fn, label, ["give COEFF (%s m2.5/s) or DIAMETER (%s m), ", ...
                             "not both"], build_value_str (par.coeff),
                 build_value_str (par.diameter));
  elseif (! hasc && ! hasd)
    build_error (fn, label, "COEFF (m2.5/s) or DIAMETER (m) is required");
  elseif (hasc && isfield (par, "cd"))
    build_error (fn, label, ["CD (%s) applies with DIAMETER only; COEFF ", ...
                             "already includes it"], build_value_str (par.cd));
  elseif (hasd && ! isfield (par, "cd"))
    par.cd = 0.61;  # sharp-edged orifice, common practice
  endif
  build_check_inlet (fn, label, to, par);
  u = build_unit (name, "orifice", from, to, par, [], struct ());
endfunction

%!test
%! net = vn_tank (vn_network (), "T1", "area", 2, "level", 1);
%! net = vn_tank (net, "T2", "area", 1);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.015, "outlet", 0.1, "inlet", 0.3);
%! net = vn_orifice (net, "O2", "T2", "", "diameter", 0.05);
%! u = net.units(3);
%! assert ({u.name, u.kind, u.from, u.to}, {"O1", "orifice", "T1", "T2"});
%! assert ([u.par.coeff, u.par.outlet, u.par.inlet], [0.015 0.1 0.3]);
%! assert (net.units(4).to, "");
%! ## Cd 0.61 for a sharp-edged orifice (common practice).
%! assert (net.units(4).par, struct ("diameter", 0.05, "cd", 0.61));
%! assert (net.index.O2, 4);

%!test
%! net = vn_boundary (vn_network (), "main", "head", 30);
%! net = vn_tank (net, "T1", "diameter", 1);
%! net = vn_orifice (net, "O1", "main", "T1", "diameter", 0.05, "cd", 0.62);
%! assert (net.units(3).par.cd, 0.62);
%! assert (net.units(3).from, "main");

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 2), "T2", "area", 1);
%! loop = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01);
%! loop = vn_orifice (loop, "O2", "T2", "", "coeff", 0.02);
%! bulk = vn_orifice (net, {"O1", "O2"}, {"T1", "T2"}, {"T2", ""}, "coeff", [0.01 0.02]);
%! assert (isequal (bulk, loop));
%! assert (bulk.units(4).par.coeff, 0.02);

%!shared net
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 2), "T2", "area", 1);
%!error <Invalid call> vn_orifice (net, "O1", "T1")
%!error <vn_orifice: orifice "O1": FROM and TO are both "T1"; a flow element must join two different units> vn_orifice (net, "O1", "T1", "T1", "coeff", 0.01)
%!error <vn_orifice: orifice "O1": TO names unit "T3", which network "network" does not hold> vn_orifice (net, "O1", "T1", "T3", "coeff", 0.01)
%!error <vn_orifice: orifice "O1": FROM must be the name of a declared tank or boundary, got ""> vn_orifice (net, "O1", "", "T2", "coeff", 0.01)
%!error <vn_orifice: orifice "O1": COEFF must be a positive finite scalar \(m2.5/s\), got -0.01> vn_orifice (net, "O1", "T1", "T2", "coeff", -0.01)
%!error <vn_orifice: orifice "O1": CD must be a scalar in \(0, 1\], got 1.2> vn_orifice (net, "O1", "T1", "T2", "diameter", 0.05, "cd", 1.2)
%!error <vn_orifice: orifice "O1": give COEFF \(0.01 m2.5/s\) or DIAMETER \(0.05 m\), not both> vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "diameter", 0.05)
%!error <vn_orifice: orifice "O1": COEFF \(m2.5/s\) or DIAMETER \(m\) is required> vn_orifice (net, "O1", "T1", "T2")
%!error <vn_orifice: orifice "O1": CD \(0.6\) applies with DIAMETER only> vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "cd", 0.6)
%!error <vn_orifice: orifice "O1": INLET given \(0.2 m\) but TO is ""> vn_orifice (net, "O1", "T1", "", "coeff", 0.01, "inlet", 0.2)
%!error <vn_orifice: orifice "O1": OUTLET must be a non-negative finite scalar \(m\), got -0.1> vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "outlet", -0.1)
%!error <vn_orifice: orifice "T2": NAME "T2" is already taken by a tank> vn_orifice (net, "T2", "T1", "", "coeff", 0.01)
%!error <vn_orifice: orifice "O1" to "O2": COEFF must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x3 double> vn_orifice (net, {"O1", "O2"}, "T1", "T2", "coeff", [1 2 3])
%!error <vn_orifice: orifice "O1" to "O2": TO must be one value, or a cell array of one value per unit \(2\), got a 1x1 cell> vn_orifice (net, {"O1", "O2"}, "T1", {"T2"}, "coeff", 0.01)
%!error <vn_orifice: orifice "O2": FROM and TO are both "T2"> vn_orifice (net, {"O1", "O2"}, {"T1", "T2"}, "T2", "coeff", 0.01)
