## -*- texinfo -*-
## @deftypefn {} {} build_check_inlet (@var{fn}, @var{label}, @var{to}, @var{par})
## Refuse an inlet height on a flow element that discharges freely.
## @end deftypefn

function build_check_inlet (fn, label, to, par)
  if (isempty (to) && isfield (par, "inlet"))
    build_error (fn, label, ["INLET given (%s m) but TO is \"\" (free ", ...
                             "discharge), which has no inlet; allowed only ", ...
                             "with a destination unit"], build_value_str (par.inlet));
  endif
endfunction
