## SPDX-License-Identifier: GPL-3.0-or-later
## Entanglement wedge cross section bounds where they are not trivially
## true: E_W <= min(S_A, S_B) (Takayanagi and Umemoto 2017,
## arXiv:1708.09393) at a cutoff comparable to the gaps, and E_W's
## independence of the cutoff.

%!test
%! ## E_W <= min(S_A, S_B) with the cutoff close to the smallest gap or
%! ## interval (eps = shortest/2.5, just above the cutoff warning), where
%! ## S_A and S_B are smallest against E_W; and E_W >= I/2.  Takayanagi and
%! ## Umemoto 2017 (arXiv:1708.09393).  Single-interval entropies from
%! ## interval_entropy, I from them (Headrick 2010, Phys. Rev. D 82, 126010).
%! rand ("seed", 237);
%! warning ("off", "holent:cutoff", "local");   # eps is large on purpose
%! mk = {@(e) ads3_background("vacuum", "line", "cutoff", e), ...
%!       @(e) ads3_background("vacuum", "circle", "circumference", 4, "cutoff", e), ...
%!       @(e) ads3_background("thermal", "line", "beta", 0.5, "cutoff", e), ...
%!       @(e) ads3_background("rotating", "line", "beta_L", 0.3, "beta_R", 1.2, "cutoff", e)};
%! worst = 0;
%! for b = 1:numel (mk)
%!   nconn = 0;
%!   for t = 1:60
%!     lA = 0.2 + 1.5 * rand ();  lB = 0.2 + 1.5 * rand ();
%!     d = 10 ^ (-1 - 3 * rand ());
%!     A = [0, lA];  B = [lA + d, lA + d + lB];
%!     circ = b == 2;
%!     if (circ)
%!       d2 = 4 - lA - lB - d;
%!       if (d2 < 1e-3) continue; endif
%!       e = min ([lA, lB, d, d2]) / 2.5;
%!     else
%!       e = min ([lA, lB, d]) / 2.5;
%!     endif
%!     bg = mk{b} (e);
%!     E = wedge_cross_section (bg, A, B);
%!     SA = interval_entropy (bg, lA);  SB = interval_entropy (bg, lB);
%!     if (circ)
%!       Sg = interval_entropy (bg, d) + interval_entropy (bg, d2);
%!     else
%!       Sg = interval_entropy (bg, d) + interval_entropy (bg, lA + d + lB);
%!     endif
%!     I = max (0, SA + SB - Sg);
%!     assert (E <= min (SA, SB) + 1e-10);
%!     assert (E >= I / 2 - 1e-10);
%!     assert ((E > 0) == (I > 1e-10));
%!     if (E > 0)
%!       nconn++;
%!       worst = max (worst, E / min (SA, SB));
%!     endif
%!   endfor
%!   assert (nconn > 10);
%! endfor
%! ## the bound is approached (E_W/min(S_A, S_B) close to 1/2), not trivially slack
%! assert (worst > 0.4);

%!test
%! ## E_W is cutoff independent, the phase too: the same pair at two cutoffs
%! ## (Takayanagi and Umemoto 2017: a finite cross section).
%! for mk = {@(e) ads3_background("vacuum", "circle", "cutoff", e), ...
%!           @(e) ads3_background("rotating", "line", "beta_L", 0.7, "beta_R", 0.4, "cutoff", e)}
%!   [E1, i1] = wedge_cross_section (mk{1} (1e-4), [0 1], [1.02 2.5]);
%!   [E2, i2] = wedge_cross_section (mk{1} (1e-9), [0 1], [1.02 2.5]);
%!   assert (E1 > 0);
%!   assert (E1, E2, 1e-12 * E1);
%!   assert (i1.points, i2.points, 1e-12);
%! endfor
