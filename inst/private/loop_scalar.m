## -*- texinfo -*-
## @deftypefn {} {@var{v} =} loop_scalar (@var{v}, @var{field}, @var{name}, @var{fn}, @var{infok})
## Check a real scalar option (finite unless @var{infok}).
## @end deftypefn

function v = loop_scalar (v, field, name, fn, infok)
  if (! (isnumeric (v) && isreal (v) && isscalar (v)) || isnan (v)
      || (! infok && isinf (v)))
    error ("Octave:invalid-input-arg",
           "%s: %s \"%s\": %s must be a real %sscalar, got %s", fn,
           fn(4:end), name, upper (field), ifelse_str (infok), mat2str_safe (v));
  endif
  v = double (v);
endfunction

function s = mat2str_safe (v)
  if (isnumeric (v) && numel (v) <= 4)
    s = mat2str (v);
  else
    s = sprintf ("a %s of size %s", class (v), mat2str (size (v)));
  endif
endfunction

function t = ifelse_str (infok)
  if (infok)
    t = "";
  else
    t = "finite ";
  endif
endfunction
