## -*- texinfo -*-
## @deftypefn {} {@var{o} =} loop_options (@var{args}, @var{allowed}, @var{fn}, @var{name})
## Parse name/value options of vn_controller / vn_switch into a struct.
## @end deftypefn

function o = loop_options (args, allowed, fn, name)
  o = struct ();
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "%s: unit \"%s\": options come in name/value pairs", fn, name);
  endif
  for i = 1:2:numel (args)
    key = args{i};
    if (! ischar (key) || ! any (strcmpi (key, allowed)))
      if (ischar (key))
        shown = key;
      else
        shown = class (key);
      endif
      error ("Octave:invalid-input-arg",
             "%s: unit \"%s\": unknown option \"%s\"; allowed: %s", fn, name,
             shown, strjoin (allowed, ", "));
    endif
    o.(lower (key)) = args{i+1};
  endfor
endfunction
