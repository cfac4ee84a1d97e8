## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {@var{files} =} render_gallery (@var{outdir})
## Render the figures of the README gallery into @var{outdir} as small
## PNGs, headless (hidden figures), and return their paths.  Run by
## @code{make demo} (into the build directory) and @code{make gallery}
## (into doc/gallery, the committed images).  Demo data: our own invented
## scenario.
## @end deftypefn
function files = render_gallery (outdir)
  if (! exist (outdir, "dir"))
    mkdir (outdir);
  endif
  ws = warning ("off", "Octave:gnuplot-graphics");
  f = figure ("visible", "off", "position", [0 0 480 400]);
  files = {};
  unwind_protect
    ## 1. two arcs on a BTZ circle: connected against disconnected
    bg = ads3_background ("thermal", "circle", "beta", 3);
    plot_rt_surface (bg, [0.3 1.5; 2.0 3.4], "runner_up", true);
    files{end+1} = save_ (f, outdir, "btz_two_arcs.png");
    ## 2. the plateau: the horizon joins the surface
    clf (f);
    plot_rt_surface (ads3_background ("thermal", "circle", "beta", 1), [0 6.05], "runner_up", true);
    files{end+1} = save_ (f, outdir, "btz_plateau.png");
    ## 3. a heavy state: geodesics avoid the conical defect
    clf (f);
    plot_rt_surface (ads3_background ("heavy", "circle", "alpha", 0.4), [0.3 3.6], "runner_up", true);
    files{end+1} = save_ (f, outdir, "conical_defect.png");
    ## 4. three intervals on the thermal line
    clf (f);
    plot_rt_surface (ads3_background ("thermal", "line", "beta", 3), [0 1; 1.3 2.5; 4 7], "runner_up", true);
    files{end+1} = save_ (f, outdir, "planar_btz_three.png");
    ## 5. strips in a black brane
    clf (f);
    plot_surface_profile (ads_background (4, "black_brane", "zh", 1), "strip", [0.5 1 2 4]);
    files{end+1} = save_ (f, outdir, "strip_profiles.png");
    ## 6. phase diagram of two equal intervals on the thermal line
    clf (f);
    th = ads3_background ("thermal", "line", "beta", 2);
    ph = @(d, w) merge (mutual_information (th, [0 w], [w + d, 2*w + d]) > 1e-9, ...
                        "connected", "disconnected");
    w = linspace (0.1, 4, 30);
    h = plot_phase_diagram (ph, linspace (0.01, 0.6, 30), w, ...
                            "xlabel", "separation d", "ylabel", "width w");
    ## the transition line of find_transition through the cells
    hold (h.axes, "on");
    w = linspace (0.1, 4, 200);
    plot (h.axes, find_transition ("mutual_information", th, w, w), w, "--",
          "color", [0.68 0.24 0.20], "linewidth", 2);
    hold (h.axes, "off");
    files{end+1} = save_ (f, outdir, "phase_two_intervals.png");
    ## 7. a BCFT at finite temperature: surfaces ending on the brane
    clf (f);
    plot_rt_surface (ads3_background ("bcft", "half_line", "tension", 0.5, "beta", 4),
                     [0.05 1.6; 2.4 2.9]);
    files{end+1} = save_ (f, outdir, "bcft_half_line.png");
    ## 8. an interval BCFT in its thermal AdS saddle: one brane, the disk
    clf (f);
    plot_rt_surface (ads3_background ("bcft", "interval", "length", 3, "tension", 0.4),
                     [0.3 1.2; 1.9 2.8]);
    files{end+1} = save_ (f, outdir, "bcft_interval_disk.png");
    ## 9. a quench: the HRT geodesic refracted at the infalling shell
    clf (f);
    plot_rt_surface (ads3_background ("quench", "line", "beta", 1), [0 3], "t", 0.9);
    files{end+1} = save_ (f, outdir, "quench_hrt.png");
    ## 10. a boosted interval on the vacuum line: the geodesic leaves the slice
    clf (f);
    plot_rt_surface (ads3_background ("vacuum", "line"), [0 2 0 1.2; 3 4.5 0.4 0]);
    files{end+1} = save_ (f, outdir, "boosted_intervals.png");
    ## 11. the thermofield double: geodesics through the Einstein-Rosen
    ## bridge, those within each side the runner-up
    clf (f);
    plot_rt_surface (ads3_background ("tfd", "line", "beta", 2),
                     struct ("left", [0 3], "right", [0 3]), "t", 0.2, "runner_up", true);
    files{end+1} = save_ (f, outdir, "tfd_bridge.png");
    ## 12. both sides of a thermofield double on a circle: a bridge at a
    ## winding that is not the shortest (it spans 3 of the circle's 5)
    clf (f);
    plot_rt_surface (ads3_background ("tfd", "circle", "beta", 1, "circumference", 5),
                     struct ("left", [0 1], "right", [0 4]), "t", 0.1);
    files{end+1} = save_ (f, outdir, "tfd_circle_windings.png");
    ## 13. a shock wave in the thermofield double: bridges broken at u = 0
    clf (f);
    plot_rt_surface (ads3_background ("tfd", "line", "beta", 2, "shock_alpha", 2),
                     struct ("left", [0 3], "right", [0 3]), "t", 0.1);
    files{end+1} = save_ (f, outdir, "tfd_shock.png");
    ## 14. the Page-curve competition after the Page time (about 0.25 for
    ## R = [0.2, Inf)): the island wins, the bridge geodesic is the runner-up
    clf (f);
    plot_rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6),
                     [0.2 Inf], "t", 0.35, "runner_up", true);
    files{end+1} = save_ (f, outdir, "bcft_tfd_page.png");
    ## 15. compactified: the two-sided black hole as a square; well after
    ## the Page time of R = [0.2, Inf) the island has won
    clf (f);
    plot_rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6),
                     [0.2 Inf], "t", 0.6, "runner_up", true, "picture", "penrose");
    files{end+1} = save_ (f, outdir, "page_penrose.png");
  unwind_protect_cleanup
    close (f);
    warning (ws);
  end_unwind_protect
endfunction

function p = save_ (f, outdir, name)
  p = fullfile (outdir, name);
  print (f, "-dpng", "-S480,400", p);
endfunction
