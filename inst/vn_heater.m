## -*- texinfo -*-
## @deftypefn {} {@var{net} =} vn_heater (@var{net}, @var{name}, @var{tank}, @qcode{"duty"}, @var{W}, @dots{})
## Add a heater to a tank of a thermal network.
##
## The heater's duty (W) is an input: a signal or a controller may drive
## @qcode{"NAME.duty"}.  It enters the tank's energy balance,
## @code{d(V T)/dt = ... + Q/(rho cp)}, only while the element is covered
## (heat stops smoothly as the level falls to @qcode{"minlevel"}, a
## low-level trip), so a tank run dry while heated keeps a bounded
## temperature.
##
## Options:
## @table @asis
## @item @qcode{"duty"}
## heat input (W), default 0; negative values cool.
## @item @qcode{"max"}
## largest duty (W), default Inf.
## @item @qcode{"lag"}
## first-order lag of the element (s), default 0 (none).
## @item @qcode{"minlevel"}
## level (m) below which the heater is tripped, default 0.05 m.
## @end table
##
## The heat actually delivered is reported as @code{res.NAME.duty}.  A
## modelled heater is no substitute for over-temperature and low-level
## trips designed under local codes and licensed practice.
## @seealso{vn_network, vn_tank, vn_controller}
## @end deftypefn

function net = vn_heater (net, name, tank, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  fn = "vn_heater";
  loop_check_net (net, name, fn);
  if (! net.options.thermal)
    error ("Octave:invalid-input-arg",
           "%s: heater \"%s\": network \"%s\" is not thermal; declare it with vn_network (..., \"thermal\", true)",
           fn, name, net.name);
  endif
  build_check_ref (fn, sprintf ("heater \"%s\"", name), net, "TANK", tank,
                   {"tank"});
  o = loop_options (varargin, {"duty", "max", "lag", "minlevel"}, fn, name);
  o = loop_units (net, name, o, fn, "heater");
  par = struct ();
  if (isfield (o, "duty"))
    par.duty = loop_scalar (o.duty, "duty", name, fn, false);
  endif
  if (isfield (o, "max"))
    par.max = loop_scalar (o.max, "max", name, fn, true);
    if (par.max < 0)
      error ("Octave:invalid-input-arg",
             "%s: heater \"%s\": MAX must be >= 0 (W), got %g", fn, name,
             par.max);
    endif
  endif
  if (isfield (o, "lag"))
    par.lag = loop_scalar (o.lag, "lag", name, fn, false);
    if (par.lag < 0)
      error ("Octave:invalid-input-arg",
             "%s: heater \"%s\": LAG must be >= 0 (s), got %g", fn, name,
             par.lag);
    endif
  endif
  if (isfield (o, "minlevel"))
    par.minlevel = loop_scalar (o.minlevel, "minlevel", name, fn, false);
    if (par.minlevel < 0)
      error ("Octave:invalid-input-arg",
             "%s: heater \"%s\": MINLEVEL must be >= 0 (m), got %g", fn,
             name, par.minlevel);
    endif
  endif
  net = loop_append (net, name, "heater", par, struct ());
  net.units(end).to = tank;
endfunction

%!test
%! ## heated insulated tank at steady state: T = T_in + Q/(rho cp F)
%! ## (steady energy balance, common practice)
%! net = vn_network ("hw", "thermal", true, "ambient", 15);
%! net = vn_tank (net, "T1", "area", 2, "level", 1, "temperature", 10);
%! net = vn_feed (net, "F1", "T1", "flow", 0.002, "temperature", 10);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.002);
%! net = vn_heater (net, "H1", "T1", "duty", 2e4);
%! res = vn_simulate (net, [0 40000], "dt", 100);
%! o = net.options;
%! assert (res.T1.temperature(end), 10 + 2e4 / (o.density * o.cp * 0.002), 1e-4);
%! assert (res.H1.duty(end), 2e4, 1e-6);
%!error <not thermal> vn_heater (vn_tank (vn_network ("n"), "T1", "area", 1), "H1", "T1", "duty", 1)
%!error <vn_heater: heater "H1": TANK names unit "T9", which network "n" does not hold> vn_heater (vn_network ("n", "thermal", true), "H1", "T9", "duty", 1)
%!error <LAG must be .= 0> vn_heater (vn_tank (vn_network ("n", "thermal", true), "T1", "area", 1), "H1", "T1", "lag", -1)
