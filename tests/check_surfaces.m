## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of rt_surface and surface_profile: the sampled curves
## against the metric (their lengths, integrated here along the samples,
## against the regulated lengths), the Poincare-disk geometry, the
## boundary endpoints and orthogonality, and the strip/ball profiles
## against the turning points and sizes of strip_entropy/ball_entropy.

%!## Proper length of a sampled curve cut where its areal radius reaches
%!## rcut; metric (r, phi, t): ds^2 = -N2 dt^2 + dr^2/N2 + r^2 (dphi - W dt)^2
%!## with N2 = (r^2 - rp^2)(r^2 - rm^2)/r^2 + defect term, W = rp rm/r^2.
%!function len = curve_length (r, ph, t, rp, rm, a2, rcut)
%!  keep = r <= rcut;
%!  k = find (keep);
%!  ## cut the first and last segments at r = rcut by linear interpolation
%!  i0 = k(1);  i1 = k(end);
%!  f0 = (rcut - r(i0)) / (r(i0-1) - r(i0));
%!  f1 = (rcut - r(i1)) / (r(i1+1) - r(i1));
%!  P = [r ph t];
%!  P = [P(i0,:) + f0 * (P(i0-1,:) - P(i0,:)); P(i0:i1,:); P(i1,:) + f1 * (P(i1+1,:) - P(i1,:))];
%!  ## Simpson on each straight segment in (log r, phi, t)
%!  len = 0;
%!  for j = 1:rows (P) - 1
%!    A = P(j,:);  B = P(j+1,:);
%!    g = @(u) seg (A, B, u, rp, rm, a2);
%!    len += (g (0) + 4 * g (0.5) + g (1)) / 6;
%!  endfor
%!endfunction

%!function v = seg (A, B, u, rp, rm, a2)
%!  lr = log (A(1)) + u * (log (B(1)) - log (A(1)));
%!  r = exp (lr);
%!  d = [(log (B(1)) - log (A(1))) * r, B(2) - A(2), B(3) - A(3)];
%!  N2 = (r^2 - rp^2) * (r^2 - rm^2) / r^2 + a2;
%!  W = rp * rm / r^2;
%!  v = sqrt (d(1)^2 / N2 + r^2 * (d(2) - W * d(3))^2 - N2 * d(3)^2);
%!endfunction

%!test
%! ## Global AdS: in the Poincare disk every geodesic is a circle orthogonal
%! ## to the unit circle, |centre|^2 = 1 + radius^2 (common practice), and
%! ## it ends at the region's endpoints.
%! bg = ads3_background ("vacuum", "circle");
%! s = rt_surface (bg, [0.3 1.1; 2 4.5], "tol", 1e-6);
%! for k = 1:numel (s.curves)
%!   c = s.curves{k};
%!   ## circle through three samples
%!   P = c([2, round(end/2), end-1], :);
%!   M = [2 * (P(2,:) - P(1,:)); 2 * (P(3,:) - P(1,:))];
%!   b = [sumsq(P(2,:)) - sumsq(P(1,:)); sumsq(P(3,:)) - sumsq(P(1,:))];
%!   ctr = (M \ b)';  rad = hypot (P(1,1) - ctr(1), P(1,2) - ctr(2));
%!   assert (hypot (c(:,1) - ctr(1), c(:,2) - ctr(2)), rad * ones (rows (c), 1), 1e-9);
%!   assert (sumsq (ctr), 1 + rad^2, 1e-9);
%!   ph = 2 * pi * s.endpoints(s.pairs(k,:)) / bg.circumference;
%!   ends = [cos(ph(:)) sin(ph(:))];
%!   assert (sortrows (c([1 end], :)), sortrows (ends), 1e-14);
%! endfor

%!test
%! ## Orthogonality at the boundary: the first and last chords are radial
%! ## (disk) or vertical (half plane) up to the sampling tolerance
%! ## (common practice: geodesics meet the AdS boundary at right angles).
%! tol = 1e-5;
%! for b = {{"vacuum", "line"}, {"thermal", "line", "beta", 1}, ...
%!          {"thermal", "circle", "beta", 2}, {"heavy", "circle", "alpha", 0.6}, ...
%!          {"rotating", "line", "beta", 1, "Omega", 0.4}}
%!   bg = ads3_background (b{1}{:});
%!   s = rt_surface (bg, [0.5 2.5], "tol", tol);
%!   c = s.curves{1}(:, 1:2);
%!   for e = [1 2; rows(c) rows(c)-1]'
%!     d = c(e(2),:) - c(e(1),:);
%!     if (strcmp (s.picture, "disk"))
%!       nrm = c(e(1),:);
%!     else
%!       nrm = [0 1];
%!     endif
%!     assert (abs (d(1) * nrm(2) - d(2) * nrm(1)) / norm (d) < 1e-2);
%!   endfor
%! endfor

%!test
%! ## The length of the sampled curve, integrated along it with the metric
%! ## of the slice, is the regulated geodesic length (closed forms:
%! ## Ryu and Takayanagi 2006, PRL 96, 181602; Hubeny, Rangamani and
%! ## Takayanagi 2007, JHEP 07, 062 for rotating BTZ, from memory).
%! eps = 1e-4;  L = 2 * pi;
%! cases = {{"thermal", "circle", "beta", 1.3}, ...
%!          {"thermal", "circle", "beta", 0.5}, ...
%!          {"rotating", "circle", "beta", 0.8, "Omega", 0.5}, ...
%!          {"heavy", "circle", "alpha", 0.5}, ...
%!          {"vacuum", "circle"}};
%! for k = 1:numel (cases)
%!   bg = ads3_background (cases{k}{:}, "cutoff", eps);
%!   for A = [1 2.2; 1 5.5]'
%!     s = rt_surface (bg, A', "tol", 1e-7);
%!     if (s.horizon || numel (s.curves) != 1 || rows (s.curves{1}) < 10)
%!       continue;    # plateau or the path through the apex: not a geodesic
%!     endif
%!     c = s.curves{1};
%!     if (columns (c) < 3)
%!       c(:,3) = 0;
%!     endif
%!     R = hypot (c(:,1), c(:,2));
%!     ph = unwrap (atan2 (c(:,2), c(:,1)));
%!     r = 2 * R ./ (1 - R.^2);
%!     rp = 0;  rm = 0;  a2 = 1;
%!     if (bg.horizon)
%!       rp = (L/2) * (1/bg.beta_L + 1/bg.beta_R);
%!       rm = (L/2) * (1/bg.beta_L - 1/bg.beta_R);
%!       a2 = 0;
%!     elseif (strcmp (bg.bulk, "conical_defect"))
%!       r = bg.alpha * r;  a2 = bg.alpha^2;
%!     endif
%!     len = curve_length (r, ph, c(:,3), rp, rm, a2, 1 / eps);
%!     ## the minimiser may be the geodesic round the other side: s.arcs
%!     assert (len, geodesic_length (bg, 0, s.arcs, "class", "positive"), 2e-6);
%!   endfor
%! endfor

%!test
%! ## The same on the line: planar BTZ (z = 1/r), rotating planar BTZ and
%! ## Poincare, lengths against the closed forms (eps small enough that the
%! ## scheme-dependent O(eps^2 r_+^2) terms stay below the tolerance).
%! eps = 1e-5;
%! for b = {{"vacuum", "line"}, {"thermal", "line", "beta", 0.7}, ...
%!          {"rotating", "line", "beta", 1, "Omega", -0.6}}
%!   bg = ads3_background (b{1}{:}, "cutoff", eps);
%!   s = rt_surface (bg, [-0.4 1.9], "tol", 1e-7);
%!   c = s.curves{1};
%!   if (columns (c) < 3)
%!     c(:,3) = 0;
%!   endif
%!   rp = 0;  rm = 0;
%!   if (bg.horizon)
%!     rp = pi * (1/bg.beta_L + 1/bg.beta_R);
%!     rm = pi * (1/bg.beta_L - 1/bg.beta_R);
%!   endif
%!   len = curve_length (1 ./ c(:,2), c(:,1), c(:,3), rp, rm, 0, 1 / eps);
%!   assert (len, geodesic_length (bg, -0.4, 1.9), -3e-7);   # sampling-limited
%! endfor

%!test
%! ## The horizon joins the surface on the plateau of a BTZ circle
%! ## (Hubeny, Maxfield, Rangamani and Tonni 2013, JHEP 08, 092, from
%! ## memory): the runner-up of a large interval is the geodesic alone.
%! bg = ads3_background ("thermal", "circle", "beta", 1);
%! l = 2 * pi * 0.99;
%! s = rt_surface (bg, [0 l]);
%! assert (s.horizon);
%! R = hypot (s.horizon_curve(:,1), s.horizon_curve(:,2));
%! rp = 2 * pi / 1;
%! assert (R, rp / (1 + sqrt (1 + rp^2)) * ones (size (R)), 1e-14);
%! assert (s.S, (1/6) * geodesic_length (bg, l, 2*pi, "class", "positive") + bg.S_BH, 1e-9);
%! r = rt_surface (bg, [0 l], "configuration", "runner_up");
%! assert (! r.horizon);
%! assert (r.S, (1/6) * geodesic_length (bg, 0, l, "class", "positive"), 1e-9);
%! assert (r.S > s.S);

%!test
%! ## Runner-up against a brute force written here: every pairing of the
%! ## four endpoints of two intervals on a BTZ circle, with the horizon in
%! ## any face (Headrick 2010, PRD 82, 126010 for the candidates).
%! bg = ads3_background ("thermal", "circle", "beta", 1.1, "c", 6);
%! A = [0.2 1.5; 2.5 4.1];
%! p = sort (A(:))';  L = 2*pi;
%! g = @(a) geodesic_length (bg, 0, a, "class", "positive");
%! vals = [];
%! for pr = {[1 2; 3 4], [1 4; 2 3]}
%!   P = pr{1};
%!   for k = 1:4     # face named by the boundary segment k (p(k), p(k+1))
%!     len = 0;
%!     for i = 1:2
%!       d = p(P(i,2)) - p(P(i,1));
%!       inside = k >= P(i,1) && k < P(i,2);
%!       len += g (merge (inside, L - d, d));
%!     endfor
%!     vals(end+1) = len + merge (mod (k, 2) == 1, bg.S_BH, 0);
%!   endfor
%! endfor
%! vals = unique (round (vals * 1e9) / 1e9);
%! s = rt_surface (bg, A);
%! r = rt_surface (bg, A, "configuration", "runner_up");
%! assert (s.S, vals(1), 1e-8);
%! assert (r.S, vals(2), 1e-8);

%!test
%! ## Strip profiles: z* at the centre (strip_entropy's root finder), the
%! ## ends at x = -l/2, l/2 (its width quadrature), and the vacuum first
%! ## integral x(z) (Ryu and Takayanagi 2006, JHEP 08, 045) checked with
%! ## Octave's integral.
%! for bgc = {ads_background(3, "vacuum"), ads_background(4, "black_brane", "zh", 1)}
%!   bg = bgc{1};
%!   [~, i] = strip_entropy (bg, [0.7 1.8]);
%!   p = surface_profile (bg, "strip", [0.7 1.8], "tol", 1e-6);
%!   for k = 1:2
%!     [zm, j] = max (p(k).z);
%!     assert (zm, i.z_star(k), 1e-12);
%!     assert (p(k).x(j), 0);
%!     assert (p(k).x([1 end])', [-1 1] * p(k).size / 2, 1e-7);
%!   endfor
%! endfor
%! bg = ads_background (4, "vacuum");
%! p = surface_profile (bg, "strip", 1, "tol", 1e-6);
%! zs = p.top;  d = 4;
%! k = find (p.z > 0.2 & p.x > 0);
%! for j = k(1:10:end)'
%!   xz = integral (@(u) (u/zs).^(d-1) ./ sqrt (1 - (u/zs).^(2*d-2)), p.z(j), zs);
%!   assert (p.x(j), xz, 1e-7);
%! endfor

%!test
%! ## Ball profiles: the tip depth of ball_entropy at r = 0 and the radius
%! ## at the boundary, in a black brane and a tabulated blackening.
%! bg = ads_background (4, "black_brane", "zh", 1);
%! [~, ib] = ball_entropy (bg, [0.6 2]);
%! p = surface_profile (bg, "ball", [0.6 2], "tol", 1e-6);
%! for k = 1:2
%!   assert (p(k).z(1), ib.z_star(k), 1e-12);
%!   assert (p(k).x(end), p(k).size, 1e-6);
%!   assert (all (diff (p(k).x) >= 0) && all (diff (p(k).z) < 0));
%! endfor

%!test
%! ## Boosted intervals (endpoints at different times): the lengths of the
%! ## sampled curves, integrated here with the metric including dt, against
%! ## the two-point functions of the boundary theory (common practice;
%! ## Hubeny, Rangamani and Takayanagi 2007, JHEP 07, 062, from memory):
%! ## Poincare log((dx^2 - dt^2)/eps^2), planar BTZ
%! ## log((beta/(pi eps))^2 sinh(pi (dx - dt)/beta) sinh(pi (dx + dt)/beta)),
%! ## global AdS (L = 2 pi) log((2/eps^2) (cos dt - cos dx)).
%! eps = 1e-5;  beta = 0.7;
%! P1 = [-0.4 0.1];  P2 = [1.9 0.9];  dx = 2.3;  dt = 0.8;
%! c = geodesic_curve (ads3_background ("vacuum", "line"), P1, P2, "tol", 1e-7){1};
%! len = curve_length (1 ./ c(:,2), c(:,1), c(:,3), 0, 0, 0, 1 / eps);
%! assert (len, log ((dx^2 - dt^2) / eps^2), -3e-7);
%! c = geodesic_curve (ads3_background ("thermal", "line", "beta", beta), P1, P2, "tol", 1e-7){1};
%! len = curve_length (1 ./ c(:,2), c(:,1), c(:,3), 2 * pi / beta, 0, 0, 1 / eps);
%! ref = log ((beta / (pi * eps))^2 * sinh (pi * (dx - dt) / beta) * sinh (pi * (dx + dt) / beta));
%! assert (len, ref, -3e-7);
%! c = geodesic_curve (ads3_background ("vacuum", "circle"), [1 0.2], [2.5 -0.3], "tol", 1e-7){1};
%! R = hypot (c(:,1), c(:,2));
%! len = curve_length (2 * R ./ (1 - R.^2), unwrap (atan2 (c(:,2), c(:,1))), c(:,3), 0, 0, 1, 1 / eps);
%! assert (len, log ((2 / eps^2) * (cos (0.5) - cos (1.5))), -3e-7);

%!test
%! ## Regions with endpoint times (n x 4) in the eight static bulks: the
%! ## curves of the minimiser, integrated here with the metric (dt
%! ## included), add up to its regulated length (6/c) S (Hubeny, Rangamani
%! ## and Takayanagi 2007, JHEP 07, 062); each starts and ends at its
%! ## endpoints with their times.
%! eps = 1e-5;  L = 2 * pi;
%! cases = {{"vacuum", "line"}, {"thermal", "line", "beta", 0.9}, ...
%!          {"rotating", "line", "beta", 1, "Omega", 0.3}, {"vacuum", "circle"}, ...
%!          {"thermal", "circle", "beta", 1.2}, {"thermal", "circle", "beta", 9}, ...
%!          {"rotating", "circle", "beta", 1, "Omega", -0.4}, {"heavy", "circle", "alpha", 0.6}};
%! A = [0.5 2.1 0.1 0.6; 2.6 3.4 0.3 0.1];
%! bulks = {};
%! for k = 1:numel (cases)
%!   bg = ads3_background (cases{k}{:}, "cutoff", eps);
%!   bulks{end+1} = bg.bulk;
%!   s = rt_surface (bg, A, "tol", 1e-6);
%!   circle = strcmp (s.picture, "disk");
%!   len = 0;
%!   for q = 1:numel (s.curves)
%!     c = s.curves{q};
%!     e = s.pairs(q,:);
%!     tt = s.times(e);
%!     assert (sort (c([1 end], 3)), sort (tt(:)), 1e-14);
%!     rp = 0;  rm = 0;  a2 = 0;
%!     if (circle)
%!       R = hypot (c(:,1), c(:,2));
%!       r = 2 * R ./ (1 - R.^2);  ph = unwrap (atan2 (c(:,2), c(:,1)));
%!       a2 = 1;
%!       if (bg.horizon)
%!         rp = (L/2) * (1/bg.beta_L + 1/bg.beta_R);  rm = (L/2) * (1/bg.beta_L - 1/bg.beta_R);
%!         a2 = 0;
%!       elseif (strcmp (bg.bulk, "conical_defect"))
%!         r = bg.alpha * r;  a2 = bg.alpha^2;
%!       endif
%!     else
%!       r = 1 ./ c(:,2);  ph = c(:,1);
%!       if (bg.horizon)
%!         rp = pi * (1/bg.beta_L + 1/bg.beta_R);  rm = pi * (1/bg.beta_L - 1/bg.beta_R);
%!       endif
%!     endif
%!     len += curve_length (r, ph, c(:,3), rp, rm, a2, 1 / eps);
%!   endfor
%!   assert (len, 6 * s.S / bg.c, 1e-4);   # sampling-limited (~50 tol)
%! endfor
%! assert (numel (unique (bulks)), 8);

%!test
%! ## The path through the apex of a conical defect with times: two radial
%! ## legs (constant angle) meeting at the centre at the mean time
%! ## (doc/hrt_time.md: the extremum over the apex time).
%! bg = ads3_background ("heavy", "circle", "alpha", 0.6);
%! c = geodesic_curve (bg, [0 0], [5.5 0.3], "tol", 1e-5){1};
%! [~, i] = min (hypot (c(:,1), c(:,2)));
%! assert (c(i, :), [0 0 0.15], 1e-14);
%! ang = atan2 (c(:,2), c(:,1));
%! assert (ang(2:i-1), zeros (i - 2, 1), 1e-14);
%! assert (ang(i+1:end-1), (5.5 - 2*pi) * ones (rows (c) - i - 1, 1), 1e-12);
%! assert (all (diff (c(1:i,3)) >= 0) && all (diff (c(i:end,3)) >= 0));

