## SPDX-License-Identifier: GPL-3.0-or-later
## Tabulated blackening functions as a solver writes them: rounded to 6, 8
## or 10 significant digits, or with random noise, on grids of 100 to
## 10^4 points.  References are derived here from the metric
## ds^2 = (1/z^2)(-f dt^2 + dz^2/f + dx^2) with the exact f:
##   * the d = 4 brane f = 1 - z^4 and the charged brane
##     f = 1 - (1+q) z^4 + q z^6 (the planar AdS-Reissner-Nordstrom form,
##     common practice; zh = 1 for q <= 2, double zero at q = 2): m = 1+q,
##     T = |f'(1)|/(4 pi) = |2q - 4|/(4 pi), s = 1/(4 G) for ell = zh = 1;
##   * strips: z* by fzero on the width integral and the area at the cutoff
##     by Octave's integral (substitution z = z*(1 - t^2) at the tip);
##   * tolerances: the error estimates the background and info report,
##     which must cover the true error and stay of the order the data's
##     noise allows.

%!function fv = rnd_ (v, dig)
%!  ## the samples as a text file with DIG significant digits would hold them
%!  fv = str2double (strsplit (sprintf (["%." num2str(dig) "g "], v), " "))(1:end-1)';
%!endfunction

%!function [zs, S] = strip_ref_ (f, l, eps)
%!  ## d = 4 strip of width l in f (exact): fzero + integral
%!  d = 4;
%!  sg = @(u) reshape (sum (u(:)'.^((0:2*d-3)'), 1), size (u));
%!  wid = @(zs) 2 * zs * integral (@(t) 2 * (1 - t.^2).^(d-1) ./ ...
%!          sqrt (f (zs * (1 - t.^2)) .* sg (1 - t.^2)), 0, 1, "RelTol", 1e-12, "AbsTol", 0);
%!  zs = fzero (@(x) wid (x) - l, [0.05, 0.999], optimset ("TolX", 1e-14));
%!  S = 2 * zs^(2-d) * integral (@(t) 2 * (1 - t.^2).^(1-d) ./ ...
%!        sqrt (f (zs * (1 - t.^2)) .* sg (1 - t.^2)), 0, sqrt (1 - eps / zs),
%!        "RelTol", 1e-12, "AbsTol", 0) / 4;
%!endfunction

%!test
%! ## m, T and s of rounded and noisy data: within the reported errors,
%! ## and the errors of the order of the data's accuracy
%! warning ("off", "holent:cutoff", "local");
%! for q = [0 0.5 1.5]
%!   f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%!   Tx = abs (2*q - 4) / (4*pi);
%!   cases = {100, 6; 1000, 8; 10000, 10; 100, 1e-7; 4000, 1e-10};
%!   for c = 1:rows (cases)
%!     [N, a] = cases{c,:};
%!     z = linspace (0, 1.2, N)';
%!     if (a >= 1)
%!       fv = rnd_ (f (z), a);  nz = 10^-a;
%!     else
%!       randn ("state", N);  fv = f (z) + a * randn (N, 1);  fv(1) = 1;  nz = a;
%!     endif
%!     bg = ads_background (4, "tabulated", "z", z, "f", fv);
%!     assert (bg.horizon && ! bg.extremal);
%!     assert (abs (bg.m - (1 + q)) <= 3 * bg.m_error);
%!     assert (bg.m_error < 1e4 * nz + 1e-6);
%!     assert (abs (bg.T - Tx) <= bg.T_error);
%!     assert (bg.T_error < 1e-3);
%!     assert (abs (bg.zh - 1) < 1e-5);
%!     assert (bg.entropy_density, 1 / (4 * bg.zh^3), 1e-14);
%!     assert (bg.energy_density, 3 * bg.m / (16 * pi), 1e-14);
%!     assert (bg.noise >= 0.1 * nz / 2 && bg.noise < 1e3 * nz + 1e-6);
%!   endfor
%! endfor

%!test
%! ## strips of noisy charged-brane data against fzero + integral on the
%! ## exact f, within the accuracy info reports (which is noise-sized)
%! warning ("off", "holent:cutoff", "local");
%! q = 1.5;  f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%! l = [0.6 2];
%! for a = [1e-7 1e-9]
%!   z = linspace (0, 1.2, 1000)';
%!   randn ("state", 7);  fv = f (z) + a * randn (1000, 1);  fv(1) = 1;
%!   bg = ads_background (4, "tabulated", "z", z, "f", fv, "cutoff", 1e-3);
%!   [S, info] = strip_entropy (bg, l);
%!   assert (all (info.accuracy > 0 & info.accuracy < 1e3 * a));
%!   for k = 1:2
%!     [zs, Sr] = strip_ref_ (f, l(k), 1e-3);
%!     assert (abs (S(k) - Sr) <= 5 * info.accuracy(k) + 1e-9 * Sr);
%!     assert (abs (info.z_star(k) - zs) < 1e4 * a);
%!   endfor
%! endfor

%!test
%! ## balls and strips of rounded brane data against the analytic brane
%! ## (itself checked against ode45 and series in check_ball_horizon.m and
%! ## check_hd_series.m), within the reported accuracy
%! warning ("off", "holent:cutoff", "local");
%! bb = ads_background (4, "black_brane", "zh", 1);
%! [~, ib] = ball_entropy (bb, [0.4 1.5]);
%! [~, is] = strip_entropy (bb, [0.4 3]);
%! for dig = [6 10]
%!   z = linspace (0, 1.2, 800)';
%!   bt = ads_background (4, "tabulated", "z", z, "f", rnd_ (1 - z.^4, dig));
%!   [~, it] = ball_entropy (bt, [0.4 1.5]);
%!   assert (all (abs (it.delta - ib.delta) <= 5 * it.accuracy + 1e-10));
%!   assert (all (it.accuracy < 1e2 * 10^-dig * abs (ib.delta) + 1e-12));
%!   [~, it] = strip_entropy (bt, [0.4 3]);
%!   assert (all (abs (it.delta - is.delta) <= 5 * it.accuracy + 1e-10));
%! endfor
%! ## analytic backgrounds report accuracy 0
%! assert (ib.accuracy, [0 0]);

%!test
%! ## extremal q = 2 (double zero): recognised, T = 0; q = 1.999 with
%! ## 10-digit data: a horizon with T = |2q - 4|/(4 pi) within T_error
%! f = @(z, q) 1 - (1 + q) * z.^4 + q * z.^6;
%! z = linspace (0, 1.2, 1000)';
%! for dig = [6 8 10]
%!   bg = ads_background (4, "tabulated", "z", z, "f", rnd_ (f (z, 2), dig));
%!   assert (bg.extremal && bg.horizon && bg.T == 0);
%!   assert (abs (bg.zh - 1) < 1e-3);
%!   [~, i] = strip_entropy (bg, [0.5 2]);        # strips converge
%!   assert (all (isfinite (i.delta)) && all (i.z_star < bg.zh));
%! endfor
%! bg = ads_background (4, "tabulated", "z", z, "f", rnd_ (f (z, 1.999), 10));
%! assert (! bg.extremal);
%! assert (abs (bg.T - 0.002 / (4*pi)) <= bg.T_error);
%! assert (bg.zh, 1, 1e-9);

%!test
%! ## a table that ends at the horizon (as a solver writes it): T to the
%! ## data's accuracy, not first order in the grid step.  f = 1 - z^4
%! ## e^(z^2 - 1): zh = 1, f'(1) = -6 (derived here).
%! f = @(z) 1 - z.^4 .* exp (z.^2 - 1);
%! for N = [100 4000]
%!   z = linspace (0, 1, N)';
%!   bg = ads_background (4, "tabulated", "z", z, "f", f (z));
%!   assert (bg.zh, 1);
%!   assert (abs (bg.T - 6 / (4*pi)) <= bg.T_error);
%! endfor
%! assert (abs (bg.T / (6 / (4*pi)) - 1) < 1e-7);  # N = 4000: not O(h)
%! ## the same with f = 1 - 2.5 z^4 + 1.5 z^6 (T = 1/(4 pi))
%! z = linspace (0, 1, 100)';
%! bg = ads_background (4, "tabulated", "z", z, "f", 1 - 2.5 * z.^4 + 1.5 * z.^6);
%! assert (bg.T, 1 / (4*pi), 1e-10);

%!test
%! ## m from 6-digit data (f = 1 - 2 z^4) and a function handle
%! z = linspace (0, 0.9, 200)';
%! bg = ads_background (4, "tabulated", "z", z, "f", rnd_ (1 - 2 * z.^4, 6));
%! assert (abs (bg.m - 2) <= 3 * bg.m_error && bg.m_error < 1e-4);
%! bh = ads_background (4, "tabulated", "f", @(z) 1 - z.^4, "z_max", 1.2);
%! assert (bh.zh, 1, 1e-12);
%! assert (bh.T, 1 / pi, 1e-9);
%! assert (numel (bh.table.samples.z), 4001);

%!test
%! ## f - 1 = O(z^d) refused whatever the sampling (10, 14, 30 samples of
%! ## 1 - z^2; a small z^2 admixture on 500 non-uniform samples)
%! for N = [10 14 30]
%!   z = linspace (0, 1.5, N);
%!   fail ('ads_background (4, "tabulated", "z", z, "f", 1 - z.^2)', "vanish like z\\^4");
%! endfor
%! z = (linspace (0, 1, 500)'.^1.5) * 1.3;
%! fail ('ads_background (4, "tabulated", "z", z, "f", 1 - 1e-3 * z.^2 - z.^4)', "vanish like z\\^4");
%! ## a stored background is reused as it is: no refit (spline kept)
%! bg = ads_background (4, "tabulated", "z", z, "f", 1 - z.^4);
%! assert (isfield (bg.table.spline, "g2") && numel (bg.table.spline.g2) == 500);

%!test
%! ## charged branes f = 1 - (1+q) z^4 + q z^6 as samples (issue 14):
%! ## balls.  Small balls obey the first law of entanglement (Blanco,
%! ## Casini, Hung and Myers 2013, JHEP 08 (2013) 060): delta S = 2 pi
%! ## Omega_2 R^4 e/15 with e = 3 m/(16 pi G), m = 1 + q, up to O(R^6)
%! ## relative corrections (the z^6 term); large balls become extensive,
%! ## delta S -> s V with V = Omega_2 R^3/3 (common practice: the surface
%! ## hugs the horizon), up to a wall term O(zh/R) relative whose sign
%! ## depends on q (below 1 for q = 0.5, above for q = 1.5 at R = 16 zh).
%! z = linspace (0, 1.4, 4001)';
%! for q = [0.5 1.5]
%!   f = 1 - (1 + q) * z.^4 + q * z.^6;
%!   bg = ads_background (4, "tabulated", "z", z, "f", round (f * 1e10) / 1e10);
%!   R = [0.03 0.06];
%!   [~, info] = ball_entropy (bg, R);
%!   fl = 2 * pi * 4 * pi * R.^4 * (3 * (1 + q) / (16 * pi)) / 15;
%!   assert (info.delta, fl, 2 * (1 + q) * R.^2 .* fl + 1e-6 * fl);
%!   R = [4 8 16] * bg.zh;
%!   [~, info] = ball_entropy (bg, R);
%!   ratio = info.delta ./ (bg.entropy_density * 4 * pi * R.^3 / 3);
%!   assert (abs (ratio(end) - 1) < 0.06 && abs (ratio(end) - 1) < abs (ratio(1) - 1));
%! endfor

%!test
%! ## the whole digits x grid matrix (issue 14): 6, 8, 10 significant digits
%! ## and random noise 1e-10, 1e-8, 1e-7, each on grids of 100, 1000 and
%! ## 10^4 points, for the brane (q = 0) and a charged brane (q = 1.5):
%! ## m, T within their reported errors; a strip of width 1 of the brane
%! ## against the analytic brane (checked against fzero + integral above)
%! ## within the accuracy strip_entropy reports
%! warning ("off", "holent:cutoff", "local");
%! [~, ib] = strip_entropy (ads_background (4, "black_brane", "zh", 1), 1);
%! for q = [0 1.5]
%!   f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%!   Tx = abs (2*q - 4) / (4*pi);
%!   for N = [100 1000 10000]
%!     z = linspace (0, 1.2, N)';
%!     for a = [6 8 10 1e-10 1e-8 1e-7]
%!       if (a >= 1)
%!         fv = rnd_ (f (z), a);
%!       else
%!         randn ("state", N + round (-log10 (a)));
%!         fv = f (z) + a * randn (N, 1);  fv(1) = 1;
%!       endif
%!       bg = ads_background (4, "tabulated", "z", z, "f", fv);
%!       assert (abs (bg.m - (1 + q)) <= 3 * bg.m_error);
%!       assert (abs (bg.T - Tx) <= bg.T_error);
%!       if (q == 0)
%!         [~, it] = strip_entropy (bg, 1);
%!         assert (abs (it.delta - ib.delta) <= 5 * it.accuracy + 1e-10);
%!       endif
%!     endfor
%!   endfor
%! endfor

%!test
%! ## near-extremal q = 1.999 and extremal q = 2 (issue 14) on a
%! ## representative subset of the digits x noise x grid matrix.  Exact
%! ## facts (derived here): f = (1 - z^2)(1 + z^2 - q z^4), zh = 1 with
%! ## b = |f'(1)| = 4 - 2q and a = f''(1) = 18 q - 12; for q = 2,
%! ## f = (1 - z^2)^2 (1 + 2 z^2) >= 0 touches zero at z = 1 (T = 0,
%! ## s = 1/4 still finite).  Tolerances from the data's error eta (max
%! ## |f_i - f(z_i)|: half a unit of the last digit, 4 standard deviations
%! ## of Gaussian noise): near z = 1, f + delta = -b u + (a/2) u^2 + delta
%! ## has the slope b - sqrt(b^2 - 2 a delta) off by at most sqrt(2 a eta)
%! ## (a delta/b when b^2 >> a eta) and its root moved by at most
%! ## sqrt(2 eta/a) (eta/b); the interpolating spline adds a slope noise
%! ## ~ eta/h (h the grid step), and its least moves by that over a.  So
%! ## T is resolved only when eta << b^2/(2a) = 8.3e-8 (q = 1.999);
%! ## otherwise the data may be reported extremal (T = 0), with T_error
%! ## covering the true T.  (On 100 points the grid, not eta, limits: its
%! ## interpolation error replaces eta; only 6 digits are taken there.)
%! warning ("off", "holent:cutoff", "local");
%! cases = {100, 6; 1000, 8; 10000, 10; 1000, 1e-10; 10000, 1e-8; 1000, 1e-7};
%! l = [0.5 2];
%! for q = [1.999 2]
%!   f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%!   b = 4 - 2*q;  a2 = 18*q - 12;  Tx = b / (4*pi);
%!   zr = zeros (size (l));  Sr = zr;
%!   for k = 1:numel (l)
%!     [zr(k), Sr(k)] = strip_ref_ (f, l(k), 1e-3);
%!   endfor
%!   for c = 1:rows (cases)
%!     [N, e] = cases{c,:};
%!     z = linspace (0, 1.2, N)';  h = z(2);
%!     if (e >= 1)
%!       fv = rnd_ (f (z), e);  eta = 0.5 * 10^-e;
%!     else
%!       randn ("state", N + c);  fv = f (z) + e * randn (N, 1);  fv(1) = 1;
%!       eta = 4 * e;
%!     endif
%!     bg = ads_background (4, "tabulated", "z", z, "f", fv, "cutoff", 1e-3);
%!     tolT = (3 * eta / h + sqrt (2 * a2 * eta)) / (4*pi);
%!     tolz = sqrt (2 * eta / a2) + 3 * eta / (h * a2) + b / a2;
%!     assert (bg.horizon);
%!     assert (abs (bg.zh - 1) <= tolz);
%!     assert (abs (bg.entropy_density - 1/4) <= 3 * tolz / 4);
%!     assert (abs (bg.m - (1 + q)) <= 3 * bg.m_error);
%!     assert (bg.m_error < 1e4 * eta + 1e-6);
%!     assert (abs (bg.T - Tx) <= bg.T_error);    # the reported error covers
%!     assert (abs (bg.T - Tx) <= tolT);          # and T is as good as eta allows
%!     if (q == 2)
%!       assert (bg.extremal && bg.T == 0);       # a double zero: T = 0
%!     elseif (tolT < Tx / 3)
%!       assert (! bg.extremal);                  # resolvable: resolved
%!     endif
%!     [S, it] = strip_entropy (bg, l);
%!     assert (all (abs (S - Sr) <= 5 * it.accuracy + 1e-9 * Sr));
%!     assert (all (abs (it.z_star - zr) < 1e4 * eta));
%!     assert (all (it.accuracy < 1e3 * eta + 1e-9));
%!   endfor
%! endfor

%!test
%! ## balls of (near-)extremal data: small balls obey the first law of
%! ## entanglement (Blanco, Casini, Hung and Myers 2013, JHEP 08 (2013)
%! ## 060), delta S = 2 pi Omega_2 R^4 e/15, e = 3 (1 + q)/(16 pi), up to
%! ## O(R^2) relative (the z^6 term) and the reported accuracy; a ball of
%! ## radius zh (tip away from the double zero) converges
%! warning ("off", "holent:cutoff", "local");
%! z = linspace (0, 1.2, 1000)';
%! R = [0.03 0.06];
%! for q = [1.999 2]
%!   f = 1 - (1 + q) * z.^4 + q * z.^6;
%!   for e = [8 1e-8]
%!     if (e >= 1)
%!       fv = rnd_ (f, e);
%!     else
%!       randn ("state", 3);  fv = f + e * randn (1000, 1);  fv(1) = 1;
%!     endif
%!     bg = ads_background (4, "tabulated", "z", z, "f", fv);
%!     [~, info] = ball_entropy (bg, [R 1]);
%!     fl = 2 * pi * 4 * pi * R.^4 * (3 * (1 + q) / (16 * pi)) / 15;
%!     assert (abs (info.delta(1:2) - fl) <= 2 * (1 + q) * R.^2 .* fl ...
%!             + 5 * info.accuracy(1:2));
%!     assert (isfinite (info.delta(3)) && info.accuracy(3) < 1e-6);
%!   endfor
%! endfor

%!test
%! ## a noisy extremal table (q = 2, 10^4 samples, noise 1e-7): the
%! ## quadrature next to the tip accepts what the data allow there
%! ## (noise/f(z*) relative; it used to fail with holent:noconv at l = 4)
%! warning ("off", "holent:cutoff", "local");
%! f = @(z) 1 - 3 * z.^4 + 2 * z.^6;
%! z = linspace (0, 1.2, 10000)';
%! randn ("state", 10007);  fv = f (z) + 1e-7 * randn (10000, 1);  fv(1) = 1;
%! bg = ads_background (4, "tabulated", "z", z, "f", fv, "cutoff", 1e-3);
%! [S, it] = strip_entropy (bg, [0.5 4]);
%! [zr, Sr] = strip_ref_ (f, 4, 1e-3);
%! assert (abs (S(2) - Sr) <= 5 * it.accuracy(2) && it.accuracy(2) < 1e-5);
%! assert (it.z_star(2), zr, 1e-4);
