## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## Independent checks of the time-dependent closed forms (doc/hrt_time.md,
## doc/tfd_shock.md, doc/quench.md, doc/bulk_causality.md): geodesics of
## each metric integrated here with ode45, never the closed forms.
##
## Boosted geodesics (q_half): the rotating BTZ family
##   ds^2 = -f dt^2 + dr^2/f + r^2 (dphi - w dt)^2,
##   f = (r^2 - up)(r^2 - um)/r^2, w = r_+ r_-/r^2,
## with up = r_+^2 (or -1 for global AdS, -alpha^2 for the defect: w = 0),
## um = r_-^2.  E = -p_t and J = p_phi are conserved; then
##   dt/ds = (E - J w)/f, dphi/ds = J/r^2 + w (E - J w)/f,
##   (dr/ds)^2 = V = f (1 - J^2/r^2) + (E - J w)^2,
## and ode45 integrates r'' = V'(r)/2 (V' written out) with t and phi from
## the turning point V(r_*) = 0, where the geodesic is symmetric
## ((t, phi, s) -> (-t, -phi, -s) is an isometry): dt = 2 t(s_c),
## dphi = 2 phi(s_c), length 2 s_c.  The last stretch to the
## Fefferman-Graham cutoff r_c (doc/ads3_geodesics.md section 1), where r
## grows like e^s, is added by quadrature in log r.  Chosen (E, J) give
## (dt, dphi), and geodesic_length at those separations must agree.

%!function [dt, dphi, len] = q_half (up, um, E, J, rc)
%!   rp = sign (up) * sqrt (abs (up)); rm = sqrt (um); K = J * rp * rm;
%!   V = @(u) (u - up) .* (u - um) .* (u - J^2) ./ u.^2 + (E - K ./ u).^2;
%!   r = rc;
%!   while (V (r^2) > 0 && r > 1e-8)
%!     r /= 1.5;
%!   endwhile
%!   rs = sqrt (fzero (V, [r^2, (1.5 * r)^2], optimset ("TolX", 1e-16 * r^2)));
%!   S = log (2e3 / rs);
%!   opts = odeset ("RelTol", 1e-10, "AbsTol", 1e-12);
%!   [s, y] = ode45 (@(s, y) q_rhs (y, up, um, E, J, K, rp, rm), [0, S], [0; 0; rs; 0], opts);
%!   r1 = y(end, 3);
%!   sq = @(r) sqrt (V (r.^2));
%!   ## the tail to the cutoff by quadrature in log r (smooth there)
%!   g = @(h, q) integral (@(x) h (r1 * exp (x)) .* r1 .* exp (x) ./ sq (r1 * exp (x)),
%!                         0, log (rc / r1), "RelTol", 1e-13, "AbsTol", q);
%!   tail = g (@(r) ones (size (r)), 1e-13);
%!   fr = @(r) (r.^2 - up) .* (r.^2 - um) ./ r.^2;
%!   wr = @(r) rp * rm ./ r.^2;
%!   tt = g (@(r) (E - J * wr (r)) ./ fr (r), 1e-16);
%!   tp = g (@(r) J ./ r.^2 + wr (r) .* (E - J * wr (r)) ./ fr (r), 1e-16);
%!   dt = 2 * (y(end, 1) + tt);  dphi = 2 * (y(end, 2) + tp);  len = 2 * (s(end) + tail);
%!endfunction

%!function v = q_vels (r, up, um, E, J, K, rp, rm)
%!   u = r .* r;  f = (u - up) .* (u - um) ./ u;  w = rp * rm ./ u;  a = E - J * w;
%!   v = [a ./ f; J ./ u + w .* a ./ f];
%!endfunction

%!function dy = q_rhs (y, up, um, E, J, K, rp, rm)
%!   r = y(3); u = r * r;
%!   N = (u - up) * (u - um) * (u - J^2);
%!   dA = ((u - um) * (u - J^2) + (u - up) * (u - J^2) + (u - up) * (u - um)) / u^2 - 2 * N / u^3;
%!   dB = 2 * (E - K / u) * K / u^2;
%!   dy = [q_vels(r, up, um, E, J, K, rp, rm); y(4); r * (dA + dB)];
%!endfunction

%!function [ok, msg] = q_cmp (bg, up, um, E, J, zc, scale, tol)
%!  rc = sqrt (1 / zc^2 + (up + um) / 2 + (up - um)^2 * zc^2 / 16);
%!  [dt, dphi, len] = q_half (up, um, E, J, rc);
%!  ## bulk angle/time -> boundary units (scale = L/(2 pi) on a circle)
%!  g = geodesic_length (bg, 0, dphi * scale, "t2", dt * scale, "class", "positive");
%!  ok = abs (g - len) < tol * len;
%!  msg = sprintf ("E %g J %g: ode45 %.12g, closed form %.12g", E, J, len, g);
%!endfunction

%!test
%! ## Vacuum line (Poincare): Hubeny, Rangamani and Takayanagi 2007,
%! ## len = log((dx^2 - dt^2)/eps^2).
%! eps = 1e-6;
%! bg = ads3_background ("vacuum", "line", "cutoff", eps);
%! for EJ = [0.3 1.5; -0.5 1.2]'
%!   [ok, msg] = q_cmp (bg, 0, 0, EJ(1), EJ(2), eps, 1, 1e-9);
%!   assert (ok, msg);
%! endfor

%!test
%! ## Thermal line (planar BTZ, beta = 1.3).
%! eps = 1e-6;  beta = 1.3;  R = 2 * pi / beta;
%! bg = ads3_background ("thermal", "line", "beta", beta, "cutoff", eps);
%! for EJ = [0.3 8; -2 7]'
%!   [ok, msg] = q_cmp (bg, R^2, 0, EJ(1), EJ(2), eps, 1, 1e-9);
%!   assert (ok, msg);
%! endfor

%!test
%! ## Rotating BTZ on a line: the check that decides beta_L with x - t
%! ## (doc/hrt_time.md): the other assignment misses by ~0.1.
%! eps = 1e-6;  bl = 0.8;  br = 1.3;
%! bg = ads3_background ("rotating", "line", "beta_L", bl, "beta_R", br, "cutoff", eps);
%! rp = pi * (1 / bl + 1 / br);  rm = pi * (1 / bl - 1 / br);
%! for EJ = [0.5 8; -0.5 8; 2 9]'
%!   [ok, msg] = q_cmp (bg, rp^2, rm^2, EJ(1), EJ(2), eps, 1, 1e-9);
%!   assert (ok, msg);
%! endfor

%!test
%! ## Circles of circumference L = 5: global AdS, the conical defect
%! ## (alpha = 0.6), BTZ (beta = 1, R = L/beta) and rotating BTZ.
%! eps = 1e-6;  L = 5;  sc = L / (2 * pi);  zc = eps / sc;
%! bg = ads3_background ("vacuum", "circle", "circumference", L, "cutoff", eps);
%! [ok, msg] = q_cmp (bg, -1, 0, 0.3, 1.5, zc, sc, 1e-9);  assert (ok, msg);
%! bg = ads3_background ("heavy", "circle", "alpha", 0.6, "circumference", L, "cutoff", eps);
%! [ok, msg] = q_cmp (bg, -0.36, 0, -0.2, 1.0, zc, sc, 1e-9);  assert (ok, msg);
%! bg = ads3_background ("thermal", "circle", "beta", 1, "circumference", L, "cutoff", eps);
%! [ok, msg] = q_cmp (bg, 25, 0, 1, 12, zc, sc, 1e-9);  assert (ok, msg);
%! bg = ads3_background ("rotating", "circle", "beta_L", 0.8, "beta_R", 1.3, "circumference", L, "cutoff", eps);
%! rp = L / 2 * (1 / 0.8 + 1 / 1.3);  rm = L / 2 * (1 / 0.8 - 1 / 1.3);
%! [ok, msg] = q_cmp (bg, rp^2, rm^2, 0.7, 9, zc, sc, 1e-9);  assert (ok, msg);

%!test
%! ## Thermofield double, through the bridge, in ingoing Eddington-
%! ## Finkelstein coordinates (v = t + r_*, r_* = log|(r - R)/(r + R)|/(2R),
%! ## valid inside the horizon): the symmetric geodesic with energy E turns
%! ## at r_* < R where E^2 + f = 0, on v = r_*(r_*) (left-right symmetry),
%! ## with dr/ds = 0 and dv/ds = 1/E (towards the right side).  Equations of -f dv^2 + 2 dv dr:
%! ## v'' = -(f_r/2) v'^2, r'' = f v'' + f_r r' v'.  t = v - r_*(r_c) at the
%! ## cutoff; the length is twice the half.  Compared with the two-sided
%! ## closed form (Hartman and Maldacena 2013: 2 log((beta/(pi eps))
%! ## cosh(2 pi t/beta))).
%! eps = 1e-5;  beta = 1;  R = 2 * pi / beta;
%! bg = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps);
%! rc = 1 / eps + R^2 * eps / 4;
%! rst = @(r) log (abs ((r - R) ./ (r + R))) / (2 * R);
%! f = @(r) r.^2 - R^2;
%! for rs = [0.3, 0.7, 0.95] * R
%!   E = sqrt (R^2 - rs^2);
%!   rhs = @(s, y) [y(3); y(4); -y(2) * y(3)^2; ...
%!                  f(y(2)) * (-y(2) * y(3)^2) + 2 * y(2) * y(4) * y(3)];
%!   opts = odeset ("RelTol", 1e-11, "AbsTol", 1e-12, "Events", @(s, y) deal (y(2) - rc, 1, 0));
%!   [s, y] = ode45 (rhs, [0, 40], [rst(rs); rs; 1 / E; 0], opts);
%!   t = y(end, 1) - rst (y(end, 2));
%!   len = 2 * s(end);
%!   g = geodesic_length (bg, 0, 0, "side1", "left", "t1", t, "t2", t);
%!   ## (the event location of ode45 limits this to a few 1e-6)
%!   assert (g, len, 2e-5 * len);
%! endfor

%!test
%! ## Global quench through a smoothed shell: ds^2 = -F dv^2 + 2 dv dr +
%! ## r^2 dx^2, F = r^2 - R^2 (1 + tanh(v/d))/2.  The symmetric geodesic
%! ## from a chosen tip (v_*, r_*) (v' = r' = 0, x' = 1/r_*), equations
%! ## v'' = -(F_r/2) v'^2 + r x'^2, r'' = F v'' + F_r r' v' + (F_v/2) v'^2,
%! ## x' = r_*/r^2, gives at the cutoff l = 2 x and t = v + 1/r (r_* ~ -1/r
%! ## there).  The thin-shell closed form (Balasubramanian et al. 2011,
%! ## PRD 84, 026010; doc/quench.md) is the limit d -> 0: the difference
%! ## shrinks with d (4e-4 at d = 0.02, 2e-5 at d = 0.005).
%! eps = 1e-3;  beta = 1;  R = 2 * pi / beta;  rc = 1 / eps;
%! bg = ads3_background ("quench", "line", "beta", beta, "cutoff", eps);
%! for vs = [-0.3, -0.25]   # tips in the vacuum: the geodesic crosses the shell
%!   err = [];
%!   for d = [0.02, 0.005]
%!     rhs = @(s, y) q_vrhs (y, R, d, 2.2);
%!     opts = odeset ("RelTol", 1e-9, "AbsTol", 1e-11, "Events", @(s, y) deal (y(2) - rc, 1, 0));
%!     [s, y] = ode45 (rhs, [0, 30], [vs; 2.2; 0; 0; 0], opts);
%!     l = 2 * y(end, 5);  t = y(end, 1) + 1 / y(end, 2);
%!     assert (t > 0 && t < l / 2);   # a crossing geodesic
%!     g = geodesic_length (bg, 0, l, "t", t);
%!     err(end+1) = abs (g - 2 * s(end)) / g;
%!   endfor
%!   assert (err(2) < err(1) / 4);
%!   assert (err(2) < 1e-4);
%! endfor

%!function dy = q_vrhs (y, R, d, J)
%!  v = y(1); r = y(2); vp = y(3); rp = y(4);
%!  F = r^2 - R^2 * (1 + tanh (v / d)) / 2;
%!  Fv = -R^2 / (2 * d) * sech (v / d)^2;
%!  xp = J / r^2;
%!  vpp = -r * vp^2 + r * xp^2;
%!  rpp = F * vpp + 2 * r * rp * vp + Fv / 2 * vp^2;
%!  dy = [vp; rp; vpp; rpp; xp];
%!endfunction

%!test
%! ## Null rays in the conical defect (f = r^2 + alpha^2, E = 1, J < 1) in
%! ## u = 1/r against the angle: u'' = -alpha^2 u, dt/dphi = 1/(J (1 +
%! ## alpha^2 u^2)), from the boundary (u = 0) back to it: every ray sweeps
%! ## pi/alpha in angle and in time, so bulk_light_time lands at
%! ## x1 + L/(2 alpha) at t = L/(2 alpha), after the boundary light (Gao and
%! ## Wald 2000, Class. Quant. Grav. 17, 4999).
%! L = 6;  alpha = 0.7;
%! bg = ads3_background ("heavy", "circle", "alpha", alpha, "circumference", L);
%! for J = [0.3, 0.8]
%!   rhs = @(p, y) [y(2); -alpha^2 * y(1); 1 / (J * (1 + alpha^2 * y(1)^2))];
%!   u0p = sqrt (1 - J^2) / J;
%!   opts = odeset ("RelTol", 1e-12, "AbsTol", 1e-13, "Events", @(p, y) deal (y(1), 1, -1));
%!   [p, y] = ode45 (rhs, [1e-9, 20], [u0p * 1e-9; u0p; 1e-9 / J], opts);
%!   assert (p(end), pi / alpha, 1e-8);
%!   assert (y(end, 3), pi / alpha, 1e-8);
%!   [tb, tl] = bulk_light_time (bg, 0, p(end) * L / (2 * pi));
%!   assert (tb, y(end, 3) * L / (2 * pi), 1e-8);
%!   assert (tb >= tl);
%! endfor
