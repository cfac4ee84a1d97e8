## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{h} =} plot_surface_profile (@var{bg}, @var{shape}, @var{sizes})
## @deftypefnx {} {@var{h} =} plot_surface_profile (@var{hax}, @var{bg}, @var{shape}, @var{sizes})
## @deftypefnx {} {@var{h} =} plot_surface_profile (@dots{}, "tol", @var{tol}, @var{prop}, @var{val}, @dots{})
## Draw the profiles of strips (@var{shape} = @qcode{"strip"}: z(x) for
## each width in @var{sizes}) or balls (@qcode{"ball"}: z(r), drawn on both
## sides of the centre) in the AdS_(d+1) background @var{bg}, in the
## (x, z) plane with the boundary on top and the depth growing downwards.
## The boundary regions are highlighted, the turning points marked, and a
## horizon, when there is one within reach of the picture, shaded below
## z = zh.  Several sizes are drawn from light to deep teal.
##
## Draws into the axes @var{hax} or the current axes; other
## property/value pairs go to the profile lines.  @var{tol} is passed to
## @code{surface_profile}.  @var{h} is a struct of handles: @code{axes},
## @code{bulk}, @code{boundary}, @code{regions}, @code{surface},
## @code{turning}, @code{horizon}; and @code{prof}, the profiles drawn.
##
## @seealso{surface_profile, strip_entropy, ball_entropy, plot_rt_surface}
## @end deftypefn

function h = plot_surface_profile (varargin)
  fn = "plot_surface_profile";
  if (nargin < 3)
    print_usage ();
  endif
  [hax, args, o, props] = __holent_fig_args__ (fn, varargin, 3, {"tol"});
  [bg, shape, sizes] = deal (args{:});
  ## surface_profile's own path, its messages naming this function
  opts = {};
  if (isfield (o, "tol"))
    opts = {"tol", o.tol};
  endif
  p = __holent_surface_profile__ (fn, bg, shape, sizes, opts);
  if (isempty (p))
    error ("holent:empty", "%s: SIZES is empty: nothing to draw", fn);
  endif
  [hax, held, pal] = __holent_fig_begin__ (hax);
  h = struct ("axes", hax, "bulk", [], "boundary", [], "regions", [], "surface", [],
              "turning", [], "horizon", [], "prof", p);
  half = max ([p.size]) / (1 + strcmp (shape, "strip"));
  xl = 1.15 * half * [-1 1];
  zm = 1.25 * max ([p.top]);
  if (isfinite (bg.zh) && bg.zh < 2 * max ([p.top]))
    zm = max (zm, 1.15 * bg.zh);
  endif
  h.bulk = fill (hax, xl([1 2 2 1]), [0 0 zm zm], pal.bulk, "edgecolor", "none");
  if (isfinite (bg.zh) && bg.zh < zm)
    h.horizon = fill (hax, xl([1 2 2 1]), [bg.zh bg.zh zm zm], pal.horizon,
                      "edgecolor", "none");
  endif
  h.boundary = plot (hax, xl, [0 0], "color", pal.boundary, "linewidth", 1.2);
  n = numel (p);
  for k = 1:n
    w = merge (n > 1, (k - 1) / max (n - 1, 1), 1);
    col = (1 - w) * [0.55 0.78 0.78] + w * pal.surface;
    x = p(k).x;  z = p(k).z;
    if (strcmp (shape, "ball"))
      x = [-flipud(x); x];  z = [flipud(z); z];
    endif
    h.regions(end+1) = plot (hax, [min(x) max(x)], [0 0], "color", pal.region, "linewidth", 5);
    h.surface(end+1) = plot (hax, x, z, "color", col, "linewidth", 2.5);
    h.turning(end+1) = plot (hax, 0, p(k).top, "o", "color", col, "markerfacecolor", col,
                             "markersize", 5);
  endfor
  __holent_fig_props__ (fn, h.surface, props);
  set (hax, "ydir", "reverse", "xlim", xl, "ylim", [-0.03 * zm, zm]);
  xlabel (hax, merge (strcmp (shape, "ball"), "r", "x"));
  ylabel (hax, "z");
  title (hax, sprintf ("%s profiles, d = %d", shape, bg.dimension), "color", pal.boundary);
  if (! held)
    hold (hax, "off");
  endif
endfunction

%!demo
%! ## Strips of growing width in a black brane: the deepest ones hug the
%! ## horizon.
%! figure ("visible", "off");
%! h = plot_surface_profile (ads_background (4, "black_brane", "zh", 1), "strip", [0.5 1 2 4]);
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_profile_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   bg = ads_background (3, "black_brane", "zh", 1);
%!   h = plot_surface_profile (bg, "ball", [0.5 2], "linestyle", "--");
%!   assert (numel (h.surface), 2);
%!   assert (get (h.surface(2), "linestyle"), "--");
%!   ## the turning point is drawn at the tip depth of ball_entropy
%!   [~, i] = ball_entropy (bg, 2);
%!   assert (get (h.turning(2), "ydata"), i.z_star, 1e-12);
%!   assert (ishghandle (h.horizon));
%!   png = [tempname() ".png"];
%!   print (f, "-dpng", png);
%!   assert (exist (png, "file") == 2);
%!   delete (png);
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!error <Invalid call> plot_surface_profile (1, 2)
%!error <SHAPE must be> plot_surface_profile (ads_background (4, "vacuum"), "cube", 1)
