## -*- texinfo -*-
## @deftypefn {} {[@var{r}, @var{J}, @var{pred}] =} fit_residuals (@var{net}, @var{E}, @var{P}, @var{th}, @var{so}, @var{jac})
## Weighted residuals (measured - predicted) / sigma of all experiments
## stacked into one column, skipping NaN (and censored) samples; with two
## outputs also their Jacobian with respect to the fit's parameters
## @var{th} (logarithms or values, as @code{P(i).space} says), and the
## predictions per experiment.  The sensor parameters of @var{P} (from
## fit_params) turn the model's output into what the sensor reads:
## measured = scale * model + offset.  A test that starts from measured
## levels starts a tank whose level sensor is fitted at (reading - offset)
## / scale, with the sensitivities that follow.  @var{jac} false skips the
## Jacobian.
## @end deftypefn

function [r, J, pred] = fit_residuals (net, E, P, th, so, jac = true)
  want = nargout > 1 && jac;
  [p, dp] = fit_values (P, th);
  np = numel (p);
  r = cell (numel (E), 1);
  Jc = cell (numel (E), 1);
  pred = cell (numel (E), 1);
  isunit = strcmp ({P.type}, "unit");
  exper = [P.exper];
  for k = 1:numel (E)
    e = E(k);
    iu = find (isunit & (exper == 0 | exper == k));
    pq = {P(iu).q};
    ## a fitted starting level replaces the measured one
    for i = iu
      if (strcmp (P(i).q.var, "level") && ! isempty (e.levels))
        e.levels(e.levels(:, 1) == P(i).q.unit, :) = [];
      endif
    endfor
    [sc, off, isc, ioff] = sensors (P, p, e.yname);
    ## a measured start read through a fitted sensor: the tank starts at
    ## (reading - offset) / scale, a level that moves with the sensor, so
    ## it enters the run as a hidden starting-level parameter
    hid = zeros (0, 3);                 # [output, d level / d offset, d level / d th scale]
    pv = p(iu);
    m = 1;
    while (m <= rows (e.levels))
      un = net.units(e.levels(m, 1)).name;
      j = find (strcmp (e.yname, [un ".level"]), 1);
      if (! isempty (j) && (isc(j) > 0 || ioff(j) > 0))
        l0 = (e.levels(m, 2) - off(j)) / sc(j);
        pq{end+1} = vn_quantity (net, [un ".level"], "param", "vn_fit");
        pv(end+1) = l0;
        hid(end+1, :) = [j, -1 / sc(j), -l0 * (isc(j) > 0)];
        e.levels(m, :) = [];
      else
        m += 1;
      endif
    endwhile
    if (want && ! isempty (pq))
      [Y, S] = fit_model (net, e, pq, pv, so);
    else
      Y = fit_model (net, e, pq, pv, so);
    endif
    Ym = Y .* sc + off;
    pred{k} = Ym;
    ok = ! isnan (e.y);
    W = repmat (e.w, rows (Y), 1);
    rk = (e.y - Ym) .* W;
    r{k} = rk(ok);
    if (want)
      Jk = zeros (nnz (ok), np);
      for m = 1:numel (iu)
        Si = - S(:, :, m) .* sc .* W * dp(iu(m));
        Jk(:, iu(m)) = Si(ok);
      endfor
      for h = 1:rows (hid)
        Sh = - S(:, :, numel (iu) + h) .* sc .* W;
        j = hid(h, 1);
        if (ioff(j) > 0)
          Jk(:, ioff(j)) += Sh(ok) * hid(h, 2);
        endif
        if (isc(j) > 0)
          Jk(:, isc(j)) += Sh(ok) * hid(h, 3);
        endif
      endfor
      for j = 1:numel (e.yname)
        rows_j = false (size (ok));
        rows_j(:, j) = true;
        sel = rows_j(ok);
        if (ioff(j) > 0)
          Jk(sel, ioff(j)) += - W(ok(:, j), j);
        endif
        if (isc(j) > 0)
          Jk(sel, isc(j)) += - Y(ok(:, j), j) .* W(ok(:, j), j) * dp(isc(j));
        endif
      endfor
      Jc{k} = Jk;
    endif
  endfor
  r = vertcat (r{:});
  J = [];
  if (want)
    J = vertcat (Jc{:});
  endif
endfunction

## Scale and offset of the sensor of each output (1 and 0 when not
## fitted) and which parameter holds them (0 if none).
function [sc, off, isc, ioff] = sensors (P, p, ynames)
  ny = numel (ynames);
  sc = ones (1, ny);
  off = zeros (1, ny);
  isc = zeros (1, ny);
  ioff = zeros (1, ny);
  for i = 1:numel (P)
    if (! strcmp (P(i).type, "unit"))
      j = find (strcmp (ynames, P(i).quantity), 1);
      if (! isempty (j))
        if (strcmp (P(i).type, "scale"))
          isc(j) = i;
          sc(j) = p(i);
        else
          ioff(j) = i;
          off(j) = p(i);
        endif
      endif
    endif
  endfor
endfunction

## The Jacobian against central differences of the residuals, relative
## 1e-4, for a fit with a sensor (offset and scale on T2.level) and a
## test that starts from measured levels (so the starting level of T2
## moves with the sensor), and for a per-test starting level.  Invented
## data from the model itself with a seeded disturbance.
%!test
%! net = vn_network ("jacobian check");
%! net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%! net = vn_tank (net, "T2", "area", 1.0, "level", 0.8);
%! net = vn_feed (net, "F1", "T1", "flow", 0.004);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.003);
%! net = vn_orifice (net, "O2", "T2", "", "coeff", 0.0025);
%! t = (0:20:600).';
%! u = 0.004 + 0.002 * (t >= 100);
%! res = vn_simulate (net, t, vn_signal ("F1.flow", "step", 100, 0.004, 0.006));
%! randn ("state", 1);
%! y = [res.T1.level, 1.02 * res.T2.level + 0.03] + 0.01 * randn (numel (t), 2);
%! ex = [vn_experiment(t, "F1.flow", u, "T1.level", y(:, 1), "T2.level",
%!                     y(:, 2), "start", "measured"),
%!       vn_experiment(t, "F1.flow", u, "T2.level", y(:, 2), "start", "declared")];
%! params = {"O1.coeff", "T2.area", "T2.level:offset", "T2.level:scale", "T1.level@2"};
%! opt = fit_options ({}, params);
%! P = fit_params (net, params, ex, opt);
%! E = fit_classify (net, ex, {P(strcmp ({P.type}, "unit")).q});
%! so = struct ("reltol", 1e-10, "abstol", 1e-12, "solver", 0,
%!              "maxsteps", 100000, "maxstep", 0);
%! th = fit_values (P, [0.0031, 0.9, 0.02, 1.01, 1.1], "inverse");
%! [r, J] = fit_residuals (net, E, P, th, so);
%! Jfd = zeros (size (J));
%! for i = 1:numel (th)
%!   h = 1e-6 * max (abs (th(i)), 1);
%!   tp = th; tp(i) += h;
%!   tm = th; tm(i) -= h;
%!   Jfd(:, i) = (fit_residuals (net, E, P, tp, so)
%!                - fit_residuals (net, E, P, tm, so)) / (2 * h);
%! endfor
%! err = max (abs (J - Jfd)) ./ max (abs (Jfd));
%! assert (all (err < 1e-4), mat2str (err, 3));
%! assert (all (max (abs (Jfd)) > 0.1));
%! ## the measured start through the sensor: the first T2 reading is
%! ## predicted exactly
%! [~, ~, pred] = fit_residuals (net, E, P, th, so, false);
%! assert (pred{1}(1, 2), y(1, 2), 1e-9);
