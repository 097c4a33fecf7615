## -*- texinfo -*-
## @deftypefn {} {} loop_check_net (@var{net}, @var{name}, @var{fn})
## Check the network and the new unit's name for vn_controller / vn_switch.
## @end deftypefn

function loop_check_net (net, name, fn)
  if (! (isstruct (net) && isfield (net, "type")
         && strcmp (net.type, "vesselnet.network")))
    error ("Octave:invalid-input-arg",
           "%s: NET must be a network made by vn_network", fn);
  endif
  if (! ischar (name) || ! isvarname (name))
    error ("Octave:invalid-input-arg",
           "%s: NAME must be an identifier, got %s", fn, disp_name (name));
  endif
  build_check_reserved (fn, sprintf ("%s \"%s\"", fn(4:end), name), name);
  if (isfield (net.index, name))
    error ("Octave:invalid-input-arg",
           "%s: unit \"%s\" already exists in network \"%s\"", fn, name,
           net.name);
  endif
endfunction

function s = disp_name (v)
  if (ischar (v))
    s = ["\"" v "\""];
  else
    s = ["a " class(v)];
  endif
endfunction
