## vn_ensemble on MPI ranks: the standalone program src/cluster/vn_cluster.c
## started by a launcher on this machine (mpirun -np 2 on localhost) must
## give the records the threaded run gives.  Skipped when MPI (mpirun, or
## the program, built only where mpicc exists) is missing.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_cluster.m")'

%!function ok = have_mpi ()
%!  bin = fullfile (fileparts (which ("__vn_ensemble__")), "..", "bin",
%!                  "vn_cluster");
%!  ok = (! isempty (file_in_path (getenv ("PATH"), "mpirun"))
%!        && exist (bin, "file"));
%!endfunction

%!function l = launcher ()
%!  l = "mpirun -np 2 --oversubscribe";
%!  [~, who] = system ("id -u");
%!  if (str2double (who) == 0)
%!    l = [l " --allow-run-as-root"];
%!  endif
%!endfunction

%!function net = plant ()
%!  net = vn_network ("c");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%!  net = vn_tank (net, "T2", "area", 1.5, "level", 1.0);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.01);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01);
%!  net = vn_valve (net, "V1", "T2", "", "kv", 30, "opening", 0.5);
%!  net = vn_controller (net, "LC1", "measure", "T2.level", "manipulate",
%!                       "V1.opening", "setpoint", 1.2, "gain", -0.8,
%!                       "reset", 120, "action", "direct", "limits", [0 1]);
%!endfunction

%!testif ; have_mpi ()
%! ## seven runs over two ranks (uneven), one of them failing
%! net = plant ();
%! u = vn_signal ("F1.flow", "step", 200, 0.01, 0.014);
%! c = [0.006 0.01 -1 0.014 0.02 0.012 0.008];
%! a = [1.0 1.5 2.0 2.5 3.0 1.8 1.2];
%! args = {"vary", {"O1.coeff", c, "T2.area", a}, "dt", 10};
%! th = vn_ensemble (net, [0 600], u, args{:}, "workers", 2);
%! cl = vn_ensemble (net, [0 600], u, args{:}, "cluster", launcher ());
%! assert (cl.names, th.names);
%! assert (isequaln (cl.y, th.y));
%! assert (cl.params, th.params);
%! assert ([cl.failed.run], 3);
%! assert (cl.failed(1).message, th.failed(1).message);
%! assert (cl.mean, th.mean, 0);
%! assert (cl.p95, th.p95, 0);
%! assert (cl.stats.steps, th.stats.steps);

%!testif ; have_mpi ()
%! ## a launcher that fails is reported with its output
%! net = plant ();
%! try
%!   vn_ensemble (net, [0 60], "vary", {"O1.coeff", [0.01 0.02]},
%!                "cluster", "false");
%!   assert (false);
%! catch err
%!   assert (err.identifier, "vesselnet:cluster-failure");
%!   assert (! isempty (strfind (err.message, "ended with status 1")));
%! end_try_catch

%!error <option "cluster" must be the launcher> vn_ensemble (plant (), [0 10], "vary", {"O1.coeff", 1}, "cluster", 3)
