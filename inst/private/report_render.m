## -*- texinfo -*-
## @deftypefn {} {@var{s} =} report_render (@var{blocks}, @var{markdown})
## Lay out a report: @var{blocks} is a cell array of
## @code{@{"h", TITLE@}}, @code{@{"p", TEXT@}} or
## @code{@{"t", HEADINGS, CELLS@}} (a table, CELLS rows x columns of
## text).  As plain text (@var{markdown} false) tables are aligned in
## columns, numbers to the right; as Markdown they are pipe tables and
## titles are headings.  Returns one char row, lines joined by newlines.
## @end deftypefn

function s = report_render (blocks, markdown)
  out = {};
  for i = 1:numel (blocks)
    b = blocks{i};
    switch (b{1})
      case "h"
        if (markdown)
          if (i == 1)
            out(end+1:end+2) = {["## " b{2}], ""};
          else
            out(end+1:end+3) = {"", ["### " b{2}], ""};
          endif
        else
          if (i > 1)
            out{end+1} = "";
          endif
          out{end+1} = b{2};
        endif
      case "p"
        if (markdown)
          out{end+1} = [b{2} "  "];
        else
          out{end+1} = b{2};
        endif
      case "t"
        out = [out, pipe_table(b{2}, b{3}, markdown)];
    endswitch
  endfor
  s = strjoin (out, "\n");
endfunction

function out = pipe_table (head, cells, markdown)
  head = head(:).';
  grid = [head; cells];
  w = max (cellfun (@numel, grid), [], 1);
  ## right-align columns whose cells all read as numbers (or "-")
  isnum = false (1, numel (head));
  for j = 1:numel (head)
    c = cells(:,j);
    isnum(j) = ! isempty (c) && all (cellfun (@(x) ! isempty (regexp (x, '^[-+]?([0-9.]+(e[-+]?[0-9]+)?|Inf|-)$', "once")), c));
  endfor
  out = cell (1, rows (grid) + markdown);
  for r = 1:rows (grid)
    parts = cell (1, numel (head));
    for j = 1:numel (head)
      if (isnum(j) && r > 1)
        parts{j} = sprintf ("%*s", w(j), grid{r,j});
      else
        parts{j} = sprintf ("%-*s", w(j), grid{r,j});
      endif
    endfor
    if (markdown)
      line = ["| " strjoin(parts, " | ") " |"];
    else
      line = ["  " strjoin(parts, "  ")];
    endif
    out{r + (markdown && r > 1)} = regexprep (line, '\s+$', "");
  endfor
  if (markdown)
    rule = cell (1, numel (head));
    for j = 1:numel (head)
      if (isnum(j))
        rule{j} = [repmat("-", 1, max (w(j) - 1, 2)) ":"];
      else
        rule{j} = repmat ("-", 1, max (w(j), 3));
      endif
    endfor
    out{2} = ["| " strjoin(rule, " | ") " |"];
    out = [{""}, out, {""}];
  endif
endfunction

%!test
%! b = {{"h", "fit"}, {"p", "rmse 4 mm"}, {"t", {"name", "value"}, {"a", "1.5"; "bb", "-"}}};
%! s = report_render (b, false);
%! assert (s, "fit\nrmse 4 mm\n  name  value\n  a       1.5\n  bb        -");
%! m = report_render (b, true);
%! assert (! isempty (strfind (m, "## fit")));
%! assert (! isempty (strfind (m, "| name | value |\n| ---- | ----: |\n| a    |   1.5 |")));
