## The compiled form of a network (inst/private/vn_compile.m) is made once
## and reused; these tests check that a changed network is never served a
## stale one, whether the change came from a builder or by hand, and that
## results assembled from the template are those a name-by-name lookup
## gives.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_compile.m")'

%!function net = two_tanks ()
%!  net = vn_network ("c");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%!  net = vn_tank (net, "T2", "area", 1.5, "level", 1.0);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.01);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01);
%!  net = vn_orifice (net, "O2", "T2", "", "coeff", 0.008);
%!endfunction

%!function res = uncached (varargin)
%!  old = getenv ("VN_COMPILE_CACHE");
%!  setenv ("VN_COMPILE_CACHE", "0");
%!  unwind_protect
%!    res = vn_simulate (varargin{:});
%!  unwind_protect_cleanup
%!    setenv ("VN_COMPILE_CACHE", old);
%!  end_unwind_protect
%!endfunction

%!test
%! ## a coefficient edited by hand is seen at once, and equals a fresh pack
%! net = two_tanks ();
%! r1 = vn_simulate (net, [0 600], "dt", 10);
%! r1b = vn_simulate (net, [0 600], "dt", 10);
%! assert (r1b.T2.level, r1.T2.level, 0);
%! net.units(4).par.coeff = 0.02;
%! r2 = vn_simulate (net, [0 600], "dt", 10);
%! r3 = uncached (net, [0 600], "dt", 10);
%! assert (r2.T2.level, r3.T2.level, 0);
%! assert (r2.O1.flow, r3.O1.flow, 0);
%! assert (max (abs (r2.T2.level - r1.T2.level)) > 1e-3);
%! ## and edited back: the first result again
%! net.units(4).par.coeff = 0.01;
%! r4 = vn_simulate (net, [0 600], "dt", 10);
%! assert (r4.T2.level, r1.T2.level, 0);

%!test
%! ## an area, the gravity and a declared input edited by hand
%! net = two_tanks ();
%! r0 = vn_simulate (net, [0 300], "dt", 10);
%! n1 = net;
%! n1.units(1).par.area = 3;
%! r1 = vn_simulate (n1, [0 300], "dt", 10);
%! assert (r1.T1.volume(1), 3 * 1.5, 1e-12);
%! n2 = net;
%! n2.options.gravity = 1.62;          # lunar gravity: slower draining
%! r2 = vn_simulate (n2, [0 300], "dt", 10);
%! ## orifice law F = coeff sqrt (dH) does not involve g; a valve would.
%! ## The packed gravity must still be the new one:
%! assert (r2.O2.flow(1), 0.008 * sqrt (1.0), 1e-12);
%! n3 = net;
%! n3.units(3).par.flow = 0.02;
%! r3 = vn_simulate (n3, [0 300], "dt", 10);
%! assert (r3.F1.flow, 0.02 * ones (31, 1), 0);
%! assert (r0.F1.flow, 0.01 * ones (31, 1), 0);
%! ## the operating point sees the edit too (vn_steady packs through the cache)
%! op0 = vn_steady (net);
%! op3 = vn_steady (n3);
%! ## steady state of two orifices in series: F = c2 sqrt (h2), so
%! ## h2 = (F / c2)^2 (Torricelli, REFERENCES.md)
%! assert (op0.T2.level, (0.01 / 0.008)^2, 1e-6);
%! assert (op3.T2.level, (0.02 / 0.008)^2, 1e-6);

%!test
%! ## every builder bumps the revision, the bulk form too
%! net = vn_network ("r");
%! net = vn_tank (net, "T1", "area", 1, "level", 1);
%! a = net.revision;
%! net = vn_tank (net, {"T2", "T3"}, "area", [1 2], "level", 1);
%! b = net.revision;
%! net = vn_orifice (net, {"O1", "O2"}, {"T1", "T2"}, {"T2", "T3"}, "coeff", 0.01);
%! c = net.revision;
%! net = vn_valve (net, "V1", "T3", "", "kv", 10, "opening", 0.5);
%! d = net.revision;
%! net = vn_controller (net, "LC1", "measure", "T3.level", "manipulate",
%!                      "V1.opening", "setpoint", 1, "gain", 1, "reset", 100,
%!                      "action", "direct", "limits", [0 1]);
%! e = net.revision;
%! assert (all (diff ([a b c d e]) > 0));

%!test
%! ## a result from the template equals a record of the same quantities,
%! ## whose columns are found name by name; on random networks
%! rand ("seed", 11);
%! for trial = 1:12
%!   n = 2 + floor (4 * rand ());
%!   net = vn_network ("p");
%!   for i = 1:n
%!     net = vn_tank (net, sprintf ("T%d", i), "area", 0.5 + 2 * rand (),
%!                    "level", 0.2 + 2 * rand (), "rim", 5);
%!   endfor
%!   net = vn_feed (net, "F1", "T1", "flow", 0.02 * rand ());
%!   for i = 1:n
%!     to = "";
%!     if (i < n)
%!       to = sprintf ("T%d", i + 1);
%!     endif
%!     switch (mod (i + trial, 3))
%!       case 0
%!         net = vn_orifice (net, sprintf ("L%d", i), sprintf ("T%d", i), to,
%!                           "coeff", 0.005 + 0.01 * rand ());
%!       case 1
%!         net = vn_valve (net, sprintf ("L%d", i), sprintf ("T%d", i), to,
%!                         "kv", 5 + 20 * rand (), "opening", rand ());
%!       otherwise
%!         net = vn_resistance (net, sprintf ("L%d", i), sprintf ("T%d", i), to,
%!                              "r", 500 + 1000 * rand ());
%!     endswitch
%!   endfor
%!   if (rand () < 0.5)
%!     net = vn_feed (net, "F2", sprintf ("T%d", n), "flow", 0.01 * rand ());
%!   endif
%!   res = vn_simulate (net, [0 200], "dt", 20);
%!   names = {};
%!   for i = 1:numel (net.units)
%!     un = net.units(i).name;
%!     f = fieldnames (res.(un));
%!     for j = 1:numel (f)
%!       names{end+1} = [un "." f{j}];
%!     endfor
%!   endfor
%!   ## inputs held at declared values are not outputs: compare those apart
%!   isout = true (size (names));
%!   for j = 1:numel (names)
%!     try
%!       vn_simulate (net, [0 20], "record", names(j));
%!     catch
%!       isout(j) = false;
%!     end_try_catch
%!   endfor
%!   rec = vn_simulate (net, [0 200], "dt", 20, "record", names(isout));
%!   for j = find (isout)
%!     dot = find (names{j} == ".", 1);
%!     un = names{j}(1:dot-1);
%!     v = names{j}(dot+1:end);
%!     assert (res.(un).(v), rec.(un).(v), 0);
%!   endfor
%!   for j = find (! isout)
%!     dot = find (names{j} == ".", 1);
%!     un = names{j}(1:dot-1);
%!     v = names{j}(dot+1:end);
%!     assert (res.(un).(v), net.units(net.index.(un)).par.(v) * ones (11, 1), 0);
%!   endfor
%!   assert (res.units.T1.level, "m");
%! endfor

%!test
%! ## a record keeps one field per quantity, grouped by unit, even when a
%! ## quantity is named twice
%! net = two_tanks ();
%! full = vn_simulate (net, [0 100], "dt", 10);
%! r = vn_simulate (net, [0 100], "dt", 10, "record",
%!                  {"O1.flow", "T2.level", "T1.level", "T2.level", "T1.volume"});
%! assert (fieldnames (r)(1:6), {"t"; "O1"; "T2"; "T1"; "x"; "states"});
%! assert (fieldnames (r.T1), {"level"; "volume"});
%! assert (r.T1.volume, full.T1.volume, 0);
%! assert (r.O1.flow, full.O1.flow, 0);
%! lv = vn_simulate (net, [0 100], "dt", 10, "record", "levels");
%! assert (fieldnames (lv)(1:5), {"t"; "T1"; "T2"; "x"; "states"});
%! assert (lv.T2.level, full.T2.level, 0);

%!test
%! ## a signal on an input that is not an output is filled from the signal
%! net = vn_network ("s");
%! net = vn_tank (net, "T1", "area", 1, "level", 1);
%! net = vn_valve (net, "V1", "T1", "", "kv", 20, "opening", 0.5);
%! u = vn_signal ("V1.opening", "step", 50, 0.5, 0.2);
%! r = vn_simulate (net, [0 100], u, "dt", 10);
%! assert (r.V1.opening, [0.5 * ones(5, 1); 0.2 * ones(6, 1)], 0);
%! r2 = vn_simulate (net, [0 100], "dt", 10);
%! assert (r2.V1.opening, 0.5 * ones (11, 1), 0);

%!test
%! ## with the cache off, a network seen before is packed again, and the
%! ## result is the same
%! net = two_tanks ();
%! r1 = vn_simulate (net, [0 100], "dt", 10);
%! r2 = uncached (net, [0 100], "dt", 10);
%! assert (r2.T1.level, r1.T1.level, 0);
%! assert (r2.units, r1.units);
