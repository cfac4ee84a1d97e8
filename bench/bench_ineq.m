## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## bench_ineq (): entropy_inequalities (C enumeration) against a
## straightforward vectorised Octave evaluation of the same families, in
## one run: subadditivity over every pair of disjoint subsets and MMI over
## every triple of single parties plus every covering triple, N = 8 .. 12.
## Prints both times, the ratio ours/peer and that the worst values agree;
## then the time of the whole report for N = 16.
function bench_ineq ()
  printf ("%-4s %12s %12s %12s %8s %10s\n", "N", "instances", "holent [s]",
          "octave [s]", "ratio", "agree");
  for N = [8 10 12]
    S = rand (2^N - 1, 1) .* sum (dec2bin (1:2^N-1) == "1", 2);
    t0 = tic ();
    rep = entropy_inequalities (S);
    t_ours = toc (t0);
    t0 = tic ();
    [wsa, wmmi, cnt] = peer (S, N);
    t_peer = toc (t0);
    ok = abs (wsa - rep.sa.worst_value) < 1e-12 && abs (wmmi - rep.mmi.worst_value) < 1e-12 ...
         && cnt == rep.sa.count + rep.mmi.count;
    printf ("%-4d %12d %12.4f %12.4f %8.3f %10s\n", N,
            rep.sa.count + rep.mmi.count, t_ours, t_peer, t_ours / t_peer,
            {"NO", "yes"}{ok + 1});
  endfor
  printf ("(holent column: the whole report, all six families; octave column: sa and mmi only)\n");
  N = 16;
  S = sum (dec2bin (1:2^N-1) == "1", 2);
  t0 = tic ();
  rep = entropy_inequalities (S);
  printf ("N = 16, every family (%.3g instances): %.2f s\n",
          rep.sa.count + rep.al.count + rep.ssa.count + rep.wm.count ...
          + rep.mmi.count + rep.cyclic.count, toc (t0));
endfunction

## Plain Octave: for each X the disjoint Y are the masks with no common bit.
function [wsa, wmmi, cnt] = peer (S, N)
  M = 2^N - 1;
  k = (1:M)';
  wsa = Inf;  wmmi = Inf;  cnt = 0;
  for X = 1:M
    Y = k(bitand (k, X) == 0 & k > X);
    if (! isempty (Y))
      wsa = min (wsa, min (S(X) + S(Y) - S(bitor (X, Y))));
      cnt += numel (Y);
    endif
    ## covering triples X < Y < Z = rest
    rest = M - X;
    Y = k(bitand (k, X) == 0 & k > X & k < M);
    Z = rest - Y;
    sel = Z > Y & bitand (Z, Y) == 0;
    Y = Y(sel);  Z = Z(sel);
    if (! isempty (Y))
      v = S(bitor (X, Y)) + S(bitor (Y, Z)) + S(bitor (X, Z)) - S(X) - S(Y) - S(Z) - S(M);
      wmmi = min (wmmi, min (v));
      cnt += numel (Y);
    endif
  endfor
  ## single parties a < b < c
  p = 2.^(0:N-1);
  [a, b, c] = ndgrid (1:N);
  t = a < b & b < c;
  x = p(a(t))';  y = p(b(t))';  z = p(c(t))';
  v = S(x + y) + S(y + z) + S(x + z) - S(x) - S(y) - S(z) - S(x + y + z);
  wmmi = min (wmmi, min (v));
  cnt += numel (x);
endfunction
