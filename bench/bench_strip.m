## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## bench_strip (): 1000 strip widths in the d = 4 black brane (zh = 1,
## cutoff 1e-3), holent's strip_entropy against a plain Octave script built
## on integral and fzero (below), both aiming at 1e-10 relative accuracy.
## strip_entropy has no tolerance option: its core always works to about
## 1e-12 (QAG relative 1e-12, Brent on the root variable to 1e-13).  The
## peer runs at the target, RelTol 1e-10 and TolX 1e-11 z*, and carries
## each root's bracket over to the next width (z* grows with the width),
## as a careful user would; the printed agreement checks the target on S
## and z*.  The script is slow, so it is timed on a run of 100
## consecutive widths (its brackets carried over) and its time scaled to
## 1000; the printout says so.  Medians are not needed here: one run of
## each, with the load average printed.
function bench_strip ()
  d = 4;  zh = 1;  eps = 1e-3;
  bg = ads_background (d, "black_brane", "zh", zh, "cutoff", eps);
  l = linspace (0.05, 4, 1000);

  strip_entropy (bg, l(1:10));            # load the MEX file
  t0 = tic ();
  [S, info] = strip_entropy (bg, l);
  t_ours = toc (t0);

  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));
  sub = 451:550;
  t0 = tic ();
  [Sp, zp] = plain_strip (d, zh, eps, l(sub));
  t_sub = toc (t0);
  t_plain = t_sub * numel (l) / numel (sub);

  err_S = max (abs (S(sub) - Sp) ./ Sp);
  err_z = max (abs (info.z_star(sub) - zp) ./ zp);
  printf ("strip_entropy, d = 4 brane, %d widths in [%g, %g]\n", numel (l), l(1), l(end));
  printf ("  holent (GSL core)           : %8.4f s\n", t_ours);
  printf ("  plain integral + fzero      : %8.4f s for %d consecutive widths, scaled to %d: %8.2f s\n",
          t_sub, numel (sub), numel (l), t_plain);
  printf ("  ratio plain/holent          : %8.0f\n", t_plain / t_ours);
  printf ("  max relative difference     : S %.2g, z* %.2g (on the %d common widths)\n",
          err_S, err_z, numel (sub));
  ok = @(b) merge (b, "met", "NOT met");
  printf ("  targets: < 0.2 s %s; >= 100x %s; agreement <= 1e-10 %s\n",
          ok (t_ours < 0.2), ok (t_plain / t_ours >= 100), ok (max (err_S, err_z) <= 1e-10));
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
  lo = 1e-3;
  for k = 1:numel (l)
    ## the bracket of the previous (smaller) width carried over
    zs(k) = fzero (@(x) width (x) - l(k), [lo, zh * (1 - 1e-12)],
                   optimset ("TolX", 1e-11 * lo));
    lo = zs(k);
    x = zs(k);
    A = integral (@(t) reshape (2 * (1 - t(:)'.^2).^(1-d) ./ sqrt (q (x, t)), size (t)), ...
                  0, sqrt (1 - eps / x), o{:});
    S(k) = 2 * x^(2-d) * A / 4;
  endfor
endfunction
