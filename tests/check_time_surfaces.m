## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of rt_surface on regions with endpoint times, the global
## quench and the thermofield double: each sampled curve's length,
## integrated here with the metric along the samples, against the
## regulated length of geodesic_length / rt_entropy; endpoints and times;
## the quench curve continuous across the shell with the refraction law
## derived below from the Vaidya metric; the two-sided curve through the
## bridge.

%!## Proper length of the polyline (samples P, k x 3) in the metric g:
%!## ds^2 = d' G(p) d for the straight segment of each pair of samples,
%!## integrated with Octave's integral where a sample lies beyond the
%!## cutoff (keep(p) false) the segment is cut by fzero.
%!function len = poly_length (P, metric, inside)
%!  len = 0;
%!  for j = 1:rows (P) - 1
%!    A = P(j,:);  B = P(j+1,:);  d = B - A;
%!    ia = inside (A);  ib = inside (B);
%!    if (! ia && ! ib)
%!      continue;
%!    endif
%!    u0 = 0;  u1 = 1;
%!    if (! ia)
%!      u0 = fzero (@(u) inside (A + u * d, true), [0 1]);
%!    endif
%!    if (! ib)
%!      u1 = fzero (@(u) inside (A + u * d, true), [0 1]);
%!    endif
%!    f = @(u) reshape (sqrt (max (0, metric (A + u(:) * d, d))), size (u));
%!    len += integral (f, u0, u1, "RelTol", 1e-12, "AbsTol", 1e-13);
%!  endfor
%!endfunction

%!## Vaidya (line), picture (x, z, v): ds^2 = -f dv^2 + 2 dv dr + r^2 dx^2,
%!## r = 1/z, f = r^2 (v < 0), r^2 - R^2 (v > 0) (Balasubramanian et al.
%!## 2011, PRD 84, 026010); vsgn the side of the segment.
%!function q = vaidya_line (p, d, R, vsgn)
%!  r = 1 ./ p(:,2);  dr = -d(2) * r.^2;
%!  f = r.^2 - (vsgn > 0) * R^2;
%!  q = -f * d(3)^2 + 2 * d(3) * dr + r.^2 * d(1)^2;
%!endfunction

%!## The same on a circle, picture (X, Y, v) of the disk: r = 2 rho/(1 -
%!## rho^2), phi the angle; f = r^2 + 1 inside the shell, r^2 - R^2 outside,
%!## bulk units (v scaled by 2 pi/L).
%!function q = vaidya_disk (p, d, R, vsgn, sc)
%!  rho = hypot (p(:,1), p(:,2));  drho = (p(:,1) * d(1) + p(:,2) * d(2)) ./ rho;
%!  dphi = (p(:,1) * d(2) - p(:,2) * d(1)) ./ rho.^2;
%!  r = 2 * rho ./ (1 - rho.^2);  dr = 2 * (1 + rho.^2) ./ (1 - rho.^2).^2 .* drho;
%!  f = r.^2 + (vsgn < 0) - (vsgn > 0) * R^2;
%!  dv = d(3) / sc;
%!  q = -f * dv^2 + 2 * dv * dr + r.^2 .* dphi.^2;
%!endfunction

%!## Planar BTZ in Kruskal coordinates, picture (X, T, x) with
%!## X = (v - u)/2, T = (v + u)/2: ds^2 = (-4 du dv + R^2 (1 - uv)^2
%!## dx^2)/(1 + uv)^2, r = R (1 - uv)/(1 + uv) (common practice; checked
%!## against -f dt^2 + dr^2/f + r^2 dx^2 by u = -e^{-R(t - r*)},
%!## v = e^{R(t + r*)}).
%!function q = kruskal (p, d, R)
%!  uv = p(:,2).^2 - p(:,1).^2;
%!  q = (4 * (d(1)^2 - d(2)^2) + R^2 * (1 - uv).^2 * d(3)^2) ./ (1 + uv).^2;
%!endfunction

%!## inside the cutoff r = R (1 - uv)/(1 + uv) <= rc, i.e. 1 + uv >= 2 R/(rc + R)
%!function v = kruskal_in (p, R, rc, signed)
%!  v = 1 + p(2)^2 - p(1)^2 - 2 * R / (rc + R);
%!  if (nargin < 4)
%!    v = v >= 0;
%!  endif
%!endfunction

%!## Length of a quench curve: segments on the side of the shell of their
%!## midpoint (the crossings are samples).
%!function len = quench_length (c, R, eps, disk, sc)
%!  len = 0;
%!  for j = 1:rows (c) - 1
%!    vs = sign (c(j,3) + c(j+1,3));
%!    if (disk)
%!      m = @(p, d) vaidya_disk (p, d, R, vs, sc);
%!      in = @(p, varargin) cut (2 * hypot (p(1), p(2)) / (1 - sumsq (p(1:2))) * sc, 1 / eps, varargin{:});
%!    else
%!      m = @(p, d) vaidya_line (p, d, R, vs);
%!      in = @(p, varargin) cut (1 / p(2), 1 / eps, varargin{:});
%!    endif
%!    len += poly_length (c(j:j+1,:), m, in);
%!  endfor
%!endfunction

%!## inside the cutoff (r <= rc), or its signed distance for fzero
%!function v = cut (r, rc, signed)
%!  if (nargin > 2)
%!    v = 1 - r / rc;
%!  else
%!    v = r <= rc;
%!  endif
%!endfunction

%!test
%! ## Quench on a line (beta = 1): the curve at 0 < t < l/2 has its
%! ## crossings exactly on the shell, the BTZ legs at v > 0 and the vacuum
%! ## chord at v < 0, its length integrated with the Vaidya metric equals
%! ## the refracted length (Balasubramanian et al. 2011, PRD 84, 026010)
%! ## of rt_entropy; before the quench and after saturation it is the
%! ## vacuum / BTZ geodesic at the boundary time.
%! eps = 1e-4;  beta = 1;  R = 2 * pi / beta;
%! q = ads3_background ("quench", "line", "beta", beta, "cutoff", eps);
%! for t = [-0.3 0.4 1.3]
%!   s = rt_surface (q, [0 2], "t", t, "tol", 1e-5);
%!   c = s.curves{1};
%!   assert (c([1 end], :), [0 0 t; 2 0 t], 1e-14);
%!   i = find (c(:,3) == 0);
%!   if (t > 0 && t < 1)
%!     assert (numel (i), 2);
%!     assert (all (c(1:i(1)-1, 3) > 0) && all (c(i(1)+1:i(2)-1, 3) < 0) && all (c(i(2)+1:end, 3) > 0));
%!     assert (c(i(1), 2), c(i(2), 2), 1e-14);   # symmetric crossings
%!   else
%!     assert (all (c(:,3) <= t + 1e-12));   # v = t - z before, v <= t in BTZ
%!     assert (t < 0 || all (c(:,3) >= 0));
%!   endif
%!   len = quench_length (c, R, eps, false, 1);
%!   assert (len, 6 * rt_entropy (q, [0 2], "t", t), 1e-4);   # sampling-limited
%! endfor

%!test
%! ## Refraction at the shell, from the geodesic equations of
%! ## ds^2 = -f dv^2 + 2 dv dr + r^2 dx^2, f = r^2 - theta(v) R^2 (derived
%! ## here): v' and x' are continuous and, integrating
%! ## d/ds (r' - f v') = (R^2/2) delta(v) v'^2 across v = 0,
%! ## r'_out - r'_in = -(R^2/2) v' for a curve entering the BTZ side.
%! ## Tangents from quadratic fits to the samples on each side of the
%! ## second crossing, normalised to unit proper length.
%! beta = 1;  R = 2 * pi / beta;
%! q = ads3_background ("quench", "line", "beta", beta);
%! c = rt_surface (q, [0 2], "t", 0.5, "tol", 1e-10).curves{1};
%! i = find (c(:,3) == 0)(2);
%! X = [c(:,1), 1 ./ c(:,2), c(:,3)];          # (x, r, v)
%! tg = {};
%! for side = [-1 1]
%!   k = i + side * (0:3)';
%!   u = [0; cumsum(sqrt (sum (diff (X(k,:)).^2, 2)))] * side;
%!   d = zeros (1, 3);
%!   for j = 1:3
%!     p = polyfit (u, X(k,j), 3);
%!     d(j) = p(3);
%!   endfor
%!   f = X(i,2)^2 - (side > 0) * R^2;
%!   tg{end+1} = d / sqrt (-f * d(3)^2 + 2 * d(3) * d(2) + X(i,2)^2 * d(1)^2);
%! endfor
%! [tin, tout] = deal (tg{:});
%! assert (tout([1 3]), tin([1 3]), 2e-4 * norm (tin));
%! assert (tout(2) - tin(2), -(R^2 / 2) * tin(3), 2e-4 * norm (tin));
%! assert (abs (tout(2) - tin(2)) > 0.1 * norm (tin));   # a real kink

%!test
%! ## Quench on a circle (L = 2 pi, beta = 0.8): the same length check in
%! ## the disk, for an arc beyond half the circle (the geodesic over the
%! ## shorter arc).
%! eps = 1e-4;  beta = 0.8;  R = 2 * pi / beta;
%! q = ads3_background ("quench", "circle", "beta", beta, "cutoff", eps);
%! s = rt_surface (q, [1 4.6], "t", 0.6, "tol", 1e-5);
%! c = s.curves{1};
%! assert (numel (find (c(:,3) == 0)), 2);
%! assert (sortrows (c([1 end], 1:2)), sortrows ([cos([1;4.6]), sin([1;4.6])]), 1e-14);
%! len = quench_length (c, R, eps, true, 1);
%! assert (len, 6 * rt_entropy (q, [1 4.6], "t", 0.6), 1e-4);

%!test
%! ## Thermofield double on a line (beta = 2): at tL = tR = t the two-sided
%! ## region's minimiser joins the sides through the bridge; the curve
%! ## runs from the left boundary (X_K = -cosh(R t), T_K = sinh(R t)) to the
%! ## right one through X_K = 0, and its Kruskal length is the
%! ## Hartman-Maldacena value 2 log((beta/(pi eps)) cosh(2 pi t/beta)) for
%! ## dx = 0 (Hartman and Maldacena 2013, JHEP 05, 014) and the closed form
%! ## of geodesic_length for dx != 0.
%! eps = 1e-4;  beta = 2;  R = 2 * pi / beta;
%! tf = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps);
%! t = 0.3;
%! s = rt_surface (tf, struct ("left", [0 3], "right", [0 3]), "t", t, "tol", 1e-5);
%! assert (s.picture, "kruskal");
%! assert (rows (s.pairs), 2);
%! assert (sort (s.sides(s.pairs), 2), [0 1; 0 1]);
%! in = @(p, varargin) kruskal_in (p, R, 1 / eps, varargin{:});
%! for k = 1:2
%!   c = s.curves{k};
%!   a = s.pairs(k,1);  b = s.pairs(k,2);
%!   ends = [(2 * s.sides([a b]) - 1) .* cosh(R * s.times([a b])), sinh(R * s.times([a b])), s.endpoints([a b])];
%!   assert (c([1 end], :), ends, 1e-12);
%!   assert (any (c(:,1) < 0) && any (c(:,1) > 0));      # crosses the bridge
%!   len = poly_length (c, @(p, d) kruskal (p, d, R), in);
%!   assert (len, 2 * log ((beta / (pi * eps)) * cosh (2 * pi * t / beta)), 1e-4);
%! endfor
%! ## a shifted pair: the closed form of the bridge length (doc/tfd_shock.md)
%! s = rt_surface (tf, struct ("left", [0 1.5], "right", [0.4 1.9]), "t", 0.1, "tol", 1e-5);
%! c = s.curves{1};
%! a = s.pairs(1,:);  nm = {"left", "right"};
%! len = poly_length (c, @(p, d) kruskal (p, d, R), in);
%! ref = geodesic_length (tf, s.endpoints(a(1)), s.endpoints(a(2)), "t1", s.times(a(1)) - 0.1, ...
%!                        "t2", s.times(a(2)) - 0.1, "side1", nm{s.sides(a(1)) + 1}, "side2", nm{s.sides(a(2)) + 1}, "t", 0.1);
%! assert (len, ref, 1e-4);

%!test
%! ## Thermofield double on a circle, one side: the BTZ configuration with
%! ## the horizon as the bifurcation circle u = v = 0 (X_K = T_K = 0); the
%! ## geodesic stays in the right exterior (X_K > |T_K|).
%! tf = ads3_background ("tfd", "circle", "beta", 3);
%! s = rt_surface (tf, [0 6], "tol", 1e-4);
%! assert (s.horizon);
%! assert (s.horizon_curve(:, 1:2), zeros (2, 2));
%! c = s.curves{1};
%! assert (all (c(:,1) > abs (c(:,2)) - 1e-15));
