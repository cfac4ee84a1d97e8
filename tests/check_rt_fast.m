## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-check of the fast RT minimiser (the O(n^2) sweep of doc/rt_fast.md,
## used by rt_entropy for every AdS3 background) against the cubic dynamic
## programme it replaces, which takes the minimum over every split of every
## run (an exact recursion over the non-crossing pairings, doc/rt_regions.md)
## and stays in the gateway as METHOD "dp".  Random regions in all eight
## bulks, three kinds of spacing (uniform, log-uniform over six decades,
## clustered), n up to 2000: the same minimum to 1e-12 relative and the same
## minimising configuration (pairs, arcs, horizon).  The brute-force
## enumeration of check_rt_bruteforce.m runs through the fast path too.

%!function bgs = fast_backgrounds ()
%!  bgs = {ads3_background("vacuum", "line", "cutoff", 1e-4), ...
%!         ads3_background("vacuum", "circle", "circumference", 7), ...
%!         ads3_background("thermal", "line", "beta", 0.7), ...
%!         ads3_background("thermal", "circle", "beta", 0.9, "circumference", 6), ...
%!         ads3_background("thermal", "circle", "beta", 9, "circumference", 6, ...
%!                         "saddle", "thermal_ads"), ...
%!         ads3_background("rotating", "circle", "beta_L", 0.5, "beta_R", 1.6), ...
%!         ads3_background("rotating", "line", "beta_L", 0.4, "beta_R", 2.5), ...
%!         ads3_background("heavy", "circle", "alpha", 0.45, "circumference", 5)};
%!endfunction

%!function A = fast_region (n, span, style, circle)
%!  switch (style)
%!    case 1
%!      g = rand (2 * n + 1, 1);
%!    case 2
%!      g = exp (12 * rand (2 * n + 1, 1) - 6);
%!    otherwise
%!      g = rand (2 * n + 1, 1) .* (1 + 99 * (rand (2 * n + 1, 1) < 0.3));
%!  endswitch
%!  x = cumsum (g) / sum (g) * span;
%!  A = [x(1:2:end-1), x(2:2:end)];
%!  if (circle && rand () < 0.5)
%!    ## the complement's pattern: the last interval wraps through 0
%!    A = [x(2:2:end), [x(3:2:end-1); x(1) + span]];
%!  endif
%!endfunction

%!function fast_compare (bg, A)
%!  [S1, ~, c1] = __holent_rt__ ("entropy", "t", "A", bg, A, "dp");
%!  [S2, ~, c2] = __holent_rt__ ("entropy", "t", "A", bg, A, "fast");
%!  [S3, ~] = __holent_rt__ ("entropy", "t", "A", bg, A);
%!  for k = 1:numel (S1)
%!    assert (S2(k), S1(k), -1e-12);
%!    assert (c2(k).pairs, c1(k).pairs);
%!    assert (c2(k).horizon, c1(k).horizon);
%!    assert (c2(k).arcs, c1(k).arcs, 1e-12 * max ([1; c1(k).arcs]));
%!  endfor
%!  assert (S3, S2);
%!endfunction

%!test
%! ## many small regions in every bulk
%! rand ("seed", 17);
%! bgs = fast_backgrounds ();
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   span = 20;
%!   if (strcmp (bg.boundary, "circle"))
%!     span = bg.circumference;
%!   endif
%!   A = cell (1, 60);
%!   for k = 1:numel (A)
%!     A{k} = fast_region (randi (40), span, mod (k, 3) + 1, strcmp (bg.boundary, "circle"));
%!   endfor
%!   fast_compare (bg, A);
%! endfor

%!test
%! ## large regions: n = 2000 where the DP takes about a second (line,
%! ## global and thermal AdS), n = 600 to 1000 with two turns of the circle
%! ## (horizon, defect), which also runs the sweep on two threads
%! rand ("seed", 29);
%! bgs = fast_backgrounds ();
%! nn = [2000, 2000, 2000, 1000, 2000, 600, 2000, 800];
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   span = 300;
%!   if (strcmp (bg.boundary, "circle"))
%!     span = bg.circumference;
%!   endif
%!   fast_compare (bg, fast_region (nn(b), span, mod (b, 3) + 1, strcmp (bg.boundary, "circle")));
%! endfor

%!test
%! ## Adversarial regions for the sweep's property (W) of doc/rt_fast.md,
%! ## where exact ties between candidates are common: endpoints on a
%! ## regular grid (a random subset of k L/M on a circle, of k on a line, so
%! ## many gaps and arcs are equal and every rotation of a circle is a
%! ## symmetry), in the bulks whose lengths are least strictly concave: the
%! ## conical defect (alpha = 0.9 and 0.7: arcs beyond L/(2 alpha) have the
%! ## capped, constant length), BTZ with arcs long enough to be linear to
%! ## the last bit (beta = 0.05), global AdS (log sin, not monotone).  Ties
%! ## may make the DP and the sweep pick different minimisers, so the
%! ## minimum is compared (1e-12 relative) and the sweep's configuration
%! ## must reproduce it: S = (c/6) length (+ S_BH with the horizon).
%! rand ("seed", 41);
%! bgs = {ads3_background("heavy", "circle", "alpha", 0.9, "circumference", 6), ...
%!        ads3_background("heavy", "circle", "alpha", 0.7, "circumference", 6), ...
%!        ads3_background("thermal", "circle", "beta", 0.05, "circumference", 6), ...
%!        ads3_background("vacuum", "circle", "circumference", 6), ...
%!        ads3_background("thermal", "line", "beta", 0.05), ...
%!        ads3_background("vacuum", "line")};
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   circ = strcmp (bg.boundary, "circle");
%!   A = cell (1, 50);
%!   for k = 1:numel (A)
%!     n = randi (30);
%!     M = 2 * n + randi (2 * n);               # grid points, some left empty
%!     g = sort (randperm (M, 2 * n))' - 1;
%!     if (circ)
%!       x = g * bg.circumference / M;
%!     else
%!       x = g * (0.5 + 2 * (b == 5));            # BTZ line: arcs of k l >= 19 too
%!     endif
%!     A{k} = [x(1:2:end), x(2:2:end)];
%!   endfor
%!   [S1, ~] = __holent_rt__ ("entropy", "t", "A", bg, A, "dp");
%!   [S2, ~, c2] = __holent_rt__ ("entropy", "t", "A", bg, A, "fast");
%!   assert (S2, S1, -1e-12);
%!   for k = 1:numel (A)
%!     hz = 0;
%!     if (c2(k).horizon)
%!       hz = bg.S_BH;
%!     endif
%!     assert (bg.c / 6 * c2(k).length + hz, S2(k), -1e-12);
%!   endfor
%! endfor

%!test
%! ## The example of doc/rt_fast.md where the best partner of the first
%! ## point among the old ones changes when two points are added (the old
%! ## property (P) fails) and the new point wins (property (W)): vacuum
%! ## line, A = [1, 9] u [11, 16] u [18, 32].  By hand (2 log(l/eps) per
%! ## geodesic, Ryu and Takayanagi 2006): pairing 1-32, 9-11, 16-18 gives
%! ## 2 log(31 * 2 * 2 / eps^3), below 1-9, 11-32, 16-18 (2 log(8 * 21 * 2
%! ## / eps^3)) and every other non-crossing pairing; c = 6, eps = 1/2.
%! bg = ads3_background ("vacuum", "line", "c", 6, "cutoff", 0.5);
%! A = [1 9; 11 16; 18 32];
%! [S1, ~, c1] = __holent_rt__ ("entropy", "t", "A", bg, A, "dp");
%! [S2, ~, c2] = __holent_rt__ ("entropy", "t", "A", bg, A, "fast");
%! assert (S2, 2 * log (31 * 2 * 2 / 0.5^3), -1e-14);
%! assert (S1, S2, -1e-14);
%! assert (c2.pairs, [1 6; 2 3; 4 5]);
%! assert (c1.pairs, c2.pairs);

%!error <METHOD> __holent_rt__ ("entropy", "t", "A", ads3_background ("vacuum", "line"), [0 1], "cubic")
%!error <the DP takes at most 4096> __holent_rt__ ("entropy", "t", "A", ads3_background ("vacuum", "line"), [2 * (0:4096)', 2 * (0:4096)' + 1], "dp")
