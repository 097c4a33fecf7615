## -*- texinfo -*-
## @deftypefn {} {@var{t} =} fit_tquantile (@var{p}, @var{df})
## Quantile of Student's t distribution with @var{df} degrees of freedom
## at probability @var{p} > 0.5, through the inverse incomplete beta
## function: for x = I^-1 (2 (1 - p); df/2, 1/2), t = sqrt (df (1/x - 1)).
## @var{df} = Inf gives the normal quantile.
## @end deftypefn

function t = fit_tquantile (p, df)
  if (isinf (df))
    t = sqrt (2) * erfinv (2 * p - 1);
  else
    x = betaincinv (2 * (1 - p), df / 2, 0.5);
    t = sqrt (df * (1 / x - 1));
  endif
endfunction
