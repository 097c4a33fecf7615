## -*- texinfo -*-
## @deftypefn {} {} build_check_table (@var{fn}, @var{label}, @var{tab})
## Check a strapping table [level volume] of a tank.
##
## K x 2 (K >= 2), finite, non-negative, both columns strictly increasing so
## that level and volume map one to one; the first row may be [0 0].
## @end deftypefn

function build_check_table (fn, label, tab)
  if (! (isnumeric (tab) && isreal (tab) && ndims (tab) == 2
         && columns (tab) == 2 && rows (tab) >= 2))
    build_error (fn, label, ["TABLE must be a K x 2 matrix [level (m), ", ...
                             "volume (m3)] with K >= 2, got %s"],
                 build_value_str (tab));
  endif
  if (! all (isfinite (tab(:))) || any (tab(:) < 0))
    [r, c] = find (! isfinite (tab) | tab < 0, 1);
    build_error (fn, label, ["TABLE must hold finite non-negative values, ", ...
                             "got %s in row %d, column %d"],
                 build_value_str (tab(r,c)), r, c);
  endif
  col = {"levels (m)", "volumes (m3)"};
  for c = 1:2
    k = find (diff (tab(:,c)) <= 0, 1);
    if (! isempty (k))
      build_error (fn, label, ["TABLE %s must increase strictly, got ", ...
                               "%s in row %d then %s in row %d"], col{c},
                   build_value_str (tab(k,c)), k, build_value_str (tab(k+1,c)),
                   k + 1);
    endif
  endfor
endfunction
