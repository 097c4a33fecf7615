## -*- texinfo -*-
## @deftypefn {} {[@var{names}, @var{vals}] =} vn_option_pairs (@var{args}, @var{fn})
## Split name/value option pairs, checking that they pair up and that every
## name is a string; messages begin with the caller's name @var{fn}.
## @end deftypefn

function [names, vals] = vn_option_pairs (args, fn)
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "%s: options come in name/value pairs", fn);
  endif
  names = args(1:2:end);
  vals = args(2:2:end);
  bad = find (! cellfun ("ischar", names), 1);
  if (! isempty (bad))
    error ("Octave:invalid-input-arg",
           "%s: option names must be strings (argument %d is a %s)", fn,
           2 * bad - 1, class (names{bad}));
  endif
endfunction

%!test
%! [n, v] = vn_option_pairs ({"dt", 5, "solver", "klu"}, "f");
%! assert (n, {"dt", "solver"});
%! assert (v, {5, "klu"});
%!error <f: options come in name/value pairs> vn_option_pairs ({"dt"}, "f")
%!error <f: option names must be strings \(argument 3> vn_option_pairs ({"dt", 1, 2, 3}, "f")
