## SPDX-License-Identifier: GPL-3.0-or-later
## Two-sided regions on the thermofield double on a circle (the annulus of
## the two-sided BTZ black hole): the dynamic programme of the core against
## a brute force written here from scratch, purity, the large-L limit, the
## linear growth and saturation, the information quantities built on it,
## and rt_surface's curves of the minimiser, whose lengths are integrated
## here with the Kruskal metric.
##
## The brute force does not share the core's formulation: every perfect
## matching of the endpoints (crossing ones too), each pair joined by the
## best geodesic of each parity of crossings with a reference path (from a
## point of A^c on the left boundary to one of A^c on the right), over a
## range of windings, with lengths from the embedding of the two-sided BTZ
## in R^{2,2} (Banados, Henneaux, Teitelboim and Zanelli 1993, PRD 48,
## 1506: cosh d = -X.Y, the circle an identification x ~ x + L), the
## horizon loop (length R L, the translation length of that
## identification) added as the Z2 homology of the annulus asks (an even
## number of crossings with the reference path in all; common practice).

## Regulated length from boundary null vectors: d = log(2 (-n.m)) + 2 log(1/eps)
## for the cutoff r = 1/eps (the large-r limit of acosh(-X.Y)).
%!function n = bvec (R, side, x, t)
%!   ## Right exterior: X = (r/R)(cosh Rx, sinh Rx) and sqrt(r^2/R^2 - 1)(sinh Rt,
%!   ## cosh Rt) with the metric diag(-1, 1, -1, 1); the left exterior at forward
%!   ## time t flips the cosh Rt component (Kruskal u, v exchanged).
%!   n = [cosh(R * x), sinh(R * x), sinh(R * t), (2 * side - 1) * cosh(R * t)] / R;
%!endfunction

%!function d = emb_len (R, eps, p, q)
%!   ## p, q = [side, x, t].  Isometries first bring the pair to a symmetric
%!   ## position (the boost x -> x - x0 in the X0-X1 plane; the Killing
%!   ## time, which moves a right time forward and a left one back), so
%!   ## the inner product has no cancellation between large terms.
%!   x0 = (p(2) + q(2)) / 2;
%!   if (p(1) == q(1))
%!     t0 = (p(3) + q(3)) / 2;
%!     p(3) -= t0; q(3) -= t0;
%!   else
%!     s = (p(3) - q(3)) / 2 * (2 * p(1) - 1);   # half of tR - tL
%!     p(3) -= s * (2 * p(1) - 1); q(3) -= s * (2 * q(1) - 1);
%!   endif
%!   p(2) -= x0; q(2) -= x0;
%!   n = bvec (R, p(1), p(2), p(3));
%!   m = bvec (R, q(1), q(2), q(3));
%!   ip = -n(1) * m(1) + n(2) * m(2) - n(3) * m(3) + n(4) * m(4);
%!   d = log (2 * (-ip)) - 2 * log (eps);
%!endfunction

## Shocked bridge (Shenker and Stanford 2014, JHEP 03 (2014) 067, the
## x-dependent form of doc/tfd_shock.md section 2, checked in
## tests/core/test_tfd.c by extremising over the crossing point).
%!function d = shock_len (beta, eps, alpha, xl, tl, xr, tr)
%!   k = pi / beta; T = tl + tr; dx = xr - xl;
%!   d = 2 * log ((beta / (pi * eps)) * (sqrt (cosh (k * (T + dx)) * cosh (k * (T - dx))) ...
%!                                         + alpha / 2 * exp (k * (tl - tr))));
%!endfunction

## Parity of the crossings of the lifted curve from (s1, a) to (s2, b) with
## every lift of the reference path from (left, pL + kL) to (right, pR + kL).
%!function par = crossings (s1, a, s2, b, pL, pR, L)
%!   K = -12:12;
%!   if (s1 == s2)
%!     p = merge (s1 == 1, pR, pL) + K * L;
%!     par = mod (sum (p > min (a, b) & p < max (a, b)), 2);
%!   else
%!     if (s1 == 1)               # order as (left a, right b)
%!       [a, b] = deal (b, a);
%!     endif
%!     par = mod (sum (sign (a - pL - K * L) .* sign (b - pR - K * L) < 0), 2);
%!   endif
%!endfunction

%!function S = brute_entropy (bg, A, dt)
%!   beta = bg.beta; L = bg.circumference; eps = bg.cutoff; R = 2 * pi / beta;
%!   alpha = bg.shock_alpha;
%!   P = zeros (0, 3);            # [side, x, t]
%!   gaps = cell (1, 2);
%!   nm = {"left", "right"};
%!   for s = 0:1
%!     M = A.(nm{s + 1});
%!     P = [P; s * ones(rows (M), 1), M(:, 1), M(:, 3) + dt; ...
%!             s * ones(rows (M), 1), M(:, 2), M(:, 4) + dt];
%!     ## a point of A^c: the middle of the gap after the first interval
%!     e = mod (M(1, 2), L); st = sort (mod (M(:, 1), L));
%!     nxt = st(find (st > e, 1)); if (isempty (nxt)) nxt = st(1) + L; endif
%!     gaps{s + 1} = (e + nxt) / 2;
%!   endfor
%!   pL = gaps{1}; pR = gaps{2};
%!   N = rows (P);
%!   P(:, 2) = mod (P(:, 2), L);
%!   W = Inf (N, N, 2);           # best length of each parity
%!   for i = 1:N
%!     for j = i + 1:N
%!       for w = -2:2
%!         a = P(i, 2); b = P(j, 2) + w * L;
%!         if (P(i, 1) == P(j, 1))
%!           if (abs (a - b) < 1e-14 || abs (w) > 1) continue; endif
%!           d = emb_len (R, eps, P(i, :), [P(j, 1), b, P(j, 3)]);
%!         else
%!           q = [P(j, 1), b, P(j, 3)];
%!           if (P(i, 1) == 0)
%!             l = P(i, :); r = q;
%!           else
%!             l = q; r = P(i, :);
%!           endif
%!           if (alpha > 0)
%!             d = shock_len (beta, eps, alpha, l(2), l(3), r(2), r(3));
%!           else
%!             d = emb_len (R, eps, P(i, :), q);
%!           endif
%!         endif
%!         par = crossings (P(i, 1), a, P(j, 1), b, pL, pR, L);
%!         W(i, j, par + 1) = min (W(i, j, par + 1), real (d));
%!       endfor
%!     endfor
%!   endfor
%!   ## every perfect matching; best total of each parity
%!   best = match_best (W, 1:N);
%!   hor = R * L;                  # closed geodesic of the identification
%!   S = bg.c / 6 * min (best(1), best(2) + hor);
%!endfunction

%!function b = match_best (W, idx)
%!   if (isempty (idx))
%!     b = [0, Inf];
%!     return;
%!   endif
%!   i = idx(1); b = [Inf, Inf];
%!   for k = 2:numel (idx)
%!     j = idx(k);
%!     rest = match_best (W, idx([2:k-1, k+1:end]));
%!     for p = 0:1
%!       for q = 0:1
%!         v = W(i, j, p + 1) + rest(q + 1);
%!         b(mod (p + q, 2) + 1) = min (b(mod (p + q, 2) + 1), v);
%!       endfor
%!     endfor
%!   endfor
%!endfunction

## n disjoint random intervals on a circle, times small enough to keep each
## side achronal, a random rotation (rows may wrap).
%!function M = rand_side (n, L)
%!   x = sort (rand (2 * n, 1)) * L;
%!   while (min (diff ([x; x(1) + L])) < 0.02 * L)
%!     x = sort (rand (2 * n, 1)) * L;
%!   endwhile
%!   sep = min (diff ([x; x(1) + L]));
%!   t = (rand (2 * n, 1) - 0.5) * 0.9 * sep;
%!   M = [x(1:2:end), x(2:2:end), t(1:2:end), t(2:2:end)];
%!   if (rand () < 0.5)           # the complement's rows: one wraps through L
%!     M = [x(2:2:end), [x(3:2:end); x(1) + L], t(2:2:end), [t(3:2:end); t(1)]];
%!   endif
%!   M(:, 1:2) = M(:, 1:2) + rand () * L;
%!endfunction

%!test
%! ## The core's minimum against the brute force, with and without shocks.
%! rand ("seed", 7);
%! worst = 0; nbridge = 0; nhor = 0; ntot = 0;
%! for trial = 1:150
%!   ## every third a short circle, where the horizon is cheap
%!   beta = 0.5 + 2 * rand (); L = merge (mod (trial, 3), 1 + 6 * rand (), 0.3 + rand ());
%!   alpha = (rand () < 0.4) * 3 * rand ();
%!   bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, ...
%!                         "c", 3, "shock_alpha", alpha);
%!   nl = 1 + (rand () < 0.35); nr = 1 + (rand () < 0.5);
%!   A = struct ("left", rand_side (nl, L), "right", rand_side (nr, L));
%!   dt = 1.5 * beta * rand () ^ 2;
%!   [S, conf] = rt_entropy (bg, A, "t", dt);
%!   Sb = brute_entropy (bg, A, dt);
%!   worst = max (worst, abs (S - Sb) / abs (Sb));
%!   nbridge += conf.crossings > 0; nhor += conf.horizon; ntot++;
%! endfor
%! assert (worst < 1e-12);
%! ## both kinds of minimiser occur
%! assert (nbridge >= 20 && nhor >= 4 && ntot - nbridge >= 60);

%!test
%! ## Purity of the TFD (common practice): S(A) = S(A^c) with the complement
%! ## on both sides; S(A_L u whole right) = S(A_L^c on the left alone);
%! ## S(whole left u whole right) = 0.
%! rand ("seed", 3);
%! for k = 1:30
%!   beta = 0.5 + rand (); L = 2 + 4 * rand ();
%!   bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, ...
%!                         "shock_alpha", (k > 20) * rand ());
%!   x = sort (rand (4, 1)) * L; y = sort (rand (4, 1)) * L;
%!   A = struct ("left", [x(1) x(2); x(3) x(4)], "right", [y(1) y(2); y(3) y(4)]);
%!   Ac = struct ("left", [x(2) x(3); x(4) x(1) + L], "right", [y(2) y(3); y(4) y(1) + L]);
%!   t = 3 * rand ();
%!   assert (rt_entropy (bg, A, "t", t), rt_entropy (bg, Ac, "t", t), 1e-11);
%!   B = struct ("left", [x(1) x(2)], "right", [0 L]);
%!   assert (rt_entropy (bg, B, "t", t), ...
%!           rt_entropy (bg, struct ("left", [x(2) x(1) + L]), "t", t), 1e-11);
%! endfor
%! assert (rt_entropy (bg, struct ("left", [0 L], "right", [0 L])), 0);

%!test
%! ## Large L: the circle approaches the line (the bridge windings and the
%! ## other class move off to infinity).
%! bl = ads3_background ("tfd", "line", "beta", 1);
%! bc = ads3_background ("tfd", "circle", "beta", 1, "circumference", 80);
%! A = struct ("left", [0 2; 3 3.5], "right", [0.5 2.2; 4 5]);
%! t = [0 0.3 0.7 1.5 3];
%! assert (rt_entropy (bc, A, "t", t), rt_entropy (bl, A, "t", t), 1e-9);

%!test
%! ## Hartman and Maldacena 2013 (JHEP 05 (2013) 014): A_L = A_R = [0, l]
%! ## with l small against L: S = (2c/3) min(log((beta/(pi eps)) cosh(2 pi
%! ## t/beta)), log((beta/(pi eps)) sinh(pi l/beta))), two geodesics through
%! ## the bridge until they are longer than the two within the sides: the
%! ## linear growth at the rate 4 s_th (s_th = pi c/(3 beta)) and saturation.
%! beta = 1; L = 10; l = 2; eps = 1e-3; c = 3;
%! bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, "cutoff", eps, "c", c);
%! t = linspace (0, 2, 17);
%! S = rt_entropy (bg, struct ("left", [0 l], "right", [0 l]), "t", t);
%! conn = 2 * c / 3 * log (beta / (pi * eps) * cosh (2 * pi * t / beta));
%! disc = 2 * c / 3 * log (beta / (pi * eps) * sinh (pi * l / beta));
%! assert (S, min (conn, disc), 1e-12);
%! ## the slope before saturation (t ~ 1.0) against 4 s_th, up to tanh
%! k = find (t >= 0.5 & t <= 0.9);
%! sl = diff (S(k)) ./ diff (t(k));
%! assert (sl, 4 * pi * c / (3 * beta) * ones (size (sl)), 2e-2 * 4 * pi * c / 3);
%! assert (mi_vanishing_time (bg, struct ("left", [0 l], "right", [0 l])), ...
%!         beta / (2 * pi) * acosh (sinh (pi * l / beta)), 1e-10);

%!test
%! ## Intervals longer than half the circle: saturation at 2 S(A) one-sided,
%! ## S(A) = min(geodesic, geodesic of A^c + S_BH) (common practice).
%! beta = 1; L = 4; l = 3.2; eps = 1e-3; c = 3;
%! bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, "cutoff", eps, "c", c);
%! A = struct ("left", [0 l], "right", [0 l]);
%! S1 = rt_entropy (bg, struct ("right", [0 l]));
%! SAc = rt_entropy (bg, struct ("right", [l L]));
%! S = rt_entropy (bg, A, "t", [0 5]);
%! ## late: no bridge, and the pure-state value 2 S(A^c) (no horizon needed)
%! assert (S(2), min (2 * S1, 2 * SAc), 1e-12);
%! assert (S(2) < 2 * S1);
%! I = mutual_information (bg, struct ("left", [0 l]), struct ("right", [0 l]), "t", [0 5]);
%! assert (I(2) > 0);            # saturation below S(A_L) + S(A_R)

%!## Length of a curve P (k x 3: X_K, T_K, x) sampled by rt_surface in the
%!## Kruskal picture of the two-sided BTZ, with the metric
%!## ds^2 = (-4 du dv + R^2 (1 - uv)^2 dx^2)/(1 + uv)^2, u = T_K - X_K,
%!## v = T_K + X_K, r = R (1 - uv)/(1 + uv) (common practice; the exterior
%!## -f dt^2 + dr^2/f + r^2 dx^2 by u = -e^{-R(t - r*)}, v = e^{R(t + r*)}),
%!## up to the cutoff r = 1/eps: every straight segment between
%!## samples by 5-point Gauss-Legendre (nodes by the Golub-Welsch
%!## eigenvalue method), the segments that cross the cutoff cut there by
%!## fzero.  Vectorised over the segments: the curves have 10^4-10^5
%!## samples at tol = 1e-9.
%!function len = kruskal_length (P, R, eps)
%!  in = @(p) 1 + p(:,2).^2 - p(:,1).^2 - 2 * R / (1 / eps + R);  # >= 0: r <= 1/eps
%!  b = (1:4) ./ sqrt (4 * (1:4).^2 - 1);
%!  [V, D] = eig (diag (b, 1) + diag (b, -1));
%!  xg = diag (D);  wg = 2 * V(1,:)'.^2;
%!  A = P(1:end-1,:);  B = P(2:end,:);  dP = B - A;
%!  ga = in (A);  gb = in (B);
%!  u0 = zeros (rows (A), 1);  u1 = ones (rows (A), 1);
%!  for j = find ((ga < 0) != (gb < 0))'
%!    u = fzero (@(u) in (A(j,:) + u * dP(j,:)), [0 1], optimset ("TolX", 1e-17));
%!    if (ga(j) < 0)
%!      u0(j) = u;
%!    else
%!      u1(j) = u;
%!    endif
%!  endfor
%!  keep = ga >= 0 | gb >= 0;
%!  len = 0;
%!  for q = 1:5
%!    p = A + (u0 + (u1 - u0) * (xg(q) + 1) / 2) .* dP;
%!    ds = sqrt (max (0, kruskal_rows (p, dP, R)));
%!    len += sum (keep .* (u1 - u0) .* ds) * wg(q) / 2;
%!  endfor
%!endfunction

%!## ds^2/du^2 of that metric at the points p along the directions d (rows)
%!function q = kruskal_rows (p, d, R)
%!  uv = p(:,2).^2 - p(:,1).^2;
%!  q = (4 * (d(:,1).^2 - d(:,2).^2) + R^2 * (1 - uv).^2 .* d(:,3).^2) ./ (1 + uv).^2;
%!endfunction

%!## A curve through a shock is two pieces split by a NaN row, each in its
%!## own side's Kruskal coordinates (doc/tfd_shock.md, section 2); the
%!## jump along the null shock adds nothing.
%!function len = pieces_length (P, R, eps)
%!  i = [0; find(isnan (P(:,1))); rows(P) + 1];
%!  len = 0;
%!  for k = 1:numel (i) - 1
%!    len += kruskal_length (P(i(k)+1:i(k+1)-1,:), R, eps);
%!  endfor
%!endfunction

%!## The checks of one two-sided region on a circle (with or without a
%!## shock): returns
%!## whether a bridge was used, whether one with |xR - xL + w L| > L/2
%!## (not the shortest winding), and whether the horizon was.
%!function [nb, nw, nh] = check_annulus (bg, A, pL, pR, t)
%!  beta = bg.beta;  L = bg.circumference;  eps = bg.cutoff;  R = 2 * pi / beta;
%!  ## the sampling tolerance relative to the picture's scale cosh(R t)
%!  tm = max (abs ([A.left(:,3:end)(:); A.right(:,3:end)(:); 0] + t));
%!  s = rt_surface (bg, A, "t", t, "tol", 1e-9 * cosh (R * tm));
%!  S = rt_entropy (bg, A, "t", t);
%!  assert (s.picture, "kruskal");
%!  assert (s.S, S, 1e-13 * abs (S));
%!  N = numel (s.endpoints);
%!  assert (sort (s.pairs(:))', 1:N);      # each endpoint once
%!  len = 0;  par = s.horizon;  nb = false;  nw = false;
%!  for k = 1:rows (s.pairs)
%!    c = s.curves{k};  i = s.pairs(k,:);  sd = s.sides(i);
%!    ## the ends on the boundaries X_K = -+cosh(R t), T_K = sinh(R t)
%!    ## at the pair's endpoints (x modulo L: the lifted curve)
%!    E = [(2 * sd - 1) .* cosh(R * s.times(i)), sinh(R * s.times(i))];
%!    mis = @(o) c([1 end], 3) - s.endpoints(i(o));   # modulo L: 0
%!    o = merge (norm (mod (mis ([1 2]) + L / 2, L) - L / 2) < 1e-12, [1 2], [2 1]);
%!    assert (abs (mod (mis (o) + L / 2, L) - L / 2) < 1e-12);
%!    assert (c([1 end], 1:2), E(o,:), 1e-9 * max (abs (E(:))));
%!    if (sd(1) != sd(2))
%!      ## through the bridge at the minimiser's winding: the lifted
%!      ## separation xR - xL + w L
%!      d = (c(end,3) - c(1,3)) * (2 * sd(o(2)) - 1);
%!      xl = s.endpoints(i(sd == 0));  xr = s.endpoints(i(sd == 1));
%!      assert (d, xr - xl + s.windings(k) * L, 1e-12);
%!      assert (any (c(:,1) < 0) && any (c(:,1) > 0));
%!      nb = true;  nw = nw || abs (d) > L / 2 * (1 + 1e-9);
%!    else
%!      assert (s.windings(k), 0);
%!      ## within the side's exterior, over the recorded arc
%!      assert (all ((2 * sd(1) - 1) * c(:,1) >= abs (c(:,2)) - 1e-12));
%!      assert (abs (c(end,3) - c(1,3)), s.arcs(k), 1e-12);
%!    endif
%!    len += pieces_length (c, R, eps);
%!    ## through a shock: one NaN row per bridge, the crossings on u = 0
%!    ## shifted by alpha/2 in X_K (left coordinates above, right below)
%!    j = find (isnan (c(:,1)));
%!    assert (numel (j), (bg.shock_alpha > 0) * (sd(1) != sd(2)));
%!    if (! isempty (j))
%!      assert (c(j-1,1) - c(j-1,2), 0, 1e-13 * cosh (R * tm));
%!      assert (c(j+1,1) - c(j+1,2), 0, 1e-13 * cosh (R * tm));
%!      assert (abs (c(j+1,1) - c(j-1,1)), bg.shock_alpha / 2, 1e-12 * cosh (R * tm));
%!      assert (c(j-1,3), c(j+1,3), 1e-12);
%!    endif
%!    par += crossings (sd(o(1)), c(1,3), sd(o(2)), c(end,3), pL, pR, L);
%!  endfor
%!  if (s.horizon)
%!    ## the bifurcation circle u = v = 0, x from 0 to L
%!    assert (s.horizon_curve(:,1:2), zeros (2, 2));
%!    assert (s.horizon_curve(:,3), [0; L]);
%!    len += kruskal_length (s.horizon_curve, R, eps);
%!  endif
%!  assert (mod (par, 2), 0);              # Z2 homology
%!  assert (bg.c / 6 * len, S, 1e-8 * abs (S));
%!  nh = s.horizon;
%!endfunction

%!test
%! ## Two-sided regions on the thermofield double on a circle (with
%! ## times, no shock): every piece of rt_surface's minimiser, integrated
%! ## with the Kruskal metric of the two-sided BTZ (Banados, Henneaux,
%! ## Teitelboim and Zanelli 1992, PRL 69, 1849; 1993, PRD 48, 1506: the
%! ## circle an identification x ~ x + L of planar BTZ, so the metric is
%! ## that of kruskal_length with R = 2 pi/beta in boundary units) up to the
%! ## cutoff r = 1/eps, plus the horizon circle when used, adds up to the
%! ## regulated entropy of rt_entropy (6/c times it) to 1e-8; the ends lie
%! ## on the region's endpoints, each used once; the bridge curves span
%! ## the lifted separation of the minimiser's winding; the curves and the
%! ## horizon cross a reference path an even number of times.
%! rand ("seed", 5);
%! nb = nw = nh = 0;
%! for trial = 1:14
%!   beta = 0.5 + 2 * rand ();  L = merge (mod (trial, 3), 1 + 6 * rand (), 0.3 + rand ());
%!   bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, ...
%!                         "cutoff", 1e-6, "c", 3);
%!   Al = rand_side (1 + floor (3 * rand ()), L);
%!   Ar = rand_side (1 + floor (3 * rand ()), L);
%!   ## points of A^c: the middle of the gap after the first interval
%!   pL = (Al(1,2) + [Al(2:end,1); Al(1,1) + L](1)) / 2;
%!   pR = (Ar(1,2) + [Ar(2:end,1); Ar(1,1) + L](1)) / 2;
%!   ## times within beta/4 (the Kruskal picture grows like e^{2 pi t/beta},
%!   ## and with it the rounding of u v = T_K^2 - X_K^2 in the samples)
%!   sc = min (1, beta / 4 / max (abs ([Al(:,3:4)(:); Ar(:,3:4)(:)])));
%!   Al(:,3:4) *= sc;  Ar(:,3:4) *= sc;
%!   [b, w, h] = check_annulus (bg, struct ("left", Al, "right", Ar), pL, pR, 0.4 * beta * rand () ^ 2);
%!   nb += b;  nw += w;  nh += h;
%! endfor
%! assert (nb >= 4);
%! ## A_L = [0, 1], A_R = [0, 4] on L = 5, beta = 1: the bridges join 0 to
%! ## 0 and 1 to 4, separation 3 > L/2 (the other winding would cross the
%! ## first bridge)
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 5, "cutoff", 1e-6);
%! [b, w] = check_annulus (bg, struct ("left", [0 1], "right", [0 4]), 2, 4.5, 0);
%! assert (b && w);
%! ## the horizon: two intervals nearly covering the left circle (their
%! ## gaps' geodesics win) and a short one on the right, late enough that
%! ## no bridge pays: the face of the left hole lies in A_L alone
%! bg = ads3_background ("tfd", "circle", "beta", 2, "circumference", 1, "cutoff", 1e-6);
%! A = struct ("left", [0 0.45; 0.5 0.95], "right", [0 0.1]);
%! [b, w, h] = check_annulus (bg, A, 0.47, 0.5, 0.75);
%! assert (h && ! b);

%!test
%! ## The same checks through a shock wave (alpha > 0; Shenker and Stanford
%! ## 2014, JHEP 03, 067): each bridge curve is two pieces, in the left and
%! ## the right side's Kruskal coordinates, integrated each with the metric
%! ## and summed, at the minimiser's winding (also one that is not the
%! ## shortest), against rt_entropy to 1e-8.
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 5, ...
%!                       "cutoff", 1e-6, "shock_alpha", 0.1);
%! [b, w] = check_annulus (bg, struct ("left", [0 1], "right", [0 4]), 2, 4.5, 0);
%! assert (b && w);
%! rand ("seed", 11);
%! nb = 0;
%! for trial = 1:6
%!   beta = 0.5 + 2 * rand ();  L = 1 + 6 * rand ();
%!   bg = ads3_background ("tfd", "circle", "beta", beta, "circumference", L, ...
%!                         "cutoff", 1e-6, "c", 3, "shock_alpha", 2 * rand ());
%!   Al = rand_side (1 + floor (2 * rand ()), L);
%!   Ar = rand_side (1 + floor (2 * rand ()), L);
%!   pL = (Al(1,2) + [Al(2:end,1); Al(1,1) + L](1)) / 2;
%!   pR = (Ar(1,2) + [Ar(2:end,1); Ar(1,1) + L](1)) / 2;
%!   sc = min (1, beta / 4 / max (abs ([Al(:,3:4)(:); Ar(:,3:4)(:)])));
%!   Al(:,3:4) *= sc;  Ar(:,3:4) *= sc;
%!   nb += check_annulus (bg, struct ("left", Al, "right", Ar), pL, pR, 0.2 * beta * rand () ^ 2);
%! endfor
%! assert (nb >= 2);
