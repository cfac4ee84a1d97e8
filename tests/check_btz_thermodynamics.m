## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Cross-checks of btz_thermodynamics and hawking_page against the BTZ
## metric read independently inside the tests, the laws of black hole
## thermodynamics, the Cardy formula and the RT entropy of the whole circle.
##
## BTZ metric (Banados, Teitelboim and Zanelli 1992, PRL 69, 1849; from
## memory):  ds^2 = -N^2 dt^2 + dr^2/N^2 + r^2 (dphi + N^phi dt)^2,
##   N^2 = -8 G M + r^2/ell^2 + 16 G^2 J^2/r^2,  N^phi = -4 G J/r^2,
## phi ~ phi + 2 pi, boundary metric -dt^2 + ell^2 dphi^2 (circle 2 pi ell).
## Horizon r_+ = largest root of N^2 (fzero), T = kappa/(2 pi) with
## kappa = (N^2)'(r_+)/2 (complex-step derivative), Omega_H = -N^phi(r_+),
## S = 2 pi r_+/(4G).  Global AdS3 is N^2 = 1 + r^2/ell^2, i.e. M = -1/(8G).

%!function q = metric_state (M, J, G, ell)
%!  N2 = @(r) -8 * G * M + r.^2 / ell^2 + 16 * G^2 * J^2 ./ r.^2;
%!  rmin = max (2 * sqrt (G * abs (J) * ell), 1e-6 * sqrt (8 * G * M) * ell);
%!  rmax = 2 * sqrt (8 * G * M) * ell + 1;
%!  q.rp = fzero (N2, [rmin, rmax], optimset ("TolX", 1e-15));
%!  h = 1e-20 * q.rp;
%!  kappa = imag (N2 (q.rp + 1i * h)) / h / 2;
%!  q.T = kappa / (2 * pi);
%!  q.Omega = 4 * G * J / q.rp^2;
%!  q.S = 2 * pi * q.rp / (4 * G);
%!endfunction

%!function F = btz_F_metric (rp, rm, G, ell)
%!  M = (rp^2 + rm^2) / (8 * G * ell^2);  J = rp * rm / (4 * G * ell);
%!  q = metric_state (M, J, G, ell);
%!  F = M - q.T * q.S - q.Omega * J;
%!endfunction

%!function [M, J, G, ell] = random_state ()
%!  ell = 0.5 + 2 * rand ();
%!  G = 0.01 + 0.1 * rand ();
%!  M = 0.1 + 10 * rand ();
%!  J = (2 * rand () - 1) * 0.98 * M * ell;
%!endfunction

%!test
%! ## Temperature, angular velocity, entropy and horizon from the metric,
%! ## on the circle 2 pi ell (default) and rescaled to circumference L: the
%! ## boundary frame x = L phi/(2 pi), t' = t L/(2 pi ell) multiplies every
%! ## energy (M, T, Omega_J, F) by K = 2 pi ell/L and leaves J, S, radii and
%! ## the velocity Omega = ell Omega_H unchanged (derived in doc/).
%! rand ("seed", 7);
%! for k = 1:25
%!   [M, J, G, ell] = random_state ();
%!   q = metric_state (M, J, G, ell);
%!   th = btz_thermodynamics ("M", M, "J", J, "G", G, "ell", ell);
%!   assert (th.r_plus * ell, q.rp, 1e-10 * q.rp);
%!   assert (th.T, q.T, 1e-9 * q.T);
%!   assert (th.Omega_J, q.Omega, 1e-10 * abs (q.Omega) + 1e-14);
%!   assert (th.Omega, q.Omega * ell, 1e-10 * abs (q.Omega * ell) + 1e-14);
%!   assert (th.S, q.S, 1e-10 * q.S);
%!   assert (th.horizon_length * ell, 2 * pi * q.rp, 1e-10 * q.rp);
%!   L = 0.3 + 10 * rand ();
%!   K = 2 * pi * ell / L;
%!   t2 = btz_thermodynamics ("M", K * M, "J", J, "G", G, "ell", ell, "circumference", L);
%!   assert ([t2.T, t2.Omega_J, t2.S, t2.J, t2.r_plus, t2.Omega],
%!           [K * q.T, K * q.Omega, q.S, J, q.rp / ell, q.Omega * ell],
%!           1e-9 * max (abs ([K * q.T, K * q.Omega, q.S, J, q.rp / ell, 1])));
%!   assert (t2.F, K * th.F, 1e-10 * abs (th.F * K));
%!   assert ([t2.C_Omega, t2.C_J, t2.L0, t2.Lbar0], [th.C_Omega, th.C_J, th.L0, th.Lbar0],
%!           1e-10 * max ([th.C_Omega, th.C_J, th.L0, th.Lbar0]));
%! endfor

%!test
%! ## The mass of the metric: M = (r_+^2 + r_-^2)/(8 G ell^2),
%! ## J = r_+ r_-/(4 G ell) with r_- the inner root (BTZ 1992), here from
%! ## the roots of r^2 N^2 (a quadratic in r^2, solved with roots).
%! rand ("seed", 8);
%! for k = 1:10
%!   [M, J, G, ell] = random_state ();
%!   x = sort (roots ([1 / ell^2, -8 * G * M, 16 * G^2 * J^2]));
%!   th = btz_thermodynamics ("r_plus", sqrt (x(2)) / ell, "r_minus", sign (J) * sqrt (x(1)) / ell,
%!                            "G", G, "ell", ell);
%!   assert ([th.M, th.J], [M, J], 1e-9 * M);
%! endfor

%!test
%! ## First law dM = T dS + Omega_J dJ (Bardeen, Carter and Hawking 1973,
%! ## Commun. Math. Phys. 31, 161; from memory) by central differences
%! ## along random directions of random states, ell and circumference
%! ## random; for ell = 1, L = 2 pi, Omega_J = Omega.
%! rand ("seed", 3);
%! for k = 1:30
%!   ell = 0.5 + 2 * rand ();  L = 0.5 + 10 * rand ();  c = 1 + 100 * rand ();
%!   rp = 0.2 + 5 * rand ();  rm = (2 * rand () - 1) * 0.95 * rp;
%!   d = randn (1, 2);  h = 1e-5;
%!   o = {"c", c, "ell", ell, "circumference", L};
%!   p = btz_thermodynamics ("r_plus", rp + h * d(1), "r_minus", rm + h * d(2), o{:});
%!   m = btz_thermodynamics ("r_plus", rp - h * d(1), "r_minus", rm - h * d(2), o{:});
%!   z = btz_thermodynamics ("r_plus", rp, "r_minus", rm, o{:});
%!   dM = p.M - m.M;
%!   rhs = z.T * (p.S - m.S) + z.Omega_J * (p.J - m.J);
%!   assert (dM, rhs, 1e-7 * (abs (z.T * (p.S - m.S)) + abs (dM)));
%! endfor
%! ## In the (M, J) variables: dS/dM = 1/T, dS/dJ = -Omega/T (ell = 1, L = 2 pi).
%! M = 2.3;  J = -1.1;  h = 1e-6;  o = {"c", 30};
%! S = @(M, J) btz_thermodynamics ("M", M, "J", J, o{:}).S;
%! z = btz_thermodynamics ("M", M, "J", J, o{:});
%! assert ((S (M + h, J) - S (M - h, J)) / (2 * h), 1 / z.T, 1e-6 / z.T);
%! assert ((S (M, J + h) - S (M, J - h)) / (2 * h), -z.Omega / z.T, 1e-6 / z.T);

%!test
%! ## Smarr relation in three dimensions, M = T S/2 + Omega J: the Euler
%! ## relation of S(M, J), homogeneous of degree 1/2 (S ~ r_+, M and J
%! ## ~ r^2 at fixed ell); Smarr 1973 (PRL 30, 71) for the relation in
%! ## general, from memory.  Also F = M - T S - Omega J = -(pi c L/6)/(beta_L beta_R).
%! rand ("seed", 4);
%! rp = 0.1 + 5 * rand (1, 50);  rm = (2 * rand (1, 50) - 1) .* rp;
%! th = btz_thermodynamics ("r_plus", rp, "r_minus", rm, "c", 9, "ell", 1.5, "circumference", 4);
%! assert (th.M, th.T .* th.S / 2 + th.Omega_J .* th.J, 1e-12 * max (th.M));
%! assert (th.F, th.M - th.T .* th.S - th.Omega_J .* th.J, 1e-12 * max (th.M));
%! assert (th.F, -(pi * 9 * 4 / 6) * th.T_L .* th.T_R, 1e-12 * max (abs (th.F)));
%! th = btz_thermodynamics ("r_plus", rp, "r_minus", rm, "c", 9);
%! assert (th.M, th.T .* th.S / 2 + th.Omega .* th.J, 1e-12 * max (th.M));

%!test
%! ## Cardy formula S = 2 pi sqrt(c/6 (L0 - c/24)) + 2 pi sqrt(c/6 (Lbar0 - c/24))
%! ## (Cardy 1986, Nucl. Phys. B 270, 186), with M ell = L0 + Lbar0 - c/12 and
%! ## J = L0 - Lbar0 on the circle 2 pi ell, equals the Bekenstein-Hawking
%! ## entropy of BTZ (Strominger 1998, JHEP 02 (1998) 009).
%! rand ("seed", 5);
%! for k = 1:10
%!   [M, J, G, ell] = random_state ();
%!   c = 3 * ell / (2 * G);
%!   L0 = (M * ell + J) / 2 + c / 24;  Lb0 = (M * ell - J) / 2 + c / 24;
%!   q = metric_state (M, J, G, ell);
%!   cardy = 2 * pi * sqrt (c / 6 * (L0 - c / 24)) + 2 * pi * sqrt (c / 6 * (Lb0 - c / 24));
%!   assert (cardy, q.S, 1e-10 * q.S);
%!   th = btz_thermodynamics ("M", M, "J", J, "G", G, "ell", ell);
%!   assert ([th.L0, th.Lbar0], [L0, Lb0], 1e-12 * L0);
%!   ## on another circle the Virasoro data are the same
%!   t2 = btz_thermodynamics ("T", th.T / 3, "Omega", th.Omega, "G", G, "ell", ell,
%!                            "circumference", 6 * pi * ell);
%!   assert ([t2.L0, t2.Lbar0], [L0, Lb0], 1e-10 * L0);
%! endfor

%!test
%! ## Modular invariance (Cardy 1986): log Z_BTZ(beta_L, beta_R) equals the
%! ## vacuum log Z_AdS(L^2/beta_L, L^2/beta_R) = (2 pi/L)(c/24)(L^2/beta_L + L^2/beta_R),
%! ## with log Z = -beta F, beta = (beta_L + beta_R)/2.
%! bl = [0.3 1 2.5];  br = [0.7 1 0.9];  L = 2;  c = 6;
%! th = btz_thermodynamics ("beta_L", bl, "beta_R", br, "c", c, "circumference", L);
%! lz = (2 * pi / L) * (c / 24) * (L^2 ./ bl + L^2 ./ br);
%! assert (-(bl + br) / 2 .* th.F, lz, 1e-12 * max (lz));
%! ## and the thermal AdS saddle is the vacuum: log Z = (2 pi/L)(c/24)(beta_L + beta_R)
%! assert (-(bl + br) / 2 .* th.F_thermal_ads, (2 * pi / L) * (c / 24) * (bl + br), 1e-13);

%!test
%! ## Hawking and Page 1983 (Commun. Math. Phys. 87, 577): the transition is
%! ## where the grand potentials of BTZ and of thermal AdS cross.  Both are
%! ## built here from the metric: F_btz = M - T S - Omega_H J along a family
%! ## of fixed r_-/r_+ = Omega ell, F_ads = M_vacuum = -1/(8G) (global AdS,
%! ## J = S = 0); the root (fzero) is compared with sqrt(1 - Omega^2)/L after
%! ## rescaling to circumference L.
%! G = 0.05;  ell = 1.3;  L = 5;  K = 2 * pi * ell / L;
%! for Om = [0 0.4 -0.8 0.95]
%!   Fb = @(rp) btz_F_metric (rp, Om * rp, G, ell);
%!   rp0 = fzero (@(rp) Fb (rp) - (-1 / (8 * G)), [0.05 10] * ell);
%!   q = metric_state ((rp0^2 * (1 + Om^2)) / (8 * G * ell^2), rp0^2 * Om / (4 * G * ell), G, ell);
%!   [Thp, info] = hawking_page ("circumference", L, "Omega", Om, "G", G, "ell", ell);
%!   assert (Thp, K * q.T, 1e-8 * Thp);
%!   assert (Thp, sqrt (1 - Om^2) / L, 1e-15);
%!   assert (info.F_thermal_ads, K * (-1 / (8 * G)), 1e-12);
%!   ## BTZ dominates above, thermal AdS below; beta_L beta_R < L^2 above
%!   [~, hi] = hawking_page ("circumference", L, "Omega", Om, "T", 1.05 * Thp, "G", G, "ell", ell);
%!   [~, lo] = hawking_page ("circumference", L, "Omega", Om, "T", 0.95 * Thp, "G", G, "ell", ell);
%!   assert ({hi.saddle, lo.saddle}, {"btz", "thermal_ads"});
%!   b = 1 / (1.05 * Thp);
%!   assert (b * (1 - Om) * b * (1 + Om) < L^2);
%! endfor

%!test
%! ## The horizon is the RT surface of the whole boundary circle (Ryu and
%! ## Takayanagi 2006, PRL 96, 181602; from memory): interval_entropy (bg, L)
%! ## is the entropy S of btz_thermodynamics.
%! for s = {{0.4, 0.4, 2 * pi, 3}, {0.35, 0.65, 3, 12}, {0.2, 1.5, 7, 1.5}}
%!   [bl, br, L, c] = deal (s{1}{:});
%!   bg = ads3_background ("rotating", "circle", "beta_L", bl, "beta_R", br,
%!                         "circumference", L, "c", c, "saddle", "btz");
%!   th = btz_thermodynamics ("beta_L", bl, "beta_R", br, "circumference", L, "c", c);
%!   assert (interval_entropy (bg, L), th.S, 1e-12 * th.S);
%!   assert (bg.S_BH, th.S, 1e-12 * th.S);
%!   if (exist ("rt_entropy") == 2)
%!     assert (rt_entropy (bg, [0 L]), th.S, 1e-10 * th.S);
%!   endif
%! endfor

%!test
%! ## Heat capacities: positive, and C = T dS/dT by central differences at
%! ## fixed Omega and at fixed J.
%! rand ("seed", 6);
%! o = {"c", 24, "ell", 1.2, "circumference", 3};
%! for k = 1:20
%!   T = 0.05 + 2 * rand ();  Om = 1.9 * rand () - 0.95;  h = 1e-6 * T;
%!   th = btz_thermodynamics ("T", T, "Omega", Om, o{:});
%!   assert (th.C_Omega > 0 && th.C_J > 0);
%!   Sp = btz_thermodynamics ("T", T + h, "Omega", Om, o{:}).S;
%!   Sm = btz_thermodynamics ("T", T - h, "Omega", Om, o{:}).S;
%!   assert (th.C_Omega, T * (Sp - Sm) / (2 * h), 1e-7 * th.C_Omega);
%!   hM = 1e-6 * th.M;
%!   p = btz_thermodynamics ("M", th.M + hM, "J", th.J, o{:});
%!   m = btz_thermodynamics ("M", th.M - hM, "J", th.J, o{:});
%!   assert (th.C_J, T * (p.S - m.S) / (p.T - m.T), 1e-6 * th.C_J);
%! endfor

%!test
%! ## ads3_background picks its saddle through hawking_page and carries M, J.
%! bg = ads3_background ("rotating", "circle", "beta", 1, "Omega", 0.5, "circumference", 1.2, "c", 6);
%! [~, info] = hawking_page ("circumference", 1.2, "beta_L", bg.beta_L, "beta_R", bg.beta_R, "c", 6);
%! assert (bg.saddle, info.saddle);
%! assert (bg.bulk, "rotating_btz");
%! th = btz_thermodynamics ("beta_L", bg.beta_L, "beta_R", bg.beta_R, "circumference", 1.2, "c", 6);
%! assert ([bg.M, bg.J], [th.M, th.J], 1e-14);
%! ## just below T_hp = sqrt(1 - Omega^2)/L thermal AdS wins, with its vacuum energy
%! Th = hawking_page ("circumference", 1.2, "Omega", 0.5);
%! bg = ads3_background ("rotating", "circle", "T", 0.99 * Th, "Omega", 0.5, "circumference", 1.2, "c", 6);
%! assert (bg.bulk, "thermal_ads");
%! assert ([bg.M, bg.J], [-pi * 6 / (6 * 1.2), 0], 1e-14);
%! bg = ads3_background ("rotating", "circle", "T", 1.01 * Th, "Omega", 0.5, "circumference", 1.2, "c", 6);
%! assert (bg.bulk, "rotating_btz");
