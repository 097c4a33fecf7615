## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_feed (@var{net}, @var{name}, @var{tank}, @qcode{"flow"}, @var{q}, @dots{})
## @deftypefnx {} {@var{net} =} vn_feed (@var{net}, @{@var{name1}, @dots{}@}, @{@var{tank1}, @dots{}@}, @qcode{"flow"}, @var{q}, @dots{})
## Add a feed, a flow imposed into a tank from outside the network.
##
## The flow @var{q}, m3/s, is an input (signals may drive it; default 0);
## a negative flow is a draw-off.  The feed goes into the declared tank
## @var{tank}.  Options: @qcode{"flow"}, @qcode{"temperature"} (degC,
## thermal networks) and one concentration per declared species.
##
## Bulk form: given a cell array of names, one feed is added per name in
## one call, with the same checks and messages as one call per feed;
## @var{tank} is one name for all or a cell array of one per feed, and
## each option a scalar or a vector of one value per feed.
##
## @seealso{vn_network, vn_tank, vn_signal}
## @end deftypefn

function net = vn_feed (net, name, tank, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  fn = "vn_feed";
  build_check_net (fn, net);
  spec = [{"flow", "real", "m3/s", []}; build_material_spec(net)];
  if (iscell (name))
    net = build_bulk (fn, "feed", net, name, {tank}, {"tank"}, varargin,
                      spec, @feed_unit);
  else
    net = build_add_unit (net, feed_unit (fn, net, name, {tank}, varargin,
                                          spec));
  endif
endfunction

## Check one feed against NET and make its unit.
function u = feed_unit (fn, net, name, fixed, args, spec)
  tank = fixed{1};
  label = build_check_name (fn, net, "feed", name);
  if (ischar (tank) && strcmp (tank, name))
    build_error (fn, label, "TANK names the feed itself; give a declared tank");
  endif
  build_check_ref (fn, label, net, "TANK", tank, {"tank"});
  par = build_options (fn, label, args, spec);
  build_check_thermal (fn, label, net, par, {"temperature"});
  [par, aux] = build_split_species (net, par, struct ());
  u = build_unit (name, "feed", "", tank, par, [], aux);
endfunction

%!test
%! net = vn_tank (vn_network (), "T1", "area", 2);
%! net = vn_feed (net, "F1", "T1", "flow", 0.02);
%! net = vn_feed (net, "D1", "T1", "flow", -0.005);
%! u = net.units(2);
%! assert ({u.name, u.kind, u.from, u.to}, {"F1", "feed", "", "T1"});
%! assert (u.par.flow, 0.02);
%! assert (net.units(3).par.flow, -0.005);
%! assert ([net.index.T1, net.index.F1, net.index.D1], [1 2 3]);

%!test
%! net = vn_network ("w", "thermal", true, "species", {"chlorine"});
%! net = vn_tank (net, "T1", "area", 4, "level", 2, "temperature", 12);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01, "temperature", 9, "chlorine", 1.8);
%! assert (net.units(2).par, struct ("flow", 0.01, "temperature", 9));
%! assert (net.units(2).aux.species.chlorine, 1.8);

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! net = vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T2", "area", 1);
%! loop = vn_feed (vn_feed (net, "F1", "T1", "flow", 0.02), "F2", "T2", "flow", 0.03);
%! bulk = vn_feed (net, {"F1", "F2"}, {"T1", "T2"}, "flow", [0.02 0.03]);
%! assert (isequal (bulk, loop));
%! assert (bulk.units(4).par.flow, 0.03);

%!error <Invalid call> vn_feed (vn_network (), "F1")
%!error <vn_feed: feed "F1": TANK names unit "T1", which network "network" does not hold> vn_feed (vn_network (), "F1", "T1", "flow", 1)
%!error <vn_feed: feed "F1": TANK "river" is a boundary; it must be a tank> vn_feed (vn_boundary (vn_network (), "river", "head", 2), "F1", "river", "flow", 1)
%!error <vn_feed: feed "F1": FLOW must be a finite real scalar \(m3/s\), got NaN> vn_feed (vn_tank (vn_network (), "T1", "area", 1), "F1", "T1", "flow", NaN)
%!error <vn_feed: feed "F1": TANK must be the name of a declared tank, got 3> vn_feed (vn_network (), "F1", 3)
%!error <vn_feed: feed "F1": TANK names the feed itself> vn_feed (vn_network (), "F1", "F1")
%!error <vn_feed: feed "F1": TEMPERATURE given \(9\) but network "network" is not thermal> vn_feed (vn_tank (vn_network (), "T1", "area", 1), "F1", "T1", "temperature", 9)
%!error <vn_feed: feed "F1": TANK "F0" is a feed; it must be a tank> vn_feed (vn_feed (vn_tank (vn_network (), "T1", "area", 1), "F0", "T1"), "F1", "F0")
%!error <vn_feed: feed "F1" to "F2": TANK must be one value, or a cell array of one value per unit \(2\), got a 1x3 cell> vn_feed (vn_tank (vn_network (), "T1", "area", 1), {"F1", "F2"}, {"T1", "T1", "T1"}, "flow", 1)
%!error <vn_feed: feed "F1" to "F2": FLOW must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x3 double> vn_feed (vn_tank (vn_network (), "T1", "area", 1), {"F1", "F2"}, "T1", "flow", [1 2 3])
