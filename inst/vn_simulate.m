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
## output interval (s).
## @item @qcode{"initial"}
## an operating point from @code{vn_steady} (uses its @code{x}), or a state
## vector; default: the levels declared on the tanks.
## @item @qcode{"reltol"}, @qcode{"abstol"}
## integrator tolerances. Default 1e-6 relative; the absolute tolerance
## is set per state, scaled to its capacity: a tank's volume gets its largest
## plan area times 1e-8 m, heat and concentration states that volume figure
## times 1 K or the largest declared concentration, other states 1e-8.
## A positive @qcode{"abstol"} replaces them all with one value.
## @item @qcode{"solver"}
## @qcode{"auto"} (dense up to 100 states, else KLU sparse), @qcode{"dense"}
## or @qcode{"klu"}.
## @item @qcode{"maxsteps"}
## steps allowed between two outputs (default 100000).
## @item @qcode{"maxstep"}
## largest step (s), default none.
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
  x0 = initial_state (opt.initial);
  so.reltol = opt.reltol;
  so.abstol = opt.abstol;
  so.solver = opt.solver;
  so.maxsteps = opt.maxsteps;
  so.maxstep = opt.maxstep;
  so.record = tm.rec;
  [X, Y, stats, states, ev] = __vn_simulate__ (cn.pk, sig, tout, x0, so);
  if (isempty (opt.record))
    res = vn_results (net, tout, X, Y, states, u, tm, sig);
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
%!error <TSPAN> vn_simulate (net, "a")
%!error <needs tf . t0> vn_simulate (net, [10 0])
%!error <unknown option "dtt"> vn_simulate (net, [0 10], "dtt", 1)
%!error <no unit "T9"> vn_simulate (net, [0 10], vn_signal ("T9.flow", "step", 1, 0, 1))
%!error <record> vn_simulate (net, [0 10], "record", 3)
%!error <initial state has 3 values> vn_simulate (net, [0 10], "initial", [1 2 3])
