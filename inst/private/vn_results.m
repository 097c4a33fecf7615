## -*- texinfo -*-
## @deftypefn {} {@var{res} =} vn_results (@var{net}, @var{t}, @var{X}, @var{Y}, @var{states}, @var{u})
## Assemble a result struct: one field per unit with one column per output
## and per input, units of measure in res.units (doc/internals.md section 7).
## @end deftypefn

function res = vn_results (net, t, X, Y, states, u)
  s = vn_schema ();
  res.t = t(:);
  col = 0;
  units = struct ();
  for i = 1:numel (net.units)
    un = net.units(i);
    k = s.(un.kind);
    r = struct ();
    m = struct ();
    no = numel (k.outputs);
    for j = 1:no
      r.(k.outputs{j}) = Y(:, col + j);
      m.(k.outputs{j}) = k.ounits{j};
    endfor
    col += no;
    ## inputs held at their declared values unless a signal drives them
    for j = find (k.isinput)
      pname = k.params{j};
      if (isfield (r, pname))
        continue;
      endif
      if (isfield (un.par, pname))
        val = un.par.(pname);
      else
        val = k.defaults(j);
      endif
      r.(pname) = repmat (val, numel (t), 1);
      m.(pname) = k.units{j};
    endfor
    res.(un.name) = r;
    units.(un.name) = m;
  endfor
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
  for i = 1:numel (net.units)
    un = net.units(i);
    if (any (strcmp (un.kind, {"controller", "switch"})))
      q = un.aux.manipulate;
      dot = find (q == ".", 1);
      tu = q(1:dot-1);
      tv = q(dot+1:end);
      k = s.(net.units(net.index.(tu)).kind);
      if (! any (strcmp (k.outputs, tv)))
        res.(tu).(tv) = res.(un.name).output;
      endif
    endif
  endfor
  res.x = X;
  res.states = states;
  res.units = units;
  res = vn_props_names (net, res);
endfunction
