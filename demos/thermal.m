## Thermal and species part of the demo (invented scenario, no real plant):
## a dairy's heated process-water buffer tank held at 65 degC by a PI
## temperature loop on its heater, and a water works' contact tank whose
## chlorine residual follows a dosing change while the chlorine decays.
##
## Prints the operating points, the loop settings and the response to a
## draw-off upset, and writes PNG trends into OUT.  The figures are a
## model's: validate against plant data and have tuning reviewed before
## it reaches a live loop; temperature trips and dosing limits belong to
## systems designed under local codes and licensed practice.

function files = thermal (out)
  files = {};
  printf ("\nHeated buffer tank (invented dairy)\n");
  printf ("-----------------------------------\n");
  net = vn_network ("dairy buffer (invented)", "thermal", true, "ambient", 18);
  net = vn_tank (net, "BUF", "diameter", 1.6, "level", 1.5, "rim", 2.5, ...
                 "temperature", 65, "ua", 35);
  net = vn_feed (net, "MAKEUP", "BUF", "flow", 1.5e-3, "temperature", 12);
  net = vn_orifice (net, "DRAW", "BUF", "", "coeff", 1.5e-3 / sqrt (1.5));
  net = vn_heater (net, "HTR", "BUF", "duty", 3.3e5, "max", 6e5, "lag", 40);
  ## the heater's process model: gain 1/(rho cp F) degC per W, time
  ## constant V/F, the element's lag standing in for dead time
  o = net.options;
  V = pi / 4 * 1.6^2 * 1.5;
  m = struct ("gain", 1 / (o.density * o.cp * 1.5e-3), "tau", V / 1.5e-3,
              "deadtime", 40);
  pid = vn_tune (m, "simc", "tauc", 300);
  printf ("  SIMC PI from the energy balance: Kc %.3g W/degC, Ti %.0f s\n",
          pid.Kc, pid.Ti);
  net = vn_controller (net, "TC1", "measure", "BUF.temperature", ...
                       "manipulate", "HTR.duty", "setpoint", 65, ...
                       "gain", pid.Kc, "reset", pid.Ti, "action", "reverse", ...
                       "limits", [0 6e5]);
  op = vn_steady (net);
  printf ("  operating point: level %.3f m, %.2f degC, heater %.0f kW (loss to ambient %.1f kW)\n",
          op.BUF.level, op.BUF.temperature, op.HTR.duty / 1e3,
          35 * (op.BUF.temperature - 18) / 1e3);
  u = vn_signal ("MAKEUP.flow", "step", 1800, 1.5e-3, 2.2e-3);
  res = vn_simulate (op.net, [0 4 * 3600], u, "initial", op, "dt", 30);
  [dip, k] = min (res.BUF.temperature);
  printf ("  make-up step 5.4 -> 7.9 m3/h at 0.5 h: temperature dips to %.2f degC at %.2f h,\n",
          dip, res.t(k) / 3600);
  back = find (abs (res.BUF.temperature - 65) > 0.1, 1, "last");
  printf ("  back within 0.1 degC after %.2f h; heater %.0f kW at the end (limit 600 kW);\n  the level rises to the rim and spills %.1f m3 to the drain\n",
          res.t(back) / 3600, res.HTR.duty(end) / 1e3,
          trapz (res.t, res.BUF.spill));
  if (exist ("vn_plot"))
    f = fullfile (out, "dairy_buffer.png");
    vn_plot (res, {"BUF.temperature", "HTR.duty", "BUF.level"}, "file", f,
             "title", "Dairy buffer (invented): temperature loop against a make-up step");
    files{end+1} = f;
  endif

  printf ("\nContact tank (invented water works)\n");
  printf ("-----------------------------------\n");
  k = 2e-5;     # first-order chlorine decay, 1/s (invented)
  net = vn_network ("contact (invented)", "species", {"chlorine"}, "decay", k);
  net = vn_tank (net, "CT", "area", 60, "level", 3, "chlorine", 1.2);
  net = vn_feed (net, "INLET", "CT", "flow", 0.08, "chlorine", 1.5);
  net = vn_orifice (net, "OUT", "CT", "", "coeff", 0.08 / sqrt (3));
  op = vn_steady (net);
  Vc = 60 * 3;
  printf ("  steady residual %.4f mg/l (closed form c_in F/(F + k V) = %.4f)\n",
          op.CT.chlorine, 1.5 * 0.08 / (0.08 + k * Vc));
  u = vn_signal ("INLET.chlorine", "step", 3600, 1.5, 1.8);
  res = vn_simulate (op.net, [0 12 * 3600], u, "initial", op, "dt", 120);
  c1 = 1.8 * 0.08 / (0.08 + k * Vc);
  i63 = find (res.CT.chlorine >= op.CT.chlorine + 0.632 * (c1 - op.CT.chlorine), 1);
  printf ("  dose 1.5 -> 1.8 mg/l at 1 h: residual %.4f mg/l after 11 h (final %.4f),\n",
          res.CT.chlorine(end), c1);
  printf ("  63 %% of the change after %.0f min (V/(F + k V) = %.0f min)\n",
          (res.t(i63) - 3600) / 60, Vc / (0.08 + k * Vc) / 60);
  if (exist ("vn_plot"))
    f = fullfile (out, "contact_residual.png");
    vn_plot (res, {"CT.chlorine", "INLET.chlorine"}, "file", f,
             "title", "Contact tank (invented): chlorine residual after a dosing change");
    files{end+1} = f;
  endif
endfunction
