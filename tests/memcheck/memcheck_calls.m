## The Octave calls "make memcheck" runs under valgrind: a network with a
## controller and a switch (simulated with a signal), steady state and
## linearisation of a controlled network, a run that fails in the
## integrator, a refused hand-made packed struct and a small fit.
## Invented data; each result is checked, so a call that quietly did
## nothing would not pass for clean.
more off;
net = vn_network ("memcheck");
net = vn_tank (net, "T1", "area", 2, "level", 1.2);
net = vn_tank (net, "T2", "area", 1.5, "level", 0.8);
net = vn_feed (net, "F1", "T1", "flow", 0.01);
net = vn_valve (net, "LV1", "T1", "T2", "kv", 400, "opening", 0.5);
net = vn_orifice (net, "O2", "T2", "", "coeff", 0.012);
loop = vn_controller (net, "LC1", "measure", "T1.level", "manipulate",
                      "LV1.opening", "setpoint", 1, "gain", 2, "reset", 200,
                      "action", "direct", "limits", [0 1]);
net = vn_pump (loop, "P1", "T2", "", "flow", 0.006, "speed", 0);
net = vn_switch (net, "LS1", "measure", "T2.level", "manipulate",
                 "P1.speed", "on", 1.0, "off", 0.7);
sg = vn_signal ("F1.flow", "step", 100, 0.01, 0.014);
res = vn_simulate (net, [0 1200], sg, "dt", 20);
assert (all (isfinite (res.T1.level)));
printf ("memcheck: simulate ok, T1 level %.4f m at the end\n", res.T1.level(end));

op = vn_steady (loop);
assert (abs (op.T1.level - 1) < 1e-6);
printf ("memcheck: steady ok, T1 level %.6f m\n", op.T1.level);
lin = vn_linearize (loop, op, {"F1.flow"}, {"T1.level", "T2.level"});
assert (all (isfinite (lin.A(:))));
printf ("memcheck: linearize ok, %d states\n", rows (lin.A));

## a run that fails: far too few integrator steps for the horizon
try
  vn_simulate (net, [0 1e6], "dt", 1e5, "maxsteps", 3);
  error ("memcheck: the starved run did not fail");
catch err
  assert (err.identifier, "vesselnet:solver-failure");
  printf ("memcheck: failing run ok (%s)\n", err.identifier);
end_try_catch

## a hand-made packed struct with a wild table offset is refused
here = pwd ();
cd (fullfile (fileparts (which ("vn_network")), "private"));
pk = vn_pack (loop, "uncached");
cd (here);
pk.taboff(1) = -1e8;
pk.tablen(1) = 3;
try
  __vn_simulate__ (pk, [], [0; 1], [], struct ("reltol", 1e-6, "abstol",
                   1e-8, "solver", 0, "maxsteps", 0, "maxstep", 0));
  error ("memcheck: the bad packed struct was taken");
catch err
  assert (err.identifier, "Octave:invalid-input-arg");
  printf ("memcheck: bad packed struct refused ok\n");
end_try_catch

## a small fit: one coefficient from a noiseless drain test
truth = vn_orifice (vn_tank (vn_network ("fit"), "T1", "area", 1, "level", 1),
                    "O1", "T1", "", "coeff", 0.004);
t = (0:20:400).';
r = vn_simulate (truth, t);
ex = vn_experiment (t, "T1.level", r.T1.level, "start", "declared");
start = truth;
start.units(2).par.coeff = 0.006;
est = vn_fit (start, ex, {"O1.coeff"});
assert (abs (est.value - 0.004) < 1e-5);
printf ("memcheck: fit ok, coeff %.6g\n", est.value);
printf ("memcheck: all calls done\n");
