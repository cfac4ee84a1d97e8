## SPDX-License-Identifier: GPL-3.0-or-later
## t = per_call (f, m): median wall time of one call of F over M calls
## (after one warm-up call): the fixed cost of a function per call.
function t = per_call (f, m)
  f ();
  ts = zeros (m, 1);
  for r = 1:m
    t0 = tic ();
    f ();
    ts(r) = toc (t0);
  endfor
  t = median (ts);
endfunction
