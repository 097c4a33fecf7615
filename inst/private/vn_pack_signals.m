## -*- texinfo -*-
## @deftypefn  {} {@var{sig} =} vn_pack_signals (@var{net}, @var{u}, @var{caller})
## @deftypefnx {} {@var{sig} =} vn_pack_signals (@var{net}, @var{u}, @var{caller}, @var{cn})
## Resolve signals made by vn_signal against a network and pack them for
## the core (doc/internals.md section 5).  Two signals on one input are an
## error.  Given the network's compiled form @var{cn} (vn_compile), the
## packed signals are kept with it: the same signals on the same network
## are packed once.  @code{sig.held} lists the signals (positions in
## @var{u}) on inputs that are not outputs of their unit, with
## @code{sig.hunit} and @code{sig.hvar}: the result gets those from the
## signal, not from the core.
##
## Each table is checked against its input's range (@code{signal_range}):
## non-finite points, and values outside the range of an input with a unit
## of measure, are errors under @var{caller}; a position (valve opening,
## pump speed) past its travel is clipped exactly.  @code{sig.u} holds the
## signals as the core gets them (clipped), for the result, and
## @code{sig.clips} the clipped ones as given, for
## @code{signal_clip_warn}.
## @end deftypefn

function sig = vn_pack_signals (net, u, caller, cn)
  persistent keys = {};
  persistent items = {};
  sig = [];
  if (isempty (u))
    return;
  endif
  if (nargin < 4)
    cn = vn_compile (net);
  endif
  key = [cn.key, __vn_hash__(u)];
  j = find (strcmp (keys, key), 1);
  if (! isempty (j) && ! strcmp (getenv ("VN_COMPILE_CACHE"), "0"))
    sig = items{j};
    return;
  endif
  layout = cn.layout;
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
  clips = [];
  uc = u;
  pos = 0;
  held = false (1, m);
  hunit = hvar = cell (1, m);
  s = vn_schema ();
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
    [t, v, c] = signal_range (caller, q, double (t), double (v),
                              logical (u(i).hold));
    clips = [clips, c];
    uc(i).t = t;
    uc(i).v = v;
    held(i) = ! any (strcmp (s.(q.kind).outputs, q.var));
    hunit{i} = q.uname;
    hvar{i} = q.var;
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
  sig.held = find (held);
  sig.hunit = hunit(held);
  sig.hvar = hvar(held);
  sig.u = uc;
  sig.clips = clips;
  if (! strcmp (getenv ("VN_COMPILE_CACHE"), "0"))
    keys = [{key}, keys(1:min (end, 7))];
    items = [{sig}, items(1:min (end, 7))];
  endif
endfunction
