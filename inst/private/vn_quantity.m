## -*- texinfo -*-
## @deftypefn {} {@var{q} =} vn_quantity (@var{net}, @var{name}, @var{what}, @var{caller})
## Resolve a quantity "UNIT.VARIABLE" of a network.
##
## @var{what} is "input" (an input parameter a signal may drive), "output"
## (a reported variable) or "param" (any numeric parameter).  Returns a
## struct with the unit's position, kind, the 0-based parameter slot or
## output index, and the flat 0-based index into the core's vectors.
## @end deftypefn

function q = vn_quantity (net, name, what, caller)
  if (! ischar (name) || ! any (name == "."))
    error ("Octave:invalid-input-arg",
           "%s: a quantity is \"UNIT.VARIABLE\", got %s", caller,
           disp_value (name));
  endif
  dot = find (name == ".", 1);
  uname = name(1:dot-1);
  var = name(dot+1:end);
  if (! isfield (net.index, uname))
    error ("Octave:invalid-input-arg",
           "%s: quantity \"%s\": the network has no unit \"%s\"", caller,
           name, uname);
  endif
  s = vn_schema ();
  ui = net.index.(uname);
  kind = net.units(ui).kind;
  k = s.(kind);
  q.name = name;
  q.unit = ui;
  q.uname = uname;
  q.kind = kind;
  q.var = var;
  ## a declared species is carried in the core's slot c<k>
  ks = find (strcmp (net.options.species, var), 1);
  if (! isempty (ks) && any (strcmp (kind, {"tank", "feed", "boundary"})))
    var = sprintf ("c%d", ks);
  endif
  switch (what)
    case {"input", "param"}
      slot = find (strcmp (k.params, var), 1);
      if (strcmp (what, "input"))
        allowed = k.params(k.isinput);
        ok = ! isempty (slot) && k.isinput(slot);
      else
        allowed = k.params(! k.iscode);
        ok = ! isempty (slot) && ! k.iscode(slot);
      endif
      if (! ok)
        error ("Octave:invalid-input-arg",
               "%s: quantity \"%s\": %s is not %s of %s \"%s\"; allowed: %s",
               caller, name, var, ifelse_str (what), kind, uname,
               strjoin (allowed, ", "));
      endif
      q.slot = slot - 1;
      q.index = param_offset (net, s, ui) + slot - 1;
      q.unitofmeasure = k.units{slot};
    case "output"
      j = find (strcmp (k.outputs, var), 1);
      if (isempty (j))
        error ("Octave:invalid-input-arg",
               "%s: quantity \"%s\": %s is not an output of %s \"%s\"; outputs: %s",
               caller, name, var, kind, uname, strjoin (k.outputs, ", "));
      endif
      q.slot = j - 1;
      q.index = output_offset (net, s, ui) + j - 1;
      q.unitofmeasure = k.ounits{j};
  endswitch
endfunction

function t = ifelse_str (what)
  if (strcmp (what, "input"))
    t = "an input";
  else
    t = "a numeric parameter";
  endif
endfunction

function off = param_offset (net, s, ui)
  off = 0;
  for i = 1:ui-1
    off += numel (s.(net.units(i).kind).params);
  endfor
endfunction

function off = output_offset (net, s, ui)
  off = 0;
  for i = 1:ui-1
    off += numel (s.(net.units(i).kind).outputs);
  endfor
endfunction

function t = disp_value (v)
  if (ischar (v))
    t = ["\"" v "\""];
  else
    t = sprintf ("a %s", class (v));
  endif
endfunction
