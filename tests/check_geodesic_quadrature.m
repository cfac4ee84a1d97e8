## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## Independent check of geodesic_length and interval_entropy in every AdS3
## background: the length of the boundary-anchored geodesic is computed here
## from the bulk metric alone, by quadrature (Octave's integral) of the
## geodesic equations with the conserved quantities fixed by fzero / fsolve,
## cut off where the Fefferman-Graham coordinate equals the boundary cutoff
## eps.  Derivations (metrics, FG maps, charges): doc/ads3_geodesics.md.
##
## Metrics used (ell = 1, circle rescaled to angle phi in [0, 2 pi)):
##   static:   ds^2 = -F dt^2 + dr^2/F + r^2 dphi^2,  F(r) = r^2 - up, with
##             up = 0 (Poincare, r = 1/z), -1 (global / thermal AdS),
##             r_+^2 (BTZ; Banados, Teitelboim and Zanelli 1992, PRL 69,
##             1849), -alpha^2 (conical defect);
##   rotating: ds^2 = -f dt^2 + dr^2/f + r^2 (dphi - (r_+ r_-/r^2) dt)^2,
##             f = (r^2 - r_+^2)(r^2 - r_-^2)/r^2 (Banados, Teitelboim and
##             Zanelli 1992; Hubeny, Rangamani and Takayanagi 2007, JHEP 07
##             (2007) 062 for its equal-time geodesics).
## FG coordinate zeta (dr/sqrt(f) = -dzeta/zeta, r zeta -> 1), with
## u = r^2:  u(zeta) = 1/zeta^2 + (up + um)/2 + (up - um)^2 zeta^2/16
## (static: sqrt(u) = 1/zeta + up zeta/4).  On a line zeta = eps, on a circle
## of circumference L the boundary metric is (L/2pi)^2 (-dt^2 + dphi^2), so
## z = (L/2pi) zeta and the cutoff is zeta = 2 pi eps / L.
##
## About O(eps^2): the quadrature gives the exact length of the geodesic cut
## at zeta_c; the closed forms drop the scheme-dependent terms, which are
## (zeta_c^2/2) (up + um - u_* - u_2) (u_* the turning point, u_2 the other
## root of the radial quadratic; -zeta_c^2 u_*/2 when static, see the doc).
## For the hotter states below (r_+ ~ 3 to 4) this is up to 1.6e-8 of the
## length at eps = 1e-4, above the 1e-8 asked for, so the comparisons use
## eps = 1e-5, 1e-6, 1e-7, where it is at most 2e-10; the last test checks
## the eps^2 term itself at eps = 1e-2 and 5e-3.

%!function p = q_static_dphi (up, delta)
%!  ## Opening angle of the geodesic of dr^2/F + r^2 dphi^2 (F = r^2 - up)
%!  ## with turning point r_*^2 = up + delta (delta = F(r_*) > 0).  Conserved
%!  ## r^2 dphi/ds = r_*, dr/ds = sqrt(F (1 - r_*^2/r^2)).  r = r_* cosh w
%!  ## removes the 1/sqrt endpoint singularity; sinh w = e^y spreads the
%!  ## near-horizon scale sqrt(delta)/r_* over an O(1) range of y.
%!  rs2 = up + delta;
%!  g = @(y) exp (y) ./ ((1 + exp (2 * y)) .* sqrt (delta + rs2 * exp (2 * y)));
%!  ylo = 0.5 * log (min (delta, 1) / rs2) - 40;
%!  p = 2 * integral (g, ylo, Inf, "AbsTol", 1e-14, "RelTol", 1e-13);
%!endfunction

%!function [delta, rs] = q_static_turn (up, theta)
%!  ## Turning point of the geodesic over the angle theta: fzero in log(delta).
%!  if (up > 0)
%!    br = log (up) + [-34, 40];
%!  elseif (up < 0)
%!    br = [log(-up) + 1e-10, log(-up) + 40];
%!  else
%!    br = [-60, 60];
%!  endif
%!  q = fzero (@(q) q_static_dphi (up, exp (q)) - theta, br,
%!             optimset ("TolX", 1e-15));
%!  delta = exp (q);
%!  rs = sqrt (up + delta);
%!endfunction

%!function len = q_static_len (up, delta, zeta)
%!  ## Length 2 int_{r_*}^{r_c} r dr / sqrt(F (r^2 - r_*^2)), r_c from the FG
%!  ## map: r_c^2 - up = (1/zeta - up zeta/4)^2.
%!  rs2 = up + delta;
%!  f = @(y) sqrt (rs2) * exp (y) ./ sqrt (delta + rs2 * exp (2 * y));
%!  ylo = 0.5 * log (min (delta, 1) / rs2) - 40;
%!  yc = 0.5 * log (((1 / zeta - up * zeta / 4)^2 - delta) / rs2);
%!  len = 2 * integral (f, ylo, yc, "AbsTol", 1e-13, "RelTol", 1e-13);
%!endfunction

%!function len = q_static (up, theta, zeta)
%!  ## Regulated length over angle theta (bulk units) at FG cutoff zeta.
%!  len = zeros (size (zeta));
%!  delta = q_static_turn (up, theta);
%!  for k = 1:numel (zeta)
%!    len(k) = q_static_len (up, delta, zeta(k));
%!  endfor
%!endfunction

%!function [r, len, E, J, us, u2] = q_rot_eval (rp, rm, q, theta, zeta)
%!  ## Rotating BTZ.  Conserved E = -p_t, J = p_phi; with u = r^2,
%!  ## (du/ds)^2 = 4 p(u), p = u^2 + (E^2 - up - um - J^2) u
%!  ##   + up um + J^2 (up + um) - 2 E J r_+ r_-,
%!  ## dt/ds = (E u - r_+ r_- J)/((u - up)(u - um)),
%!  ## dphi/ds = (J (u - up - um) + r_+ r_- E)/((u - up)(u - um)).
%!  ## The real turning point u_* > up exists iff P = J + E > k_+ and
%!  ## M = J - E > k_- (k_+- = r_+ +- r_-): unknowns q, P = k_+ (1 + e^q1),
%!  ## M = k_- (1 + e^q2), and every difference below is formed without
%!  ## cancellation.  Returns r = [Delta t; Delta phi - theta].
%!  kp = rp + rm;  km = rp - rm;  K = kp * km / 2;
%!  e1 = exp (q(1));  e2 = exp (q(2));
%!  P = kp * (1 + e1);  M = km * (1 + e2);
%!  E = (P - M) / 2;  J = (P + M) / 2;
%!  up = rp^2;  um = rm^2;
%!  h = sqrt (e1 * e2 * (2 + e1) * (2 + e2));
%!  g = e1 + e2 + e1 * e2 + h;
%!  us = up + K * g;                          # larger root of p
%!  a_p = K * g;  a_m = K * (2 + g);  a_2 = 2 * K * h;  # u_*-up, u_*-um, u_*-u_2
%!  u2 = us - a_2;
%!  ## u = u_* cosh^2 w, sinh w = e^y: du/(2 sqrt p) = sqrt(u_*) e^y dy/sqrt(a_2 + u_* e^2y)
%!  s2 = @(y) us * exp (2 * y);
%!  ds = @(y) sqrt (us) * exp (y) ./ sqrt (a_2 + s2 (y));
%!  den = @(y) (a_p + s2 (y)) .* (a_m + s2 (y));
%!  tdot = @(y) (E * (us + s2 (y)) - rp * rm * J) ./ den (y) .* ds (y);
%!  pdot = @(y) (J * (us + s2 (y) - up - um) + rp * rm * E) ./ den (y) .* ds (y);
%!  ylo = 0.5 * log (min (a_p, a_2) / us) - 40;
%!  o = {"AbsTol", 1e-12, "RelTol", 1e-12};
%!  r = 2 * [integral(tdot, ylo, Inf, o{:}); integral(pdot, ylo, Inf, o{:})];
%!  r(2) -= theta;
%!  len = zeros (size (zeta));
%!  for k = 1:numel (zeta)
%!    uc = 1 / zeta(k)^2 + (up + um) / 2 + (up - um)^2 * zeta(k)^2 / 16;
%!    len(k) = 2 * integral (ds, ylo, 0.5 * log ((uc - us) / us),
%!                           "AbsTol", 1e-13, "RelTol", 1e-13);
%!  endfor
%!endfunction

%!function [len, E, J, r] = q_rot (rp, rm, theta, zeta)
%!  ## Fix (E, J) by Delta t = 0 and Delta phi = theta with fsolve from the
%!  ## generic start P = 2 k_+, M = 2 k_-, then integrate the length.
%!  [q, ~, info] = fsolve (@(q) q_rot_eval (rp, rm, q, theta, []), [0; 0],
%!                         optimset ("TolFun", 1e-11, "TolX", 1e-14));
%!  assert (info >= 1);
%!  [r, len, E, J] = q_rot_eval (rp, rm, q, theta, zeta);
%!  assert (abs (r) < 1e-9);
%!endfunction

%!function q_fg_check (up, um)
%!  ## The FG map: int_{u(z2)}^{u(z1)} du/(2 sqrt((u-up)(u-um))) = log(z2/z1),
%!  ## i.e. dr/sqrt(f) = -dzeta/zeta, and r zeta -> 1.
%!  U = @(z) 1 ./ z.^2 + (up + um) / 2 + (up - um)^2 * z.^2 / 16;
%!  z1 = 1e-3;  z2 = 0.2;
%!  I = integral (@(u) 1 ./ (2 * sqrt ((u - up) .* (u - um))), U (z2), U (z1),
%!                "AbsTol", 1e-13, "RelTol", 1e-13);
%!  assert (I, log (z2 / z1), 1e-11);
%!  assert (sqrt (U (1e-7)) * 1e-7, 1, 1e-12);
%!endfunction

%!function q_close (a, b)
%!  ## 1e-8 relative, the agreement asked of every background.
%!  assert (a, b, -1e-8);
%!endfunction

%!shared eps3
%! eps3 = [1e-5, 1e-6, 1e-7];

%!test
%! ## FG maps of every metric used below.
%! q_fg_check (0, 0);             # Poincare (u = r^2 = 1/z^2)
%! q_fg_check (-1, 0);            # global / thermal AdS
%! q_fg_check (pi^2, 0);          # BTZ
%! q_fg_check (-0.36, 0);         # conical defect alpha = 0.6
%! q_fg_check (pi^2, (pi/3)^2);   # rotating BTZ

%!test
%! ## poincare.  Calabrese and Cardy 2004 (J. Stat. Mech. P06002): vacuum on a
%! ## line, S = (c/3) log(l/eps), i.e. length 2 log(l/eps).
%! for l = [0.3, 1.7, 20]
%!   qd = q_static (0, l, eps3);
%!   for k = 1:3
%!     bg = ads3_background ("vacuum", "line", "cutoff", eps3(k), "c", 9);
%!     q_close (geodesic_length (bg, 2.5, 2.5 + l), qd(k));
%!     q_close (geodesic_length (bg, 2.5 + l, 2.5), qd(k));
%!     q_close (2 * log (l / eps3(k)), qd(k));
%!     q_close (interval_entropy (bg, l), 9 / 6 * qd(k));
%!   endfor
%! endfor

%!test
%! ## global_ads, circle L = 5.  Calabrese and Cardy 2004 (J. Stat. Mech.
%! ## P06002): S = (c/3) log((L/(pi eps)) sin(pi l/L)).  In global AdS both
%! ## arcs bound the same geodesic, opening angle 2 pi min(l, L - l)/L < pi.
%! L = 5;
%! for l = [0.4, 1.3, 3.9]
%!   th = 2 * pi * min (l, L - l) / L;
%!   qd = q_static (-1, th, 2 * pi * eps3 / L);
%!   for k = 1:3
%!     bg = ads3_background ("vacuum", "circle", "circumference", L,
%!                           "cutoff", eps3(k), "c", 2);
%!     q_close (geodesic_length (bg, 1, 1 + l, "class", "positive"), qd(k));
%!     q_close (geodesic_length (bg, 1, 1 + l, "class", "negative"), qd(k));
%!     q_close (geodesic_length (bg, 1, 1 + l), qd(k));
%!     q_close (2 * log (L / (pi * eps3(k)) * sin (pi * l / L)), qd(k));
%!     q_close (interval_entropy (bg, l), qd(k) / 3);
%!   endfor
%! endfor

%!test
%! ## thermal_ads: below the Hawking-Page temperature (beta > L) the thermal
%! ## state on a circle is dual to global AdS with periodic Euclidean time; the
%! ## constant-time geodesics are those of the global AdS metric, whatever
%! ## beta (also with rotation, where the identification is twisted).
%! L = 2 * pi;  l = 2.2;
%! qd = q_static (-1, 2 * pi * l / L, eps3);
%! for k = 1:3
%!   bg = ads3_background ("thermal", "circle", "beta", 9, "cutoff", eps3(k));
%!   assert (bg.bulk, "thermal_ads");
%!   q_close (geodesic_length (bg, 0, l, "class", "negative"), qd(k));
%!   q_close (interval_entropy (bg, l), qd(k) / 6);
%!   q_close (interval_entropy (bg, L - l), qd(k) / 6);
%!   bg = ads3_background ("rotating", "circle", "beta_L", 5, "beta_R", 11,
%!                         "cutoff", eps3(k));
%!   assert (bg.bulk, "thermal_ads");
%!   q_close (geodesic_length (bg, 0, l), qd(k));
%! endfor

%!test
%! ## planar_btz, beta = 2: r_+ = 2 pi/beta (T = F'(r_+)/(4 pi)).  Calabrese
%! ## and Cardy 2004 (J. Stat. Mech. P06002), thermal line:
%! ## S = (c/3) log((beta/(pi eps)) sinh(pi l/beta)).
%! beta = 2;  up = (2 * pi / beta)^2;
%! for l = [0.3, 1.7, 6]
%!   qd = q_static (up, l, eps3);
%!   for k = 1:3
%!     bg = ads3_background ("thermal", "line", "beta", beta, "cutoff", eps3(k));
%!     q_close (geodesic_length (bg, -l, 0), qd(k));
%!     q_close (2 * log (beta / (pi * eps3(k)) * sinh (pi * l / beta)), qd(k));
%!     q_close (interval_entropy (bg, l), qd(k) / 6);
%!   endfor
%! endfor

%!test
%! ## btz on circles: both homotopy classes, the geodesic over the arc l
%! ## (angle 2 pi l/L) and the one over the other arc (angle 2 pi (L-l)/L,
%! ## round the other side of the horizon).  r_+ = L/beta for the circle
%! ## rescaled to 2 pi (Banados, Teitelboim and Zanelli 1992, PRL 69, 1849).
%! for cas = {[2*pi, 2, 1], [2*pi, 2, 2.5], [3, 1, 0.7]}
%!   L = cas{1}(1);  beta = cas{1}(2);  l = cas{1}(3);
%!   up = (L / beta)^2;  z = 2 * pi * eps3 / L;
%!   q1 = q_static (up, 2 * pi * l / L, z);
%!   q2 = q_static (up, 2 * pi * (L - l) / L, z);
%!   for k = 1:3
%!     bg = ads3_background ("thermal", "circle", "beta", beta,
%!                           "circumference", L, "cutoff", eps3(k), "c", 12);
%!     assert (bg.bulk, "btz");
%!     q_close (geodesic_length (bg, 0.3, 0.3 + l, "class", "positive"), q1(k));
%!     q_close (geodesic_length (bg, 0.3, 0.3 + l, "class", "negative"), q2(k));
%!     q_close (geodesic_length (bg, 0.3 + l, 0.3 + L, "class", "positive"), q2(k));
%!     q_close (geodesic_length (bg, 0.3, 0.3 + l), min (q1(k), q2(k)));
%!     ## Homology constraint with the horizon entropy computed separately
%!     ## (next test): S = (c/6) min(len(l), len(L - l) + 2 pi r_+).
%!     q_close (interval_entropy (bg, l), 2 * min (q1(k), q2(k) + 2 * pi * L / beta));
%!   endfor
%! endfor

%!test
%! ## S_BH from the metric.  Horizon: largest zero of f (fzero); its length
%! ## int_0^{2 pi} sqrt(g_phiphi(r_h)) dphi (integral) in units of ell, and
%! ## S = ell Length/(4G) (Bekenstein-Hawking).  The metric parameters come
%! ## from the state through its Hawking temperature f'(r_h)/(4 pi) (complex
%! ## step derivative) rescaled by 2 pi/L, and horizon angular velocity
%! ## r_+ r_-/r_h^2, which must equal 1/beta = 2/(beta_L + beta_R) and Omega.
%! ## Compared with Cardy (Cardy 1986, Nucl. Phys. B 270, 186; from memory):
%! ## S = (pi c/6) L (1/beta_L + 1/beta_R), with c = 3 ell/(2G) (Brown and
%! ## Henneaux 1986, Commun. Math. Phys. 104, 207).
%! G = 0.05;  ell = 2;
%! for cas = {[2*pi, 1.5, 3], [3, 1, 1], [4, 2.5, 0.9]}
%!   L = cas{1}(1);  bl = cas{1}(2);  br = cas{1}(3);
%!   bg = ads3_background ("rotating", "circle", "beta_L", bl, "beta_R", br,
%!                         "circumference", L, "G", G, "ell", ell);
%!   assert (bg.c, 3 * ell / (2 * G), -1e-14);
%!   rp = (L / 2) * (1 / bl + 1 / br);  rm = (L / 2) * (1 / bl - 1 / br);
%!   assert ([bg.r_plus, bg.r_minus], [rp, rm], -1e-14);
%!   f = @(r) (r.^2 - rp^2) .* (r.^2 - rm^2) ./ r.^2;
%!   rh = fzero (f, [(abs(rm) + rp) / 2, 10 * rp]);   # between |r_-| and r_+, then above
%!   fp = imag (f (rh + 1i * 1e-20)) / 1e-20;
%!   assert (L / (2 * pi) * 4 * pi / fp, (bl + br) / 2, -1e-12);
%!   assert (rp * rm / rh^2, bg.Omega, 1e-12);
%!   len = integral (@(p) sqrt (rh^2 * ones (size (p))), 0, 2 * pi);
%!   S = ell * len / (4 * G);
%!   assert (bg.S_BH, S, -1e-12);
%!   assert (pi * bg.c / 6 * L * (1 / bl + 1 / br), S, -1e-12);
%! endfor
%! ## Planar: entropy per unit length r_h ell/(4G) = pi c T/3 (thermal
%! ## entropy density of a 2D CFT; Cardy 1986, from memory).
%! bg = ads3_background ("thermal", "line", "T", 0.7, "G", G, "ell", ell);
%! rh = fzero (@(r) r.^2 - bg.r_plus^2, [0.5, 2] * bg.r_plus);
%! assert (1 / (imag ((rh + 1i * 1e-20)^2 - bg.r_plus^2) / 1e-20 / (4 * pi)), 1 / 0.7, -1e-12);
%! assert (bg.entropy_density, rh * ell / (4 * G), -1e-12);
%! assert (bg.entropy_density, pi * bg.c * 0.7 / 3, -1e-12);

%!test
%! ## rotating_btz: the equal-time geodesic leaves the constant-t slice;
%! ## (E, J) fixed by Delta t = 0 and Delta phi = theta (fsolve on the
%! ## quadratures).  Hubeny, Rangamani and Takayanagi 2007 (JHEP 07 (2007)
%! ## 062): S = (c/6) log((beta_L beta_R/(pi^2 eps^2)) sinh(pi l/beta_L)
%! ## sinh(pi l/beta_R)).  Both classes; Omega > 0 and Omega < 0.
%! for cas = {[2*pi, 1.5, 3, 1.5], [4, 2.5, 0.9, 1.2]}
%!   L = cas{1}(1);  bl = cas{1}(2);  br = cas{1}(3);  l = cas{1}(4);
%!   rp = (L / 2) * (1 / bl + 1 / br);  rm = (L / 2) * (1 / bl - 1 / br);
%!   z = 2 * pi * eps3 / L;
%!   [q1, E, J] = q_rot (rp, rm, 2 * pi * l / L, z);
%!   assert (abs (E) > 0.1);           # E = 0 would give Delta t != 0
%!   q2 = q_rot (rp, rm, 2 * pi * (L - l) / L, z);
%!   hrt = @(a, e) log (bl * br / (pi^2 * e^2) * sinh (pi * a / bl) * sinh (pi * a / br));
%!   for k = 1:3
%!     bg = ads3_background ("rotating", "circle", "beta_L", bl, "beta_R", br,
%!                           "circumference", L, "cutoff", eps3(k), "c", 3);
%!     assert (bg.bulk, "rotating_btz");
%!     q_close (geodesic_length (bg, 0, l, "class", "positive"), q1(k));
%!     q_close (geodesic_length (bg, 0, l, "class", "negative"), q2(k));
%!     q_close (hrt (l, eps3(k)), q1(k));
%!     q_close (hrt (L - l, eps3(k)), q2(k));
%!     Sh = 2 * pi * rp / 2;               # (c/6) * horizon length, c = 3
%!     q_close (interval_entropy (bg, l), min (q1(k), q2(k) + 2 * pi * rp) / 2);
%!     q_close (bg.S_BH, Sh);
%!   endfor
%! endfor

%!test
%! ## planar_rotating_btz on a line: r_+- = pi (1/beta_L +- 1/beta_R), x = phi.
%! ## Hubeny, Rangamani and Takayanagi 2007 (JHEP 07 (2007) 062).
%! bl = 1.2;  br = 2.5;
%! rp = pi * (1 / bl + 1 / br);  rm = pi * (1 / bl - 1 / br);
%! for l = [0.4, 2]
%!   qd = q_rot (rp, rm, l, eps3);
%!   for k = 1:3
%!     bg = ads3_background ("rotating", "line", "beta_L", bl, "beta_R", br,
%!                           "cutoff", eps3(k), "c", 6);
%!     assert (bg.bulk, "planar_rotating_btz");
%!     q_close (geodesic_length (bg, 1, 1 + l), qd(k));
%!     q_close (interval_entropy (bg, l), qd(k));
%!     q_close (log (bl * br / (pi * eps3(k))^2 * sinh (pi * l / bl) * sinh (pi * l / br)), qd(k));
%!   endfor
%! endfor

%!test
%! ## Rotating charges against the embedding-space result of the doc
%! ## (E, J) = ((k_+ coth(k_+ theta/2) -+ k_- coth(k_- theta/2))/2), and the
%! ## non-rotating limit of the rotating integrator reproduces the static one.
%! rp = pi;  rm = pi / 3;  th = 1.5;
%! [~, E, J] = q_rot (rp, rm, th, []);
%! cp = (rp + rm) * coth ((rp + rm) * th / 2);  cm = (rp - rm) * coth ((rp - rm) * th / 2);
%! assert ([E, J], [cp - cm, cp + cm] / 2, -1e-9);
%! a = q_rot (2, 0, 1.1, [1e-3, 1e-5]);
%! b = q_static (4, 1.1, [1e-3, 1e-5]);
%! assert (a, b, -1e-10);

%!test
%! ## conical_defect (heavy state), alpha < 1: F = r^2 + alpha^2.  Geodesics on
%! ## both sides of the defect (class positive: arc l; negative: arc L - l),
%! ## each with pi alpha arc/L < pi/2.  The closed form (conical defect,
%! ## e.g. Asplund, Bernamonti, Galli and Hartman 2015, JHEP 02 (2015) 171,
%! ## from memory): 2 log((L/(pi alpha eps)) sin(pi alpha l/L)).
%! for cas = {[2*pi, 0.6, 1.9], [5, 0.35, 1]}
%!   L = cas{1}(1);  al = cas{1}(2);  l = cas{1}(3);
%!   assert (pi * al * max (l, L - l) / L < pi / 2);
%!   z = 2 * pi * eps3 / L;
%!   q1 = q_static (-al^2, 2 * pi * l / L, z);
%!   q2 = q_static (-al^2, 2 * pi * (L - l) / L, z);
%!   for k = 1:3
%!     bg = ads3_background ("heavy", "circle", "alpha", al, "circumference", L,
%!                           "cutoff", eps3(k), "c", 24);
%!     q_close (geodesic_length (bg, 0, l, "class", "positive"), q1(k));
%!     q_close (geodesic_length (bg, 0, l, "class", "negative"), q2(k));
%!     q_close (2 * log (L / (pi * al * eps3(k)) * sin (pi * al * l / L)), q1(k));
%!     q_close (interval_entropy (bg, l), 4 * min (q1(k), q2(k)));
%!   endfor
%! endfor

%!test
%! ## Defect cap.  The opening angle of a geodesic tends to pi/alpha as its
%! ## turning point goes to the apex (no geodesic on one side spans more);
%! ## beyond, the infimum over the class is the path through the apex, twice
%! ## the radial length int_0^{r_c} dr/sqrt(r^2 + alpha^2).
%! al = 0.8;  L = 2 * pi;  e = 1e-5;
%! assert (q_static_dphi (-al^2, al^2 * (1 + 1e-12)), pi / al, 1e-5);
%! z = 2 * pi * e / L;  rc = 1 / z - al^2 * z / 4;
%! apex = 2 * integral (@(r) 1 ./ sqrt (r.^2 + al^2), 0, rc, "AbsTol", 1e-13, "RelTol", 1e-13);
%! bg = ads3_background ("heavy", "circle", "alpha", al, "cutoff", e);
%! l = 0.8 * L;                          # pi alpha l / L = 0.64 pi > pi/2
%! q_close (geodesic_length (bg, 0, l, "class", "positive"), apex);
%! ## just below the cap the geodesic exists and approaches the same value
%! lc = L / (2 * al) * (1 - 1e-4);
%! q_close (geodesic_length (bg, 0, lc, "class", "positive"), q_static (-al^2, 2 * pi * lc / L, z));
%! assert (abs (q_static (-al^2, 2 * pi * lc / L, z) - apex) < 1e-6);

%!test
%! ## Entanglement plateau on the BTZ circle (Hubeny, Maxfield, Rangamani and
%! ## Tonni 2013, JHEP 08 (2013) 092; from memory): the complement plus the
%! ## horizon wins once L - l < a, where len(L - a) = len(a) + 2 pi r_+.  From
%! ## the quadrature lengths (eps = 1e-6, so O(eps^2) is negligible)
%! ## a = (beta/2pi) log(2/(1 + exp(-2 pi L/beta))) (doc), which tends to
%! ## beta log(2)/(2 pi) for L >> beta; near the Hawking-Page point the
%! ## difference is visible (beta = 5, L = 2 pi: 3e-4).
%! L = 2 * pi;  e = 1e-6;
%! for beta = [2, 5]
%!   up = (L / beta)^2;
%!   g = @(a) q_static (up, 2 * pi * (L - a) / L, e) ...
%!            - q_static (up, 2 * pi * a / L, e) - 2 * pi * sqrt (up);
%!   a = fzero (g, [0.05, 0.2] * beta, optimset ("TolX", 1e-13));
%!   assert (a, beta / (2 * pi) * log (2 / (1 + exp (-2 * pi * L / beta))), 1e-9);
%!   bg = ads3_background ("thermal", "circle", "beta", beta, "cutoff", e);
%!   [~, b] = interval_entropy (bg, L - a + [-1e-6, 1e-6]);
%!   assert (b, [false, true]);
%! endfor
%! assert (abs (a - beta * log (2) / (2 * pi)) > 2e-4);

%!test
%! ## The dropped terms are O(eps^2) and scheme dependent: at larger cutoffs
%! ## the exact FG-cut length minus the closed form is
%! ## (zeta^2/2)(up + um - u_* - u_2) + O(zeta^4) (doc/ads3_geodesics.md).
%! L = 2 * pi;  beta = 2;  l = 1;  up = (L / beta)^2;
%! bg = ads3_background ("thermal", "circle", "beta", beta, "cutoff", 1e-6);
%! z = [1e-2, 5e-3];
%! delta = q_static_turn (up, 2 * pi * l / L);
%! for k = 1:2
%!   d = q_static_len (up, delta, z(k)) - (geodesic_length (bg, 0, l) + 2 * log (1e-6 / z(k)));
%!   assert (d, -(z(k)^2 / 2) * (up + delta), 1e-3 * z(k)^2 * (up + delta));
%! endfor
%! rp = pi;  rm = pi / 3;  th = 1.5;  z = 1e-2;
%! q = fsolve (@(q) q_rot_eval (rp, rm, q, th, []), [0; 0], optimset ("TolFun", 1e-11));
%! [~, len, ~, ~, us, u2] = q_rot_eval (rp, rm, q, th, z);
%! kp = rp + rm;  km = rp - rm;
%! hrt = log (4 / (z^2 * kp * km) * sinh (kp * th / 2) * sinh (km * th / 2));
%! assert (len - hrt, (z^2 / 2) * (rp^2 + rm^2 - us - u2), 2e-3 * z^2 * us);
