## SPDX-License-Identifier: GPL-3.0-or-later
## Random property tests of the information inequalities over every AdS3
## background, with regions whose coordinates span many orders of
## magnitude: subadditivity and Araki-Lieb (Araki and Lieb 1970, Commun.
## Math. Phys. 18, 160), strong subadditivity (Lieb and Ruskai 1973,
## J. Math. Phys. 14, 1938; for RT: Headrick and Takayanagi 2007,
## arXiv:0704.3719), monogamy of mutual information (Hayden, Headrick and
## Maloney 2013, arXiv:1107.2940), I >= 0, and the entanglement wedge
## cross section bounds I/2 <= E_W <= min(S_A, S_B) (Takayanagi and
## Umemoto 2018, arXiv:1708.09393), all from memory.

%!function bgs = backgrounds ()
%! ## every AdS3 state, with a cutoff far below the regions drawn
%! e = 1e-9;
%! bgs = {ads3_background("vacuum", "line", "cutoff", e, "c", 3), ...
%!        ads3_background("thermal", "line", "beta", 0.7, "cutoff", e, "c", 2), ...
%!        ads3_background("rotating", "line", "beta", 0.7, "Omega", 0.4, "cutoff", e), ...
%!        ads3_background("vacuum", "circle", "cutoff", e, "c", 5), ...
%!        ads3_background("thermal", "circle", "beta", 1, "cutoff", e), ...
%!        ads3_background("thermal", "circle", "beta", 9, "cutoff", e), ...
%!        ads3_background("rotating", "circle", "beta", 1, "Omega", 0.3, "cutoff", e), ...
%!        ads3_background("heavy", "circle", "alpha", 0.4, "cutoff", e)};
%!endfunction

%!function P = parties (bg, np)
%! ## np disjoint parties of 1 to 3 intervals; widths and gaps drawn from
%! ## 10^-5 .. 10^0 of the scale (the circumference, or on a line a scale
%! ## 10^-3 .. 10^9 about a centre up to 10^6 scales away)
%! k = np * 3;
%! if (strcmp (bg.boundary, "circle"))
%!   L = bg.circumference;  x0 = L * rand ();  sc = L / (2 * k);
%! else
%!   sc = 10 ^ (-3 + 12 * rand ());  x0 = (rand () - 0.5) * sc * 10 ^ (6 * rand ());
%! endif
%! w = sc * 10 .^ (-5 * rand (1, 2 * k));        # widths and gaps
%! if (strcmp (bg.boundary, "circle"))
%!   w = w * (bg.circumference / sum (w)) * (1 - 1e-3 * rand ());
%! endif
%! x = x0 + cumsum ([0 w]);
%! iv = [x(1:2:2*k)' x(2:2:2*k+1)'];
%! own = randi (np, k, 1);  own(1:np) = 1:np;
%! P = arrayfun (@(j) iv(own == j, :), 1:np, "uniformoutput", false);
%!endfunction

%!test
%! rand ("seed", 10);  randn ("seed", 10);
%! ws = warning ("off", "holent:cutoff");
%! unwind_protect
%!   bgs = backgrounds ();
%!   for b = 1:numel (bgs)
%!     bg = bgs{b};
%!     for trial = 1:25
%!       P = parties (bg, 3);
%!       [A, B, C] = P{:};
%!       S = @(varargin) rt_entropy (bg, vertcat (varargin{:}));
%!       sA = S (A);  sB = S (B);  sC = S (C);
%!       sAB = S (A, B);  sBC = S (B, C);  sAC = S (A, C);  sABC = S (A, B, C);
%!       tol = 1e-9 * (abs (sA) + abs (sB) + abs (sC) + abs (sABC) + 1);
%!       what = sprintf ("background %d (%s), trial %d", b, bg.bulk, trial);
%!       assert (sA + sB >= sAB - tol, ["SA: " what]);
%!       assert (sAB >= abs (sA - sB) - tol, ["AL: " what]);
%!       assert (sAB + sBC >= sB + sABC - tol, ["SSA: " what]);
%!       assert (sAB + sBC + sAC - sA - sB - sC - sABC >= -tol, ["MMI: " what]);
%!       I = mutual_information (bg, A, B);
%!       assert (I, sA + sB - sAB, tol);
%!       assert (I >= -tol, ["I >= 0: " what]);
%!       I3 = tripartite_information (bg, A, B, C);
%!       assert (I3 <= tol, ["I3 <= 0: " what]);
%!       assert (conditional_entropy (bg, A, B), sAB - sB, tol);
%!     endfor
%!   endfor
%! unwind_protect_cleanup
%!   warning (ws);
%! end_unwind_protect

%!test
%! ## E_W bounds, on the backgrounds wedge_cross_section supports, for two
%! ## intervals at scales 10^-3 .. 10^6 (the reflected entropy is 2 E_W)
%! rand ("seed", 11);
%! bgs = backgrounds ();
%! for b = [1 2 3 4]
%!   bg = bgs{b};
%!   for trial = 1:20
%!     sc = 10 ^ (-3 + 9 * rand ());
%!     if (strcmp (bg.boundary, "circle"))
%!       sc = bg.circumference / 5;
%!     endif
%!     l = sc * (0.05 + rand (1, 3));
%!     A = [0, l(1)];  B = A(2) + [l(2) * 1e-3 ^ rand(), 0];
%!     B(2) = B(1) + l(3);
%!     if (strcmp (bg.boundary, "circle") && B(2) >= bg.circumference)
%!       continue;
%!     endif
%!     E = wedge_cross_section (bg, A, B);
%!     I = mutual_information (bg, A, B);
%!     sA = rt_entropy (bg, A);  sB = rt_entropy (bg, B);
%!     tol = 1e-9 * (abs (sA) + abs (sB) + 1);
%!     assert (E >= I / 2 - tol, sprintf ("E_W >= I/2: background %d trial %d", b, trial));
%!     assert (E <= min (sA, sB) + tol, sprintf ("E_W <= min S: background %d trial %d", b, trial));
%!   endfor
%! endfor
