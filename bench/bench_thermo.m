## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## bench_thermo (): btz_thermodynamics on 10^6 states (T, Omega) against the
## same closed forms written as vectorised Octave expressions, in one run.
## Prints n, both times (medians), the ratio ours/peer (target <= 1) and
## the largest relative difference.
function bench_thermo ()
  n = 1e6;
  reps = 7;
  c = 12;  L = 3;
  T = 0.05 + 2 * rand (n, 1);
  Om = 1.98 * rand (n, 1) - 0.99;
  ours = @() btz_thermodynamics ("T", T, "Omega", Om, "c", c,
                                 "circumference", L);
  [t_ours, th] = median_time (ours, reps);
  [t_peer, p] = median_time (@() peer (T, Om, c, L), reps);
  d = 0;
  for f = setdiff (fieldnames (p), {"saddle"})'
    d = max (d, max (abs (th.(f{1}) - p.(f{1})) ./ max (abs (p.(f{1})), 1e-300)));
  endfor
  printf ("load average: %s\n", strtrim (fileread ("/proc/loadavg")));
  printf ("%-28s %8s %12s %12s %8s %12s\n", "case", "n", "holent [s]",
          "octave [s]", "ratio", "max rel diff");
  printf ("%-28s %8d %12.4f %12.4f %8.2f %12.2e\n",
          "all fields from (T, Omega)", n, t_ours, t_peer, t_ours / t_peer, d);
  printf ("saddles agree: %d\n", isequal (th.saddle, p.saddle));
  printf ("(medians of %d runs each; ratio = holent / plain Octave, target <= 1)\n", reps);
endfunction

## The same outputs in plain Octave (doc/btz_thermodynamics.md).
function p = peer (T, Om, c, L)
  d = L * T ./ ((1 - Om) .* (1 + Om));
  u = d .* (1 + Om);  v = d .* (1 - Om);   # L T_L, L T_R
  TL = u / L;  TR = v / L;
  p.r_plus = (u + v) / 2;
  p.r_minus = d .* Om;                      # (u - v)/2 without cancellation
  p.M = (2 * pi / L) * c / 24 * (u.^2 + v.^2);
  p.J = c / 24 * 2 * p.r_minus .* (u + v);
  p.T = T;
  p.Omega = Om;
  p.Omega_J = 2 * pi * Om / L;
  p.T_L = TL;
  p.T_R = TR;
  p.S = pi * c / 6 * (u + v);
  p.F = -(2 * pi / L) * c / 12 * u .* v;
  p.C_Omega = p.S;
  p.C_J = pi * c / 6 * (u + v) .* u .* v ./ (u.^2 - u .* v + v.^2);
  p.horizon_length = pi * (u + v);
  p.L0 = c / 24 * (u.^2 + 1);
  p.Lbar0 = c / 24 * (v.^2 + 1);
  p.F_thermal_ads = -(2 * pi / L) * c / 12 * ones (size (T));
  s = repmat ({"thermal_ads"}, size (T));
  s(u .* v > 1) = {"btz"};
  p.saddle = s;
endfunction
