## Headline demo of vesselnet (what "make demo" runs).
##
## Invented scenario, no real plant: a small water works on a hillside
## (see waterworks.m).  The demo prints the network, finds its operating
## point, gives the gains and time constants there and one step response,
## simulates an eight-hour shift with an intake step and an evening
## closure of the zone valve, prints a summary of the run and writes PNG
## trends into demos/output/ (or a temporary folder when that is not
## writable; VN_DEMO_OUT overrides).  A command that is not available is
## reported and its part skipped.
##
## The figures are a model's: a model of a real works must be validated
## against its data, and any tuning reviewed, before it informs operation.

1;
here = fileparts (mfilename ("fullpath"));
addpath (here);
more off;

printf ("vesselnet demo: a small water works (invented scenario)\n");
printf ("=======================================================\n\n");
[net, u, tend] = waterworks ();
if (demo_have ("vn_show"))
  vn_show (net);
endif

tanks = {"BREAK", "CLEAR", "RES"};
levels = strcat (tanks, ".level");

## ---- operating point -------------------------------------------------
op = [];
if (demo_have ("vn_steady"))
  try
    op = vn_steady (net);
    printf ("\nOperating point (%s, %d iterations, residual %.2g m3/s):\n",
            op.method, op.iterations, op.residual);
    for i = 1:numel (tanks)
      printf ("  %-6s level %6.3f m   head %7.3f m\n", tanks{i},
              op.(tanks{i}).level, op.(tanks{i}).head);
    endfor
    printf ("  LV101 opening %.3f, passing %.1f m3/h\n", op.LV101.opening,
            op.LV101.flow * 3600);
    printf ("  P201 at speed %.3f: %.1f m3/h against %.2f m\n",
            op.P201.speed, op.P201.flow * 3600, op.P201.head);
    printf ("  TV301 to the zone: %.1f m3/h; bulk draw-off %.1f m3/h\n",
            op.TV301.flow * 3600, -op.BULK.flow * 3600);
  catch err
    printf ("vn_steady failed: %s\n", err.message);
    op = [];
  end_try_catch
endif

## ---- gains and time constants ----------------------------------------
if (! isempty (op) && demo_have ("vn_linearize"))
  try
    inputs = {"INTAKE.flow", "TV301.opening"};
    lin = vn_linearize (net, op, inputs, levels);
    printf ("\nLinear model at the operating point (level loops LC101, LC201 closed):\n");
    printf ("  steady-state gains (m per unit of input):\n");
    printf ("  %-13s", "");
    printf (" %14s", inputs{:});
    printf ("\n");
    for i = 1:numel (levels)
      printf ("  %-13s", levels{i});
      printf (" %14.4g", lin.gain(i,:));
      printf ("\n");
    endfor
    printf ("  time constants (complex pairs twice): %s min\n",
            strjoin (arrayfun (@(x) sprintf ("%.1f", x / 60), lin.tau(:).',
                               "UniformOutput", false), ", "));
  catch err
    printf ("vn_linearize failed: %s\n", err.message);
  end_try_catch
endif

sr = [];
if (! isempty (op) && demo_have ("vn_stepresponse"))
  try
    ## small enough that the reservoir stays below its rim
    sr = vn_stepresponse (net, op, "TV301.opening", -0.01, {"RES.level"});
    printf ("\nStep of -0.01 on TV301.opening (loops closed):\n");
    for j = 1:numel (sr.outputs)
      m = sr.metrics(j);
      printf ("  %-10s gain %8.2f m per unit opening (linear model %8.2f), t63 %6.1f min, 2 %% settling %6.1f min\n",
              sr.outputs{j}, m.gain, sr.lin.gain(j), m.t63 / 60, m.settle / 60);
    endfor
  catch err
    printf ("vn_stepresponse failed: %s\n", err.message);
    sr = [];
  end_try_catch
endif

## ---- the shift -------------------------------------------------------
printf ("\nEvents: intake 180 -> 209 m3/h at 1 h; zone valve TV301 60 %% -> 30 %% over 5 min at 3 h\n");
if (isempty (op))
  res = vn_simulate (net, [0 tend], u, "dt", 60);
else
  res = vn_simulate (net, [0 tend], u, "dt", 60, "initial", op);
endif
demo_summary (res, tanks, {"INTAKE.flow", "LV101.flow", "P201.flow", ...
                           "TV301.flow", "RES.spill"});
k = find (res.RES.spill > 0, 1);
if (! isempty (k))
  printf ("  the reservoir reaches its rim after %.2f h and spills to waste\n",
          res.t(k) / 3600);
endif
printf ("  break tank held at %.3f m by LC101 (peak %.3f m); clearwell at %.3f m by LC201\n",
        res.BREAK.level(end), max (res.BREAK.level), res.CLEAR.level(end));

## ---- pictures --------------------------------------------------------
if (demo_have ("vn_plot"))
  out = demo_outdir (fullfile (here, "output"));
  files = {};
  try
    f = fullfile (out, "waterworks_levels.png");
    vn_plot (res, levels, "file", f, "title", "Water works (invented): levels");
    files{end+1} = f;
    f = fullfile (out, "waterworks_flows.png");
    vn_plot (res, {"INTAKE.flow", "LV101.flow", "P201.flow", "TV301.flow", ...
                   "RES.spill"}, "file", f,
             "title", "Water works (invented): flows");
    files{end+1} = f;
    f = fullfile (out, "waterworks_actuators.png");
    vn_plot (res, {"LV101.opening", "P201.speed"}, "file", f,
             "title", "Water works (invented): valve opening and pump speed");
    files{end+1} = f;
    if (! isempty (sr))
      f = fullfile (out, "waterworks_step.png");
      vn_plot (sr, "file", f, "title", "Step on TV301.opening");
      files{end+1} = f;
    endif
  catch err
    printf ("vn_plot failed: %s\n", err.message);
  end_try_catch
  printf ("\nPictures written:\n");
  printf ("  %s\n", files{:});
endif
printf ("\nAll figures come from an invented model: validate a model against plant data\nand have any tuning reviewed before it is used on a live works.\n");

## ---- energy and species (heated buffer, contact tank) ----------------
try
  out = demo_outdir (fullfile (here, "output"));
  more_files = thermal (out);
  printf ("\nPictures written:\n");
  printf ("  %s\n", more_files{:});
catch err
  printf ("thermal demo failed: %s\n", err.message);
end_try_catch

## ---- fitting step tests and tuning a level loop (fit_and_tune.m) -------
try
  fit_and_tune (demo_outdir (fullfile (here, "output")));
catch err
  printf ("fit_and_tune failed: %s\n", err.message);
end_try_catch

## ---- a plant record: read, fitted, validated, tuned (plant_record.m) ----
if (demo_have ("vn_readlog") && demo_have ("vn_validate"))
  try
    plant_record (demo_outdir (fullfile (here, "output")));
  catch err
    printf ("plant_record failed: %s\n", err.message);
  end_try_catch
endif
