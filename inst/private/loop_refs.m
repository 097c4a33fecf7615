## -*- texinfo -*-
## @deftypefn {} {@var{aux} =} loop_refs (@var{net}, @var{name}, @var{o}, @var{fn})
## Check the measured quantity (an output) and the driven input of a
## controller or switch, and that no other unit already drives the input.
## @end deftypefn

function aux = loop_refs (net, name, o, fn)
  for f = {"measure", "manipulate"}
    if (! ischar (o.(f{1})))
      error ("Octave:invalid-input-arg",
             "%s: unit \"%s\": %s must be a quantity \"UNIT.VARIABLE\"", fn,
             name, upper (f{1}));
    endif
  endfor
  vn_quantity (net, o.measure, "output", sprintf ("%s: unit \"%s\"", fn, name));
  vn_quantity (net, o.manipulate, "input", sprintf ("%s: unit \"%s\"", fn, name));
  for i = 1:numel (net.units)
    u = net.units(i);
    if (any (strcmp (u.kind, {"controller", "switch"}))
        && strcmp (u.aux.manipulate, o.manipulate))
      error ("Octave:invalid-input-arg",
             "%s: unit \"%s\": %s is already driven by \"%s\"; one controller or switch per input",
             fn, name, o.manipulate, u.name);
    endif
  endfor
  aux.measure = o.measure;
  aux.manipulate = o.manipulate;
endfunction
