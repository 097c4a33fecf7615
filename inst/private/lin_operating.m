## -*- texinfo -*-
## @deftypefn {} {[@var{net}, @var{x}, @var{states}, @var{held}] =} lin_operating (@var{net}, @var{op}, @var{caller})
## Resolve an operating point against a network for linear analysis.
##
## @var{op} is a struct from @code{vn_steady} (field @code{x}, the state
## vector; optional @code{net}, the network with its inputs at their steady
## values; optional @code{states}, the state names), a state vector, or []
## for the levels declared on the tanks.  When @var{op} carries a network,
## its input values (feed flows, valve openings, pump speeds, boundary
## heads) replace those of @var{net}; every other parameter stays as given
## in @var{net}.  A network in @var{op} with other units is an error.
##
## A network in @var{op} that lacks only on/off switches of @var{net} is
## an operating point with those switches frozen (@code{vn_steady (...,
## "freeze", true)}): they are taken out of the network returned, the
## inputs they drive held at the values in @var{op}.
##
## Returns the network to pack, the state vector (possibly []), the
## state names recorded in @var{op} (@{@} when none), which the caller
## compares with the names the core reports, and the names of the
## switches held (@{@} when none).
## @end deftypefn

function [net, x, states, held] = lin_operating (net, op, caller)

  states = {};
  held = {};
  if (isempty (op))
    x = [];
    return;
  endif
  if (isnumeric (op))
    if (! isreal (op) || ! isvector (op) || ! all (isfinite (op)))
      error ("Octave:invalid-input-arg",
             "%s: OP as a state vector must hold finite real numbers", caller);
    endif
    x = op(:);
    return;
  endif
  if (! isstruct (op) || ! isscalar (op) || ! isfield (op, "x"))
    error ("Octave:invalid-input-arg",
           "%s: OP must be an operating point from vn_steady (a struct with field x), a state vector or []",
           caller);
  endif
  x = op.x(:);
  if (! isnumeric (x) || ! isreal (x) || ! all (isfinite (x)))
    error ("Octave:invalid-input-arg",
           "%s: OP.x must hold the finite real states of the operating point",
           caller);
  endif
  if (isfield (op, "states") && iscellstr (op.states))
    states = op.states(:);
  endif
  if (isfield (op, "net") && ! isempty (op.net))
    [net, held] = take_inputs (net, op.net, caller);
  endif

endfunction

## Copy the input values of the operating point's network into NET.  An
## operating point found with switches frozen (vn_steady's "freeze") has
## them taken out and their inputs held: they are taken out of NET too.
function [net, held] = take_inputs (net, onet, caller)
  if (! isstruct (onet) || ! isfield (onet, "units"))
    error ("Octave:invalid-input-arg",
           "%s: OP.net must be a network made by vn_network", caller);
  endif
  held = {};
  mine = strcat ({net.units.name}, ":", {net.units.kind});
  theirs = strcat ({onet.units.name}, ":", {onet.units.kind});
  out = ! ismember (mine, theirs);
  if (any (out) && all (strcmp ({net.units(out).kind}, "switch"))
      && isequal (mine(! out), theirs))
    held = {net.units(out).name};
    net = vn_drop_units (net, find (out));
    mine = theirs;
  endif
  if (! isequal (mine, theirs))
    extra = setdiff (theirs, mine);
    missing = setdiff (mine, theirs);
    error ("Octave:invalid-input-arg",
           ["%s: the operating point is from another network: its units ", ...
            "differ (only in the op: %s; only in NET: %s)"], caller,
           list_or_none (extra), list_or_none (missing));
  endif
  s = vn_schema ();
  kinds = {net.units.kind};
  for kind = unique (kinds)
    k = s.(kind{1});
    names = k.params(k.isinput);
    if (isempty (names))
      continue;   # tanks, orifices: nothing to copy, however many
    endif
    for i = find (strcmp (kinds, kind{1}))
      for name = names
        if (isfield (onet.units(i).par, name{1}))
          net.units(i).par.(name{1}) = onet.units(i).par.(name{1});
        endif
      endfor
    endfor
  endfor
endfunction

function t = list_or_none (c)
  if (isempty (c))
    t = "none";
  else
    t = strjoin (c, ", ");
  endif
endfunction

%!test
%! ## Input values come from op.net, other parameters from NET.
%! net.units = struct ("name", {"T1", "F1"}, "kind", {"tank", "feed"},
%!                     "par", {struct("area", 2), struct("flow", 0.01)});
%! onet = net;
%! onet.units(1).par.area = 5;
%! onet.units(2).par.flow = 0.03;
%! [n2, x] = lin_operating (net, struct ("x", [4; 1], "net", onet), "t");
%! assert (n2.units(2).par.flow, 0.03);
%! assert (n2.units(1).par.area, 2);
%! assert (x, [4; 1]);
%! [~, x] = lin_operating (net, [], "t");
%! assert (isempty (x));

%!test
%! ## An operating point without a switch of NET: the switch is held.
%! net.units = struct ("name", {"T1", "P1", "LS1"}, "kind", {"tank", "pump", "switch"},
%!                     "par", {struct("area", 2), struct("speed", 0), struct()});
%! net.index = struct ("T1", 1, "P1", 2, "LS1", 3);
%! onet = net;
%! onet.units(3) = [];
%! onet.units(2).par.speed = 1;
%! [n2, ~, ~, held] = lin_operating (net, struct ("x", 4, "net", onet), "t");
%! assert (held, {"LS1"});
%! assert ({n2.units.name}, {"T1", "P1"});
%! assert (n2.units(2).par.speed, 1);

%!error <another network> lin_operating (struct ("units", struct ("name", {"T1"}, "kind", {"tank"})), struct ("x", 1, "net", struct ("units", struct ("name", {"T2"}, "kind", {"tank"}))), "t")
%!error <state vector> lin_operating (struct (), [1 NaN], "t")
