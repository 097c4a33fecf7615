## -*- texinfo -*-
## @deftypefn {} {@var{E} =} fit_classify (@var{net}, @var{ex}, @var{pq}, @var{fn})
## Resolve the quantities of each experiment against the network for
## vn_fit: inputs (input parameters of their unit) become signals, the
## rest must be outputs of their unit.  @var{pq} are the fitted
## parameters (from vn_quantity); fitting an input that a test drives is
## refused.  Returns one struct per experiment.  Inputs get their
## intersample rule (fit_hold) and their gaps filled; censored readings
## of outputs are NaN in @code{y} (no part in the fit) and kept in
## @code{ymeas} with the mask @code{cens}.  @code{inputs} and
## @code{readings} say, per quantity, what was decided and counted.
## The input signals are packed once for the core (@code{sig},
## @code{vn_pack_signals}, under the command name @var{fn}, default
## @qcode{"vn_fit"}); @code{clips} holds those clipped to their travel
## (empty when none).
## @end deftypefn

function E = fit_classify (net, ex, pq, fn = "vn_fit")
  s = vn_schema ();
  E = struct ("t", {}, "name", {}, "u", {}, "u0", {}, "yname", {},
              "yidx", {}, "y", {}, "ymeas", {}, "cens", {}, "w", {},
              "start", {}, "levels", {}, "inputs", {}, "readings", {},
              "sig", {}, "clips", {});
  for k = 1:numel (ex)
    x = ex(k);
    who = sprintf ("vn_fit: experiment %d", k);
    if (! isempty (x.name))
      who = sprintf ("%s (\"%s\")", who, x.name);
    endif
    u = struct ("quantity", {}, "t", {}, "v", {}, "hold", {}, "kind", {});
    u0 = {};
    label = x.name;
    if (isempty (label))
      label = sprintf ("test %d", k);
    endif
    hold = "auto";
    if (isfield (x, "hold"))
      hold = x.hold;
    endif
    cens = false (size (x.data));
    if (isfield (x, "censored") && isequal (size (x.censored), size (x.data)))
      cens = x.censored;
    endif
    inputs = struct ("experiment", {}, "quantity", {}, "rule", {}, "how", {},
                     "filled", {});
    yname = {};
    yidx = [];
    ycol = [];
    for j = 1:numel (x.names)
      name = x.names{j};
      q = fit_quantity (net, s, name, who);
      col = x.data(:, j);
      if (q.isinput)
        if (any (cens(:, j)))
          error ("Octave:invalid-input-arg",
                 "%s: input \"%s\" has %d reading(s) at or past its \"range\"; an input must be known at every time, so only measured outputs may be censored",
                 who, name, nnz (cens(:, j)));
        endif
        for i = 1:numel (pq)
          if (strcmp (pq{i}.name, name))
            error ("Octave:invalid-input-arg",
                   "%s: \"%s\" drives the test, so it cannot also be fitted",
                   who, name);
          endif
        endfor
        [held, how, col, nfill] = fit_hold (x.t, col, hold);
        [tt, vv] = fit_breakpoints (x.t, col, held);
        u(end+1) = struct ("quantity", name, "t", tt, "v", vv,
                           "hold", held, "kind", "table");
        u0(end+1, :) = {q.unit, q.var, col(1)};
        rule = "linear";
        if (held)
          rule = "held";
        endif
        inputs(end+1) = struct ("experiment", label, "quantity", name,
                                "rule", rule, "how", how, "filled", nfill);
      else
        yname{end+1} = name;
        yidx(end+1) = q.index;
        ycol(end+1) = j;
      endif
    endfor
    ny = numel (yname);
    if (ny == 0)
      error ("Octave:invalid-input-arg",
             "%s has no measured output; its quantities %s are all inputs",
             who, strjoin (x.names, ", "));
    endif
    w = ones (1, ny);
    if (! isempty (x.sigma))
      w = expand (x.sigma, ny, "sigma", who);
      w = 1 ./ w;
    elseif (! isempty (x.weights))
      w = sqrt (expand (x.weights, ny, "weights", who));
    endif
    ymeas = x.data(:, ycol);
    yc = cens(:, ycol);
    y = ymeas;
    y(yc) = NaN;
    levels = zeros (0, 2);
    if (strcmp (x.start, "measured"))
      for j = 1:ny
        dot = find (yname{j} == ".", 1);
        un = yname{j}(1:dot-1);
        ui = net.index.(un);
        v = y(1, j);
        if (strcmp (yname{j}(dot+1:end), "level")
            && strcmp (net.units(ui).kind, "tank") && ! isnan (v))
          levels(end+1, :) = [ui, v];
        endif
      endfor
    endif
    readings = struct ("experiment", repmat ({label}, 1, ny),
                       "quantity", yname, "used", num2cell (sum (! isnan (y), 1)),
                       "censored", num2cell (sum (yc, 1)),
                       "missing", num2cell (sum (isnan (ymeas), 1)));
    ## the signals do not depend on the parameters fitted: packed once
    sig = vn_pack_signals (net, u, fn);
    clips = [];
    if (! isempty (sig))
      clips = sig.clips;
    endif
    E(k) = struct ("t", x.t, "name", x.name, "u", u, "u0", {u0},
                   "yname", {yname}, "yidx", int32 (yidx), "y", y,
                   "ymeas", ymeas, "cens", yc, "w", w, "start", x.start,
                   "levels", levels, "inputs", inputs, "readings", readings,
                   "sig", sig, "clips", clips);
  endfor
endfunction

## Role of a quantity: an input parameter of its unit, else an output.
function q = fit_quantity (net, s, name, who)
  dot = find (name == ".", 1);
  un = name(1:dot-1);
  var = name(dot+1:end);
  if (! isfield (net.index, un))
    error ("Octave:invalid-input-arg",
           "%s: quantity \"%s\": the network has no unit \"%s\"", who, name, un);
  endif
  ui = net.index.(un);
  k = s.(net.units(ui).kind);
  ## a declared species is carried in the core's slot c<k>
  ks = find (strcmp (net.options.species, var), 1);
  if (! isempty (ks))
    var = sprintf ("c%d", ks);
  endif
  slot = find (strcmp (k.params, var), 1);
  if (! isempty (slot) && k.isinput(slot))
    q = vn_quantity (net, name, "input", who);
    q.isinput = true;
  elseif (any (strcmp (k.outputs, var)))
    q = vn_quantity (net, name, "output", who);
    q.isinput = false;
  else
    error ("Octave:invalid-input-arg",
           "%s: quantity \"%s\" is neither an input nor an output of %s \"%s\"; inputs: %s; outputs: %s",
           who, name, net.units(ui).kind, un,
           strjoin (k.params(k.isinput), ", "), strjoin (k.outputs, ", "));
  endif
endfunction

function v = expand (v, ny, what, who)
  if (isscalar (v))
    v = repmat (v, 1, ny);
  elseif (numel (v) != ny)
    error ("Octave:invalid-input-arg",
           "%s: \"%s\" has %d value(s) but the test has %d measured output(s)",
           who, what, numel (v), ny);
  endif
endfunction
