## Reference tests of the volume balances through vn_simulate: total
## volume held in a closed ring of tanks over a day, a feed step met
## exactly at its breakpoint, and a level switch cycling a pump against
## the mass-balance period.  Each check names its source.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_ref_conservation.m")'

%!test
%! ## Closed ring, no feeds, no spill: the total volume stays what it was
%! ## (conservation of mass, incompressible liquid; a linear invariant that
%! ## BDF keeps to round-off: Shampine, Conservation laws and the numerical
%! ## solution of ODEs, Comp. Math. Appl. 12B, 1986; memory)
%! net = vn_network ("ring");
%! net = vn_tank (net, "T1", "area", 2, "level", 3);
%! net = vn_tank (net, "T2", "shape", "horizontal", "diameter", 2, ...
%!                "length", 4, "level", 0.6, "base", 2);
%! net = vn_tank (net, "T3", "area", 3, "level", 0.5, "base", 1);
%! net = vn_pump (net, "P1", "T1", "T2", "shutoff", 12, "k", 2e5);
%! net = vn_orifice (net, "O2", "T2", "T3", "coeff", 0.004);
%! net = vn_orifice (net, "O3", "T3", "T1", "diameter", 0.04, "cd", 0.62);
%! net = vn_pump (net, "P2", "T3", "T1", "flow", 0.002);
%! ## the pumps change speed through the day so the ring never settles
%! u = vn_signal ("P1.speed", "table", [0 1; 21600 1; 21600 0.6; 43200 0.6; 50000 1.1]);
%! u(2) = vn_signal ("P2.speed", "table", [0 0; 30000 0; 30000 1; 70000 1; 70000 0]);
%! res = vn_simulate (net, [0 86400], u, "dt", 600);
%! Vt = res.T1.volume + res.T2.volume + res.T3.volume;
%! assert (max (abs (Vt / Vt(1) - 1)) < 1e-9);
%! ## the ring did move liquid around
%! assert (max (res.T1.volume) - min (res.T1.volume) > 0.5);
%! assert (max (res.P2.flow) > 0.0019);
%! assert ([res.T1.spill; res.T2.spill; res.T3.spill], zeros (3 * numel (res.t), 1));

%!test
%! ## A feed step at a time that is not an output time: the volume of a
%! ## tank with no outlet is flat up to the step and rises at the new
%! ## feed exactly from it, V = V0 + F max(t - ts, 0) (volume balance)
%! ts = 123.456;
%! net = vn_network ("integrator");
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0);
%! u = vn_signal ("F1.flow", "step", ts, 0, 0.01);
%! res = vn_simulate (net, [0 300], u, "dt", 10);
%! assert (! any (res.t == ts));
%! assert (res.T1.volume, 2 + 0.01 * max (res.t - ts, 0), 1e-10);
%! ## a ramp: V = V0 + integral of the ramp, a quadratic in time
%! u = vn_signal ("F1.flow", "table", [0 0; 50.5 0; 150.5 0.02; 400 0.02]);
%! res = vn_simulate (net, (0:20:400).', u, "reltol", 1e-10, "abstol", 1e-12);
%! t = res.t;
%! F = @(s) min (max (s - 50.5, 0), 100) * 0.02 / 100;
%! V = 2 + 0.5 * F (t) .* min (max (t - 50.5, 0), 100) ...
%!       + 0.02 * max (t - 150.5, 0);
%! assert (res.T1.volume, V, 1e-8);

%!test
%! ## the kink sits at the breakpoint: outputs just before and just after
%! ## it, with an orifice outlet from a steady level (Torricelli 1644:
%! ## level steady where F = c sqrt(h))
%! ts = 500.25;
%! c = 0.01;
%! F0 = 0.01;
%! net = vn_network ("kink");
%! net = vn_tank (net, "T1", "area", 1, "level", (F0 / c)^2);
%! net = vn_feed (net, "F1", "T1", "flow", F0);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", c);
%! u = vn_signal ("F1.flow", "step", ts, F0, 2 * F0);
%! res = vn_simulate (net, [0 ts-1e-3 ts ts+1e-3 ts+1], u, "reltol", 1e-10, "abstol", 1e-12);
%! V = res.T1.volume;
%! assert (V(1:3), ones (3, 1), 1e-10);
%! ## right after the step the volume rises at F1 - c sqrt(h) = 0.01 m3/s
%! assert ((V(4) - V(3)) / 1e-3, 0.01, 1e-6);
%! assert (res.F1.flow(1:2), [F0; F0]);
%! assert (res.F1.flow(4:5), [2*F0; 2*F0]);

%!test
%! ## A level switch cycles a fixed-flow pump on a tank fed at F_in:
%! ## on 2.5 m, off 1.0 m; fill time A dh/F_in, empty time
%! ## A dh/(F_pump - F_in), switching exactly at the set points
%! ## (volume balance of a prism tank)
%! A = 2; Fin = 0.004; Fp = 0.01; dh = 1.5;
%! net = vn_network ("sump");
%! net = vn_tank (net, "T1", "area", A, "level", 1.5);
%! net = vn_feed (net, "F1", "T1", "flow", Fin);
%! net = vn_pump (net, "P1", "T1", "", "flow", Fp, "speed", 0);
%! net = vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "P1.speed", ...
%!                  "on", 2.5, "off", 1.0, "values", [0 1]);
%! res = vn_simulate (net, [0 6000], "dt", 50);
%! tfill = A * dh / Fin;
%! tempty = A * dh / (Fp - Fin);
%! assert ([tfill tempty], [750 500], 1e-12);
%! ## first on after filling 1.5 -> 2.5 m, then empty, fill, ...
%! t1 = A * 1.0 / Fin;
%! tev = t1 + cumsum ([0, repmat([tempty tfill], 1, 4)]);
%! tev = tev(tev <= 6000).';
%! ev = res.events;
%! assert (ev.t, tev, 1e-6);
%! assert (ev.value, mod ((1:numel (tev)).', 2));
%! assert (all (strcmp (ev.unit, "LS1")));
%! assert (diff (ev.t(1:2:end)), (tfill + tempty) * ones (floor ((numel (tev) - 1) / 2), 1), 1e-6);
%! ## the level at the switching instants is the set point
%! r2 = vn_simulate (net, [0; ev.t], "reltol", 1e-9);
%! lev = r2.T1.level(2:end);
%! want = merge (mod ((1:numel (tev)).', 2), 2.5, 1.0);
%! assert (lev, want, 1e-6);
%! ## and the level stays inside the dead band
%! assert (all (res.T1.level >= 1 - 1e-6 & res.T1.level <= 2.5 + 1e-6));
