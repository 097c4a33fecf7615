## -*- texinfo -*-
## @deftypefn  {} {@var{lin} =} vn_linearize (@var{net}, @var{op}, @var{inputs}, @var{outputs})
## @deftypefnx {} {@var{lin} =} vn_linearize (@dots{}, @var{name}, @var{value}, @dots{})
## Linearise a network about an operating point.
##
## @var{op} is an operating point from @code{vn_steady}: its state vector
## @code{op.x} and, when present, its network @code{op.net} whose input
## values (feed flows, valve openings, pump speeds, boundary heads) are
## used in place of those of @var{net}.  A plain state vector, or [] for
## the levels declared on the tanks, is accepted too.  @var{inputs} and
## @var{outputs} are quantities @qcode{"UNIT.VARIABLE"}, a cell array or a
## single string: inputs are input parameters (@qcode{"F1.flow"},
## @qcode{"LV1.opening"}, @qcode{"P1.speed"}); outputs any reported
## variable (@qcode{"T2.level"}, @qcode{"T2.volume"}, @qcode{"O1.flow"},
## @qcode{"T1.spill"}, @qcode{"LV1.position"}).
##
## The model is @code{dx/dt = A x + B u, y = C x + D u} in deviations from
## the operating point, SI units and seconds, with the analytic Jacobians
## of the compiled core.  Fields of @var{lin}:
##
## @table @code
## @item A, B, C, D
## the matrices; A is sparse above 200 states, dense otherwise.
## @item states, inputs, outputs
## names of the states (@qcode{"T1.volume"}, ...), inputs and outputs.
## @item poles, tau, zeta, wn
## poles slowest first with their time constants @code{-1/real (pole)} (s;
## Inf for an integrator), damping ratios and natural frequencies (rad/s).
## Not computed above 2000 states unless asked (see @code{note}).
## @item gain
## steady-state gains, outputs x inputs, @code{D - C A^-1 B} on the states
## the input reaches and that reach the output; a signed Inf where an
## input drives an integrating output (a tank whose outflow does not
## depend on its level), the sign of the output's ramp for a rise of the
## input.  Each finite gain is the derivative of the steady output with
## respect to the input, as two @code{vn_steady} operating points give.
## @item num, den, zeros
## for one input and one output: the transfer function's coefficients in
## descending powers of s and its zeros; [] otherwise.  Built on the
## states the input reaches and that reach the output only, so a state
## outside them (an idle tank) adds no common factor to both.
## @item op
## the operating point given.
## @item note
## what was left out, or "".
## @end table
##
## Options:
## @table @asis
## @item @qcode{"sparse"}
## true: return A sparse whatever the size.
## @item @qcode{"dense"}
## true: return A dense whatever the size.
## @item @qcode{"poles"}
## true: compute the poles above 2000 states too (dense eigenvalues, slow);
## false: skip them at any size.
## @item @qcode{"loop"}
## @qcode{"closed"} (default): controllers and switches stay in the model,
## so the inputs they drive are not free and their setpoints can be inputs;
## @qcode{"open"}: controllers and switches are taken out and the inputs
## they drive are held at their operating-point values (the loop opened at
## the controller's output), as for tuning that loop.
## @end table
##
## An input at a bound of its range (a valve at opening 0 or 1, a pump at
## speed 0) has the derivative from inside the range in its columns of B
## and D, the one-sided derivative the clipped law has there (not the 0 of
## the clip), and @code{note} says so.  Steady-state gains keep only the
## states the input reaches and that reach the output (found on the
## non-zero pattern of A, B and C): an idle tank (a catch tank below a
## rim that does not spill) never makes a gain singular or Inf.
##
## An operating point found with switches frozen (@code{vn_steady (@dots{},
## "freeze", true)}) is linearised with each switch holding its output.
##
## A linear model holds near its operating point only: check it against a
## simulation (@code{vn_stepresponse}) and against plant data before
## tuning a live loop with it, and have the tuning reviewed.
## @seealso{vn_steady, vn_stepresponse, vn_frequency, vn_rga}
## @end deftypefn

function lin = vn_linearize (net, op, inputs, outputs, varargin)

  if (nargin < 4)
    print_usage ();
  endif
  opt = parse_options (varargin);
  if (! (isstruct (net) && isfield (net, "type")
         && strcmp (net.type, "vesselnet.network")))
    error ("Octave:invalid-input-arg",
           "vn_linearize: NET must be a network made by vn_network");
  endif
  inputs = name_list (inputs, "INPUTS");
  outputs = name_list (outputs, "OUTPUTS");
  [pnet, x, opstates, held] = lin_operating (net, op, "vn_linearize");
  if (! isempty (held))
    net = hold_switches (net, held, [inputs, outputs]);
  endif
  if (strcmp (opt.loop, "open"))
    [net, pnet, x, opstates] = open_loops (net, pnet, x, op);
  endif

  pin = zeros (1, numel (inputs), "int32");
  inq = cell (1, numel (inputs));
  for j = 1:numel (inputs)
    inq{j} = vn_quantity (net, inputs{j}, "input", "vn_linearize");
    pin(j) = inq{j}.index;
  endfor
  [~, first] = unique (inputs, "first");
  if (numel (first) < numel (inputs))
    dup = inputs(setdiff (1:numel (inputs), first));
    error ("Octave:invalid-input-arg",
           "vn_linearize: input \"%s\" is given twice", dup{1});
  endif
  yout = zeros (1, numel (outputs), "int32");
  for i = 1:numel (outputs)
    yout(i) = output_index (net, outputs{i});
  endfor

  ## The core's sparse Jacobian serves both forms; B, C, D come dense.
  [A, B, C, D, states, x] = __vn_linearize__ (vn_pack (pnet), x, pin, yout,
                                              true);
  if (! isempty (opstates) && ! isequal (opstates, states(:)))
    error ("Octave:invalid-input-arg",
           "vn_linearize: the operating point is from another network: its states are %s; this network has %s",
           strjoin (opstates.', ", "), strjoin (states(:).', ", "));
  endif
  [B, D, bound] = inside_range (pnet, inq, x, pin, yout, B, D);
  nx = rows (A);
  if (opt.dense || (! opt.sparse && nx <= 200))
    A = full (A);
  endif

  lin.A = A;
  lin.B = B;
  lin.C = C;
  lin.D = D;
  lin.states = states(:);
  lin.inputs = inputs(:);
  lin.outputs = outputs(:);
  lin.x = x;
  lin.note = "";
  if (! isempty (bound))
    lin.note = sprintf ("B and D of %s: one-sided, from inside the range",
                        strjoin (bound, ", "));
  endif
  lin.poles = [];
  lin.tau = [];
  lin.zeta = [];
  lin.wn = [];
  if (isempty (opt.poles))
    opt.poles = nx <= 2000;
    if (! opt.poles)
      lin.note = strtrim ([lin.note, " ", ...
                           sprintf(["poles not computed: %d states exceed 2000 ", ...
                                    "(ask with \"poles\", true)"], nx)]);
    endif
  endif
  if (opt.poles)
    [lin.poles, lin.tau, lin.zeta, lin.wn] = lin_modes (A);
  endif
  lin.gain = lin_gain (A, B, C, D);
  lin.num = [];
  lin.den = [];
  lin.zeros = [];
  if (numel (inputs) == 1 && numel (outputs) == 1 && opt.poles)
    ## on the states the input reaches and that reach the output: a state
    ## outside (an idle catch tank) would only add a common factor to
    ## numerator and denominator
    k = lin_reach (A, B) & lin_reach (A.', C.');
    [lin.num, lin.den, lin.zeros] = lin_polynomials (full (A(k,k)), B(k),
                                                     C(k), D);
  endif
  lin.op = op;

endfunction

function opt = parse_options (args)
  opt = struct ("sparse", false, "dense", false, "poles", [], "loop", "closed");
  [names, vals] = vn_option_pairs (args, "vn_linearize");
  for i = 1:numel (names)
    name = names{i};
    val = vals{i};
    switch (lower (name))
      case {"sparse", "dense", "poles"}
        if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
          error ("Octave:invalid-input-arg",
                 "vn_linearize: option \"%s\" must be true or false",
                 lower (name));
        endif
        opt.(lower (name)) = logical (val);
      case "loop"
        if (! (ischar (val) && any (strcmpi (val, {"open", "closed"}))))
          error ("Octave:invalid-input-arg",
                 "vn_linearize: option \"loop\" must be \"open\" or \"closed\", got %s",
                 shown (val));
        endif
        opt.loop = lower (val);
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_linearize: unknown option \"%s\"; allowed: sparse, dense, poles, loop",
               name);
    endswitch
  endfor
  if (opt.sparse && opt.dense)
    error ("Octave:invalid-input-arg",
           "vn_linearize: options \"sparse\" and \"dense\" cannot both be true");
  endif
endfunction

## Take controllers and switches out: the inputs they drive keep the value
## they had at the operating point, their states leave the state vector.
function [net, pnet, x, opstates] = open_loops (net, pnet, x, op)
  kinds = {pnet.units.kind};
  drop = find (strcmp (kinds, "controller") | strcmp (kinds, "switch"));
  if (isempty (drop))
    opstates = {};
    return;
  endif
  [~, ~, ~, ~, names, x] = __vn_linearize__ (vn_pack (pnet), x,
                                             zeros (1, 0, "int32"),
                                             zeros (1, 0, "int32"), true);
  keep = true (size (x));
  for i = drop
    u = pnet.units(i);
    q = u.aux.manipulate;
    dot = find (q == ".", 1);
    tu = q(1:dot-1);
    tv = q(dot+1:end);
    if (isstruct (op) && isfield (op, u.name) && isfield (op.(u.name), "output"))
      val = op.(u.name).output;
      pnet.units(pnet.index.(tu)).par.(tv) = val;
      net.units(net.index.(tu)).par.(tv) = val;
    endif
    keep &= ! strncmp (names, [u.name "."], numel (u.name) + 1);
  endfor
  x = x(keep);
  opstates = names(keep);
  pnet = vn_drop_units (pnet, drop);
  net = vn_drop_units (net, drop);
endfunction

## An input at a bound of its range (a valve at opening 0 or 1, a pump at
## speed 0) is clipped there, so its derivative is one-sided: the law is
## differentiated just inside the range (1e-8 of the smaller of the range
## and the value's magnitude, at least 1e-8), one input at a time, and
## only its columns of B and D are taken from there.
function [B, D, bound] = inside_range (pnet, inq, x, pin, yout, B, D)
  bound = {};
  s = vn_schema ();
  for j = 1:numel (inq)
    q = inq{j};
    k = s.(q.kind);
    slot = find (strcmp (k.params, q.var), 1);
    if (isempty (slot))
      continue;   # a species concentration: linear in its value
    endif
    par = pnet.units(q.unit).par;
    if (isfield (par, q.var))
      v = par.(q.var);
    else
      v = k.defaults(slot);
    endif
    lo = k.lo(slot);
    hi = k.hi(slot);
    h = 1e-8 * min (hi - lo, max (1, abs (v)));
    if (v <= lo)
      v = lo + h;
    elseif (v >= hi)
      v = hi - h;
    else
      continue;
    endif
    pnet.units(q.unit).par.(q.var) = v;
    [~, Bj, ~, Dj] = __vn_linearize__ (vn_pack (pnet), x, pin(j), yout, true);
    pnet.units(q.unit).par = par;
    B(:,j) = Bj;
    D(:,j) = Dj;
    bound{end+1} = sprintf ("%s.%s", pnet.units(q.unit).name, q.var);
  endfor
endfunction

## Switches frozen in the operating point hold their output: they leave
## the network, so they can be neither input nor output.
function net = hold_switches (net, held, names)
  for i = 1:numel (names)
    dot = find ([names{i} "."] == ".", 1);
    if (ischar (names{i}) && any (strcmp (names{i}(1:dot-1), held)))
      error ("Octave:invalid-input-arg",
             "vn_linearize: \"%s\": switch %s is held at its output in this operating point (vn_steady \"freeze\"), so it is not in the linear model",
             names{i}, strjoin (strcat ("\"", held, "\""), ", "));
    endif
  endfor
  net = vn_drop_units (net, cellfun (@(h) net.index.(h), held));
endfunction

## A string or cell array of strings, as a row cell.
function c = name_list (c, what)
  if (ischar (c) && rows (c) <= 1)
    c = {c};
  endif
  if (! iscell (c))
    error ("Octave:invalid-input-arg",
           "vn_linearize: %s must be quantities \"UNIT.VARIABLE\" (a string or a cell array of strings), got a %s",
           what, class (c));
  endif
  c = c(:).';
endfunction

## 0-based output index; an input parameter given as output says which
## outputs the unit has.
function idx = output_index (net, name)
  if (ischar (name) && any (name == "."))
    dot = find (name == ".", 1);
    uname = name(1:dot-1);
    var = name(dot+1:end);
    if (isfield (net.index, uname))
      k = vn_schema ().(net.units(net.index.(uname)).kind);
      if (any (strcmp (k.params, var)) && ! any (strcmp (k.outputs, var)))
        error ("Octave:invalid-input-arg",
               "vn_linearize: output \"%s\": %s is a parameter of %s \"%s\", not an output; its outputs: %s",
               name, var, net.units(net.index.(uname)).kind, uname,
               strjoin (k.outputs, ", "));
      endif
    endif
  endif
  q = vn_quantity (net, name, "output", "vn_linearize");
  idx = q.index;
endfunction

function t = shown (v)
  if (ischar (v))
    t = ["\"" v "\""];
  else
    t = sprintf ("a %s", class (v));
  endif
endfunction

%!demo
%! ## Invented example: a buffer tank at a brewery's water works feeds a
%! ## second tank through a pipe; linearise about the steady state.
%! net = vn_network ("brewhouse water");
%! net = vn_tank (net, "T1", "area", 3, "level", 1.2);
%! net = vn_tank (net, "T2", "area", 1.5, "level", 0.8);
%! net = vn_feed (net, "F1", "T1", "flow", 0.004);
%! net = vn_resistance (net, "R1", "T1", "T2", "r", 200);
%! net = vn_orifice (net, "O2", "T2", "", "coeff", 0.006);
%! op = vn_steady (net);
%! lin = vn_linearize (net, op, {"F1.flow"}, {"T1.level", "T2.level"});
%! printf ("time constants %.1f s and %.1f s\n", lin.tau);
%! printf ("gains %.1f and %.1f m per m3/s\n", lin.gain);

%!shared net, op
%! ## Square-root tank: A 2 m2, h_s 1.5 m, F_s 0.01 m3/s, coefficient so
%! ## that h_s is the steady level.
%! net = vn_network ("one tank");
%! net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01 / sqrt (1.5));
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! op = struct ("x", 3, "net", net, "states", {{"T1.volume"}});

%!test
%! ## tau = 2 A h_s/F_s = 600 s, gain 2 h_s/F_s = 300 s/m2 (Seborg et al.,
%! ## Process Dynamics and Control, linearised square-root tank, memory).
%! lin = vn_linearize (net, op, "F1.flow", "T1.level");
%! assert (lin.tau, 600, 1e-9);
%! assert (lin.poles, -1/600, 1e-12);
%! assert (lin.gain, 300, 1e-9);
%! assert (lin.A, -1/600, 1e-12);
%! assert (lin.C, 0.5, 1e-12);
%! assert (lin.states, {"T1.volume"});
%! assert (lin.inputs, {"F1.flow"});
%! ## G(s) = 300/(600 s + 1): num/den = 0.5 / (s + 1/600).
%! assert (lin.num, 0.5, 1e-12);
%! assert (lin.den, [1, 1/600], 1e-12);
%! assert (isempty (lin.zeros));
%! assert (lin.op, op);
%! assert (lin.note, "");

%!test
%! ## Outflow O1.flow: gain 1 at steady state (mass balance), D = 0; the
%! ## feed's own flow is an output with D = 1 (analytic).
%! lin = vn_linearize (net, op, {"F1.flow"}, {"O1.flow", "F1.flow", "T1.volume"});
%! assert (lin.gain, [1; 1; 600], 1e-9);
%! assert (lin.D, [0; 1; 0]);
%! assert (isempty (lin.num));

%!test
%! ## The sparse form holds the same Jacobian as the dense one.
%! ls = vn_linearize (net, op, "F1.flow", "T1.level", "sparse", true);
%! assert (issparse (ls.A));
%! assert (full (ls.A), -1/600, 1e-12);
%! assert (ls.gain, 300, 1e-9);
%! ld = vn_linearize (net, op, "F1.flow", "T1.level", "dense", true);
%! assert (! issparse (ld.A));

%!error <no unit "F9"> vn_linearize (net, op, "F9.flow", "T1.level")
%!error <level is not an input> vn_linearize (net, op, "T1.level", "T1.level")
%!error <area is a parameter of tank "T1", not an output; its outputs: level, volume, head, spill> vn_linearize (net, op, "F1.flow", "T1.area")
%!error <not an output of tank> vn_linearize (net, op, "F1.flow", "T1.depth")
%!error <UNIT.VARIABLE> vn_linearize (net, op, "F1.flow", {3})
%!error <UNIT.VARIABLE> vn_linearize (net, op, "F1.flow", 3)
%!error <another network> vn_linearize (net, [3; 1], "F1.flow", "T1.level")
%!error <another network: its units differ> vn_linearize (net, setfield (op, "net", setfield (net, "units", net.units(1:2))), "F1.flow", "T1.level")
%!error <another network: its states> vn_linearize (net, setfield (op, "states", {"T9.volume"}), "F1.flow", "T1.level")
%!error <must be "open" or "closed"> vn_linearize (net, op, "F1.flow", "T1.level", "loop", "half")
%!error <given twice> vn_linearize (net, op, {"F1.flow", "F1.flow"}, "T1.level")
%!error <unknown option> vn_linearize (net, op, "F1.flow", "T1.level", "foo", 1)
%!error vn_linearize (net, op, "F1.flow")

%!test
%! ## open and closed loop: a P level controller on an outlet valve
%! ## (invented data); closed loop is faster, open loop is the plant alone
%! net = vn_network ("ol");
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 150, "opening", 0.5, ...
%!                 "characteristic", "linear");
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 1, ...
%!                      "action", "direct", "limits", [0 1]);
%! op = vn_steady (net);
%! lc = vn_linearize (net, op, "F1.flow", "T1.level");
%! lo = vn_linearize (net, op, "F1.flow", "T1.level", "loop", "open");
%! assert (numel (lc.states), 1);
%! assert (numel (lo.states), 1);
%! ## open loop: tau = 2 A h / F for a square-root outlet (Seborg et al., memory)
%! h = op.T1.level;
%! assert (lo.tau, 2 * 2 * h / 0.01, 1e-6 * lo.tau);
%! ## closed loop adds the controller's gain to the outlet's: faster
%! assert (lc.tau < lo.tau);
%! k = 150 / 3600 * sqrt (999.1 * 9.80665 / 1e5) * sqrt (h);  # dQ/dx
%! assert (1 / lc.tau, 1 / lo.tau + k / 2, 1e-6 / lc.tau);
