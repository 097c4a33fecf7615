## -*- texinfo -*-
## @deftypefn  {} {@var{op} =} vn_steady (@var{net})
## @deftypefnx {} {@var{op} =} vn_steady (@var{net}, @var{quantity}, @var{value}, @dots{})
## @deftypefnx {} {@var{op} =} vn_steady (@var{net}, @qcode{"target"}, @{@var{output}, @var{value}, @dots{}@}, @qcode{"adjust"}, @{@var{input}, @dots{}@})
## @deftypefnx {} {@var{op} =} vn_steady (@dots{}, @var{option}, @var{value}, @dots{})
## Find the steady state (operating point) of a network.
##
## With no further arguments the inputs keep their declared values (feed
## flows, valve openings, pump speeds, boundary heads).  Pairs
## @var{quantity}, @var{value} such as @code{"F1.flow", 0.025} set inputs
## to other values first.  A value outside the input's range is an error
## (a feed flow beyond 1e6 m3/s, a negative concentration), except for a
## position past its travel (a valve opening outside [0, 1], a pump speed
## outside [0, 10]): that is clipped to the range, with a warning
## (@qcode{"vesselnet:clipped"}), and the operating point holds the
## clipped value.
##
## The inverse problem: @qcode{"target"} names outputs and the values they
## must hold, @qcode{"adjust"} the inputs left free to achieve that, as
## many inputs as targets; e.g. the feed that holds a level:
## @code{vn_steady (net, "target", @{"T2.level", 1.5@}, "adjust",
## @{"F1.flow"@})}.  Input and target values may be texts "VALUE UNIT"
## in a unit of the quantity's dimension (@code{"F1.flow", "90 m3/h"},
## @code{@{"T2.level", "1500 mm"@}}; see @code{vn_units}).
##
## The search is Newton's method on the volume balances (and the target
## equations) with the core's analytic Jacobian, a backtracking line
## search on the residual scaled by the network's flows, dense LU for
## small networks and KLU for large ones.  It starts from the declared
## levels (or @qcode{"initial"}); when that fails it simulates over a
## few of the slowest time constants and starts again from where the run
## ended.  Iterations are bounded, so the call always returns.
##
## When no steady state exists the error (identifier
## @qcode{"vesselnet:no-steady-state"}) says why in plant terms: a tank
## with no outlet that keeps filling, a tank whose outlets cannot pass its
## inflow, a tank that runs dry under a pump or draw-off, a pump that
## cannot reach the head it works against, targets the inputs cannot
## meet.  A tank spilling over its rim is a valid steady state.
##
## Fields of @var{op}:
## @table @code
## @item T1, O1, @dots{}
## one field per unit with its outputs and inputs as scalars, as in
## @code{vn_simulate}'s result: @code{op.T1.level}, @code{op.O1.flow},
## @code{op.F1.flow}; @code{op.units} gives their units of measure.
## @item x, states
## the state vector and the states' names.
## @item input_names, input_values
## every input quantity (@qcode{"F1.flow"}, @dots{}) and its value at the
## steady state; @code{inputs} holds the same as @code{inputs.F1.flow}.
## @item adjusted
## the inputs found for the targets, @code{adjusted.F1.flow} (an empty
## struct without targets).
## @item spilling, spill
## names of the tanks spilling over their rims and their spill flows
## (m3/s), in the same order.
## @item residual, relres
## largest volume-balance residual (m3/s) and the scaled residual
## (relative to the network's flows and to the targets).
## @item iterations, method, solver
## Newton iterations, @qcode{"newton"} or @qcode{"newton after
## simulation"}, @qcode{"dense"} or @qcode{"klu"}.
## @item frozen
## names of the switches held by @qcode{"freeze"} (an empty cell
## otherwise).
## @item saturated
## names of the controllers whose output sits at a limit (their own
## @qcode{"limits"} or the driven input's range, a valve fully open or
## shut): such a loop cannot hold its setpoint at this operating point,
## and a warning (id @qcode{"vesselnet:saturated"}) says so.
## @item net
## the network with the inputs set to their steady values, so that
## @code{vn_simulate (op.net, tspan, "initial", op)} continues from it.
## With @qcode{"freeze"} the frozen switches are not in it and the inputs
## they drive hold the switches' outputs; @code{vn_linearize} and
## @code{vn_stepresponse} accept such an operating point with the full
## network and linearise (and simulate) with each switch holding its
## output.
## @end table
##
## Options:
## @table @asis
## @item @qcode{"initial"}
## start from an operating point (its @code{x}) or a state vector.
## @item @qcode{"maxiter"}
## Newton iterations per attempt, a whole number in [1, 10000] (default 60).
## @item @qcode{"tol"}
## scaled residual accepted as converged, in (0, 1) (default 1e-10).
## @item @qcode{"solver"}
## @qcode{"auto"} (dense up to 100 unknowns, else KLU), @qcode{"dense"}
## or @qcode{"klu"}.
## @item @qcode{"simulate"}
## false: no simulation fallback (default true).
## @item @qcode{"freeze"}
## true: hold every on/off switch at the output it starts with (a network
## with switches cycles and has no single steady state; without this
## option vn_steady says so).
## @item @qcode{"verbose"}
## print iterations, method and residual.
## @end table
##
## An operating point is a model's prediction: validate the model against
## plant data before settings derived from it reach a live plant.
## @seealso{vn_simulate, vn_linearize, vn_stepresponse}
## @end deftypefn

function op = vn_steady (net, varargin)
  if (nargin < 1)
    print_usage ();
  endif
  if (! (isstruct (net) && isfield (net, "type")
         && strcmp (net.type, "vesselnet.network")))
    error ("Octave:invalid-input-arg",
           "vn_steady: NET must be a network made by vn_network");
  endif
  [ovr, opt] = parse_args (net, varargin);
  ## inputs at other values
  for i = 1:numel (ovr)
    q = ovr(i).q;
    if (any (strcmp (net.options.species, q.var)))
      net.units(q.unit).aux.species.(q.var) = ovr(i).value;
    else
      net.units(q.unit).par.(q.var) = ovr(i).value;
    endif
  endfor
  [net, frozen] = freeze_switches (net, opt.freeze);
  [padj, ytgt, tval, qadj] = inverse_problem (net, opt);
  x0 = start_state (opt.initial);
  pk = vn_pack (net);
  so = struct ("maxiter", opt.maxiter, "tol", opt.tol, "solver", opt.solver,
               "simulate", opt.simulate);
  [x, y, ua, info, states] = __vn_steady__ (pk, x0, padj, ytgt, tval, so);
  adjusted = struct ();
  for k = 1:numel (qadj)
    net.units(qadj{k}.unit).par.(qadj{k}.var) = ua(k);
    adjusted.(qadj{k}.uname).(qadj{k}.var) = ua(k);
  endfor
  op = operating_point (net, x, y, states);
  op.adjusted = adjusted;
  op.residual = info.residual;
  op.relres = info.relres;
  op.iterations = info.iterations;
  if (info.simulated)
    op.method = "newton after simulation";
  else
    op.method = "newton";
  endif
  op.solver = info.solver;
  op.frozen = frozen;
  op.saturated = saturated_loops (net, op);
  op.net = net;
  if (opt.verbose)
    printf ("vn_steady: %s, %d iterations, residual %.3g m3/s (scaled %.3g), %s\n",
            op.method, op.iterations, op.residual, op.relres, op.solver);
  endif
endfunction

## Name/value pairs: input quantities ("UNIT.VAR") and options.
function [ovr, opt] = parse_args (net, args)
  opt = struct ("target", {{}}, "adjust", {{}}, "initial", [],
                "maxiter", 60, "tol", 1e-10, "solver", 0, "simulate", true,
                "verbose", false, "freeze", false);
  ovr = struct ("q", {}, "value", {});
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "vn_steady: arguments after NET come in name/value pairs");
  endif
  for i = 1:2:numel (args)
    name = args{i};
    val = args{i+1};
    if (! ischar (name) || ! isrow (name))
      error ("Octave:invalid-input-arg",
             "vn_steady: argument %d must be an input quantity \"UNIT.VARIABLE\" or an option name",
             i + 1);
    endif
    if (any (name == "."))
      q = vn_quantity (net, name, "input", "vn_steady");
      val = units_value ("vn_steady", sprintf ("input \"%s\"", name),
                         "value", val, q.unitofmeasure);
      if (! (isnumeric (val) && isreal (val) && isscalar (val)
             && isfinite (val)))
        error ("Octave:invalid-input-arg",
               "vn_steady: %s must be a finite real scalar (%s)", name,
               q.unitofmeasure);
      endif
      [~, v, clip] = signal_range ("vn_steady", q, 0, double (val), true,
                                "input");
      if (! isempty (clip))
        warning ("vesselnet:clipped",
                 "vn_steady: input \"%s\" given as %.6g, outside its range [%.6g, %.6g]; the operating point uses it clipped to %.6g",
                 name, val, clip.lo, clip.hi, v);
      endif
      ovr(end+1) = struct ("q", q, "value", v);
      continue;
    endif
    switch (lower (name))
      case "target"
        if (! iscell (val) || mod (numel (val), 2) != 0)
          error ("Octave:invalid-input-arg",
                 "vn_steady: \"target\" must be a cell {OUTPUT, VALUE, ...}, e.g. {\"T2.level\", 1.5}");
        endif
        opt.target = val;
      case "adjust"
        if (ischar (val))
          val = {val};
        endif
        if (! iscellstr (val))
          error ("Octave:invalid-input-arg",
                 "vn_steady: \"adjust\" must be an input quantity or a cell of them, e.g. {\"F1.flow\"}");
        endif
        opt.adjust = val;
      case "initial"
        opt.initial = val;
      case "maxiter"
        if (! (isnumeric (val) && isscalar (val) && isreal (val)
               && val >= 1 && val <= 1e4 && val == fix (val)))
          error ("Octave:invalid-input-arg",
                 "vn_steady: option \"maxiter\" must be a whole number in [1, 10000], got %s",
                 build_value_str (val));
        endif
        opt.maxiter = val;
      case "tol"
        if (! (isnumeric (val) && isscalar (val) && isreal (val)
               && val > 0 && val < 1))
          error ("Octave:invalid-input-arg",
                 "vn_steady: option \"tol\" must lie in (0, 1), got %s",
                 build_value_str (val));
        endif
        opt.tol = val;
      case "solver"
        j = find (strcmpi ({"auto", "dense", "klu"}, val));
        if (! ischar (val) || isempty (j))
          error ("Octave:invalid-input-arg",
                 "vn_steady: option \"solver\" must be \"auto\", \"dense\" or \"klu\"");
        endif
        opt.solver = j - 1;
      case {"simulate", "verbose", "freeze"}
        if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
          error ("Octave:invalid-input-arg",
                 "vn_steady: option \"%s\" must be true or false", lower (name));
        endif
        opt.(lower (name)) = logical (val);
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_steady: unknown option \"%s\"; allowed: target, adjust, initial, maxiter, tol, solver, simulate, freeze, verbose, or an input quantity \"UNIT.VARIABLE\"",
               name);
    endswitch
  endfor
endfunction

## Targets (outputs and values) and adjusted inputs, 0-based for the core.
function [padj, ytgt, tval, qadj] = inverse_problem (net, opt)
  nt = numel (opt.target) / 2;
  na = numel (opt.adjust);
  if (nt != na)
    error ("Octave:invalid-input-arg",
           "vn_steady: %d target(s) but %d adjusted input(s); give as many inputs in \"adjust\" as outputs in \"target\"",
           nt, na);
  endif
  ytgt = zeros (1, nt, "int32");
  tval = zeros (nt, 1);
  for k = 1:nt
    name = opt.target{2*k-1};
    val = opt.target{2*k};
    q = vn_quantity (net, name, "output", "vn_steady");
    val = units_value ("vn_steady", sprintf ("target \"%s\"", name),
                       "value", val, q.unitofmeasure);
    if (! (isnumeric (val) && isreal (val) && isscalar (val) && isfinite (val)))
      error ("Octave:invalid-input-arg",
             "vn_steady: target %s must be a finite real scalar (%s)", name,
             q.unitofmeasure);
    endif
    ytgt(k) = q.index;
    tval(k) = val;
  endfor
  padj = zeros (1, na, "int32");
  qadj = cell (1, na);
  for k = 1:na
    qadj{k} = vn_quantity (net, opt.adjust{k}, "input", "vn_steady");
    padj(k) = qadj{k}.index;
  endfor
  if (numel (unique (opt.adjust)) < na)
    error ("Octave:invalid-input-arg",
           "vn_steady: \"adjust\" names an input twice: %s",
           strjoin (opt.adjust, ", "));
  endif
endfunction

function x0 = start_state (init)
  if (isempty (init))
    x0 = [];
  elseif (isstruct (init) && isfield (init, "x"))
    x0 = init.x(:);
  elseif (isnumeric (init) && isreal (init) && isvector (init))
    x0 = double (init(:));
  else
    error ("Octave:invalid-input-arg",
           "vn_steady: option \"initial\" must be an operating point from vn_steady or a state vector");
  endif
endfunction

## Switches cycle: refuse, or hold each at the output it starts with.
function [net, names] = freeze_switches (net, freeze)
  sw = find (strcmp ({net.units.kind}, "switch"));
  names = cell (1, 0);
  if (isempty (sw))
    return;
  endif
  names = {net.units(sw).name};
  if (! freeze)
    error ("vesselnet:no-steady-state",
           "vn_steady: switch %s turns its input on and off, so the network has no single steady state; give \"freeze\", true to hold each switch at the output it starts with",
           strjoin (strcat ("\"", names, "\""), ", "));
  endif
  try
    r0 = vn_simulate (net, [0 1e-6], "record", strcat (names, ".output"));
  catch err
    vn_rethrow (err, "vn_steady");
  end_try_catch
  for j = 1:numel (sw)
    q = net.units(sw(j)).aux.manipulate;
    dot = find (q == ".", 1);
    tu = q(1:dot-1);
    net.units(net.index.(tu)).par.(q(dot+1:end)) = r0.(names{j}).output(1);
  endfor
  net = vn_drop_units (net, sw);
endfunction

## Controllers whose output sits at a limit (its own or the driven
## input's range): the loop cannot hold its setpoint there.  Warn once,
## naming each, and return their names.
function names = saturated_loops (net, op)
  names = cell (0, 1);
  for i = find (strcmp ({net.units.kind}, "controller"))
    u = net.units(i);
    [rlo, rhi] = loop_input_range (net, u.aux.manipulate, "vn_steady");
    [lo, hi] = deal (rlo, rhi);
    if (isfield (u.par, "lo"))
      lo = max (lo, u.par.lo);
    endif
    if (isfield (u.par, "hi"))
      hi = min (hi, u.par.hi);
    endif
    out = op.(u.name).output;
    tol = 1e-9 * max (1, abs (out));
    if (abs (out - hi) <= tol || abs (out - lo) <= tol)
      names{end+1, 1} = u.name;
      warning ("vesselnet:saturated",
               "vn_steady: controller \"%s\" holds %s at its %s limit %.6g: %s settles at %.6g, setpoint %.6g; the loop cannot hold its setpoint at this operating point",
               u.name, u.aux.manipulate, ifelse (abs (out - hi) <= tol, "upper", "lower"),
               out, u.aux.measure, op.(u.name).measurement, op.(u.name).setpoint);
    endif
  endfor
endfunction

## The result struct: unit fields as scalars, inputs, spilling tanks.
function op = operating_point (net, x, y, states)
  ## one time point: every field of the result is already a scalar
  res = vn_results (net, 0, x(:).', y(:).', states, []);
  op = rmfield (res, intersect (fieldnames (res), {"t", "x", "states", "units"}));
  names = {};
  values = [];
  inputs = struct ();
  s = vn_schema ();
  kinds = {net.units.kind};
  for i = find (! strcmp (kinds, "tank"))
    un = net.units(i);
    r = res.(un.name);
    k = s.(un.kind);
    for j = find (k.isinput)
      if (! isfield (r, k.params{j}))
        continue;   # a property slot the network does not carry
      endif
      v = r.(k.params{j});
      if (! isnan (v))
        names{end+1, 1} = [un.name "." k.params{j}];
        values(end+1, 1) = v;
        inputs.(un.name).(k.params{j}) = v;
      endif
    endfor
  endfor
  tanks = {net.units(strcmp (kinds, "tank")).name};
  spill = cellfun (@(n) res.(n).spill, tanks);
  op.spilling = tanks(spill > 0).';
  op.spill = spill(spill > 0).';
  op.x = x(:);
  op.states = states;
  op.units = res.units;
  op.input_names = names;
  op.input_values = values;
  op.inputs = inputs;
endfunction

%!demo
%! ## Invented example: a buffer tank above a filter bed, both draining
%! ## through orifices; the feed that holds the bed's level at 1.5 m.
%! net.type = "vesselnet.network"; net.name = "filter house";
%! net.options = struct ("gravity", 9.80665, "density", 998.2, "cp", 4181.3,
%!                       "ambient", 15, "thermal", false, "species", {{}},
%!                       "decay", [], "smooth", 1e-3);
%! net.units = struct ("name", {"T1", "T2", "O1", "O2", "F1"},
%!   "kind", {"tank", "tank", "orifice", "orifice", "feed"},
%!   "from", {"", "", "T1", "T2", ""}, "to", {"", "", "T2", "", "T1"},
%!   "par", {struct("area", 3, "level", 1), struct("area", 2, "level", 1),
%!           struct("coeff", 0.012), struct("coeff", 0.01),
%!           struct("flow", 0.01)},
%!   "table", {[], [], [], [], []}, "aux", {struct(), struct(), struct(),
%!   struct(), struct()});
%! net.index = struct ("T1", 1, "T2", 2, "O1", 3, "O2", 4, "F1", 5);
%! op = vn_steady (net);
%! printf ("T1 %.3f m, T2 %.3f m at a feed of %.4f m3/s\n", op.T1.level,
%!         op.T2.level, op.F1.flow);
%! op = vn_steady (net, "target", {"T2.level", 1.5}, "adjust", {"F1.flow"});
%! printf ("feed for T2 at 1.5 m: %.5f m3/s\n", op.adjusted.F1.flow);

%!function net = one_tank (with_feed)
%!  ## Torricelli tank: area 2 m2, orifice coeff 0.01, optional feed 0.01
%!  net = vn_network ("t");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1);
%!  net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%!  if (with_feed)
%!    net = vn_feed (net, "F1", "T1", "flow", 0.01);
%!  endif
%!endfunction

%!test
%! ## Orifice law F = c sqrt(h): steady level h = (F/c)^2 (Torricelli).
%! net = one_tank (true);
%! op = vn_steady (net);
%! assert (op.T1.level, 1.0, 1e-9);
%! assert (op.O1.flow, 0.01, 1e-12);
%! assert (op.x, 2.0, 1e-8);
%! assert (op.states, {"T1.volume"});
%! assert (op.method, "newton");
%! op = vn_steady (net, "F1.flow", 0.025);
%! assert (op.T1.level, 6.25, 1e-8);
%! assert (op.F1.flow, 0.025);
%! assert (op.net.units(3).par.flow, 0.025);
%! assert (op.input_names, {"F1.flow"});
%! assert (op.inputs.F1.flow, 0.025);
%! assert (op.relres < 1e-9);

%!test
%! ## Inverse: the feed holding h = 2.25 m is c sqrt(h) = 0.015 (Torricelli).
%! net = one_tank (true);
%! op = vn_steady (net, "target", {"T1.level", 2.25}, "adjust", "F1.flow");
%! assert (op.adjusted.F1.flow, 0.015, 1e-10);
%! assert (op.T1.level, 2.25, 1e-9);
%! assert (op.net.units(3).par.flow, 0.015, 1e-10);

%!test
%! ## a sump under a level switch has no single steady state unless the
%! ## switch is frozen (invented data)
%! net = vn_network ("sump");
%! net = vn_tank (net, "S1", "area", 2, "level", 0.5);
%! net = vn_feed (net, "F1", "S1", "flow", 0.004);
%! net = vn_orifice (net, "O1", "S1", "", "coeff", 0.002);
%! net = vn_pump (net, "P1", "S1", "", "flow", 0.01, "speed", 0);
%! net = vn_switch (net, "LS1", "measure", "S1.level", "manipulate", ...
%!                  "P1.speed", "on", 1.5, "off", 0.5);
%! fail ("vn_steady (net)", "no single steady state");
%! op = vn_steady (net, "freeze", true);
%! ## pump held off: the orifice passes the feed, h = (F/c)^2
%! assert (op.S1.level, (0.004 / 0.002)^2, 1e-8);
%!test
%! ## inputs and targets as "VALUE UNIT" give what the SI numbers give
%! net = vn_tank (vn_network (), "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%! a = vn_steady (net, "F1.flow", 0.02);
%! b = vn_steady (net, "F1.flow", "72 m3/h");
%! assert (b.T1.level, a.T1.level, 1e-9);
%! c = vn_steady (net, "target", {"T1.level", "2250 mm"}, "adjust", "F1.flow");
%! assert (c.F1.flow, 0.015, 1e-8);       # coeff sqrt (2.25) = 0.015
%!error <vn_steady: input "F1.flow": VALUE "1 m": "m" is a unit of length; VALUE allows units of flow> vn_steady (vn_feed (vn_tank (vn_network (), "T1", "area", 2), "F1", "T1"), "F1.flow", "1 m")

%!test
%! ## an opening past its travel is clipped, with a warning, and the
%! ## operating point is the one at the clipped opening (invented data)
%! net = vn_tank (vn_network (), "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 40, "opening", 0.5);
%! warning ("off", "vesselnet:clipped", "local");
%! a = vn_steady (net, "LV1.opening", 1.5);
%! b = vn_steady (net, "LV1.opening", 1);
%! assert (a.LV1.opening, 1);
%! assert (a.inputs.LV1.opening, 1);
%! assert (a.T1.level, b.T1.level, 1e-12);
## An undersized outlet valve: fully open it passes the feed only at a
## level of 3.67 m.  Valve law Q = Kv sqrt(dp / (rho / rho0)), Kv in m3/h
## and dp in bar (IEC 60534-2-1, non-choked liquid), dp = rho g h, rho0 =
## 999.1 kg/m3 (water at 15 degC, memory): h = (Q / Kv)^2 1e5 / (rho0 g).
%!test
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.005);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30, "opening", 0.5);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                      "setpoint", 1, "gain", 2, "reset", 100, "action", "direct", "limits", [0 1.2]);
%! warning ("off", "vesselnet:saturated", "local");
%! op = vn_steady (net);
%! assert (op.saturated, {"LC1"});
%! assert (op.LC1.output, 1, 1e-9);
%! h = (0.005 * 3600 / 30) ^ 2 * 1e5 / (999.1 * net.options.gravity);
%! assert (op.T1.level, h, 1e-6 * h);
%! net.units(net.index.F1).par.flow = 0.002;
%! op = vn_steady (net);
%! assert (op.saturated, cell (0, 1));
%! assert (op.T1.level, 1, 1e-9);
%!warning <vn_steady: controller "LC1" holds LV1.opening at its upper limit 1: T1.level settles at 3.67> ...
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.005);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30, "opening", 0.5);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                      "setpoint", 1, "gain", 2, "reset", 100, "action", "direct");
%! vn_steady (net);
%!warning <vn_steady: input "LV1.opening" given as 1.5, outside its range \[0, 1\]; the operating point uses it clipped to 1>
%! net = vn_feed (vn_tank (vn_network (), "T1", "area", 2, "level", 1), "F1", "T1", "flow", 0.01);
%! vn_steady (vn_valve (net, "LV1", "T1", "", "kv", 40), "LV1.opening", 1.5);
%!error <vn_steady: input "F1.flow": values must lie in \[-1e\+06, 1e\+06\] \(m3/s\), got 3e\+06$> vn_steady (vn_feed (vn_tank (vn_network (), "T1", "area", 2), "F1", "T1"), "F1.flow", 3e6)

%!error <vn_steady: option "maxiter" must be a whole number in \[1, 10000\], got 1e\+06> vn_steady (vn_tank (vn_network (), "T1", "area", 2), "maxiter", 1e6)
%!error <vn_steady: option "tol" must lie in \(0, 1\), got 2> vn_steady (vn_tank (vn_network (), "T1", "area", 2), "tol", 2)
%!error <vn_steady: option "tol" must lie in \(0, 1\), got "tight"> vn_steady (vn_tank (vn_network (), "T1", "area", 2), "tol", "tight")
%!error <2 target\(s\) but 1 adjusted>
%! net = one_tank (true);
%! vn_steady (net, "target", {"T1.level", 2, "T1.volume", 4}, "adjust", {"F1.flow"});
%!error <no unit "T9">
%! net = one_tank (false);
%! vn_steady (net, "T9.flow", 0.1);
%!error <unknown option "speed">
%! net = one_tank (false);
%! vn_steady (net, "speed", 0.1);
%!error <Invalid call>
%! vn_steady ();
