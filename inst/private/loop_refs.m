## -*- texinfo -*-
## @deftypefn {} {@var{aux} =} loop_refs (@var{net}, @var{name}, @var{o}, @var{fn})
## Check the measured quantity (an output) and the driven input of a
## controller or switch, and that no other unit already drives the input.
## @end deftypefn

function aux = loop_refs (net, name, o, fn)
  for f = {"measure", "manipulate"}
    if (! (ischar (o.(f{1})) && rows (o.(f{1})) <= 1))
      error ("Octave:invalid-input-arg",
             "%s: %s \"%s\": %s must be a quantity \"UNIT.VARIABLE\", got a %s",
             fn, fn(4:end), name, upper (f{1}), class (o.(f{1})));
    endif
  endfor
  label = sprintf ("%s: %s \"%s\"", fn, fn(4:end), name);
  vn_quantity (net, o.measure, "output", label);
  vn_quantity (net, o.manipulate, "input", label);
  if (strcmp (o.measure, o.manipulate))
    error ("Octave:invalid-input-arg",
           "%s: MEASURE and MANIPULATE are both \"%s\": a loop may not measure the very input it sets; measure a variable that input moves (a level, a flow downstream)",
           label, o.measure);
  endif
  for i = 1:numel (net.units)
    u = net.units(i);
    if (any (strcmp (u.kind, {"controller", "switch"}))
        && strcmp (u.aux.manipulate, o.manipulate))
      error ("Octave:invalid-input-arg",
             "%s: %s \"%s\": %s is already driven by \"%s\"; one controller or switch per input",
             fn, fn(4:end), name, o.manipulate, u.name);
    endif
  endfor
  aux.measure = o.measure;
  aux.manipulate = o.manipulate;
endfunction
