## -*- texinfo -*-
## @deftypefn {} {[@var{x}, @var{unit}, @var{ok}] =} units_text (@var{s})
## Split a text "VALUE UNIT" ("36 m3/h", "2400mm", "-5 degC", "1.2e3 L")
## into its number @var{x} and unit @var{unit} (blanks trimmed).
##
## The value is a decimal number with a point, optionally signed and with
## an exponent, or Inf; @var{ok} is false (and @var{x} NaN) when the text
## does not start with one or has no unit after it.
## @end deftypefn

function [x, unit, ok] = units_text (s)
  x = NaN;
  unit = "";
  ok = false;
  if (! (ischar (s) && rows (s) == 1))
    return;
  endif
  tok = regexp (s, ['^\s*([-+]?(?:(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?|Inf))', ...
                    '\s*((?<=\s)\S.*?|[^\d\s.,+\-eE].*?)\s*$'], "tokens", "once");
  if (isempty (tok))
    return;
  endif
  x = str2double (tok{1});
  unit = tok{2};
  ok = ! isnan (x);
endfunction

%!test
%! [x, u, ok] = units_text ("36 m3/h");
%! assert ({x, u, ok}, {36, "m3/h", true});
%! [x, u, ok] = units_text ("  -1.5e-3mm ");
%! assert ({x, u, ok}, {-1.5e-3, "mm", true});
%! [x, u] = units_text ("Inf m");
%! assert ({x, u}, {Inf, "m"});
%! [x, u] = units_text (".5 J/(kg K)");
%! assert ({x, u}, {0.5, "J/(kg K)"});
%!test
%! [x, u, ok] = units_text ("36");
%! assert (ok, false);
%! [x, u, ok] = units_text ("m3/h");
%! assert (ok, false);
%! [x, u, ok] = units_text ("1,5 m");
%! assert (ok, false);
%! [~, ~, ok] = units_text (36);
%! assert (ok, false);
