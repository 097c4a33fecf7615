## -*- texinfo -*-
## @deftypefn {} {@var{spec} =} build_nozzle_spec ()
## Option rows for the nozzle heights every flow element has.
##
## "outlet" is measured from the source's base, "inlet" from the
## destination's base (rows in the layout of build_options).
## @end deftypefn

function spec = build_nozzle_spec ()
  spec = {"outlet", "nonneg", "m", [];
          "inlet",  "nonneg", "m", []};
endfunction
