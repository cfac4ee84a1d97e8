## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
##
## RT surfaces that end on end-of-the-world branes (rt_surface on BCFT
## backgrounds), checked against the metric, independently of the core:
##  * hyperbolic distances on the constant-time slice from their closed
##    forms (common practice): the Poincare half plane, the Poincare disk,
##    and the static planar BTZ slice through its embedding in R^{2,1},
##    X = ((r/r+) cosh(r+ x), (r/r+) sinh(r+ x), sqrt(r^2/r+^2 - 1)),
##    cosh d = -X1.X2 with r = 1/z, r+ = 1/zh;
##  * the brane is the curve at distance rho = arctanh(T) from the
##    tensionless brane, the geodesic orthogonal to the boundary at the
##    BCFT's end (Takayanagi 2011, PRL 107, 101602): checked with fminbnd
##    for the distance from a point to that geodesic;
##  * the landing point minimises the distance from the boundary point
##    over the brane (the geodesic meets it orthogonally): fminbnd on the
##    length (common practice);
##  * every sample of the curve lies on the geodesic from the boundary
##    point to the landing point: d(B, P) + d(P, L) = d(B, L).

%!function d = dist_hp (p, q)
%!  ## Poincare half plane, as 2 asinh of half the chord (no cancellation)
%!  d = 2 * asinh (sqrt ((p(:,1) - q(:,1)).^2 + (p(:,2) - q(:,2)).^2) ./ (2 * sqrt (p(:,2) .* q(:,2))));
%!endfunction

%!function d = dist_btz (p, q, zh)
%!  c = zh^2 ./ (p(:,2) .* q(:,2)) .* cosh ((p(:,1) - q(:,1)) / zh) ...
%!      - sqrt (zh^2 ./ p(:,2).^2 - 1) .* sqrt (zh^2 ./ q(:,2).^2 - 1);
%!  d = acosh (max (c, 1));
%!endfunction

%!function d = dist_disk (p, q)
%!  w2 = (p(:,1) - q(:,1)).^2 + (p(:,2) - q(:,2)).^2;
%!  d = 2 * asinh (sqrt (w2 ./ ((1 - sum (p.^2, 2)) .* (1 - sum (q.^2, 2)))));
%!endfunction

%!function p = disk_point (bg, x, z)
%!  ## bulk coordinates of doc/bcft.md (x = z0 theta, z = z0/cosh r) to the
%!  ## disk of doc/surfaces.md (R = tanh(r/2), angle pi x/length)
%!  R = tanh (acosh (bg.z0 ./ z) / 2);
%!  p = [R .* cos(x / bg.z0), R .* sin(x / bg.z0)];
%!endfunction

%!function check_brane_curves (bg, s, dist, tens, zero_geo, brane_pt, zb_max)
%!  ## the brane-ending curves are the last numel(s.brane.x) of s.curves
%!  nb = numel (s.brane.x);
%!  assert (nb > 0);
%!  for q = 1:nb
%!    c = s.curves{end - nb + q};
%!    e = 1 + (s.brane.end(q) > 0);
%!    rho = atanh (tens(e));
%!    B = c(1,:);  L = c(end,:);
%!    assert (B(2) == 0 || abs (hypot (B(1), B(2)) - 1) < 1e-14);
%!    ## (1) L is at distance |rho| from the tensionless brane, on the side
%!    ##     away from the region when T > 0
%!    [~, dperp] = fminbnd (@(u) dist (L, zero_geo (u, e)), -30, 30,
%!                          optimset ("TolX", 1e-13));
%!    assert (dperp, abs (rho), 1e-8);
%!    ## (2) L minimises the distance from the boundary point over the brane
%!    Bd = B;
%!    if (B(2) == 0)
%!      Bd(2) = 1e-7;
%!    else
%!      Bd = B * (1 - 1e-7);
%!    endif
%!    f = @(u) dist (Bd, brane_pt (u, e));
%!    [us, dmin] = fminbnd (f, 1e-9, zb_max (e), optimset ("TolX", 1e-14));
%!    P = brane_pt (us, e);
%!    assert (L, P, 2e-6 * max (1, norm (P)));
%!    assert (dist (Bd, L), dmin, 1e-9);
%!    ## (3) every sample lies on the geodesic from B to L (but those next
%!    ##     to B, where the closed forms cancel to a few digits)
%!    k = find (hypot (c(:,1) - B(1), c(:,2) - B(2)) > 1e-3 * norm (L - B));
%!    k = k(k < rows (c));
%!    dev = dist (repmat (Bd, numel (k), 1), c(k,:)) + dist (c(k,:), repmat (L, numel (k), 1)) ...
%!          - dist (Bd, L);
%!    assert (max (abs (dev)) < 1e-6);
%!  endfor
%!endfunction

%!test
%! ## Half line at zero temperature: Poincare AdS3 (tensions of both signs).
%! for T = [0.5, 0, -0.4]
%!   bg = ads3_background ("bcft", "half_line", "tension", T);
%!   s = rt_surface (bg, [0.1 2; 2.5 2.6], "tol", 1e-4);
%!   [S, conf] = rt_entropy (bg, [0.1 2; 2.5 2.6]);
%!   assert (s.S, S, 1e-12);
%!   assert (s.brane.landing, conf.brane.landing, 1e-14);
%!   zero_geo = @(u, e) [0, exp(u)];
%!   brane_pt = @(z, e) [brane_profile(bg, z), z];
%!   ## the profile itself is on the brane (1) at a few depths
%!   for z = [0.1 1 7]
%!     [~, d] = fminbnd (@(u) dist_hp ([brane_profile(bg, z), z], [0, exp(u)]), -30, 30,
%!                       optimset ("TolX", 1e-13));
%!     assert (d, abs (atanh (T)), 1e-8);
%!   endfor
%!   check_brane_curves (bg, s, @dist_hp, [T T], zero_geo, brane_pt, [50 50]);
%! endfor

%!test
%! ## Half line at finite temperature (planar BTZ) and an interval in its
%! ## BTZ saddle with unequal tensions: branes at both ends and the horizon.
%! bh = ads3_background ("bcft", "half_line", "tension", -0.3, "beta", 2);
%! bi = ads3_background ("bcft", "interval", "length", 3, "tension", [0.35 -0.2], "beta", 1.5);
%! regs = {[0.1 3], [0 2.95]};
%! bgs = {bh, bi};
%! for k = 1:2
%!   bg = bgs{k};  zh = bg.zh;  len = bg.length;
%!   s = rt_surface (bg, regs{k}, "tol", 1e-4);
%!   dist = @(p, q) dist_btz (p, q, zh);
%!   zero_geo = @(u, e) [merge(e == 2, len, 0), zh / (1 + exp (-u))];   # x = 0 or length
%!   for z = [0.05 0.2] * zh / 0.3
%!     x = brane_profile (bg, z);
%!     [~, d] = fminbnd (@(u) dist ([x, z], zero_geo (u, 1)), -40, 40, optimset ("TolX", 1e-13));
%!     assert (d, abs (atanh (bg.tension(1))), 1e-8);
%!   endfor
%!   brane_pt = @(z, e) [brane_profile(bg, z, e - 1), z];
%!   check_brane_curves (bg, s, dist, bg.tension, zero_geo, brane_pt, [1 1] * zh * (1 - 1e-9));
%!   if (k == 2)
%!     ## the whole-horizon piece lies at z = zh between the branes
%!     assert (s.horizon);
%!     assert (s.horizon_curve(:,2), [zh; zh], 1e-15);
%!     assert (s.horizon_curve(:,1)', [brane_profile(bg, zh), brane_profile(bg, zh, 1)], 1e-12);
%!     ## the drawn branes end there
%!     assert (s.brane_curves{2}(end,:), [brane_profile(bg, zh, 1), zh], 1e-12);
%!   endif
%! endfor

%!test
%! ## Interval in its thermal AdS saddle: the disk of the doubled interval,
%! ## one brane joining both ends.
%! for T = [0.3 -0.25]
%!   bg = ads3_background ("bcft", "interval", "length", 3, "tension", T);
%!   s = rt_surface (bg, [0.3 2.7], "tol", 1e-4);
%!   assert (s.picture, "disk");
%!   [~, conf] = rt_entropy (bg, [0.3 2.7]);
%!   zero_geo = @(u, e) [tanh(u), 0];              # the diameter theta = 0, pi
%!   brane_pt = @(z, e) disk_point (bg, brane_profile (bg, z), z);
%!   zt = bg.z0 / cosh (atanh (T));                 # the brane's deepest point
%!   for q = 1:numel (conf.brane.x)
%!     L = disk_point (bg, conf.brane.landing(q,1), conf.brane.landing(q,2));
%!     assert (s.curves{end - numel (conf.brane.x) + q}(end,:), L, 1e-14);
%!   endfor
%!   ## the landing points of both ends lie on the half of the brane from x = 0
%!   ## or its mirror image (theta -> pi - theta): check each on its half
%!   nb = numel (s.brane.x);
%!   for q = 1:nb
%!     c = s.curves{end - nb + q};
%!     if (c(1,1) < 0)     # from x > length/2: mirror the picture
%!       s2 = s;  s2.curves = {[-c(:,1), c(:,2)]};
%!       s2.brane.x = 0;  s2.brane.end = 0;
%!     else
%!       s2 = s;  s2.curves = {c};  s2.brane.x = 0;  s2.brane.end = 0;
%!     endif
%!     check_brane_curves (bg, s2, @dist_disk, [T T], zero_geo, brane_pt, [1 1] * zt);
%!   endfor
%!   ## the drawn brane runs from theta = 0 to theta = pi
%!   b = s.brane_curves{1};
%!   assert (b([1 end],:), [1 0; -1 0], 1e-12);
%! endfor

%!test
%! ## Islands of the two-sided BCFT (page_curve): the late-time
%! ## configuration on one exterior, a planar BTZ slice with the brane.
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6, "c", 6);
%! R = [0.2 0.5; 1 Inf];
%! s = rt_surface (bg, R, "tol", 1e-4);
%! [~, info] = page_curve (bg, R, 100);
%! assert (s.S, info.S_island, 1e-12);
%! assert (s.brane.landing, info.island, 1e-14);
%! assert (s.pairs, info.island_pairs);
%! zh = bg.zh;
%! check_brane_curves (bg, s, @(p, q) dist_btz (p, q, zh), bg.tension,
%!                     @(u, e) [0, zh / (1 + exp (-u))],
%!                     @(z, e) [brane_profile(bg, z), z], [1 1] * zh * (1 - 1e-9));

%!test
%! ## Runner-up on the half line (Poincare, T = 0.4, and planar BTZ,
%! ## T = -0.3): the other saddle of an interval, connected vs ending on
%! ## the brane (Takayanagi 2011, PRL 107, 101602 for the candidates),
%! ## its area computed here from the metric: the connected geodesic as
%! ## the distance of the two cutoff points, each brane-ending one as the
%! ## least distance from its cutoff point to the brane (fminbnd over the
%! ## landing depth); the runner-up's curves pass check_brane_curves.
%! bp = ads3_background ("bcft", "half_line", "tension", 0.4, "cutoff", 1e-5);
%! bt = ads3_background ("bcft", "half_line", "tension", -0.3, "beta", 2, "cutoff", 1e-5);
%! for k = 1:2
%!   bg = merge (k == 1, bp, bt);
%!   if (k == 1)
%!     dist = @dist_hp;  zmax = 50;
%!     zero_geo = @(u, e) [0, exp(u)];
%!   else
%!     zh = bt.zh;  dist = @(p, q) dist_btz (p, q, zh);  zmax = zh * (1 - 1e-9);
%!     zero_geo = @(u, e) [0, zh / (1 + exp (-u))];
%!   endif
%!   brane_pt = @(z, e) [brane_profile(bg, z), z];
%!   eps = bg.cutoff;
%!   for A = {[1 2], [0.1 1.4]}
%!     a = A{1};
%!     s = rt_surface (bg, a, "tol", 1e-4);
%!     r = rt_surface (bg, a, "configuration", "runner_up", "tol", 1e-4);
%!     conn = dist ([a(1) eps], [a(2) eps]);
%!     ends = 0;
%!     for x = a
%!       [~, d] = fminbnd (@(z) dist ([x eps], brane_pt (z, 1)), 1e-9, zmax, optimset ("TolX", 1e-14));
%!       ends += d;
%!     endfor
%!     both = sort ([conn ends]) * bg.c / 6;
%!     assert ([s.S r.S], both, 1e-6);
%!     assert (r.S >= s.S);
%!     assert (isempty (r.pairs) != isempty (s.pairs));
%!     if (! isempty (r.brane.x))
%!       check_brane_curves (bg, r, dist, bg.tension(1) * [1 1], zero_geo, brane_pt, [1 1] * zmax);
%!     endif
%!   endfor
%! endfor

%!test
%! ## Interval in its BTZ saddle: the runner-up is a candidate of the same
%! ## set, not below the minimum, and differs from it.
%! bg = ads3_background ("bcft", "interval", "length", 3, "tension", 0.3, "beta", 1);
%! s = rt_surface (bg, [0.2 0.9; 1.5 2.8]);
%! r = rt_surface (bg, [0.2 0.9; 1.5 2.8], "configuration", "runner_up");
%! assert (r.S >= s.S);
%! assert (! isequal ({s.pairs, s.brane.x, s.horizon}, {r.pairs, r.brane.x, r.horizon}));

%!error <needs the boundary time 't'> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "configuration", "runner_up")
%!error <rt_surface: t: applies to the two-sided> rt_surface (ads3_background ("bcft", "half_line"), [1 2], "t", 1)
%!error <rt_surface: t must not be NaN> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "t", NaN)
%!error <plot_rt_surface: configuration "runner_up" on a two-sided> plot_rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "runner_up", true)
%!error <single RT candidate> rt_surface (ads3_background ("bcft", "interval", "length", 3, "beta", 1), [0 3], "configuration", "runner_up")
%!error <rt_surface: A\(1,:\): must lie> rt_surface (ads3_background ("bcft", "half_line"), [-1 2])
