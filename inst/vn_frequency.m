## -*- texinfo -*-
## @deftypefn  {} {@var{fr} =} vn_frequency (@var{lin})
## @deftypefnx {} {@var{fr} =} vn_frequency (@var{lin}, @var{w})
## @deftypefnx {} {@var{fr} =} vn_frequency (@dots{}, @qcode{"controller"}, @var{pid}, @qcode{"input"}, @var{in}, @qcode{"output"}, @var{out})
## Compute the frequency response of a linear model, and optionally the
## margins of one control loop closed around it.
##
## @var{lin} is a linear model as returned by @code{vn_linearize} (fields
## @code{A}, @code{B}, @code{C}, @code{D}, @code{inputs}, @code{outputs};
## @code{poles} is used when present).  @var{w} are frequencies in rad/s
## (positive, any order is kept).  Without @var{w} a logarithmic grid of
## 50 points per decade runs from two decades below the slowest to two
## decades above the fastest nonzero pole (and controller corner
## frequencies); with no nonzero pole it spans 1e-4 to 1 rad/s.
##
## The response @code{G(jw) = C (jwI - A)^-1 B + D} is found from the
## eigenvalues of A when its eigenvectors are well conditioned (all
## frequencies at once) and otherwise by solving one linear system per
## frequency (sparse A stays sparse).  Fields of @var{fr}:
##
## @table @code
## @item w
## frequencies (rad/s), a column.
## @item response
## complex G(jw), size nw x outputs x inputs.
## @item magnitude
## @code{abs (response)}, in output units per input unit.
## @item phase
## phase in degrees, unwrapped along w from the principal value at the
## first frequency.
## @item inputs, outputs
## the quantity names.
## @end table
##
## @strong{Loop.}  With @qcode{"controller"} @var{pid} (fields @code{Kc},
## @code{Ti} (Inf or absent: no integral action), @code{Td} (absent: 0) and
## optionally @code{form}, @qcode{"ideal"} (default)
## @code{C(s) = Kc (1 + 1/(Ti s) + Td s)} or @qcode{"series"}
## @code{C(s) = Kc (1 + 1/(Ti s)) (1 + Td s)}), the pair @var{in} to
## @var{out} (needed only when the model has several inputs or outputs)
## is closed.  The controller acts with @code{abs (Kc)} and the sign of
## the process gain at low frequency picks its action, so that the loop is
## negative feedback: @qcode{"reverse"} (output falls as the measurement
## rises) for a positive process gain, @qcode{"direct"} for a negative one.
## A field @code{action} of @var{pid} that disagrees gives a warning
## (id @qcode{"vesselnet:action"}).  Delay is not modelled.
## @code{fr.loop} holds:
##
## @table @code
## @item L, magnitude, phase
## open-loop response @code{sign * G(jw) C(jw)} on the grid, phase in
## degrees unwrapped.
## @item gain_margin, gain_margin_db
## gain margin @code{1/|L|} at the phase crossover, absolute and in dB;
## Inf when the phase never crosses -180 degrees on the grid.  With
## several crossovers the smallest margin is kept.
## @item phase_margin
## phase margin @code{180 + phase (L)} at the gain crossover (degrees,
## wrapped into -180..180); Inf when |L| never crosses 1 on the grid; the
## smallest over several crossovers.
## @item phase_crossover, gain_crossover
## phase and gain crossover frequencies (rad/s) of the reported margins,
## refined on the exact response; NaN when there is none.
## @item action, input, output, controller
## the controller action chosen, the pair and the settings used.
## @end table
##
## Margins are those of the linear model at one operating point: the model
## must be validated against the plant, and any tuning reviewed, before it
## reaches a live loop.
## @seealso{vn_linearize, vn_rga, vn_stepresponse}
## @end deftypefn

function fr = vn_frequency (lin, varargin)

  if (nargin < 1)
    print_usage ();
  endif
  check_model (lin);
  [A, B, C, D] = deal (lin.A, lin.B, lin.C, lin.D);
  [p, m] = size (D);
  inputs = names_of (lin, "inputs", "u", m);
  outputs = names_of (lin, "outputs", "y", p);

  w = [];
  if (numel (varargin) > 0 && ! ischar (varargin{1}))
    w = varargin{1};
    varargin(1) = [];
  endif
  [pid, in, out] = parse_options (varargin);
  if (! isempty (w) && (! isnumeric (w) || ! isreal (w) || ! isvector (w)
                        || ! all (isfinite (w)) || any (w <= 0)))
    error ("Octave:invalid-input-arg",
           "vn_frequency: W must be a vector of positive finite frequencies (rad/s)");
  endif

  if (isempty (w))
    w = default_grid (lin, pid);
  endif
  w = w(:);

  G = response (A, B, C, D, w);
  fr.w = w;
  fr.response = G;
  fr.magnitude = abs (G);
  fr.phase = unwrap (angle (G), pi, 1) * 180 / pi;
  fr.inputs = inputs;
  fr.outputs = outputs;

  if (! isempty (pid))
    j = pick (in, inputs, "input");
    i = pick (out, outputs, "output");
    fr.loop = loop_margins (A, B(:,j), C(i,:), D(i,j), w, G(:,i,j), pid);
    fr.loop.input = inputs{j};
    fr.loop.output = outputs{i};
  endif

endfunction

## The model must carry consistent A, B, C, D.
function check_model (lin)
  if (! isstruct (lin) || ! all (isfield (lin, {"A", "B", "C", "D"})))
    error ("Octave:invalid-input-arg",
           "vn_frequency: LIN must be a linear model struct with fields A, B, C, D");
  endif
  n = rows (lin.A);
  if (columns (lin.A) != n || rows (lin.B) != n || columns (lin.C) != n
      || ! isequal (size (lin.D), [rows(lin.C), columns(lin.B)]))
    error ("Octave:invalid-input-arg",
           "vn_frequency: sizes of LIN.A %s, B %s, C %s, D %s do not agree",
           mat2str (size (lin.A)), mat2str (size (lin.B)),
           mat2str (size (lin.C)), mat2str (size (lin.D)));
  endif
  if (! all (isfinite (nonzeros ([lin.A, lin.B; lin.C, lin.D]))))
    error ("Octave:invalid-input-arg",
           "vn_frequency: LIN.A, B, C, D must hold finite numbers");
  endif
endfunction

## Quantity names from the model, or generic ones.
function c = names_of (lin, field, stem, k)
  if (isfield (lin, field) && iscellstr (lin.(field)) && numel (lin.(field)) == k)
    c = lin.(field)(:).';
  else
    c = arrayfun (@(q) sprintf ("%s%d", stem, q), 1:k, "uniformoutput", false);
  endif
endfunction

function [pid, in, out] = parse_options (args)
  pid = [];
  in = "";
  out = "";
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "vn_frequency: options must come in name, value pairs");
  endif
  for k = 1:2:numel (args)
    if (! ischar (args{k}))
      error ("Octave:invalid-input-arg",
             "vn_frequency: option names must be strings");
    endif
    switch (lower (args{k}))
      case "controller"
        pid = check_pid (args{k+1});
      case "input"
        in = args{k+1};
      case "output"
        out = args{k+1};
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_frequency: unknown option \"%s\" (allowed: controller, input, output)",
               args{k});
    endswitch
  endfor
endfunction

## Controller settings: Kc nonzero, Ti > 0 or Inf, Td >= 0.
function pid = check_pid (pid)
  if (! isstruct (pid) || ! isfield (pid, "Kc"))
    error ("Octave:invalid-input-arg",
           "vn_frequency: CONTROLLER must be a struct with field Kc (and Ti, Td)");
  endif
  if (! isfield (pid, "Ti") || isempty (pid.Ti))
    pid.Ti = Inf;
  endif
  if (! isfield (pid, "Td") || isempty (pid.Td))
    pid.Td = 0;
  endif
  if (! isfield (pid, "form") || isempty (pid.form))
    pid.form = "ideal";
  endif
  ok = @(v) isnumeric (v) && isscalar (v) && isreal (v);
  if (! ok (pid.Kc) || ! isfinite (pid.Kc) || pid.Kc == 0)
    error ("Octave:invalid-input-arg",
           "vn_frequency: controller gain Kc must be a finite nonzero scalar, got %s",
           disp_value (pid.Kc));
  endif
  if (! ok (pid.Ti) || ! (pid.Ti > 0))
    error ("Octave:invalid-input-arg",
           "vn_frequency: controller reset time Ti must be > 0 s (Inf: no integral action), got %s",
           disp_value (pid.Ti));
  endif
  if (! ok (pid.Td) || ! isfinite (pid.Td) || pid.Td < 0)
    error ("Octave:invalid-input-arg",
           "vn_frequency: controller derivative time Td must be >= 0 s, got %s",
           disp_value (pid.Td));
  endif
  if (! ischar (pid.form) || ! any (strcmpi (pid.form, {"ideal", "series"})))
    error ("Octave:invalid-input-arg",
           "vn_frequency: controller form must be \"ideal\" or \"series\", got %s",
           disp_value (pid.form));
  endif
endfunction

function s = disp_value (v)
  if (ischar (v))
    s = ["\"" v "\""];
  elseif (isnumeric (v) && isscalar (v))
    s = num2str (v);
  else
    s = sprintf ("a %s of size %s", class (v), mat2str (size (v)));
  endif
endfunction

## Index of a named quantity; the only one when the name is omitted.
function k = pick (name, names, what)
  if (isempty (name))
    if (numel (names) != 1)
      error ("Octave:invalid-input-arg",
             "vn_frequency: the model has %d %ss (%s); give option \"%s\"",
             numel (names), what, strjoin (names, ", "), what);
    endif
    k = 1;
    return;
  endif
  k = find (strcmp (name, names));
  if (! ischar (name) || isempty (k))
    error ("Octave:invalid-input-arg",
           "vn_frequency: %s %s is not in the model (allowed: %s)",
           what, disp_value (name), strjoin (names, ", "));
  endif
endfunction

## Log grid two decades beyond the poles and controller corners.
function w = default_grid (lin, pid)
  if (isfield (lin, "poles") && numel (lin.poles) == rows (lin.A))
    poles = lin.poles;
  else
    poles = lin_modes (lin.A);
  endif
  f = abs (poles(:));
  if (! isempty (pid))
    f = [f; 1 / pid.Ti; 1 / pid.Td];
  endif
  f = f(isfinite (f) & f > 0);
  if (isempty (f))
    lo = -4;
    hi = 0;
  else
    lo = floor (log10 (min (f))) - 2;
    hi = ceil (log10 (max (f))) + 2;
  endif
  w = logspace (lo, hi, 50 * (hi - lo) + 1)';
endfunction

## G(jw) for all frequencies, nw x p x m.
function G = response (A, B, C, D, w)
  n = rows (A);
  [p, m] = size (D);
  nw = numel (w);
  G = zeros (nw, p, m);
  if (n == 0)
    G = repmat (reshape (full (D), [1 p m]), nw, 1, 1);
    return;
  endif
  if (! issparse (A) && n <= 500)
    [V, E] = eig (full (A));
    if (rcond (V) > 1e-8)
      lam = diag (E);
      CV = full (C) * V;
      VB = V \ full (B);
      R = 1 ./ (1i * w - lam.');
      for i = 1:p
        for j = 1:m
          G(:,i,j) = R * (CV(i,:).' .* VB(:,j)) + D(i,j);
        endfor
      endfor
      if (isreal (A) && isreal (B) && isreal (C))
        ## Residues of conjugate pairs cancel only to round-off at w = 0.
        G(w == 0,:,:) = real (G(w == 0,:,:));
      endif
      return;
    endif
  endif
  for k = 1:nw
    G(k,:,:) = reshape (at (A, B, C, D, 1i * w(k)), [1 p m]);
  endfor
endfunction

## C (sI - A)^-1 B + D at one complex s; Inf where sI - A is singular.
function g = at (A, B, C, D, s)
  n = rows (A);
  if (issparse (A))
    M = s * speye (n) - A;
  else
    M = s * eye (n) - A;
  endif
  [X, r] = linsolve_quiet (M, full (B));
  if (r < eps)
    g = Inf (size (D));
  else
    g = full (C) * X + D;
  endif
endfunction

function [X, r] = linsolve_quiet (M, B)
  warning ("off", "Octave:singular-matrix", "local");
  warning ("off", "Octave:nearly-singular-matrix", "local");
  if (issparse (M))
    r = 1 / condest (M);
  else
    r = rcond (M);
  endif
  X = M \ B;
endfunction

## Open loop with one controller, and its gain and phase margins.
function lp = loop_margins (A, b, c, d, w, g, pid)
  ctrl = @(s) controller_at (pid, s);
  ## The sign of G at a small real s is the sign of its low-frequency
  ## asymptote, also for integrating processes.
  s0 = 1e-3 * min ([w; abs(nonzeros (lin_modes (A)))]);
  g0 = real (at (A, b, c, d, s0));
  if (g0 == 0 || ! isfinite (g0))
    error ("vesselnet:zero-gain",
           "vn_frequency: the process gain of this pair is %g at low frequency; no controller action can be chosen",
           g0);
  endif
  sgn = sign (g0);
  if (sgn > 0)
    action = "reverse";
  else
    action = "direct";
  endif
  if (isfield (pid, "action") && ischar (pid.action)
      && ! strcmpi (pid.action, action))
    warning ("vesselnet:action",
             ["vn_frequency: controller action \"%s\" would give positive ", ...
              "feedback with this process gain (%g); margins are for \"%s\" action"],
             pid.action, g0, action);
  endif
  L = sgn * g .* ctrl (1i * w);
  Lat = @(x) sgn * at (A, b, c, d, 1i * x) * ctrl (1i * x);

  mag = abs (L);
  ph = unwrap (angle (L)) * 180 / pi;
  lw = log10 (w);

  ## Gain crossovers: log |L| changes sign.
  pm = Inf;
  wgc = NaN;
  lm = log (mag);
  for k = find (lm(1:end-1) .* lm(2:end) <= 0 & lm(1:end-1) != lm(2:end)).'
    x = refine (@(u) log (abs (Lat (10 ^ u))), lw(k), lw(k+1));
    wc = 10 ^ x;
    margin = mod (angle (Lat (wc)) * 180 / pi + 360, 360) - 180;
    if (margin < pm)
      pm = margin;
      wgc = wc;
    endif
  endfor

  ## Phase crossovers: the unwrapped phase passes -180 + 360 n.
  gm = Inf;
  wpc = NaN;
  q = floor ((ph + 180) / 360);
  for k = find (diff (q) != 0).'
    x = refine (@(u) imag (Lat (10 ^ u)) / abs (Lat (10 ^ u)), lw(k), lw(k+1));
    wx = 10 ^ x;
    margin = 1 / abs (Lat (wx));
    if (real (Lat (wx)) < 0 && margin < gm)
      gm = margin;
      wpc = wx;
    endif
  endfor

  lp.controller = pid;
  lp.action = action;
  lp.L = L;
  lp.magnitude = mag;
  lp.phase = ph;
  lp.gain_margin = gm;
  lp.gain_margin_db = 20 * log10 (gm);
  lp.phase_margin = pm;
  lp.gain_crossover = wgc;
  lp.phase_crossover = wpc;
endfunction

## Controller response at s, with the gain's magnitude.
function cs = controller_at (pid, s)
  integ = 0;
  if (isfinite (pid.Ti))
    integ = 1 ./ (pid.Ti * s);
  endif
  if (strcmpi (pid.form, "series"))
    cs = abs (pid.Kc) * (1 + integ) .* (1 + pid.Td * s);
  else
    cs = abs (pid.Kc) * (1 + integ + pid.Td * s);
  endif
endfunction

## Root of f in [a, b] with a sign change, by the Illinois false position.
function x = refine (f, a, b)
  fa = f (a);
  fb = f (b);
  if (fa == 0)
    x = a;
    return;
  elseif (fb == 0)
    x = b;
    return;
  endif
  x = a;
  side = 0;
  for it = 1:60
    x = (a * fb - b * fa) / (fb - fa);
    fx = f (x);
    if (fx == 0 || abs (b - a) < 1e-13)
      break;
    endif
    if (sign (fx) == sign (fb))
      b = x;
      fb = fx;
      if (side == -1)
        fa /= 2;
      endif
      side = -1;
    else
      a = x;
      fa = fx;
      if (side == 1)
        fb /= 2;
      endif
      side = 1;
    endif
  endfor
endfunction

%!demo
%! ## Invented: a buffer tank of a dairy's whey line, level h (m) against
%! ## the feed flow (m3/s), area 3 m2, outlet resistance 400 s/m2, with a
%! ## level sensor lag of 20 s.  PI control, Kc 0.02 m3/s per m, Ti 600 s.
%! lin.A = [-1/1200, 0; 1/20, -1/20];
%! lin.B = [1/3; 0];
%! lin.C = [0, 1];
%! lin.D = 0;
%! lin.inputs = {"F1.flow"};
%! lin.outputs = {"T1.level"};
%! fr = vn_frequency (lin, "controller", struct ("Kc", 0.02, "Ti", 600));
%! printf ("gain %g m per m3/s at %g rad/s\n", fr.magnitude(1), fr.w(1));
%! printf ("phase margin %.1f deg at %.4g rad/s, gain margin %.2f (%s action)\n",
%!         fr.loop.phase_margin, fr.loop.gain_crossover, fr.loop.gain_margin, fr.loop.action);

%!test
%! ## First order K/(tau s + 1) at w = 1/tau: K/sqrt(2), -45 deg (analytic).
%! lin = struct ("A", -0.1, "B", 0.1, "C", 2, "D", 0);
%! fr = vn_frequency (lin, [0.01; 0.1; 1]);
%! assert (fr.magnitude(2), 2 / sqrt (2), 1e-12);
%! assert (fr.phase(2), -45, 1e-10);
%! assert (fr.inputs, {"u1"});

%!test
%! ## Integrator 1/s with ideal PI Kc 1, Ti 1: |L| = 1 where w^4 = w^2 + 1,
%! ## so wc^2 = (1 + sqrt 5)/2 and the phase margin is atan (wc) (analytic).
%! lin = struct ("A", 0, "B", 1, "C", 1, "D", 0, "inputs", {{"F1.flow"}},
%!               "outputs", {{"T1.level"}});
%! fr = vn_frequency (lin, "controller", struct ("Kc", 1, "Ti", 1));
%! wc = sqrt ((1 + sqrt (5)) / 2);
%! assert (fr.loop.gain_crossover, wc, 1e-9);
%! assert (fr.loop.phase_margin, atand (wc), 1e-7);
%! assert (fr.loop.gain_margin, Inf);
%! assert (isnan (fr.loop.phase_crossover));
%! assert (fr.loop.action, "reverse");

%!test
%! ## 1/(s + 1)^3 with P control Kc 2 (negative gain, so direct action):
%! ## phase -180 at w = sqrt (3), |G| = 1/8, gain margin 4 (analytic).
%! A = [-1 1 0; 0 -1 1; 0 0 -1];
%! lin = struct ("A", A, "B", [0; 0; 1], "C", [-1 0 0], "D", 0);
%! fr = vn_frequency (lin, "controller", struct ("Kc", -2));
%! assert (fr.loop.phase_crossover, sqrt (3), 1e-9);
%! assert (fr.loop.gain_margin, 4, 1e-9);
%! assert (fr.loop.gain_margin_db, 20 * log10 (4), 1e-8);
%! assert (fr.loop.action, "direct");

%!warning <positive feedback>
%! lin = struct ("A", -1, "B", 1, "C", 1, "D", 0);
%! vn_frequency (lin, "controller", struct ("Kc", 1, "action", "direct"));

%!error <sizes of LIN.A> vn_frequency (struct ("A", 1, "B", [1 1], "C", 1, "D", 0))
%!error <positive finite> vn_frequency (struct ("A", -1, "B", 1, "C", 1, "D", 0), [-1 1])
%!error <Ti must be > 0> vn_frequency (struct ("A", -1, "B", 1, "C", 1, "D", 0), "controller", struct ("Kc", 1, "Ti", 0))
%!error <give option "input"> vn_frequency (struct ("A", -1, "B", [1 1], "C", 1, "D", [0 0]), "controller", struct ("Kc", 1))
