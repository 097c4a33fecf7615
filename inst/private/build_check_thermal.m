## -*- texinfo -*-
## @deftypefn {} {} build_check_thermal (@var{fn}, @var{label}, @var{net}, @var{par}, @var{fields})
## Refuse energy options on a network that was not declared thermal.
## @end deftypefn

function build_check_thermal (fn, label, net, par, fields)
  if (net.options.thermal)
    return;
  endif
  for i = 1:numel (fields)
    if (isfield (par, fields{i}))
      build_error (fn, label, ["%s given (%s) but network \"%s\" is not ", ...
                               "thermal; declare it with vn_network (..., ", ...
                               "\"thermal\", true)"],
                   upper (fields{i}), build_value_str (par.(fields{i})),
                   net.name);
    endif
  endfor
endfunction
