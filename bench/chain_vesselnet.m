## -*- texinfo -*-
## @deftypefn  {} {[@var{t}, @var{h}, @var{stats}, @var{net}] =} chain_vesselnet (@var{N})
## @deftypefnx {} {[@var{t}, @var{h}, @var{stats}, @var{net}] =} chain_vesselnet (@var{net})
## Build the N-tank benchmark chain with vesselnet's builders and simulate it.
##
## The chain is the one of bench/README.md: tanks @code{T1} @dots{}
## @code{TN} of area 1 m2 starting at 1 m, feed @code{F} of 0.01 m3/s into
## @code{T1}, orifices @code{O1} @dots{} @code{ON} of coefficient
## 0.01 m2.5/s, the last one discharging freely.  The run covers 0 to
## 3600 s with output every 5 s, relative tolerance 1e-6 and absolute
## tolerance 1e-8 m3, as in the two baselines.
##
## Given a network @var{net} made by an earlier call, it is simulated
## again without being rebuilt.
##
## @var{t} is the 721x1 column of output times (s), @var{h} the 721xN
## levels (m).  @var{stats} holds the core's counts (@code{steps},
## @code{rhs}, @code{jac}), @code{wall} (integration time measured inside
## the core, s), @code{call} (the whole @code{vn_simulate} call including
## packing and unpacking, s), @code{build} (the builder calls, one per kind
## in their bulk form, s; 0 when @var{net} was given) and @code{bytes}
## (size of the result structure).
##
## This is a benchmark case, not a user command.
## @seealso{chain_ode15s, vn_simulate}
## @end deftypefn

function [t, h, stats, net] = chain_vesselnet (N, record)

  if (nargin < 1 || nargin > 2)
    print_usage ();
  endif
  if (nargin < 2)
    record = "all";
  endif
  tbuild = 0;
  if (isstruct (N))
    net = N;
  else
    if (! (isreal (N) && isscalar (N) && N == fix (N) && N >= 1))
      error ("Octave:invalid-input-arg",
             "chain_vesselnet: N (number of tanks) must be an integer >= 1, got %s",
             mat2str (N));
    endif
    t0 = tic ();
    net = build_chain (N);
    tbuild = toc (t0);
  endif

  t0 = tic ();
  ## "levels" records what the floor records; "all" every output
  args = {"dt", 5, "reltol", 1e-6, "abstol", 1e-8};
  if (strcmp (record, "levels"))
    args(end+1:end+2) = {"record", "levels"};
  endif
  res = vn_simulate (net, [0 3600], args{:});
  tcall = toc (t0);

  t = res.t;
  ## All states are tank volumes of area 1 m2, in tank order.
  h = res.x;
  if (rows (h) != numel (t))
    h = h.';
  endif
  info = whos ("res");
  stats = struct ("steps", res.stats.steps, "rhs", res.stats.rhs,
                  "jac", res.stats.jac, "wall", res.stats.wall,
                  "call", tcall, "build", tbuild, "bytes", info.bytes);

endfunction

## One builder call per kind, in the bulk form (cell arrays of names).
function net = build_chain (N)
  tanks = arrayfun (@(i) sprintf ("T%d", i), 1:N, "UniformOutput", false);
  orifices = arrayfun (@(i) sprintf ("O%d", i), 1:N, "UniformOutput", false);
  net = vn_network ("chain");
  net = vn_tank (net, tanks, "area", 1.0, "level", 1.0);
  net = vn_feed (net, "F", "T1", "flow", 0.01);
  ## Orifice i joins T(i) to T(i+1); the last one discharges freely.
  net = vn_orifice (net, orifices, tanks, [tanks(2:end), {""}],
                    "coeff", 0.01);
endfunction

%!test
%! ## One tank fed at 0.01 m3/s through c = 0.01 at h = 1 m is at rest
%! ## (Torricelli orifice law q = c sqrt (h), common practice).
%! [t, h, stats] = chain_vesselnet (1);
%! assert (size (h), [721 1]);
%! assert (t([1 2 end]), [0; 5; 3600]);
%! assert (h, ones (721, 1), 1e-6);
%! assert (stats.build > 0);

%!test
%! ## Two tanks approach h = [2 1] m; chain_floor 2 gives [1.99933 0.99959]
%! ## after 3600 s (bench/README.md).
%! [~, h, stats, net] = chain_vesselnet (2);
%! assert (h(end,:), [1.99933 0.99959], 2e-5);
%! assert (stats.steps > 10);
%! [~, h2, stats2] = chain_vesselnet (net);
%! assert (h2, h);
%! assert (stats2.build, 0);

%!error <N \(number of tanks\)> chain_vesselnet (0)
%!error chain_vesselnet ()
