## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_pump (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"flow"}, @var{q}, @dots{})
## @deftypefnx {} {@var{net} =} vn_pump (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"shutoff"}, @var{h0}, @qcode{"k"}, @var{k}, @dots{})
## @deftypefnx {} {@var{net} =} vn_pump (@var{net}, @{@var{name1}, @dots{}@}, @var{from}, @var{to}, @dots{})
## Add a pump from @var{from} to @var{to}.
##
## Give exactly one mode: a fixed-flow pump delivers @var{q}, m3/s, times
## its speed; a centrifugal pump follows the curve H = s^2 @var{h0} -
## @var{k} Q^2 at relative speed s (affinity laws), with @var{h0} the
## shut-off head, m, and @var{k} in m/(m3/s)^2, behind a check valve.
## Options:
##
## @table @asis
## @item @qcode{"speed"}
## Relative speed s, an input (default 1; 0 = stopped).
## @item @qcode{"suction"}
## Band of source level above the outlet, m, over which the pump loses
## suction as the source runs dry (optional).
## @item @qcode{"outlet"}, @qcode{"inlet"}
## Nozzle heights, m, as for @code{vn_orifice}.
## @end table
##
## Pump curves must be checked against the manufacturer's data before the
## model is used to operate a plant.
##
## Bulk form: given a cell array of names, one pump is added per name in
## one call, with the same checks and messages as one call each;
## @var{from} and @var{to} are each one name for all or a cell array of
## one name per pump, and a numeric option is a scalar or a vector of one
## value per pump.
##
## @seealso{vn_valve, vn_orifice, vn_resistance, vn_signal}
## @end deftypefn

function net = vn_pump (net, name, from, to, varargin)
  if (nargin < 4)
    print_usage ();
  endif
  fn = "vn_pump";
  build_check_net (fn, net);
  spec = [{"flow",    "nonneg",   "m3/s",       [];
           "shutoff", "positive", "m",          [];
           "k",       "positive", "m/(m3/s)^2", [];
           "speed",   "nonneg",   "",           [];
           "suction", "positive", "m",          []};
          build_nozzle_spec()];
  if (iscell (name))
    net = build_bulk (fn, "pump", net, name, {from, to}, {"from", "to"},
                      varargin, spec, @pump_unit);
  else
    net = build_add_unit (net, pump_unit (fn, net, name, {from, to},
                                          varargin, spec));
  endif
endfunction

## Check one pump against NET and make its unit.
function u = pump_unit (fn, net, name, ends, args, spec)
  [from, to] = ends{:};
  label = build_check_name (fn, net, "pump", name);
  build_check_link (fn, label, net, from, to);
  par = build_options (fn, label, args, spec);
  fixed = isfield (par, "flow");
  curve = isfield (par, "shutoff") || isfield (par, "k");
  if (fixed && curve)
    build_error (fn, label, ["FLOW (%s m3/s) conflicts with the curve ", ...
                             "(SHUTOFF, K); give one mode only"],
                 build_value_str (par.flow));
  elseif (! fixed && ! curve)
    build_error (fn, label, ["FLOW (m3/s) or SHUTOFF (m) with K ", ...
                             "(m/(m3/s)^2) is required"]);
  elseif (curve && ! isfield (par, "k"))
    build_error (fn, label, "SHUTOFF (%s m) needs K (m/(m3/s)^2) for the curve",
                 build_value_str (par.shutoff));
  elseif (curve && ! isfield (par, "shutoff"))
    build_error (fn, label, "K (%s m/(m3/s)^2) needs SHUTOFF (m) for the curve",
                 build_value_str (par.k));
  endif
  build_check_inlet (fn, label, to, par);
  u = build_unit (name, "pump", from, to, par, [], struct ());
endfunction

%!test
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 2), "T2", "area", 1);
%! net = vn_boundary (net, "river", "head", 4);
%! net = vn_pump (net, "P1", "T2", "river", "shutoff", 25, "k", 4e4);
%! net = vn_pump (net, "P2", "T1", "T2", "flow", 0.01, "speed", 0.8, "suction", 0.2);
%! u = net.units(4);
%! assert ({u.name, u.kind, u.from, u.to}, {"P1", "pump", "T2", "river"});
%! assert (u.par, struct ("shutoff", 25, "k", 4e4));
%! assert (net.units(5).par, struct ("flow", 0.01, "speed", 0.8, "suction", 0.2));
%! assert ([net.index.P1, net.index.P2], [4 5]);

%!test
%! ## A pump may lift from a boundary (a river intake) into a tank.
%! net = vn_boundary (vn_network (), "river", "head", 2);
%! net = vn_tank (net, "T1", "area", 3, "base", 12);
%! net = vn_pump (net, "P1", "river", "T1", "shutoff", 30, "k", 2e3, "inlet", 1);
%! assert ({net.units(3).from, net.units(3).to}, {"river", "T1"});
%! assert (net.units(3).par.inlet, 1);

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 2), "T2", "area", 1);
%! loop = vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "speed", 0.5);
%! loop = vn_pump (loop, "P2", "T2", "T1", "flow", 0.02, "speed", 0.5);
%! bulk = vn_pump (net, {"P1", "P2"}, {"T1", "T2"}, {"T2", "T1"}, "flow", [0.01 0.02], "speed", 0.5);
%! assert (isequal (bulk, loop));

%!shared net
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 2), "T2", "area", 1);
%!error <Invalid call> vn_pump (net, "P1", "T1")
%!error <vn_pump: pump "P1": FLOW \(0.01 m3/s\) conflicts with the curve> vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "shutoff", 20, "k", 1e4)
%!error <vn_pump: pump "P1": FLOW \(m3/s\) or SHUTOFF \(m\) with K> vn_pump (net, "P1", "T1", "T2", "speed", 1)
%!error <vn_pump: pump "P1": SHUTOFF \(20 m\) needs K> vn_pump (net, "P1", "T1", "T2", "shutoff", 20)
%!error <vn_pump: pump "P1": K \(10000 m/\(m3/s\)\^2\) needs SHUTOFF> vn_pump (net, "P1", "T1", "T2", "k", 1e4)
%!error <vn_pump: pump "P1": SPEED must be a non-negative finite scalar, got -1> vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "speed", -1)
%!error <vn_pump: pump "P1": FROM and TO are both "T2"> vn_pump (net, "P1", "T2", "T2", "flow", 0.01)
%!error <vn_pump: pump "P1": FROM names unit "T9", which network "network" does not hold> vn_pump (net, "P1", "T9", "T2", "flow", 0.01)
%!error <vn_pump: pump "P1" to "P2": SPEED must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x3 double> vn_pump (net, {"P1", "P2"}, "T1", "T2", "flow", 0.01, "speed", [1 1 1])
