## -*- texinfo -*-
## @deftypefn {} {@var{r} =} ifelse (@var{c}, @var{a}, @var{b})
## @var{a} when @var{c} holds, else @var{b}: a choice inside an expression.
## @end deftypefn

function r = ifelse (c, a, b)
  if (c)
    r = a;
  else
    r = b;
  endif
endfunction

%!assert (ifelse (true, "yes", "no"), "yes")
%!assert (ifelse (false, 1, 2), 2)
