## -*- texinfo -*-
## @deftypefn {} {@var{s} =} build_value_str (@var{v})
## Describe a value given by the user, for an error message.
## @end deftypefn

function s = build_value_str (v)
  if (ischar (v) && rows (v) <= 1)
    if (numel (v) > 40)
      v = [v(1:37) "..."];
    endif
    s = ["\"" v "\""];
  elseif ((isnumeric (v) || islogical (v)) && isscalar (v))
    if (islogical (v))
      s = ifelse (v, "true", "false");
    elseif (iscomplex (v))
      s = num2str (v);
    else
      s = sprintf ("%.6g", v);
    endif
  elseif (isempty (v))
    s = sprintf ("an empty %s", class (v));
  else
    dims = sprintf ("%dx", size (v));
    s = sprintf ("a %s %s", dims(1:end-1), class (v));
  endif
endfunction
