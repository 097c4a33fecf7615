## -*- texinfo -*-
## @deftypefn  {} {[@var{p}, @var{dp}] =} fit_values (@var{P}, @var{th})
## @deftypefnx {} {@var{th} =} fit_values (@var{P}, @var{p}, "inverse")
## Parameter values @var{p} from the fit's own coordinates @var{th}
## (logarithms where @code{P(i).space} is "log", the values themselves
## where it is "linear") and the derivative d p / d th; or the inverse.
## @end deftypefn

function [p, dp] = fit_values (P, th, inverse)
  lg = strcmp ({P.space}, "log").';
  th = th(:);
  p = th;
  if (nargin > 2)
    p(lg) = log (th(lg));
    dp = [];
  else
    p(lg) = exp (th(lg));
    dp = ones (size (th));
    dp(lg) = p(lg);
  endif
endfunction
