## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## Cross-checks of the BCFT backgrounds (ads3_background "bcft" and
## "bcft_tfd"), rt_entropy with end-of-the-world branes and page_curve,
## against published results and against numerical computations written
## here, independently of the package, from the bulk metric.
##
## Sources:
##  [T]   Takayanagi 2011, PRL 107, 101602: brane with K_ab = T h_ab (ell = 1),
##        boundary entropy log g = (c/6) arctanh(T ell) (from memory).
##  [FTT] Fujita, Takayanagi and Tonni 2011, JHEP 11 (2011) 043 (from memory).
##  [CC]  Calabrese and Cardy 2004, J. Stat. Mech. P06002: a BCFT interval
##        adjacent to the boundary, S = (c/6) log(2l/eps) + log g; at finite
##        temperature (c/6) log((beta/(pi eps)) sinh(2 pi l/beta)) + log g; on
##        an interval of length L, (c/6) log((2L/(pi eps)) sin(pi l/L)) + log g
##        (from memory).
##  [C]   Cardy 1989 / Affleck and Ludwig 1991: log Z of a BCFT on an interval
##        at high temperature, pi c L/(6 beta) + log g0 + log g1, and at low
##        temperature pi c beta/(24 L) (from memory).
##  [HM]  Hartman and Maldacena 2013, JHEP 05 (2013) 014: late-time growth
##        dS/dt = 2 pi c/(3 beta) of the two-sided entropy (from memory).
##  [AMM] Almheiri, Mahajan and Maldacena 2019, arXiv:1910.11077; Rozali,
##        Sully, Van Raamsdonk, Waddell and Wakeham 2019, arXiv:1910.12836:
##        growth, then an island plateau (from memory).
##  [BHTZ] Banados, Henneaux, Teitelboim and Zanelli 1993, PRD 48, 1506:
##        the BTZ embedding (from memory; verified below against the metric).
##  Geodesic curvature of a curve under a conformal change of metric,
##  k' = e^(-phi) (k - d phi/dn) (common practice).

%!function d = dist_poincare (x1, z1, x2, z2)
%!  d = acosh (1 + ((x1 - x2).^2 + (z1 - z2).^2) ./ (2 * z1 .* z2));
%!endfunction
%!function d = dist_btz (zh, x1, z1, x2, z2)
%!  ## time-symmetric slice of planar BTZ through its embedding [BHTZ]
%!  d = acosh ((zh^2 ./ (z1 .* z2)) .* cosh ((x1 - x2) / zh)
%!             - sqrt (zh^2 ./ z1.^2 - 1) .* sqrt (zh^2 ./ z2.^2 - 1));
%!endfunction
%!function d = dist_tads (z0, x1, z1, x2, z2)
%!  ## the slice of the thermal AdS saddle is a disc: cosh r = z0/z, theta = x/z0
%!  c1 = z0 ./ z1; c2 = z0 ./ z2;
%!  d = acosh (c1 .* c2 - sqrt (c1.^2 - 1) .* sqrt (c2.^2 - 1) .* cos ((x1 - x2) / z0));
%!endfunction
%!function k = geo_curv (X, W, phi, z)
%!  ## |geodesic curvature| of the curve (X(z), W(z)) in e^(2 phi) (dX^2 + dW^2)
%!  h = 1e-4 * z;
%!  X1 = (X (z + h) - X (z - h)) / (2 * h); W1 = (W (z + h) - W (z - h)) / (2 * h);
%!  X2 = (X (z + h) - 2 * X (z) + X (z - h)) / h^2;
%!  W2 = (W (z + h) - 2 * W (z) + W (z - h)) / h^2;
%!  sp = hypot (X1, W1);
%!  kE = (X1 * W2 - W1 * X2) / sp^3;
%!  n = [-W1, X1] / sp;
%!  g = 1e-6 * max (abs (W (z)), 1e-3);
%!  px = (phi (X (z) + g, W (z)) - phi (X (z) - g, W (z))) / (2 * g);
%!  pw = (phi (X (z), W (z) + g) - phi (X (z), W (z) - g)) / (2 * g);
%!  k = abs (exp (-phi (X (z), W (z))) * (kE - (px * n(1) + pw * n(2))));
%!endfunction
%!function [d, zl] = min_to_brane (f, lo, hi)
%!  o = optimset ("TolX", 1e-15, "MaxIter", 2000, "MaxFunEvals", 4000);
%!  ## coarse scan, then fminbnd around the best sample
%!  p = linspace (lo, hi, 400);
%!  [~, i] = min (arrayfun (f, p));
%!  a = p(max (i - 1, 1)); b = p(min (i + 1, numel (p)));
%!  [zl, d] = fminbnd (f, a, b, o);
%!endfunction

%!function best = brute_bcft (x, pairc, branec, c0, rightc, hlen)
%!  ## every non-crossing configuration: each point pairs (a stack of open
%!  ## points) or, outside every pair, ends on the left brane (before any on
%!  ## the right brane); the horizon face is in when c0 xor (left endings odd)
%!  K = struct ("x", x, "pairc", pairc, "branec", branec, "c0", c0,
%!              "rightc", rightc, "hlen", hlen);
%!  best = brute_rec (K, 1, [], 0, 0, false);
%!endfunction
%!function v = brute_rec (K, i, stack, acc, nl, seenR)
%!  if (i > numel (K.x))
%!    v = Inf;
%!    if (isempty (stack))
%!      v = acc + K.hlen * xor (K.c0, mod (nl, 2));
%!    endif
%!    return;
%!  endif
%!  v = brute_rec (K, i + 1, [stack i], acc, nl, seenR);
%!  if (! isempty (stack))
%!    v = min (v, brute_rec (K, i + 1, stack(1:end-1), acc + K.pairc (K.x(stack(end)), K.x(i)), nl, seenR));
%!  else
%!    if (! seenR)
%!      v = min (v, brute_rec (K, i + 1, stack, acc + K.branec (K.x(i)), nl + 1, false));
%!    endif
%!    v = min (v, brute_rec (K, i + 1, stack, acc + K.rightc (K.x(i)), nl, true));
%!  endif
%!endfunction

## ---- many intervals: the minimiser against a brute force over configurations
%!test
%! eps = 1e-6; rho = atanh (0.4); L = 4; beta = 0.8;
%! bh = ads3_background ("bcft", "half_line", "tension", 0.4, "cutoff", eps, "c", 6);
%! bi = ads3_background ("bcft", "interval", "length", L, "tension", 0.4, "beta", beta, "cutoff", eps, "c", 6);
%! assert (bi.saddle, "btz");
%! ls = @(d) log (beta / (pi * eps) * sinh (pi * d / beta));
%! rand ("seed", 7);
%! for trial = 1:12
%!   x = sort (L * rand (1, 6));
%!   A = reshape (x, 2, []).';
%!   ## half line, zero temperature [CC closed forms, checked above]
%!   [S, cf] = rt_entropy (bh, A);
%!   Sb = brute_bcft (x, @(a, b) 2 * log ((b - a) / eps), @(a) log (2 * a / eps) + rho,
%!                    false, @(a) Inf, 0);
%!   assert (S, Sb, 1e-10);
%!   ## the configuration adds up to S
%!   len = sum (2 * log (diff (cf.pair_coords, 1, 2) / eps)) + sum (log (2 * cf.brane.x / eps) + rho);
%!   assert (S, len, 1e-10);
%!   ## interval, BTZ saddle: two branes and the horizon
%!   S = rt_entropy (bi, A);
%!   hl = L / (beta / (2 * pi)) + 2 * rho;
%!   br = @(d) log (beta / (pi * eps)) + log (sinh (2 * pi * d / beta)) + rho;
%!   Sb = brute_bcft (x, @(a, b) 2 * ls (b - a), br, false, @(a) br (L - a), hl);
%!   assert (S, Sb, 1e-10);
%! endfor

## ---- boundary entropy [T], [FTT]
%!test
%! for T = [-0.9 -0.3 0 0.4 0.95]
%!   for c = [1 12]
%!     bg = ads3_background ("bcft", "half_line", "tension", T / 2, "ell", 2, "c", c);
%!     assert (bg.log_g, [1 1] * (c / 6) * atanh (T), 1e-14);
%!   endfor
%! endfor
%! bg = ads3_background ("bcft", "half_line", "tension", 0);
%! assert (bg.log_g, [0 0]);                      # tension 0: log g = 0
%! bg = ads3_background ("bcft", "half_line", "log_g", 0.3, "c", 3);
%! assert ((3 / 6) * atanh (bg.tension(1)), 0.3, 1e-14);

## ---- the brane profiles have geodesic curvature |T| on the slice [T]
%!test
%! for T = [-0.6 0.3 0.8]
%!   sh = T / sqrt (1 - T^2);
%!   ## Poincare: phi = -log z, W = z
%!   bg = ads3_background ("bcft", "half_line", "tension", T);
%!   X = @(z) brane_profile (bg, z);
%!   for z = [0.1 1 3]
%!     assert (geo_curv (X, @(z) z, @(x, w) -log (w), z), abs (T), 1e-6);
%!   endfor
%!   ## planar BTZ: W = zh asin(z/zh), metric (dW^2 + dx^2)/z^2
%!   bg = ads3_background ("bcft", "half_line", "tension", T, "beta", 2);
%!   zh = 1 / pi;
%!   X = @(z) brane_profile (bg, z);
%!   for z = [0.05 0.2 0.3]
%!     k = geo_curv (X, @(z) zh * asin (z / zh), @(x, w) -log (zh * sin (w / zh)), z);
%!     assert (k, abs (T), 1e-6);
%!   endfor
%!   ## thermal AdS saddle: W = z0 atanh(z/z0), metric (h/z^2)(dW^2 + dx^2)
%!   bg = ads3_background ("bcft", "interval", "length", 3, "tension", T);
%!   z0 = 3 / pi;
%!   X = @(z) brane_profile (bg, z);
%!   zz = @(w) z0 * tanh (w / z0);
%!   for z = [0.05 0.3] * z0
%!     k = geo_curv (X, @(z) z0 * atanh (z / z0), @(x, w) 0.5 * log (1 - zz (w)^2 / z0^2) - log (zz (w)), z);
%!     assert (k, abs (T), 1e-6);
%!   endfor
%! endfor

## ---- the embedding distances agree with the metrics' line elements
%!test
%! zh = 0.7; z0 = 1.3; x = 0.4; z = 0.3; dx = 1e-5; dz = 2e-5;
%! assert (dist_btz (zh, x, z, x + dx, z + dz), sqrt (dx^2 + dz^2 / (1 - z^2 / zh^2)) / z, -1e-4);
%! h = 1 - z^2 / z0^2;
%! assert (dist_tads (z0, x, z, x + dx, z + dz), sqrt (h * dx^2 + dz^2 / h) / z, -1e-4);

## ---- every brane-ending geodesic: minimised over the landing point (1e-9)
%!test
%! eps = 1e-7; c = 3;
%! for T = [-0.7 0 0.5]
%!   ## zero temperature half line, [0, a]
%!   bg = ads3_background ("bcft", "half_line", "tension", T, "cutoff", eps, "c", c);
%!   for a = [0.3 2]
%!     [S, cf] = rt_entropy (bg, [0 a]);
%!     f = @(z) dist_poincare (a, eps, brane_profile (bg, z), z);
%!     [d, zl] = min_to_brane (f, 1e-3 * a, 3 * a);
%!     assert (6 * S / c, d, 1e-9);
%!     assert (cf.brane.landing, [brane_profile(bg, zl), zl], 1e-6);
%!     ## [CC]: (c/6) log(2a/eps) + log g
%!     assert (S, c / 6 * log (2 * a / eps) + bg.log_g(1), 1e-12);
%!   endfor
%!   ## finite temperature half line
%!   beta = 1.5; zh = beta / (2 * pi);
%!   bg = ads3_background ("bcft", "half_line", "tension", T, "beta", beta, "cutoff", eps, "c", c);
%!   for a = [0.2 1.1]
%!     S = rt_entropy (bg, [0 a]);
%!     f = @(q) dist_btz (zh, a, eps, brane_profile (bg, zh * tanh (q)), zh * tanh (q));
%!     assert (6 * S / c, min_to_brane (f, 1e-3, 30), 1e-9);
%!     assert (S, c / 6 * log (beta / (pi * eps) * sinh (2 * pi * a / beta)) + bg.log_g(1), 1e-12);
%!   endfor
%!   ## interval, zero temperature (thermal AdS saddle): one connected brane
%!   L = 3; z0 = L / pi;
%!   bg = ads3_background ("bcft", "interval", "length", L, "tension", T, "cutoff", eps, "c", c);
%!   assert (bg.saddle, "thermal_ads");
%!   for a = [0.4 0.9]
%!     S = rt_entropy (bg, [0 a]);
%!     f = @(z) dist_tads (z0, a, eps, brane_profile (bg, z), z);
%!     assert (6 * S / c, min_to_brane (f, 1e-4, z0 / cosh (atanh (T)) * (1 - 1e-12)), 1e-9);
%!     assert (S, c / 6 * log (2 * L / (pi * eps) * sin (pi * a / L)) + bg.log_g(1), 1e-12);
%!   endfor
%!   ## interval, BTZ saddle, unequal tensions: the far brane
%!   bg = ads3_background ("bcft", "interval", "length", L, "tension", [0.2 T], "beta", 1, "cutoff", eps, "c", c);
%!   zh = 1 / (2 * pi);
%!   [S, cf] = rt_entropy (bg, [2.7 L]);
%!   assert (cf.brane.end, L);
%!   f = @(q) dist_btz (zh, 2.7, eps, brane_profile (bg, zh * tanh (q), 1), zh * tanh (q));
%!   assert (6 * S / c, min_to_brane (f, 1e-3, 30), 1e-9);
%! endfor

## ---- an interval away from the boundary: connected against two brane endings
%!test
%! eps = 1e-7;
%! bg = ads3_background ("bcft", "half_line", "tension", 0.4, "cutoff", eps);
%! for A = [0.5 0.8; 0.5 3; 0.1 5]'
%!   a = A(1); b = A(2);
%!   dc = dist_poincare (a, eps, b, eps);
%!   da = min_to_brane (@(z) dist_poincare (a, eps, brane_profile (bg, z), z), 1e-3 * a, 3 * a);
%!   db = min_to_brane (@(z) dist_poincare (b, eps, brane_profile (bg, z), z), 1e-3 * b, 3 * b);
%!   [S, cf] = rt_entropy (bg, [a b]);
%!   assert (6 * S, min (dc, da + db), 1e-9);
%!   assert (isempty (cf.brane.endpoint), dc < da + db);
%! endfor

## ---- interval at finite temperature: thermodynamics and Hawking-Page [C]
%!test
%! L = 2; c = 6; T = 0.35;
%! bg = ads3_background ("bcft", "interval", "length", L, "tension", T, "beta", 1, "c", c);
%! lg = 2 * bg.log_g(1);
%! lnZ = @(b) pi * c * L ./ (6 * b) + lg;
%! h = 1e-4;
%! Sth = lnZ (1) - (lnZ (1 + h) - lnZ (1 - h)) / (2 * h);   # S = (1 - beta d/dbeta) log Z
%! assert (rt_entropy (bg, [0 L]), Sth, 1e-7);
%! ## the transition: both free energies equal at beta_c
%! bc = fzero (@(b) lnZ (b) - pi * c * b / (24 * L), [0.1 100]);
%! assert (bg.beta_c, bc, 1e-10);
%! assert (ads3_background ("bcft", "interval", "length", L, "tension", T, "beta", 0.99 * bc).saddle, "btz");
%! assert (ads3_background ("bcft", "interval", "length", L, "tension", T, "beta", 1.01 * bc).saddle, "thermal_ads");
%! ## tension 0: beta_c = 2 L
%! assert (ads3_background ("bcft", "interval", "length", L, "beta", 1).beta_c, 2 * L, 1e-14);

## ---- information quantities on a BCFT
%!test
%! bg = ads3_background ("bcft", "half_line", "tension", 0.5, "c", 6);
%! A = [1 2]; B = [2.5 4];
%! I = mutual_information (bg, A, B);
%! assert (I, rt_entropy (bg, A) + rt_entropy (bg, B) - rt_entropy (bg, [A; B]), 1e-12);
%! assert (I >= 0);

## ---- Page curve: against the bulk, the Page time by fzero, [HM], [AMM]
%!test
%! beta = 2; T = 0.6; c = 6; eps = 1e-7; b = 1; zh = beta / (2 * pi);
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", beta, "tension", T, "c", c, "cutoff", eps);
%! ## bridge geodesic from (b, t) on the left to (b, t) on the right, by the
%! ## embedding of the eternal BTZ [BHTZ], both times forward
%! P = @(x, z, t, s) [zh / z * cosh(x / zh), sqrt(zh^2 / z^2 - 1) * sinh(t / zh), ...
%!                    zh / z * sinh(x / zh), s * sqrt(zh^2 / z^2 - 1) * cosh(t / zh)];
%! dot22 = @(u, v) -u(1) * v(1) - u(2) * v(2) + u(3) * v(3) + u(4) * v(4);
%! dbr = @(t) acosh (-dot22 (P (b, eps, t, 1), P (b, eps, t, -1)));
%! dis = min_to_brane (@(q) dist_btz (zh, b, eps, brane_profile (bg, zh * tanh (q)), zh * tanh (q)), 1e-3, 30);
%! t = [0 0.2 0.5 1 2 4];
%! [S, info] = page_curve (bg, [b Inf], t);
%! Sref = c / 6 * min (arrayfun (dbr, t), 2 * dis);
%! assert (S, Sref, 1e-8);
%! assert (info.S_island, c / 3 * dis, 1e-8);
%! tp = fzero (@(t) dbr (t) - 2 * dis, [0 10]);
%! assert (info.page_time, tp, 1e-8);
%! ## the phases agree at the Page time; the island phase does not depend on t
%! [Sp, ip] = page_curve (bg, [b Inf], info.page_time);
%! assert (ip.S_no_island, info.S_island, 1e-10);
%! Sl = page_curve (bg, [b Inf], info.page_time + [0.1 1 10 100]);
%! assert (Sl, info.S_island * ones (1, 4), 1e-12);
%! ## [HM] late-time growth of the no-island phase
%! [~, i2] = page_curve (bg, [b Inf], [30 31]);
%! assert (diff (i2.S_no_island), 2 * pi * c / (3 * beta), 1e-9);
%! ## [AMM] growth, then the plateau
%! assert (all (diff (S(t < info.page_time)) > 0));
%! assert (info.phase(t > info.page_time), repmat ({"island"}, 1, nnz (t > info.page_time)));
%! ## the island's edge lies on the brane, outside the horizon
%! isl = info.island;
%! assert (isl(1), brane_profile (bg, isl(2)), 1e-12);
%! assert (isl(2) < zh);

## ---- bad input
%!error id=holent:domain ads3_background ("bcft", "half_line", "tension", 1)
%!error id=holent:domain ads3_background ("bcft", "half_line", "tension", -1.2)
%!error <tension in \[0, 1/ell\)> ads3_background ("bcft_tfd", "half_line", "beta", 1, "tension", -0.1)
%!error <needs 'beta'> ads3_background ("bcft_tfd", "half_line")
%!error <unequal tensions> ads3_background ("bcft", "interval", "length", 1, "tension", [0.1 0.2])
%!error <one value per end> ads3_background ("bcft", "interval", "length", 1, "tension", [0.1 0.2 0.3])
%!error <past its boundary> rt_entropy (ads3_background ("bcft", "half_line"), [-1 2])
%!error <\[0, 3\]> rt_entropy (ads3_background ("bcft", "interval", "length", 3), [1 4])
%!error <zero-length> rt_entropy (ads3_background ("bcft", "half_line"), [0 0])
%!error <overlap> rt_entropy (ads3_background ("bcft", "half_line"), [1 3; 2 4])
%!error <finite> rt_entropy (ads3_background ("bcft", "half_line"), [1 Inf])
%!error <boundary x = 0> page_curve (ads3_background ("bcft_tfd", "half_line", "beta", 1), [0 2], 0)
%!error <page_curve> rt_entropy (ads3_background ("bcft_tfd", "half_line", "beta", 1), [1 2])

## Regions with endpoint times are refused on a BCFT background, naming
## what is supported (no silent wrong number).
%!error <regions with endpoint times> rt_entropy (ads3_background ("bcft", "half_line", "tension", 0.3), [0.3 1.2 0 0.2])
%!error id=holent:unsupported rt_surface (ads3_background ("bcft", "half_line", "tension", 0.3), [0.3 1.2 0 0.2])
