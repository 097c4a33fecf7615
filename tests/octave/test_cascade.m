## Cascade control: an outer (master) controller drives the setpoint of
## an inner (slave) one.  The builders let a controller name only a unit
## that already exists, so the outer one is always declared after the
## inner one; the core runs the outer one first within each evaluation.
## Invented scenario: a surge tank's level held by an outer level loop
## that sets the flow setpoint of an inner loop on its outlet pump.

%!function net = surge_line (flow_in)
%!  net = vn_network ("cascade");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1);
%!  net = vn_feed (net, "F1", "T1", "flow", flow_in);
%!  net = vn_pump (net, "P1", "T1", "", "flow", 0.02, "speed", 0.5);
%!  net = vn_controller (net, "FC1", "measure", "P1.flow", "manipulate", "P1.speed", ...
%!                       "setpoint", 0.01, "gain", 40, "reset", 5, "limits", [0 1.5]);
%!  net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "FC1.setpoint", ...
%!                       "setpoint", 1, "gain", 0.02, "reset", 300, "action", "direct", ...
%!                       "limits", [0 0.03]);
%!endfunction

## The cascade against the same equations written by hand and integrated
## by Octave's ode15s.  Controller law (ISA ideal form, vn_controller
## help; Astrom and Hagglund, Advanced PID Control, 2006, ch. 3):
## u = bias + Kc (e + I/Ti), dI/dt = e while unsaturated; e = sp - m
## (reverse) or m - sp (direct); the bias defaults to the initial value of
## the driven input; a flow reaches its controller through a 1 s
## transmitter lag.  Plant: dV/dt = F - 0.02 speed, level = V / 2.
%!test
%! net = surge_line (0.01);
%! u = vn_signal ("F1.flow", "step", 200, 0.01, 0.014);
%! res = vn_simulate (net, [0 3000], u, "dt", 10, "reltol", 1e-8);
%! F = @(t) 0.01 + 0.004 * (t >= 200);
%! ## x = [V; I_level; I_flow; filtered flow]
%! function dx = rhs (t, x, F)
%!   h = x(1) / 2;
%!   el = h - 1;                              # direct acting
%!   sp = 0.01 + 0.02 * (el + x(2) / 300);    # LC1 output = FC1 setpoint
%!   ef = sp - x(4);                          # reverse acting
%!   s = 0.5 + 40 * (ef + x(3) / 5);          # FC1 output = pump speed
%!   q = 0.02 * s;
%!   dx = [F(t) - q; el; ef; (q - x(4)) / 1];
%! endfunction
%! opts = odeset ("RelTol", 1e-10, "AbsTol", 1e-12, "MaxStep", 5);
%! [~, xa] = ode15s (@(t, x) rhs (t, x, F), [0 200], [2; 0; 0; 0.01], opts);
%! [tb, xb] = ode15s (@(t, x) rhs (t, x, F), res.t(res.t >= 200), xa(end,:).', opts);
%! lv = res.T1.level(res.t >= 200);
%! assert (lv, xb(:,1) / 2, 2e-6);
%! q = res.P1.flow(res.t >= 200);
%! assert (q, 0.02 * (0.5 + 40 * ((0.01 + 0.02 * (xb(:,1) / 2 - 1 + xb(:,2) / 300)) - xb(:,4) + xb(:,3) / 5)), 2e-7);
%! ## integral action in both loops: the level returns to its setpoint and
%! ## the pump carries the new feed (mass balance)
%! assert (res.T1.level(end), 1, 2e-4);
%! assert (res.P1.flow(end), 0.014, 2e-6);
%! assert (res.LC1.output(end), 0.014, 2e-6);

## Operating point and gains: with integral action in both loops the
## level's gain on the outer setpoint is exactly 1 and on the feed 0,
## checked against the difference of two operating points.
%!test
%! net = surge_line (0.01);
%! op = vn_steady (net);
%! assert (op.T1.level, 1, 1e-9);
%! assert (op.P1.flow, 0.01, 1e-12);
%! assert (op.LC1.output, 0.01, 1e-12);
%! lin = vn_linearize (net, op, {"LC1.setpoint", "F1.flow"}, {"T1.level", "P1.flow"});
%! op2 = vn_steady (net, "LC1.setpoint", 1.01);
%! op3 = vn_steady (net, "F1.flow", 0.0101);
%! assert (lin.gain(1,1), (op2.T1.level - op.T1.level) / 0.01, 1e-6);
%! assert (lin.gain(1,1), 1, 1e-9);
%! assert (lin.gain(1,2), 0, 1e-9);
%! assert (lin.gain(2,2), (op3.P1.flow - op.P1.flow) / 1e-4, 1e-6);
%! assert (all (real (lin.poles) < 0));

## The analytic Jacobian through the cascade (level -> LC1 -> FC1 setpoint
## -> FC1 -> pump speed -> flow) equals central differences of the
## right-hand side, away from the operating point (common practice).
%!test
%! net = surge_line (0.012);
%! here = pwd ();
%! cd (fullfile (fileparts (which ("vn_simulate")), "private"));
%! unwind_protect
%!   pk = vn_pack (net, "uncached");
%! unwind_protect_cleanup
%!   cd (here);
%! end_unwind_protect
%! [~, ~, ~, ~, ~, x0] = __vn_linearize__ (pk, [], zeros (1, 0, "int32"), zeros (1, 0, "int32"), false);
%! [~, ~, names] = __vn_rhs__ (pk, x0);
%! assert (names(:).', {"T1.volume", "FC1.integral", "FC1.filtered", "LC1.integral"});
%! ## inside both loops' limits: LC1 output 0.0112, FC1 output 0.536
%! x = x0 + [0.1; 0.001; 0.0005; 3];
%! A = __vn_linearize__ (pk, x, zeros (1, 0, "int32"), zeros (1, 0, "int32"), false);
%! Afd = zeros (numel (x));
%! for j = 1:numel (x)
%!   h = 1e-6 * max (abs (x(j)), 1e-3);
%!   e = zeros (numel (x), 1);
%!   e(j) = h;
%!   Afd(:,j) = (__vn_rhs__ (pk, x + e) - __vn_rhs__ (pk, x - e)) / (2 * h);
%! endfor
%! assert (A, Afd, 1e-6 * max (abs (Afd(:))));
%! ## the outer loop really reaches the pump: the volume row depends on
%! ## the outer controller's integral state
%! assert (A(1,4), -0.02 * 40 * 0.02 / 300, 1e-15);

## A chain that closes on itself is refused by the core, naming the unit.
%!error <controller "FC1": its output comes back to its own setpoint> ...
%! net = surge_line (0.01);
%! k = net.index.FC1;
%! net.units(k).aux.manipulate = "LC1.setpoint";
%! vn_simulate (net, [0 10]);

## Seven levels run; an eighth is refused (derivatives chain through at
## most eight driven inputs), naming the outermost controller.
%!test
%! net = surge_line (0.01);
%! prev = "LC1";
%! for k = 3:7
%!   name = sprintf ("C%d", k);
%!   net = vn_controller (net, name, "measure", "T1.level", "manipulate", [prev ".setpoint"], ...
%!                        "setpoint", 1, "gain", 1e-3, "action", "direct");
%!   prev = name;
%! endfor
%! res = vn_simulate (net, [0 10]);
%! assert (res.T1.level(end), 1, 1e-3);
%! net = vn_controller (net, "C8", "measure", "T1.level", "manipulate", "C7.setpoint", ...
%!                      "setpoint", 1, "gain", 1e-3, "action", "direct");
%! fail ("vn_simulate (net, [0 10])", 'controller "C8": it heads a cascade of 8 controllers or switches; at most 7 are supported');
