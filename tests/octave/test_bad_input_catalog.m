## Bad-input catalog: one table of bad calls across every command (wrong
## types, sizes, NaN, Inf, empty values, wrong names, unknown options,
## unit strings), each asserting that the refusal is an error of the
## command that was called (the message starts "COMMAND: "), that it names
## the unit or argument, the field, and what is allowed.  A silent
## acceptance of any row fails the test.  The catalog prints its size.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_bad_input_catalog.m")'

%!shared net, ctl, hot, op, lin, res, ex
%! net = vn_network ("w");
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_tank (net, "T2", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "T2", "kv", 40, "opening", 0.5);
%! net = vn_orifice (net, "O2", "T2", "", "coeff", 0.01);
%! net = vn_boundary (net, "river", "head", 4);
%! ctl = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 2, ...
%!                      "action", "direct", "limits", [0 1]);
%! hot = vn_tank (vn_network ("h", "thermal", true), "T1", "area", 1, ...
%!                "level", 1, "temperature", 20);
%! op = vn_steady (net);
%! lin = vn_linearize (net, op, {"F1.flow", "LV1.opening"}, {"T1.level", "T2.level"});
%! res = vn_simulate (net, [0 10]);
%! t = (0:10:600).';
%! ex = vn_experiment (t, "F1.flow", 0.01 + 0.002 * (t > 100), "T2.level", ones (size (t)));

%!test
%! ## the fixtures themselves are good
%! assert (res.T1.level(1), 1);
%! assert (all (isfinite (lin.gain(:))));

%!test
%! ## {call, command, {fragments every message must hold}}
%! cat = {
%!  'vn_network ("w", "gravity", 0)', 'vn_network', {'network "w"', 'GRAVITY', 'must be a positive finite scalar'};
%!  'vn_network ("w", "gravity", NaN)', 'vn_network', {'network "w"', 'GRAVITY', 'must be a positive finite scalar'};
%!  'vn_network ("w", "density", -1)', 'vn_network', {'network "w"', 'DENSITY', 'must be a positive finite scalar'};
%!  'vn_network ("w", "cp", Inf)', 'vn_network', {'network "w"', 'CP', 'must be a positive finite scalar'};
%!  'vn_network ("w", "ambient", NaN)', 'vn_network', {'network "w"', 'AMBIENT', 'must be a finite real scalar'};
%!  'vn_network ("w", "thermal", 2)', 'vn_network', {'network "w"', 'THERMAL', 'must be true or false'};
%!  'vn_network ("w", "species", {"1a"})', 'vn_network', {'network "w"', 'SPECIES', 'must be a cell array of identifiers'};
%!  'vn_network ("w", "decay", -1)', 'vn_network', {'network "w"', 'DECAY', 'must be a vector of non-negative finite values'};
%!  'vn_network ("w", "smooth", 0)', 'vn_network', {'network "w"', 'SMOOTH', 'must be a positive finite scalar'};
%!  'vn_network ("w", "smooth", 1)', 'vn_network', {'network "w"', 'SMOOTH'};
%!  'vn_network ("w", "gravty", 9.8)', 'vn_network', {'network "w"', 'option "gravty"', 'allowed: ', 'gravity', 'density', 'cp'};
%!  'vn_network (3)', 'vn_network', {'NAME', 'must be a non-empty char row'};
%!  'vn_network ("w", "species", {"level"})', 'vn_network', {'network "w"', 'SPECIES', 'is reserved for a unit option or output'};
%!  'vn_network ("w", "species", {"a","b"}, "decay", [1 2 3])', 'vn_network', {'network "w"', 'DECAY', 'one rate per species'};
%!  'vn_tank (net, "T3", "area", -2)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", NaN)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", Inf)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", [])', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", [1 2])', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", "big")', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "area", 1e10)', 'vn_tank', {'tank "T3"', 'T3', 'must lie in [1e-09, 1e+09] (m2)'};
%!  'vn_tank (net, "T3", "diameter", 0)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "shape", "cube")', 'vn_tank', {'tank "T3"', 'T3', 'must be one of "prism"'};
%!  'vn_tank (net, "T3", "shape", "sphere")', 'vn_tank', {'tank "T3"', 'T3', 'needs DIAMETER (m)'};
%!  'vn_tank (net, "T3", "shape", "sphere", "diameter", 2, "length", 3)', 'vn_tank', {'tank "T3"', 'T3', 'does not apply to shape "sphere"; that shape takes: diameter, height'};
%!  'vn_tank (net, "T3", "shape", "cone", "diameter", 2)', 'vn_tank', {'tank "T3"', 'T3', 'needs HEIGHT (m)'};
%!  'vn_tank (net, "T3", "shape", "horizontal", "diameter", 2)', 'vn_tank', {'tank "T3"', 'T3', 'needs LENGTH (m)'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 1; 0.5 2])', 'vn_tank', {'tank "T3"', 'T3', 'must increase strictly'};
%!  'vn_tank (net, "T3", "table", [0 0 0])', 'vn_tank', {'tank "T3"', 'T3', 'must be a K x 2 matrix [level'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 NaN])', 'vn_tank', {'tank "T3"', 'T3', 'must hold finite non-negative values'};
%!  'vn_tank (net, "T3", "area", 1, "level", -1)', 'vn_tank', {'tank "T3"', 'T3', 'must be a non-negative finite scalar'};
%!  'vn_tank (net, "T3", "area", 1, "level", 2e5)', 'vn_tank', {'tank "T3"', 'T3', 'must lie in [0, 100000] (m)'};
%!  'vn_tank (net, "T3", "area", 1, "rim", 0)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive scalar or Inf'};
%!  'vn_tank (net, "T3", "area", 1, "rim", 2, "level", 3)', 'vn_tank', {'tank "T3"', 'T3', 'must not exceed RIM (2 m)'};
%!  'vn_tank (net, "T3", "area", 1, "base", 2e5)', 'vn_tank', {'tank "T3"', 'T3', 'must lie in [-100000, 100000] (m)'};
%!  'vn_tank (net, "T3", "area", 1, "contractions", 3)', 'vn_tank', {'tank "T3"', 'T3', 'must be 0'};
%!  'vn_tank (net, "T3", "area", 1, "spill", "T9", "rim", 2)', 'vn_tank', {'tank "T3"', 'T3', 'does not hold; declare the tank first'};
%!  'vn_tank (net, "T3", "area", 1, "spill", "T1")', 'vn_tank', {'tank "T3"', 'T3', 'no finite RIM to spill over'};
%!  'vn_tank (net, "T3", "area", 1, "temperature", 20)', 'vn_tank', {'tank "T3"', 'T3', 'not thermal; declare it with vn_network'};
%!  'vn_tank (net, "T3", "area", 1, "ua", -1)', 'vn_tank', {'tank "T3"', 'T3', 'must be a non-negative finite scalar'};
%!  'vn_tank (net, "T3", "areas", 1)', 'vn_tank', {'tank "T3"', 'option "areas"', 'allowed: ', 'shape', 'area', 'diameter'};
%!  'vn_tank (net, "T3", 3, 1)', 'vn_tank', {'tank "T3"', 'option names must be char', 'allowed: ', 'shape', 'area', 'diameter'};
%!  'vn_tank (net, "t", "area", 1)', 'vn_tank', {'tank "t"', 'NAME', 'reserved names: ', 't', 'stats', 'events'};
%!  'vn_tank (net, "stats", "area", 1)', 'vn_tank', {'tank "stats"', 'NAME', 'reserved names: ', 't', 'stats', 'events'};
%!  'vn_tank (net, "T1", "area", 1)', 'vn_tank', {'tank "T1"', 'T1', 'must be unique'};
%!  'vn_tank (net, "3T", "area", 1)', 'vn_tank', {'tank "3T"', 'NAME', 'must be an identifier'};
%!  'vn_tank (net, "T3", "area", 1, "level", 1, "volume", 1)', 'vn_tank', {'tank "T3"', 'T3'};
%!  'vn_tank (net, "T3", "area", 1, "crest", -1, "rim", 2)', 'vn_tank', {'tank "T3"', 'T3', 'must be a positive finite scalar'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 2; 2 5], "rim", Inf)', 'vn_tank', {'tank "T3"', 'RIM', 'must lie in (0, 2] (m)', 'strapping table', 'got Inf'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 2; 2 5], "rim", 2.5)', 'vn_tank', {'tank "T3"', 'RIM', 'must not exceed the top of the vessel (2 m)', 'got 2.5'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 2; 2 5], "level", 2.5)', 'vn_tank', {'tank "T3"', 'LEVEL', 'must not exceed the top of the vessel (2 m)', 'got 2.5'};
%!  'vn_tank (net, "T3", "table", [0 0; 1 2; 2 5], "volume", 6)', 'vn_tank', {'tank "T3"', 'VOLUME', 'must not exceed the top of the strapping table (5 m3)', 'got 6'};
%!  'vn_boundary (net, "B1")', 'vn_boundary', {'boundary "B1"', 'B1', 'is required'};
%!  'vn_boundary (net, "B1", "head", NaN)', 'vn_boundary', {'boundary "B1"', 'B1', 'must be a finite real scalar'};
%!  'vn_boundary (net, "B1", "head", 2e5)', 'vn_boundary', {'boundary "B1"', 'B1', 'must lie in [-100000, 100000] (m)'};
%!  'vn_boundary (net, "B1", "head", 1, "temperature", 20)', 'vn_boundary', {'boundary "B1"', 'B1', 'not thermal; declare it with vn_network'};
%!  'vn_boundary (net, "B1", "hed", 1)', 'vn_boundary', {'boundary "B1"', 'option "hed"', 'allowed: ', 'head', 'temperature'};
%!  'vn_boundary (net, "x", "head", 1)', 'vn_boundary', {'boundary "x"', 'NAME', 'reserved names: ', 't', 'stats', 'events'};
%!  'vn_feed (net, "F2", "T9", "flow", 1)', 'vn_feed', {'feed "F2"', 'F2', 'does not hold; declare the tank first'};
%!  'vn_feed (net, "F2", "river", "flow", 1)', 'vn_feed', {'feed "F2"', 'F2', 'must be a tank'};
%!  'vn_feed (net, "F2", "T1", "flow", NaN)', 'vn_feed', {'feed "F2"', 'F2', 'must be a finite real scalar'};
%!  'vn_feed (net, "F2", "T1", "flow", 2e6)', 'vn_feed', {'feed "F2"', 'F2', 'must lie in [-1e+06, 1e+06] (m3/s)'};
%!  'vn_feed (net, "F2", "T1", "flow", "fast")', 'vn_feed', {'feed "F2"', 'F2', 'must be a finite real scalar'};
%!  'vn_feed (net, "F2", "T1", "flw", 1)', 'vn_feed', {'feed "F2"', 'option "flw"', 'allowed: ', 'flow', 'temperature'};
%!  'vn_feed (net, "F2", "T1", "flow", 1, "temperature", 20)', 'vn_feed', {'feed "F2"', 'F2', 'not thermal; declare it with vn_network'};
%!  'vn_feed (net, "F2", "T1", "flow", 1, "chlorine", 1)', 'vn_feed', {'feed "F2"', 'option "chlorine"', 'allowed: ', 'flow', 'temperature'};
%!  'vn_orifice (net, "O1", "T1", "T2")', 'vn_orifice', {'orifice "O1"', 'O1', 'is required'};
%!  'vn_orifice (net, "O1", "T1", "T2", "coeff", -1)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be a positive finite scalar'};
%!  'vn_orifice (net, "O1", "T1", "T2", "coeff", 2e6)', 'vn_orifice', {'orifice "O1"', 'O1', 'must lie in [1e-12, 1e+06] (m2.5/s)'};
%!  'vn_orifice (net, "O1", "T1", "T2", "cd", 1.5, "diameter", 0.1)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be a scalar in'};
%!  'vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "cd", 0.6)', 'vn_orifice', {'orifice "O1"', 'O1', 'applies with DIAMETER only'};
%!  'vn_orifice (net, "O1", "T1", "T1", "coeff", 0.01)', 'vn_orifice', {'orifice "O1"', 'O1', 'must join two different units'};
%!  'vn_orifice (net, "O1", "T9", "T2", "coeff", 0.01)', 'vn_orifice', {'orifice "O1"', 'O1', 'does not hold; declare the tank or boundary first'};
%!  'vn_orifice (net, "O1", "T1", "F1", "coeff", 0.01)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be a tank or boundary'};
%!  'vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "outlet", -1)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be a non-negative finite scalar'};
%!  'vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01, "inlet", NaN)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be a non-negative finite scalar'};
%!  'vn_orifice (net, "O1", "T1", 5, "coeff", 0.01)', 'vn_orifice', {'orifice "O1"', 'O1', 'must be the name of a declared tank or boundary'};
%!  'vn_resistance (net, "R1", "T1", "T2")', 'vn_resistance', {'resistance "R1"', 'R1', 'is required'};
%!  'vn_resistance (net, "R1", "T1", "T2", "r", 0)', 'vn_resistance', {'resistance "R1"', 'R1', 'must be a positive finite scalar'};
%!  'vn_resistance (net, "R1", "T1", "T2", "r", 1e20)', 'vn_resistance', {'resistance "R1"', 'R1', 'must lie in [1e-12, 1e+15] (s/m2)'};
%!  'vn_resistance (net, "R1", "T1", "T2", "r", [1 2])', 'vn_resistance', {'resistance "R1"', 'R1', 'must be a positive finite scalar'};
%!  'vn_resistance (net, "R1", "T1", "T2", "res", 1)', 'vn_resistance', {'resistance "R1"', 'option "res"', 'allowed: ', 'r', 'outlet', 'inlet'};
%!  'vn_valve (net, "V1", "T1", "T2")', 'vn_valve', {'valve "V1"', 'V1', 'is required'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", -4)', 'vn_valve', {'valve "V1"', 'V1', 'must be a positive finite scalar'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "opening", 1.5)', 'vn_valve', {'valve "V1"', 'V1', 'must be a scalar in [0'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "opening", NaN)', 'vn_valve', {'valve "V1"', 'V1', 'must be a scalar in [0'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "characteristic", "square")', 'vn_valve', {'valve "V1"', 'V1', 'must be one of "linear"'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "rangeability", 1)', 'vn_valve', {'valve "V1"', 'V1', 'must be a finite scalar greater than 1'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "lag", -1)', 'vn_valve', {'valve "V1"', 'V1', 'must be a non-negative finite scalar'};
%!  'vn_valve (net, "V1", "T1", "T2", "kv", 4, "cv", 4)', 'vn_valve', {'valve "V1"', 'option "cv"', 'allowed: ', 'kv', 'opening', 'characteristic'};
%!  'vn_pump (net, "P1", "T1", "T2")', 'vn_pump', {'pump "P1"', 'P1', 'is required'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", -1)', 'vn_pump', {'pump "P1"', 'P1', 'must be a non-negative finite scalar'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", 2e4)', 'vn_pump', {'pump "P1"', 'P1', 'must lie in [0, 10000] (m3/s)'};
%!  'vn_pump (net, "P1", "T1", "T2", "shutoff", 20)', 'vn_pump', {'pump "P1"', 'P1', 'needs K (m/(m3/s)^2) for the curve'};
%!  'vn_pump (net, "P1", "T1", "T2", "k", 1e4)', 'vn_pump', {'pump "P1"', 'P1', 'needs SHUTOFF (m) for the curve'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "shutoff", 20, "k", 1e4)', 'vn_pump', {'pump "P1"', 'P1', 'conflicts with the curve'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "speed", -1)', 'vn_pump', {'pump "P1"', 'P1', 'must be a non-negative finite scalar'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "speed", 20)', 'vn_pump', {'pump "P1"', 'P1', 'must lie in [0, 10]'};
%!  'vn_pump (net, "P1", "T1", "T2", "flow", 0.01, "suction", 0)', 'vn_pump', {'pump "P1"', 'P1', 'must be a positive finite scalar'};
%!  'vn_heater (net, "H1", "T1", "duty", 1000)', 'vn_heater', {'heater "H1"', 'H1', 'not thermal; declare it with vn_network'};
%!  'vn_heater (hot, "H1", "T9", "duty", 1000)', 'vn_heater', {'heater "H1"', 'H1', 'does not hold; declare the tank first'};
%!  'vn_heater (hot, "H1", "T1", "duty", NaN)', 'vn_heater', {'heater "H1"', 'H1', 'must be a real finite scalar'};
%!  'vn_heater (hot, "H1", "T1", "duty", 1000, "max", -5)', 'vn_heater', {'heater "H1"', 'H1', 'must be >= 0'};
%!  'vn_heater (hot, "H1", "T1", "duty", 1000, "lag", -5)', 'vn_heater', {'heater "H1"', 'H1', 'must be >= 0'};
%!  'vn_heater (hot, "H1", "T1", "duty", 1000, "minlevel", -1)', 'vn_heater', {'heater "H1"', 'H1', 'must be >= 0'};
%!  'vn_heater (hot, "H1", "T1", "power", 1000)', 'vn_heater', {'heater "H1"', 'option "power"', 'allowed: ', 'duty', 'max', 'lag'};
%!  'vn_heater (hot, "H1", "T1", "duty", 2e12)', 'vn_heater', {'heater "H1"', 'H1', 'must lie in [-1e+12, 1e+12] (W)'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1)', 'vn_controller', {'controller "LC1"', 'LC1', 'is required'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'is required'};
%!  'vn_controller (net, "LC1", "measure", "T1.lvl", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'outputs: level, volume, head'};
%!  'vn_controller (net, "LC1", "measure", "T9.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'units: T1, T2, F1'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "T2.level", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'inputs in network "w": F1.flow, LV1.opening'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", NaN, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'must be a real finite scalar'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 0)', 'vn_controller', {'controller "LC1"', 'LC1', 'must not be 0 (sign goes in ACTION)'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "reset", -1)', 'vn_controller', {'controller "LC1"', 'LC1', 'must lie in [1e-06, 1e+12] (s)'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "action", "up")', 'vn_controller', {'controller "LC1"', 'LC1', 'must be "reverse" or "direct"'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "limits", [1 0])', 'vn_controller', {'controller "LC1"', 'LC1', 'must be [lo hi] with lo < hi'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "limits", [0 NaN])', 'vn_controller', {'controller "LC1"', 'LC1', 'must be [lo hi] with lo < hi'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "filter", -1)', 'vn_controller', {'controller "LC1"', 'LC1', 'must lie in [0, 1e+06] (s)'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "alpha", 5)', 'vn_controller', {'controller "LC1"', 'LC1', 'must lie in [0.01, 1]'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "antiwindup", "yes")', 'vn_controller', {'controller "LC1"', 'LC1', 'must be true or false'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2, "kp", 3)', 'vn_controller', {'controller "LC1"', 'option "kp"', 'allowed: ', 'measure', 'manipulate', 'setpoint'};
%!  'vn_controller (net, "LC1", "measure", "F1.flow", "manipulate", "F1.flow", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'very input it sets'};
%!  'vn_controller (ctl, "LC2", "measure", "T2.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC2"', 'LC2', 'already driven by "LC1"; one controller or switch per input'};
%!  'vn_controller (net, "LC1", "measure", 5, "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "LC1"', 'LC1', 'must be a quantity "UNIT.VARIABLE"'};
%!  'vn_controller (net, "x", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 2)', 'vn_controller', {'controller "x"', 'NAME', 'reserved names: ', 't', 'stats', 'events'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'is required'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 1, "off", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'needs on != off'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", NaN, "off", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'must be a real finite scalar'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2e12, "off", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'must lie in [-1e+12, 1e+12] (measured unit)'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1, "values", [0 NaN])', 'vn_switch', {'switch "LS1"', 'LS1', 'must be [off-value on-value]'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1, "values", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'must be [off-value on-value]'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1, "hysteresis", 1)', 'vn_switch', {'switch "LS1"', 'option "hysteresis"', 'allowed: ', 'measure', 'manipulate', 'on'};
%!  'vn_switch (net, "LS1", "measure", "T1.head", "manipulate", "T1.level", "on", 2, "off", 1)', 'vn_switch', {'switch "LS1"', 'LS1', 'inputs in network "w": F1.flow, LV1.opening'};
%!  'vn_signal ("F1.flow", "jump", 1, 0, 1)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be one of "step"'};
%!  'vn_signal ("F1.flow", "step", NaN, 0, 1)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be a finite real scalar'};
%!  'vn_signal ("F1.flow", "step", 1, 0)', 'vn_signal', {'signal "F1.flow"', 'F1', 'takes T0, BEFORE, AFTER'};
%!  'vn_signal ("F1flow", "step", 1, 0, 1)', 'vn_signal', {'QUANTITY', 'must be "UNIT.VARIABLE"'};
%!  'vn_signal (5, "step", 1, 0, 1)', 'vn_signal', {'QUANTITY', 'must be "UNIT.VARIABLE"'};
%!  'vn_signal ("F1.flow", "table", [0 1 2])', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be a K x 2 matrix [t v]'};
%!  'vn_signal ("F1.flow", "table", [0 1; NaN 2])', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be finite'};
%!  'vn_signal ("F1.flow", "table", [1 1; 0 2])', 'vn_signal', {'signal "F1.flow"', 'F1', 'must not decrease'};
%!  'vn_signal ("F1.flow", "ramp", 10, 5, 0, 1)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be later than T0'};
%!  'vn_signal ("F1.flow", "pulse", 1, -1, 0, 1)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be a positive finite scalar'};
%!  'vn_signal ("F1.flow", "step", 1, 0, Inf)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be a finite real scalar'};
%!  'vn_signal ("F1.flow", "table", [0 1; 1 2], "hold", 3)', 'vn_signal', {'signal "F1.flow"', 'F1', 'must be true or false'};
%!  'vn_simulate (net, [10 0])', 'vn_simulate', {'TSPAN', 'needs tf > t0'};
%!  'vn_simulate (net, [0 NaN])', 'vn_simulate', {'TSPAN', 'must be [t0 tf] or a vector of output times'};
%!  'vn_simulate (net, [])', 'vn_simulate', {'TSPAN', 'must be [t0 tf] or a vector of output times'};
%!  'vn_simulate (net, "long")', 'vn_simulate', {'TSPAN', 'must be [t0 tf] or a vector of output times'};
%!  'vn_simulate (net, [0 10], "dt", -1)', 'vn_simulate', {'option "dt"', 'must be a positive time step'};
%!  'vn_simulate (net, [0 10], "dt", 0)', 'vn_simulate', {'option "dt"', 'must be a positive time step'};
%!  'vn_simulate (net, [0 10], "reltol", -1)', 'vn_simulate', {'option "reltol"', 'must lie in [1e-12, 0.1]', 'got -1'};
%!  'vn_simulate (net, [0 10], "reltol", 2)', 'vn_simulate', {'option "reltol"', 'must lie in [1e-12, 0.1]', 'got 2'};
%!  'vn_simulate (net, [0 10], "reltol", 1e-20)', 'vn_simulate', {'option "reltol"', 'must lie in [1e-12, 0.1]', 'got 1e-20'};
%!  'vn_simulate (net, [0 10], "abstol", -1)', 'vn_simulate', {'option "abstol"', 'must lie in [1e-18, 1000]', 'got -1'};
%!  'vn_simulate (net, [0 10], "abstol", 1e6)', 'vn_simulate', {'option "abstol"', 'must lie in [1e-18, 1000]', 'got 1e+06'};
%!  'vn_simulate (net, [0 10], "solver", "euler")', 'vn_simulate', {'option "solver"', 'must be "auto"'};
%!  'vn_simulate (net, [0 10], "maxsteps", 0)', 'vn_simulate', {'option "maxsteps"', 'must be a whole number in [1, 1e+09]', 'got 0'};
%!  'vn_simulate (net, [0 10], "maxsteps", 1e12)', 'vn_simulate', {'option "maxsteps"', 'must be a whole number in [1, 1e+09]', 'got 1e+12'};
%!  'vn_simulate (net, [0 10], "maxstep", -1)', 'vn_simulate', {'option "maxstep"', 'must lie in [1e-06, 1e+09] (s)', 'got -1'};
%!  'vn_simulate (net, [0 10], "maxstep", 1e-9)', 'vn_simulate', {'option "maxstep"', 'must lie in [1e-06, 1e+09] (s)', 'got 1e-09'};
%!  'vn_simulate (net, [0 3600], "dt", 1e-9)', 'vn_simulate', {'option "dt"', 'must be a positive time step in [0.00036, Inf) (s)', 'got 1e-09'};
%!  'vn_simulate (net, [0 10], vn_signal ("F1.flow", "step", 5, 0.01, 3e6))', 'vn_simulate', {'signal "F1.flow"', 'must lie in [-1e+06, 1e+06] (m3/s)', 'got 3e+06 at t = 5 s'};
%!  'vn_simulate (net, [0 10], struct ("quantity", "F1.flow", "t", [0; 1], "v", [0; NaN], "hold", false))', 'vn_simulate', {'signal "F1.flow"', 'point 2 must hold a finite time and value', 'value NaN'};
%!  'vn_simulate (net, [0 10], struct ("quantity", "F1.flow", "t", [0; Inf], "v", [0; 1], "hold", false))', 'vn_simulate', {'signal "F1.flow"', 'point 2 must hold a finite time and value', 't = Inf'};
%!  'vn_ensemble (net, [0 10], vn_signal ("F1.flow", "step", 5, 0.01, -3e6), "vary", {"LV1.kv", [1 2]})', 'vn_ensemble', {'signal "F1.flow"', 'must lie in [-1e+06, 1e+06] (m3/s)', 'got -3e+06 at t = 5 s'};
%!  'vn_ensemble (net, [0 10], [], "vary", {"LV1.kv", [1 2]}, "reltol", 2)', 'vn_ensemble', {'option "reltol"', 'must lie in [1e-12, 0.1]', 'got 2'};
%!  'vn_steady (net, "F1.flow", 3e6)', 'vn_steady', {'input "F1.flow"', 'must lie in [-1e+06, 1e+06] (m3/s)', 'got 3e+06'};
%!  'vn_simulate (net, [0 10], "initial", [1 2 3])', 'vn_simulate', {'initial state', 'has 3 values; this network has 2 states'};
%!  'vn_simulate (net, [0 10], "record", {"T9.level"})', 'vn_simulate', {'quantity "T9.level"', 'T9', 'units: T1, T2, F1'};
%!  'vn_simulate (net, [0 10], "record", {"T1.colour"})', 'vn_simulate', {'quantity "T1.colour"', 'T1', 'outputs: level, volume, head'};
%!  'vn_simulate (net, [0 10], "speed", 2)', 'vn_simulate', {'option "speed"', 'allowed: ', 'dt', 'initial', 'reltol'};
%!  'vn_simulate (net, [0 10], vn_signal ("T9.flow", "step", 1, 0, 1))', 'vn_simulate', {'quantity "T9.flow"', 'T9', 'units: T1, T2, F1'};
%!  'vn_simulate (net, [0 10], vn_signal ("T1.level", "step", 1, 0, 1))', 'vn_simulate', {'quantity "T1.level"', 'T1', 'inputs in network "w": F1.flow, LV1.opening'};
%!  'vn_simulate (struct ("a", 1), [0 10])', 'vn_simulate', {'NET', 'must be a network made by vn_network'};
%!  'vn_simulate (ctl, [0 10], vn_signal ("LV1.opening", "step", 1, 0, 1))', 'vn_simulate', {'controller "LC1"', 'LV1'};
%!  'vn_steady (net, "F9.flow", 1)', 'vn_steady', {'quantity "F9.flow"', 'F9', 'units: T1, T2, F1'};
%!  'vn_steady (net, "F1.flow", NaN)', 'vn_steady', {'F1', 'must be a finite real scalar'};
%!  'vn_steady (net, "F1.flow", "lots")', 'vn_steady', {'F1.flow', 'must be a', 'lots'};
%!  'vn_steady (net, "target", {"T2.level"}, "adjust", {"F1.flow"})', 'vn_steady', {'OUTPUT', 'must be a cell {OUTPUT'};
%!  'vn_steady (net, "target", {"T9.level", 1}, "adjust", {"F1.flow"})', 'vn_steady', {'quantity "T9.level"', 'T9', 'units: T1, T2, F1'};
%!  'vn_steady (net, "target", {"T2.level", 1}, "adjust", {"T1.level"})', 'vn_steady', {'quantity "T1.level"', 'T1', 'inputs in network "w": F1.flow, LV1.opening'};
%!  'vn_steady (net, "target", {"T2.level", NaN}, "adjust", {"F1.flow"})', 'vn_steady', {'T2', 'must be a finite real scalar'};
%!  'vn_steady (net, "maxiter", -1)', 'vn_steady', {'option "maxiter"', 'must be a whole number in [1, 10000]', 'got -1'};
%!  'vn_steady (net, "maxiter", 1e9)', 'vn_steady', {'option "maxiter"', 'must be a whole number in [1, 10000]', 'got 1e+09'};
%!  'vn_steady (net, "tol", 0)', 'vn_steady', {'option "tol"', 'must lie in (0, 1)', 'got 0'};
%!  'vn_steady (net, "LV1.opening", NaN)', 'vn_steady', {'LV1.opening', 'must be a finite real scalar'};
%!  'vn_steady (net, "freeze", "yes")', 'vn_steady', {'option "freeze"', 'must be true or false'};
%!  'vn_steady (net, "initial", [1 2 3 4 5])', 'vn_steady', {'start state', 'has 5 values; this network has 2 states'};
%!  'vn_steady (net, "bogus", 1)', 'vn_steady', {'quantity "UNIT.VARIABLE"', 'option "bogus"', 'allowed: ', 'target', 'adjust', 'initial'};
%!  'vn_linearize (net, op, {"F9.flow"}, {"T2.level"})', 'vn_linearize', {'quantity "F9.flow"', 'F9', 'units: T1, T2, F1'};
%!  'vn_linearize (net, op, {"F1.flow"}, {"T2.lvl"})', 'vn_linearize', {'quantity "T2.lvl"', 'T2', 'outputs: level, volume, head'};
%!  'vn_linearize (net, op, {"T1.level"}, {"T2.level"})', 'vn_linearize', {'quantity "T1.level"', 'T1', 'inputs in network "w": F1.flow, LV1.opening'};
%!  'vn_linearize (net, op, {"F1.flow"}, {"T2.level"}, "loop", "half")', 'vn_linearize', {'option "loop"', 'must be "open" or "closed"'};
%!  'vn_linearize (net, op, {"F1.flow"}, {"T2.level"}, "bogus", 1)', 'vn_linearize', {'option "bogus"', 'allowed: ', 'sparse', 'dense', 'poles'};
%!  'vn_linearize (net, op, 5, {"T2.level"})', 'vn_linearize', {'INPUTS', 'must be quantities "UNIT.VARIABLE"'};
%!  'vn_linearize (net, [1 2 3 4 5 6 7], {"F1.flow"}, {"T2.level"})', 'vn_linearize', {'operating point', 'has 7 states; this network has 2'};
%!  'vn_linearize (net, op, {"F1.flow", "F1.flow"}, {"T2.level"})', 'vn_linearize', {'F1', 'given twice'};
%!  'vn_stepresponse (net, op, "F9.flow", 0.001)', 'vn_stepresponse', {'quantity "F9.flow"', 'F9', 'units: T1, T2, F1'};
%!  'vn_stepresponse (net, op, "F1.flow", 0)', 'vn_stepresponse', {'SIZE', 'is zero; give a non-zero change'};
%!  'vn_stepresponse (net, op, "F1.flow", NaN)', 'vn_stepresponse', {'SIZE', 'must be a finite real scalar'};
%!  'vn_stepresponse (net, op, "F1.flow", 0.001, {"T2.lvl"})', 'vn_stepresponse', {'quantity "T2.lvl"', 'T2', 'outputs: level, volume, head'};
%!  'vn_stepresponse (net, op, "F1.flow", 0.001, "tend", -5)', 'vn_stepresponse', {'option "tend"', 'must be a positive number'};
%!  'vn_stepresponse (net, op, "F1.flow", 0.001, "bogus", 1)', 'vn_stepresponse', {'option "bogus"', 'allowed: ', 'percent', 't', 'tend'};
%!  'vn_stepresponse (net, op, {"F1.flow"}, 0.001)', 'vn_stepresponse', {'quantity "UNIT.VARIABLE"', 'INPUT', 'must be one quantity "UNIT.VARIABLE"'};
%!  'vn_frequency (lin, -1)', 'vn_frequency', {'W', 'must be a vector of positive finite frequencies (rad/s)'};
%!  'vn_frequency (lin, [1 NaN])', 'vn_frequency', {'W', 'must be a vector of positive finite frequencies (rad/s)'};
%!  'vn_frequency (lin, 1, "bogus", 1)', 'vn_frequency', {'option "bogus"', 'allowed: ', 'controller', 'input', 'output)'};
%!  'vn_frequency (lin, 1, "controller", struct ("Kc", 1, "Ti", 1, "Td", 0), "input", "F9.flow", "output", "T2.level")', 'vn_frequency', {'F9', 'allowed: ', 'F1.flow', 'LV1.opening)'};
%!  'vn_frequency (5)', 'vn_frequency', {'LIN', 'must be a linear model struct with fields A'};
%!  'vn_rga (ones (2, 3))', 'vn_rga', {'gain matrix is 2 x 3', 'needs as many inputs as outputs'};
%!  'vn_rga (lin, "pairing", {"F9.flow"})', 'vn_rga', {'F9', 'allowed: ', 'F1.flow', 'LV1.opening)'};
%!  'vn_experiment ([0 1 2], "F1.flow", [1 2], "T2.level", [1 2 3])', 'vn_experiment', {'F1', 'has 2 samples but T has 3 times'};
%!  'vn_experiment ([0 NaN 2], "F1.flow", [1 2 3], "T2.level", [1 2 3])', 'vn_experiment', {'T holds 1 NaN', 'every sample needs a finite time'};
%!  'vn_experiment ([0 2 1], "F1.flow", [1 2 3], "T2.level", [1 2 3])', 'vn_experiment', {'T', 'must hold two or more strictly increasing times'};
%!  'vn_experiment ([0 1 2], "F1flow", [1 2 3], "T2.level", [1 2 3])', 'vn_experiment', {'quantity "UNIT.VARIABLE"', 'option "F1flow"', 'allowed: ', 'sigma', 'weights', 'hold'};
%!  'vn_experiment ([0 1 2], "F1.flow", [1 2 3], "T2.level", [1 2 3], "hold", "maybe")', 'vn_experiment', {'option "hold"', 'true or false'};
%!  'vn_experiment ([0 1 2], "F1.flow", [1 2 3], "T2.level", [1 2 3], "sigma", -1)', 'vn_experiment', {'option "sigma"', 'must be positive finite numbers'};
%!  'vn_fit (net, ex, {"O9.coeff"})', 'vn_fit', {'quantity "O9.coeff"', 'O9', 'units: T1, T2, F1'};
%!  'vn_fit (net, ex, {"T1.colour"})', 'vn_fit', {'quantity "T1.colour"', 'T1', 'allowed: ', 'area', 'diameter', 'length'};
%!  'vn_fit (net, ex, {"LV1.kv"}, "maxiter", -1)', 'vn_fit', {'option "maxiter"', 'must be a positive integer'};
%!  'vn_fit (net, ex, {"LV1.kv"}, "bogus", 1)', 'vn_fit', {'option "bogus"', 'allowed: ', 'lower', 'upper', 'maxiter'};
%!  'vn_fit (net, 5, {"LV1.kv"})', 'vn_fit', {'EX', 'must be one or more tests made by vn_experiment'};
%!  'vn_fit (net, ex, 5)', 'vn_fit', {'PARAMS', 'must name the parameters to fit'};
%!  'vn_fopdt ([0 1 2], [1 2], [1 2 3])', 'vn_fopdt', {'T, U and Y', 'must have the same length', 'U 2'};
%!  'vn_fopdt ([0 1 2], [1 2 3], [1 NaN NaN])', 'vn_fopdt', {'Y', 'at least 8 are needed'};
%!  'vn_fopdt ([0 2 1], [1 2 3], [1 2 3])', 'vn_fopdt', {'T (s)', 'must be strictly increasing'};
%!  'vn_fopdt ([0 1 2], [1 2 3], [1 2 3], "cubic")', 'vn_fopdt', {'option "cubic"', 'allowed: ', '"fopdt"', '"integrating"', '"sopdt"'};
%!  'vn_fopdt ([0 1 2], [1 2 3], [1 2 3], "maxiter", -1)', 'vn_fopdt', {'MAXITER', 'must be a positive integer'};
%!  'vn_fopdt ("t", [1 2 3], [1 2 3])', 'vn_fopdt', {'T (s), U and Y', 'must be real numeric vectors'};
%!  'vn_tune (struct ("gain", 1, "tau", 10, "deadtime", 1), "pidtuner")', 'vn_tune', {'METHOD', 'allowed: ', '"simc"', '"imc"', '"lambda"'};
%!  'vn_tune (struct ("gain", 0, "tau", 10, "deadtime", 1), "simc")', 'vn_tune', {'GAIN', 'is 0; a process with no gain'};
%!  'vn_tune (struct ("gain", 1, "tau", -10, "deadtime", 1), "simc")', 'vn_tune', {'tau is -10', 'must be positive'};
%!  'vn_tune (struct ("gain", 1, "tau", 10, "deadtime", -1), "simc")', 'vn_tune', {'DEADTIME', 'must be >= 0'};
%!  'vn_tune (struct ("gain", 1, "deadtime", 1), "simc")', 'vn_tune', {'MODEL', 'needs field tau (or tau1 and tau2)'};
%!  'vn_tune (struct ("gain", NaN, "tau", 10, "deadtime", 1), "simc")', 'vn_tune', {'GAIN', 'must be a finite real scalar'};
%!  'vn_tune (struct ("gain", 1, "tau", 10, "deadtime", 1), "simc", "tauc", -1)', 'vn_tune', {'TAUC', 'must be a positive finite scalar'};
%!  'vn_tune (struct ("gain", 1, "tau", 10, "deadtime", 1), "simc", "bogus", 1)', 'vn_tune', {'option "bogus"', 'allowed: ', '"tauc"', '"lambda"', '"type"'};
%!  'vn_tune (struct ("gain", 1, "tau", 10, "deadtime", 1), "zn", "type", "pd")', 'vn_tune', {'TYPE', 'must be "p"'};
%!  'vn_tune (5, "simc")', 'vn_tune', {'MODEL', 'must be a scalar struct with fields gain'};
%!  'vn_units (5, "parsecs")', 'vn_units', {'FROM', 'known units are length: m, mm, cm'};
%!  'vn_units ("5 parsecs", "m")', 'vn_units', {'X', 'must be a real numeric array', '"5 parsecs"'};
%!  'vn_units (5, "m", "kg")', 'vn_units', {'TO', 'known units are length: m, mm, cm'};
%!  'vn_units (5, 3)', 'vn_units', {'FROM', 'known units are length: m, mm, cm'};
%!  'vn_units (5, "m3/h", "bar")', 'vn_units', {'"m3/h"', '"bar"', 'flow units: m3/s'};
%!  'vn_show (42)', 'vn_show', {'NET', 'must be a network made by vn_network'};
%!  'vn_plot (42)', 'vn_plot', {'first argument', 'must be a result, step response, frequency response or fit struct'};
%!  'vn_plot (res, {"T9.level"})', 'vn_plot', {'quantity "T9.level"', 'T9'};
%!  'vn_plot (res, {"T1.level"}, "bogus", 1)', 'vn_plot', {'option "bogus"', 'allowed: ', 'file', 'title', 'figure'};
%!  'vn_ensemble (net, [0 10], [], "vary", {"O9.coeff", [1 2]})', 'vn_ensemble', {'quantity "O9.coeff"', 'O9', 'units: T1, T2, F1'};
%!  'vn_ensemble (net, [0 10], [], "vary", {"LV1.kv", [1 NaN]})', 'vn_ensemble', {'LV1', 'must be finite real numbers'};
%!  'vn_ensemble (net, [0 10], [], "vary", {"LV1.kv", [1 2]}, "workers", -1)', 'vn_ensemble', {'option "workers"', 'must be an integer in [1'};
%!  'vn_ensemble (net, [0 10], [], "vary", {"LV1.kv", [1 2]}, "bogus", 1)', 'vn_ensemble', {'option "bogus"', 'allowed: ', 'vary', 'draws', 'record'};
%!  'vn_ensemble (net, [10 0], [], "vary", {"LV1.kv", [1 2]})', 'vn_ensemble', {'TSPAN', 'needs tf > t0'};
%!  'vn_tank (net, "T3", "area", "5 parsecs")', 'vn_tank', {'tank "T3"', 'AREA', 'allows units of area: m2'};
%!  'vn_tank (net, "T3", "diameter", "2400 kg")', 'vn_tank', {'tank "T3"', 'DIAMETER', 'allows units of length: m, mm'};
%!  'vn_feed (net, "F2", "T1", "flow", "36 m3/hour")', 'vn_feed', {'feed "F2"', 'FLOW', 'allows units of flow: m3/s'};
%!  'vn_tank (net, "T3", "area", 1, "level", "abc m")', 'vn_tank', {'tank "T3"', 'LEVEL', 'non-negative finite scalar (m)'};
%!  'vn_valve (net, "V2", "T1", "", "kv", "40 parsecs")', 'vn_valve', {'valve "V2"', 'KV', 'allows units of valve coefficient'};
%!  'vn_signal ("F1.flow", "step", "5 parsecs", 0, 1)', 'vn_signal', {'signal "F1.flow"', 'T0', 'allows units of time: s'};
%!  'vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", "1 bar", "gain", 1)', 'vn_controller', {'controller "LC1"', 'SETPOINT', 'allows units of length'};
%!  'vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", "2 kg", "off", 1)', 'vn_switch', {'switch "LS1"', 'ON', 'allows units of length'};
%!  'vn_network ("w", "gravity", "9.8 parsecs")', 'vn_network', {'network "w"', 'GRAVITY', 'allows units of acceleration'};
%!  'vn_boundary (net, "B1", "head", "4 degC")', 'vn_boundary', {'boundary "B1"', 'HEAD', 'allows units of length'};
%!  'vn_tank (net, "T3", "area", "-2 m2")', 'vn_tank', {'tank "T3"', 'AREA', 'positive finite scalar (m2)'};
%!  'vn_tank (net, "T3", "area", "NaN m2")', 'vn_tank', {'tank "T3"', 'AREA', 'positive finite scalar (m2)'};
%!  'vn_pump (net, "P1", "T1", "", "flow", "5 psi")', 'vn_pump', {'pump "P1"', 'FLOW', 'allows units of flow'};
%!  'vn_orifice (net, "O1", "T1", "", "diameter", "5 L")', 'vn_orifice', {'orifice "O1"', 'DIAMETER', 'allows units of length'};
%!  'vn_network ("w", "display", {"flow", "parsecs"})', 'vn_network', {'network "w"', 'DISPLAY', 'must be one of m3/s'};
%!  'vn_network ("w", "display", {"colour", "m"})', 'vn_network', {'network "w"', 'DISPLAY', 'dimensions: length, area'};
%! };
%! bad = {};
%! commands = {};
%! for i = 1:rows (cat)
%!   [call, fn, frags] = cat{i,:};
%!   commands{end+1} = fn;
%!   try
%!     eval ([call ";"]);
%!     bad{end+1} = sprintf ("%s: no error", call);
%!     continue;
%!   catch err
%!   end_try_catch
%!   msg = err.message;
%!   why = "";
%!   if (! strncmp (msg, [fn ": "], numel (fn) + 2))
%!     why = sprintf ("does not start with \"%s: \"", fn);
%!   elseif (! (strcmp (err.identifier, "Octave:invalid-input-arg")
%!              || strncmp (err.identifier, "vesselnet:", 10)))
%!     why = sprintf ("identifier \"%s\"", err.identifier);
%!   else
%!     ## list items are looked for anywhere, so a list may grow or be
%!     ## reordered without breaking a row
%!     for k = 1:numel (frags)
%!       if (isempty (strfind (msg, frags{k})))
%!         why = sprintf ("lacks \"%s\"", frags{k});
%!         break;
%!       endif
%!     endfor
%!   endif
%!   if (! isempty (why))
%!     bad{end+1} = sprintf ("%s: message %s: %s", call, why, msg);
%!   endif
%! endfor
%! printf ("test_bad_input_catalog: %d bad calls across %d commands, %d refused as expected\n",
%!         rows (cat), numel (unique (commands)), rows (cat) - numel (bad));
%! for i = 1:numel (bad)
%!   printf ("  %s\n", bad{i});
%! endfor
%! assert (rows (cat) >= 150);
%! assert (numel (bad), 0);

%!test
%! ## every field a result carries is a reserved unit name, so no unit can
%! ## overwrite one (the builders refuse reserved names)
%! here = pwd ();
%! cd (fullfile (fileparts (which ("vn_simulate")), "private"));
%! unwind_protect
%!   reserved = build_reserved_names ();
%! unwind_protect_cleanup
%!   cd (here);
%! end_unwind_protect
%! sr = vn_stepresponse (net, op, "F1.flow", 0.001, {"T2.level"});
%! units = {net.units.name};
%! results = {res, op, lin, sr};
%! for k = 1:numel (results)
%!   f = setdiff (fieldnames (results{k}), [units, {"A", "B", "C", "D"}]);
%!   missing = setdiff (f, reserved);
%!   assert (missing, cell (0, 1));
%! endfor
%! for name = {"t", "x", "y", "stats", "states", "events"}
%!   fail (sprintf ("vn_tank (net, \"%s\", \"area\", 1)", name{1}), "reserved");
%! endfor
