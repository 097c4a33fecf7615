## -*- texinfo -*-
## @deftypefn  {} {@var{sr} =} vn_stepresponse (@var{net}, @var{op}, @var{input}, @var{size})
## @deftypefnx {} {@var{sr} =} vn_stepresponse (@var{net}, @var{op}, @var{input}, @var{size}, @var{outputs})
## @deftypefnx {} {@var{sr} =} vn_stepresponse (@dots{}, @var{name}, @var{value}, @dots{})
## Compare the nonlinear and linear responses to a step on one input.
##
## The network starts at the operating point @var{op} (from
## @code{vn_steady}; see @code{vn_linearize} for the forms accepted) and
## the input @var{input} (@qcode{"F1.flow"}) steps by @var{size} at t = 0:
## from the start of the run it holds its operating value plus @var{size}.
## @var{outputs} are quantities, a cell array or one string (default: the
## levels of all tanks).
##
## The nonlinear response is simulated with @code{vn_simulate}; the linear
## one is the exact step of the model from @code{vn_linearize} (a matrix
## exponential, no integration error).  Both are deviations from the
## operating point.
##
## Fields of @var{sr}:
## @table @code
## @item t
## times (s), a column.
## @item nonlinear, linear
## output deviations, rows time, columns outputs.
## @item outputs, input
## the names; @code{size} the step in the input's units, @code{before} the
## input's operating value.
## @item lin
## the linear model.
## @item metrics
## struct array, one element per output, figures of the nonlinear
## response from @code{step_metrics}: @code{gain} (final change / size),
## @code{final}, @code{t63}, @code{rise} (10-90 %), @code{settle} (2 %),
## @code{overshoot} (%), @code{peak}, @code{undershoot}, @code{inverse},
## @code{deadtime} (1 % threshold) and @code{settles}.  Everything comes
## from the nonlinear model, never from the linear gain: the final change
## is the nonlinear steady state the run heads for (Newton from the state
## the run ended in, the input at its stepped value), so a run that stops
## just inside the 2 % band still gives sound times.  @code{settles} is
## false when the response does not settle away from zero: it returns to
## zero (a flow out of a tank train whose outflow is held), it has no
## steady state (an integrating level; @code{final} and @code{gain} NaN),
## or it is still outside 2 % of its final change at the end of the run
## (give a longer @qcode{"tend"}); @code{t63}, @code{rise}, @code{settle},
## @code{overshoot} and the other times are NaN then.
## @item metrics_linear
## the same figures for the linear response, with the final change
## gain x size (a signed Inf for an integrating pair, which never settles).
## @end table
##
## Options:
## @table @asis
## @item @qcode{"percent"}
## true: @var{size} is in percent of the magnitude of the input's operating
## value (a positive @var{size} always raises the input).
## @item @qcode{"t"}
## output times (s), increasing, from 0 on.
## @item @qcode{"tend"}
## last time (s), 400 points from 0.  The default is 5 times the slowest
## time constant of the linear model; a model whose poles are all
## integrators needs @qcode{"t"} or @qcode{"tend"}.
## @item @qcode{"reltol"}, @qcode{"abstol"}
## integrator tolerances of the nonlinear run.  Default: relative 1e-8 (a
## small step's deviations are small differences of large contents) and
## the absolute tolerance of @code{vn_simulate}, per state and scaled to
## each tank's capacity, so a sight tube's deviations are resolved as
## finely as a reservoir's.  A positive @qcode{"abstol"} replaces them all
## with one value.
## @end table
##
## Both responses are a model's: validate the model against a plant step
## test before a tuning based on them reaches a live loop, and have the
## tuning reviewed.
## @seealso{vn_linearize, vn_simulate, vn_steady, vn_fopdt}
## @end deftypefn

function sr = vn_stepresponse (net, op, input, amount, varargin)

  if (nargin < 4)
    print_usage ();
  endif
  outputs = [];
  args = varargin;
  if (! isempty (args) && (iscell (args{1}) || (ischar (args{1})
                                                && any (args{1} == "."))))
    outputs = args{1};
    args(1) = [];
  endif
  opt = parse_options (args);
  if (! (ischar (input) && rows (input) == 1))
    error ("Octave:invalid-input-arg",
           "vn_stepresponse: INPUT must be one quantity \"UNIT.VARIABLE\", got a %s",
           class (input));
  endif
  if (! (isnumeric (amount) && isscalar (amount) && isreal (amount)
         && isfinite (amount)))
    error ("Octave:invalid-input-arg",
           "vn_stepresponse: SIZE must be a finite real scalar");
  endif
  if (amount == 0)
    error ("Octave:invalid-input-arg",
           "vn_stepresponse: step SIZE on \"%s\" is zero; give a non-zero change",
           input);
  endif
  if (isempty (outputs))
    outputs = tank_levels (net);
  endif

  try
    lin = vn_linearize (net, op, {input}, outputs);
  catch err
    vn_rethrow (err, "vn_stepresponse");
  end_try_catch
  [pnet, x] = lin_operating (net, op, "vn_stepresponse");
  q = vn_quantity (pnet, input, "input", "vn_stepresponse");
  before = input_value (pnet, q);
  du = amount;
  if (opt.percent)
    if (before == 0)
      error ("Octave:invalid-input-arg",
             "vn_stepresponse: \"%s\" is 0 at the operating point; a step in percent of it is zero, give an absolute SIZE",
             input);
    endif
    du = amount / 100 * abs (before);
  endif
  check_range (pnet, q, before, du);

  t = time_grid (opt, lin);
  ## Output values at the operating point, before the step.
  [y0, x] = nonlinear (pnet, x, [], [0; t(2)/2; t(2)], lin.outputs, opt);
  y0 = y0(1,:);
  step = struct ("quantity", input, "kind", "step", "t", 0,
                 "v", before + du, "hold", true);
  ts = t;
  if (t(1) > 0)
    ts = [0; t];
  endif
  [ynl, ~, xend] = nonlinear (pnet, x, step, ts, lin.outputs, opt);
  ynl = ynl(end-numel(t)+1:end,:) - y0;
  ylin = lin_deviation (lin.A, lin.B, lin.C, lin.D, du, t);
  ynf = nonlinear_final (pnet, input, before + du, xend, lin.outputs) - y0;

  sr.t = t;
  sr.nonlinear = ynl;
  sr.linear = ylin;
  sr.outputs = lin.outputs;
  sr.input = input;
  sr.size = du;
  sr.before = before;
  sr.lin = lin;
  for j = numel (lin.outputs):-1:1
    m(j) = step_metrics (t, ynl(:,j), du, "final", ynf(j));
    ml(j) = step_metrics (t, ylin(:,j), du, "final", lin.gain(j) * du);
  endfor
  sr.metrics = m(:);
  sr.metrics_linear = ml(:);

endfunction

## The stepped input must stay inside its range: refused here, under this
## command's name, before any run (the physics would clip it, and the
## steady state after the step would be refused by vn_steady).
function check_range (net, q, before, du)
  k = vn_schema ().(q.kind);
  lo = k.lo(q.slot + 1);
  hi = k.hi(q.slot + 1);
  v = before + du;
  if (! (v >= lo && v <= hi))
    error ("Octave:invalid-input-arg",
           "vn_stepresponse: %s \"%s\": %s %g %+g = %g after the step lies outside [%g, %g] (%s); give a SIZE that keeps it inside",
           q.kind, net.units(q.unit).name, q.var, before, du, v, lo, hi,
           q.unitofmeasure);
  endif
endfunction

function opt = parse_options (args)
  opt = struct ("percent", false, "t", [], "tend", [], "reltol", 1e-8,
                "abstol", []);
  [names, vals] = vn_option_pairs (args, "vn_stepresponse");
  for i = 1:numel (names)
    name = names{i};
    val = vals{i};
    switch (lower (name))
      case "percent"
        if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
          error ("Octave:invalid-input-arg",
                 "vn_stepresponse: option \"percent\" must be true or false");
        endif
        opt.percent = logical (val);
      case "t"
        if (! (isnumeric (val) && isreal (val) && isvector (val)
               && numel (val) >= 2 && all (isfinite (val))
               && all (diff (val) > 0) && val(1) >= 0))
          error ("Octave:invalid-input-arg",
                 "vn_stepresponse: option \"t\" must be two or more increasing times from 0 on (s)");
        endif
        opt.t = val(:);
      case {"tend", "reltol", "abstol"}
        if (! (isscalar (val) && isreal (val) && val > 0 && isfinite (val)))
          error ("Octave:invalid-input-arg",
                 "vn_stepresponse: option \"%s\" must be a positive number, got %s",
                 lower (name), num2str (val));
        endif
        opt.(lower (name)) = val;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_stepresponse: unknown option \"%s\"; allowed: percent, t, tend, reltol, abstol",
               name);
    endswitch
  endfor
endfunction

function names = tank_levels (net)
  tanks = strcmp ({net.units.kind}, "tank");
  names = strcat ({net.units(tanks).name}, ".level");
  if (isempty (names))
    error ("Octave:invalid-input-arg",
           "vn_stepresponse: network \"%s\" has no tanks; give OUTPUTS",
           net.name);
  endif
endfunction

## The input's value in the network, or the kind's default.
function v = input_value (net, q)
  par = net.units(q.unit).par;
  if (isfield (par, q.var))
    v = par.(q.var);
  else
    k = vn_schema ().(q.kind);
    v = k.defaults(q.slot + 1);
  endif
endfunction

function t = time_grid (opt, lin)
  if (! isempty (opt.t))
    t = opt.t;
    return;
  endif
  tend = opt.tend;
  if (isempty (tend))
    tau = abs (lin.tau(isfinite (lin.tau)));
    if (isempty (tau) || max (tau) == 0)
      error ("Octave:invalid-input-arg",
             "vn_stepresponse: the linear model has no finite time constant (integrators only, or poles not computed); give \"t\" or \"tend\"");
    endif
    tend = 5 * max (tau);
  endif
  t = linspace (0, tend, 400).';
endfunction

## Simulated outputs (rows time), the start state the run used and the
## state it ended in.
function [Y, x0, xend] = nonlinear (net, x, u, t, names, opt)
  tol = {"reltol", opt.reltol};
  if (! isempty (opt.abstol))
    tol = [tol, {"abstol", opt.abstol}];
  endif
  try
    res = vn_simulate (net, t, u, "initial", x, tol{:});
  catch err
    vn_rethrow (err, "vn_stepresponse");
  end_try_catch
  x0 = res.x(1,:).';
  xend = res.x(end,:).';
  Y = zeros (numel (t), numel (names));
  for j = 1:numel (names)
    dot = find (names{j} == ".", 1);
    Y(:,j) = res.(names{j}(1:dot-1)).(names{j}(dot+1:end));
  endfor
endfunction

## The outputs at the nonlinear steady state the run heads for: Newton
## from the state the run ended in, with the input at its stepped value.
## NaN where there is none (an integrating output, a switch that cycles).
function y = nonlinear_final (net, input, value, xend, names)
  y = NaN (1, numel (names));
  try
    op = vn_steady (net, input, value, "initial", xend, "simulate", false);
  catch err
    if (! any (strcmp (err.identifier, {"vesselnet:no-steady-state",
                                        "vesselnet:solver-failure"})))
      vn_rethrow (err, "vn_stepresponse");
    endif
    return;
  end_try_catch
  for j = 1:numel (names)
    dot = find (names{j} == ".", 1);
    y(j) = op.(names{j}(1:dot-1)).(names{j}(dot+1:end));
  endfor
endfunction

%!test
%! ## A sight glass (1e-6 m2, 0.1 m, 1e-7 m3) fed at 1e-9 m3/s: a step of
%! ## 0.01 K in the feed temperature moves the well-mixed content as a
%! ## first-order lag of tau = V/F = 100 s and gain 1 (energy balance,
%! ## Seborg et al., stirred-tank heating, memory).  With one absolute
%! ## tolerance of 1e-10 for every state the heat content (2e-6 m3 K) was
%! ## held to 5e-5 of itself and the responses differed by 5 %.
%! net = vn_network ("sight glass", "thermal", true, "ambient", 15);
%! net = vn_tank (net, "T1", "area", 1e-6, "level", 0.1, "temperature", 20);
%! net = vn_feed (net, "F1", "T1", "flow", 1e-9, "temperature", 20);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 1e-9 / sqrt (0.1));
%! op = vn_steady (net);
%! sr = vn_stepresponse (net, op, "F1.temperature", 0.01, "T1.temperature", "tend", 500);
%! assert (sr.linear, 0.01 * (1 - exp (-sr.t / 100)), 1e-9);
%! assert (sr.nonlinear, sr.linear, 1e-3 * 0.01);

%!demo
%! ## Invented example: the cooling-water tank of a dairy, fed by a pump and
%! ## drained through an orifice; a 10 % step on the feed.
%! net = vn_network ("dairy cooling water");
%! net = vn_tank (net, "T1", "area", 2.5, "level", 1.4);
%! net = vn_feed (net, "F1", "T1", "flow", 0.006);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.005);
%! op = vn_steady (net);
%! sr = vn_stepresponse (net, op, "F1.flow", 10, "T1.level", "percent", true);
%! plot (sr.t / 60, [sr.nonlinear, sr.linear]);
%! xlabel ("time (min)");  ylabel ("level change (m)");
%! legend ("nonlinear", "linear", "location", "southeast");
%! printf ("gain %.1f s/m2 (linear %.1f), t63 %.0f s (linear %.0f)\n",
%!         sr.metrics.gain, sr.metrics_linear.gain, sr.metrics.t63,
%!         sr.metrics_linear.t63);

%!shared net, op
%! ## Square-root tank: A 2 m2, h_s 1.5 m, F_s 0.01 m3/s.
%! net = vn_network ("one tank");
%! net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01 / sqrt (1.5));
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! op = struct ("x", 3, "net", net);

%!test
%! ## Small step (1e-4 relative): nonlinear and exact linear responses agree
%! ## to 1e-3 of the change; first order reaches 63.2 % at tau = 600 s
%! ## (Seborg et al., linearised square-root tank, memory).
%! sr = vn_stepresponse (net, op, "F1.flow", 1e-6, {"T1.level", "O1.flow"});
%! assert (sr.t([1 end]), [0; 3000], 1e-9);
%! assert (rows (sr.t), 400);
%! assert (sr.size, 1e-6);
%! assert (sr.before, 0.01);
%! assert (sr.linear(:,1), 300e-6 * (1 - exp (-sr.t / 600)), 1e-12);
%! assert (sr.nonlinear, sr.linear, 1e-3 * abs (sr.linear(end,:)));
%! assert (sr.metrics_linear(1).t63, sr.lin.tau, 0.5);
%! assert (sr.metrics(1).t63, 600, 1);
%! assert (sr.metrics(1).gain, 300, 0.5);
%! assert (sr.metrics(2).gain, 1, 1e-3);
%! assert (sr.metrics_linear(1).overshoot, 0);

%!test
%! ## A large step (+50 %) departs from the linear model as the square root
%! ## law predicts: new steady level h2 = 1.5 * 1.5^2 = 3.375 m (Torricelli).
%! sr = vn_stepresponse (net, op, "F1.flow", 50, "T1.level",
%!                       "percent", true, "tend", 30000);
%! assert (sr.size, 0.005, 1e-15);
%! assert (sr.nonlinear(end), 3.375 - 1.5, 1e-3);
%! assert (sr.linear(end), 300 * 0.005, 1e-6);

%!error <is zero> vn_stepresponse (net, op, "F1.flow", 0, "T1.level")
%!error <no unit "F2"> vn_stepresponse (net, op, "F2.flow", 1e-3, "T1.level")
%!error <not an output> vn_stepresponse (net, op, "F1.flow", 1e-3, "T1.depth")
%!error <another network> vn_stepresponse (net, [1; 2], "F1.flow", 1e-3, "T1.level")
%!error <option "t"> vn_stepresponse (net, op, "F1.flow", 1e-3, "T1.level", "t", [5 1])
%!error <unknown option> vn_stepresponse (net, op, "F1.flow", 1e-3, "T1.level", "speed", 1)
%!error vn_stepresponse (net, op, "F1.flow")
%!shared vnet, vop
%! vnet = vn_network ("valve tank");
%! vnet = vn_tank (vnet, "T1", "area", 2, "level", 1);
%! vnet = vn_feed (vnet, "F1", "T1", "flow", 0.01);
%! vnet = vn_valve (vnet, "V1", "T1", "", "kv", 100, "opening", 0.6);
%! vop = vn_steady (vnet);
%!error <^vn_stepresponse: valve "V1": opening 0.6 \+0.5 = 1.1 after the step lies outside \[0, 1\]> vn_stepresponse (vnet, vop, "V1.opening", 0.5, "T1.level")
%!error <^vn_stepresponse: valve "V1": opening 0.6 -0.7 = -0.1> vn_stepresponse (vnet, vop, "V1.opening", -0.7, "T1.level")
%!error <^vn_stepresponse: valve "V1": opening 0.6 -0.72 = -0.12> vn_stepresponse (vnet, vop, "V1.opening", -120, "T1.level", "percent", true)
