## -*- texinfo -*-
## @deftypefn {} {} vn_rethrow (@var{err}, @var{fn})
## Rethrow an error caught from a command called inside command @var{fn},
## under @var{fn}'s name: a message that starts "vn_linearize: " or
## "vesselnet: " then starts "@var{fn}: ", so the user reads the name of
## the command they called.  The identifier is kept.
## @end deftypefn

function vn_rethrow (err, fn)
  msg = regexprep (err.message, '^(vn_\w+|vesselnet): ', [fn ': '], "once");
  e = struct ("message", msg, "identifier", err.identifier,
              "stack", err.stack);
  error (e);
endfunction

%!test
%! try
%!   error ("Octave:invalid-input-arg", "vn_linearize: quantity \"T2.x\": no");
%! catch err
%!   try
%!     vn_rethrow (err, "vn_stepresponse");
%!   catch e2
%!     assert (e2.message, "vn_stepresponse: quantity \"T2.x\": no");
%!     assert (e2.identifier, "Octave:invalid-input-arg");
%!   end_try_catch
%! end_try_catch
