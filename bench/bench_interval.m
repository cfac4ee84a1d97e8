## SPDX-License-Identifier: GPL-3.0-or-later
## bench_interval (): interval_entropy and geodesic_length on 10^6 lengths
## against the same closed forms written as one vectorised Octave
## expression (the peer), in one run; then the fixed cost of one call of
## each wrapper (a scalar argument, median of 2000 calls) and of the
## gateway alone.  Prints n, our time (and per value), the peer's, the
## ratio ours/peer and the largest relative difference.  Targets: <= 5 ns
## a value, fixed cost < 50 us.  Medians of 7 runs; the load average is
## printed since the machine may be shared.
function bench_interval ()
  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));
  n = 1e6;
  reps = 7;
  rand ("seed", 3);
  bgs = {ads3_background("vacuum", "line", "c", 12, "cutoff", 1e-6), ...
         ads3_background("thermal", "line", "beta", 0.7, "c", 12, "cutoff", 1e-6), ...
         ads3_background("thermal", "circle", "beta", 0.7, "c", 12, "cutoff", 1e-6), ...
         ads3_background("rotating", "circle", "beta_L", 0.7, "beta_R", 0.4, "c", 12, "cutoff", 1e-6)};
  names = {"vacuum line", "thermal line", "BTZ circle (plateau)", "rotating BTZ circle"};
  printf ("%-36s %8s %11s %8s %11s %7s %10s\n", "case", "n", "holent [s]",
          "ns/val", "peer [s]", "ratio", "max rel");
  for k = 1:numel (bgs)
    bg = bgs{k};
    L = 5;
    if (strcmp (bg.boundary, "circle"))
      L = bg.circumference;
    endif
    l = L * (0.001 + 0.998 * rand (n, 1));
    f = @(x) closed_form (bg, x);
    peer = f;
    if (strcmp (bg.boundary, "circle"))
      peer = @(x) min (f (x), f (L - x) + bg.S_BH);
    endif
    [t, S] = median_time (@() interval_entropy (bg, l), reps);
    [tp, Sp] = median_time (@() peer (l), reps);
    report (["interval_entropy, " names{k}], n, t, tp, S, Sp);
    x1 = L * rand (n, 1);
    x2 = x1 + l;
    if (strcmp (bg.boundary, "circle"))
      x2 = mod (x2, L);
      gpeer = @() (6 / bg.c) * min (f (mod (x2 - x1, L)), f (L - mod (x2 - x1, L)));
    else
      gpeer = @() (6 / bg.c) * f (abs (x2 - x1));
    endif
    [t, G] = median_time (@() geodesic_length (bg, x1, x2), reps);
    [tp, Gp] = median_time (gpeer, reps);
    report (["geodesic_length, " names{k}], n, t, tp, G, Gp);
  endfor
  ## fixed cost per call
  bg = bgs{2};
  m = 2000;
  t1 = per_call (@() interval_entropy (bg, 0.5), m);
  t2 = per_call (@() geodesic_length (bg, 0.1, 0.6), m);
  t3 = per_call (@() __holent_interval__ ("entropy", "interval_entropy", bg, 0.5), m);
  t4 = per_call (@() (bg.c / 3) * log ((bg.beta / (pi * bg.cutoff)) * sinh (pi * 0.5 / bg.beta)), m);
  printf ("fixed cost of one call (median of %d): interval_entropy %.1f us, geodesic_length %.1f us,\n",
          m, 1e6 * t1, 1e6 * t2);
  printf ("  gateway alone %.1f us, the closed form typed in Octave %.1f us (target < 50 us: %s)\n",
          1e6 * t3, 1e6 * t4, ifelse_ (max (t1, t2) < 50e-6, "met", "NOT met"));
  printf ("(medians; ratio = holent / plain Octave, target <= 1; per value target <= 5 ns)\n");
endfunction

## Regulated length times c/6: the entropy of one interval in closed form
## (Calabrese and Cardy 2004; Ryu and Takayanagi 2006).
function S = closed_form (bg, l)
  switch (bg.bulk)
    case "poincare"
      S = (bg.c / 3) * log (l / bg.cutoff);
    otherwise
      ## one temperature: beta_L = beta_R = beta (Hubeny, Rangamani and
      ## Takayanagi 2007 for two)
      S = (bg.c / 6) * (log ((bg.beta_L / (pi * bg.cutoff)) * sinh (pi * l / bg.beta_L))
                        + log ((bg.beta_R / (pi * bg.cutoff)) * sinh (pi * l / bg.beta_R)));
  endswitch
endfunction

function report (nm, n, t, tp, S, Sp)
  printf ("%-36s %8d %11.4f %8.2f %11.4f %7.2f %10.2e\n", nm, n, t, 1e9 * t / n,
          tp, t / tp, max (abs (S(:) - Sp(:)) ./ max (abs (Sp(:)), 1)));
endfunction

function r = ifelse_ (c, a, b)
  if (c) r = a; else r = b; endif
endfunction
