## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## Independent checks of the time-dependent closed forms (doc/tfd_shock.md,
## doc/quench.md): geodesics of the metric integrated here with ode45,
## never the closed forms.  (The covariant one-sided lengths are checked
## against the embedding distance in tests/core/test_hrt.c, the null rays
## by quadrature in tests/core/test_causal.c.)

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

%!test
%! ## One-sided boosted (HRT) lengths from the metric ds^2 = -f dt^2 +
%! ## dr^2/f + r^2 dx^2, f = r^2 - R2: planar BTZ (R2 = (2 pi/beta)^2, a
%! ## line), global AdS (R2 = -1) and the conical defect (R2 = -alpha^2) on
%! ## a circle of circumference 2 pi.  Spacelike geodesics with conserved
%! ## E = f t', J = r^2 x' (unit speed): r'^2 = f + E^2 - f J^2/r^2, so
%! ## r'' = r - R2 J^2/r^3, integrated with ode45 from the turning point
%! ## (the larger root of (r^2 - R2)(r^2 - J^2) + E^2 r^2 = 0) to the
%! ## cutoff r_c = 1/eps + R2 eps/4 (Fefferman-Graham).  The symmetric
%! ## geodesic joins (-x, -t) to (x, t): compared with geodesic_length for
%! ## endpoints 2x apart in space and 2t in time.  Hubeny, Rangamani and
%! ## Takayanagi 2007 (JHEP 07 (2007) 062) give the closed forms holent
%! ## uses; the integration here never calls them.
%! eps = 1e-4;
%! cases = {ads3_background("thermal", "line", "beta", 1, "cutoff", eps), (2 * pi)^2, [9 0.9; 12 3];
%!          ads3_background("vacuum", "circle", "cutoff", eps), -1, [1.5 0.5; 4 2];
%!          ads3_background("heavy", "circle", "alpha", 0.6, "cutoff", eps), -0.36, [1.2 0.3; 3 1]};
%! for c = 1:rows (cases)
%!   [bg, R2, JE] = cases{c,:};
%!   rc = 1 / eps + R2 * eps / 4;
%!   for k = 1:rows (JE)
%!     J = JE(k,1);  E = JE(k,2);
%!     b = J^2 + R2 - E^2;            # r^4 - b r^2 + R2 J^2 = 0
%!     rs = sqrt ((b + sqrt (b^2 - 4 * R2 * J^2)) / 2);
%!     rhs = @(s, y) [y(2); y(1) - R2 * J^2 / y(1)^3; E / (y(1)^2 - R2); J / y(1)^2];
%!     opts = odeset ("RelTol", 1e-11, "AbsTol", 1e-12, ...
%!                    "Events", @(s, y) deal (y(1) - rc, 1, 1));
%!     [s, y] = ode45 (rhs, [0, 40], [rs; 0; 0; 0], opts);
%!     dt = 2 * y(end, 3);  dx = 2 * y(end, 4);
%!     assert (abs (y(end, 1) - rc) < 1e-6 * rc);
%!     assert (abs (dt) < abs (dx));   # spacelike on the boundary
%!     g = geodesic_length (bg, -dx / 2, dx / 2, "t1", -dt / 2, "t2", dt / 2);
%!     ## the event location of ode45 limits this to a few 1e-6
%!     assert (g, 2 * s(end), 1e-5 * g);
%!   endfor
%! endfor

%!test
%! ## Bulk null rays from the metric (doc/bulk_causality.md): in global AdS
%! ## and the conical defect, f = r^2 + alpha^2 (circumference 2 pi), a ray
%! ## with E = f t' = 1 and J = r^2 x' (|J| < 1) turns where f J^2 = r^2
%! ## and has r'' = alpha^2 J^2/r^3.  Integrated with ode45 from the
%! ## turning point out to r ~ 50 (1 + r_t) (the rest to the boundary by
%! ## quadrature), the ray sweeps 2x in angle and 2t in time; holent
%! ## must land there (bulk_light_time, tol 1e-4) at that time, and
%! ## nowhere else: the sweep is pi/alpha for every J (Gao and Wald 2000,
%! ## Class. Quant. Grav. 17, 4999: never before the boundary light).  In
%! ## BTZ (f = r^2 - R^2) a ray from the boundary with |J| < E never turns
%! ## (r'^2 = E^2 - J^2 + J^2 R^2/r^2 > 0) and reaches the horizon.
%! for alpha = [1 0.6]
%!   bg = ads3_background ("heavy", "circle", "alpha", alpha);
%!   for J = [0.2 0.7 0.95]
%!     rt = alpha * J / sqrt (1 - J^2);
%!     rhs = @(s, y) [y(2); alpha^2 * J^2 / y(1)^3; 1 / (y(1)^2 + alpha^2); J / y(1)^2];
%!     ## (a fixed span, no event: the last point is a step of ode45, not
%!     ## its interpolant)
%!     opts = odeset ("RelTol", 1e-11, "AbsTol", 1e-13);
%!     [s, y] = ode45 (rhs, [0, 50 * (1 + rt) / sqrt(1 - J^2)], [rt; 0; 0; 0], opts);
%!     ## the rest out to the boundary by quadrature (Octave's integral):
%!     ## dt/dr = t'/r', dx/dr = x'/r'
%!     rp = @(r) sqrt (1 - J^2 * (r.^2 + alpha^2) ./ r.^2);
%!     dt = 2 * (y(end, 3) + integral (@(r) 1 ./ ((r.^2 + alpha^2) .* rp (r)), y(end, 1), Inf));
%!     dx = 2 * (y(end, 4) + integral (@(r) J ./ (r.^2 .* rp (r)), y(end, 1), Inf));
%!     [tb, tl] = bulk_light_time (bg, 0, dx, "tol", 1e-4);
%!     assert (tb, dt, 1e-5);
%!     assert (tb >= tl - 1e-12);
%!     assert (bulk_light_time (bg, 0, dx + 0.01, "tol", 1e-4), Inf);
%!   endfor
%! endfor
%! R = 2 * pi;  J = 0.9;
%! rhs = @(s, y) [y(2); -J^2 * R^2 / y(1)^3];
%! opts = odeset ("RelTol", 1e-10, "Events", @(s, y) deal (y(1) - R, 1, -1));
%! [s, y] = ode45 (rhs, [0, 1e4], [1e2; -sqrt(1 - J^2 + J^2 * R^2 / 1e4)], opts);
%! assert (y(end, 1), R, 1e-8);
%! assert (bulk_light_time (ads3_background ("thermal", "circle", "beta", 1), 0, 0:0.5:3), Inf (1, 7));
