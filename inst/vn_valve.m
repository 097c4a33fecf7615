## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_valve (@var{net}, @var{name}, @var{from}, @var{to}, @qcode{"kv"}, @var{kv}, @dots{})
## @deftypefnx {} {@var{net} =} vn_valve (@var{net}, @{@var{name1}, @dots{}@}, @var{from}, @var{to}, @dots{})
## Add a control valve from @var{from} to @var{to}.
##
## Liquid sizing after IEC 60534-2-1 (non-choked): Q = Kv f(x)
## sqrt (dp / (rho/rho0)), with Q in m3/h and dp in bar.  Options:
##
## @table @asis
## @item @qcode{"kv"}
## Flow coefficient at full travel, m3/h at 1 bar (required).
## @item @qcode{"opening"}
## Travel x, 0..1, an input that signals and controllers drive (default 1).
## @item @qcode{"characteristic"}
## Inherent characteristic f(x): @qcode{"linear"} (default), @qcode{"equal"}
## (equal percentage, R^(x-1)) or @qcode{"quick"} (quick opening).
## @item @qcode{"rangeability"}
## R of the equal-percentage characteristic, > 1 (default 50).
## @item @qcode{"lag"}
## Actuator time constant, s (default 0: the valve follows at once).
## @item @qcode{"outlet"}, @qcode{"inlet"}
## Nozzle heights, m, as for @code{vn_orifice}.
## @end table
##
## Valve data must be checked against the manufacturer's sheet before a
## model sized with it is used on a live loop.
##
## Bulk form: given a cell array of names, one valve is added per name in
## one call, with the same checks and messages as one call each;
## @var{from} and @var{to} are each one name for all or a cell array of
## one name per valve, and a numeric option is a scalar or a vector of one
## value per valve (@qcode{"characteristic"}: one name or a cell array).
##
## @seealso{vn_orifice, vn_resistance, vn_pump, vn_signal}
## @end deftypefn

function net = vn_valve (net, name, from, to, varargin)
  if (nargin < 4)
    print_usage ();
  endif
  fn = "vn_valve";
  build_check_net (fn, net);
  chars = {"linear", "equal", "quick"};
  spec = [{"kv",             "positive", "m3/h", [];
           "opening",        "fraction", "",     [];
           "characteristic", "choice",   "",     {"char", chars};
           "rangeability",   "above1",   "",     [];
           "lag",            "nonneg",   "s",    []};
          build_nozzle_spec()];
  if (iscell (name))
    net = build_bulk (fn, "valve", net, name, {from, to}, {"from", "to"},
                      varargin, spec, @valve_unit);
  else
    net = build_add_unit (net, valve_unit (fn, net, name, {from, to},
                                           varargin, spec));
  endif
endfunction

## Check one valve against NET and make its unit.
function u = valve_unit (fn, net, name, ends, args, spec)
  [from, to] = ends{:};
  label = build_check_name (fn, net, "valve", name);
  build_check_link (fn, label, net, from, to);
  [par, aux] = build_options (fn, label, args, spec);
  if (! isfield (par, "kv"))
    build_error (fn, label, "KV (m3/h at 1 bar) is required");
  endif
  build_check_inlet (fn, label, to, par);
  u = build_unit (name, "valve", from, to, par, [], aux);
endfunction

%!test
%! net = vn_tank (vn_network (), "T2", "area", 1.5);
%! net = vn_valve (net, "LV1", "T2", "", "kv", 40, "opening", 0.5, ...
%!                 "characteristic", "equal");
%! u = net.units(2);
%! assert ({u.name, u.kind, u.from, u.to}, {"LV1", "valve", "T2", ""});
%! assert ([u.par.kv, u.par.opening, u.par.char], [40 0.5 1]);
%! assert (u.aux.characteristic, "equal");
%! assert (isfield (u.par, "characteristic"), false);

%!test
%! net = vn_tank (vn_tank (vn_network (), "A", "area", 1), "B", "area", 1);
%! net = vn_valve (net, "V1", "A", "B", "kv", 10, "characteristic", "Quick", ...
%!                 "rangeability", 30, "lag", 4, "outlet", 0.2, "inlet", 0.4);
%! net = vn_valve (net, "V2", "B", "A", "kv", 5, "characteristic", "linear");
%! u = net.units(3);
%! assert ([u.par.char, u.par.rangeability, u.par.lag, u.par.outlet, u.par.inlet], [2 30 4 0.2 0.4]);
%! assert (u.aux.characteristic, "quick");
%! assert (net.units(4).par.char, 0);
%! assert (net.index.V2, 4);

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! net = vn_tank (vn_tank (vn_network (), "A", "area", 1), "B", "area", 1);
%! loop = vn_valve (net, "V1", "A", "B", "kv", 10, "characteristic", "quick");
%! loop = vn_valve (loop, "V2", "B", "", "kv", 5, "characteristic", "equal");
%! bulk = vn_valve (net, {"V1", "V2"}, {"A", "B"}, {"B", ""}, "kv", [10 5],
%!                  "characteristic", {"quick", "equal"});
%! assert (isequal (bulk, loop));
%! assert ([bulk.units(3:4).par], [loop.units(3:4).par]);

%!shared net
%! net = vn_tank (vn_network (), "T2", "area", 1.5);
%!error <Invalid call> vn_valve (net, "LV1", "T2")
%!error <vn_valve: valve "LV1": KV \(m3/h at 1 bar\) is required> vn_valve (net, "LV1", "T2", "", "opening", 1)
%!error <vn_valve: valve "LV1": KV must be a positive finite scalar \(m3/h\), got -4> vn_valve (net, "LV1", "T2", "", "kv", -4)
%!error <vn_valve: valve "LV1": OPENING must be a scalar in \[0, 1\], got 1.5> vn_valve (net, "LV1", "T2", "", "kv", 4, "opening", 1.5)
%!error <vn_valve: valve "LV1": CHARACTERISTIC must be one of "linear", "equal", "quick", got "parabolic"> vn_valve (net, "LV1", "T2", "", "kv", 4, "characteristic", "parabolic")
%!error <vn_valve: valve "LV1": CHARACTERISTIC must be one of .*, got 2> vn_valve (net, "LV1", "T2", "", "kv", 4, "characteristic", 2)
%!error <vn_valve: valve "LV1": RANGEABILITY must be a finite scalar greater than 1, got 1> vn_valve (net, "LV1", "T2", "", "kv", 4, "rangeability", 1)
%!error <vn_valve: valve "LV1": LAG must be a non-negative finite scalar \(s\), got -1> vn_valve (net, "LV1", "T2", "", "kv", 4, "lag", -1)
%!error <vn_valve: valve "LV1": FROM "F1" is a feed; it must be a tank or boundary> vn_valve (vn_feed (net, "F1", "T2"), "LV1", "F1", "T2", "kv", 4)
%!error <vn_valve: valve "LV1" to "LV2": CHARACTERISTIC must be one value, or a cell array of one value per unit \(2\), got a 1x3 cell> vn_valve (net, {"LV1", "LV2"}, "T2", "", "kv", 4, "characteristic", {"linear", "equal", "quick"})
%!error <vn_valve: valve "LV2": OPENING must be a scalar in \[0, 1\], got 1.5> vn_valve (net, {"LV1", "LV2"}, "T2", "", "kv", 4, "opening", [0.5 1.5])
