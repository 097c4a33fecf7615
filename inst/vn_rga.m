## -*- texinfo -*-
## @deftypefn  {} {@var{R} =} vn_rga (@var{lin})
## @deftypefnx {} {@var{R} =} vn_rga (@var{G})
## @deftypefnx {} {[@var{R}, @var{info}] =} vn_rga (@dots{}, @qcode{"pairing"}, @var{p})
## Compute the relative gain array of a square multivariable process at
## steady state.
##
## @var{lin} is a linear model from @code{vn_linearize}; its steady-state
## gains @code{lin.gain} are used, or, when that field is absent, the same
## gains computed from A, B, C, D: @code{D - C A^-1 B} on the states each
## input reaches and that reach each output, so a state that carries no
## flow at the operating point (an idle catch tank) does not make the
## gains singular.  @var{G} may instead be a square numeric gain matrix, outputs
## in rows and inputs in columns.  The relative gain array (Bristol, 1966)
## is @code{R = G .* inv (G).'}: each element is the gain of one pair with
## all other loops open divided by its gain with all other loops closed.
## Rows and columns sum to 1.  Pairs with relative gains near 1 interact
## little; negative ones lead to a loop that changes sign when the others
## close.
##
## @var{info} holds:
## @table @code
## @item niederlinski
## Niederlinski index @code{det (G(:,p)) / prod (g(i, p(i)))} of the pairing
## @var{p} (default diagonal: output i with input i).  A negative index
## means that pairing with integral action in every loop is unstable.
## @item pairing
## suggested pairing, the input index for each output: the permutation
## whose relative gains are all positive and closest to 1 in sum of
## absolute deviations (searched exhaustively up to 8 x 8, greedily above).
## @item gain, inputs, outputs
## the gain matrix and the quantity names.
## @end table
##
## Option @qcode{"pairing"} @var{p} gives a pairing for the Niederlinski
## index as a permutation vector (input index for each output) or as a
## cellstr of input names in output order.
##
## Errors: a non-square gain matrix, a gain matrix that is singular
## (reciprocal condition below 1e-12, id @qcode{"vesselnet:singular-gain"})
## and gains that are not finite, as for integrating outputs such as a level
## without self-regulation (id @qcode{"vesselnet:integrating"}).
##
## The array describes the linear model at one operating point only:
## validate the model against plant tests before a pairing is put on a
## live plant.
## @seealso{vn_linearize, vn_frequency}
## @end deftypefn

function [R, info] = vn_rga (lin, varargin)

  if (nargin < 1)
    print_usage ();
  endif
  [G, inputs, outputs] = gain_of (lin);
  [p, m] = size (G);
  if (p != m)
    error ("Octave:invalid-input-arg",
           ["vn_rga: the gain matrix is %d x %d (outputs %s; inputs %s); ", ...
            "the relative gain array needs as many inputs as outputs"],
           p, m, strjoin (outputs, ", "), strjoin (inputs, ", "));
  endif
  [i, j] = find (! isfinite (G), 1);
  if (! isempty (i))
    error ("vesselnet:integrating",
           ["vn_rga: the steady-state gain from %s to %s is %g: that output ", ...
            "has no steady state (integrating); pair it in a level loop first ", ...
            "or give a model with that loop closed"],
           inputs{j}, outputs{i}, G(i,j));
  endif
  rc = rcond (G);
  if (! (rc >= 1e-12))
    error ("vesselnet:singular-gain",
           ["vn_rga: the gain matrix is singular (reciprocal condition %g, ", ...
            "below 1e-12): the inputs %s cannot move the outputs %s ", ...
            "independently at steady state"],
           rc, strjoin (inputs, ", "), strjoin (outputs, ", "));
  endif
  pair = parse_pairing (varargin, inputs);

  R = G .* inv (G).';

  if (nargout > 1)
    Gp = G(:,pair);
    info.niederlinski = det (Gp) / prod (diag (Gp));
    info.pairing = suggest (R);
    info.gain = G;
    info.inputs = inputs;
    info.outputs = outputs;
  endif

endfunction

## Gain matrix and names from a model or a numeric matrix.
function [G, inputs, outputs] = gain_of (lin)
  if (isnumeric (lin) && ismatrix (lin) && ! isempty (lin))
    G = full (double (lin));
    inputs = arrayfun (@(k) sprintf ("u%d", k), 1:columns (G), "uniformoutput", false);
    outputs = arrayfun (@(k) sprintf ("y%d", k), 1:rows (G), "uniformoutput", false);
    return;
  endif
  if (! isstruct (lin) || ! (isfield (lin, "gain")
                             || all (isfield (lin, {"A", "B", "C", "D"}))))
    error ("Octave:invalid-input-arg",
           "vn_rga: LIN must be a linear model struct (gain or A, B, C, D) or a square gain matrix");
  endif
  if (isfield (lin, "gain") && ! isempty (lin.gain))
    G = full (lin.gain);
  else
    ## states the inputs cannot reach, or that cannot reach the outputs,
    ## are removed before any solve; integrating pairs give signed Inf
    G = lin_gain (lin.A, lin.B, lin.C, lin.D);
  endif
  [p, m] = size (G);
  inputs = names_of (lin, "inputs", "u", m);
  outputs = names_of (lin, "outputs", "y", p);
endfunction

function c = names_of (lin, field, stem, k)
  if (isfield (lin, field) && iscellstr (lin.(field)) && numel (lin.(field)) == k)
    c = lin.(field)(:).';
  else
    c = arrayfun (@(q) sprintf ("%s%d", stem, q), 1:k, "uniformoutput", false);
  endif
endfunction

## Pairing option: permutation vector or input names in output order.
function pair = parse_pairing (args, inputs)
  n = numel (inputs);
  pair = 1:n;
  if (isempty (args))
    return;
  endif
  if (numel (args) != 2 || ! ischar (args{1}) || ! strcmpi (args{1}, "pairing"))
    error ("Octave:invalid-input-arg",
           "vn_rga: the only option is \"pairing\", followed by its value");
  endif
  p = args{2};
  if (iscellstr (p))
    [ok, pair] = ismember (p(:).', inputs);
    if (! all (ok))
      error ("Octave:invalid-input-arg",
             "vn_rga: pairing names %s are not inputs of the model (allowed: %s)",
             strjoin (p(! ok), ", "), strjoin (inputs, ", "));
    endif
  else
    pair = p;
  endif
  if (! isnumeric (pair) || ! isequal (sort (pair(:).'), 1:n))
    error ("Octave:invalid-input-arg",
           "vn_rga: pairing must be a permutation of 1..%d (an input for each output), got %s",
           n, mat2str (pair));
  endif
  pair = pair(:).';
endfunction

## Pairing whose relative gains are positive and closest to 1.
function best = suggest (R)
  n = rows (R);
  cost = abs (R - 1) + 1e6 * (R <= 0);
  if (n <= 8)
    P = perms (1:n);
    total = sum (cost(sub2ind ([n n], repmat (1:n, rows (P), 1), P)), 2);
    [~, k] = min (total);
    best = P(k,:);
  else
    best = zeros (1, n);
    c = cost;
    for step = 1:n
      [~, k] = min (c(:));
      [i, j] = ind2sub ([n n], k);
      best(i) = j;
      c(i,:) = Inf;
      c(:,j) = Inf;
    endfor
  endif
endfunction

%!demo
%! ## Invented: a brewery's wort blending tank, outputs level (m) and
%! ## temperature (degC) against hot and cold water flows (m3/s).
%! G = [400, 380; 900, -700];
%! [R, info] = vn_rga (G);
%! disp (R)
%! printf ("suggested pairing: output 1 <- input %d, output 2 <- input %d\n",
%!         info.pairing);
%! [~, chosen] = vn_rga (G, "pairing", info.pairing);
%! printf ("Niederlinski index of that pairing: %.3f\n",
%!         chosen.niederlinski);

%!test
%! ## Wood and Berry, Chem. Eng. Sci. 28 (1973), gains (memory):
%! ## lambda11 = 1/(1 - g12 g21/(g11 g22)) = 2.0094 (Bristol 1966).
%! G = [12.8, -18.9; 6.6, -19.4];
%! [R, info] = vn_rga (G);
%! assert (R(1,1), 2.0094, 5e-5);
%! assert (R(1,1), 1 / (1 - G(1,2) * G(2,1) / (G(1,1) * G(2,2))), 1e-12);
%! assert (sum (R, 1), [1 1], 1e-12);
%! assert (sum (R, 2), [1; 1], 1e-12);
%! assert (info.pairing, [1 2]);
%! assert (info.niederlinski, 1 / R(1,1), 1e-12);

%!test
%! ## Model struct: gains from -C A^-1 B; a swapped process pairs off-diagonal.
%! lin = struct ("A", -eye (2), "B", [0.2 1; 1 0.3], "C", eye (2),
%!               "D", zeros (2), "inputs", {{"F1.flow", "F2.flow"}},
%!               "outputs", {{"T1.level", "T2.level"}});
%! [R, info] = vn_rga (lin, "pairing", {"F2.flow", "F1.flow"});
%! l11 = 1 / (1 - 1 * 1 / (0.2 * 0.3));
%! assert (R, [l11, 1 - l11; 1 - l11, l11], 1e-12);
%! assert (info.pairing, [2 1]);
%! ## Columns swapped onto the diagonal: det (G(:,[2 1])) / (1 * 1) = 0.94.
%! assert (info.niederlinski, 0.94, 1e-12);

%!error <2 x 3> vn_rga (ones (2, 3))
%!error <cannot move the outputs> vn_rga ([1 2; 2 4])
%!error <integrating> vn_rga (struct ("A", [0 0; 0 -1], "B", eye (2), "C", eye (2), "D", zeros (2)))
%!error <permutation> vn_rga (eye (2), "pairing", [1 1])
