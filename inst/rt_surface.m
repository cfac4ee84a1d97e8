## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{surf} =} rt_surface (@var{bg}, @var{A})
## @deftypefnx {} {@var{surf} =} rt_surface (@dots{}, "tol", @var{tol}, "configuration", @var{which}, "t", @var{t})
## The RT surface of the region @var{A} (as in @code{rt_entropy}: an
## n x 2 matrix of intervals, or a cell array of them) in the AdS3
## background @var{bg}, as curves in the bulk, ready to be drawn.
##
## The picture (@file{doc/surfaces.md}): on a line the half plane
## (x, z) with z = 1/r, the Poincare z in the vacuum and the
## Fefferman-Graham z of the static planar BTZ metric; on a circle the disk
## (R cos phi, R sin phi), phi = 2 pi x/L, R = r/(1 + sqrt(1 + r^2)) with r
## the areal radius, i.e. the Poincare disk in global and thermal AdS
## (geodesics are circles orthogonal to the unit circle).  With a conical
## defect R is the covering disk's radius and phi the true angle.  In
## rotating BTZ the HRT geodesic leaves the t = 0 slice: each point carries
## its time t in a third column and is drawn projected.
##
## Sampling: the curves are sampled so that no chord strays more than
## @var{tol} (default 1e-3, at least 1e-10, at most 0.5) from the curve in the picture's coordinates;
## each curve starts and ends exactly on the boundary.
##
## @var{which} is @qcode{"minimal"} (the default: the minimiser of
## @code{rt_entropy}) or @qcode{"runner_up"} (the best other candidate, for
## up to 8 intervals; @code{holent:domain} when there is none).  On the
## one-sided BCFT backgrounds the runner-up is the best other configuration
## of geodesics between endpoints, geodesics ending on a brane and the
## horizon (e.g. the brane-ending saddle of an interval whose connected
## geodesic wins, and the reverse).  On the two-sided @qcode{"bcft_tfd"}
## it needs the time @var{t} (below).
##
## @strong{Two-sided BCFT} (@code{ads3_background ("bcft_tfd", @dots{})},
## @var{A} a radiation region R as in @code{page_curve}): without
## @var{t}, the island configuration (the late-time surface) on one
## exterior in the half plane, with the brane.  With @var{t}, the
## minimiser of @code{page_curve} at the boundary time @var{t} on both
## sides, or with @qcode{"runner_up"} the least configuration of the other
## kind: the island configuration (no geodesic through the Einstein-Rosen
## bridge) before the Page time, the best one with geodesics through the
## bridge from the Page time on (@code{find_transition ("page_time",
## @dots{})}), so that @code{S} is the other branch of the Page curve
## (@file{doc/bcft.md}).  Picture @qcode{"kruskal"} as for a thermofield
## double below: @code{endpoints} are R's endpoints on the left then on the
## right side; @code{pairs} the geodesics within the left side, within the
## right side, then through the bridge; the curves ending on the brane
## follow (@code{brane.endpoint}, @code{brane.landing} in the [x, z] of
## the exterior); @code{brane_curves} is empty.
##
## @strong{Time} (@file{doc/surfaces.md}): regions with endpoint times
## (n x 4 rows [start, end, t_start, t_end]) in every static bulk, a quench
## (@code{ads3_background ("quench", @dots{})}, @var{t} the boundary time)
## and a thermofield double (@code{ads3_background ("tfd", @dots{})}, a
## region or a struct with fields @code{left} and @code{right}, @var{t}
## added to every time) give the minimiser of @code{rt_entropy} with its
## geodesics as k x 3 arrays whose columns are named in @code{columns}:
## [x, z, t] or [X, Y, t] in the pictures above for static bulks (the
## boosted geodesics); the same with the ingoing Eddington-Finkelstein
## time v (the shell at v = 0, the boundary time at the boundary) for a
## quench, whose curve is the BTZ leg, the vacuum chord inside the shell
## and the BTZ leg out; and for a thermofield double the Kruskal picture
## @qcode{"kruskal"} [X_K, T_K, x], X_K = (v - u)/2, T_K = (v + u)/2
## (boundaries X_K = +-cosh(R t), T_K = sinh(R t), R = 2 pi/beta on a
## line, L/beta on a circle; horizons |X_K| = |T_K|), the horizon as the
## bifurcation circle X_K = T_K = 0.  Sampled with the same rule.  No
## runner-up on this path.  Regions on both sides of a circle are not
## supported (as in @code{rt_entropy}); geodesics through a shock are not
## drawn (@code{holent:unsupported}).
##
## @var{surf} (a struct array of the size of the cell) has fields
## @table @code
## @item picture
## @qcode{"half_plane"} or @qcode{"disk"}.
## @item curves
## a cell row, one k x 2 (k x 3 with t) array per geodesic, in the order
## of @code{pairs}.
## @item S, pairs, arcs, horizon, endpoints, intervals
## the entropy of the configuration and the fields of @code{rt_entropy}'s
## configuration.
## @item horizon_curve
## the horizon (a closed circle in the disk) when it is part of the
## surface, else empty.
## @item horizon_depth
## R of the horizon in the disk, z = 1/r_+ in the half plane, NaN without.
## @item defect
## true when the bulk has a conical defect (apex at the centre).
## @item times, sides
## the time of each endpoint and its side (0 left, 1 right; 1 without a
## thermofield double).
## @item columns
## the names of the curves' columns.
## @end table
##
## @seealso{rt_entropy, plot_rt_surface, surface_profile}
## @end deftypefn

function surf = rt_surface (bg, A, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  surf = __holent_rt_surface__ ("rt_surface", bg, A, varargin);
endfunction

%!test
%! ## Vacuum line: the geodesic is the semicircle (x - xc)^2 + z^2 = (l/2)^2
%! ## (common practice; Ryu and Takayanagi 2006, PRL 96, 181602), meeting
%! ## the boundary at the endpoints.
%! s = rt_surface (ads3_background ("vacuum", "line"), [-1 3], "tol", 1e-4);
%! c = s.curves{1};
%! assert (s.picture, "half_plane");
%! assert (hypot (c(:,1) - 1, c(:,2)), 2 * ones (rows (c), 1), 1e-12);
%! assert (c([1 end], :), [-1 0; 3 0], 1e-14);
%! ## the chords stay within tol of the circle
%! m = (c(1:end-1,:) + c(2:end,:)) / 2;
%! assert (max (2 - hypot (m(:,1) - 1, m(:,2))) <= 1e-4);

%!test
%! ## Runner-up of two close intervals is the disconnected pair (Headrick
%! ## 2010, PRD 82, 126010).
%! bg = ads3_background ("vacuum", "line");
%! s = rt_surface (bg, [0 1; 1.2 2.2], "configuration", "runner_up");
%! assert (s.pairs, [1 2; 3 4]);
%! assert (s.S, rt_entropy (bg, [0 1]) + rt_entropy (bg, [1.2 2.2]), 1e-12);
%! s = rt_surface (bg, [0 1; 1.2 2.2]);
%! assert (s.pairs, [1 4; 2 3]);

%!test
%! ## A boosted interval in Poincare AdS: the curve lies on
%! ## z^2 + (x - xc)^2 - (t - tc)^2 = (dx^2 - dt^2)/4 (common practice),
%! ## from (0, 0, 0) to (2, 0, 1).
%! s = rt_surface (ads3_background ("vacuum", "line"), [0 2 0 1]);
%! c = s.curves{1};
%! assert (s.columns, {"x", "z", "t"});
%! assert (c(:,2).^2 + (c(:,1) - 1).^2 - (c(:,3) - 0.5).^2, 0.75 * ones (rows (c), 1), 1e-12);
%! assert (c([1 end], :), [0 0 0; 2 0 1], 1e-14);
%! assert (s.times', [0 1]);

%!test
%! ## Two-sided BCFT, R = [1, Inf) at t = 0.2, before its Page time: the
%! ## geodesic through the bridge, (c/3) log((beta/(pi eps)) cosh(2 pi t/beta))
%! ## (Hartman and Maldacena 2013, JHEP 05, 014), wins; the runner-up is the
%! ## island configuration, (c/3)(log((beta/(pi eps)) sinh(2 pi/beta)) +
%! ## arctanh T) (Calabrese and Cardy 2004; Takayanagi 2011, PRL 107, 101602).
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6);
%! s = rt_surface (bg, [1 Inf], "t", 0.2);
%! r = rt_surface (bg, [1 Inf], "t", 0.2, "configuration", "runner_up");
%! e = bg.cutoff;
%! assert (s.S, log (2 / (pi * e) * cosh (0.2 * pi)) / 3, 1e-12);
%! assert (r.S, (log (2 / (pi * e) * sinh (pi)) + atanh (0.6)) / 3, 1e-12);
%! assert ({s.picture, s.pairs, s.sides'}, {"kruskal", [1 2], [0 1]});
%! assert (r.brane.endpoint', [1 2]);

%!error <Invalid call> rt_surface (ads3_background ("vacuum", "line"))
%!error <not available for regions with times> rt_surface (ads3_background ("vacuum", "line"), [0 1 0 0.5], "configuration", "runner_up")
%!error <configuration must be> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "best")
%!error id=holent:unsupported rt_surface (ads3_background ("tfd", "circle", "beta", 1, "circumference", 5), struct ("left", [0 1], "right", [0 1]))
%!error <single RT candidate> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "runner_up")
%!error <tol must lie> rt_surface (ads3_background ("vacuum", "line"), [0 1], "tol", 0)
%!error <overlap> rt_surface (ads3_background ("vacuum", "line"), [0 2; 1 3])
