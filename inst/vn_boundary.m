## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_boundary (@var{net}, @var{name}, @qcode{"head"}, @var{h}, @dots{})
## @deftypefnx {} {@var{net} =} vn_boundary (@var{net}, @{@var{name1}, @dots{}@}, @qcode{"head"}, @var{h}, @dots{})
## Add a fixed-head boundary (a river, a reservoir, a main) to the network.
##
## A boundary holds its head @var{h}, m (an input that signals may drive),
## whatever flows in or out; flow elements may start or end at it.  Options:
## @qcode{"head"} (required), @qcode{"temperature"} (degC, thermal networks)
## and one concentration per declared species, carried by any flow that
## leaves the boundary.
##
## Bulk form: given a cell array of names, one boundary is added per name
## in one call, with the same checks and messages as one call each; each
## option is a scalar or a vector of one value per boundary.
##
## @seealso{vn_network, vn_tank, vn_orifice, vn_pump}
## @end deftypefn

function net = vn_boundary (net, name, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  fn = "vn_boundary";
  build_check_net (fn, net);
  spec = [{"head", "real", "m", []}; build_material_spec(net)];
  if (iscell (name))
    net = build_bulk (fn, "boundary", net, name, {}, {}, varargin, spec,
                      @boundary_unit);
  else
    net = build_add_unit (net, boundary_unit (fn, net, name, {}, varargin,
                                              spec));
  endif
endfunction

## Check one boundary against NET and make its unit.
function u = boundary_unit (fn, net, name, ~, args, spec)
  label = build_check_name (fn, net, "boundary", name);
  par = build_options (fn, label, args, spec);
  if (! isfield (par, "head"))
    build_error (fn, label, "HEAD (m) is required");
  endif
  build_check_thermal (fn, label, net, par, {"temperature"});
  [par, aux] = build_split_species (net, par, struct ());
  u = build_unit (name, "boundary", "", "", par, [], aux);
endfunction

%!test
%! net = vn_boundary (vn_network (), "river", "head", 4.0);
%! u = net.units(1);
%! assert ({u.name, u.kind, u.from, u.to}, {"river", "boundary", "", ""});
%! assert (u.par.head, 4.0);
%! assert (net.index.river, 1);

%!test
%! net = vn_network ("w", "thermal", true, "species", {"salt"});
%! net = vn_boundary (net, "sea", "head", -0.5, "temperature", 9, "salt", 35);
%! assert (net.units(1).par, struct ("head", -0.5, "temperature", 9));
%! assert (net.units(1).aux.species.salt, 35);

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! loop = vn_boundary (vn_boundary (vn_network (), "R1", "head", 2), "R2", "head", 5);
%! bulk = vn_boundary (vn_network (), {"R1", "R2"}, "head", [2 5]);
%! assert (isequal (bulk, loop));
%! assert (bulk.units(2).par.head, 5);

%!error <Invalid call> vn_boundary (vn_network ())
%!error <vn_boundary: boundary "river": HEAD \(m\) is required> vn_boundary (vn_network (), "river")
%!error <vn_boundary: boundary "river": HEAD must be a finite real scalar \(m\), got Inf> vn_boundary (vn_network (), "river", "head", Inf)
%!error <vn_boundary: boundary "river": HEAD must be a finite real scalar \(m\), got a 1x2 double> vn_boundary (vn_network (), "river", "head", [1 2])
%!error <vn_boundary: boundary "river": TEMPERATURE given \(12\) but network "network" is not thermal> vn_boundary (vn_network (), "river", "head", 1, "temperature", 12)
%!error <vn_boundary: boundary "river": unknown option "salt"; allowed: head, temperature> vn_boundary (vn_network (), "river", "head", 1, "salt", 3)
%!error <vn_boundary: boundary "R1" to "R2": HEAD must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x3 double> vn_boundary (vn_network (), {"R1", "R2"}, "head", [1 2 3])
