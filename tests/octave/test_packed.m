## The gateways check every field of the packed network and signal structs
## (doc/internals.md sections 4 and 5) before the core reads them: a
## hand-made struct gives an error naming the field, never a crash.  Each
## case spoils one field of a good packed struct and calls every gateway
## that builds a network.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_packed.m")'

%!function [pk, sig] = good ()
%!  ## a table tank drained by an orifice, fed by a stepped feed
%!  net = vn_network ("packed");
%!  net = vn_tank (net, "T1", "table", [0 0; 1 2; 2 5], "level", 0.5);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%!  s = vn_signal ("F1.flow", "step", 10, 0.004, 0.006);
%!  here = pwd ();
%!  cd (fullfile (fileparts (which ("vn_network")), "private"));
%!  unwind_protect
%!    pk = vn_pack (net, "uncached");
%!    sig = vn_pack_signals (net, s, "test");
%!  unwind_protect_cleanup
%!    cd (here);
%!  end_unwind_protect
%!endfunction

%!function o = sim_opts ()
%!  o = struct ("reltol", 1e-6, "abstol", 1e-8, "solver", 0,
%!              "maxsteps", 0, "maxstep", 0);
%!endfunction

%!function o = steady_opts ()
%!  o = struct ("maxiter", 0, "tol", 0, "solver", 0, "simulate", false);
%!endfunction

## Calls every gateway that builds a network with PK and SIG; each must
## raise an error matching PAT (never crash).
%!function refuse_all (pk, sig, pat)
%!  calls = {@() __vn_simulate__ (pk, sig, [0; 1; 2], [], sim_opts ()), ...
%!           @() __vn_linearize__ (pk, [], int32 ([]), int32 ([]), false), ...
%!           @() __vn_steady__ (pk, [], int32 ([]), int32 ([]), [], ...
%!                              steady_opts ())};
%!  names = {"vn_simulate", "vn_linearize", "vn_steady"};
%!  for i = 1:numel (calls)
%!    try
%!      calls{i} ();
%!      error ("test_packed:no-error", "%s accepted a bad packed struct (%s)",
%!             names{i}, pat);
%!    catch err
%!      if (strcmp (err.identifier, "test_packed:no-error"))
%!        rethrow (err);
%!      endif
%!      assert (strncmp (err.message, [names{i} ": "], numel (names{i}) + 2),
%!              sprintf ("message starts with the command: %s", err.message));
%!      assert (! isempty (regexp (err.message, pat, "once")),
%!              sprintf ("'%s' does not match '%s'", err.message, pat));
%!      assert (err.identifier, "Octave:invalid-input-arg");
%!    end_try_catch
%!  endfor
%!endfunction

%!test
%! ## the good struct runs: volume of [0 0; 1 2; 2 5] at level 0.5 is 1 m3
%! [pk, sig] = good ();
%! [X, Y] = __vn_simulate__ (pk, sig, [0; 5; 20], [], sim_opts ());
%! assert (X(1), 1, 1e-12);
%! assert (all (isfinite (X(:))));
%! assert (columns (pk.tab), 1);
%! assert (pk.tablen(1), int32 (3));

%!test
%! ## the table offset of the report: -1e8 used to kill Octave
%! [pk, sig] = good ();
%! pk.taboff(1) = -1e8;
%! refuse_all (pk, sig, "packed field 'taboff' element 1 must be a whole number in \\[0, 2147483647\\], got -1e\\+08");

%!test
%! [pk, sig] = good ();
%! pk.taboff = [NaN, 0, 0];
%! refuse_all (pk, sig, "'taboff' element 1 .* got NaN");
%! pk.taboff = int32 ([2 0 0]);
%! refuse_all (pk, sig, "table of unit \"T1\" runs past the 3 packed \\(level, volume\\) pairs");
%! pk.taboff = int32 ([0 0 0]);
%! pk.tablen = [1e10 0 0];
%! refuse_all (pk, sig, "'tablen' element 1 .* got 1e\\+10");
%! pk.tablen = [-3 0 0];
%! refuse_all (pk, sig, "'tablen' element 1 .* got -3");
%! pk.tablen = [3 0];
%! refuse_all (pk, sig, "'tablen' must have 3 elements, got 2");

%!test
%! [pk, sig] = good ();
%! pk.tab = pk.tab(1:end-1);
%! refuse_all (pk, sig, "'tab' must hold \\(level, volume\\) pairs");
%! pk.tab = {1, 2};
%! refuse_all (pk, sig, "'tab' must be a real numeric array");
%! pk.tab = [0; 0; 1; 2; 2; 5] + 1i;
%! refuse_all (pk, sig, "'tab' must be a real numeric array");

%!test
%! ## species count: NaN was cast to int unchecked
%! [pk, sig] = good ();
%! pk.opt(7) = NaN;
%! refuse_all (pk, sig, "'opt' element 7 \\(species count\\) must be a whole number in \\[0, 64\\], got NaN");
%! pk.opt(7) = 1e12;
%! refuse_all (pk, sig, "got 1e\\+12");
%! pk.opt(7) = 1.5;
%! refuse_all (pk, sig, "got 1.5");
%! pk.opt(7) = 3;
%! refuse_all (pk, sig, "3 species but only 0 decay rates");
%! pk.opt(7) = 0;
%! pk.opt(5) = NaN;
%! refuse_all (pk, sig, "element 5 \\(thermal\\) must be 0 or 1");
%! pk.opt = pk.opt(1:6);
%! refuse_all (pk, sig, "'opt' must have at least 7 elements");

%!test
%! ## the core still checks the values a struct carries
%! [pk, sig] = good ();
%! pk.opt(1) = -9.8;
%! refuse_all (pk, sig, "gravity must be a positive finite number \\(m/s2\\), got -9.8");
%! pk.opt(1) = 9.8;
%! pk.opt(7) = 9;
%! pk.opt(8:16) = 0;
%! refuse_all (pk, sig, "between 0 and 8 species are allowed, got 9");

%!test
%! [pk, sig] = good ();
%! r = pk.ref;
%! pk.ref = double (r);  pk.ref(2, 2) = NaN;
%! refuse_all (pk, sig, "'ref' element 6 .* got NaN");
%! pk.ref = double (r);  pk.ref(1, 3) = 0.5;
%! refuse_all (pk, sig, "'ref' element 9 .* got 0.5");
%! pk.ref = double (r);  pk.ref(1, 3) = -1e9;
%! refuse_all (pk, sig, "'ref' element 9 .* got -1e\\+09");
%! pk.ref = r(:, 1:2);
%! refuse_all (pk, sig, "'ref' must have 12 elements, got 8");
%! pk.ref = r;  pk.ref(2, 3) = 7;
%! refuse_all (pk, sig, "orifice \"O1\": reference 2 is 7, outside the network's 3 units");

%!test
%! [pk, sig] = good ();
%! g = pk.given;
%! pk.given = double (g);  pk.given(1) = 2;
%! refuse_all (pk, sig, "'given' must hold only 0 and 1");
%! pk.given = g(:, 1:2);
%! refuse_all (pk, sig, "'given' must have");
%! pk.given = g;
%! pk.par = pk.par(1:end-1, :);
%! refuse_all (pk, sig, "'par' must have");
%! pk.par = "abc";
%! refuse_all (pk, sig, "'par' must be a real numeric array");

%!test
%! [pk, sig] = good ();
%! k = pk.kinds;
%! pk.kinds = "tank";
%! refuse_all (pk, sig, "'kinds' must be a cell array of strings");
%! pk.kinds = {k{1:2}, 3};
%! refuse_all (pk, sig, "'kinds' must be a cell array of strings");
%! pk.kinds = {k{1:2}, "weir"};
%! refuse_all (pk, sig, "unit \"O1\" has unknown kind \"weir\"");
%! pk.kinds = k(1:2);
%! refuse_all (pk, sig, "has 2 kinds but 3 names");
%! pk.kinds = k;
%! pk.names = {"T1", "F1", ["a"; "b"]};
%! refuse_all (pk, sig, "'names' must be a cell array of strings");
%! pk.names = {"T1", "F1", "O1"};
%! pk = rmfield (pk, "opt");
%! refuse_all (pk, sig, "lacks field 'opt'");
%! refuse_all ([good(), good()], sig, "NET must be a packed vesselnet network");
%! refuse_all (42, sig, "NET must be a packed vesselnet network");

%!function refuse_sig (pk, sig, pat)
%!  try
%!    __vn_simulate__ (pk, sig, [0; 1; 2], [], sim_opts ());
%!    error ("test_packed:no-error", "accepted a bad signal struct (%s)", pat);
%!  catch err
%!    if (strcmp (err.identifier, "test_packed:no-error"))
%!      rethrow (err);
%!    endif
%!    assert (! isempty (regexp (err.message, ["^vn_simulate: .*" pat], "once")),
%!            sprintf ("'%s' does not match '%s'", err.message, pat));
%!  end_try_catch
%!endfunction

%!test
%! [pk, sig] = good ();
%! s = sig;  s.unit = NaN;
%! refuse_sig (pk, s, "'unit' element 1 must be a whole number in \\[0, 2147483647\\], got NaN");
%! s = sig;  s.off = -1;
%! refuse_sig (pk, s, "'off' element 1 .* got -1");
%! s = sig;  s.len = s.len + 100;
%! refuse_sig (pk, s, "packed signal data are too short");
%! s = sig;  s.hold = 2;
%! refuse_sig (pk, s, "'hold' element 1 must be a whole number in \\[0, 1\\], got 2");
%! s = sig;  s.par = [s.par, s.par];
%! refuse_sig (pk, s, "'par' must have 1 elements, got 2");
%! s = sig;  s.unit = 17;
%! refuse_sig (pk, s, "signal 1: unit index 17 is outside the network");
%! s = sig;  s.data = {};
%! refuse_sig (pk, s, "'data' must be a real numeric array");
%! refuse_sig (pk, [sig, sig], "SIGNALS must be a packed signal struct");
