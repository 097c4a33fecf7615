## -*- texinfo -*-
## @deftypefn {} {[@var{r}, @var{J}, @var{pred}] =} fit_residuals (@var{net}, @var{E}, @var{pq}, @var{p}, @var{so})
## Weighted residuals (measured - predicted) / sigma of all experiments
## stacked into one column, skipping NaN samples; with two outputs also
## their Jacobian with respect to log p (d r / d log p = -p dY/dp / sigma),
## and the predictions per experiment.
## @end deftypefn

function [r, J, pred] = fit_residuals (net, E, pq, p, so)
  np = numel (p);
  r = cell (numel (E), 1);
  Jc = cell (numel (E), 1);
  pred = cell (numel (E), 1);
  for k = 1:numel (E)
    e = E(k);
    if (nargout > 1)
      [Y, S] = fit_model (net, e, pq, p, so);
    else
      Y = fit_model (net, e, pq, p, so);
    endif
    pred{k} = Y;
    ok = ! isnan (e.y);
    W = repmat (e.w, rows (Y), 1);
    rk = (e.y - Y) .* W;
    r{k} = rk(ok);
    if (nargout > 1)
      Jk = zeros (nnz (ok), np);
      for i = 1:np
        Si = -S(:, :, i) .* W * p(i);
        Jk(:, i) = Si(ok);
      endfor
      Jc{k} = Jk;
    endif
  endfor
  r = vertcat (r{:});
  if (nargout > 1)
    J = vertcat (Jc{:});
  endif
endfunction
