## -*- texinfo -*-
## @deftypefn {} {[@var{p}, @var{cost}] =} fopdt_seed (@var{type}, @var{cand}, @var{ev}, @var{t}, @var{y})
## Pick the best starting point among candidate time constants and dead
## times (rows of @var{cand}, positive).  The response is linear in the gain
## and the output baseline, so for each candidate those two are solved by
## linear least squares and only the candidate rows are searched.  Returns
## @var{p} = [gain; y0; log of the candidate row].
## @end deftypefn

function [p, cost] = fopdt_seed (type, cand, ev, t, y)

  cost = Inf;
  p = [];
  for i = 1:rows (cand)
    g = fopdt_unitresp (type, cand(i,:), ev, t);
    A = [g, ones(numel (t), 1)];
    if (rank (A) < 2)
      continue;
    endif
    c = A \ y;
    e = y - A * c;
    ci = e' * e;
    if (ci < cost)
      cost = ci;
      p = [c; log(cand(i,:)).'];
    endif
  endfor

endfunction
