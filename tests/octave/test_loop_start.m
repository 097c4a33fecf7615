## Where the loops start: a controller's transmitter filter starts at the
## measurement of the plant as declared, with every controller output at
## its bias (the driven input's declared value).  A network declared at
## equilibrium therefore stays there exactly, whatever the loop gain.
## Before, the filter was settled by three passes of a fixed-point
## iteration through the loop, which is off by (loop gain)^3 of the
## first guess and diverges for a loop gain above 1.
## Invented scenario: a dosing pump on a flow loop.

%!function net = dosing (kc, sp = 0.01)
%!  net = vn_network ("dosing");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.01);
%!  net = vn_pump (net, "P1", "T1", "", "flow", 0.02, "speed", 0.5);
%!  net = vn_controller (net, "FC1", "measure", "P1.flow", "manipulate", "P1.speed", ...
%!                       "setpoint", sp, "gain", kc, "reset", 5, "limits", [0 1.5]);
%!endfunction

## loop gains 0.2, 0.8 and 2 (controller gain x 0.02 m3/s per unit speed)
%!test
%! for kc = [10 40 100]
%!   res = vn_simulate (dosing (kc), [0 20], "dt", 1);
%!   assert (res.FC1.measurement(1), 0.01, 1e-15);
%!   assert (res.P1.flow, 0.01 * ones (21, 1), 1e-12);
%!   assert (res.FC1.output, 0.5 * ones (21, 1), 1e-10);
%!   assert (res.T1.level, ones (21, 1), 1e-9);
%! endfor

## Off equilibrium the filter still reads the declared plant, and the
## controller acts on the error from the first instant: setpoint 0.012
## with speed 0.5 (flow 0.01) gives u(0) = 0.5 + Kc (0.012 - 0.01).
%!test
%! res = vn_simulate (dosing (40, 0.012), [0 1], "dt", 1);
%! assert (res.FC1.measurement(1), 0.01, 1e-15);
%! assert (res.FC1.output(1), 0.5 + 40 * 0.002, 1e-12);
%! assert (res.P1.flow(1), 0.02 * (0.5 + 40 * 0.002), 1e-13);
