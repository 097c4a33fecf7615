## -*- texinfo -*-
## @deftypefn {} {[@var{tau}, @var{theta}, @var{note}] =} tune_halfrule (@var{mm})
## Reduce a second-order-plus-dead-time model to first order by Skogestad's
## half rule: half of the smaller lag tau2 goes to the time constant, half to
## the dead time (Skogestad, J. Process Control 13, 2003).  A first-order
## model passes unchanged with an empty note.
## @end deftypefn

function [tau, theta, note] = tune_halfrule (mm)

  tau = mm.tau + mm.tau2 / 2;
  theta = mm.theta + mm.tau2 / 2;
  note = "";
  if (mm.tau2 > 0)
    note = sprintf ("second-order model reduced by the half rule to tau %g, dead time %g. ",
                    tau, theta);
  endif

endfunction
