## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Cross-checks of ball_entropy for balls much larger than the horizon
## depth zh of a black brane, where the tip sits exponentially close to the
## horizon (zh - z_tip ~ exp(-2 k R), k = sqrt(d (d-1)/2)/zh) and the
## surface hugs the horizon before rising to the boundary
## (doc/higher_dimensional.md, "Large balls").

%!function dy = __hug__ (lam, y, d)
%! ## Near the horizon, independent variable lam = log(u), u = zh - z (zh = 1),
%! ## state (r, theta, A) with theta the tangent angle of the profile in
%! ## dr^2 + dz^2/f (dr/ds = cos(theta), dz/ds = sqrt(f) sin(theta)) and A the
%! ## area per ell^(d-1) Omega_{d-2} minus the hemisphere's element
%! ## sin^(d-2)(phi) cos^(1-d)(phi) dphi, phi = atan(r/z).  Curvature of a
%! ## geodesic of the weight r^(d-2) z^(1-d) (common practice, derived in doc/):
%! ## dtheta/ds = -(d-2) sin(theta)/r - (d-1) sqrt(f) cos(theta)/z.
%! ## f = u (1 + z + ... + z^(d-1)) keeps every digit of u.
%! r = y(1);  th = y(2);  u = exp (lam);  z = 1 - u;
%! S = polyval (ones (1, d), z);  sf = sqrt (u * S);
%! k = -(d-2) * sin (th) / r - (d-1) * sf * cos (th) / z;
%! drl = -1 / (sqrt (S / u) * tan (th));            # dr/dlam
%! dA = r^(d-2) * z^(1-d) * (1 - (z*cos (th) - r*sf*sin (th)) / hypot (r, z)) / cos (th);
%! dy = [1; k / cos(th); dA] * drl;
%!endfunction

%!function dy = __polar__ (t, y, d)
%! ## From u = 1/2 to the boundary: polar coordinates z = rho cos(phi),
%! ## r = rho sin(phi) against t = log(tan(phi)), state (rho, theta, A);
%! ## ds/dphi = rho/D, D = cos(phi) cos(theta) - sin(phi) sqrt(f) sin(theta),
%! ## and 1 - D written without cancellation through psi = theta + phi.
%! ph = atan (exp (t));  sp = sin (ph);  cp = cos (ph);
%! rho = y(1);  th = y(2);  r = rho * sp;  z = rho * cp;
%! om = z^d / (1 + sqrt (1 - z^d));  sf = 1 - om;    # 1 - sqrt(f)
%! psi = th + ph;
%! D = cos (psi) + om * sp * sin (th);
%! omD = 2 * sin (psi / 2)^2 - om * sp * sin (th);
%! k = -(d-2) * sin (th) / r - (d-1) * sf * cos (th) / z;
%! dy = [rho * (sp*cos(th) + cp*sf*sin(th)); rho * k; sp^(d-2) * cp^(1-d) * omD] * sp * cp / D;
%!endfunction

%!function [R, A] = __shoot__ (d, u0)
%! ## Octave ode45 shooting from a tip at zh - z = u0 (series start at r0:
%! ## theta = -sqrt(f0) r0/z0, u = u0 + f0 r0^2/(2 z0)); returns the radius
%! ## and the excess area per ell^(d-1) Omega_{d-2}.
%! r0 = 1e-4;  z0 = 1 - u0;  f0 = u0 * polyval (ones (1, d), z0);
%! o = odeset ("RelTol", 1e-12, "AbsTol", [1e-14; 1e-300; 1e-10]);
%! [l, y] = ode45 (@(l, y) __hug__ (l, y, d), [log(u0) + f0*r0^2/(2*z0*u0), log(0.5)], ...
%!                 [r0; -sqrt(f0)*r0/z0; 0], o);
%! z = 1 - exp (l(end));  r = y(end, 1);
%! o = odeset ("RelTol", 1e-12, "AbsTol", 1e-14);
%! [~, p] = ode45 (@(t, y) __polar__ (t, y, d), [log(r / z), 12], [hypot(r, z); y(end, 2:3).'], o);
%! R = p(end, 1);  A = p(end, 3);   # cos(phi) = 6e-6: the O(z^d) rest is far below 1e-12
%!endfunction

%!test
%! ## Large balls of the brane (tips 1e-20 to 1e-24 zh from the horizon:
%! ## R = 14, 11, 8.7 zh, beyond the 5.6, 4.35, 3.2 zh the shooting in z
%! ## reached) against the independent ode45 shooting above, in other
%! ## variables (r, theta against log(zh - z), a hand-over at u = zh/2):
%! ## delta = ell^(d-1) Omega_{d-2} A/(4G).  ode45 at RelTol 1e-12 agrees to
%! ## a few 1e-9 (at 1e-13 the d = 6 difference falls to 6e-10).
%! for d = [3 4 6]
%!   [R, A] = __shoot__ (d, 10^(-max (20, 4*d)));
%!   bg = ads_background (d, "black_brane", "zh", 1, "G", 0.3, "ell", 1.1);
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   [~, info] = ball_entropy (bg, R);
%!   assert (info.delta, 1.1^(d-1) * Om * A / 1.2, 1e-8 * info.delta);
%!   assert (R > 8.5);
%! endfor

%!test
%! ## Volume law with its area correction (derived in doc/higher_dimensional.md):
%! ## for R >> zh the surface runs along the horizon (area s Vol(ball), s the
%! ## entropy density) and joins the boundary through a wall of the shape of
%! ## the wide strip's, so
%! ##   delta = s Omega_{d-2} R^(d-1)/(d-1) + sigma Omega_{d-2} R^(d-2) (1 + O(zh/R)),
%! ##   sigma = (ell^(d-1)/(4G zh^(d-2))) [int_0^1 u^(1-d) (sqrt((1 - u^(2d-2))/f(zh u)) - 1) du - 1/(d-2)]
%! ## (the strip's A_fin - s l per wall; vacuum finite parts are R-independent
%! ## constants).  sigma by Octave's integral; the O(1/R) terms are removed by a
%! ## least-squares fit in 1/R, plus for even d a log(R/zh) term at order R^0:
%! ## the vacuum's universal c_n log(R/eps) has its scale R replaced by zh in the
%! ## wide ball (the wall's near-boundary region is cut off at the horizon), so
%! ## delta contains -(ell^(d-1) Omega_{d-2}/4G) c_n log(R/zh), c_4 = -1/2
%! ## (derived in doc/; its coefficient is checked for d = 4).
%! for d = 3:6
%!   zh = 0.7;  G = 0.3;
%!   bg = ads_background (d, "black_brane", "zh", zh, "G", G);
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   x = [10 13 16 20 25 30 35 40];  R = zh * x;
%!   [~, info] = ball_entropy (bg, R);
%!   assert (info.reach > 20 * zh);
%!   ## integrand without cancellation: with a = 1 + ... + u^(2d-3),
%!   ## b = 1 + ... + u^(d-1) (so (1 - u^(2d-2))/f(zh u) = a/b) and
%!   ## c = u + ... + u^(d-2) = u^(1-d) (a - b):  u^(1-d) (sqrt(a/b) - 1) = c/(b (q + 1))
%!   c = @(u) polyval ([ones(1, d-2), 0], u);  b = @(u) polyval (ones (1, d), u);
%!   q = @(u) sqrt (1 + u.^(d-1) .* c (u) ./ b (u));
%!   sig = (integral (@(u) c (u) ./ (b (u) .* (q (u) + 1)), 0, 1, "RelTol", 1e-13, "AbsTol", 0) ...
%!          - 1/(d-2)) / (4 * G * zh^(d-2));
%!   s = bg.entropy_density;
%!   assert (s, 1 / (4 * G * zh^(d-1)), 1e-14);
%!   y = (info.delta - s * Om * R.^(d-1) / (d-1)) ./ (Om * R.^(d-2));
%!   M = [ones(size(x)); 1./x; 1./x.^2; 1./x.^3].';
%!   if (mod (d, 2) == 0)
%!     M = [M, log(x).'./x.'.^(d-2)];
%!   endif
%!   c = M \ y(:);
%!   assert (c(1), sig, 1e-4 * abs (sig));
%!   if (d == 4)
%!     assert (c(end), 0.5 / (4 * G * zh^2), 2e-3 * c(end));
%!   endif
%!   ## the volume term dominates: delta/(s Vol) -> 1 from below
%!   assert (all (diff (info.delta ./ (s * Om * R.^(d-1) / (d-1))) > 0));
%! endfor

%!test
%! ## A tabulated brane (spline of 1000 samples) follows the analytic brane to
%! ## large balls: the tip within 1e-100 zh of the tabulated horizon is reachable.
%! for d = [3 4 6]
%!   z = linspace (0, 1.2, 1000)';
%!   bt = ads_background (d, "tabulated", "z", z, "f", 1 - z.^d);
%!   bb = ads_background (d, "black_brane", "zh", 1);
%!   R = [2 5 10 20];
%!   [~, it] = ball_entropy (bt, R);
%!   [~, ib] = ball_entropy (bb, R);
%!   assert (it.delta, ib.delta, 1e-10 * ib.delta);
%!   assert (it.reach > 30 && ib.reach > 75);
%! endfor
