## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## bench_page (): a Page-curve scan, 10^4 boundary times of a 50-interval
## radiation region in the two-sided BCFT black hole (bcft_tfd), against a
## plain vectorised Octave script of the same closed forms and the same
## exact minimisation (the one-sided dynamic programme of doc/bcft.md, then
## S(t) = (c/3) min_k (A_k + k h(t)) as one matrix minimum).  Prints n, both
## times, the ratio ours/peer (target <= 0.1) and the agreement.
function bench_page ()
  beta = 2; T = 0.6; c = 12; eps = 1e-6;
  bg = ads3_background ("bcft_tfd", "half_line", "beta", beta, "tension", T,
                        "c", c, "cutoff", eps);
  rand ("seed", 13);
  cuts = sort (0.2 + 30 * rand (1, 99));
  R = [reshape([cuts, Inf], 2, []).'];          # 50 rows, the last to Inf
  t = linspace (0, 20, 1e4);
  reps = 5;
  S = page_curve (bg, R, t);  Sp = peer (R, t, beta, eps, c, atanh (T));
  t_ours = t_peer = Inf;
  for r = 1:reps
    t0 = tic ();  S = page_curve (bg, R, t);  t_ours = min (t_ours, toc (t0));
    t0 = tic ();  Sp = peer (R, t, beta, eps, c, atanh (T));  t_peer = min (t_peer, toc (t0));
  endfor
  printf ("%-34s %10s %10s %8s %12s\n", "case", "holent [s]", "octave [s]", "ratio", "max rel diff");
  printf ("%-34s %10.4f %10.4f %8.3f %12.2e\n",
          sprintf ("Page curve, %d times x %d rows", numel (t), rows (R)),
          t_ours, t_peer, t_ours / t_peer, max (abs (S - Sp) ./ abs (Sp)));
  printf ("(best of %d runs each; ratio = holent / plain Octave, target <= 0.1)\n", reps);
endfunction

## The peer: closed forms and the exact one-sided minimisation in Octave.
function S = peer (R, t, beta, eps, c, rho)
  x = R(:).';  x = sort (x(isfinite (x) & x > 0));
  m = numel (x);
  lb = log (beta / (pi * eps));
  C = 2 * (lb + log (sinh (pi * abs (x.' - x) / beta)));    # pairs
  lc = lb + log (sinh (2 * pi * x / beta)) + rho;           # to the brane
  P = Inf (m + 1);  P(1:m+2:end) = 0;                       # P(i+1, j+1): [i, j)
  for len = 2:2:m
    for i = 0:m-len
      j = i + len;  ks = i+1:2:j-1;
      P(i+1, j+1) = min (C(i+1, ks+1) + P(i+2, ks+1) + P(ks+2, j+1).');
    endfor
  endfor
  F = Inf (m + 1, 2);  F(1, 1) = 0;                         # prefix, parity
  for i = 1:m
    q = i - 1;  js = mod (q + 1, 2):2:q-1;
    for par = 0:1
      v = F(i, 2 - par) + lc(q+1);
      if (! isempty (js))
        v = min (v, min (F(js+1, par+1).' + C(js+1, q+1).' + P(js+2, q+1).'));
      endif
      F(i+1, par+1) = v;
    endfor
  endfor
  G = Inf (m + 1, m + 1);  G(m+1, 1) = 0;                   # suffix, k bridges
  for i = m-1:-1:0
    js = i+1:2:m-1;
    v = [Inf, G(i+2, 1:m)];
    if (! isempty (js))
      v = min (v, min (C(i+1, js+1).' + P(i+2, js+1).' + G(js+2, :), [], 1));
    endif
    G(i+1, :) = v;
  endfor
  A = min (min (F, [], 2) + G, [], 1);
  h = lb + abs (2 * pi * t / beta) + log1p (exp (-4 * pi * abs (t) / beta)) - log (2);
  S = (c / 3) * min (A.' + (0:m).' * h, [], 1);
endfunction
