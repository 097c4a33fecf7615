## -*- texinfo -*-
## @deftypefn  {} {@var{res} =} vn_simulate (@var{net}, @var{tspan})
## @deftypefnx {} {@var{res} =} vn_simulate (@var{net}, @var{tspan}, @var{u})
## @deftypefnx {} {@var{res} =} vn_simulate (@dots{}, @var{name}, @var{value}, @dots{})
## Simulate a network in time with the compiled core.
##
## @var{tspan} is @code{[t0 tf]} in seconds (outputs every @qcode{"dt"}
## seconds, default @code{(tf - t0)/500}) or a vector of three or more
## increasing output times.  @var{u} holds signals made by
## @code{vn_signal}; inputs without a signal keep their declared values.
## Every breakpoint of a signal is met exactly: the integrator stops and
## restarts there.
##
## Signal values are checked against their input's range, as declared
## values are.  A value outside the range of an input with a unit of
## measure (a feed flow beyond [-1e6, 1e6] m3/s, a head beyond 1e5 m, a
## negative concentration), or a NaN or Inf, is an error.  A position past
## its travel (a valve opening outside [0, 1], a pump speed outside
## [0, 10]) is clipped to it, as the physics would, with a warning
## (identifier @qcode{"vesselnet:clipped"}) naming the signal, the largest
## or smallest value it reaches in the run, when, and the range.  The
## result then reports what the physics used: @code{res.LV1.opening} is
## the clipped opening (exactly: a ramp through a bound is clipped where
## it crosses it), and @code{res.signals} holds the signals as given.
##
## The result @var{res} has @code{res.t} (column, s) and one field per
## unit holding its outputs and inputs as columns, e.g.
## @code{res.T1.level}, @code{res.T1.spill}, @code{res.O1.flow},
## @code{res.LV1.opening}; @code{res.units} gives their units of measure,
## @code{res.x} the states (@code{res.states} their names) and
## @code{res.stats} the integrator's counts and wall time; @code{res.events}
## logs switchings (@code{t}, @code{unit}, @code{value}) of @code{vn_switch}
## units.
##
## Options:
## @table @asis
## @item @qcode{"dt"}
## output interval (s); at most 1e7 output times per run.
## @item @qcode{"initial"}
## an operating point from @code{vn_steady} (uses its @code{x}), or a state
## vector; default: the levels declared on the tanks.
## @item @qcode{"reltol"}, @qcode{"abstol"}
## integrator tolerances, @qcode{"reltol"} in [1e-12, 0.1] (default
## 1e-6), @qcode{"abstol"} in [1e-18, 1e3]; the absolute tolerance
## is set per state, scaled to its capacity: a tank's volume gets its largest
## plan area times 1e-8 m, heat and concentration states that volume figure
## times 1 K or the largest declared concentration, other states 1e-8.
## A positive @qcode{"abstol"} replaces them all with one value.
## @item @qcode{"solver"}
## @qcode{"auto"} (dense up to 100 states, else KLU sparse), @qcode{"dense"}
## or @qcode{"klu"}.
## @item @qcode{"maxsteps"}
## steps allowed between two outputs, a whole number in [1, 1e9]
## (default 100000).
## @item @qcode{"maxstep"}
## largest step (s) in [1e-6, 1e9], default none.
## @item @qcode{"record"}
## record only these output quantities (a cell array such as
## @code{@{"T1.level", "O1.flow"@}}, or @qcode{"levels"} for every tank
## level): for large networks this saves memory and time, since a record
## of tank quantities needs no flows.  The result then holds just those
## fields (and the states).
## @item @qcode{"verbose"}
## print the integrator's counts when done.
## @end table
##
## Integration is CVODES' BDF method with the analytic Jacobian.  When the
## integrator fails, the error says at what time and in which unit.
## Ctrl-C stops a run.
##
## The result is a model's prediction: validate the model against plant
## data before using it to judge a real upset, and never in place of
## overfill protection or other safety systems.
## @seealso{vn_signal, vn_steady, vn_plot, vn_network}
## @end deftypefn

function res = vn_simulate (net, tspan, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  u = [];
  args = varargin;
  if (! isempty (args) && ! ischar (args{1}))
    u = args{1};
    args(1) = [];
  endif
  opt = parse_options (args);
  build_check_net ("vn_simulate", net);
  if (isempty (opt.record))
    cn = vn_compile (net, "results");
    tm = cn.tmpl;
  elseif (ischar (opt.record))
    cn = vn_compile (net, "levels");
    tm = cn.levels;
  else
    cn = vn_compile (net);
    cn = vn_compile (net, "record", record_list (net, opt.record, cn.layout));
    tm = cn.record;
  endif
  tout = sim_times (tspan, opt.dt, "vn_simulate");
  sig = vn_pack_signals (net, u, "vn_simulate", cn);
  if (! isempty (sig))
    signal_clip_warn ("vn_simulate", sig.clips, tout(1), tout(end));
  endif
  x0 = initial_state (opt.initial);
  so.reltol = opt.reltol;
  so.abstol = opt.abstol;
  so.solver = opt.solver;
  so.maxsteps = opt.maxsteps;
  so.maxstep = opt.maxstep;
  so.record = tm.rec;
  [X, Y, stats, states, ev] = __vn_simulate__ (cn.pk, sig, tout, x0, so);
  if (isempty (opt.record))
    res = vn_results (net, tout, X, Y, states, sig_u (sig), tm, sig);
  else
    res = __vn_assemble__ (tm, tout, X, Y, states);
  endif
  res.events = struct ("t", ev(:,1), "unit", {{net.units(ev(:,2)).name}.'},
                       "value", ev(:,3));
  res.stats = stats;
  res.net = net;
  res.signals = u;
  if (opt.verbose)
    printf ("vn_simulate: %d steps, %d rhs, %d Jacobians, %d restarts, %s, %.3g s\n",
            stats.steps, stats.rhs, stats.jac, stats.restarts, stats.solver,
            stats.wall);
  endif
endfunction

function opt = parse_options (args)
  opt = struct ("dt", [], "initial", [], "reltol", 1e-6, "abstol", 0,
                "solver", 0, "maxsteps", 100000, "maxstep", 0,
                "verbose", false, "record", []);
  [names, vals] = vn_option_pairs (args, "vn_simulate");
  for i = 1:numel (names)
    name = names{i};
    val = vals{i};
    [opt, taken] = integrator_option (opt, "vn_simulate", lower (name), val);
    if (taken)
      continue;
    endif
    switch (lower (name))
      case "dt"
        opt.dt = val;
      case "initial"
        opt.initial = val;
      case "verbose"
        opt.verbose = logical (val);
      case "record"
        if (! (iscellstr (val) || (ischar (val) && strcmp (val, "levels"))))
          error ("Octave:invalid-input-arg",
                 "vn_simulate: option \"record\" must be a cell array of output quantities or \"levels\"");
        endif
        opt.record = val;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_simulate: unknown option \"%s\"; allowed: dt, initial, reltol, abstol, solver, maxsteps, maxstep, record, verbose",
               name);
    endswitch
  endfor
endfunction

## The signals as the core applies them (clipped to their inputs' ranges).
function u = sig_u (sig)
  u = [];
  if (! isempty (sig))
    u = sig.u;
  endif
endfunction

## Output indices (0-based) of the recorded quantities NAMES.
function idx = record_list (net, names, layout)
  [~, first] = unique (names, "first");
  names = names(sort (first));         # a quantity named twice is kept once
  idx = zeros (1, numel (names), "int32");
  for j = 1:numel (names)
    q = vn_quantity (net, names{j}, "output", "vn_simulate", layout);
    idx(j) = q.index;
  endfor
endfunction

function x0 = initial_state (init)
  if (isempty (init))
    x0 = [];
  elseif (isstruct (init) && isfield (init, "x"))
    x0 = init.x(:);
  elseif (isnumeric (init) && isreal (init))
    x0 = init(:);
  else
    error ("Octave:invalid-input-arg",
           "vn_simulate: option \"initial\" must be an operating point from vn_steady or a state vector");
  endif
endfunction

%!demo
%! ## An invented break tank draining through an orifice after its feed
%! ## steps down.
%! net = vn_network ("demo");
%! net = vn_tank (net, "T1", "area", 2, "level", 1.44);
%! net = vn_feed (net, "F1", "T1", "flow", 0.012);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%! u = vn_signal ("F1.flow", "step", 600, 0.012, 0.008);
%! res = vn_simulate (net, [0 3600], u, "dt", 10);
%! vn_plot (res, {"T1.level"});

%!shared net, u
%! net = vn_network ("t");
%! net = vn_tank (net, "T1", "diameter", 1, "level", 2);
%! net = vn_orifice (net, "O1", "T1", "", "cd", 0.61, "diameter", 0.05);
%! net = vn_feed (net, "F1", "T1", "flow", 0);
%! u = vn_signal ("F1.flow", "step", 100, 0, 0.002);
%!test
%! ## Torricelli draining, 2 m to 0.5 m in 209.40 s (REFERENCES.md;
%! ## t = (A/(Cd a)) sqrt(2/g) (sqrt(h0) - sqrt(h1)))
%! res = vn_simulate (net, [0 300], "dt", 0.05, "reltol", 1e-9);
%! t05 = interp1 (flipud (res.T1.level), flipud (res.t), 0.5);
%! assert (t05, 209.3967, 0.01);
%! assert (res.O1.flow, 0.61 * pi / 4 * 0.05^2 * sqrt (2 * 9.80665 * res.T1.level), 1e-9);
%! assert (res.units.T1.level, "m");
%!test
%! ## a step at t = 100 s is met exactly: the feed output jumps there
%! res = vn_simulate (net, [0 200], u, "dt", 10);
%! assert (res.F1.flow(res.t == 100), 0.002);
%! assert (res.F1.flow(res.t == 90), 0);
%! assert (res.stats.restarts >= 1);
%!test
%! ## recording only levels gives the same levels
%! r1 = vn_simulate (net, [0 200], u, "dt", 10);
%! r2 = vn_simulate (net, [0 200], u, "dt", 10, "record", "levels");
%! assert (r2.T1.level, r1.T1.level, 0);
%! assert (! isfield (r2, "O1"));
%! r3 = vn_simulate (net, [0 200], u, "dt", 10, "record", {"O1.flow"});
%! assert (r3.O1.flow, r1.O1.flow, 0);
%!test
%! ## starting from an operating point holds it
%! op = vn_steady (net, "F1.flow", 0.002);
%! res = vn_simulate (op.net, [0 500], "initial", op);
%! assert (res.T1.level(end), op.T1.level, 1e-6);
%!test
%! ## a ramp of the opening to 1.5 is clipped at 1 where it crosses it
%! ## (t = 50 s): the physics and res use the clipped opening, the same
%! ## run as with the clipped ramp given directly (invented data)
%! n = vn_tank (vn_network ("v"), "T1", "area", 2, "level", 1);
%! n = vn_feed (n, "F1", "T1", "flow", 0.01);
%! n = vn_valve (n, "LV1", "T1", "", "kv", 40, "opening", 0.5);
%! u1 = vn_signal ("LV1.opening", "ramp", 0, 100, 0.5, 1.5);
%! u2 = vn_signal ("LV1.opening", "table", [0 0.5; 50 1]);
%! warning ("off", "vesselnet:clipped", "local");
%! r1 = vn_simulate (n, [0 200], u1, "dt", 10, "reltol", 1e-9);
%! r2 = vn_simulate (n, [0 200], u2, "dt", 10, "reltol", 1e-9);
%! assert (max (r1.LV1.opening), 1);
%! assert (r1.LV1.opening, min (0.5 + r1.t / 100, 1), 1e-12);
%! assert (r1.T1.level, r2.T1.level, 1e-6);
%! assert (r1.LV1.flow, r2.LV1.flow, 1e-8);
%! assert (r1.signals.v, [0.5; 1.5]);
%!test
%! ## a pump speed stepped below 0 is clipped to 0: the fixed-flow pump
%! ## stops, it does not run backwards through its check valve
%! n = vn_tank (vn_network ("p"), "T1", "area", 2, "level", 1);
%! n = vn_pump (n, "P1", "T1", "", "flow", 0.001);
%! u = vn_signal ("P1.speed", "step", 50, 1, -1);
%! warning ("off", "vesselnet:clipped", "local");
%! r = vn_simulate (n, [0 100], u, "dt", 10);
%! assert (r.P1.speed(r.t > 50), zeros (5, 1));
%! assert (r.P1.flow(r.t > 50), zeros (5, 1));
%! assert (r.T1.level(end), 1 - 0.001 * 50 / 2, 1e-9);
%!warning <vn_simulate: signal "LV1.opening" reaches 1.5 at t = 100 s, outside its range \[0, 1\]; it is clipped to \[0, 1\]>
%! n = vn_valve (vn_tank (vn_network ("v"), "T1", "area", 2, "level", 1), "LV1", "T1", "", "kv", 40);
%! vn_simulate (n, [0 200], vn_signal ("LV1.opening", "ramp", 0, 100, 0.5, 1.5));
%!warning <vn_simulate: signal "P1.speed" reaches 12 at t = 30 s, outside its range \[0, 10\]>
%! n = vn_pump (vn_tank (vn_network ("p"), "T1", "area", 2, "level", 1), "P1", "T1", "", "flow", 1e-4);
%! vn_simulate (n, [0 100], vn_signal ("P1.speed", "table", [0 1; 30 12; 60 1]));
%!test
%! ## a signal that leaves the range only after the run ends is not
%! ## clipped within it: no warning
%! n = vn_valve (vn_tank (vn_network ("v"), "T1", "area", 2, "level", 1), "LV1", "T1", "", "kv", 40);
%! warning ("error", "vesselnet:clipped", "local");
%! r = vn_simulate (n, [0 40], vn_signal ("LV1.opening", "ramp", 0, 100, 0.5, 1.5));
%! assert (r.LV1.opening(end), 0.9, 1e-12);
%!error <vn_simulate: signal "F1.flow": values must lie in \[-1e\+06, 1e\+06\] \(m3/s\), got 3e\+06 at t = 600 s> vn_simulate (net, [0 10], vn_signal ("F1.flow", "step", 600, 0, 3e6))
%!error <vn_simulate: signal "F1.flow": point 1 must hold a finite time and value, got t = 0 s, value NaN> vn_simulate (net, [0 10], struct ("quantity", "F1.flow", "t", 0, "v", NaN, "hold", false))
%!error <vn_simulate: option "reltol" must lie in \[1e-12, 0.1\], got 2> vn_simulate (net, [0 10], "reltol", 2)
%!error <vn_simulate: option "abstol" must lie in \[1e-18, 1000\] \(units of each state\), got 0> vn_simulate (net, [0 10], "abstol", 0)
%!error <vn_simulate: option "maxstep" must lie in \[1e-06, 1e\+09\] \(s\), got 0> vn_simulate (net, [0 10], "maxstep", 0)
%!error <vn_simulate: option "maxsteps" must be a whole number in \[1, 1e\+09\], got 2.5> vn_simulate (net, [0 10], "maxsteps", 2.5)
%!error <vn_simulate: option "dt" must be a positive time step in \[1e-06, Inf\) \(s\)> vn_simulate (net, [0 10], "dt", 1e-8)
%!error <TSPAN> vn_simulate (net, "a")
%!error <needs tf . t0> vn_simulate (net, [10 0])
%!error <unknown option "dtt"> vn_simulate (net, [0 10], "dtt", 1)
%!error <no unit "T9"> vn_simulate (net, [0 10], vn_signal ("T9.flow", "step", 1, 0, 1))
%!error <record> vn_simulate (net, [0 10], "record", 3)
%!error <initial state has 3 values> vn_simulate (net, [0 10], "initial", [1 2 3])
