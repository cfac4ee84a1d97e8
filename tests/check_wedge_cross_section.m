## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Cross-checks of wedge_cross_section against published closed forms and
## against direct numerical minimisations written here, independently of
## the package, from the metric of each background.
##
## Sources:
##  [TU]  Takayanagi and Umemoto 2017, arXiv:1708.09393, Nature Phys. 14,
##        573 (2018): E_W of two intervals in the Poincare vacuum,
##        (c/6) log(1 + 2z + 2 sqrt(z(z+1))), z = (a2-a1)(b2-b1)/((b1-a2)(b2-a1));
##        and the bounds I(A:B)/2 <= E_W <= min(S_A, S_B).
##  [DF]  Dutta and Faulkner 2019, arXiv:1905.00577: S_R = 2 E_W.
##  [H]   Headrick 2010, Phys. Rev. D 82, 126010: the two-interval
##        mutual-information transition (from memory).
##  [HRT] Hubeny, Rangamani and Takayanagi 2007, JHEP 07 (2007) 062: the
##        regulated lengths of (rotating) BTZ geodesics (from memory).
##  [BHTZ] Banados, Henneaux, Teitelboim and Zanelli 1993, Phys. Rev. D 48,
##        1506: BTZ as a quotient of AdS3, its embedding (from memory; the
##        embedding is verified below against the metric itself).
##  Geodesic distance on the quadric -T1^2 + X1^2 - T2^2 + X2^2 = -1 is
##  acosh(-X.Y) and a plane section through the origin is a geodesic
##  (common practice); the hyperbolic law of cosines and the half-plane
##  distance are the same fact in other coordinates (common practice).

%!function S = mi_from_intervals (bg, A, B)
%!  ## I(A:B) from single-interval entropies, the two-interval minimisation
%!  ## written out (the line's span, the circle's second gap).
%!  lA = A(:,2) - A(:,1);  lB = B(:,2) - B(:,1);
%!  if (isfinite (bg.circumference))
%!    L = bg.circumference;
%!    d1 = mod (B(:,1) - A(:,2), L);  d2 = L - lA - lB - d1;
%!  else
%!    d1 = B(:,1) - A(:,2);  d2 = B(:,2) - A(:,1);
%!  endif
%!  SA = interval_entropy (bg, lA);  SB = interval_entropy (bg, lB);
%!  Sc = interval_entropy (bg, d1) + interval_entropy (bg, d2);
%!  S = [SA, SB, max(0, SA + SB - Sc)];
%!endfunction

%!function [A, B] = random_pairs (n, scale, circle_L)
%!  ## n random disjoint pairs, many with small gaps so both phases occur
%!  if (nargin > 2)
%!    u = 0.03 + rand (n, 4);
%!    u(:,2) = 0.005 + u(:,2) .* (0.3 * (rand (n, 1) < 0.6) + 0.7 * rand (n, 1));
%!    u = u ./ sum (u, 2) * circle_L;
%!    a1 = circle_L * rand (n, 1);
%!    A = [a1, a1 + u(:,1)];
%!    B = [A(:,2) + u(:,2), A(:,2) + u(:,2) + u(:,3)];
%!  else
%!    a1 = scale * (2 * rand (n, 1) - 1);
%!    lA = scale * (0.05 + rand (n, 1));  lB = scale * (0.05 + rand (n, 1));
%!    d = scale * (0.005 + 0.4 * rand (n, 1) .^ 2);
%!    A = [a1, a1 + lA];  B = [A(:,2) + d, A(:,2) + d + lB];
%!  endif
%!endfunction

%!function g = circle_geo (a, b)
%!  ## [centre, half-angle] of the shorter arc between angles a < b (unwrapped)
%!  if (b - a > pi)
%!    [a, b] = deal (b, a + 2 * pi);
%!  endif
%!  g = [(a + b) / 2, (b - a) / 2];
%!endfunction

%!function X = btz_embed (rp, rm, t, x, r)
%!  ## [BHTZ] for r > r_+ (rows: T1, X1, T2, X2); r_- = 0 is planar BTZ.
%!  A = (r.^2 - rm^2) / (rp^2 - rm^2);  B = A - 1;
%!  al = rp * x - rm * t;  ga = rp * t - rm * x;
%!  X = [sqrt(A) .* cosh(al); sqrt(A) .* sinh(al); sqrt(B) .* sinh(ga); sqrt(B) .* cosh(ga)];
%!endfunction

%!function q = btz_coords (rp, rm, X)
%!  ## the inverse of btz_embed: (t, x, r)
%!  A = X(1)^2 - X(2)^2;
%!  al = atanh (X(2) / X(1));  ga = atanh (X(3) / X(4));
%!  M = [-rm, rp; rp, -rm];     # [al; ga] = M [t; x]
%!  tx = M \ [al; ga];
%!  q = [tx(1), tx(2), sqrt(rm^2 + A * (rp^2 - rm^2))];
%!endfunction

%!function d = ip (X, Y)
%!  d = -X(1,:) .* Y(1,:) + X(2,:) .* Y(2,:) - X(3,:) .* Y(3,:) + X(4,:) .* Y(4,:);
%!endfunction

%!function check_btz_embedding (rp, rm)
%!  ## Pull the embedding back with finite differences and compare with the
%!  ## BTZ metric ds^2 = -f dt^2 + dr^2/f + r^2 (dx - (r+ r-/r^2) dt)^2.
%!  eta = diag ([-1 1 -1 1]);
%!  for q = [0.3 -0.2 1.1 * rp + 0.4; -0.4 0.5 2 * rp + 1].'
%!    h = 1e-6;  J = zeros (4, 3);
%!    for k = 1:3
%!      e = zeros (3, 1);  e(k) = h;
%!      qp = q + e;  qm = q - e;
%!      J(:,k) = (btz_embed (rp, rm, qp(1), qp(2), qp(3)) ...
%!                - btz_embed (rp, rm, qm(1), qm(2), qm(3))) / (2 * h);
%!    endfor
%!    r = q(3);  f = (r^2 - rp^2) * (r^2 - rm^2) / r^2;  N = rp * rm / r^2;
%!    g = [-f + r^2 * N^2, -r^2 * N, 0; -r^2 * N, r^2, 0; 0, 0, 1/f];
%!    assert (J.' * eta * J, g, 1e-7 * max (abs (g(:))));
%!  endfor
%!endfunction

%!function P = btz_null (rp, rm, x)
%!  ## the boundary point (t = 0, x): lim X/r, a null vector
%!  P = [cosh(rp * x); sinh(rp * x); -sinh(rm * x); cosh(rm * x)];
%!endfunction

%!function [d, s] = min_between (X1, X2, s0)
%!  ## direct minimisation of the geodesic distance acosh(-X1(s1).X2(s2))
%!  o = optimset ("TolX", 1e-11, "TolFun", 1e-13, "MaxFunEvals", 2e4, "MaxIter", 2e4);
%!  f = @(s) acosh (max (1, -ip (X1 (s(1)), X2 (s(2)))));
%!  [s, d] = fminsearch (f, s0, o);
%!endfunction

%!test
%! ## [TU] closed form on random pairs in the Poincare vacuum, both phases;
%! ## the phase agrees with [H]'s rule z > 1 (x = z/(1+z) > 1/2).
%! rand ("seed", 3);
%! bg = ads3_background ("vacuum", "line", "c", 24);
%! [A, B] = random_pairs (300, 2);
%! z = (A(:,2) - A(:,1)) .* (B(:,2) - B(:,1)) ./ ((B(:,1) - A(:,2)) .* (B(:,2) - A(:,1)));
%! ref = 24 / 6 * log (1 + 2*z + 2*sqrt (z .* (z + 1)));
%! [E, info] = wedge_cross_section (bg, num2cell (A, 2), num2cell (B, 2));
%! assert (E, ref .* (z > 1), 1e-10 * max (ref));
%! assert (strcmp ({info.phase}.', "connected"), z > 1);
%! assert (any (z > 1) && any (z < 1));
%! assert ([info.E_connected].', ref, 1e-10 * max (ref));
%! ## [DF] reflected entropy
%! assert (wedge_cross_section (bg, num2cell (A, 2), num2cell (B, 2), "reflected", true), 2 * E, 1e-12);

%!test
%! ## Poincare: minimise the half-plane distance between points on the two
%! ## semicircles (geodesics of ds^2 = (dx^2 + dz^2)/z^2), by fminsearch.
%! bg = ads3_background ("vacuum", "line", "c", 6);
%! pts = [0 1 1.3 2.2; -2 -0.3 0.1 4; 0.5 0.6 0.62 5];
%! for k = 1:rows (pts)
%!   p = pts(k,:);
%!   [E, info] = wedge_cross_section (bg, p(1:2), p(3:4));
%!   semi = @(a, b, u) [(a + b)/2 + (b - a)/2 * cos(pi ./ (1 + exp (-u))); ...
%!                      (b - a)/2 * sin(pi ./ (1 + exp (-u)))];
%!   dist = @(P, Q) acosh (1 + sum ((P - Q).^2) / (2 * P(2) * Q(2)));
%!   o = optimset ("TolX", 1e-12, "TolFun", 1e-14, "MaxFunEvals", 1e4, "MaxIter", 1e4);
%!   f = @(u) dist (semi (p(2), p(3), u(1)), semi (p(1), p(4), u(2)));
%!   [u, dmin] = fminsearch (f, [0 0], o);
%!   assert (info.phase, "connected");
%!   assert (E, dmin, 1e-7);
%!   ## the package's end points are the minimiser's (z = 1/r)
%!   got = [info.points(:,2), 1 ./ info.points(:,3)];
%!   want = [semi(p(2), p(3), u(1)).'; semi(p(1), p(4), u(2)).'];
%!   assert (got, want, 1e-4);
%! endfor

%!test
%! ## Global AdS and thermal AdS on a circle (the same t = 0 slice,
%! ## ds^2 = drho^2 + sinh^2(rho) dphi^2): geodesics tanh(rho) cos(phi - phi0)
%! ## = cos(theta), distance by the hyperbolic law of cosines; fminsearch.
%! L = 5;
%! bgs = {ads3_background("vacuum", "circle", "circumference", L, "c", 6), ...
%!        ads3_background("thermal", "circle", "circumference", L, "beta", 9, "c", 6)};
%! assert (bgs{2}.bulk, "thermal_ads");
%! cfg = [0.2 1.9 2.3 4.6; 4 6.5 6.8 8.5; 1 2 2.2 3.1];   # the second wraps
%! for b = 1:2
%!   for k = 1:rows (cfg)
%!     p = cfg(k,:);
%!     [E, info] = wedge_cross_section (bgs{b}, p(1:2), p(3:4));
%!     ph = 2 * pi * p / L;
%!     G1 = circle_geo (ph(2), ph(3));  G2 = circle_geo (ph(4), ph(1) + 2 * pi);
%!     pt = @(G, u) [atanh(cos (G(2)) / cos (G(2) * tanh (u))), G(1) + G(2) * tanh(u)];
%!     dist = @(P, Q) acosh (cosh (P(1)) * cosh (Q(1)) - sinh (P(1)) * sinh (Q(1)) * cos (P(2) - Q(2)));
%!     o = optimset ("TolX", 1e-12, "TolFun", 1e-14, "MaxFunEvals", 1e4, "MaxIter", 1e4);
%!     [u, dmin] = fminsearch (@(u) dist (pt (G1, u(1)), pt (G2, u(2))), [0 0], o);
%!     assert (E, dmin, 1e-7);
%!     q1 = pt (G1, u(1));  q2 = pt (G2, u(2));
%!     got = info.points;
%!     assert (got(:,3), 2 * pi / L * sinh ([q1(1); q2(1)]), 1e-4 * max (got(:,3)));
%!     dx = mod (got(:,2) - L * [q1(2); q2(2)] / (2 * pi) + L/2, L) - L/2;
%!     assert (dx, [0; 0], 1e-5);
%!   endfor
%! endfor

%!test
%! ## Planar BTZ (thermal line), t = 0 slice ds^2 = dr^2/(r^2 - r+^2) + r^2 dx^2,
%! ## r+ = 2 pi/beta.  The RT curve r(x) = r+/sqrt(1 - k^2 cosh^2(r+ (x - c))),
%! ## k = 1/cosh(r+ l/2), is a plane section of the embedding; its regulated
%! ## length, integrated here from the metric, is [HRT]'s
%! ## 2 log((beta/(pi eps)) sinh(pi l/beta)).  Distances from the embedding,
%! ## itself checked against the metric; then fminsearch along the curves.
%! beta = 1.3;  rp = 2 * pi / beta;
%! check_btz_embedding (rp, 0);
%! l = 1.7;  h = l / 2;  k = 1 / cosh (rp * h);  ep = 1e-4;
%! r = @(x) rp ./ sqrt (1 - k^2 * cosh (rp * x).^2);
%! dr = @(x) rp^2 * k^2 * cosh (rp * x) .* sinh (rp * x) ./ (1 - k^2 * cosh (rp * x).^2).^1.5;
%! ds = @(x) sqrt (dr(x).^2 ./ (r(x).^2 - rp^2) + r(x).^2);
%! xe = acosh (sqrt (1 - (rp * ep)^2) / k) / rp;
%! len = 2 * integral (ds, 0, xe, "RelTol", 1e-11, "AbsTol", 1e-11);
%! assert (len, 2 * log (beta / (pi * ep) * sinh (pi * l / beta)), 1e-6);
%! bg = ads3_background ("thermal", "line", "beta", beta, "c", 6, "cutoff", ep);
%! assert (len, geodesic_length (bg, 0, l), 1e-6);
%! cfg = [-0.8 0.6 0.7 1.4; -1 -0.1 0 0.5; -0.5 0.5 0.52 2];
%! for j = 1:rows (cfg)
%!   p = cfg(j,:);
%!   [E, info] = wedge_cross_section (bg, p(1:2), p(3:4));
%!   assert (info.phase, "connected");
%!   ## points on the curve over [a, b], parametrised by x = c + h tanh(u)
%!   curve = @(a, b, u) btz_embed (rp, 0, 0, (a+b)/2 + (b-a)/2 * tanh (u), ...
%!                                 rp ./ sqrt (1 - cosh (rp * (b-a)/2 * tanh (u)).^2 / cosh (rp * (b-a)/2)^2));
%!   [dmin, u] = min_between (@(u) curve (p(2), p(3), u), @(u) curve (p(1), p(4), u), [0 0]);
%!   assert (E, dmin, 1e-7);
%!   q = [btz_coords(rp, 0, curve (p(2), p(3), u(1))); btz_coords(rp, 0, curve (p(1), p(4), u(2)))];
%!   assert (info.points(:,1:2), q(:,1:2), 1e-5);
%!   assert (info.points(:,3), q(:,3), 1e-4 * max (q(:,3)));
%! endfor

%!test
%! ## Planar rotating BTZ: the HRT geodesics of t = 0 intervals leave the
%! ## t = 0 slice, so no 2D slice works.  Use the embedding (checked against
%! ## the rotating metric): the geodesic between boundary points P, Q is the
%! ## plane section X(s) = (e^s P + e^-s Q)/sqrt(-2 P.Q); its regulated
%! ## length is [HRT]'s log((beta_L beta_R/(pi^2 eps^2)) sinh(pi l/beta_L)
%! ## sinh(pi l/beta_R)); then fminsearch over the two arc lengths.
%! bl = 0.9;  br = 2.1;
%! rp = pi * (1/bl + 1/br);  rm = pi * (1/bl - 1/br);
%! check_btz_embedding (rp, rm);
%! bg = ads3_background ("rotating", "line", "beta_L", bl, "beta_R", br, "c", 6, "cutoff", 1e-5);
%! geo = @(a, b) @(s) (exp (s) * btz_null (rp, rm, a) + exp (-s) * btz_null (rp, rm, b)) ...
%!                    / sqrt (-2 * ip (btz_null (rp, rm, a), btz_null (rp, rm, b)));
%! ## the regulated length: distance between the points at r = 1/eps
%! ep = 1e-5;  l = 1.3;
%! d = acosh (-ip (btz_embed (rp, rm, 0, 0, 1/ep), btz_embed (rp, rm, 0, l, 1/ep)));
%! assert (d, log (bl * br / (pi^2 * ep^2) * sinh (pi * l / bl) * sinh (pi * l / br)), 1e-6);
%! assert (d, geodesic_length (bg, 0, l), 1e-6);
%! ## the geodesic leaves t = 0 away from its midpoint
%! g = geo (0, l);
%! q = btz_coords (rp, rm, g (0.8));
%! assert (abs (q(1)) > 1e-2);
%! q0 = btz_coords (rp, rm, g (0));
%! assert (q0(1), 0, 1e-12);
%! cfg = [-0.7 0.4 0.5 1.2; -1 -0.2 -0.15 0.6; -0.4 0.3 0.35 1.5];
%! for j = 1:rows (cfg)
%!   p = cfg(j,:);
%!   [E, info] = wedge_cross_section (bg, p(1:2), p(3:4));
%!   assert (info.phase, "connected");
%!   G1 = geo (p(2), p(3));  G2 = geo (p(4), p(1));
%!   [dmin, s] = min_between (G1, G2, [0 0]);
%!   assert (E, dmin, 1e-7);
%!   q = [btz_coords(rp, rm, G1 (s(1))); btz_coords(rp, rm, G2 (s(2)))];
%!   assert (info.points(:,1:2), q(:,1:2), 1e-5);
%!   assert (info.points(:,3), q(:,3), 1e-4 * max (q(:,3)));
%!   ## the half-and-half split: each chiral half gives half its static value
%!   D = @(z) log (1 + 2*z + 2*sqrt (z .* (z + 1)));
%!   assert (E, (6/12) * sum (D (info.cross_ratio)), 1e-12);
%! endfor

%!test
%! ## Bounds [TU]: I(A:B)/2 <= E_W <= min(S_A, S_B) on random pairs in every
%! ## supported background; E_W = 0 exactly where I = 0 (same phase).
%! rand ("seed", 17);
%! bgs = {ads3_background("vacuum", "line", "c", 3), ...
%!        ads3_background("vacuum", "circle", "circumference", 4), ...
%!        ads3_background("thermal", "circle", "circumference", 4, "beta", 6), ...
%!        ads3_background("thermal", "line", "beta", 0.7, "c", 2), ...
%!        ads3_background("rotating", "line", "beta_L", 0.5, "beta_R", 1.7)};
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   if (isfinite (bg.circumference))
%!     [A, B] = random_pairs (300, 0, bg.circumference);
%!   else
%!     [A, B] = random_pairs (300, 1);
%!   endif
%!   E = wedge_cross_section (bg, num2cell (A, 2), num2cell (B, 2));
%!   S = mi_from_intervals (bg, A, B);
%!   I = S(:,3);
%!   tol = 1e-9 * max (abs (S(:)));
%!   assert (all (E >= I / 2 - tol), bg.bulk);
%!   assert (all (E <= min (S(:,1), S(:,2)) + tol), bg.bulk);
%!   assert ((E > 0), (I > tol), bg.bulk);
%!   assert (sum (E > 0) > 30 && sum (E == 0) > 30, bg.bulk);
%!   if (exist ("mutual_information"))
%!     for j = 1:10
%!       assert (mutual_information (bg, A(j,:), B(j,:)), I(j), 1e-8 * max (abs (S(:))));
%!     endfor
%!   endif
%!   ## the core's phase agrees with rt_entropy's minimal surface of A u B
%!   ## (connected: cheaper than S(A) + S(B))
%!   R = arrayfun (@(j) [A(j,:); B(j,:)], (1:rows (A))', "uniformoutput", false);
%!   Sab = rt_entropy (bg, R);
%!   SA = rt_entropy (bg, num2cell (A, 2));
%!   SB = rt_entropy (bg, num2cell (B, 2));
%!   assert (Sab < SA + SB - tol, E > 0, bg.bulk);
%! endfor

%!function v = mi_raw (bg, lA, lB, d)
%!  if (isfinite (bg.circumference))
%!    d2 = bg.circumference - lA - lB - d;
%!  else
%!    d2 = lA + lB + d;
%!  endif
%!  v = interval_entropy (bg, lA) + interval_entropy (bg, lB) ...
%!      - interval_entropy (bg, d) - interval_entropy (bg, d2);
%!endfunction

%!test
%! ## E_W jumps from zero to a finite value at the mutual-information
%! ## transition ([TU], [H]): find the transition gap d* with fzero on
%! ## S_A + S_B - S(gaps) built from interval_entropy; just inside, E_W is
%! ## at least (c/3) log(1 + sqrt 2) = its value at z = 1 (for the static
%! ## bulks exactly; with two temperatures z_L z_R = 1 and the sum of the
%! ## halves is larger); just outside it is 0.
%! bgs = {ads3_background("vacuum", "line", "c", 3), ...
%!        ads3_background("vacuum", "circle", "circumference", 8, "c", 3), ...
%!        ads3_background("thermal", "circle", "circumference", 8, "beta", 9, "c", 3), ...
%!        ads3_background("thermal", "line", "beta", 0.7, "c", 3), ...
%!        ads3_background("rotating", "line", "beta_L", 0.5, "beta_R", 1.7, "c", 3)};
%! jump = 3 / 3 * log (1 + sqrt (2));
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   lA = 0.9;  lB = 1.3;
%!   pair = @(d) deal ([0, lA], [lA + d, lA + d + lB]);
%!   f = @(d) mi_raw (bg, lA, lB, d);
%!   ds = fzero (f, [1e-4, 1.2]);
%!   [A, B] = pair (ds * (1 - 1e-9));
%!   [Ein, info] = wedge_cross_section (bg, A, B);
%!   [A, B] = pair (ds * (1 + 1e-9));
%!   Eout = wedge_cross_section (bg, A, B);
%!   assert (Eout, 0, bg.bulk);
%!   assert (Ein >= jump - 1e-6, bg.bulk);
%!   if (! strcmp (bg.bulk, "planar_rotating_btz"))
%!     assert (Ein, jump, 1e-6);
%!     assert (info.cross_ratio, 1, 1e-6);
%!   else
%!     assert (prod (info.cross_ratio), 1, 1e-6);
%!     assert (Ein > jump + 1e-3);
%!   endif
%! endfor
