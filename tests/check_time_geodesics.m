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
