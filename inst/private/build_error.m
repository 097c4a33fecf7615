## -*- texinfo -*-
## @deftypefn {} {} build_error (@var{fn}, @var{label}, @var{fmt}, @dots{})
## Throw a bad-argument error of a network builder.
##
## The message reads "@var{fn}: @var{label}: ..." so that it names the
## function and the unit; @var{label} may be empty.
## @end deftypefn

function build_error (fn, label, fmt, varargin)
  if (isempty (label))
    head = [fn ": "];
  else
    head = [fn ": " label ": "];
  endif
  error ("Octave:invalid-input-arg", [head fmt], varargin{:});
endfunction
