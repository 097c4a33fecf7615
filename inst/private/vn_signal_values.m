## -*- texinfo -*-
## @deftypefn {} {@var{y} =} vn_signal_values (@var{t}, @var{v}, @var{hold}, @var{tq})
## Values of a signal table at times @var{tq}, right-continuous at jumps
## (equal consecutive times), as the core applies them.
## @end deftypefn

function y = vn_signal_values (t, v, hold, tq)
  t = t(:);
  v = v(:);
  tq = tq(:);
  n = numel (t);
  k = lookup (t, tq);          # last k with t(k) <= tq; 0 before the start
  y = zeros (size (tq));
  y(k == 0) = v(1);
  y(k == n) = v(n);
  in = k > 0 & k < n;
  ki = k(in);
  if (hold)
    y(in) = v(ki);
  else
    w = (tq(in) - t(ki)) ./ (t(ki+1) - t(ki));
    y(in) = v(ki) + w .* (v(ki+1) - v(ki));
  endif
endfunction
