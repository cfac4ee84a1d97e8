## SPDX-License-Identifier: GPL-3.0-or-later
## Independent cross-checks of the higher-dimensional RT functions (strips,
## balls, tabulated f, the first law): every reference value below is
## derived inside this file from the metric, by a different route from the
## package's (power series in place of the package's substitution and
## quadrature, Octave's integral/fzero).
##
## Strip in the brane f = 1 - x^d, x = z/zh (d >= 3).  Expanding
## 1/sqrt(f) = sum_n c_n x^(dn), c_n = (2n)!/(4^n n!^2), termwise
## (t = u^(2d-2) turns every term into a Beta integral):
##   l/2   = z* sum_n c_n (z*/zh)^(dn) B(d(n+1)/(2d-2), 1/2)/(2d-2),
##   S_fin = (2 ell^(d-1) Lp^(d-2)/4G) z*^(2-d) sum_n c_n (z*/zh)^(dn) B((dn+2-d)/(2d-2), 1/2)/(2d-2),
## the n = 0 term of S_fin being the analytic continuation (the vacuum
## constant, computed here by integral of the subtracted integrand).  This
## hypergeometric form of the strip is standard (e.g. Fischler and Kundu
## 2013, JHEP 05 (2013) 098; from memory).  The series converges for
## z* < zh like (z*/zh)^(dn)/n.

%!function c = series_c (N)
%!  n = 0:N;
%!  c = exp (gammaln (2*n + 1) - 2 * gammaln (n + 1) - n * log (4));
%!endfunction

%!function B = beta_ (a, b)
%!  ## Beta function, a > 0 (log-gamma: no overflow for large a)
%!  B = exp (gammaln (a) + gammaln (b) - gammaln (a + b));
%!endfunction

%!function J0 = jvac_integral (d)
%!  ## vacuum constant int_0^1 u^(1-d) ((1 - u^(2d-2))^(-1/2) - 1) du - 1/(d-2),
%!  ## = int u^(d-1)/(sqrt(q) (1 + sqrt(q))) du, q = 1 - u^(2d-2), and with
%!  ## u = 1 - t^2, q = t^2 sum_{k<2d-2} u^k: a smooth integrand
%!  sig = @(u) sum (u(:)'.^((0:2*d-3)'), 1);
%!  g = @(t) 2 * (1 - t(:)'.^2).^(d-1) ./ (sqrt (sig (1 - t.^2)) .* (1 + t(:)' .* sqrt (sig (1 - t.^2))));
%!  J0 = integral (g, 0, 1, "RelTol", 1e-15, "AbsTol", 0) - 1 / (d - 2);
%!endfunction

%!function [l, J] = brane_series (d, zs, zh)
%!  N = ceil (40 / (-d * log (zs / zh))) + 50;   # x^(dN) < e^-40
%!  n = 0:N;  c = series_c (N);  x = (zs / zh).^(d * n);
%!  l = 2 * zs * sum (c .* x .* beta_ (d * (n + 1) / (2*d - 2), 0.5)) / (2*d - 2);
%!  J = jvac_integral (d) + sum (c(2:end) .* x(2:end) .* beta_ ((d * n(2:end) + 2 - d) / (2*d - 2), 0.5)) / (2*d - 2);
%!  if (! isfinite (l) || ! isfinite (J))
%!    error ("brane_series: not finite");
%!  endif
%!endfunction

%!test
%! ## The vacuum constant by integral equals the Ryu-Takayanagi closed form
%! ## -sqrt(pi) G(d/(2d-2))/((d-2) G(1/(2d-2))) (RT 2006, JHEP 08 (2006) 045).
%! for d = 3:7
%!   ref = -sqrt (pi) * gamma (d / (2*d - 2)) / ((d - 2) * gamma (1 / (2*d - 2)));
%!   assert (jvac_integral (d), ref, 1e-12 * abs (ref));
%! endfor

%!test
%! ## Brane strips, d = 3, 4, 6: z*, finite and delta against the series
%! ## (z* fixed by fzero on the series width), up to z*/zh ~ 0.99.
%! ell = 1.3;  G = 0.2;  Lp = 1.7;  zh = 0.8;
%! for d = [3 4 6]
%!   bg = ads_background (d, "black_brane", "zh", zh, "ell", ell, "G", G, "cutoff", 1e-4);
%!   l = [0.05 0.4 1 2] * zh;
%!   [~, info] = strip_entropy (bg, l, "length", Lp);
%!   pre = 2 * ell^(d-1) * Lp^(d-2) / (4 * G);
%!   g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!   for k = 1:numel (l)
%!     zs = fzero (@(x) brane_series (d, x, zh) - l(k), [1e-3, 0.9999] * zh,
%!                 optimset ("TolX", 1e-16));
%!     assert (info.z_star(k), zs, 1e-12 * zs);
%!     [~, J] = brane_series (d, zs, zh);
%!     fin = pre * zs^(2-d) * J;
%!     assert (info.finite(k), fin, 1e-11 * max (1, abs (fin)));
%!     ## vacuum strip of the same width, RT 2006 closed form
%!     finv = -2^(d-1) * pi^((d-1)/2) * ell^(d-1) / ((d - 2) * 4 * G) * g^(d-1) * (Lp / l(k))^(d-2);
%!     assert (info.delta(k), fin - finv, 1e-11 * max ([1, abs(fin), abs(finv)]));
%!   endfor
%! endfor

%!test
%! ## Large strips: delta itself grows as s l Lp^(d-2), s = ell^(d-1)/(4 G zh^(d-1))
%! ## (horizon area density; Bekenstein-Hawking), its slope differing from
%! ## s Lp^(d-2) only by the vacuum's power tail (d-2) K l^(1-d) (K from RT 2006).
%! ell = 1.1;  G = 0.3;  Lp = 2;
%! for d = [3 4 5]
%!   zh = 0.7;
%!   bg = ads_background (d, "black_brane", "zh", zh, "ell", ell, "G", G);
%!   s = ell^(d-1) / (4 * G * zh^(d-1));
%!   g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!   K = 2^(d-1) * pi^((d-1)/2) * ell^(d-1) / ((d - 2) * 4 * G) * g^(d-1) * Lp^(d-2);
%!   l = [15 20] * zh;
%!   [~, info] = strip_entropy (bg, l, "length", Lp);
%!   slope = diff (info.delta) / diff (l);
%!   tail = K * (l(1)^(2-d) - l(2)^(2-d)) / diff (l);   # -d(fin_vac)/dl averaged
%!   assert (slope, s * Lp^(d-2) - tail, 1e-9 * s * Lp^(d-2));
%!   ## and delta/(s l Lp^(d-2)) -> 1 (the constant offset is O(zh/l))
%!   r = info.delta ./ (s * l * Lp^(d-2));
%!   assert (abs (r - 1) < 0.2 && abs (r(2) - 1) < abs (r(1) - 1));
%! endfor

%!test
%! ## Vacuum balls: the finite constant C_d of every d from 3 to 8 against
%! ## an independent extraction.  Area per ell^(d-1) Omega_{d-2} above y = eps/R:
%! ## int y^(1-d) (1 - y^2)^((d-3)/2) dy; subtract the binomial terms
%! ## c_k y^(2k-d+1), 2k <= d-2 (c_k = binomial((d-3)/2, k) (-1)^k) whose
%! ## integrals are the divergences (and for even d the log c_n log(R/eps)):
%! ##   C_d = int_0^1 y^(1-d) [(1-y^2)^((d-3)/2) - sum_{2k<=d-2} c_k y^(2k)] dy - sum_{2k<d-2} c_k/(d-2-2k),
%! ## the bracket summed as its tail series below y = 0.3 (no cancellation).
%! for d = 3:8
%!   a = (d - 3) / 2;  K = 80;  k = 0:K;
%!   ck = ones (1, K + 1);
%!   for j = 1:K
%!     ck(j+1) = -ck(j) * (a - j + 1) / j;
%!   endfor
%!   low = k(2*k <= d - 2);
%!   tailk = k(2*k > d - 2);
%!   br_series = @(y) reshape (sum (ck(tailk + 1)' .* y(:)'.^(2 * tailk' + 1 - d), 1), size (y));
%!   br_direct = @(y) reshape (y(:)'.^(1-d) .* ((1 - y(:)'.^2).^a - sum (ck(low + 1)' .* y(:)'.^(2 * low'), 1)), size (y));
%!   I = integral (br_series, 0, 0.3, "RelTol", 1e-14, "AbsTol", 1e-16) ...
%!       + integral (br_direct, 0.3, 1, "RelTol", 1e-14, "AbsTol", 1e-16);
%!   pw = low(2*low < d - 2);
%!   C = I - sum (ck(pw + 1) ./ (d - 2 - 2 * pw));
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   bg = ads_background (d, "vacuum", "ell", 1.2, "G", 0.25, "cutoff", 1e-3);
%!   [~, info] = ball_entropy (bg, 0.9);
%!   assert (info.finite, 1.2^(d-1) * Om / 1 * C, 1e-11 * max (1, abs (C)) * 1.2^(d-1) * Om);
%! endfor
%! ## d = 3: 2 pi ell^2 (R/eps - 1)/(4G), the F-term -2 pi ell^2/(4G)
%! ## (Ryu and Takayanagi 2006, JHEP 08 (2006) 045)
%! [~, info] = ball_entropy (ads_background (3, "vacuum", "G", 0.25), 2);
%! assert (info.finite, -2 * pi, 1e-13);

%!test
%! ## First law of entanglement (Blanco, Casini, Hung and Myers 2013, JHEP
%! ## 08 (2013) 060): delta S = 2 pi int_ball (R^2 - r^2)/(2R) e d^(d-1)x
%! ## = 2 pi Omega_{d-2} R^d e/(d^2 - 1), integrated here by integral over r,
%! ## with Omega_{d-2} = 2 pi^((d-1)/2)/Gamma((d-1)/2) the area of the unit
%! ## (d-2)-sphere and e the energy density from thermodynamics written out
%! ## here: T = d/(4 pi zh), s = ell^(d-1)/(4G zh^(d-1)), e = int T ds = (d-1) T s/d.
%! ## The relative correction must scale as R^d (next order in m R^d).
%! ell = 0.9;  G = 0.15;  zh = 1.4;
%! for d = 3:6
%!   bg = ads_background (d, "black_brane", "zh", zh, "ell", ell, "G", G);
%!   T = d / (4 * pi * zh);  s = ell^(d-1) / (4 * G * zh^(d-1));  e = (d - 1) * T * s / d;
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   R = [0.04 0.08] * zh;
%!   fl = zeros (size (R));
%!   for k = 1:2
%!     fl(k) = 2 * pi * e * Om * integral (@(r) (R(k)^2 - r.^2) / (2 * R(k)) .* r.^(d-2), 0, R(k),
%!                                         "RelTol", 1e-14);
%!   endfor
%!   assert (fl, 2 * pi * Om * R.^d * e / (d^2 - 1), 1e-13 * fl);
%!   [~, info] = ball_entropy (bg, R);
%!   dev = info.delta ./ fl - 1;
%!   assert (all (dev < 0));                               # relative entropy >= 0
%!   assert (abs (dev) < (R / zh).^d);
%!   assert (dev(2) / dev(1), 2^d, 0.05 * 2^d);             # O(R^d) correction
%! endfor

%!function F = fzero_J (d, l, zh)
%!  ## finite part per 2 ell^(d-1) Lp^(d-2)/(4G), ell = G = Lp = 1: z*^(2-d) J/4
%!  zs = fzero (@(x) brane_series (d, x, zh) - l, [1e-4, 0.9999] * zh, optimset ("TolX", 1e-16));
%!  [~, J] = brane_series (d, zs, zh);
%!  F = zs^(2-d) * J / 4;
%!endfunction

%!test
%! ## Strip mutual information, vacuum: with S_fin = -K/l^(d-2) and K from the
%! ## RT 2006 closed form (not from the package), and in the brane with every
%! ## finite part from the series above; the transition separation of the
%! ## brane by fzero on the series gap (Headrick 2010, PRD 82, 126010 for
%! ## S(A u B) = min(disconnected, connected); from memory).
%! for d = [3 4]
%!   g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!   K = 2^(d-1) * pi^((d-1)/2) / ((d - 2) * 4) * g^(d-1);
%!   bg = ads_background (d, "vacuum");
%!   l1 = 0.8;  l2 = 1.3;  s = [0.03 0.3 0.6 3];
%!   I = strip_mutual_information (bg, l1, s, l2);
%!   ref = max (0, K * (s.^(2-d) + (l1 + s + l2).^(2-d) - l1^(2-d) - l2^(2-d)));
%!   assert (I, ref, 1e-11 * max (ref));
%! endfor
%! d = 4;  zh = 1;
%! bg = ads_background (d, "black_brane", "zh", zh);
%! fin = @(l) 2 * fzero_J (d, l, zh);
%! l1 = 0.9;  l2 = 0.6;
%! gap = @(s) fin (l1) + fin (l2) - fin (s) - fin (l1 + s + l2);
%! s = [0.05 0.15];
%! [I, info] = strip_mutual_information (bg, l1, s, l2);
%! assert (I, [gap(s(1)), gap(s(2))], 1e-10 * max (I));
%! st = fzero (gap, [0.05 0.6], optimset ("TolX", 1e-14));
%! assert (info.s_transition, st, 1e-8 * st);

%!test
%! ## Tabulated f from a "solver" (here the brane sampled on a coarse,
%! ## non-uniform grid): f(0) = 1 and f - 1 = O(z^d) accepted, the horizon,
%! ## T = |f'(zh)|/(4 pi) and the strip/ball entropies reproduced to the
%! ## spline's accuracy; the series above is the reference for the strip.
%! d = 4;  zh = 1;
%! z = (linspace (0, 1, 500)'.^1.5) * 1.3;
%! bt = ads_background (d, "tabulated", "z", z, "f", 1 - (z / zh).^d, "cutoff", 1e-4);
%! assert (bt.zh, zh, 1e-10);
%! assert (bt.T, d / (4 * pi * zh), 1e-8);
%! l = [0.3 1.2];
%! [~, it] = strip_entropy (bt, l);
%! for k = 1:2
%!   zs = fzero (@(x) brane_series (d, x, zh) - l(k), [1e-3, 0.9999], optimset ("TolX", 1e-16));
%!   assert (it.z_star(k), zs, 1e-8);
%! endfor
%! ## samples that break f - 1 = O(z^d) are refused
%! fail ('ads_background (4, "tabulated", "z", z, "f", 1 - 1e-3 * z.^2 - z.^4)', "vanish like z\\^4");
%! fail ('ads_background (4, "tabulated", "z", z, "f", 1 - (z / zh).^4 + 1e-6)', "must be 1 at z = 0");

%!test
%! ## Tabulated f = 1 - m z^d - a z^(d+2) (a user's solver with a subleading
%! ## term): m, T = |f'(zh)|/(4 pi), and small strips and balls against the
%! ## first-order change of the area written here from the metric: only
%! ## dz^2/f varies, delta(1/f) = m z^d + a z^(d+2) + O(f-1)^2, so on the
%! ## vacuum surfaces (as in Blanco, Casini, Hung and Myers 2013, JHEP 08
%! ## (2013) 060)
%! ##   ball:  delta A = Omega_{d-2}/(2R) int_0^R (R^2 - z^2)^((d-1)/2) z (m + a z^2) dz,
%! ##   strip: delta A = Lp^(d-2) int_0^z* z sqrt(1 - (z/z*)^(2d-2)) (m + a z^2) dz,
%! ## by integral; the m term alone is the first law with
%! ## e = (d-1) m/(16 pi G).  Second order is O(m R^d) relative.
%! d = 4;  m = 0.7;  a = 0.3;  G = 1;
%! z = linspace (0, 1.3, 800)';
%! bt = ads_background (d, "tabulated", "z", z, "f", 1 - m * z.^d - a * z.^(d+2));
%! assert (bt.m, m, 1e-8);
%! assert (bt.zh, 1, 1e-10);                 # f(1) = 0
%! assert (bt.T, (d * m + (d + 2) * a) / (4 * pi), 1e-7);
%! assert (bt.energy_density, (d - 1) * m / (16 * pi * G), 1e-8);
%! Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%! R = [0.01 0.02 0.04];
%! [~, ib] = ball_entropy (bt, R);
%! [~, is] = strip_entropy (bt, R);
%! gr = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%! for k = 1:3
%!   dA = Om / (2 * R(k)) * integral (@(x) (R(k)^2 - x.^2).^((d-1)/2) .* x .* (m + a * x.^2),
%!                                    0, R(k), "RelTol", 1e-13);
%!   assert (ib.delta(k), dA / (4 * G), (2 * m * R(k)^d + 1e-8) * dA / (4 * G));
%!   zs = R(k) / (2 * sqrt (pi) * gr);
%!   dAs = integral (@(x) x .* sqrt (1 - (x / zs).^(2*d-2)) .* (m + a * x.^2), 0, zs, "RelTol", 1e-13);
%!   assert (is.delta(k), dAs / (4 * G), (2 * m * zs^d + 1e-8) * dAs / (4 * G));
%! endfor
%! ## the a term is what moves delta off the first law: relative R^2 2a/((d+3) m)
%! fl = 2 * pi * Om * R.^d * bt.energy_density / (d^2 - 1);
%! assert (ib.delta ./ fl - 1, 2 * a / ((d + 3) * m) * R.^2, 1e-3 * 2 * a / ((d + 3) * m) * R.^2);
