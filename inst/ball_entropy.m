## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} ball_entropy (@var{bg}, @var{R})
## @deftypefnx {} {[@var{S}, @var{info}] =} ball_entropy (@var{bg}, @var{R})
## Ryu-Takayanagi entropy S = Area/(4 G) of a ball of radius @var{R} (an
## array) in the AdS_(d+1) background @var{bg} from @code{ads_background}.
##
## In vacuum the surface is the hemisphere z^2 + r^2 = R^2, in closed form.
## Otherwise the profile is shot from its tip (a regular singular point,
## started from its series) with a GSL Runge-Kutta solver in polar
## coordinates about the ball's centre, and the tip depth is found by
## Brent's method (doc/higher_dimensional.md).  A tip within 0.01 zh of a
## horizon is first carried along the horizon in log(zh - z), so balls much
## wider than zh (where @code{delta} approaches the volume law
## s Omega_(d-2) R^(d-1)/(d-1), s the entropy density) keep every digit.
##
## @var{S} is the area above the cutoff (to O(eps^2)).  @var{info} has the
## fields of @code{strip_entropy}: @code{finite} (S minus every divergent
## term of the hemisphere: powers (R/eps)^(d-2-2k) and, for even d, the
## universal c log(R/eps); limit eps -> 0), @code{delta} (S minus the vacuum
## ball of the same radius, cutoff-independent), @code{z_star} (depth of
## the tip), @code{divergence} (S - finite: the subtracted terms up to O(eps^2))
## and @code{reach}
## (largest radius: the tip within 1e-250 zh of the brane's horizon, about
## 168, 120, 94, 77 zh for d = 3..6; 1e-100 zh of a tabulated horizon; or
## at z_max).
##
## @seealso{ads_background, strip_entropy}
## @end deftypefn

function [S, info] = ball_entropy (bg, R)
  fn = "ball_entropy";
  if (nargin != 2)
    print_usage ();
  endif
  R = __holent_array__ (fn, "R", R);
  if (nargout > 1)
    [S, fin, del, zs, reach, acc] = __holent_hd__ ("ball", fn, bg, R);
  else
    [S, fin, del, zs, reach] = __holent_hd__ ("ball", fn, bg, R);
    acc = [];
  endif
  if (any (R(:) <= 2 * bg.cutoff))
    warning ("holent:cutoff", "%s: %d ball(s) not wider than twice the cutoff %g",
             fn, nnz (R(:) <= 2 * bg.cutoff), bg.cutoff);
  endif
  info = struct ("finite", fin, "delta", del, "z_star", zs,
                 "divergence", S - fin, "reach", reach, "accuracy", acc);
endfunction

%!function A = hemi (d, R, eps)
%! ## hemisphere area above the cutoff per ell^(d-1) Omega_{d-2}, by integral
%! A = integral (@(z) R * (R^2 - z.^2).^((d-3)/2) ./ z.^(d-1), eps, R, ...
%!               "RelTol", 1e-13, "AbsTol", 0);
%!endfunction

%!test
%! ## Vacuum: Ryu and Takayanagi 2006 (JHEP 08 (2006) 045) hemisphere, the
%! ## area by Octave's integral; finite parts derived in doc/: d = 3:
%! ## 2 pi ell^2 (R/eps - 1); d = 4: 4 pi ell^3 (R^2/(2 eps^2) - log(2R/eps)/2 - 1/4).
%! for d = 3:7
%!   bg = ads_background (d, "vacuum", "ell", 1.1, "G", 0.4, "cutoff", 1e-3);
%!   R = [0.2 1 3];
%!   [S, info] = ball_entropy (bg, R);
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   for k = 1:3
%!     assert (S(k), 1.1^(d-1) * Om / 1.6 * hemi (d, R(k), 1e-3), 1e-10 * S(k));
%!   endfor
%!   assert (info.delta, zeros (1, 3));
%!   assert (info.z_star, R);
%! endfor
%! bg = ads_background (3, "vacuum", "cutoff", 1e-3);
%! [S, info] = ball_entropy (bg, 2);
%! assert (S, 2 * pi * (2e3 - 1) / 4, 1e-9);
%! assert (info.finite, -2 * pi / 4, 1e-14);
%! bg = ads_background (4, "vacuum", "cutoff", 1e-5);
%! [S, info] = ball_entropy (bg, 1);
%! assert (S, pi * (0.5e10 - 0.5 * log (2e5) - 0.25), -1e-14);
%! assert (info.finite, pi * (-0.5 * log (2) - 0.25), 1e-14);
%! assert (info.divergence, pi * (0.5e10 - 0.5 * log (1e5)), -1e-14);

%!test
%! ## First law of entanglement (Blanco, Casini, Hung and Myers 2013, JHEP 08
%! ## (2013) 060): delta S = 2 pi Omega_{d-2} R^d e/(d^2 - 1) for small R, e
%! ## the energy density; corrections are O((R/zh)^d) relative.
%! for d = 3:6
%!   bg = ads_background (d, "black_brane", "zh", 1, "G", 0.3, "ell", 1.2);
%!   Om = 2 * pi^((d-1)/2) / gamma ((d-1)/2);
%!   R = [0.02 0.05];
%!   [~, info] = ball_entropy (bg, R);
%!   fl = 2 * pi * Om * R.^d * bg.energy_density / (d^2 - 1);
%!   assert (info.delta, fl, 3 * R.^d .* fl + 1e-8 * fl);
%! endfor

%!test
%! ## Black brane, d = 4, checked by an independent shooting written here:
%! ## the profile in the arclength s of dr^2 + dz^2/f has curvature
%! ## d(theta)/ds = -(d-2) sin(theta)/r - (d-1) sqrt(f) cos(theta)/z (a geodesic of
%! ## the weight r^(d-2) z^(1-d), derived in doc/), integrated by ode45 as z(r)
%! ## from the tip (series start) to r = R/2, then as r(z) down to the cutoff.
%! ## Its area minus the hemisphere's (by integral) is delta up to O(eps^2);
%! ## delta stays below the first law's value (positivity of relative
%! ## entropy, Blanco, Casini, Hung and Myers 2013).
%! d = 4;  eps = 1e-3;  R = 0.8;
%! bg = ads_background (d, "black_brane", "zh", 1, "cutoff", eps);
%! [S, info] = ball_entropy (bg, R);
%! z0 = info.z_star;  f = @(z) 1 - z.^d;
%! k = @(r, z, t) -(d-2)*sin(t)/r - (d-1)*sqrt(f(z))*cos(t)/z;
%! rr = @(r, y) [sqrt(f(y(1)))*sin(y(2)); k(r, y(1), y(2)); r^(d-2)/y(1)^(d-1)] / cos(y(2));
%! r0 = 1e-5;  kap = -sqrt (f (z0)) / z0;
%! y0 = [z0+sqrt(f(z0))*kap*r0^2/2; kap*r0; r0^(d-1)/(d-1)/z0^(d-1)];
%! o = odeset ("RelTol", 1e-12, "AbsTol", 1e-14);
%! [~, y] = ode45 (rr, [r0, R/2], y0, o);
%! rz = @(z, y) [cos(y(2)); k(y(1), z, y(2)); y(1)^(d-2)/z^(d-1)] / (sqrt(f(z))*sin(y(2)));
%! [~, y2] = ode45 (rz, [y(end, 1), eps], [R/2; y(end, 2:3).'], o);
%! assert (y2(end, 1), sqrt (R^2 - eps^2), 1e-10);  # r(z) = sqrt(R^2 - z^2) + O(z^d)
%! Ahemi = integral (@(z) R * (R^2 - z.^2).^((d-3)/2) ./ z.^(d-1), eps, R, "RelTol", 1e-14, "AbsTol", 0);
%! assert (pi * (y2(end, 3) - Ahemi), info.delta, 2e-5 * info.delta);
%! assert (S, pi * y2(end, 3), 1e-10 * S);
%! Rs = linspace (0.1, 1.5, 8);
%! [~, i2] = ball_entropy (bg, Rs);
%! assert (all (i2.delta < 2 * pi * 4 * pi * Rs.^d * bg.energy_density / (d^2 - 1)));

%!test
%! ## tabulated brane reproduces the analytic one; monotonic tip depth
%! d = 3;  z = linspace (0, 1.2, 1000)';
%! bt = ads_background (d, "tabulated", "z", z, "f", 1 - z.^d);
%! bb = ads_background (d, "black_brane", "zh", 1);
%! R = [0.3 1 1.6];
%! [~, it] = ball_entropy (bt, R);
%! [~, ib] = ball_entropy (bb, R);
%! assert (it.z_star, ib.z_star, 1e-8);
%! assert (it.delta, ib.delta, 1e-8 * max (ib.delta));
%! [~, i2] = ball_entropy (bb, linspace (0.1, 1.8, 12));
%! assert (all (diff (i2.z_star) > 0));
%! try
%!   ball_entropy (bb, 3 * i2.reach);  error ("no error");
%! catch err
%!   assert (err.identifier, "holent:reach");
%!   assert (! isempty (strfind (err.message, "ball_entropy: R(1) = ")));
%! end_try_catch

%!test
%! ## Wide balls at finite temperature: delta -> s Vol(ball) (volume law),
%! ## approached from below as 1 + (d-1) sigma/(s R) + O(1/R^2), with the
%! ## wall term sigma (< 0) of doc/higher_dimensional.md by integral
%! ## (tested in detail in tests/check_ball_horizon.m).
%! d = 4;  bg = ads_background (d, "black_brane", "T", 2, "G", 0.2);
%! zh = bg.zh;  R = [10 20 40] * zh;
%! [~, info] = ball_entropy (bg, R);
%! ratio = info.delta ./ (bg.entropy_density * 4 * pi * R.^3 / 3);
%! assert (all (ratio < 1) && all (diff (ratio) > 0));
%! ## u^(1-d) (sqrt((1 - u^6)/(1 - u^4)) - 1), written without cancellation
%! b = @(u) 1 + u + u.^2 + u.^3;  q = @(u) sqrt (1 + u.^3 .* (u + u.^2) ./ b (u));
%! sig = (integral (@(u) (u + u.^2) ./ (b (u) .* (q (u) + 1)), 0, 1) - 1/(d-2)) / (4 * 0.2 * zh^(d-2));
%! assert (ratio - 1, (d-1) * sig ./ (bg.entropy_density * R), 2 ./ (R / zh).^2);

%!warning <twice the cutoff> ball_entropy (ads_background (4, "vacuum", "cutoff", 1e-2), 0.015);
%!error <Invalid call> ball_entropy (ads_background (4, "vacuum"))
%!error <R\(1\) = -1 must be positive \(a radius\)> ball_entropy (ads_background (4, "vacuum"), -1)
%!error <NaN> ball_entropy (ads_background (4, "vacuum"), [1 NaN])
%!error <numeric array> ball_entropy (ads_background (4, "vacuum"), "a")
%!error <background struct> ball_entropy (struct ("a", 1), 1)
%!error <R\(1\) = 1e\+308 gives an entropy out of double precision> ball_entropy (ads_background (4, "vacuum"), 1e308)
%!error <ball_entropy: BG.zh: must be positive> ball_entropy (setfield (ads_background (4, "vacuum"), "zh", -1), 1)
%!error <BG: must have d .= 3 for a ball: in d = 2 the ball of radius R is the interval of width 2 R> ball_entropy (ads_background (2, "vacuum"), 1)
