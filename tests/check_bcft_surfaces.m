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

## ---- The two-sided BCFT at a boundary time t: minimiser and runner-up ----
## Kruskal picture [X_K, T_K, x] of eternal planar BTZ (doc/surfaces.md),
## u = T_K - X_K, v = T_K + X_K, metric (-4 du dv + R^2 (1 - uv)^2
## dx^2)/(1 + uv)^2, R = 2 pi/beta.  It is the quadric
## -X0^2 + X1^2 + X2^2 - X3^2 = -1 of R^{2,2} through X0 +- X1 = rho
## e^{+-R x}, rho = (1 - uv)/(1 + uv), X2 = (v - u)/(1 + uv),
## X3 = (v + u)/(1 + uv) (Banados, Henneaux, Teitelboim and Zanelli 1993,
## PRD 48, 1506; common practice), so the geodesic distance is
## cosh d = -X.Y; written in the chart (derived here) without the
## cancellations of X.Y near the boundary:
##   sinh^2(d/2) = ((1 - u1 v1)(1 - u2 v2) sinh^2(R dx/2) - du dv)
##                 / ((1 + u1 v1)(1 + u2 v2)),
## and for the null ray N = lim X/rho of a boundary point (u2 v2 = -1)
##   -X.N = (2 (1 - u1 v1) sinh^2(R dx/2) - du dv)/(1 + u1 v1).

%!## sinh^2(R dx/2), du and dv between the points p and q (rows)
%!function [s2, du, dv] = kruskal_parts (p, q, R)
%!  d = p - q;
%!  du = d(:,2) - d(:,1);  dv = d(:,2) + d(:,1);
%!  s2 = sinh (R * d(:,3) / 2).^2;
%!endfunction

%!function d = kruskal_dist (p, q, R)
%!  uvp = (p(:,2) - p(:,1)) .* (p(:,2) + p(:,1));
%!  uvq = (q(:,2) - q(:,1)) .* (q(:,2) + q(:,1));
%!  [s2, du, dv] = kruskal_parts (p, q, R);
%!  h = ((1 - uvp) .* (1 - uvq) .* s2 - du .* dv) ./ ((1 + uvp) .* (1 + uvq));
%!  d = 2 * asinh (sqrt (max (h, 0)));
%!endfunction

%!## Regulated length of a sampled curve: the distances between consecutive
%!## samples (the length of the curve if they lie on one geodesic) and, at
%!## an end on the boundary, the regulated distance log(-2 X.N/(R eps))
%!## from a sample X to the boundary point, whose cutoff point r = 1/eps is
%!## N/(R eps) + O(eps) (common practice), taken from the first sample
%!## with 1 + uv >= 1e-2 (nearer the boundary the rounding of X_K, T_K of
%!## a few units costs digits in 1 + uv).  dev: the sum over all bulk
%!## samples minus the distance between the first and the last (0 on one
%!## geodesic).
%!function [len, dev] = kruskal_length (c, R, eps)
%!  bd = abs (c(:,1).^2 - c(:,2).^2 - 1) < 1e-12 * c(:,1).^2;   # on the boundary
%!  assert (bd(1));
%!  k = find (! bd);
%!  assert (k', k(1):k(end));
%!  seg = kruskal_dist (c(1:end-1,:), c(2:end,:), R);
%!  dev = sum (seg(k(1:end-1))) - kruskal_dist (c(k(1),:), c(k(end),:), R);
%!  deep = find (1 + (c(:,2) - c(:,1)) .* (c(:,2) + c(:,1)) >= 1e-2 & ! bd);
%!  len = sum (seg(deep(1):deep(end)-1));
%!  for e = find (bd)'
%!    P = c(deep(1 + (e > deep(1)) * (numel (deep) - 1)),:);
%!    uv = (P(2) - P(1)) * (P(2) + P(1));
%!    [s2, du, dv] = kruskal_parts (P, c(e,:), R);
%!    len += log (2 * (2 * (1 - uv) * s2 - du * dv) / (1 + uv) / (R * eps));
%!  endfor
%!endfunction

%!## Which of s.pairs cross the bridge (join the two sides).
%!function nb = n_bridge (s)
%!  nb = sum (s.sides(s.pairs(:,1)) != s.sides(s.pairs(:,2)));
%!endfunction

%!test
%! ## The two branches of the Page curve.  On bcft_tfd at a time t the
%! ## minimiser is page_curve's and the runner-up is the best configuration
%! ## of the other kind: before the Page time (find_transition) the
%! ## Hartman-Maldacena geodesics through the bridge win and the runner-up
%! ## is the island configuration; after it the reverse; at the Page time
%! ## they agree.  For R = [b, Inf] against the closed forms
%! ## S_HM = (c/3) log((beta/(pi eps)) cosh(2 pi t/beta)) (Hartman and
%! ## Maldacena 2013, JHEP 05, 014) and S_island = (c/3) (log((beta/(pi eps))
%! ## sinh(2 pi b/beta)) + arctanh T) (Calabrese and Cardy 2004, J. Stat.
%! ## Mech. P06002, with log g of Takayanagi 2011, PRL 107, 101602; the
%! ## competition as in Almheiri, Mahajan and Maldacena 2019,
%! ## arXiv:1910.11077, from memory).
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6, "c", 6);
%! eps = bg.cutoff;  beta = bg.beta;  c = bg.c;
%! regs = {[1 Inf], [0.2 0.5; 1 Inf], [0.3 1.1; 1.6 2.4], [0.05 Inf]};
%! for q = 1:numel (regs)
%!   R = regs{q};
%!   tp = find_transition ("page_time", bg, R);
%!   ts = [0, tp / 2, tp * (1 - 1e-7), tp, tp + 1e-7, tp + 0.6];
%!   for t = ts
%!     [S, info] = page_curve (bg, R, t);
%!     s = rt_surface (bg, R, "t", t);
%!     r = rt_surface (bg, R, "t", t, "configuration", "runner_up");
%!     assert (s.picture, "kruskal");
%!     assert (s.S, S, 1e-10 * S);
%!     other = merge (info.n_bridge > 0, info.S_island, info.S_no_island);
%!     assert (r.S, other, 1e-10 * S);
%!     assert (r.S >= s.S);
%!     ## bridge geodesics before the Page time only (ties to the island)
%!     assert (n_bridge (s) > 0, t < tp);
%!     assert (n_bridge (r) > 0, t >= tp);
%!     assert (n_bridge (s), info.n_bridge);
%!     if (t == tp && tp > 0)
%!       assert (r.S, s.S, 1e-10 * S);
%!     endif
%!     if (isinf (R(end)) && rows (R) == 1)
%!       Shm = c / 3 * log (beta / (pi * eps) * cosh (2 * pi * t / beta));
%!       Sis = c / 3 * (log (beta / (pi * eps) * sinh (2 * pi * R(1) / beta)) + atanh (0.6));
%!       assert (sort ([s.S r.S]), sort ([Shm Sis]), 1e-10 * Sis);
%!       ch = exp (atanh (0.6)) * sinh (2 * pi * R(1) / beta);
%!       assert (tp, beta / (2 * pi) * acosh (max (ch, 1)), 1e-12);
%!     endif
%!   endfor
%! endfor

%!test
%! ## The curves from the metric: each piece of the minimiser and of the
%! ## runner-up before and after the Page time lies on one geodesic of the
%! ## Kruskal metric (samples collinear in R^{2,2}), the pieces' regulated
%! ## lengths add up to 6 S/c; the bridge geodesics run from the left
%! ## boundary to the right one at constant x (translation invariance);
%! ## the brane-ending ones stay on the slice of Schwarzschild time t
%! ## (T_K/X_K = tanh(2 pi t/beta), boost invariance) outside the horizon,
%! ## and, mapped back to the static slice (q^2 = X_K^2 - T_K^2,
%! ## z = zh (1 - q^2)/(1 + q^2)), end orthogonally on the brane at
%! ## distance arctanh T from the tensionless one (check_brane_curves).
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6, "c", 6, "cutoff", 1e-5);
%! beta = bg.beta;  Rk = 2 * pi / beta;  zh = bg.zh;
%! A = [0.2 0.5; 1 Inf];
%! tp = find_transition ("page_time", bg, A);
%! for t = [0.5 * tp, tp + 0.4]
%!   for which = {"minimal", "runner_up"}
%!     s = rt_surface (bg, A, "t", t, "configuration", which{1}, "tol", 1e-4);
%!     total = 0;
%!     nb = numel (s.brane.x);
%!     for k = 1:numel (s.curves)
%!       cv = s.curves{k};
%!       [len, dev] = kruskal_length (cv, Rk, bg.cutoff);
%!       assert (abs (dev) < 1e-10 * len);
%!       total += len;
%!       if (k <= rows (s.pairs))
%!         e = s.pairs(k,:);
%!         side = s.sides(e);
%!         ends = [(2 * side - 1) .* cosh(Rk * t), sinh(Rk * t) * [1; 1], s.endpoints(e)];
%!         assert (cv([1 end],:), ends, 1e-12 * cosh (Rk * t));
%!         if (side(1) != side(2))
%!           assert (cv(:,3), s.endpoints(e(1)) * ones (rows (cv), 1));
%!           assert (any (cv(:,1) < 0) && any (cv(:,1) > 0));
%!         endif
%!       else
%!         q = k - rows (s.pairs);
%!         assert (abs (cv(:,2) - tanh (Rk * t) * abs (cv(:,1))) < 1e-12 * cosh (Rk * t));
%!         q2 = cv(:,1).^2 - cv(:,2).^2;
%!         assert (all (q2(2:end) > 0 & q2(2:end) < 1));
%!         z = zh * (1 - q2) ./ (1 + q2);
%!         assert (abs (z(1)) < 1e-12);
%!         z(1) = 0;
%!         assert ([cv(end,3), z(end)], s.brane.landing(q,:), 1e-12);
%!         one = struct ("curves", {{[cv(:,3), z]}}, "brane", struct ("x", s.brane.x(q), "end", 0));
%!         check_brane_curves (bg, one, @(p, w) dist_btz (p, w, zh), bg.tension,
%!                             @(u, e) [0, zh / (1 + exp (-u))],
%!                             @(zz, e) [brane_profile(bg, zz), zz], [1 1] * zh * (1 - 1e-9));
%!       endif
%!     endfor
%!     assert (total * bg.c / 6, s.S, 1e-10 * s.S);
%!   endfor
%! endfor

%!error <needs the boundary time 't'> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "configuration", "runner_up")
%!error <rt_surface: t: applies to the two-sided> rt_surface (ads3_background ("bcft", "half_line"), [1 2], "t", 1)
%!error <rt_surface: t: must be nearer 0 for the Kruskal picture> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 Inf], "t", 300)
%!error <rt_surface: t: is too far from 0> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 Inf], "t", 1e308, "configuration", "runner_up")
%!error <rt_surface: t must not be NaN> rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "t", NaN)
%!error <plot_rt_surface: configuration "runner_up" on a two-sided> plot_rt_surface (ads3_background ("bcft_tfd", "half_line", "beta", 2), [1 2], "runner_up", true)
%!error <single RT candidate> rt_surface (ads3_background ("bcft", "interval", "length", 3, "beta", 1), [0 3], "configuration", "runner_up")
%!error <rt_surface: A\(1,:\): must lie> rt_surface (ads3_background ("bcft", "half_line"), [-1 2])
