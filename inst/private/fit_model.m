## -*- texinfo -*-
## @deftypefn {} {[@var{Y}, @var{S}] =} fit_model (@var{net}, @var{e}, @var{pq}, @var{p}, @var{so})
## Predict the measured outputs of one experiment @var{e} (from
## fit_classify) with parameters @var{p}; with two outputs also their
## sensitivities @var{S} (times x outputs x parameters, d output / d p)
## from the core's forward sensitivities.  The initial-state
## sensitivities follow the start: at a steady state dx0/dp = -A \ B_p;
## from declared levels by central differences of the (algebraic)
## initial state.
## @end deftypefn

function [Y, S] = fit_model (net, e, pq, p, so)
  want = nargout > 1;
  net = fit_apply (net, pq, p);
  ## the run starts at the first input values
  for j = 1:rows (e.u0)
    net.units(e.u0{j, 1}).par.(e.u0{j, 2}) = e.u0{j, 3};
  endfor
  for j = 1:rows (e.levels)
    net.units(e.levels(j, 1)).par.level = e.levels(j, 2);
  endfor
  pin = int32 (cellfun (@(q) q.index, pq));
  np = numel (pq);
  pk = vn_pack (net);
  if (strcmp (e.start, "steady"))
    ## the core's Newton directly: vn_steady's result struct is not needed
    so_ss = struct ("maxiter", 60, "tol", 1e-10, "solver", 0, "simulate", true);
    x0 = __vn_steady__ (pk, [], zeros (1, 0, "int32"), zeros (1, 0, "int32"),
                        zeros (1, 0), so_ss);
    if (want)
      [A, B] = __vn_linearize__ (pk, x0, pin, e.yidx, false);
      sx0 = - (full (A) \ full (B));
    endif
  else
    [~, ~, ~, ~, ~, x0] = __vn_linearize__ (pk, [], pin, e.yidx, false);
    if (want)
      sx0 = zeros (numel (x0), np);
      for i = 1:np
        ## a starting level may be zero: a forward difference there
        h = 1e-6 * max (abs (p(i)), 1e-3);
        lo = p(i) - h;
        if (lo < 0 && p(i) >= 0)
          lo = p(i);
        endif
        sx0(:, i) = (initial (pk, pq{i}, p(i) + h, pin, e.yidx)
                     - initial (pk, pq{i}, lo, pin, e.yidx)) / (p(i) + h - lo);
      endfor
    endif
  endif
  sig = vn_pack_signals (net, e.u, "vn_fit");
  ## only the measured outputs are recorded
  o = struct ("reltol", so.reltol, "abstol", so.abstol, "solver", so.solver,
              "maxsteps", so.maxsteps, "maxstep", so.maxstep,
              "record", e.yidx);
  if (want)
    o.sens = pin;
    o.sens_x0 = sx0;
    o.sens_yout = e.yidx;
    [~, Yall, ~, ~, ~, S] = __vn_simulate__ (pk, sig, e.t, x0, o);
    S = reshape (S, numel (e.t), numel (e.yidx), np);
  else
    [~, Yall] = __vn_simulate__ (pk, sig, e.t, x0, o);
  endif
  Y = Yall;
endfunction

## Initial state from declared levels with one parameter changed.
function x = initial (pk, q, v, pin, yidx)
  pk.par(q.slot + 1, q.unit) = v;
  pk.given(q.slot + 1, q.unit) = true;
  [~, ~, ~, ~, ~, x] = __vn_linearize__ (pk, [], pin, yidx, false);
endfunction
