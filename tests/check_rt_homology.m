## SPDX-License-Identifier: GPL-3.0-or-later
## RT minimisation over region sets on the circle, checked from outside
## the minimiser:
##  * the homology rule on the BTZ circle for two intervals, from an
##    enumeration of the six candidates written out by hand here from the
##    topology of the annulus (two pairings; for each, the face holding the
##    horizon), with the closed-form lengths of Hubeny, Rangamani and
##    Takayanagi 2007 (JHEP 07 (2007) 062), themselves checked against the
##    metric in tests/check_geodesic_quadrature.m;
##  * the whole circle [a, a + L] in every circle background;
##  * the heavy state at alpha = 1 against the global vacuum.

%!function len = rv_len (bg, l)
%!  ## regulated length over an arc l in the BTZ family (ell = 1):
%!  ## log((beta_L beta_R/(pi^2 eps^2)) sinh(pi l/beta_L) sinh(pi l/beta_R))
%!  ## (Hubeny, Rangamani and Takayanagi 2007); written with log-sinh.
%!  lsh = @(x) x + log1p (-exp (-2 * x)) - log (2);
%!  e = bg.cutoff;
%!  len = log (bg.beta_L / (pi * e)) + log (bg.beta_R / (pi * e)) ...
%!        + lsh (pi * l / bg.beta_L) + lsh (pi * l / bg.beta_R);
%!endfunction

%!function [S, k, cand] = rv_two_intervals (bg, l1, d1, l2, d2)
%!  ## A = A1 u A2 on the BTZ circle, boundary order A1, gap d1, A2, gap d2.
%!  ## The chord diagrams of 4 endpoints: "disc" (A1's ends, A2's ends) and
%!  ## "conn" (across d1, across d2).  Each has three faces; the horizon
%!  ## sits in one of them, every chord runs round the side away from it,
%!  ## and S_BH is added when that face is bounded by boundary pieces of A.
%!  ##   disc: middle face (touches d1, d2: outside A), A1's face, A2's face
%!  ##   conn: middle face (touches A1, A2: inside A), d1's face, d2's face
%!  L = l1 + d1 + l2 + d2;
%!  c6 = bg.c / 6;  H = bg.S_BH;
%!  f = @(x) c6 * rv_len (bg, x);
%!  cand = [f(l1) + f(l2), ...
%!          f(L - l1) + f(l2) + H, ...
%!          f(l1) + f(L - l2) + H, ...
%!          f(d1) + f(d2) + H, ...
%!          f(L - d1) + f(d2), ...
%!          f(d1) + f(L - d2)];
%!  [S, k] = min (cand);
%!endfunction

%!function rv_btz_two (bg, ntrials)
%!  L = bg.circumference;
%!  seen = false (1, 6);
%!  ncmp = 0;
%!  for t = 1:ntrials
%!    u = rand (1, 4) .* 10 .^ (-3 * rand (1, 4));
%!    if (mod (t, 8) == 0)        # one interval nearly the whole circle,
%!      u = [1, 0.004, 0.0008, 0.005] .* (1 + 0.3 * rand (1, 4));
%!      u = 50 * u / sum (u(2:4));  # the rest a few 1e-2 of L: its plateau
%!      if (mod (t, 16) == 0)
%!        u = u([3 4 1 2]);
%!      endif
%!    endif
%!    u = 0.002 + u / sum (u) * (L - 0.008);
%!    [l1, d1, l2, d2] = deal (u(1), u(2), u(3), u(4));
%!    s = L * rand ();
%!    A = [s, s + l1; s + l1 + d1, s + l1 + d1 + l2] + L * randi ([-1 1], 2, 1);
%!    A = A(randperm (2), :);
%!    [Sx, k, cand] = rv_two_intervals (bg, l1, d1, l2, d2);
%!    [S, conf] = rt_entropy (bg, A);
%!    assert (S, Sx, 1e-10 * abs (Sx));
%!    assert (conf.candidates, 6);          # binom(4, 2)
%!    cs = sort (cand);
%!    if (cs(2) - cs(1) > 1e-8 * abs (Sx))
%!      ncmp++;
%!      seen(k) = true;
%!      assert (conf.horizon, any (k == [2 3 4]));
%!      q = mod (s + cumsum ([0, l1, d1, l2]), L);    # a1, a2, b1, b2
%!      if (k <= 3)
%!        want = [q(1) q(2); q(3) q(4)];
%!      else
%!        want = [q(2) q(3); q(4) q(1)];
%!      endif
%!      got = sortrows (sort (conf.pair_coords, 2));
%!      want = sortrows (sort (want, 2));
%!      dd = abs (got - want);
%!      assert (max (min (dd(:), L - dd(:))) < 1e-10);
%!      arcs = {[l1 l2], [L-l1 l2], [l1 L-l2], [d1 d2], [L-d1 d2], [d1 L-d2]};
%!      assert (sort (conf.arcs(:)).', sort (arcs{k}), 1e-10);
%!    endif
%!  endfor
%!  assert (ncmp > ntrials / 2);
%!  ## the plain phases, the connected one with the horizon, and the
%!  ## plateau of one interval all occur
%!  assert (seen(1) && (seen(5) || seen(6)) && seen(4) && (seen(2) || seen(3)));
%!endfunction

%!test
%! ## BTZ circle: two intervals against the hand enumeration above.
%! rand ("seed", 235);
%! rv_btz_two (ads3_background ("thermal", "circle", "beta", 0.6, "c", 3, "cutoff", 1e-7), 150);

%!test
%! ## rotating BTZ circle (beta_L != beta_R), the same enumeration.
%! rand ("seed", 236);
%! bg = ads3_background ("rotating", "circle", "beta_L", 0.35, "beta_R", 1.1, "cutoff", 1e-6);
%! assert (bg.bulk, "rotating_btz");
%! rv_btz_two (bg, 150);

%!test
%! ## The whole circle [a, a + L] (Deliver 2 of the region issue): S_BH with
%! ## a horizon, 0 for global AdS, thermal AdS and the conical defect; one
%! ## candidate, no geodesic.  Also when given as touching pieces.
%! bgs = {ads3_background("vacuum", "circle", "circumference", 3), ...
%!        ads3_background("thermal", "circle", "beta", 9), ...
%!        ads3_background("thermal", "circle", "beta", 0.8, "c", 5), ...
%!        ads3_background("rotating", "circle", "beta_L", 0.4, "beta_R", 0.9), ...
%!        ads3_background("heavy", "circle", "alpha", 0.4)};
%! for b = 1:numel (bgs)
%!   bg = bgs{b};  L = bg.circumference;  a = -1.3;
%!   [S, conf] = rt_entropy (bg, [a, a + L]);
%!   assert (S, bg.S_BH * bg.horizon, 1e-12 * max (1, bg.S_BH));
%!   assert (conf.horizon, logical (bg.horizon));
%!   assert (conf.candidates, 1);
%!   assert (size (conf.pairs), [0 2]);
%!   assert (rt_entropy (bg, [a, a + 0.3 * L; a + 0.3 * L, a + L]), S, 1e-12 * max (1, S));
%!   assert (interval_entropy (bg, L), S, 1e-12 * max (1, S));
%! endfor
%! ## the S_BH of the rotating case is Cardy's (pi c/6) L (1/beta_L + 1/beta_R)
%! ## (Cardy 1986, Nucl. Phys. B 270, 186; from memory)
%! assert (rt_entropy (bgs{4}, [0 2*pi]), pi / 6 * 2 * pi * (1/0.4 + 1/0.9), 1e-12);

%!test
%! ## The heavy state at alpha = 1 (h = 0) is the global vacuum: same
%! ## entropies, same configuration and the vacuum's Catalan(n) candidates
%! ## (Catalan(3) = 5); at alpha < 1 each pairing has n + 1 defect faces,
%! ## binom(6, 3) = 20.
%! v = ads3_background ("vacuum", "circle", "circumference", 5);
%! h1 = ads3_background ("heavy", "circle", "alpha", 1, "circumference", 5);
%! h9 = ads3_background ("heavy", "circle", "alpha", 0.9, "circumference", 5);
%! R = [0.2 1; 1.5 3.9; 4.3 4.6];
%! [Sv, cv] = rt_entropy (v, R);
%! [S1, c1] = rt_entropy (h1, R);
%! [~, c9] = rt_entropy (h9, R);
%! assert (S1, Sv, 1e-12 * Sv);
%! assert (c1.pairs, cv.pairs);
%! assert (c1.arcs, cv.arcs, 1e-12);
%! assert ([cv.candidates, c1.candidates, c9.candidates], [5 5 20]);
