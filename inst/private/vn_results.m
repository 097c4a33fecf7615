## -*- texinfo -*-
## @deftypefn  {} {@var{res} =} vn_results (@var{net}, @var{t}, @var{X}, @var{Y}, @var{states}, @var{u})
## @deftypefnx {} {@var{res} =} vn_results (@dots{}, @var{tmpl}, @var{sig})
## Assemble a result struct: one field per unit with one column per output
## and per input, units of measure in res.units (doc/internals.md section 7).
##
## The struct is built by @code{__vn_assemble__} from the network's result
## template, made once per network by vn_compile (pass it as @var{tmpl}
## when already at hand), so no name is looked up per unit and the cost
## grows with the size of the result only.  Inputs a signal of @var{u}
## drives are then filled from the signals (@var{sig}, packed by
## vn_pack_signals, says which).
## @end deftypefn

function res = vn_results (net, t, X, Y, states, u, tmpl, sig)
  if (nargin < 7)
    tmpl = vn_compile (net, "results").tmpl;
  endif
  t = t(:);
  res = __vn_assemble__ (tmpl, t, X, Y, states);
  if (isempty (u))
    return;
  endif
  if (nargin < 8)
    sig = vn_pack_signals (net, u, "vn_results");
  endif
  ## an input that is also an output (a feed's flow) is what the core saw
  for j = 1:numel (sig.held)
    i = sig.held(j);
    res.(sig.hunit{j}).(sig.hvar{j}) = vn_signal_values (u(i).t, u(i).v,
                                                          u(i).hold, t);
  endfor
endfunction
