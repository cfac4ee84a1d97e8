## SPDX-License-Identifier: GPL-3.0-or-later
## Strips after a global quench in Vaidya-AdS_5 (d = 4, final brane zh = 1,
## G = ell = 1).  Independent references, derived here from the metric
## ds^2 = (1/z^2)(-f(v,z) dv^2 - 2 dv dz + dx^2), f = 1 - s(v) z^4:
##  * the area functional z^(1-d) sqrt(1 - f v'^2 - 2 v' z') has the
##    conserved quantity z^(1-d)/sqrt(Q) = z*^(1-d); its Euler-Lagrange
##    equations are integrated with ode45 and the tip (z*, v*) is found
##    with fminsearch (a smooth shell, s = (1 + tanh(v/w))/2);
##  * limits: the vacuum strip before the quench, the static brane strip
##    after saturation (strip_entropy of the brane, itself checked against
##    series and integrals), the early growth dS = (pi/(d-1)) E A t^2 of
##    Liu and Suh 2014 (PRD 89, 066012), and the growth rate v_E s A in the
##    linear regime (Liu and Suh 2014, PRL 112, 011601).

%!function dy = vrhs_ (x, y, zs, w)
%!  ## the Euler-Lagrange equations of z^(1-d) sqrt(Q), d = 4, with
%!  ## sqrt(Q) = (z*/z)^(d-1) used for the area
%!  d = 4;
%!  z = y(1); v = y(2); zp = y(3); vp = y(4);
%!  s = 0.5 * (1 + tanh (v / w));  sp = 0.5 * (1 - tanh (v / w)^2) / w;
%!  f = 1 - s * z^4;  fz = -4 * s * z^3;  fv = -sp * z^4;
%!  Q = 1 - f * vp^2 - 2 * vp * zp;
%!  vpp = (d - 1) * Q / z + 0.5 * fz * vp^2;
%!  zpp = -f * vpp - fz * zp * vp - 0.5 * fv * vp^2;
%!  ## K = J - z^(2-d)/(d-2), J the area: finite at the boundary
%!  dy = [zp; vp; zpp; vpp; ((zs/z)^(d-1) + zp) / z^(d-1)];
%!endfunction

%!function [lh, tb, jf] = ode45_shot_ (zs, vs, w)
%!  ## shot from the tip to z = 0.05 z* with ode45, then the near-boundary
%!  ## asymptotics (errors O((z/z*)^6) here)
%!  d = 4;  ze = 0.05 * zs;
%!  warning ("off", "all", "local");   # ode45 notes the event stop
%!  opt = odeset ("RelTol", 1e-11, "AbsTol", 1e-13,
%!                "Events", @(x, y) deal (y(1) - ze, 1, -1));
%!  [x, y] = ode45 (@(x, y) vrhs_ (x, y, zs, w), [0 50 * zs],
%!                  [zs; vs; 0; 0; -zs^(2-d) / (d - 2)], opt);
%!  x = x(end);  y = y(end,:);  ze = y(1);
%!  m = 0.5 * (1 + tanh ((y(2) + ze) / w));
%!  lh = x + ze^d / (d * zs^(d-1));
%!  tb = y(2) + ze + m * ze^(d+1) / (d + 1);
%!  jf = y(5) + 0.25 * m * ze^2;
%!endfunction

%!test
%! ## a smooth shell (w = 0.2): holent's tip, checked by ode45 shots of the
%! ## equations above: fzero on z* (v* kept) recovers the width, and the
%! ## boundary time and the finite area agree
%! w = 0.2;  l = 1.2;  t = 0.6;
%! bg = ads_background (4, "vaidya", "zh", 1, "shell_width", w);
%! [S, info] = strip_entropy (bg, l, "t", t);
%! vs = info.v_star;
%! zs = fzero (@(z) 2 * ode45_shot_ (z, vs, w) - l, info.z_star * [0.98 1.02],
%!             optimset ("TolX", 1e-12));
%! assert (zs, info.z_star, 1e-5);
%! [lh, tb, jf] = ode45_shot_ (zs, vs, w);
%! assert (tb, t, 5e-6);               # ode45 at RelTol 1e-11
%! assert (info.finite, 2 * jf / 4, 5e-6);

%!test
%! ## limits of a thin-shell quench: vacuum before t = 0, the static brane
%! ## strip after saturation, early growth (pi/(d-1)) E A t^2
%! warning ("off", "holent:cutoff", "local");
%! bg = ads_background (4, "vaidya", "zh", 1);
%! bv = ads_background (4, "vacuum");
%! bb = ads_background (4, "black_brane", "zh", 1);
%! l = 1.5;
%! t = [-0.3 0.01 0.02 0.03 2.5 4];
%! [S, info] = strip_entropy (bg, l, "t", t);
%! [~, iv] = strip_entropy (bv, l);
%! [~, ib] = strip_entropy (bb, l);
%! assert (info.finite(1), iv.finite, 1e-9);
%! assert (info.finite(5:6), ib.finite * [1 1], 1e-8);
%! c = pi / 3 * bg.energy_density * 2;            # A = 2 Lperp^(d-2), Lperp = 1
%! g = (info.finite(2:4) - iv.finite) ./ (c * t(2:4).^2);
%! assert (abs (g - 1) < 0.05);
%! assert (all (diff (info.finite(2:end)) >= -1e-12));  # grows, then saturates

%!test
%! ## linear regime of a wide strip: the slope tends to v_E s A (from below)
%! bg = ads_background (4, "vaidya", "zh", 1);
%! [~, info] = strip_entropy (bg, 5, "t", [1.4 1.6]);
%! slope = diff (info.finite) / 0.2;
%! vsA = entanglement_velocity (bg) * bg.entropy_density * 2;
%! assert (slope < vsA * 1.001 && slope > 0.85 * vsA);

%!test
%! ## wide strips (issue 14): l = 6 in d = 3, l = 4 and 6 in d = 4, from the
%! ## vacuum to saturation.  Checks: the vacuum strip for t <= 0 and the
%! ## static brane strip after saturation (strip_entropy of the vacuum and
%! ## of the brane); the growth rate in the linear regime tends to
%! ## v_E s A from below (Liu and Suh 2014, PRL 112, 011601; v_E from
%! ## entanglement_velocity, checked there against their closed form);
%! ## S(t) never decreases and is continuous at the one change of branch
%! ## (a swallow tail: the early surface crosses the static one; its rise
%! ## over a time step is at most the rate v_E s A times the step).
%! for c = {{3, 6, [-0.1 2.5 3.5 3.9 4.02 4.06 4.1 4.14 4.2 5]}, ...
%!          {4, 4, [-0.1 2.4 3.2 3.36 3.38 3.4 3.42 3.44 3.5 4.5]}, ...
%!          {4, 6, [-0.1 3.5 4.5 4.96 4.98 5.0 5.02 5.04 5.2 6]}}
%!   [d, l, t] = deal (c{1}{:});
%!   bg = ads_background (d, "vaidya", "zh", 1);
%!   [S, info] = strip_entropy (bg, l, "t", t);
%!   [~, iv] = strip_entropy (ads_background (d, "vacuum"), l);
%!   [~, ib] = strip_entropy (ads_background (d, "black_brane", "zh", 1), l);
%!   assert (info.finite(1), iv.finite, 1e-10);
%!   assert (info.finite(end), ib.finite, 1e-10);
%!   rate = entanglement_velocity (bg) * bg.entropy_density * 2;
%!   slope = diff (info.finite(2:3)) / diff (t(2:3));
%!   assert (slope < rate * 1.0005 && slope > 0.97 * rate, sprintf ("d = %d, l = %g: slope %g, v_E s A %g", d, l, slope, rate));
%!   assert (all (diff (info.finite) >= -1e-10));
%!   k = find (info.jump);
%!   assert (numel (k), 1);
%!   assert (info.finite(k), ib.finite, 1e-10);
%!   assert (info.finite(k) - info.finite(k-1) <= rate * (t(k) - t(k-1)) * 1.0001);
%!   assert (info.finite(k-1) < ib.finite);
%! endfor

%!error <give the boundary times> strip_entropy (ads_background (4, "vaidya", "zh", 1), 1)
%!error <needs a quench> strip_entropy (ads_background (4, "black_brane", "zh", 1), 1, "t", 1)
%!error <shell_width must be nonnegative> ads_background (4, "vaidya", "zh", 1, "shell_width", -1)

%!test
%! ## a tabulated final state (issue 14): the brane f = 1 - z^4 given as
%! ## samples rounded to 10 digits gives the quench of the analytic brane
%! ## (itself checked against ode45 above) within the data's accuracy
%! z = linspace (0, 1.3, 2001)';
%! f = round ((1 - z.^4) * 1e10) / 1e10;
%! bt = ads_background (4, "vaidya", "z", z, "f", f);
%! bb = ads_background (4, "vaidya", "zh", 1);
%! assert (bt.kind, "vaidya");
%! assert (bt.final, "tabulated");
%! t = [-0.1 0.2 0.5 0.9 1.5];
%! [St, it] = strip_entropy (bt, 1, "t", t);
%! [Sb, ib] = strip_entropy (bb, 1, "t", t);
%! assert (it.finite, ib.finite, 1e-6);
%! assert (it.z_star, ib.z_star, 1e-6);
%! ## saturation: the static strip of the tabulated final state
%! [~, is] = strip_entropy (rmfield (setfield (bt, "kind", "tabulated"), {"final", "shell_width"}), 1);
%! assert (it.finite(end), is.finite, 1e-9);

%!test
%! ## d = 2 (AdS3): the thin-shell quench of an interval against the AdS3
%! ## quench of ads3_background/interval_entropy, an independent code: its
%! ## closed forms match vacuum and BTZ geodesics across the shell
%! ## (Balasubramanian et al. 2011, PRD 84, 026010; Abajo-Arrastia, Aparicio
%! ## and Lopez 2010, JHEP 11 (2010) 149; doc/quench.md), ours shoot the
%! ## Euler-Lagrange equations.  Conventions: zh = beta/(2 pi) (f = 1 -
%! ## z^2/zh^2 is planar BTZ), the same G (c = 3/(2G)) and cutoff; the
%! ## divergence (c/3) log(1/eps) is subtracted alike, so the finite parts
%! ## and S(t) - S(t < 0) are compared.  Saturation at t = l/2 (unit
%! ## entanglement velocity in d = 2).
%! warning ("off", "holent:cutoff", "local");
%! b = 1;  eps = 1e-6;  l = 0.7;
%! bg = ads_background (2, "vaidya", "zh", b / (2*pi), "cutoff", eps);
%! q = ads3_background ("quench", "line", "beta", b, "G", 1, "cutoff", eps);
%! t = [-0.2 0.01 0.05 0.1 0.15 0.2 0.25 0.3 0.34 0.349 0.35 0.5];
%! [S, info] = strip_entropy (bg, l, "t", t);
%! S3 = interval_entropy (q, l, "t", t);
%! assert (info.divergence, log (1 / eps) / 2, 1e-14);
%! assert (info.finite, S3 - info.divergence, 1e-8);
%! assert (S - S(1), S3 - S3(1), 1e-8);
%! ## the limits, from the AdS3 module's vacuum and thermal states
%! Sv = interval_entropy (ads3_background ("vacuum", "line", "G", 1, "cutoff", eps), l);
%! Sb = interval_entropy (ads3_background ("thermal", "line", "beta", b, "G", 1, "cutoff", eps), l);
%! assert (info.finite([1 end]), [Sv Sb] - info.divergence, 1e-9);
%! assert (all (diff (info.finite) > 0) || t(end-1) >= l/2);
%! ## and the static interval of the final state (planar BTZ)
%! [~, is] = strip_entropy (ads_background (2, "black_brane", "zh", b / (2*pi), "cutoff", eps), l);
%! assert (is.finite, Sb - is.divergence, 1e-9);
%! ## BTZ as 10-digit samples (to 3 zh: the early surfaces reach z* = l/2)
%! zh = b / (2*pi);  z = linspace (0, 3 * zh, 3001)';
%! bt = ads_background (2, "vaidya", "z", z, "f", round ((1 - (z / zh).^2) * 1e10) / 1e10, "cutoff", eps);
%! [~, it] = strip_entropy (bt, l, "t", t([2 6 9]));
%! assert (it.finite, S3([2 6 9]) - info.divergence, 1e-8);
