## -*- texinfo -*-
## @deftypefn  {} {@var{q} =} vn_quantity (@var{net}, @var{name}, @var{what}, @var{caller})
## @deftypefnx {} {@var{q} =} vn_quantity (@var{net}, @var{name}, @var{what}, @var{caller}, @var{layout})
## @deftypefnx {} {@var{layout} =} vn_quantity (@var{net})
## Resolve a quantity "UNIT.VARIABLE" of a network.
##
## @var{what} is "input" (an input parameter a signal may drive), "output"
## (a reported variable) or "param" (any numeric parameter).  Returns a
## struct with the unit's position, kind, the 0-based parameter slot or
## output index, and the flat 0-based index into the core's vectors.
##
## With the network alone, return its @var{layout}: @code{poff} and
## @code{ooff}, the 0-based offset of each unit's block in the flat
## parameter and output vectors.  Callers that resolve many quantities of
## one network compute it once and pass it on.
## @end deftypefn

function q = vn_quantity (net, name, what, caller, layout)
  if (nargin == 1)
    q = unit_layout (net.units, vn_schema (), numel (net.options.species));
    return;
  elseif (nargin < 5)
    layout = [];
  endif
  if (! ischar (name) || ! any (name == "."))
    error ("Octave:invalid-input-arg",
           "%s: a quantity is \"UNIT.VARIABLE\", got %s", caller,
           disp_value (name));
  endif
  dot = find (name == ".", 1);
  uname = name(1:dot-1);
  var = name(dot+1:end);
  ui = build_find_unit (net, uname);
  if (ui == 0)
    names = {net.units.name};
    if (numel (names) > 20)
      names = [names(1:20), {sprintf("... (%d more)", numel (names) - 20)}];
    endif
    error ("Octave:invalid-input-arg",
           "%s: quantity \"%s\": the network has no unit \"%s\"; units: %s",
           caller, name, uname, strjoin (names, ", "));
  endif
  s = vn_schema ();
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
        allowed = user_names (net, allowed);
        if (isempty (allowed))
          error ("Octave:invalid-input-arg",
                 "%s: quantity \"%s\": %s is not %s of %s \"%s\": a %s has no %s; %s in network \"%s\": %s",
                 caller, name, q.var, ifelse_str (what), kind, uname, kind,
                 plural (what), plural (what), net.name,
                 strjoin (network_inputs (net, s), ", "));
        endif
        error ("Octave:invalid-input-arg",
               "%s: quantity \"%s\": %s is not %s of %s \"%s\"; allowed: %s",
               caller, name, q.var, ifelse_str (what), kind, uname,
               strjoin (allowed, ", "));
      endif
      q.slot = slot - 1;
      q.index = unit_offset (net, s, ui, "poff", layout) + slot - 1;
      q.unitofmeasure = k.units{slot};
    case "output"
      [outs, ounits] = vn_outputs_of (net, kind);
      j = find (strcmp (outs, var), 1);
      if (isempty (j))
        shown = outs;
        if (strcmp (kind, "tank"))
          shown = [shown(1:5), net.options.species(:).'];
        endif
        error ("Octave:invalid-input-arg",
               "%s: quantity \"%s\": %s is not an output of %s \"%s\"; outputs: %s",
               caller, name, q.var, kind, uname, strjoin (shown, ", "));
      endif
      q.slot = j - 1;
      q.index = unit_offset (net, s, ui, "ooff", layout) + j - 1;
      q.unitofmeasure = ounits{j};
  endswitch
endfunction

## Parameter names as a user types them: the core's species slots c1..c8
## become the declared species (none when there are none), and a
## temperature is listed only in a thermal network.
function names = user_names (net, names)
  sp = net.options.species;
  keep = true (size (names));
  for i = 1:numel (names)
    k = sscanf (names{i}, "c%d");
    if (! isempty (k) && strcmp (names{i}, sprintf ("c%d", k)))
      if (k <= numel (sp))
        names{i} = sp{k};
      else
        keep(i) = false;
      endif
    elseif (strcmp (names{i}, "temperature") && ! net.options.thermal)
      keep(i) = false;
    endif
  endfor
  names = names(keep);
endfunction

## Every input quantity of the network, for a message.
function list = network_inputs (net, s)
  list = {};
  for i = 1:numel (net.units)
    k = s.(net.units(i).kind);
    p = user_names (net, k.params(k.isinput));
    list = [list, strcat([net.units(i).name "."], p)];
  endfor
  if (isempty (list))
    list = {"none"};
  endif
endfunction

function t = plural (what)
  if (strcmp (what, "input"))
    t = "inputs";
  else
    t = "numeric parameters";
  endif
endfunction

function t = ifelse_str (what)
  if (strcmp (what, "input"))
    t = "an input";
  else
    t = "a numeric parameter";
  endif
endfunction

## Offset of unit UI's block, from LAYOUT or else from the units up to UI.
function off = unit_offset (net, s, ui, field, layout)
  if (isempty (layout))
    layout = unit_layout (net.units(1:ui), s, numel (net.options.species));
  endif
  off = layout.(field)(ui);
endfunction

## Offsets of every unit's parameter and output blocks (0-based).
function layout = unit_layout (units, s, nspecies)
  [~, code] = ismember ({units.kind}, s.kinds);
  np = cellfun (@(k) numel (s.(k).params), s.kinds);
  no = cellfun (@(k) s.(k).nout_base + nspecies * s.(k).nout_species, s.kinds);
  layout.poff = [0, cumsum(np(code(1:end-1)))];
  layout.ooff = [0, cumsum(no(code(1:end-1)))];
  layout.poff = layout.poff(1:numel (code));
  layout.ooff = layout.ooff(1:numel (code));
endfunction

function t = disp_value (v)
  if (ischar (v))
    t = ["\"" v "\""];
  else
    t = sprintf ("a %s", class (v));
  endif
endfunction
