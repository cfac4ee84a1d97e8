## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of rt_surface on regions with endpoint times, the global
## quench and the thermofield double: each sampled curve's length,
## integrated here with the metric along the samples, against the
## regulated length of geodesic_length / rt_entropy; endpoints and times;
## the quench curve continuous across the shell with the refraction law
## derived below from the Vaidya metric; the two-sided curve through the
## bridge, and through a shock wave (its two pieces integrated on their
## own, the crossing against fminbnd, the unshocked limit).

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

%!## ---- geodesics through a shock wave (doc/tfd_shock.md, section 2) ----
%!## A bridge geodesic through the shock is two pieces split by a NaN row.
%!## Each piece is integrated on its own: the cubic spline through its
%!## samples (in their cumulative chord length) and Octave's integral of
%!## the Kruskal line element along it, from its crossing on u = 0 to the
%!## cutoff r = 1/eps (found with fzero); the jump along the null shock
%!## adds nothing.
%!function [len, pieces] = shock_length (c, R, rc)
%!  i = find (isnan (c(:,1)));
%!  assert (numel (i), 1);
%!  pieces = {c(i-1:-1:1,:), c(i+1:end,:)};    # each from its crossing out
%!  len = 0;
%!  for k = 1:2
%!    P = pieces{k};
%!    tau = [0; cumsum(sqrt (sum (diff (P).^2, 2)))];
%!    pp = spline (tau', P');
%!    dp = ppder (pp);
%!    ## inside the cutoff while 1 + uv >= 2 R/(rc + R)
%!    cutf = @(s) kruskal_in (ppval (pp, s)', R, rc, true);
%!    j = find (1 + P(:,2).^2 - P(:,1).^2 < 2 * R / (rc + R), 1);
%!    tc = fzero (cutf, tau([j-1 j]), optimset ("TolX", 1e-15));
%!    f = @(s) reshape (sqrt (max (0, kruskal_rows (ppval (pp, s(:)')', ppval (dp, s(:)')', R))), size (s));
%!    len += integral (f, 0, tc, "RelTol", 1e-10, "AbsTol", 1e-12);
%!  endfor
%!endfunction

%!## the Kruskal line element of kruskal () for rows of points and tangents
%!function q = kruskal_rows (p, d, R)
%!  uv = p(:,2).^2 - p(:,1).^2;
%!  q = (4 * (d(:,1).^2 - d(:,2).^2) + R^2 * (1 - uv).^2 .* d(:,3).^2) ./ (1 + uv).^2;
%!endfunction

%!## The embedding of a picture point (X_K, T_K, x) (doc/tfd_shock.md,
%!## section 1; x in boundary units, R x the bulk angle) and the geodesic
%!## distance acosh(-X.Y) of R^{2,2} (Banados, Henneaux, Teitelboim and
%!## Zanelli 1993, PRD 48, 1506).
%!function X = kr_embed (XK, TK, x, R)
%!  u = TK - XK;  v = TK + XK;  w = 1 + u .* v;
%!  X = [(1 - u .* v) ./ w .* cosh(R * x), (1 - u .* v) ./ w .* sinh(R * x), (v - u) ./ w, (v + u) ./ w];
%!endfunction
%!function d = kr_dist (X, Y)
%!  d = acosh (X(:,1) .* Y(:,1) - X(:,2) .* Y(:,2) - X(:,3) .* Y(:,3) + X(:,4) .* Y(:,4));
%!endfunction
%!## the cutoff point r = rc of the boundary point (x, t) on side s (1 right)
%!function X = kr_cut (x, t, s, R, rc)
%!  q = sqrt ((rc - R) / (rc + R));
%!  if (s)
%!    u = -exp (-R * t) * q;  v = exp (R * t) * q;
%!  else
%!    u = exp (R * t) * q;  v = -exp (-R * t) * q;
%!  endif
%!  X = kr_embed ((v - u) / 2, (v + u) / 2, x, R);
%!endfunction

%!test
%! ## (a), (c) Line, beta = 2, shift alpha = 1.5: each piece's integrated
%! ## Kruskal length, summed, equals the two-sided length with the shock
%! ## of geodesic_length; at tL = tR = 0, dx = 0 it is
%! ## 2 log(beta/(pi eps)) + 2 log(1 + alpha/2) (Shenker and Stanford 2014,
%! ## JHEP 03, 067).  The pieces stay on their sides of the shock (left
%! ## u >= 0, right u <= 0), the jump is alpha/2 along X_K = T_K.
%! eps = 1e-5;  beta = 2;  R = 2 * pi / beta;  al = 1.5;
%! tf = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps, "shock_alpha", al);
%! s = rt_surface (tf, struct ("left", [0 3], "right", [0 3]), "tol", 1e-6);
%! assert (sort (s.sides(s.pairs), 2), [0 1; 0 1]);
%! for k = 1:2
%!   c = s.curves{k};
%!   [len, pc] = shock_length (c, R, 1 / eps);
%!   assert (len, 2 * log (beta / (pi * eps)) + 2 * log (1 + al / 2), 1e-8 * len);
%!   a = s.pairs(k,1);
%!   left = pc{1 + (s.sides(a) == 1)};  right = pc{2 - (s.sides(a) == 1)};
%!   assert (all (left(:,2) - left(:,1) >= -1e-15) && all (right(:,2) - right(:,1) <= 1e-15));
%!   assert (left(1,1) - right(1,1), al / 2, 1e-14);
%!   assert (left(1,1:2), [al al] / 4, 1e-14);    # the symmetric crossing
%! endfor
%! ## times and a separation: the closed form of geodesic_length
%! nm = {"left", "right"};  n = 0;
%! for q = [0.15 0.4 0.3; 0.7 -0.2 -0.5; -0.3 0.5 0.9]'
%!   A = struct ("left", [0 3 q(1) q(1)], "right", [q(3) 3+q(3) q(2) q(2)]);
%!   s = rt_surface (tf, A, "tol", 1e-6);
%!   for k = find (diff (s.sides(s.pairs), 1, 2))'
%!     a = s.pairs(k,:);
%!     len = shock_length (s.curves{k}, R, 1 / eps);
%!     ref = geodesic_length (tf, s.endpoints(a(1)), s.endpoints(a(2)), "t1", s.times(a(1)), ...
%!                            "t2", s.times(a(2)), "side1", nm{s.sides(a(1)) + 1}, "side2", nm{s.sides(a(2)) + 1});
%!     assert (len, ref, 1e-8 * ref);
%!     n++;
%!   endfor
%! endfor
%! assert (n, 6);    # every pair through the bridge

%!test
%! ## (b) The crossing point against an independent extremisation: the
%! ## sum of the two unshocked BTZ legs, from the cutoff points to
%! ## (u = 0, v, x) on the right and (u = 0, v + alpha, x) on the left,
%! ## each acosh(-X.Y) in R^{2,2}, maximised over v with fminbnd and its
%! ## maximum minimised over x with fminbnd (the geodesic is stationary
%! ## at the crossing: a maximum along the null shock, a minimum across).
%! eps = 1e-6;  beta = 1.5;  R = 2 * pi / beta;  al = 0.8;
%! o = optimset ("TolX", 1e-12);
%! tf = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps, "shock_alpha", al);
%! s = rt_surface (tf, struct ("left", [0 3 0.3 0.3], "right", [0.2 3.4 -0.1 -0.1]), "tol", 1e-6);
%! for j = 1:2
%!   a = s.pairs(j,:);
%!   assert (sort (s.sides(a))', [0 1]);
%!   c = s.curves{j};
%!   if (s.sides(a(1)) == 1)
%!     a = fliplr (a);     # left first
%!     c = flipud (c);
%!   endif
%!   xL = s.endpoints(a(1));  tL = s.times(a(1));
%!   xR = s.endpoints(a(2));  tR = s.times(a(2));
%!   i = find (isnan (c(:,1)));
%!   vl = 2 * c(i-1,1);  vr = 2 * c(i+1,1);  xc = c(i+1,3);
%!   assert (vl - vr, al, 1e-13);
%!   assert (c(i-1,3), xc);
%!   ## x measured from the midpoint x0 (a boost of the X0-X1 plane): no
%!   ## cancellation between cosh and sinh in the inner products
%!   x0 = (xL + xR) / 2;
%!   BL = kr_cut (xL - x0, tL, 0, R, 1 / eps);  BR = kr_cut (xR - x0, tR, 1, R, 1 / eps);
%!   legs = @(v, x) kr_dist (BL, kr_embed ((v + al) / 2, (v + al) / 2, x - x0, R)) ...
%!                  + kr_dist (BR, kr_embed (v / 2, v / 2, x - x0, R));
%!   ## v where both legs are spacelike (-X.Y > 1), from a coarse scan
%!   vv = linspace (-5, 5, 1001)';
%!   ok = vv(imag (legs (vv, xc)) == 0);
%!   assert (ok(1) > -5 && ok(end) < 5);
%!   vbest = @(x) fminbnd (@(v) -legs (v, x), ok(1), ok(end), o);
%!   xn = fminbnd (@(x) legs (vbest (x), x), xc - 1, xc + 1, o);
%!   vn = vbest (xn);
%!   assert ([xn vn], [xc vr], 1e-6);
%!   ## and the stationary value is the integrated length
%!   len = shock_length (c, R, 1 / eps);
%!   assert (legs (vn, xn), len, 1e-8 * len);
%! endfor

%!test
%! ## (d) alpha -> 0: the two pieces lie on the unshocked geodesic, the
%! ## plane of the two boundary null rays in R^{2,2}, and meet; the length
%! ## is the unshocked one (geodesic_length without the shock).
%! eps = 1e-5;  beta = 2;  R = 2 * pi / beta;
%! A = struct ("left", [0 1.5 0.2 0.2], "right", [0.4 1.9 0.1 0.1]);
%! tf0 = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps);
%! s0 = rt_surface (tf0, A, "tol", 1e-6);
%! s = rt_surface (ads3_background ("tfd", "line", "beta", beta, "cutoff", eps, "shock_alpha", 1e-12), A, "tol", 1e-6);
%! assert (s.pairs, s0.pairs);
%! nm = {"left", "right"};
%! for k = 1:rows (s.pairs)
%!   c = s.curves{k};  c0 = s0.curves{k};
%!   i = find (isnan (c(:,1)));
%!   assert (numel (i), 1);
%!   assert (c([1 end], :), c0([1 end], :), 1e-14);
%!   assert (c(i-1,:), c(i+1,:), 1e-11);
%!   ## null rays of the endpoints; residual of X = a P + b Q
%!   a = s.pairs(k,:);
%!   x = c([1 end], 3);  t = s.times(a);  sd = s.sides(a);
%!   N = [cosh(R * x), sinh(R * x), (2 * sd - 1) .* cosh(R * t), sinh(R * t)];
%!   X = kr_embed (c(:,1), c(:,2), c(:,3), R);
%!   X = X(all (isfinite (X), 2), :);
%!   res = X - (X / N) * N;
%!   assert (max (sqrt (sum (res.^2, 2)) ./ sqrt (sum (X.^2, 2))) < 1e-9);
%!   len = shock_length (c, R, 1 / eps);
%!   ref = geodesic_length (tf0, s.endpoints(a(1)), s.endpoints(a(2)), "t1", t(1), ...
%!                          "t2", t(2), "side1", nm{sd(1) + 1}, "side2", nm{sd(2) + 1});
%!   assert (len, ref, 1e-8 * ref);
%! endfor

%!## Every non-crossing pairing of the points 1..n in their order (rows of
%!## index pairs), built here from scratch.
%!function P = nc_pairings (idx)
%!  if (isempty (idx))
%!    P = {zeros(0, 2)};
%!    return;
%!  endif
%!  P = {};
%!  for k = 2:2:numel (idx)
%!    inner = nc_pairings (idx(2:k-1));
%!    outer = nc_pairings (idx(k+1:end));
%!    for a = 1:numel (inner)
%!      for b = 1:numel (outer)
%!        P{end+1} = [idx(1) idx(k); inner{a}; outer{b}];
%!      endfor
%!    endfor
%!  endfor
%!endfunction

%!test
%! ## The runner-up on the line's thermofield double (with and without a
%! ## shock, endpoint times and a shift): against a brute force written
%! ## here, every non-crossing pairing of the endpoints in the order of
%! ## the bridge slice (right ascending, then left descending; common
%! ## practice for the two-sided line, Hartman and Maldacena 2013) priced
%! ## with geodesic_length, the second best (and the best for the
%! ## minimiser) to 1e-12; the runner-up's curves end on its pairs'
%! ## boundary points, and their Kruskal lengths, integrated, add up to
%! ## its entropy (to the samples' accuracy, 1e-4 a curve at tol 1e-5).
%! rand ("seed", 17);
%! nm = {"left", "right"};  ntrial = 0;  nshock = 0;  nswap = 0;
%! for trial = 1:12
%!   beta = 0.5 + 2 * rand ();  R = 2 * pi / beta;  eps = 1e-4;
%!   al = (mod (trial, 3) == 0) * 2 * rand ();
%!   tf = ads3_background ("tfd", "line", "beta", beta, "cutoff", eps, "shock_alpha", al);
%!   A = struct ();  P = zeros (0, 3);     # [x, t, side] in the bridge order
%!   for sd = [1 0]
%!     n = 1 + (rand () < 0.5);
%!     x = cumsum (0.3 + 2 * rand (2 * n, 1)) - 1;
%!     tt = 0.1 * (rand (2 * n, 1) - 0.5);
%!     A.(nm{sd + 1}) = [x(1:2:end), x(2:2:end), tt(1:2:end), tt(2:2:end)];
%!     o = merge (sd, 1:2*n, 2*n:-1:1);
%!     P = [P; x(o), tt(o), sd * ones(2 * n, 1)];
%!   endfor
%!   sh = 0.4 * beta * rand ();
%!   P(:,2) += sh;
%!   N = rows (P);  W = zeros (N);
%!   for i = 1:N
%!     for j = i+1:N
%!       W(i,j) = geodesic_length (tf, P(i,1), P(j,1), "t1", P(i,2), "t2", P(j,2), ...
%!                                 "side1", nm{P(i,3) + 1}, "side2", nm{P(j,3) + 1});
%!     endfor
%!   endfor
%!   C = nc_pairings (1:N);
%!   cost = cellfun (@(p) tf.c / 6 * sum (W(sub2ind ([N N], p(:,1), p(:,2)))), C);
%!   [cs, ord] = sort (cost);
%!   s = rt_surface (tf, A, "t", sh, "tol", 1e-5);
%!   r = rt_surface (tf, A, "t", sh, "configuration", "runner_up", "tol", 1e-5);
%!   assert (s.S, cs(1), 1e-12 * abs (cs(1)));
%!   assert (r.S, cs(2), 1e-12 * abs (cs(2)));
%!   ## the pairs as sets of boundary points [x, side]
%!   key = @(p, X, sd) sortrows (sort ([X(p(:,1)) + 1e3 * sd(p(:,1)), X(p(:,2)) + 1e3 * sd(p(:,2))], 2));
%!   if (cs(3) - cs(2) > 1e-9 * abs (cs(2)))
%!     assert (key (r.pairs, r.endpoints, r.sides), key (C{ord(2)}, P(:,1), P(:,3)), 1e-12);
%!   endif
%!   len = 0;
%!   for k = 1:rows (r.pairs)
%!     c = r.curves{k};  e = r.pairs(k,:);
%!     E = [(2 * r.sides(e) - 1) .* cosh(R * r.times(e)), sinh(R * r.times(e)), r.endpoints(e)];
%!     assert (sortrows (c([1 end], :)), sortrows (E), 1e-12 * max (1, max (abs (E(:)))));
%!     if (trial > 4 && al == 0)
%!       len = NaN;        # the lengths on the first four and the shocked
%!     elseif (any (isnan (c(:,1))))
%!       len += shock_length (c, R, 1 / eps);
%!       nshock++;
%!     else
%!       len += poly_length (c, @(p, d) kruskal (p, d, R), @(p, varargin) kruskal_in (p, R, 1 / eps, varargin{:}));
%!     endif
%!   endfor
%!   if (! isnan (len))
%!     assert (len, 6 / tf.c * r.S, 1e-4 * rows (r.pairs));   # 1e-4 a curve, as above
%!   endif
%!   nswap += any (diff (r.sides(r.pairs), 1, 2)) != any (diff (s.sides(s.pairs), 1, 2));
%!   ntrial++;
%! endfor
%! assert (ntrial == 12 && nshock >= 1 && nswap >= 3);
%! ## refusals: the circle's annulus, a single candidate
%! A = struct ("left", [0 3], "right", [0 3]);
%! fail ('rt_surface (ads3_background ("tfd", "circle", "beta", 1, "circumference", 5), A, "configuration", "runner_up")', "not available for a thermofield double on a circle");
%! fail ('rt_surface (ads3_background ("tfd", "line", "beta", 1), struct ("right", [0 3]), "configuration", "runner_up")', "single candidate");

%!test
%! ## The runner-up with endpoint times on static lines (vacuum, thermal,
%! ## rotating) and on the global quench (line and circle, at a time t):
%! ## against every non-crossing pairing of the sorted endpoints priced
%! ## here with geodesic_length (the candidates of the time path; common
%! ## practice), the best for the minimiser and the second best for the
%! ## runner-up, to 1e-12; the runner-up's curves end on its endpoints.
%! rand ("seed", 23);
%! bgs = {ads3_background("vacuum", "line"), ads3_background("thermal", "line", "beta", 1.3), ...
%!        ads3_background("rotating", "line", "beta_L", 0.8, "beta_R", 1.9), ...
%!        ads3_background("quench", "line", "beta", 1), ads3_background("quench", "circle", "beta", 2)};
%! for k = 1:numel (bgs)
%!   bg = bgs{k};  quench = strcmp (bg.state, "quench");
%!   for trial = 1:3
%!     n = 2 + (trial == 3);
%!     x = cumsum (0.2 + rand (2 * n, 1));
%!     if (quench && strcmp (bg.boundary, "circle"))
%!       x *= 5 / (x(end) + 0.3);
%!     endif
%!     tt = (! quench) * 0.08 * (rand (2 * n, 1) - 0.5);
%!     A = [x(1:2:end), x(2:2:end), tt(1:2:end), tt(2:2:end)];
%!     tq = 0.3 + rand ();
%!     if (quench)
%!       A = A(:, 1:2);  opt = {"t", tq};
%!     else
%!       opt = {};
%!     endif
%!     N = 2 * n;  W = zeros (N);
%!     for i = 1:N
%!       for j = i+1:N
%!         if (quench)
%!           W(i,j) = geodesic_length (bg, x(i), x(j), "t", tq);
%!         else
%!           W(i,j) = geodesic_length (bg, x(i), x(j), "t1", tt(i), "t2", tt(j));
%!         endif
%!       endfor
%!     endfor
%!     C = nc_pairings (1:N);
%!     cost = sort (cellfun (@(p) bg.c / 6 * sum (W(sub2ind ([N N], p(:,1), p(:,2)))), C));
%!     s = rt_surface (bg, A, opt{:});
%!     r = rt_surface (bg, A, opt{:}, "configuration", "runner_up");
%!     assert ([s.S, r.S], cost(1:2), 1e-12 * abs (cost(1:2)));
%!     for q = 1:rows (r.pairs)
%!       c = r.curves{q};  e = r.pairs(q,:);
%!       assert (sort (c([1 end], 3)), sort (merge (quench, [tq; tq], r.times(e))), 1e-12);
%!     endfor
%!   endfor
%! endfor
