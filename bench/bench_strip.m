## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## bench_strip (): n = 1000 strip widths in [0.05, 4] zh of the d = 4 black
## brane (zh = 1, cutoff 1e-3), holent's strip_entropy against a plain
## Octave script built on integral and fzero (below), both at the target
## of issue 11, 1e-10 relative.  strip_entropy takes its series path for
## this many widths (doc/fast_paths.md: Chebyshev series fitted once per
## call, set-up included in the time; its tails are below 1e-12) and is
## also timed on its exact path (per width: Brent on the width quadrature,
## QAG at 1e-12).  The peer runs at the target, RelTol 1e-10 and TolX
## 1e-11 z*, with its integrands vectorised in the quadrature variable and
## each root's bracket carried over from the previous widths (the lower
## end is the previous z*, the upper end the secant extrapolation of the
## last two roots plus a margin, widened only if it does not bracket), as
## a careful user would.  The script is slow, so it is timed on 100
## consecutive widths and its time scaled to n; the printout says so.
## holent's times are medians of 9 calls (wall and CPU), with the load
## average printed: the machine may be shared.
function bench_strip ()
  d = 4;  zh = 1;  eps = 1e-3;
  bg = ads_background (d, "black_brane", "zh", zh, "cutoff", eps);
  n = 1000;
  l = linspace (0.05, 4, n);

  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));
  [t_ours, ~, c_ours] = median_time (@() strip_entropy (bg, l), 9);
  [S, info] = strip_entropy (bg, l);
  [t_ex, ~, c_ex] = median_time (@() strip_entropy (bg, l, "method", "exact"), 3);
  [Se, ie] = strip_entropy (bg, l, "method", "exact");

  sub = 451:550;
  t0 = tic ();
  c0 = cputime ();
  [Sp, zp] = plain_strip (d, zh, eps, l(sub));
  c_sub = cputime () - c0;
  t_sub = toc (t0);
  t_plain = t_sub * n / numel (sub);
  c_plain = c_sub * n / numel (sub);
  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));

  err_S = max (abs (S(sub) - Sp) ./ Sp);
  err_z = max (abs (info.z_star(sub) - zp) ./ zp);
  err_x = max ([abs(S - Se) ./ Se, abs(info.z_star - ie.z_star) ./ ie.z_star]);
  printf ("strip_entropy, d = 4 brane, n = %d widths in [%g, %g] zh\n", n, l(1), l(end));
  printf ("  %-34s %10s %10s\n", "", "wall [s]", "CPU [s]");
  printf ("  %-34s %10.4f %10.4f   (%d widths from the series, estimated error %.1g)\n",
          "holent, series path (auto)", t_ours, c_ours, info.series, info.series_error);
  printf ("  %-34s %10.4f %10.4f\n", "holent, exact path", t_ex, c_ex);
  printf ("  %-34s %10.2f %10.2f   (%d consecutive widths: %.2f s, scaled to n)\n",
          "plain integral + fzero (1e-10)", t_plain, c_plain, numel (sub), t_sub);
  printf ("  ratio peer/holent (wall)         : %8.0f (exact path: %.0f)\n",
          t_plain / t_ours, t_plain / t_ex);
  printf ("  agreement with the peer          : S %.2g, z* %.2g (max relative, %d common widths)\n",
          err_S, err_z, numel (sub));
  printf ("  series against exact path        : %.2g (max relative, S and z*, all %d widths)\n",
          err_x, n);
  ok = @(b) merge (b, "met", "NOT met");
  printf ("  targets: n = 1000 under 5 ms %s (wall), %s (CPU); agreement <= 1e-10 %s\n",
          ok (t_ours < 5e-3), ok (c_ours < 5e-3), ok (max ([err_S, err_z, err_x]) <= 1e-10));
endfunction

## The peer: for each width, fzero on z* of the width integral, then the
## area above the cutoff, both by integral after u = 1 - t^2 (which removes
## the 1/sqrt(1 - u) singularity at the turning point).  Written as a
## careful user would for 1e-10: 1 - u^(2d-2) = t^2 (1 + u + ... + u^(2d-3))
## and f = (w/zh)(1 + x + ... + x^(d-1)), w = zh - z = (zh - z*) + z* t^2,
## so that neither the turning point nor the horizon costs digits (the
## naive integrand 2t/sqrt(f (1 - u^(2d-2))) is 0/0 at t = 0 and leaves
## integral with a width error of ~1e-7 near the horizon).
function [S, zs] = plain_strip (d, zh, eps, l)
  o = {"RelTol", 1e-10, "AbsTol", 0};   # the target
  sig = @(u, m) sum (u(:)'.^((0:m-1)'), 1);
  q = @(x, t) (((zh - x) + x * t(:)'.^2) / zh) .* sig (x * (1 - t(:)'.^2) / zh, d) ...
              .* sig (1 - t(:)'.^2, 2*d - 2);
  width = @(x) 2 * x * integral (@(t) reshape (2 * (1 - t(:)'.^2).^(d-1) ./ sqrt (q (x, t)), size (t)), ...
                                 0, 1, o{:});
  S = zeros (size (l));  zs = S;
  lo = 1e-3;  top = zh * (1 - 1e-12);
  for k = 1:numel (l)
    ## the bracket carried over: from the previous root to the secant
    ## extrapolation of the last two plus a margin
    hi = top;
    if (k > 2)
      dz = (zs(k-1) - zs(k-2)) * (l(k) - l(k-1)) / (l(k-1) - l(k-2));
      hi = min (top, zs(k-1) + 2 * dz + 1e-6);
    endif
    fn = @(x) width (x) - l(k);
    try
      zs(k) = fzero (fn, [lo, hi], optimset ("TolX", 1e-11 * lo));
    catch
      zs(k) = fzero (fn, [lo, top], optimset ("TolX", 1e-11 * lo));
    end_try_catch
    lo = zs(k);
    x = zs(k);
    A = integral (@(t) reshape (2 * (1 - t(:)'.^2).^(1-d) ./ sqrt (q (x, t)), size (t)), ...
                  0, sqrt (1 - eps / x), o{:});
    S(k) = 2 * x^(2-d) * A / 4;
  endfor
endfunction
