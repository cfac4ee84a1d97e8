## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn {} {} holent_demo ()
## Run the built-in demonstration scenario and print its tables.
##
## The scenario is invented for the demonstration: a CFT with c = 24 on a
## circle of circumference 2 pi (cutoff 1e-4) is heated from below to above
## the Hawking-Page temperature 1/(2 pi).  For each state the demo prints the
## bulk dual and its thermodynamics, the single-interval entropies with the
## entanglement plateau, a three-interval region and which RT configuration
## dominates, the mutual information and wedge cross section of two
## intervals across their transition, and the holographic entropy
## inequalities on a four-party configuration, and, for a black hole coupled
## to a bath (a two-sided BCFT with a brane), a Page curve as a table with
## its Page time and island.
## @end deftypefn

function holent_demo ()
  c = 24;  L = 2 * pi;  eps = 1e-4;
  printf ("holent demo: c = %g, circle of circumference %.4g, cutoff %g\n", c, L, eps);
  printf ("Hawking-Page temperature (Omega = 0): T_hp = %.4f\n\n",
          hawking_page ("circumference", L, "c", c));

  ## 1. States and their duals.
  states = {"vacuum",   {}; ...
            "heavy",    {"h", 0.5}; ...
            "thermal",  {"T", 0.1}; ...
            "thermal",  {"T", 0.5}; ...
            "rotating", {"T", 0.5, "Omega", 0.6}};
  bgs = cell (rows (states), 1);
  printf ("1. States and bulk duals\n");
  printf ("   %-9s %-18s %-14s %10s %10s %10s\n", "state", "parameters", "bulk",
          "M", "J", "S_BH");
  for k = 1:rows (states)
    bgs{k} = ads3_background (states{k,1}, "circle", "c", c, "cutoff", eps,
                              states{k,2}{:});
    printf ("   %-9s %-18s %-14s %10.4f %10.4f %10.4f\n", states{k,1},
            params_str (states{k,2}), bgs{k}.bulk, bgs{k}.M, bgs{k}.J, bgs{k}.S_BH);
  endfor

  ## 2. BTZ thermodynamics across the transition.
  T = [0.1 0.15 0.2 0.3 0.5];
  th = btz_thermodynamics ("T", T, "Omega", zeros (size (T)), "c", c,
                           "circumference", L);
  printf ("\n2. BTZ thermodynamics (Omega = 0) and the dominant saddle\n");
  printf ("   %8s %10s %10s %10s %12s %12s  %s\n", "T", "M", "S", "C_J", "F_btz",
          "F_thermalAdS", "saddle");
  for k = 1:numel (T)
    printf ("   %8.3f %10.4f %10.4f %10.4f %12.4f %12.4f  %s\n", T(k), th.M(k),
            th.S(k), th.C_J(k), th.F(k), th.F_thermal_ads(k), th.saddle{k});
  endfor

  ## 3. Single intervals and the plateau.
  l = L * [0.05 0.25 0.5 0.75 0.95 0.999];
  printf ("\n3. Single-interval RT entropy S(l)  (* = surface round the complement,\n   plus the horizon where there is one: the entanglement plateau of BTZ)\n");
  printf ("   %-24s", "l / L");  printf ("%10.3f", l / L);  printf ("\n");
  for k = 1:numel (bgs)
    [S, br] = interval_entropy (bgs{k}, l);
    printf ("   %-24s", sprintf ("%s (%s)", states{k,1}, bgs{k}.bulk));
    for j = 1:numel (l)
      printf ("%9.3f%s", S(j), merge (br(j), "*", " "));
    endfor
    printf ("\n");
  endfor

  ## 4. A three-interval region: the minimising configuration.
  A = [0.3 1.2; 1.5 2.9; 3.1 5.6];
  printf ("\n4. Region A = [0.3,1.2] u [1.5,2.9] u [3.1,5.6]: dominant RT surface\n");
  printf ("   %-24s %10s  %-8s %s\n", "state", "S(A)", "horizon", "geodesics (boundary points)");
  for k = 1:numel (bgs)
    [S, conf] = rt_entropy (bgs{k}, A);
    g = "";
    for j = 1:rows (conf.pair_coords)
      g = [g sprintf("(%.1f,%.1f) ", conf.pair_coords(j,1), conf.pair_coords(j,2))];
    endfor
    printf ("   %-24s %10.3f  %-8s %s\n", sprintf ("%s (%s)", states{k,1}, bgs{k}.bulk),
            S, merge (conf.horizon, "yes", "no"), g);
  endfor

  ## 5. Two intervals on the thermal line: I(A:B) and E_W across the transition.
  bl = ads3_background ("thermal", "line", "T", 0.5, "c", c, "cutoff", eps);
  d = [0.05 0.1 0.2 0.3 0.4 0.6 1.0];
  printf ("\n5. Thermal line (T = 0.5): A = [0, 1], B = [1 + d, 2 + d]\n");
  printf ("   %8s %12s %12s %12s  %s\n", "d", "I(A:B)", "E_W", "S_R = 2E_W", "wedge");
  for k = 1:numel (d)
    B = [1 + d(k), 2 + d(k)];
    I = mutual_information (bl, [0 1], B);
    [E, info] = wedge_cross_section (bl, [0 1], B);
    printf ("   %8.2f %12.4f %12.4f %12.4f  %s\n", d(k), I, E, 2 * E, info.phase);
  endfor

  ## 6. Entropy inequalities on four adjacent arcs of the BTZ circle.
  P = {[0 1], [1.2 2.5], [2.7 3.3], [3.6 5.5]};
  Svec = entropy_vector (bgs{4}, P);
  rep = entropy_inequalities (Svec);
  printf ("\n6. Holographic entropy inequalities, 4 arcs on the BTZ circle (T = 0.5)\n");
  fams = {"sa", "al", "ssa", "wm", "mmi", "cyclic"};
  names = {"subadditivity", "Araki-Lieb", "strong subadditivity", ...
           "weak monotonicity", "monogamy of MI", "cyclic"};
  printf ("   %-22s %10s %6s %14s\n", "family", "instances", "holds", "min(lhs-rhs)");
  for k = 1:numel (fams)
    if (isfield (rep, fams{k}))
      r = rep.(fams{k});
      printf ("   %-22s %10d %6s %14.4g\n", names{k}, r.count,
              merge (r.holds, "yes", "NO"), r.worst_value);
    endif
  endfor

  ## 7. A black hole coupled to a bath (two-sided BCFT): the Page curve.
  bt = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.9,
                        "c", c, "cutoff", eps);
  R = [1.5 Inf];
  t = [0 0.5 1 1.5 2 2.5 3 4 6];
  [S, info] = page_curve (bt, R, t);
  printf ("\n7. Page curve: radiation R = [1.5, Inf) on both sides of a two-sided BCFT\n");
  printf ("   (beta = 2, brane tension T = 0.9, log g = %.3f); Page time %.4f\n",
          bt.log_g(1), info.page_time);
  printf ("   %8s %12s %12s  %s\n", "t", "S(R)", "no island", "phase");
  for k = 1:numel (t)
    printf ("   %8.2f %12.4f %12.4f  %s\n", t(k), S(k), info.S_no_island(k), info.phase{k});
  endfor
  printf ("   island edge on the brane at (x, z) = (%.4f, %.4f)\n", info.island(1,:));

  ## 8. Time: a global quench and the two-sided black hole (invented
  ## scenario, for the demo only).
  q = ads3_background ("quench", "line", "beta", 1, "c", 12, "cutoff", 1e-6);
  A = [0 2; 2.5 3.5];
  ts = [-0.5 0 0.25 0.5 0.75 1 1.5 2];
  Sq = rt_entropy (q, A, "t", ts);
  Iq = mutual_information (q, A(1,:), A(2,:), "t", ts);
  printf ("\n8. Global quench (beta = 1, c = 12): two intervals [0,2], [2.5,3.5]\n");
  printf ("   %8s %12s %12s\n", "t", "S(A)", "I(A1:A2)");
  printf ("   %8.2f %12.4f %12.4f\n", [ts; Sq; Iq]);
  tfd = ads3_background ("tfd", "line", "beta", 1, "c", 12, "cutoff", 1e-6);
  R = struct ("left", [0 2], "right", [0 2]);
  tt = [0 0.25 0.5 0.75 1 1.25];
  [St, conf] = rt_entropy (tfd, R, "t", tt);
  printf ("   two-sided S(A_L u A_R), A = [0, 2] on both sides; mutual information\n");
  printf ("   vanishes at t = %.4f\n", mi_vanishing_time (tfd, R));
  printf ("   %8s %12s %10s\n", "t", "S", "bridges");
  printf ("   %8.2f %12.4f %10d\n", [tt; St; conf.crossings]);
  sh = ads3_background ("tfd", "line", "beta", 1, "c", 12, "cutoff", 1e-6,
                        "shock_energy", 1e-6, "shock_time", 0);
  [tstar, astar] = scrambling_time (sh, R);
  printf ("   scrambling: a shock of energy density 1e-6 kills I(A_L:A_R) when sent at\n");
  printf ("   t_w = %.4f (shift alpha* = %.4f)\n", tstar, astar);
endfunction

function s = params_str (p)
  s = "";
  for j = 1:2:numel (p)
    s = [s sprintf("%s=%g ", p{j}, p{j+1})];
  endfor
endfunction

%!test
%! s = evalc ("holent_demo ()");
%! assert (! isempty (strfind (s, "btz")));
%! assert (! isempty (strfind (s, "thermal_ads")));
%! assert (! isempty (strfind (s, "connected")));
%! assert (isempty (strfind (s, " NO ")));
%! assert (! isempty (strfind (s, "Page time")));
%! assert (! isempty (strfind (s, "Global quench")));
%!error <called with too many inputs> holent_demo (1)
