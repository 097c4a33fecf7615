## -*- texinfo -*-
## @deftypefn {} {@var{label} =} build_check_name (@var{fn}, @var{net}, @var{kind}, @var{name})
## Check the network and the name of a new unit; return its message label.
##
## The name must be an identifier (it becomes a field of results, as in
## @code{res.T1.level}) and must not be taken in the network.  The label,
## e.g. @samp{tank "T1"}, starts every later message about the unit.
## @end deftypefn

function label = build_check_name (fn, net, kind, name)
  build_check_net (fn, net);
  if (! (ischar (name) && rows (name) == 1))
    build_error (fn, kind, "NAME must be a char identifier, got %s",
                 build_value_str (name));
  endif
  label = sprintf ("%s \"%s\"", kind, name);
  if (! isvarname (name))
    build_error (fn, label, ["NAME must be an identifier (a letter, then ", ...
                             "letters, digits or _), got \"%s\""], name);
  endif
  build_check_reserved (fn, label, name);
  idx = build_find_unit (net, name);
  if (idx > 0)
    old = net.units(idx).kind;
    build_error (fn, label, ["NAME \"%s\" is already taken by a %s in ", ...
                             "network \"%s\"; unit names must be unique"],
                 name, old, net.name);
  endif
endfunction
