## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{h} =} plot_rt_surface (@var{bg}, @var{A})
## @deftypefnx {} {@var{h} =} plot_rt_surface (@var{hax}, @var{bg}, @var{A})
## @deftypefnx {} {@var{h} =} plot_rt_surface (@dots{}, "runner_up", @var{tf}, "tol", @var{tol}, @var{prop}, @var{val}, @dots{})
## @deftypefnx {} {@var{h} =} plot_rt_surface (@dots{}, "picture", "penrose")
## Draw the RT configuration of the region @var{A} (an n x 2 matrix of
## intervals, as in @code{rt_entropy}) in the AdS3 background @var{bg} on
## the natural picture of the constant-time slice (@code{rt_surface}):
## the Poincare disk for a circle, with the horizon (dark disk) or the
## conical defect (marked at the centre), the upper half plane for a line
## (the boundary drawn on top, depth z growing downwards, the region
## beyond a planar horizon shaded).  The intervals of @var{A} are
## highlighted on the boundary, the minimal surface is drawn solid and,
## with @qcode{"runner_up"} true, the best other candidate dashed.  The
## horizon, when it is part of the surface, is outlined in the surface's
## colour.
##
## Draws into the axes @var{hax} or the current axes.  Other
## property/value pairs are applied to the minimal surface's lines.
## @var{tol} is the sampling tolerance of @code{rt_surface} (default
## 2e-3).  Works headless: @code{figure ("visible", "off")} then
## @code{print -dpng}.
##
## On a BCFT background (@code{ads3_background ("bcft", ...)}) the
## end-of-the-world branes are drawn (olive) with the bulk beyond them cut
## off (grey), and the surfaces that end on them; the thermal AdS saddle of
## an interval is drawn in the disk of the doubled interval (the BCFT on
## the upper half circle), the other BCFT states in the half plane.  On the
## two-sided @code{"bcft_tfd"} one exterior is drawn with the island
## configuration of the radiation region (@code{page_curve}); with the
## option @qcode{"t"} the configuration at that boundary time on both
## sides in the Kruskal diagram, with @qcode{"runner_up"} true the other
## branch of the Page curve dashed (the island configuration before the
## Page time, the geodesics through the bridge after it), the landing
## points on the brane marked (in @code{brane}; filled for the minimal
## surface, open for the runner-up).  @qcode{"runner_up"} on
## @code{"bcft_tfd"} needs @qcode{"t"}.
##
## Regions with endpoint times (n x 4 rows), a quench (option
## @qcode{"t"}, the boundary time) and a thermofield double (a struct
## region with fields @code{left} and @code{right}, option @qcode{"t"})
## are drawn from @code{rt_surface}'s time path: the curves projected on
## the picture, their time (t, or v on a quench) coded by the colour of
## markers along them (@code{time}, with a colour bar); the
## thermofield double in its Kruskal diagram (X_K, T_K), with the two
## boundaries, the horizons (dotted, in @code{horizon}) and the
## singularities (in @code{defect}), with @qcode{"runner_up"} true on a
## line the best other pairing dashed (@code{rt_surface}; also for
## endpoint times on a line and on a quench); on a circle a region on both sides
## shows the geodesics through the bridge at the minimiser's winding and
## those within each side, and the horizon circle, when it is part of
## the surface, as a marker at the bifurcation point X_K = T_K = 0.
##
## Through a shock wave (@qcode{"shock_alpha"} > 0, @file{doc/tfd_shock.md})
## the shock runs along the null line u = 0 (X_K = T_K, in @code{shock});
## each piece of a bridge geodesic is drawn in its own side's Kruskal
## coordinates (the left one above that line, the right one below), and the
## shift by alpha along the shock between its two crossings as a dotted
## segment with both crossings marked (@code{jump}, one per geodesic).
##
## The Kruskal window grows to hold every curve: at a boundary time t the
## endpoints sit at T_K = sinh(2 pi t/beta), so late times squeeze the
## picture onto the light cone.  @qcode{"picture"}, @qcode{"penrose"}
## draws the same configuration compactified instead: with u = T_K - X_K,
## v = T_K + X_K, the point (2/pi)(atan v - atan u, atan v + atan u).
## The two-sided BTZ black hole becomes a square (common practice): the
## boundaries uv = -1 the sides X = +-1, the singularities uv = 1 the top
## and the bottom, the horizons and the shock u = 0 its diagonals.  The
## curves in @var{h} are then the images of those in @code{h.surf}, which
## stays in Kruskal coordinates.
##
## @var{h} is a struct of graphics handles: @code{axes}, @code{bulk},
## @code{boundary}, @code{regions}, @code{surface}, @code{runner_up},
## @code{horizon}, @code{defect}, @code{brane}, @code{cut}, @code{label},
## @code{time}, @code{shock}, @code{jump};
## and @code{surf}, the configuration drawn (from @code{rt_surface}).
##
## @seealso{rt_surface, rt_entropy, plot_surface_profile, plot_phase_diagram}
## @end deftypefn

function h = plot_rt_surface (varargin)
  fn = "plot_rt_surface";
  if (nargin < 2)
    print_usage ();
  endif
  [hax, args, o, props] = __holent_fig_args__ (fn, varargin, 2, {"runner_up", "tol", "t", "picture"});
  [bg, A] = deal (args{:});
  tol = 2e-3;
  if (isfield (o, "tol"))
    tol = __holent_scalar__ (fn, "tol", o.tol, {1e-10, 0.5, "[]"});
  endif
  ru = false;
  if (isfield (o, "runner_up"))
    ru = __holent_bool__ (fn, "runner_up", o.runner_up);
  endif
  if (iscell (A))
    error ("holent:type", "%s: A must be one region (an n x 2 matrix), not a cell", fn);
  endif
  penrose = false;
  if (isfield (o, "picture"))
    if (! ischar (o.picture) || ! any (strcmp (o.picture, {"kruskal", "penrose"})))
      error ("holent:option", "%s: picture must be \"kruskal\" or \"penrose\"", fn);
    endif
    penrose = strcmp (o.picture, "penrose");
  endif
  ## rt_surface's own path, its messages naming this function
  r = [];
  topt = {};
  if (isfield (o, "t"))
    topt = {"t", o.t};
  endif
  s = __holent_rt_surface__ (fn, bg, A, [{"tol", tol}, topt]);
  if (ru)
    ropt = {"tol", tol, "configuration", "runner_up"};
    ropt = [ropt, topt];       # the runner-up at the same time
    r = __holent_rt_surface__ (fn, bg, A, ropt);
  endif
  if (penrose && ! strcmp (s.picture, "kruskal"))
    ## refused before any axes are made
    error ("holent:option", "%s: picture \"penrose\" needs a two-sided picture (a thermofield double, or \"bcft_tfd\" with \"t\"); this configuration is drawn on the %s", fn, merge (strcmp (s.picture, "disk"), "Poincare disk", "upper half plane"));
  endif
  [hax, held, pal] = __holent_fig_begin__ (hax);
  h = struct ("axes", hax, "bulk", [], "boundary", [], "regions", [],
              "surface", [], "runner_up", [], "horizon", [], "defect", [],
              "brane", [], "cut", [], "label", [], "time", [], "shock", [],
              "jump", [], "surf", s);
  disk = strcmp (s.picture, "disk");
  bcft = ! isempty (s.brane_curves);
  if (strcmp (s.picture, "kruskal"))
    ends = region_ends (s);   # before any map
  endif
  if (penrose)
    ends = compact (ends);
    s = compact (s);
    if (! isempty (r))
      r = compact (r);
    endif
    ## the square: boundaries X = +-1, singularities T = +-1, horizons on
    ## the diagonals
    h.bulk = fill (hax, [-1 1 1 -1], [-1 -1 1 1], pal.bulk, "edgecolor", "none");
    h.boundary = plot (hax, [1 1; -1 -1]', [-1 1; -1 1]', "color", pal.boundary,
                       "linewidth", 1.2);
    h.horizon = plot (hax, [-1 1; -1 1]', [-1 1; 1 -1]', ":", "color", pal.horizon,
                      "linewidth", 1.2);
    h.defect = plot (hax, [-1 1; -1 1]', [1 1; -1 -1]', "color", pal.defect,
                     "linewidth", 2);
    if (isfield (bg, "shock_alpha") && bg.shock_alpha > 0)
      h.shock = plot (hax, [-1 1], [-1 1], "color", pal.shock, "linewidth", 2);
    endif
    kx = ky = 1.08;
    xlabel (hax, "(2/\\pi)(atan v - atan u)");  ylabel (hax, "(2/\\pi)(atan v + atan u)");
  elseif (strcmp (s.picture, "kruskal"))
    ## the Kruskal diagram of the two-sided geometry: boundaries
    ## X^2 - T^2 = 1, singularities T^2 - X^2 = 1, horizons |X| = |T|;
    ## the window grows (both axes alike) until it holds every curve, as
    ## boundary points at a time t sit at T_K = sinh(2 pi t/beta)
    kx = 1.9;  ky = 1.5;
    cc = [s.curves(:); s.brane_curves(:)];
    if (! isempty (r))
      cc = [cc; r.curves(:)];
    endif
    for c = cc'
      P = c{1}(all (isfinite (c{1}(:,1:2)), 2), 1:2);
      if (! isempty (P))
        g = max (1, 1.06 * max (max (abs (P(:,1))) / kx, max (abs (P(:,2))) / ky));
        kx *= g;  ky *= g;
      endif
    endfor
    u = linspace (-1, 1, 241) * asinh (ky);
    h.bulk = fill (hax, [cosh(u), -cosh(fliplr (u))], [sinh(u), sinh(fliplr (u))],
                   pal.bulk, "edgecolor", "none");
    h.boundary = plot (hax, [cosh(u); -cosh(u)]', [sinh(u); sinh(u)]',
                       "color", pal.boundary, "linewidth", 1.2);
    h.horizon = plot (hax, kx * [-1 1; -1 1]', kx * [-1 1; 1 -1]', ":",
                      "color", pal.horizon, "linewidth", 1.2);
    u = linspace (-1, 1, 241) * asinh (kx);
    h.defect = plot (hax, [sinh(u); sinh(u)]', [cosh(u); -cosh(u)]',
                     "color", pal.defect, "linewidth", 2);
    if (isfield (bg, "shock_alpha") && bg.shock_alpha > 0)
      ## the shock wave runs along the null line u = 0 (X_K = T_K)
      h.shock = plot (hax, kx * [-1 1], kx * [-1 1], "color", pal.shock,
                      "linewidth", 2);
    endif
    xlabel (hax, "X_K");  ylabel (hax, "T_K");
  elseif (disk)
    if (bcft)
      L = 2 * bg.length;     # the doubled interval of the thermal AdS saddle
    else
      L = bg.circumference;
    endif
    t = linspace (0, 2 * pi, 721);
    h.bulk = fill (hax, cos (t), sin (t), pal.bulk, "edgecolor", "none");
    if (isfinite (s.horizon_depth))
      Rh = s.horizon_depth;
      h.horizon = fill (hax, Rh * cos (t), Rh * sin (t), pal.horizon, "edgecolor", "none");
    endif
    if (strcmp (bg.bulk, "conical_defect") && bg.alpha < 1)
      h.defect = plot (hax, 0, 0, "p", "markersize", 12,
                       "markerfacecolor", pal.defect, "color", pal.defect);
    endif
    if (bcft)
      ## beyond the brane (the lower half disk past the brane arc) is cut off
      b = s.brane_curves{1};
      h.cut = fill (hax, [b(:,1); cos(t(t >= pi))'], [b(:,2); sin(t(t >= pi))'],
                    pal.cut, "edgecolor", "none");
      t = t(t <= pi);        # the BCFT lives on the upper half circle
    endif
    h.boundary = plot (hax, cos (t), sin (t), "color", pal.boundary, "linewidth", 1.2);
    for k = 1:rows (s.intervals)
      u = 2 * pi * linspace (s.intervals(k,1), s.intervals(k,2), 200) / L;
      h.regions(end+1) = plot (hax, 1.02 * cos (u), 1.02 * sin (u), "color", pal.region,
                               "linewidth", 5);
    endfor
  else
    x = s.endpoints;
    if (bcft)
      x = [x; s.intervals(isfinite (s.intervals))(:); 0];
      x = [x; cellfun(@(c) min (c(:,1)), s.brane_curves(:))];
      if (isfinite (bg.length))
        x(end+1) = bg.length;
      endif
    endif
    span = max (x) - min (x);
    xl = [min(x) - 0.2 * span, max(x) + 0.2 * span];
    zc = max ([cellfun(@(c) max (c(:,2)), s.curves), eps]);
    if (isempty (s.curves))
      zc = span / 2;
    endif
    zm = 1.3 * zc;
    if (isfinite (s.horizon_depth) && s.horizon_depth < 3 * zc)
      zm = max (zm, 1.2 * s.horizon_depth);
    endif
    h.bulk = fill (hax, xl([1 2 2 1]), [0 0 zm zm], pal.bulk, "edgecolor", "none");
    if (isfinite (s.horizon_depth) && s.horizon_depth < zm)
      zh = s.horizon_depth;
      h.horizon = fill (hax, xl([1 2 2 1]), [zh zh zm zm], pal.horizon, "edgecolor", "none");
    endif
    xb = xl;
    if (bcft)
      ## beyond each brane the bulk is cut off
      for k = 1:numel (s.brane_curves)
        b = s.brane_curves{k};
        xe = xl(1 + (k == 2));
        h.cut(end+1) = fill (hax, [b(:,1); xe; xe], [b(:,2); b(end,2); 0],
                             pal.cut, "edgecolor", "none");
      endfor
      xb = [0, min(xl(2), bg.length)];
    endif
    h.boundary = plot (hax, xb, [0 0], "color", pal.boundary, "linewidth", 1.2);
    for k = 1:rows (s.intervals)
      h.regions(end+1) = plot (hax, min (s.intervals(k,:), xl(2)), [0 0],
                               "color", pal.region, "linewidth", 5);
    endfor
    set (hax, "ydir", "reverse", "xlim", xl, "ylim", [-0.03 * zm, zm]);
    xlabel (hax, "x");  ylabel (hax, "z");
  endif
  for k = 1:numel (s.brane_curves)
    c = s.brane_curves{k};
    h.brane(end+1) = plot (hax, c(:,1), c(:,2), "color", pal.brane, "linewidth", 2.5);
  endfor
  if (! isempty (r))
    for k = 1:numel (r.curves)
      c = r.curves{k};
      h.runner_up(end+1) = plot (hax, c(:,1), c(:,2), "--", "color", pal.runner,
                                 "linewidth", 2);
    endfor
    if (! isempty (r.horizon_curve))
      c = r.horizon_curve;
      h.runner_up(end+1) = plot (hax, c(:,1), c(:,2), "--", "color", pal.runner,
                                 "linewidth", 2);
    endif
  endif
  for k = 1:numel (s.curves)
    c = s.curves{k};
    h.surface(end+1) = plot (hax, c(:,1), c(:,2), "color", pal.surface, "linewidth", 3);
  endfor
  if (! isempty (s.horizon_curve))
    c = s.horizon_curve;
    if (strcmp (s.picture, "kruskal"))
      ## the horizon circle u = v = 0 projects to the origin: a marker
      h.surface(end+1) = plot (hax, c(:,1), c(:,2), "o", "color", pal.surface,
                               "markerfacecolor", pal.surface, "markersize", 9);
    else
      h.surface(end+1) = plot (hax, c(:,1), c(:,2), "color", pal.surface, "linewidth", 3);
    endif
  endif
  if (strcmp (s.picture, "kruskal"))
    ## the island's edges, where surfaces land on the brane (the brane
    ## itself covers the diagram): filled, the runner-up's open
    conf = {s, r};
    face = {pal.brane, "none"};
    for k = 1:2
      if (! isempty (conf{k}) && ! isempty (conf{k}.brane.x))
        h.brane(end+1) = island_edges (hax, conf{k}, pal.brane, face{k});
      endif
    endfor
  endif
  __holent_fig_props__ (fn, h.surface, props);
  ## through a shock a curve is two pieces split by a NaN row: the shift
  ## along the null shock u = 0, of zero length, dotted between the two
  ## crossings, each marked
  for k = 1:numel (s.curves)
    c = s.curves{k};
    for i = find (isnan (c(:,1)))'
      h.jump(end+1) = plot (hax, c([i-1 i+1], 1), c([i-1 i+1], 2), ":o",
                            "color", pal.surface, "linewidth", 3, "markersize", 7,
                            "markerfacecolor", pal.shock);
    endfor
  endfor
  ## the time of curves that leave the constant-time slice: markers on the
  ## curve coloured by its third column (t, or v on a quench), a colour bar
  tc = cellfun (@(c) columns (c) > 2 && max (c(:,3)) > min (c(:,3)), s.curves);
  if (strcmp (s.picture, "kruskal") && ! isempty (s.curves))
    h.regions = plot (hax, ends(:,1), ends(:,2), "o", "color", pal.region,
                      "markerfacecolor", pal.region, "markersize", 8);
  endif
  if (any (tc) && ! strcmp (s.picture, "kruskal"))
    P = cell2mat (cellfun (@(c) c(unique (round (linspace (1, rows (c), 41))), :),
                           s.curves(tc)(:), "uniformoutput", false));
    h.time = scatter (hax, P(:,1), P(:,2), 18, P(:,3), "filled");
    cb = colorbar (hax);
    ylabel (cb, s.columns{3});
  endif
  txt = sprintf ("S = %.4g", s.S);
  if (! isempty (r))
    txt = sprintf ("%s   (runner-up %.4g)", txt, r.S);
  endif
  h.label = title (hax, txt, "color", pal.boundary);
  if (disk)
    axis (hax, "equal");
    set (hax, "xlim", [-1.1 1.1], "ylim", [-1.1 1.1], "visible", "off");
  elseif (strcmp (s.picture, "kruskal"))
    axis (hax, "equal");
    set (hax, "xlim", [-kx kx], "ylim", [-ky ky]);
  endif
  if (! held)
    hold (hax, "off");
  endif
endfunction

## Markers at the landing points of the brane-ending curves of s (the last
## numel (s.brane.x) of s.curves) in the Kruskal diagram.
## The region endpoints of a Kruskal configuration: the curve ends on the
## boundaries X_K^2 - T_K^2 = 1 (the direction along them is not drawn;
## ends on a brane are not region endpoints).
function P = region_ends (s)
  P = zeros (0, 2);
  if (! isempty (s.curves))
    P = cell2mat (cellfun (@(c) c([1 end], 1:2), s.curves(:), "uniformoutput", false));
    P = P(abs (P(:,1) .^ 2 - P(:,2) .^ 2 - 1) < 1e-6, :);
  endif
endfunction

## The compactified picture of Kruskal points (rows X_K, T_K, ...): u and
## v through atan, the BTZ square |X|, |T| <= 1; a configuration's curves
## all mapped.
function P = compact (P)
  if (isstruct (P))
    P.curves = cellfun (@compact, P.curves, "uniformoutput", false);
    P.brane_curves = cellfun (@compact, P.brane_curves, "uniformoutput", false);
    P.horizon_curve = compact (P.horizon_curve);
    return;
  endif
  if (isempty (P))
    return;
  endif
  a = atan (P(:,2) - P(:,1));  b = atan (P(:,2) + P(:,1));
  P(:,1:2) = [b - a, b + a] * (2 / pi);
endfunction

function hb = island_edges (hax, s, col, face)
  nb = numel (s.brane.x);
  P = cell2mat (cellfun (@(c) c(end, 1:2), s.curves(end-nb+1:end)(:),
                         "uniformoutput", false));
  hb = plot (hax, P(:,1), P(:,2), "o", "color", col,
             "markerfacecolor", face, "markersize", 7, "linewidth", 1.5);
endfunction

%!demo
%! ## Two arcs on a BTZ circle: the connected surface, the disconnected
%! ## runner-up dashed, the horizon dark.
%! figure ("visible", "off");
%! bg = ads3_background ("thermal", "circle", "beta", 3);
%! h = plot_rt_surface (bg, [0.3 1.5; 2.0 3.4], "runner_up", true);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_rt_surface_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bg = ads3_background ("thermal", "circle", "beta", 1);
%!   h = plot_rt_surface (bg, [0 0.99 * 2 * pi], "runner_up", true, "linewidth", 4);
%!   assert (isaxes (h.axes));
%!   assert (all (ishghandle (h.surface)));
%!   assert (numel (h.surface), 2);          # geodesic and horizon
%!   assert (get (h.surface(1), "linewidth"), 4);
%!   ## the drawn data are the surface's curves
%!   assert (get (h.surface(1), "xdata")(:), h.surf.curves{1}(:,1));
%!   ax = axes ("parent", figure ("visible", "off"));
%!   h2 = plot_rt_surface (ax, ads3_background ("vacuum", "line"), [0 1; 1.5 2]);
%!   assert (h2.axes, ax);
%!   assert (get (ax, "ydir"), "reverse");
%!   close (get (ax, "parent"));
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!demo
%! ## An interval next to the boundary of a BCFT at finite temperature: the
%! ## RT surface ends on the brane (olive); the region beyond it is cut off.
%! figure ("visible", "off");
%! bg = ads3_background ("bcft", "half_line", "tension", 0.5, "beta", 4);
%! h = plot_rt_surface (bg, [0.05 1.6; 2.4 2.9]);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_bcft_surface_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bgs = {ads3_background("bcft", "half_line", "tension", 0.4), ...
%!          ads3_background("bcft", "interval", "length", 3, "tension", 0.3, "beta", 1), ...
%!          ads3_background("bcft", "interval", "length", 3, "tension", 0.3), ...
%!          ads3_background("bcft_tfd", "half_line", "beta", 2, "tension", 0.6)};
%!   regs = {[1 2], [0.2 0.9], [0.5 1], [1 Inf]};
%!   for k = 1:numel (bgs)
%!     clf (f);
%!     h = plot_rt_surface (bgs{k}, regs{k});
%!     assert (numel (h.brane), numel (h.surf.brane_curves));
%!     assert (all (ishghandle (h.brane)));
%!     assert (get (h.brane(1), "ydata")(:), h.surf.brane_curves{1}(:,2));
%!     assert (numel (h.surface) >= 1);
%!   endfor
%!   ## the runner-up (the other saddle) drawn dashed from rt_surface's data
%!   clf (f);
%!   h = plot_rt_surface (bgs{1}, [1 2], "runner_up", true);
%!   r = rt_surface (bgs{1}, [1 2], "configuration", "runner_up", "tol", 2e-3);
%!   assert (numel (h.runner_up), numel (r.curves));
%!   assert (get (h.runner_up(1), "xdata")(:), r.curves{1}(:,1));
%!   assert (get (h.runner_up(1), "ydata")(:), r.curves{1}(:,2));
%!   assert (get (h.runner_up(1), "linestyle"), "--");
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!demo
%! ## A two-sided region of the thermofield double at t = 0.2: the
%! ## geodesics through the Einstein-Rosen bridge in the Kruskal diagram.
%! figure ("visible", "off");
%! bg = ads3_background ("tfd", "line", "beta", 2);
%! h = plot_rt_surface (bg, struct ("left", [0 3], "right", [0 3]), "t", 0.2);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_tfd_surface_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bg = ads3_background ("tfd", "line", "beta", 2);
%!   h = plot_rt_surface (bg, struct ("left", [0 3], "right", [0 3]), "t", 0.2);
%!   assert (numel (h.surface), 2);
%!   assert (get (h.surface(1), "xdata")(:), h.surf.curves{1}(:,1));
%!   assert (get (h.surface(1), "ydata")(:), h.surf.curves{1}(:,2));
%!   ## one boundary to the other
%!   x = get (h.surface(1), "xdata");
%!   assert (sort (sign (x([1 end]))), [-1 1]);
%!   ## the four region endpoints marked on the boundaries X^2 - T^2 = 1,
%!   ## at boundary time t: T_K = sinh (2 pi t/beta) (the Kruskal map)
%!   X = get (h.regions, "xdata");  T = get (h.regions, "ydata");
%!   assert (numel (X), 4);
%!   assert (T, repmat (sinh (2 * pi * 0.2 / 2), 1, 4), 1e-12);
%!   assert (abs (X), repmat (cosh (2 * pi * 0.2 / 2), 1, 4), 1e-12);
%!   clf (f);
%!   q = ads3_background ("quench", "line", "beta", 1);
%!   h = plot_rt_surface (q, [0 2], "t", 0.5);
%!   assert (get (h.surface(1), "ydata")(:), h.surf.curves{1}(:,2));
%!   ## the markers carry the curve's time v: 0.5 at the ends, 0 at the shell
%!   c = h.surf.curves{1};
%!   v = get (h.time, "cdata")(:);
%!   assert (v([1 end]), [0.5; 0.5]);
%!   assert (min (v) < 0 && all (ismember (get (h.time, "xdata")(:), c(:,1))));
%!   assert (get (h.axes, "ydir"), "reverse");
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!demo
%! ## Both sides of a thermofield double on a circle: two geodesics through
%! ## the bridge (one spanning more than half the circle) at t = 0.1.
%! figure ("visible", "off");
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 5);
%! h = plot_rt_surface (bg, struct ("left", [0 1], "right", [0 4]), "t", 0.1);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_tfd_circle_surface_demo.png"));

%!test
%! ## Two-sided regions on a circle drawn and rendered headless: the
%! ## geodesics of rt_surface's minimiser, and the horizon as a marker.
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! png = [tempname(), ".png"];
%! unwind_protect
%!   bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 5);
%!   h = plot_rt_surface (bg, struct ("left", [0 1], "right", [0 4]), "t", 0.1);
%!   assert (numel (h.surface), 2);
%!   for k = 1:2
%!     assert (get (h.surface(k), "xdata")(:), h.surf.curves{k}(:,1));
%!     assert (get (h.surface(k), "ydata")(:), h.surf.curves{k}(:,2));
%!   endfor
%!   print (f, "-dpng", png);
%!   assert (stat (png).size > 0);
%!   clf (f);
%!   bg = ads3_background ("tfd", "circle", "beta", 2, "circumference", 1);
%!   A = struct ("left", [0 0.45; 0.5 0.95], "right", [0 0.1]);
%!   h = plot_rt_surface (bg, A, "t", 0.75);
%!   assert (h.surf.horizon);
%!   assert (numel (h.surface), rows (h.surf.pairs) + 1);
%!   assert (get (h.surface(end), "marker"), "o");
%!   print (f, "-dpng", png);
%! unwind_protect_cleanup
%!   close (f);
%!   if (exist (png, "file"))
%!     delete (png);
%!   endif
%! end_unwind_protect

%!demo
%! ## The Page-curve competition of a radiation region R = [1, Inf) in the
%! ## thermofield double of two BCFTs, before the Page time: the geodesic
%! ## through the Einstein-Rosen bridge wins (solid), the island
%! ## configuration ending on the brane is the runner-up (dashed, its
%! ## landing points open circles), in the Kruskal diagram.
%! figure ("visible", "off");
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6);
%! h = plot_rt_surface (bg, [1 Inf], "t", 0.3, "runner_up", true);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_page_surface_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! png = [tempname() ".png"];
%! unwind_protect
%!   ## bcft_tfd at a time: minimiser solid, runner-up dashed, both from
%!   ## rt_surface's data; island edges marked at the landing points
%!   bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6);
%!   for t = [0.3 1.5]      # before and after the Page time 0.68 of R
%!     clf (f);
%!     h = plot_rt_surface (bg, [0.2 0.5; 1 Inf], "t", t, "runner_up", true);
%!     r = rt_surface (bg, [0.2 0.5; 1 Inf], "t", t, "configuration", "runner_up", "tol", 2e-3);
%!     assert (h.surf.picture, "kruskal");
%!     assert (numel (h.runner_up), numel (r.curves));
%!     for k = 1:numel (r.curves)
%!       assert (get (h.runner_up(k), "xdata")(:), r.curves{k}(:,1));
%!       assert (get (h.runner_up(k), "ydata")(:), r.curves{k}(:,2));
%!       assert (get (h.runner_up(k), "linestyle"), "--");
%!     endfor
%!     assert (numel (h.surface), numel (h.surf.curves));
%!     assert (r.S > h.surf.S);
%!     ## the island configuration (minimiser after, runner-up before)
%!     isl = merge (t < 0.68, r, h.surf);
%!     assert (numel (h.brane), 1);
%!     assert (get (h.brane, "xdata")(:), cellfun (@(c) c(end,1), isl.curves(end-numel (isl.brane.x)+1:end))(:));
%!   endfor
%!   print (f, "-dpng", png);
%!   assert (exist (png, "file"), 2);
%! unwind_protect_cleanup
%!   close (f);
%!   if (exist (png, "file"))
%!     delete (png);
%!   endif
%! end_unwind_protect

%!demo
%! ## The same region through a shock wave (shift alpha = 2): each bridge
%! ## geodesic is two BTZ pieces, one on each side of the shock u = 0
%! ## (rose), joined by the shift along it (dotted, the crossings marked).
%! figure ("visible", "off");
%! bg = ads3_background ("tfd", "line", "beta", 2, "shock_alpha", 2);
%! h = plot_rt_surface (bg, struct ("left", [0 3], "right", [0 3]), "t", 0.1);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_tfd_shock_demo.png"));

%!test
%! ## a shocked thermofield double, rendered headless: the shock line
%! ## u = 0, and per bridge geodesic one dotted jump between its two
%! ## crossings (the samples beside the curve's NaN row), on X_K = T_K
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bg = ads3_background ("tfd", "line", "beta", 2, "shock_alpha", 1.5);
%!   h = plot_rt_surface (bg, struct ("left", [0 3], "right", [0 3]), "t", 0.1);
%!   assert (numel (h.surface), 2);
%!   assert (get (h.surface(1), "xdata")(:), h.surf.curves{1}(:,1));
%!   assert (isscalar (h.shock) && ishghandle (h.shock));
%!   assert (numel (h.jump), 2);
%!   for k = 1:2
%!     c = h.surf.curves{k};
%!     i = find (isnan (c(:,1)));
%!     assert (get (h.jump(k), "xdata")(:), c([i-1 i+1], 1));
%!     assert (get (h.jump(k), "ydata")(:), c([i-1 i+1], 2));
%!     assert (get (h.jump(k), "linestyle"), ":");
%!     assert (abs (diff (get (h.jump(k), "xdata"))), 0.75, 1e-12);   # alpha/2
%!   endfor
%!   png = [tempname() ".png"];
%!   print (f, "-dpng", png);
%!   assert (exist (png, "file"), 2);
%!   delete (png);
%!   ## without a shock: no shock line, no jump
%!   clf (f);
%!   h = plot_rt_surface (ads3_background ("tfd", "line", "beta", 2),
%!                        struct ("left", [0 3], "right", [0 3]));
%!   assert (isempty (h.shock) && isempty (h.jump));
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!demo
%! ## Late in the Page-curve competition the Kruskal picture hugs the light
%! ## cone; compactified, the two-sided black hole is a square.
%! figure ("visible", "off");
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6);
%! h = plot_rt_surface (bg, [1 Inf], "t", 1.2, "runner_up", true, "picture", "penrose");
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_penrose_demo.png"));

%!test
%! ## the compactified picture: the region endpoints on the boundaries
%! ## X_K^2 - T_K^2 = 1 land on the square's sides X = -+1 (uv = -1 makes
%! ## atan v - atan u = -+pi/2; common practice), every drawn point inside
%! ## the square, the curves drawn in order with the same number of samples
%! ## as rt_surface's; a shock's two crossings on the diagonal u = 0.
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! png = [tempname() ".png"];
%! unwind_protect
%!   bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6);
%!   h = plot_rt_surface (bg, [1 Inf], "t", 1.2, "runner_up", true, "picture", "penrose");
%!   assert ([get(h.axes, "xlim"), get(h.axes, "ylim")], 1.08 * [-1 1 -1 1]);
%!   assert (sort (get (h.regions, "xdata")(:)), [-1; 1], 1e-12);
%!   hl = [h.surface(:); h.runner_up(:)];
%!   X = cell2mat (arrayfun (@(q) get (q, "xdata")(:), hl, "uniformoutput", false));
%!   T = cell2mat (arrayfun (@(q) get (q, "ydata")(:), hl, "uniformoutput", false));
%!   assert (all (abs (X) <= 1 + 1e-12 & abs (T) <= 1 + 1e-12));
%!   for k = 1:numel (h.surface)
%!     c = h.surf.curves{k};
%!     u = c(:,2) - c(:,1);  v = c(:,2) + c(:,1);
%!     assert (get (h.surface(k), "xdata")(:), 2 / pi * (atan (v) - atan (u)), 1e-14);
%!   endfor
%!   print (f, "-dpng", png);
%!   assert (exist (png, "file"), 2);
%!   clf (f);
%!   bg = ads3_background ("tfd", "line", "beta", 2, "shock_alpha", 1.5);
%!   h = plot_rt_surface (bg, struct ("left", [0 3], "right", [0 3]), "t", 0.5, "picture", "penrose");
%!   for k = 1:numel (h.jump)
%!     assert (get (h.jump(k), "xdata"), get (h.jump(k), "ydata"), 1e-14);
%!   endfor
%!   assert (numel (h.jump), 2);
%! unwind_protect_cleanup
%!   close (f);
%!   if (exist (png, "file"))
%!     delete (png);
%!   endif
%! end_unwind_protect

%!test
%! ## the thermofield double on a line with its runner-up: after the
%! ## Hartman-Maldacena time of A_L = A_R = [0, 3] (t = 1.5 at beta = 1)
%! ## the geodesics within each side win, the bridge is dashed
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bg = ads3_background ("tfd", "line", "beta", 1);
%!   A = struct ("left", [0 3], "right", [0 3]);
%!   h = plot_rt_surface (bg, A, "t", 1.7, "runner_up", true);
%!   r = rt_surface (bg, A, "t", 1.7, "configuration", "runner_up", "tol", 2e-3);
%!   assert (numel (h.runner_up), 2);
%!   for k = 1:2
%!     assert (get (h.runner_up(k), "xdata")(:), r.curves{k}(:,1));
%!     assert (get (h.runner_up(k), "linestyle"), "--");
%!   endfor
%!   assert (r.sides(r.pairs(:,1)) != r.sides(r.pairs(:,2)));   # through the bridge
%!   assert (h.surf.sides(h.surf.pairs(:,1)), h.surf.sides(h.surf.pairs(:,2)));
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!error <Invalid call> plot_rt_surface (1)
%!error <picture "penrose" needs a two-sided picture> plot_rt_surface (ads3_background ("vacuum", "line"), [0 1], "picture", "penrose")
%!error <picture must be> plot_rt_surface (ads3_background ("tfd", "line", "beta", 1), struct ("left", [0 1]), "picture", "disk")
%!error <runner_up must be> plot_rt_surface (ads3_background ("vacuum", "line"), [0 1], "runner_up", "yes")
