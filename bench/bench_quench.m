## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## bench_quench (): entanglement growth after a global quench on a line:
## S(t) of a 20-interval region at 10^4 times (rt_entropy with "t")
## against a plain vectorised Octave script of the same formulas and the
## same minimisation: every pair length for all times at once (the
## crossing equation of doc/quench.md solved by vectorised bisection) and
## the dynamic programme over non-crossing pairings vectorised over times.
## Prints n, both times, the ratio ours/peer (target <= 0.1) and the
## largest difference.
function bench_quench ()
  nt = 1e4;  n = 20;
  beta = 1;  c = 3;  eps = 1e-6;
  q = ads3_background ("quench", "line", "beta", beta, "c", c, "cutoff", eps);
  x = cumsum (0.2 + rand (2 * n, 1));
  A = [x(1:2:end), x(2:2:end)];
  t = linspace (-1, 1.2 * (x(end) - x(1)) / 2, nt);
  t0 = tic ();  S = rt_entropy (q, A, "t", t);  t_ours = toc (t0);
  t0 = tic ();  Sp = peer (x, t(:), beta, c, eps);  t_peer = toc (t0);
  printf ("%-34s %8s %12s %12s %8s %12s\n", "case", "n", "holent [s]", "octave [s]", "ratio", "max abs diff");
  printf ("%-34s %8d %12.3f %12.3f %8.3f %12.2e\n", "quench, 20 intervals, 10^4 times",
          n, t_ours, t_peer, t_ours / t_peer, max (abs (S(:) - Sp(:))));
  printf ("(ratio = holent / plain Octave, target <= 0.1)\n");
endfunction

## Plain Octave: lengths of every pair at every time, then the DP.
function S = peer (x, t, beta, c, eps)
  N = numel (x);  nt = numel (t);  K = N / 2;
  W = cell (N, N);
  for i = 1:N
    for j = i+1:2:N
      W{i,j} = qlen (x(j) - x(i), t, beta, eps);
    endfor
  endfor
  ## T{s, m}: best pairing of the 2m points s..s+2m-1 (vectors over time)
  T = cell (N + 2, K + 1);
  for s = 1:N+2
    T{s,1} = zeros (nt, 1);
  endfor
  for s = N:-1:1
    for m = 1:floor ((N - s + 1) / 2)
      best = inf (nt, 1);
      for k = 0:m-1    # pair s with s + 2k + 1
        v = W{s, s+2*k+1} + T{s+1, k+1} + T{s+2*k+2, m-k};
        best = min (best, v);
      endfor
      T{s,m+1} = best;
    endfor
  endfor
  S = c / 6 * T{1, K+1}';
endfunction

## The thin-shell Vaidya length of an interval l at times t (doc/quench.md).
function L = qlen (l, t, beta, eps)
  R = 2 * pi / beta;
  L = zeros (size (t));
  pre = t <= 0;  post = t >= l / 2;  mid = ! (pre | post);
  L(pre) = 2 * log (l / eps);
  L(post) = 2 * log (beta / (pi * eps) * sinh (pi * l / beta));
  tm = t(mid);
  S = sinh (R * tm);  C = cosh (R * tm);  lam = pi * l / beta;
  h = @(e) asinh (S .* exp (-e)) + S .* (1 - exp (-2 * e)) ./ (exp (-e) .* (C + sqrt (1 + S.^2 .* exp (-2 * e)))) - lam;
  lo = zeros (size (tm));  hi = max (log (2), log (8 * C * lam ./ (3 * S)));
  for it = 1:60
    m = (lo + hi) / 2;
    up = h (m) > 0;
    hi(up) = m(up);
    lo(! up) = m(! up);
  endfor
  e = (lo + hi) / 2;
  L(mid) = 2 * log (beta / (pi * eps) * S .* cosh (e));
endfunction
