## Energy and species balances: reference checks (closed forms of the
## well-mixed tank balances; Seborg, Edgar, Mellichamp and Doyle, Process
## Dynamics and Control, ch. 2, memory; first-order decay in a CSTR,
## Levenspiel, Chemical Reaction Engineering, ch. 5, memory).

%!shared rhocp
%! rhocp = 998.2 * 4181.3;

%!test
%! ## two feeds mixing in a tank with heat loss to ambient, at steady state:
%! ## T = (F1 T1 + F2 T2 + UA Ta/(rho cp)) / (F1 + F2 + UA/(rho cp))
%! net = vn_network ("mix", "thermal", true, "ambient", 15);
%! net = vn_tank (net, "T1", "area", 3, "level", 1.5, "temperature", 15, "ua", 400);
%! net = vn_feed (net, "F1", "T1", "flow", 0.003, "temperature", 60);
%! net = vn_feed (net, "F2", "T1", "flow", 0.001, "temperature", 10);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.004 / sqrt (1.5));
%! op = vn_steady (net);
%! c = 400 / rhocp;
%! Tref = (0.003 * 60 + 0.001 * 10 + c * 15) / (0.004 + c);
%! assert (op.T1.level, 1.5, 1e-8);
%! assert (op.T1.temperature, Tref, 1e-8);

%!test
%! ## a feed-temperature step into a tank at constant volume is first
%! ## order with tau = V/F: 63.2 % of the change at t = tau
%! net = vn_network ("step", "thermal", true, "ambient", 20);
%! net = vn_tank (net, "T1", "area", 2, "level", 1, "temperature", 20);
%! net = vn_feed (net, "F1", "T1", "flow", 0.002, "temperature", 20);
%! net = vn_pump (net, "P1", "T1", "", "flow", 0.002);
%! u = vn_signal ("F1.temperature", "step", 0, 20, 30);
%! tau = 2 / 0.002;
%! res = vn_simulate (net, [0 tau 2*tau 3*tau], u, "reltol", 1e-9);
%! assert (res.T1.volume, 2 * ones (4, 1), 1e-9);
%! assert ((res.T1.temperature(2) - 20) / 10, 1 - exp (-1), 1e-6);
%! assert ((res.T1.temperature(4) - 20) / 10, 1 - exp (-3), 1e-6);

%!test
%! ## energy conserved in a closed ring of tanks (no heat in or out):
%! ## total V T constant to 1e-8 relative over a simulated day
%! net = vn_network ("ring", "thermal", true, "ambient", 15);
%! net = vn_tank (net, "A", "area", 1, "level", 2, "temperature", 60);
%! net = vn_tank (net, "B", "area", 2, "level", 1, "temperature", 10);
%! net = vn_tank (net, "C", "area", 1.5, "level", 0.5, "temperature", 30);
%! net = vn_orifice (net, "O1", "A", "B", "coeff", 0.004);
%! net = vn_orifice (net, "O2", "B", "C", "coeff", 0.003);
%! net = vn_pump (net, "P1", "C", "A", "flow", 0.002);
%! res = vn_simulate (net, [0 86400], "dt", 600, "reltol", 1e-10, "abstol", 1e-12);
%! E = res.A.volume .* res.A.temperature + res.B.volume .* res.B.temperature ...
%!     + res.C.volume .* res.C.temperature;
%! assert (max (abs (E - E(1))) / E(1) < 1e-8);
%! ## and it mixes towards one temperature
%! assert (abs (res.A.temperature(end) - res.B.temperature(end)) < 1);

%!test
%! ## a tank run dry while heated keeps a bounded, physical temperature
%! net = vn_network ("dry", "thermal", true, "ambient", 15);
%! net = vn_tank (net, "T1", "area", 1, "level", 0.5, "temperature", 15);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%! net = vn_heater (net, "H1", "T1", "duty", 5e4);
%! res = vn_simulate (net, [0 2000], "dt", 10);
%! assert (res.T1.level(end) < 1e-3);
%! assert (all (isfinite (res.T1.temperature)));
%! assert (max (res.T1.temperature) < 100);
%! assert (res.H1.duty(end) < 5e4 * 1e-3);

%!test
%! ## first-order decay in a well-mixed tank at steady state:
%! ## c = c_in F / (F + k V)
%! k = 2e-5;
%! net = vn_network ("contact", "species", {"chlorine"}, "decay", k);
%! net = vn_tank (net, "T1", "area", 20, "level", 3, "chlorine", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.05, "chlorine", 1.8);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.05 / sqrt (3));
%! op = vn_steady (net);
%! assert (op.T1.chlorine, 1.8 * 0.05 / (0.05 + k * 60), 1e-9);
%! res = vn_simulate (net, [0 7200], "dt", 60);
%! assert (isfield (res.T1, "chlorine"));
%! assert (! isfield (res.T1, "c1"));
%! ## a dosing change at the feed reaches the tank
%! u = vn_signal ("F1.chlorine", "step", 0, 1.8, 2.2);
%! res = vn_simulate (op.net, [0 36000], u, "initial", op, "dt", 600);
%! assert (res.T1.chlorine(end) > op.T1.chlorine + 0.3);

%!test
%! ## species conserved in a closed ring without decay, to 1e-8 relative
%! net = vn_network ("ring", "species", {"salt", "dye"});
%! net = vn_tank (net, "A", "area", 1, "level", 2, "salt", 3, "dye", 0);
%! net = vn_tank (net, "B", "area", 2, "level", 1, "salt", 0, "dye", 1);
%! net = vn_orifice (net, "O1", "A", "B", "coeff", 0.004);
%! net = vn_pump (net, "P1", "B", "A", "flow", 0.002);
%! res = vn_simulate (net, [0 86400], "dt", 900, "reltol", 1e-10, "abstol", 1e-12);
%! M = res.A.volume .* res.A.salt + res.B.volume .* res.B.salt;
%! assert (max (abs (M - M(1))) / M(1) < 1e-8);
%! D = res.A.volume .* res.A.dye + res.B.volume .* res.B.dye;
%! assert (max (abs (D - D(1))) / D(1) < 1e-8);

%!error <not declared|unknown option> vn_tank (vn_network ("n", "species", {"chlorine"}), "T1", "area", 1, "salt", 2)
%!error <UA> vn_tank (vn_network ("n", "thermal", true), "T1", "area", 1, "ua", -5)
%!error <DECAY> vn_network ("n", "species", {"chlorine"}, "decay", -1)
%!error <not thermal> vn_tank (vn_network ("n"), "T1", "area", 1, "temperature", 20)
