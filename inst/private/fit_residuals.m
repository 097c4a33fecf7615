## -*- texinfo -*-
## @deftypefn {} {[@var{r}, @var{J}, @var{pred}] =} fit_residuals (@var{net}, @var{E}, @var{P}, @var{th}, @var{so}, @var{jac})
## Weighted residuals (measured - predicted) / sigma of all experiments
## stacked into one column, skipping NaN (and censored) samples; with two
## outputs also their Jacobian with respect to the fit's parameters
## @var{th} (logarithms or values, as @code{P(i).space} says), and the
## predictions per experiment.  The sensor parameters of @var{P} (from
## fit_params) turn the model's output into what the sensor reads:
## measured = scale * model + offset.  @var{jac} false skips the Jacobian.
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
    if (want && ! isempty (iu))
      [Y, S] = fit_model (net, e, pq, p(iu), so);
    else
      Y = fit_model (net, e, pq, p(iu), so);
    endif
    [sc, off, isc, ioff] = sensors (P, p, e.yname);
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
      for j = 1:numel (e.yname)
        rows_j = false (size (ok));
        rows_j(:, j) = true;
        sel = rows_j(ok);
        if (ioff(j) > 0)
          Jk(sel, ioff(j)) = - W(ok(:, j), j);
        endif
        if (isc(j) > 0)
          Jk(sel, isc(j)) = - Y(ok(:, j), j) .* W(ok(:, j), j) * dp(isc(j));
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
