## Bad inputs across the commands: each error must name the command, the
## unit and the field (and, where there is one, the value given), so a
## user can find the mistake in a long build script.  Messages come from
## the builders and, for values only the core checks, from the core
## through vn_simulate.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_bad_inputs.m")'

%!shared net, ctl
%! net = vn_network ("w");
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_tank (net, "T2", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "T2", "kv", 40, "opening", 0.5);
%! net = vn_boundary (net, "river", "head", 4);
%! ctl = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 2, ...
%!                      "action", "direct", "limits", [0 1]);

%!test
%! ## the network the errors are made against is itself good
%! res = vn_simulate (net, [0 10], "dt", 5);
%! assert (numel (res.t), 3);
%! assert (res.T1.level(1), 1);

## ---- network and names --------------------------------------------
%!error <vn_network: network "w": GRAVITY must be a positive finite scalar \(m/s2\), got 0> vn_network ("w", "gravity", 0)
%!error <vn_tank: NET must be a network made by vn_network> vn_tank (struct ("a", 1), "T3", "area", 1)
%!error <vn_tank: tank "T1": NAME "T1" is already taken by a tank in network "w"> vn_tank (net, "T1", "area", 1)
%!error <vn_orifice: orifice "LV1": NAME "LV1" is already taken by a valve> vn_orifice (net, "LV1", "T1", "T2", "coeff", 0.01)
%!error <vn_tank: tank "3T": NAME must be an identifier.*got "3T"> vn_tank (net, "3T", "area", 1)
%!error <vn_show: NET must be a network made by vn_network, got 42> vn_show (42)

## ---- tanks --------------------------------------------------------
%!error <vn_tank: tank "T3": AREA must be a positive finite scalar \(m2\), got -2> vn_tank (net, "T3", "area", -2)
%!error <vn_tank: tank "T3": AREA must be a positive finite scalar \(m2\), got NaN> vn_tank (net, "T3", "area", NaN)
%!error <vn_tank: tank "T3": DIAMETER must be a positive finite scalar \(m\), got -1> vn_tank (net, "T3", "diameter", -1)
%!error <vn_tank: tank "T3": AREA must be a positive finite scalar \(m2\), got "big"> vn_tank (net, "T3", "area", "big")
%!error <vn_tank: tank "T3": LEVEL must be a non-negative finite scalar \(m\), got -1> vn_tank (net, "T3", "area", 1, "level", -1)
%!error <vn_tank: tank "T3": TABLE levels \(m\) must increase strictly, got 2 in row 2 then 1 in row 3> vn_tank (net, "T3", "table", [0 0; 2 1; 1 3])
%!error <vn_tank: tank "T3": TABLE volumes \(m3\) must increase strictly, got 2 in row 2 then 1 in row 3> vn_tank (net, "T3", "table", [0 0; 1 2; 2 1])
%!error <vn_tank: tank "T3": TABLE must be a K x 2 matrix> vn_tank (net, "T3", "table", [0 0])
%!error <vn_tank: tank "T3": SHAPE must be one of .*got "pyramid"> vn_tank (net, "T3", "shape", "pyramid", "area", 1)
%!error <vn_tank: tank "T3": shape "cone" needs HEIGHT> vn_tank (net, "T3", "shape", "cone", "diameter", 2)
%!error <vn_tank: tank "T3": shape "horizontal" needs LENGTH> vn_tank (net, "T3", "shape", "horizontal", "diameter", 2)
%!error <vn_tank: tank "T3": give AREA \(1 m2\) or DIAMETER \(1 m\), not both> vn_tank (net, "T3", "area", 1, "diameter", 1)
%!error <vn_tank: tank "T3": unknown option "colour"; allowed: shape, area> vn_tank (net, "T3", "area", 1, "colour", 2)
%!error <vn_tank: tank "T3": LEVEL must not exceed RIM \(1 m\), got 2> vn_tank (net, "T3", "area", 1, "rim", 1, "level", 2)
%!error <vn_tank: tank "T3": LEVEL must not exceed the top of the vessel \(2 m\), got 3> vn_tank (net, "T3", "shape", "sphere", "diameter", 2, "level", 3)
%!error <vn_tank: tank "T3": CONTRACTIONS must be 0, 1 or 2, got 3> vn_tank (net, "T3", "area", 1, "contractions", 3)
%!error <vn_tank: tank "T3": SPILL "T9" given but the tank has no finite RIM> vn_tank (net, "T3", "area", 1, "spill", "T9")

## ---- flow elements, feeds, boundaries ------------------------------
%!error <vn_orifice: orifice "O1": FROM and TO are both "T1"; a flow element must join two different units> vn_orifice (net, "O1", "T1", "T1", "coeff", 0.01)
%!error <vn_pump: pump "P1": FROM and TO are both "river"> vn_pump (net, "P1", "river", "river", "flow", 0.01)
%!error <vn_orifice: orifice "O1": FROM names unit "T9", which network "w" does not hold> vn_orifice (net, "O1", "T9", "T2", "coeff", 0.01)
%!error <vn_orifice: orifice "O1": FROM "F1" is a feed; it must be a tank or boundary> vn_orifice (net, "O1", "F1", "T2", "coeff", 0.01)
%!error <vn_orifice: orifice "O1": COEFF must be a positive finite scalar \(m2.5/s\), got 0> vn_orifice (net, "O1", "T1", "T2", "coeff", 0)
%!error <vn_orifice: orifice "O1": give COEFF \(0.01 m2.5/s\) or DIAMETER \(0.1 m\), not both> vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "diameter", 0.1)
%!error <vn_orifice: orifice "O1": COEFF \(m2.5/s\) or DIAMETER \(m\) is required> vn_orifice (net, "O1", "T1", "T2")
%!error <vn_orifice: orifice "O1": INLET must be a non-negative finite scalar \(m\), got -1> vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "inlet", -1)
%!error <vn_resistance: resistance "R1": R must be a positive finite scalar \(s/m2\), got -5> vn_resistance (net, "R1", "T1", "T2", "r", -5)
%!error <vn_resistance: resistance "R1": R \(s/m2\) is required> vn_resistance (net, "R1", "T1", "T2")
%!error <vn_valve: valve "LV2": OPENING must be a scalar in \[0, 1\], got 1.5> vn_valve (net, "LV2", "T1", "", "kv", 40, "opening", 1.5)
%!error <vn_valve: valve "LV2": CHARACTERISTIC must be one of "linear", "equal", "quick", got "parabolic"> vn_valve (net, "LV2", "T1", "", "kv", 40, "characteristic", "parabolic")
%!error <vn_valve: valve "LV2": KV \(m3/h at 1 bar\) is required> vn_valve (net, "LV2", "T1", "")
%!error <vn_valve: valve "LV2": RANGEABILITY must be a finite scalar greater than 1, got 1> vn_valve (net, "LV2", "T1", "", "kv", 40, "rangeability", 1)
%!error <vn_pump: pump "P1": SHUTOFF \(20 m\) needs K> vn_pump (net, "P1", "T1", "T2", "shutoff", 20)
%!error <vn_pump: pump "P1": FLOW \(0.01 m3/s\) conflicts with the curve \(SHUTOFF, K\)> vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "shutoff", 20, "k", 1e4)
%!error <vn_pump: pump "P1": FLOW must be a non-negative finite scalar \(m3/s\), got -0.01> vn_pump (net, "P1", "T1", "T2", "flow", -0.01)
%!error <vn_pump: pump "P1": SPEED must be a non-negative finite scalar, got -1> vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "speed", -1)
%!error <vn_feed: feed "F2": TANK names unit "T9", which network "w" does not hold> vn_feed (net, "F2", "T9", "flow", 0.01)
%!error <vn_feed: feed "F2": TANK "river" is a boundary; it must be a tank> vn_feed (net, "F2", "river", "flow", 0.01)
%!error <vn_feed: feed "F2": FLOW must be a finite real scalar \(m3/s\), got NaN> vn_feed (net, "F2", "T1", "flow", NaN)
%!error <vn_feed: feed "F2": FLOW must be a finite real scalar \(m3/s\), got a 1x2 double> vn_feed (net, "F2", "T1", "flow", [1 2])
%!error <vn_boundary: boundary "B2": HEAD must be a finite real scalar \(m\), got Inf> vn_boundary (net, "B2", "head", Inf)
%!error <vn_boundary: boundary "B2": HEAD \(m\) is required> vn_boundary (net, "B2")

## ---- controllers and switches -------------------------------------
%!error <vn_controller: controller "LC1": quantity "T1.colour": colour is not an output of tank "T1"; outputs: level, volume, head, spill> vn_controller (net, "LC1", "measure", "T1.colour", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)
%!error <vn_controller: controller "LC1": quantity "T1.level": level is not an input of tank "T1": a tank has no inputs; inputs in network "w": F1.flow, LV1.opening> vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "T1.level", "setpoint", 1, "gain", 2)
%!error <vn_controller: controller "LC1": unknown option "colour"; allowed: measure, manipulate> vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "colour", 3)
%!error <vn_switch: switch "LS1": ON and OFF set points are equal \(1\)> vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "F1.flow", "on", 1, "off", 1)
%!error <vn_switch: switch "LS1": VALUES must be \[off-value on-value\]> vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1, "values", [0 1 2])
## a range only the core checks, reported through vn_simulate
%!error <vn_controller: controller "LC1": RESET must lie in \[1e-06, 1e\+12\] \(s\), got -300> vn_simulate (vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "reset", -300), [0 10])

## ---- signals and simulation ---------------------------------------
%!error <vn_signal: signal "F1.flow": "step" takes T0, BEFORE, AFTER; got 2 arguments> vn_signal ("F1.flow", "step", 10, 1)
%!error <vn_signal: signal "F1.flow": TV times must not decrease, got 5 s in row 2 then 3 s in row 3> vn_signal ("F1.flow", "table", [0 1; 5 2; 3 1])
%!error <vn_signal: QUANTITY must be "UNIT.VARIABLE".*got "F1flow"> vn_signal ("F1flow", "step", 10, 1, 2)
%!error <vn_signal: signal "F1.flow": KIND must be one of "step", "ramp", "table", "pulse", got "wiggle"> vn_signal ("F1.flow", "wiggle", 10, 1, 2)
%!error <vn_signal: signal "F1.flow": AFTER must be a finite real scalar, got NaN> vn_signal ("F1.flow", "step", 5, 0, NaN)
%!error <vn_simulate: quantity "T9.flow": the network has no unit "T9"> vn_simulate (net, [0 10], vn_signal ("T9.flow", "step", 5, 0, 1))
%!error <vn_simulate: quantity "F1.speed": speed is not an input of feed "F1"; allowed: flow> vn_simulate (net, [0 10], vn_signal ("F1.speed", "step", 5, 0, 1))
%!error <vn_simulate: quantity "T1.level": level is not an input of tank "T1"> vn_simulate (net, [0 10], vn_signal ("T1.level", "step", 5, 0, 1))
%!error <vn_simulate: signal on LV1.opening: that input is driven by controller "LC1"> vn_simulate (ctl, [0 10], vn_signal ("LV1.opening", "step", 5, 0, 1))
%!error <vn_simulate: two signals drive "F1.flow"> vn_simulate (net, [0 10], [vn_signal("F1.flow", "step", 5, 0, 1), vn_signal("F1.flow", "step", 6, 0, 1)])
%!error <network "e" has no units> vn_simulate (vn_network ("e"), [0 10])
%!error <network "e" has no units> vn_steady (vn_network ("e"))
%!error <vn_simulate: TSPAN \[t0 tf\] needs tf . t0, got \[10 0\]> vn_simulate (net, [10 0])
%!error <vn_simulate: TSPAN must be \[t0 tf\]> vn_simulate (net, [0 NaN])
%!error <vn_simulate: option "dt" must be a positive time step> vn_simulate (net, [0 10], "dt", -1)
%!error <vn_simulate: option "reltol" must lie in \[1e-12, 0.1\], got "tight"> vn_simulate (net, [0 10], "reltol", "tight")
%!error <vn_simulate: option "maxsteps" must be a whole number in \[1, 1e\+09\], got 0.5> vn_simulate (net, [0 10], "maxsteps", 0.5)
%!error <vn_simulate: unknown option "tolerance"; allowed: dt, initial> vn_simulate (net, [0 10], "tolerance", 1e-6)
%!error <vn_simulate: option "solver" must be "auto", "dense" or "klu"> vn_simulate (net, [0 10], "solver", "rk4")
%!error <vn_simulate: initial state has 3 values; this network has 2 states> vn_simulate (net, [0 10], "initial", [1 2 3])
%!error <vn_simulate: U must be signals made by vn_signal> vn_simulate (net, [0 10], 3)
%!error <vn_simulate: options come in name/value pairs> vn_simulate (net, [0 10], "dt")
%!error <vn_steady: quantity "T9.flow": the network has no unit "T9"> vn_steady (net, "T9.flow", 1)

## ---- refused at declaration, not later in vn_simulate ----------------
%!error <vn_network: network "w2": SMOOTH must lie in \(0, 0.1\] \(m\), got 0.5> vn_network ("w2", "smooth", 0.5)
%!error <vn_tank: tank "T3": AREA must lie in \[1e-09, 1e\+09\] \(m2\), got 1e\+10> vn_tank (net, "T3", "area", 1e10)
%!error <vn_tank: tank "T3": LEVEL must lie in \[0, 100000\] \(m\), got 200000> vn_tank (net, "T3", "area", 1, "level", 2e5)
%!error <vn_tank: tank "T3": RIM must lie in \[1e-06, 100000\] \(m\), got 200000> vn_tank (net, "T3", "area", 1, "rim", 2e5)
%!error <vn_resistance: resistance "R1": R must lie in \[1e-12, 1e\+15\] \(s/m2\), got 1e\+20> vn_resistance (net, "R1", "T1", "", "r", 1e20)
%!error <vn_controller: controller "LC1": RESET must lie in \[1e-06, 1e\+12\] \(s\), got 0> vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "reset", 0)
%!error <vn_switch: switch "LS1": ON must lie in \[-1e\+12, 1e\+12\] \(measured unit\), got 2e\+12> vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2e12, "off", 1)
%!error <vn_switch: switch "LS1": OFF must lie in \[-1e\+12, 1e\+12\]> vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 1, "off", -3e12)

## ---- loops ---------------------------------------------------------
%!error <vn_controller: controller "FC1": MEASURE and MANIPULATE are both "F1.flow": a loop may not measure the very input it sets> vn_controller (net, "FC1", "measure", "F1.flow", "manipulate", "F1.flow", "setpoint", 0.01, "gain", 1)
%!error <vn_switch: switch "LS1": MEASURE and MANIPULATE are both "F1.flow"> vn_switch (net, "LS1", "measure", "F1.flow", "manipulate", "F1.flow", "on", 1, "off", 0)
%!test
%! ## a signal on an input a switch sets: no advice to "drive its setpoint"
%! sw = vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1);
%! try
%!   vn_simulate (sw, [0 10], vn_signal ("LV1.opening", "step", 1, 0, 1));
%!   error ("no error");
%! catch err
%!   assert (err.message, "vn_simulate: signal on LV1.opening: that input is driven by switch \"LS1\"; a switch sets it from its on and off levels; signals may drive only inputs no switch or controller sets");
%! end_try_catch
%! fail ("vn_simulate (ctl, [0 10], vn_signal (\"LV1.opening\", \"step\", 1, 0, 1))", "driven by controller \"LC1\"; drive the controller's setpoint instead");

## ---- allowed lists hold what a user may type -------------------------
%!test
%! ## no core placeholders c1 .. c8 without species, no empty list
%! try
%!   vn_simulate (net, [0 1], vn_signal ("F1.colour", "step", 1, 0, 1));
%! catch err
%!   assert (err.message, "vn_simulate: quantity \"F1.colour\": colour is not an input of feed \"F1\"; allowed: flow");
%! end_try_catch
%! sp = vn_network ("s", "species", {"salt"});
%! sp = vn_tank (sp, "T1", "area", 1);
%! sp = vn_feed (sp, "F1", "T1", "flow", 0.01, "salt", 2);
%! fail ("vn_steady (sp, \"F1.sugar\", 1)", "sugar is not an input of feed \"F1\"; allowed: flow, salt$");
%! fail ("vn_linearize (net, [], {\"T1.area\"}, {\"T1.level\"})", "area is not an input of tank \"T1\": a tank has no inputs; inputs in network \"w\": F1.flow, LV1.opening, river.head");

## ---- a tank that fills is named, not its source ----------------------
%!error <vn_steady: tank "T2" has no outlet: liquid fed to tank "T1" flows on into it> vn_steady (vn_orifice (vn_tank (vn_tank (vn_feed (vn_tank (vn_network ("f"), "T1", "area", 1, "level", 1), "F1", "T1", "flow", 0.01), "T2", "area", 1), "T3", "area", 1), "O1", "T1", "T2", "coeff", 0.01))

## ---- a missed target names its quantity ------------------------------
%!error <vn_steady: the targets cannot be met with the adjusted inputs: target 1, T1.level = 5 \(m\), is missed by -4> vn_steady (vn_orifice (vn_feed (vn_tank (vn_network ("m"), "T1", "area", 2, "level", 1, "rim", 2), "F1", "T1", "flow", 0.01), "O1", "T1", "", "coeff", 0.01), "target", {"T1.level", 5}, "adjust", {"F1.flow"})
