## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} waterworks ()
## @deftypefnx {} {[@var{net}, @var{u}, @var{tend}] =} waterworks ()
## Build the demo network: a small water works on an invented site.
##
## Invented scenario, no real plant: river water enters a raw-water break
## tank (BREAK, elevated, 6 m above the clearwell floor) through the
## intake (INTAKE, a feed).  Control valve LV101 (equal percentage) lets
## it fall freely into the horizontal clearwell (CLEAR) through an inlet
## near the clearwell's crown; level controller LC101 moves the valve to
## hold the break tank at 2.5 m.  Pump P201 (curve) lifts from the
## clearwell to the service reservoir (RES) on a hill 40 m up, which spills
## over its rim to waste when overfilled; the pump's variable-speed drive
## is held by level controller LC201 on the clearwell (1.5 m).  The town's zone (ZONE, a fixed
## head of 20 m) is fed from the reservoir through valve TV301, and a bulk
## customer draws a fixed flow from it (BULK, a negative feed).
##
## With two outputs, also return the day's events as signals @var{u}: the
## intake steps up after 1 h, and after 3 h the zone valve closes from 60 %
## to 30 % over 5 minutes (the evening demand falls); @var{tend} is the
## length of the run (s).
##
## All numbers are invented for the demonstration; a model of a real
## works must be built from its drawings and validated against its data.
## @seealso{vn_network, vn_simulate}
## @end deftypefn

function [net, u, tend] = waterworks ()
  net = vn_network ("hillside works (invented)");
  net = vn_tank (net, "BREAK", "area", 20, "level", 2.5, "base", 6, "rim", 4);
  net = vn_tank (net, "CLEAR", "shape", "horizontal", "diameter", 3, ...
                 "length", 25, "level", 1.5);
  net = vn_tank (net, "RES", "area", 150, "level", 3, "base", 40, "rim", 4.2);
  net = vn_boundary (net, "ZONE", "head", 20);
  net = vn_feed (net, "INTAKE", "BREAK", "flow", 0.05);
  net = vn_valve (net, "LV101", "BREAK", "CLEAR", "kv", 800, ...
                  "opening", 0.7, "characteristic", "equal", ...
                  "rangeability", 50, "inlet", 2.8);
  net = vn_pump (net, "P201", "CLEAR", "RES", "shutoff", 55, "k", 5400, ...
                 "outlet", 0.2);
  net = vn_valve (net, "TV301", "RES", "ZONE", "kv", 160, "opening", 0.6, ...
                  "characteristic", "linear");
  net = vn_feed (net, "BULK", "RES", "flow", -0.01);
  net = vn_controller (net, "LC101", "measure", "BREAK.level", ...
                       "manipulate", "LV101.opening", "setpoint", 2.5, ...
                       "gain", 0.5, "reset", 900, "action", "direct", ...
                       "limits", [0 1]);
  net = vn_controller (net, "LC201", "measure", "CLEAR.level", ...
                       "manipulate", "P201.speed", "setpoint", 1.5, ...
                       "gain", 0.2, "reset", 1200, "action", "direct", ...
                       "limits", [0.5 1.15]);
  if (nargout > 1)
    u = vn_signal ("INTAKE.flow", "step", 3600, 0.05, 0.058);
    u(2) = vn_signal ("TV301.opening", "table", ...
                      [0 0.6; 3*3600 0.6; 3*3600+300 0.3]);
    tend = 8 * 3600;
  endif
endfunction
