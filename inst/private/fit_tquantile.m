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

## Student's t table, two-sided 95 % (Fisher and Yates, Statistical
## Tables, memory): t(0.975, 1) = 12.706, t(0.975, 10) = 2.2281,
## t(0.975, 30) = 2.0423; the normal limit 1.95996.
%!assert (fit_tquantile (0.975, 10), 2.2281, 5e-5)
%!assert (fit_tquantile (0.975, 1), 12.706, 5e-4)
%!assert (fit_tquantile (0.975, 30), 2.0423, 5e-5)
%!assert (fit_tquantile (0.975, Inf), 1.95996, 5e-6)
%!assert (fit_tquantile (0.975, 1e6), 1.95996, 5e-5)
