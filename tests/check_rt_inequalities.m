## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Entropy inequalities and purity for rt_entropy on random region sets in
## every background (the fast dynamic programme; hundreds of sets each).
##   subadditivity and Araki-Lieb (Araki and Lieb 1970, Commun. Math. Phys.
##   18, 160), strong subadditivity (Lieb and Ruskai 1973; holographic
##   proof Headrick and Takayanagi 2007, PRD 76, 106013), weak monotonicity
##   (common practice: SSA for the purified state), monogamy of mutual
##   information (Hayden, Headrick and Maloney 2011, arXiv:1107.2940);
##   purity S(A) = S(A^c) in the global vacuum, thermal AdS and the
##   conical defect (one bulk geometry with no horizon; Ryu and Takayanagi
##   2006, PRL 96, 181602); |S(A) - S(A^c)| <= S_BH with a horizon (Araki-
##   Lieb with the black hole as the purifier).

%!function bgs = ineq_backgrounds ()
%!  bgs = {ads3_background("vacuum", "line"), ...
%!         ads3_background("thermal", "line", "beta", 0.8), ...
%!         ads3_background("rotating", "line", "beta_L", 0.4, "beta_R", 1.5), ...
%!         ads3_background("vacuum", "circle", "circumference", 5), ...
%!         ads3_background("thermal", "circle", "beta", 8), ...
%!         ads3_background("thermal", "circle", "beta", 0.6), ...
%!         ads3_background("thermal", "circle", "beta", 2.5, "saddle", "btz"), ...
%!         ads3_background("rotating", "circle", "beta", 0.7, "Omega", -0.4), ...
%!         ads3_background("heavy", "circle", "alpha", 0.3), ...
%!         ads3_background("heavy", "circle", "alpha", 0.8)};
%!endfunction

%!function [A, B, C] = ineq_parties (bg)
%!  ## 3..9 pieces separated by gaps, each given to A, B, C or nobody
%!  circle = strcmp (bg.boundary, "circle");
%!  span = ifelse_ (circle, bg.circumference, 6);
%!  do
%!    k = randi ([3 9]);
%!    p = sort (span * rand (2 * k, 1)) + circle * randi ([-1 1]) * span;
%!    who = randi ([1 4], k, 1);
%!  until (all (ismember (1:3, who)) && min (diff (p)) > 1e-3)
%!  R = [p(1:2:end), p(2:2:end)];
%!  if (circle && rand () < 0.5)       # let one piece wrap through 0
%!    R = [p(2:2:end), [p(3:2:end); p(1) + span]];
%!  endif
%!  A = R(who == 1, :);  B = R(who == 2, :);  C = R(who == 3, :);
%!endfunction

%!function r = ifelse_ (c, a, b)
%!  if (c) r = a; else r = b; endif
%!endfunction

%!test
%! rand ("seed", 31);
%! bgs = ineq_backgrounds ();
%! nsets = 200;
%! nstrict = zeros (1, numel (bgs));
%! for ib = 1:numel (bgs)
%!   bg = bgs{ib};
%!   R = cell (nsets, 7);
%!   for t = 1:nsets
%!     [A, B, C] = ineq_parties (bg);
%!     R(t,:) = {A, B, C, [A; B], [A; C], [B; C], [A; B; C]};
%!   endfor
%!   S = rt_entropy (bg, R);
%!   [a, b, c, ab, ac, bc, abc] = deal (S(:,1), S(:,2), S(:,3), S(:,4), S(:,5), S(:,6), S(:,7));
%!   tol = 1e-9 * max (abs (S(:)));
%!   assert (all (a + b - ab >= -tol), "SA fails in %s", bg.bulk);
%!   assert (all (ab - abs (a - b) >= -tol), "Araki-Lieb fails in %s", bg.bulk);
%!   assert (all (ab + bc - b - abc >= -tol), "SSA fails in %s", bg.bulk);
%!   assert (all (ab + bc - a - c >= -tol), "weak monotonicity fails in %s", bg.bulk);
%!   mmi = ab + bc + ac - a - b - c - abc;
%!   assert (all (mmi >= -tol), "MMI fails in %s: %g", bg.bulk, min (mmi));
%!   ## not all trivially saturated: some sets have a strictly negative I3
%!   nstrict(ib) = sum (mmi > 1e-3);
%! endfor
%! ## not all trivially saturated: strictly negative I3 occurs in most
%! ## backgrounds (rarely at high temperature, where I is mostly zero)
%! assert (nnz (nstrict) >= 8);

%!test
%! ## purity, and Araki-Lieb against the horizon, for random region sets
%! rand ("seed", 32);
%! bgs = ineq_backgrounds ();
%! for ib = 4:numel (bgs)
%!   bg = bgs{ib};
%!   L = bg.circumference;
%!   R = cell (150, 2);
%!   for t = 1:rows (R)
%!     n = randi (12);
%!     do
%!       p = sort (L * rand (2 * n, 1));
%!     until (min (diff ([p; p(1) + L])) > 1e-3)
%!     R{t,1} = [p(1:2:end), p(2:2:end)];
%!     R{t,2} = [p(2:2:end), [p(3:2:end); p(1) + L]];    # the complement
%!     if (t > rows (R) - 15)
%!       ## the last sets: A^c made of n thin gaps of 1e-3 .. 1e-2 (at the
%!       ## starts p(1:2:end), at least 1e-3 apart), so that A^c plus the
%!       ## horizon wins and Araki-Lieb is saturated
%!       x = p(1:2:end);  g = 1e-3 + 9e-3 * rand (n, 1);
%!       g = min (g, 0.5 * diff ([x; x(1) + L]));
%!       R{t,2} = [x, x + g];
%!       R{t,1} = [x + g, [x(2:end); x(1) + L]];
%!     endif
%!   endfor
%!   S = rt_entropy (bg, R);
%!   if (bg.horizon)
%!     assert (all (abs (S(:,1) - S(:,2)) <= bg.S_BH * (1 + 1e-12)));
%!     ## the plateau is reached for some sets (one side takes the horizon)
%!     [~, conf] = rt_entropy (bg, R);
%!     h = any (reshape ([conf.horizon], size (R)), 2);
%!     assert (any (h), "no set took the horizon in %s", bg.bulk);
%!     assert (abs (S(h,1) - S(h,2)), bg.S_BH * ones (nnz (h), 1), 1e-9 * bg.S_BH);
%!   else
%!     assert (S(:,1), S(:,2), 1e-9 * max (abs (S(:))));
%!   endif
%! endfor
