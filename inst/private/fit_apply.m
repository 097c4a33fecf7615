## -*- texinfo -*-
## @deftypefn {} {@var{net} =} fit_apply (@var{net}, @var{pq}, @var{p})
## Write parameter values @var{p} into the units named by @var{pq}.
## @end deftypefn

function net = fit_apply (net, pq, p)
  for i = 1:numel (pq)
    net.units(pq{i}.unit).par.(pq{i}.var) = p(i);
  endfor
endfunction
