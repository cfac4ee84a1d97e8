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
## bifurcation circle X_K = T_K = 0.  Sampled with the same rule.  The
## runner-up on this path (up to 8 intervals in all, a brute force): on
## a line with endpoint times and on a quench (line or circle), the best
## other non-crossing pairing of the endpoints; on the thermofield double
## of a line, the best other non-crossing pairing in the order of the
## bridge slice (right ascending, then left descending), each pair within
## a side or through the bridge (with the shock): the Hartman-Maldacena
## competition of the bridge against the geodesics within each side.
## Regions with times on a circle and the circle's annulus have none
## (@code{holent:unsupported}).  On a circle a region on both sides gives the
## minimiser over the annulus (@file{doc/tfd_shock.md}): geodesics within
## each side (over the arc in @code{arcs}), geodesics through the bridge
## at the winding of the minimiser (@code{windings}: the right point's
## image x_R + w L, the curve's x running over the lifted separation), and
## the horizon circle when the Z2 homology asks for it.
##
## @strong{Shock wave} (@qcode{"shock_alpha"} > 0, Shenker and Stanford 2014;
## @file{doc/tfd_shock.md}): a geodesic through the bridge crosses the
## shock u = 0 once, where it is continued after a shift of the Kruskal v
## by alpha.  Its curve is two pieces of BTZ geodesics separated by a row
## of NaN (so that @code{plot} leaves the gap): from the left boundary
## point to the crossing (u = 0, v + alpha) in the left side's coordinates
## (X_K = T_K = (v + alpha)/2), then from (u = 0, v) in the right side's
## coordinates to the right boundary point (in the order of the pair: the
## right piece first when the pair starts on the right).  The crossing
## (v, x) is the stationary point of the length, the one the entropy
## uses; the jump along the null shock has zero length, so the two
## pieces' lengths add up to the regulated length of @code{rt_entropy}.
##
## @var{surf} (a struct array of the size of the cell) has fields
## @table @code
## @item picture
## @qcode{"half_plane"} or @qcode{"disk"}.
## @item curves
## a cell row, one k x 2 (k x 3 with t) array per geodesic, in the order
## of @code{pairs}; a geodesic through a shock has one NaN row between its
## two pieces.
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
## @item windings
## per geodesic, the winding w of a geodesic through the bridge of a
## thermofield double on a circle (it joins x_L to x_R + w L); 0 for the
## others.
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
%! ## Both sides of a circle (the annulus of the two-sided BTZ, Banados,
%! ## Henneaux, Teitelboim and Zanelli 1993, PRD 48, 1506): A_L = [0, 1],
%! ## A_R = [0, 4], L = 5, beta = 1 at t = 0 are joined through the bridge,
%! ## 0 to 0 and 1 to 4: that bridge spans 3 > L/2 (winding 0; the shorter
%! ## image, -2, would cross the first bridge), each from X_K = -1 to 1.
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 5);
%! s = rt_surface (bg, struct ("left", [0 1], "right", [0 4]));
%! assert (s.picture, "kruskal");
%! assert (s.pairs, [1 4; 2 3]);
%! assert ([s.endpoints, s.sides], [0 1; 4 1; 1 0; 0 0]);
%! assert (s.windings, [0; 0]);
%! c = s.curves{2};
%! assert (c([1 end], :), [1 0 4; -1 0 1], 1e-12);
%! ## late (t = 3), A_L = A_R = [0, 4]: no bridge, one geodesic per side
%! ## over the complement [4, 5] and no horizon (both faces of the hole
%! ## in A; the state is pure: S(A) = S(A^c), common practice)
%! s = rt_surface (bg, struct ("left", [0 4], "right", [0 4]), "t", 3);
%! assert (s.sides(s.pairs(:,1)), s.sides(s.pairs(:,2)));
%! assert (s.arcs, [1; 1], 1e-12);
%! assert (! s.horizon);
%! assert (s.S, rt_entropy (bg, struct ("left", [4 5], "right", [4 5]), "t", 3), 1e-12);

%!test
%! ## Through a shock (alpha = 2) at t = 0 over equal intervals: two pieces
%! ## split by a NaN row, crossing u = 0 at X_K = T_K = -+alpha/4 (right
%! ## coordinates v = -alpha/2, left v + alpha; the symmetric point of
%! ## doc/tfd_shock.md, section 2).
%! bg = ads3_background ("tfd", "line", "beta", 2, "shock_alpha", 2);
%! s = rt_surface (bg, struct ("left", [0 3], "right", [0 3]));
%! c = s.curves{1};
%! i = find (isnan (c(:,1)));
%! assert (isscalar (i) && all (isnan (c(i,:))));
%! assert (sort (c([i-1 i+1], 1:2)), [-0.5 -0.5; 0.5 0.5], 1e-14);

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

%!test
%! ## Late: after saturation (Hartman and Maldacena 2013) the geodesics
%! ## stay within each side; at t = 40 beta their ends sit at
%! ## X_K = -+cosh(2 pi t/beta), T_K = sinh(2 pi t/beta), about 1e109.
%! bg = ads3_background ("tfd", "line", "beta", 1);
%! A = struct ("left", [0 3], "right", [0 3]);
%! s = rt_surface (bg, A, "t", 40);
%! assert (s.sides(s.pairs(:,1)), s.sides(s.pairs(:,2)));
%! for k = 1:2
%!   c = s.curves{k};  sd = s.sides(s.pairs(k,1));
%!   assert (c([1 end], 1:2), [1 1; 1 1] .* [(2*sd-1) * cosh(80*pi), sinh(80*pi)], 1e-15 * cosh (80*pi));
%!   assert (all (isfinite (c(:))));
%! endfor

%!error <Invalid call> rt_surface (ads3_background ("vacuum", "line"))
%!error <t: must be nearer 0 for the Kruskal picture> rt_surface (ads3_background ("tfd", "line", "beta", 1), struct ("left", [0 3], "right", [0 3]), "t", 200)
%!error <not available for regions with times on a circle> rt_surface (ads3_background ("vacuum", "circle"), [0 1 0 0.5; 2 3 0 0], "configuration", "runner_up")
%!error <single candidate> rt_surface (ads3_background ("vacuum", "line"), [0 1 0 0.5], "configuration", "runner_up")
%!error <configuration must be> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "best")
%!error <single RT candidate> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "runner_up")
%!error <tol must lie> rt_surface (ads3_background ("vacuum", "line"), [0 1], "tol", 0)
%!error <overlap> rt_surface (ads3_background ("vacuum", "line"), [0 2; 1 3])
