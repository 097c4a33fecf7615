## -*- texinfo -*-
## @deftypefn {} {[@var{Y}, @var{S}] =} fit_model (@var{net}, @var{e}, @var{pq}, @var{p}, @var{so})
## Predict the measured outputs of one experiment @var{e} (from
## fit_classify) with parameters @var{p}; with two outputs also their
## sensitivities @var{S} (times x outputs x parameters, d output / d p)
## from the core's forward sensitivities.  The initial-state
## sensitivities follow the start: at a steady state dx0/dp = -A \ B_p on
## the states p reaches (lin_reach, lin_steady_part);
## from declared levels by central differences of the (algebraic)
## initial state.
## @end deftypefn

function [Y, S] = fit_model (net, e, pq, p, so)
  want = nargout > 1;
  ## the run starts at the first input values
  for j = 1:rows (e.u0)
    net.units(e.u0{j, 1}).par.(e.u0{j, 2}) = e.u0{j, 3};
  endfor
  for j = 1:rows (e.levels)
    net.units(e.levels(j, 1)).par.level = e.levels(j, 2);
  endfor
  pin = int32 (cellfun (@(q) q.index, pq));
  np = numel (pq);
  ## The network of this experiment is the same at every trial: packed
  ## once (vn_compile's cache); the trial's parameters go straight into
  ## their slots, as packing the network with them set would put them,
  ## except where the experiment's start sets that value itself.
  pk = vn_pack (net);
  for i = 1:np
    q = pq{i};
    mine = false;
    for j = 1:rows (e.u0)
      mine |= e.u0{j, 1} == q.unit && strcmp (e.u0{j, 2}, q.var);
    endfor
    for j = 1:rows (e.levels)
      mine |= e.levels(j, 1) == q.unit && strcmp (q.var, "level");
    endfor
    if (! mine)
      pk.par(q.slot + 1, q.unit) = p(i);
      pk.given(q.slot + 1, q.unit) = true;
    endif
  endfor
  if (strcmp (e.start, "steady"))
    ## the core's Newton directly: vn_steady's result struct is not needed
    so_ss = struct ("maxiter", 60, "tol", 1e-10, "solver", 0, "simulate", true);
    x0 = __vn_steady__ (pk, [], zeros (1, 0, "int32"), zeros (1, 0, "int32"),
                        zeros (1, 0), so_ss);
    if (want)
      [A, B] = __vn_linearize__ (pk, x0, pin, e.yidx, false);
      ## only the states each parameter reaches move (an idle catch tank
      ## does not); a singular A is split, never solved as it stands
      reach = lin_reach (A, B);
      sx0 = zeros (size (B));
      for i = 1:np
        s = find (reach(:,i));
        sx0(s,i) = lin_steady_part (A(s,s), B(s,i));
      endfor
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
  ## only the measured outputs are recorded
  o = struct ("reltol", so.reltol, "abstol", so.abstol, "solver", so.solver,
              "maxsteps", so.maxsteps, "maxstep", so.maxstep,
              "record", e.yidx);
  if (want)
    o.sens = pin;
    o.sens_x0 = sx0;
    o.sens_yout = e.yidx;
    [~, Yall, ~, ~, ~, S] = __vn_simulate__ (pk, e.sig, e.t, x0, o);
    S = reshape (S, numel (e.t), numel (e.yidx), np);
  else
    [~, Yall] = __vn_simulate__ (pk, e.sig, e.t, x0, o);
  endif
  Y = Yall;
endfunction

## Initial state from declared levels with one parameter changed.
function x = initial (pk, q, v, pin, yidx)
  pk.par(q.slot + 1, q.unit) = v;
  pk.given(q.slot + 1, q.unit) = true;
  [~, ~, ~, ~, ~, x] = __vn_linearize__ (pk, [], pin, yidx, false);
endfunction
