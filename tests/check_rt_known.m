## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## rt_entropy and the information quantities against published closed
## forms and against the single-interval functions of the package.

%!test
%! ## Headrick 2010 (Phys. Rev. D 82, 126010): two intervals of lengths l1,
%! ## l2 at distance d on a line in the vacuum,
%! ##   I = max(0, (c/3) log(l1 l2 / (d (l1 + l2 + d)))),
%! ## the transition sitting at cross-ratio x = l1 l2/((l1+d)(l2+d)) = 1/2.
%! rand ("seed", 41);
%! c = 9;
%! bg = ads3_background ("vacuum", "line", "c", c, "cutoff", 1e-7);
%! for t = 1:40
%!   l1 = 0.1 + 3 * rand ();  l2 = 0.1 + 3 * rand ();  d = 0.01 + 2 * rand ();
%!   x0 = 20 * rand () - 10;
%!   I = mutual_information (bg, [x0, x0 + l1], [x0 + l1 + d, x0 + l1 + d + l2]);
%!   assert (I, max (0, (c / 3) * log (l1 * l2 / (d * (l1 + l2 + d)))), 1e-10 * c);
%! endfor
%! ## locate the transition with fzero on the connected-minus-disconnected
%! ## difference of our own entropies, and compare with x = 1/2
%! l1 = 1.3;  l2 = 0.7;
%! f = @(d) rt_entropy (bg, [0 l1; l1 + d, l1 + d + l2]) - interval_entropy (bg, l1) - interval_entropy (bg, l2);
%! dstar = fzero (@(d) mutual_information (bg, [0 l1], [l1 + d, l1 + d + l2]) - 1e-9, [1e-3, 2]);
%! x = l1 * l2 / ((l1 + dstar) * (l2 + dstar));
%! assert (x, 0.5, 1e-6);
%! [~, c1] = rt_entropy (bg, [0 l1; l1 + 0.99 * dstar, l1 + 0.99 * dstar + l2]);
%! [~, c2] = rt_entropy (bg, [0 l1; l1 + 1.01 * dstar, l1 + 1.01 * dstar + l2]);
%! assert (c1.pairs, [1 4; 2 3]);   # connected below the transition
%! assert (c2.pairs, [1 2; 3 4]);   # disconnected above
%! assert (f (0.99 * dstar) < 0 && f (1.01 * dstar) == 0);

%!test
%! ## Two intervals in the thermal state on a line (planar BTZ),
%! ##   I = max(0, (c/3) log(sinh(pi l1/b) sinh(pi l2/b) /
%! ##                       (sinh(pi d/b) sinh(pi (l1+l2+d)/b))))
%! ## (Fischler, Kundu and Kundu 2013, PRD 87, 126012; from memory: it follows
%! ## from the BTZ geodesic lengths as in Headrick 2010).
%! rand ("seed", 42);
%! b = 0.7;  c = 3;
%! bg = ads3_background ("thermal", "line", "beta", b, "c", c);
%! sh = @(l) sinh (pi * l / b);
%! for t = 1:30
%!   l1 = 0.05 + 2 * rand ();  l2 = 0.05 + 2 * rand ();  d = 0.01 + rand ();
%!   I = mutual_information (bg, [0 l1], [l1 + d, l1 + d + l2]);
%!   assert (I, max (0, (c / 3) * log (sh (l1) * sh (l2) / (sh (d) * sh (l1 + l2 + d)))), 1e-9);
%! endfor

%!test
%! ## Two intervals in global AdS3 (vacuum on a circle): chord lengths
%! ## sin(pi l/L) in place of l (Calabrese and Cardy 2004, J. Stat. Mech.
%! ## P06002, for the single-interval form), so
%! ##   I = max(0, (c/3) log(sin(pi l1/L) sin(pi l2/L) / (sin(pi d1/L) sin(pi d2/L))))
%! ## with d1, d2 the two gaps (from memory).
%! rand ("seed", 43);
%! L = 4;
%! bg = ads3_background ("vacuum", "circle", "circumference", L, "c", 6);
%! s = @(l) sin (pi * l / L);
%! for t = 1:30
%!   p = sort (L * rand (4, 1));
%!   l1 = p(2) - p(1);  d1 = p(3) - p(2);  l2 = p(4) - p(3);  d2 = L - l1 - l2 - d1;
%!   if (min ([l1 l2 d1 d2]) < 1e-3) continue; endif
%!   I = mutual_information (bg, [p(1) p(2)], [p(3) p(4)]);
%!   assert (I, max (0, 2 * log (s (l1) * s (l2) / (s (d1) * s (d2)))), 1e-9);
%! endfor

%!test
%! ## One interval: rt_entropy reproduces interval_entropy in every
%! ## background, including the entanglement plateau of BTZ (the
%! ## complement plus the horizon wins for long intervals).
%! bgs = {ads3_background("vacuum", "line"), ...
%!        ads3_background("thermal", "line", "beta", 0.5), ...
%!        ads3_background("rotating", "line", "beta_L", 0.3, "beta_R", 0.9), ...
%!        ads3_background("vacuum", "circle", "circumference", 3), ...
%!        ads3_background("thermal", "circle", "beta", 7), ...
%!        ads3_background("thermal", "circle", "beta", 0.5, "c", 3), ...
%!        ads3_background("rotating", "circle", "beta_L", 0.4, "beta_R", 1.1), ...
%!        ads3_background("heavy", "circle", "alpha", 0.5)};
%! for ib = 1:numel (bgs)
%!   bg = bgs{ib};
%!   if (strcmp (bg.boundary, "line"))
%!     l = logspace (-3, 1, 25);
%!   else
%!     L = bg.circumference;
%!     l = [L * linspace(0.001, 0.999, 41), L - [0.05 0.02 0.005]];
%!   endif
%!   x0 = 1.7;
%!   R = arrayfun (@(li) [x0, x0 + li], l, "uniformoutput", false);
%!   [S, conf] = rt_entropy (bg, R);
%!   [Si, branch] = interval_entropy (bg, l);
%!   assert (S, Si, 1e-10 * max (abs (Si)));
%!   assert ([conf.horizon], branch & bg.horizon);
%!   if (bg.horizon && strcmp (bg.boundary, "circle"))
%!     assert (any (branch) && ! all (branch));
%!     arcs = [conf.arcs];
%!     assert (arcs(branch), L - l(branch), 1e-12);
%!     assert (arcs(! branch), l(! branch), 1e-12);
%!   endif
%! endfor

%!test
%! ## Cutoff dependence: every candidate of an m-interval region carries m
%! ## geodesics, each with 2 log(1/eps), so I(A:B) and I3 do not depend on
%! ## the cutoff while H(A|B) shifts by (c/3) n_A log(eps1/eps2) (common
%! ## practice; doc/rt_regions.md).
%! rand ("seed", 44);
%! c = 2;
%! mk = @(e) {ads3_background("vacuum", "line", "c", c, "cutoff", e), ...
%!            ads3_background("thermal", "circle", "beta", 0.9, "c", c, "cutoff", e), ...
%!            ads3_background("heavy", "circle", "alpha", 0.6, "c", c, "cutoff", e)};
%! b1 = mk (1e-5);  b2 = mk (1e-9);
%! for ib = 1:3
%!   ndone = 0;
%!   for t = 1:20
%!     k = randi ([3 8]);
%!     p = sort (6 * rand (2 * k, 1));
%!     if (min (diff (p)) < 1e-3) continue; endif
%!     R = [p(1:2:end), p(2:2:end)];
%!     who = randi (3, k, 1);
%!     if (! all (ismember (1:3, who))) continue; endif
%!     A = R(who == 1,:);  B = R(who == 2,:);  C = R(who == 3,:);
%!     assert (mutual_information (b1{ib}, A, B), mutual_information (b2{ib}, A, B), 1e-8);
%!     assert (tripartite_information (b1{ib}, A, B, C), tripartite_information (b2{ib}, A, B, C), 1e-8);
%!     dH = conditional_entropy (b2{ib}, A, B) - conditional_entropy (b1{ib}, A, B);
%!     assert (dH, (c / 3) * rows (A) * log (1e4), 1e-8);
%!     ndone++;
%!   endfor
%!   assert (ndone >= 5);        # not all draws skipped
%! endfor

%!test
%! ## Many intervals: regions of n = 200 on the BTZ circle.  A thin comb A
%! ## and its complement satisfy the plateau identity S(A) = S(A^c) + S_BH
%! ## exactly when the horizon is taken (Araki-Lieb saturation), and the
%! ## cell form agrees with separate calls.
%! bg = ads3_background ("thermal", "circle", "beta", 0.3);
%! n = 200;  L = 2 * pi;
%! x = L * (0:n-1)' / n;
%! A = [x, x + 0.97 * L / n];
%! Ac = [x + 0.97 * L / n, x + L / n];
%! [S, conf] = rt_entropy (bg, {A, Ac});
%! assert (conf(1).horizon && ! conf(2).horizon);
%! assert (S(1) - S(2), bg.S_BH, 1e-9 * S(1));
%! assert (S(1), rt_entropy (bg, A), 0);
%! assert (rows (conf(1).pairs), n);
%! assert (isinf (conf(1).candidates) || conf(1).candidates > 1e100);
%! assert (conf(1).log_candidates, gammaln (2*n + 1) - 2 * gammaln (n + 1), 1e-9);
