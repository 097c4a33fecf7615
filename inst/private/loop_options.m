## -*- texinfo -*-
## @deftypefn {} {@var{o} =} loop_options (@var{args}, @var{allowed}, @var{fn}, @var{name}, @var{kind}, @var{required})
## Parse name/value options of vn_controller / vn_switch / vn_heater into a
## struct; options in @var{required} must be present.
## @end deftypefn

function o = loop_options (args, allowed, fn, name, kind, required)
  o = struct ();
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "%s: %s \"%s\": options come in name/value pairs, got %d arguments after the name; allowed: %s",
           fn, fn(4:end), name, numel (args), strjoin (allowed, ", "));
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
             "%s: %s \"%s\": unknown option \"%s\"; allowed: %s", fn, fn(4:end), name,
             shown, strjoin (allowed, ", "));
    endif
    o.(lower (key)) = args{i+1};
  endfor
  if (nargin > 5)
    for req = required
      if (! isfield (o, req{1}))
        error ("Octave:invalid-input-arg", "%s: %s \"%s\": %s is required",
               fn, kind, name, upper (req{1}));
      endif
    endfor
  endif
endfunction
