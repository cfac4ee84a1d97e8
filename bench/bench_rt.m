## SPDX-License-Identifier: GPL-3.0-or-later
## bench_rt (): rt_entropy (the O(N^2) sweep of doc/rt_fast.md) against a
## plain Octave implementation of the interval dynamic programme,
## vectorised over one row per start point as a competent user would write
## it (written here), on the BTZ circle at n = 10, 30, 100; then the targets
## at sizes the peer cannot reach (its time grows as n^3): n = 1000 on the
## BTZ circle (under 40 ms), n = 10^4 on the vacuum line (under 0.5 s) and
## on the BTZ circle (under 1 s), n = 10^5 on the vacuum line (runs, O(N)
## memory).  There the agreement column compares with the package's own
## cubic DP (METHOD "dp") where it fits (n <= 1000), not a peer.
## Medians of several runs; the machine may be shared, so the load average
## is printed too, and for the targets the median CPU time of the process
## per call (both threads of the circle sweep summed), which a load does
## not inflate as it does the wall time.
function bench_rt ()
  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));
  btz = ads3_background ("thermal", "circle", "beta", 0.5, "cutoff", 1e-6);
  vac = ads3_background ("vacuum", "line", "cutoff", 1e-6);
  printf ("%-26s %7s %12s %12s %9s %12s\n", "case", "n", "holent [s]",
          "peer [s]", "ratio", "|dS|/S");
  rand ("seed", 1);
  for n = [10 30 100]
    A = cell_region (n, btz.circumference);
    t = median_time (@() rt_entropy (btz, A), 5);
    S = rt_entropy (btz, A);
    tp = median_time (@() plain_dp (btz, A), ifelse_ (n < 100, 3, 1));
    Sp = plain_dp (btz, A);
    printf ("%-26s %7d %12.5f %12.5f %9.1f %12.2e\n", "BTZ circle vs peer", n,
            t, tp, tp / t, abs (S - Sp) / abs (Sp));
  endfor
  cases = {"BTZ circle (target 0.04 s)", btz, 1000, 0.04;
           "vacuum line (target 0.5 s)", vac, 1e4, 0.5;
           "BTZ circle (target 1 s)", btz, 1e4, 1;
           "vacuum line (runs)", vac, 1e5, Inf};
  for k = 1:rows (cases)
    [nm, bg, n, target] = cases{k, :};
    span = 1e4;
    if (strcmp (bg.boundary, "circle"))
      span = bg.circumference;
    endif
    A = cell_region (n, span);
    reps = ifelse_ (n <= 1e4, 5, 1);
    [t, ~, tc] = median_time (@() rt_entropy (bg, A), reps);
    agree = "n/a";
    if (n <= 1000)
      S = rt_entropy (bg, A);
      Sd = __holent_rt__ ("entropy", "bench", "A", bg, A, "dp");
      agree = sprintf ("%.2e (DP)", abs (S - Sd) / abs (Sd));
    endif
    met = "";
    if (isfinite (target))
      met = ifelse_ (t < target, "met", "NOT met");
    endif
    printf ("%-26s %7d %12.5f %12s %9s %12s %s (CPU %.3f s)\n", nm, n, t,
            "-", "-", agree, met, tc);
  endfor
  printf ("(medians; peer = plain Octave DP vectorised per start point, O(n^3); ratio = peer / holent)\n");
  ## fixed cost of a call with one interval (issue 11: under 50 us)
  m = 2000;
  f = {@() rt_entropy (btz, [0 0.5]), @() rt_entropy (vac, [0 0.5]), ...
       @() __holent_rt__ ("entropy", "rt_entropy", "A", btz, [0 0.5])};
  t = cellfun (@(g) per_call (g, m), f);
  printf ("fixed cost of one call with one interval (median of %d): rt_entropy BTZ circle %.1f us, vacuum line %.1f us,\n",
          m, 1e6 * t(1), 1e6 * t(2));
  printf ("  gateway alone %.1f us (target < 50 us: %s)\n", 1e6 * t(3),
          ifelse_ (max (t(1:2)) < 50e-6, "met", "NOT met"));
endfunction

## n intervals, one in each of n equal cells, random position and length
function A = cell_region (n, L)
  x = L * ((0:n-1)' + 0.1 * rand (n, 1)) / n;
  A = [x, x + L / n * (0.2 + 0.6 * rand (n, 1))];
endfunction

## The interval DP in plain Octave, one vectorised row per start point:
## endpoints on two turns of the circle, T(s, m+1) = least length pairing
## the 2m points from s, where pairing s with s + 2t + 1 splits the run
## into (s+1, t) and (s+2t+2, m-1-t); all m of row s at once.  The full
## run from g+1 is the best candidate whose horizon face touches the gap
## g; S = min(Sigma(A), Sigma(A^c) + S_BH).
function S = plain_dp (bg, A)
  L = bg.circumference;
  n = rows (A);
  s0 = mod (A(:,1), L);
  [s0, o] = sort (s0);
  e0 = s0 + mod (A(o,2) - A(o,1), L);
  q = reshape ([s0, e0]', [], 1);
  N = 2 * n;
  q2 = [q; q + L];
  P = 2 * N;
  K = n;
  len = @(l) log (bg.beta_L * bg.beta_R / (pi^2 * bg.cutoff^2) ...
                  * sinh (pi * l / bg.beta_L) .* sinh (pi * l / bg.beta_R));
  T = Inf (P + 2, K + 1);
  T(:, 1) = 0;
  [tt, mm] = ndgrid (0:K-1, 1:K);          # split t, run length m
  ok = tt < mm;
  for s = P:-1:1
    mmax = min (K, floor ((P - s + 1) / 2));
    if (mmax == 0)
      continue;
    endif
    t = (0:mmax-1)';
    w = len (q2(s + 2 * t + 1) - q2(s));   # pair s with s + 2t + 1
    inner = T(s + 1, t + 1)';
    u = min (s + 2 * tt(1:mmax, 1:mmax) + 2, P + 2);
    r = mm(1:mmax, 1:mmax) - tt(1:mmax, 1:mmax);
    R = T(sub2ind (size (T), u, max (r, 1)));
    R(! ok(1:mmax, 1:mmax)) = Inf;
    T(s, 2:mmax+1) = min ((w + inner) + R, [], 1);
  endfor
  full = T(2:N+1, K + 1);
  inA = mod ((1:N)', 2) == 1;
  c6 = bg.c / 6;
  S = min (c6 * min (full(! inA)), c6 * min (full(inA)) + bg.S_BH);
endfunction

function r = ifelse_ (c, a, b)
  if (c) r = a; else r = b; endif
endfunction
