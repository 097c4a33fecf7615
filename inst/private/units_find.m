## -*- texinfo -*-
## @deftypefn {} {[@var{i}, @var{canon}] =} units_find (@var{u})
## Position of the unit spelled @var{u} in @code{units_table}, 0 if unknown.
##
## Spellings are matched exactly (units are case-sensitive: mbar is not
## Mbar) after a few typographic forms found in plant exports are
## normalised: surrounding blanks; superscript two and three and "^" in
## powers ("m³/h", "m^3/h"); the degree sign ("°C", "°F", also in Latin-1);
## "deg C"; "hr" for the hour.  @var{canon} is the table's spelling.
## @end deftypefn

function [i, canon] = units_find (u)
  i = 0;
  canon = "";
  if (! (ischar (u) && rows (u) <= 1))
    return;
  endif
  t = units_table ();
  u = strtrim (u);
  i = find (strcmp (t.unit, u), 1);
  if (isempty (i))
    i = find (strcmp (t.unit, normalise (u)), 1);
  endif
  if (isempty (i))
    i = 0;
  else
    canon = t.unit{i};
  endif
endfunction

function u = normalise (u)
  ## UTF-8 forms first, then the single Latin-1 bytes
  reps = {char([194 178]), "2"; char([194 179]), "3"; char([194 176]), "deg";
          char([194 186]), "deg"; char([226 132 131]), "degC";
          char(178), "2"; char(179), "3"; char(176), "deg"; char(186), "deg";
          "^", ""};
  for k = 1:rows (reps)
    u = strrep (u, reps{k,1}, reps{k,2});
  endfor
  if (all (u < 128))
    u = regexprep (u, "^deg ?([CF])$", "deg$1");
    u = regexprep (u, "(?<=/)hr$", "h");
  endif
endfunction

%!assert (units_find ("m3/h") > 0)
%!assert (units_find ("m³/h"), units_find ("m3/h"))
%!assert (units_find ("m^3/h"), units_find ("m3/h"))
%!assert (units_find (" m3/hr "), units_find ("m3/h"))
%!assert (units_find (["" char([194 176]) "C"]), units_find ("degC"))
%!assert (units_find ([char(176) "F"]), units_find ("degF"))
%!assert (units_find ("deg C"), units_find ("degC"))
%!assert (units_find ("Mbar"), 0)
%!assert (units_find ("furlong"), 0)
%!assert (units_find (3), 0)
%!test
%! [i, c] = units_find ("ft²");
%! assert (c, "ft2");
