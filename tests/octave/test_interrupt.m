## Ctrl-C from Octave: a child octave-cli, fed commands on its standard
## input as a user would type them, starts a simulation that would run for
## hours (1e6 s at a step of at most 1 ms), receives SIGINT, and must stop
## with a catchable error (id vesselnet:interrupted) that says where it
## stopped; the same session must then run the next command with its
## workspace as it was.  The only time bound is generous: the child must
## answer within 30 s of the signal (it takes well under a second).
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_interrupt.m")'

%!function send (fid, line)
%!  fputs (fid, [line, "\n"]);
%!endfunction

## Wait until FILE holds PATTERN or LIMIT seconds pass; returns its text.
%!function [txt, ok] = wait_for (file, pattern, limit)
%!  t0 = tic ();
%!  ok = false;
%!  txt = "";
%!  while (toc (t0) < limit)
%!    if (exist (file, "file"))
%!      txt = fileread (file);
%!      if (! isempty (regexp (txt, pattern, "once")))
%!        ok = true;
%!        return;
%!      endif
%!    endif
%!    pause (0.2);
%!  endwhile
%!endfunction

%!test
%! if (! exist ("popen2") || ! exist ("kill"))
%!   warning ("test_interrupt: popen2 or kill missing, test skipped");
%!   return;
%! endif
%! inst = fileparts (which ("vn_network"));
%! oct = fileparts (which ("__vn_simulate__"));
%! log = [tempname(), ".log"];
%! ## exec: the pid popen2 returns is then octave-cli's own
%! cmd = sprintf ("exec octave-cli --no-gui --norc -q > '%s' 2>&1", log);
%! [in, out, pid] = popen2 ("sh", {"-c", cmd});
%! assert (pid > 0);
%! unwind_protect
%!   send (in, sprintf ('addpath ("%s"); addpath ("%s"); more off;', inst, oct));
%!   send (in, 'keep = 42; kept = {"tank", [1 2 3]};');
%!   send (in, 'net = vn_network ("long");');
%!   send (in, 'net = vn_tank (net, "T1", "area", 2, "level", 2);');
%!   send (in, 'net = vn_feed (net, "F1", "T1", "flow", 0.01);');
%!   send (in, 'net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);');
%!   ## a short run first, so the long one is in the core at once
%!   send (in, 'r0 = vn_simulate (net, [0 1], "dt", 1);');
%!   send (in, 'disp ("child: running"); fflush (stdout);');
%!   send (in, ['try, r = vn_simulate (net, [0 1e6], "dt", 1e4, ', ...
%!              '"maxstep", 1e-3, "maxsteps", 1e9); ', ...
%!              'disp ("child: finished"); ', ...
%!              'catch err, printf ("child: caught <%s> <%s>\n", ', ...
%!              'err.identifier, err.message); end; fflush (stdout);']);
%!   fflush (in);
%!   [txt, ok] = wait_for (log, "child: running", 120);
%!   assert (ok, "the child session did not start: %s", txt);
%!   ## let the simulation get well under way inside the core
%!   pause (3);
%!   txt = fileread (log);
%!   assert (isempty (strfind (txt, "child: finished")), "the run ended by itself");
%!   kill (pid, 2);
%!   [txt, ok] = wait_for (log, "child: caught", 30);
%!   assert (ok, "no error within 30 s of SIGINT: %s", txt);
%!   m = regexp (txt, "child: caught <([^>]*)> <([^>]*)>", "tokens", "once");
%!   assert (m{1}, "vesselnet:interrupted");
%!   ## the message names the command and where the run stopped
%!   assert (! isempty (regexp (m{2}, "^vn_simulate: .*interrupted at t = [0-9.e+]+ s", "once")), m{2});
%!   t = str2double (regexp (m{2}, "t = ([0-9.e+]+) s", "tokens", "once"){1});
%!   assert (t > 0 && t < 1e6, "stopped part-way, t = %g s", t);
%!   ## the same session goes on, workspace intact
%!   send (in, ['printf ("child: after <%d> <%s> <%d> <%d>\n", ', ...
%!              'keep, kept{1}, sum (kept{2}), exist ("r")); fflush (stdout);']);
%!   send (in, ['r = vn_simulate (net, [0 100], "dt", 50); ', ...
%!              'printf ("child: rerun <%.6f>\n", r.T1.level(end)); ', ...
%!              'fflush (stdout);']);
%!   fflush (in);
%!   [txt, ok] = wait_for (log, "child: rerun <[^>]*>", 60);
%!   assert (ok, "the session did not go on after the interrupt: %s", txt);
%!   a = regexp (txt, "child: after <(\\d+)> <(\\w+)> <(\\d+)> <(\\d+)>", "tokens", "once");
%!   assert (str2double (a{1}), 42);
%!   assert (a{2}, "tank");
%!   assert (str2double (a{3}), 6);
%!   assert (str2double (a{4}), 0);   # the interrupted call assigned nothing
%!   ## the rerun is a real run: from 2 m the level falls towards
%!   ## (F/c)^2 = 1 m (Torricelli, memory); the fall rate (c sqrt(h) - F)/A
%!   ## shrinks as h falls, so 100 s at the start rate overstates the drop
%!   ## and 100 s at the end rate understates it
%!   lv = str2double (regexp (txt, "child: rerun <([^>]*)>", "tokens", "once"){1});
%!   rate = @(h) (0.01 * sqrt (h) - 0.01) / 2;
%!   assert (lv > 2 - 100 * rate (2) && lv < 2 - 100 * rate (lv),
%!           "level after 100 s: %g m", lv);
%! unwind_protect_cleanup
%!   fclose (in);
%!   fclose (out);
%!   ## the child ends at the end of its input; make sure of it
%!   for k = 1:50
%!     if (waitpid (pid, WNOHANG ()) != 0)
%!       break;
%!     endif
%!     pause (0.2);
%!   endfor
%!   if (k == 50)
%!     kill (pid, 9);
%!     waitpid (pid);
%!   endif
%!   if (exist (log, "file"))
%!     delete (log);
%!   endif
%! end_unwind_protect
