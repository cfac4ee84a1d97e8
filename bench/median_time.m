## SPDX-License-Identifier: GPL-3.0-or-later
## [t, out] = median_time (f, reps): median wall time of reps calls of f
## after one warm-up call, and the last result.  Shared by the benchmarks
## (the machine may be shared: medians, not minima).
function [t, out] = median_time (f, reps)
  out = f ();  # warm up
  ts = zeros (reps, 1);
  for r = 1:reps
    t0 = tic ();
    out = f ();
    ts(r) = toc (t0);
  endfor
  t = median (ts);
endfunction
