## -*- texinfo -*-
## @deftypefn {} {@var{res} =} vn_results (@var{net}, @var{t}, @var{X}, @var{Y}, @var{states}, @var{u})
## Assemble a result struct: one field per unit with one column per output
## and per input, units of measure in res.units (doc/internals.md section 7).
##
## Units are assembled one kind at a time and the struct is made in one
## step, so the cost grows with the number of units, not its square.
## Carried properties get their network names through vn_props_names,
## applied once per kind to a template and then to every unit of that kind.
## @end deftypefn

function res = vn_results (net, t, X, Y, states, u)
  s = vn_schema ();
  t = t(:);
  nt = numel (t);
  U = net.units;
  n = numel (U);
  kinds = {U.kind};
  names = {U.name};
  layout = vn_quantity (net);
  ## Units whose inputs a signal or a loop sets are finished one by one.
  touched = false (1, n);
  for i = 1:numel (u)
    touched(unit_of (net, u(i).quantity)) = true;
  endfor
  isloop = find (strcmp (kinds, "controller") | strcmp (kinds, "switch"));
  for i = isloop
    touched(unit_of (net, U(i).aux.manipulate)) = true;
  endfor

  R = cell (1, n);
  M = cell (1, n);
  slow = touched;
  kk = unique (kinds);
  for c = 1:numel (kk)
    idx = find (strcmp (kinds, kk{c}));
    k = s.(kk{c});
    ## outputs, then the inputs held at their declared values
    inp = find (k.isinput);
    inp = inp(! ismember (k.params(inp), k.outputs));
    [outs, ounits] = vn_outputs_of (net, kk{c});
    F = [outs(:); k.params(inp)(:)];
    uom = [ounits(:); k.units(inp)(:)];
    no = numel (outs);
    vals = input_values (U(idx), k, inp);
    m = cell2struct (uom, F, 1);
    plain = ! touched(idx);
    src = [];
    if (any (plain))
      [src, F2, m2] = props_map (net, U(idx(find (plain, 1))), F, m);
      if (isempty (src))
        ## The renaming is not a plain field map: unit by unit.
        slow(idx) = true;
        plain(:) = false;
      else
        ## Only the columns the result keeps are taken out of Y.
        rk = cell2struct (columns_of (Y, layout.ooff(idx(plain)), vals(:,plain),
                                      no, src, nt), F2, 1);
        R(idx(plain)) = num2cell (rk(:).');
        M(idx(plain)) = {m2};
      endif
    endif
    if (! all (plain))
      rest = ! plain;
      rk = cell2struct (columns_of (Y, layout.ooff(idx(rest)), vals(:,rest),
                                    no, 1:numel (F), nt), F, 1);
      R(idx(rest)) = num2cell (rk(:).');
      M(idx(rest)) = {m};
    endif
  endfor
  res = one_struct (t, R, names);
  units = cell2struct (M, names, 2);

  for i = 1:numel (u)
    q = u(i).quantity;
    dot = find (q == ".", 1);
    un = q(1:dot-1);
    var = q(dot+1:end);
    ## an output (a feed's flow, a boundary's head) is what the core saw
    k = s.(net.units(net.index.(un)).kind);
    if (! any (strcmp (k.outputs, var)))
      res.(un).(var) = vn_signal_values (u(i).t, u(i).v, u(i).hold, t);
    endif
  endfor
  ## inputs driven by a controller or switch: what it set
  for i = isloop
    un = U(i);
    q = un.aux.manipulate;
    dot = find (q == ".", 1);
    tu = q(1:dot-1);
    tv = q(dot+1:end);
    k = s.(net.units(net.index.(tu)).kind);
    if (! any (strcmp (k.outputs, tv)))
      res.(tu).(tv) = res.(un.name).output;
    endif
  endfor
  res.x = X;
  res.states = states;
  res.units = units;
  ## The units finished one by one get their property names now.
  done = find (slow);
  if (! isempty (done))
    sub = net;
    sub.units = U(done);
    part = struct ();
    part.units = struct ();
    for i = done
      part.(names{i}) = res.(names{i});
      part.units.(names{i}) = res.units.(names{i});
    endfor
    part = vn_props_names (sub, part);
    for i = done
      res.(names{i}) = part.(names{i});
      res.units.(names{i}) = part.units.(names{i});
    endfor
  endif
endfunction

## Cell of columns, one row per field ROWS of a kind (outputs first, then
## the NO+j-th field the j-th held input), one column per unit.
function C = columns_of (Y, ooff, vals, no, rows, nt)
  C = cell (numel (rows), numel (ooff));
  for r = 1:numel (rows)
    j = rows(r);
    if (j <= no)
      C(r,:) = num2cell (Y(:, ooff + j), 1);
    else
      C(r,:) = num2cell (repmat (vals(j-no,:), nt, 1), 1);
    endif
  endfor
endfunction

## Position of the unit of quantity Q ("UNIT.VAR").
function i = unit_of (net, q)
  i = net.index.(q(1:find (q == ".", 1) - 1));
endfunction

## Declared values of inputs INP of units U (one kind), defaults where
## not given: one row per input, one column per unit.
function vals = input_values (U, k, inp)
  vals = repmat (k.defaults(inp)(:), 1, numel (U));
  if (isempty (inp))
    return;
  endif
  P = {U.par};
  try
    S = [P{:}];
    f = fieldnames (S);
    for j = 1:numel (inp)
      if (any (strcmp (f, k.params{inp(j)})))
        vals(j,:) = [S.(k.params{inp(j)})];
      endif
    endfor
  catch
    for i = 1:numel (U)
      for j = 1:numel (inp)
        if (isfield (U(i).par, k.params{inp(j)}))
          vals(j,i) = U(i).par.(k.params{inp(j)});
        endif
      endfor
    endfor
  end_try_catch
endfunction

## How vn_props_names renames the fields F of one unit U: the result's
## fields F2 come from F(SRC); M2 are its units of measure.  Empty SRC when
## the result is not a plain selection of the fields.
function [src, F2, m2] = props_map (net, U, F, m)
  sub = net;
  sub.units = U;
  part = struct ();
  part.(U.name) = cell2struct (num2cell (1:numel (F)).', F, 1);
  part.units = struct ();
  part.units.(U.name) = m;
  part = vn_props_names (sub, part);
  r = part.(U.name);
  F2 = fieldnames (r);
  v = struct2cell (r);
  src = [];
  if (all (cellfun ("isclass", v, "double")) && all (cellfun ("numel", v) == 1))
    src = [v{:}];
  endif
  m2 = part.units.(U.name);
endfunction

## The result struct: t first, then one field per unit (a unit named "t"
## takes the place of the times, as assigning in order would).
function res = one_struct (t, R, names)
  vals = [{t}, R];
  keys = [{"t"}, names];
  j = find (strcmp (names, "t"), 1);
  if (! isempty (j))
    vals{1} = R{j};
    vals(j+1) = [];
    keys(j+1) = [];
  endif
  res = cell2struct (vals, keys, 2);
endfunction
