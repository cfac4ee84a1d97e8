## SPDX-License-Identifier: GPL-3.0-or-later
## [t, out, tc] = median_time (f, reps): median wall time of reps calls of
## f after one warm-up call, the last result, and the median CPU time of
## the process per call (all threads; on a loaded machine the wall time
## also holds the waits for a core).  Shared by the benchmarks (the
## machine may be shared: medians, not minima).
function [t, out, tc] = median_time (f, reps)
  out = f ();  # warm up
  ts = zeros (reps, 1);
  cs = zeros (reps, 1);
  for r = 1:reps
    c0 = cputime ();
    t0 = tic ();
    out = f ();
    ts(r) = toc (t0);
    cs(r) = cputime () - c0;
  endfor
  t = median (ts);
  tc = median (cs);
endfunction
