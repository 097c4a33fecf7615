## -*- texinfo -*-
## @deftypefn {} {@var{sig} =} vn_pack_signals (@var{net}, @var{u}, @var{caller})
## Resolve signals made by vn_signal against a network and pack them for
## the core (doc/internals.md section 5).  Two signals on one input are an
## error.
## @end deftypefn

function sig = vn_pack_signals (net, u, caller)
  sig = [];
  if (isempty (u))
    return;
  endif
  if (! isstruct (u) || ! all (isfield (u, {"quantity", "t", "v", "hold"})))
    error ("Octave:invalid-input-arg",
           "%s: U must be signals made by vn_signal (a struct array)", caller);
  endif
  m = numel (u);
  unit = zeros (1, m, "int32");
  slot = zeros (1, m, "int32");
  off = zeros (1, m, "int32");
  len = zeros (1, m, "int32");
  hold = zeros (1, m, "int32");
  data = cell (1, m);
  seen = {};
  pos = 0;
  layout = vn_quantity (net);
  for i = 1:m
    q = vn_quantity (net, u(i).quantity, "input", caller, layout);
    if (any (strcmp (seen, q.name)))
      error ("Octave:invalid-input-arg",
             "%s: two signals drive \"%s\"; give one table per input",
             caller, q.name);
    endif
    seen{end+1} = q.name;
    t = u(i).t(:);
    v = u(i).v(:);
    if (numel (t) != numel (v) || isempty (t))
      error ("Octave:invalid-input-arg",
             "%s: signal on \"%s\" needs as many times as values (got %d and %d)",
             caller, q.name, numel (t), numel (v));
    endif
    unit(i) = q.unit - 1;
    slot(i) = q.slot;
    off(i) = pos;
    len(i) = numel (t);
    hold(i) = logical (u(i).hold);
    data{i} = reshape ([t v].', [], 1);
    pos += numel (t);
  endfor
  sig.unit = unit;
  sig.par = slot;
  sig.off = off;
  sig.len = len;
  sig.hold = hold;
  sig.data = vertcat (data{:});
endfunction
