## SPDX-License-Identifier: GPL-3.0-or-later
## The series (fast) path of strip_entropy (doc/fast_paths.md) for many
## widths, against
##   * the exact path of the same function (per width: Brent's method on
##     the width quadrature, area quadratures), over thousands of widths
##     from 0.02 zh to near the horizon;
##   * Octave's quadgk, and composite Gauss-Legendre quadrature on graded
##     panels over 1000 turning points at once, on the width and area
##     integrals of the metric
##     ds^2 = (1/z^2)(-f dt^2 + dz^2/f + dx^2), written here, parametrised
##     by the distance w = zh - z* of the turning point from the horizon
##     (so that strips exponentially close to it keep their digits), for
##     the d = 3 and d = 4 black brane f = 1 - (z/zh)^d and the charged
##     brane f = 1 - (1+q) z^4 + q z^6 (the planar AdS-Reissner-Nordstrom
##     form, common practice; zh = 1 for q < 2), the latter as samples;
##   * the vacuum closed form (Ryu and Takayanagi 2006, JHEP 08 (2006) 045).
## Tolerance: 1e-10 relative (the target of issue 11).  finite changes
## sign for wide strips, so its error is measured against the larger of
## |finite| and the vacuum's |finite| at the same width.

%!function [l, S] = strip_by_w_ (d, fw, w, eps)
%!  ## width and area above the cutoff of the strip turning at z* = 1 - w
%!  ## (zh = 1) in f, f given as fw (x, wz) with wz = 1 - x carried exactly.
%!  ## z = z* u, u = 1 - t^2 removes the 1/sqrt at the tip: dz = -2 z* t dt
%!  ## and 1 - u^(2d-2) = t^2 sum_{k<2d-2} u^k, so the t's cancel.
%!  x = 1 - w;
%!  sg = @(u) reshape (sum (u(:)'.^((0:2*d-3)'), 1), size (u));
%!  F = @(t) fw (x * (1 - t.^2), w + x * t.^2) .* sg (1 - t.^2);
%!  ## the integrands peak on t ~ sqrt (w): waypoints resolve the peak
%!  wp = sqrt (w / x) * 10.^(0:0.5:20);
%!  wp = wp(wp < 0.5);
%!  o = {"RelTol", 1e-13, "AbsTol", 0, "MaxIntervalCount", 1e5};
%!  l = 2 * x * quadgk (@(t) 2 * (1 - t.^2).^(d-1) ./ sqrt (F (t)), 0, 1,
%!                      "Waypoints", wp, o{:});
%!  te = sqrt (1 - eps / x);
%!  S = x^(2-d) * quadgk (@(t) 2 * (1 - t.^2).^(1-d) ./ sqrt (F (t)), 0, te,
%!                        "Waypoints", wp(wp < te), o{:}) / 2;   # 2 A/(4G), G = 1
%!endfunction

%!function [t, wt] = gl_ (m)
%!  ## Gauss-Legendre nodes and weights on [-1, 1] (Golub and Welsch 1969,
%!  ## Math. Comp. 23, 221: eigenvalues of the Jacobi matrix)
%!  k = (1:m-1)';  b = k ./ sqrt (4 * k.^2 - 1);
%!  [V, D] = eig (diag (b, 1) + diag (b, -1));
%!  [t, i] = sort (diag (D));  wt = 2 * V(1, i)'.^2;
%!endfunction

%!function I = panels_ (fun, E, t, wt)
%!  ## composite Gauss-Legendre over the panels [E(:,k), E(:,k+1)], one row
%!  ## of panel edges per turning point (all rows at once)
%!  I = 0;
%!  for k = 1:columns (E) - 1
%!    a = E(:, k);  b = E(:, k+1);  h = (b - a) / 2;
%!    I = I + h .* (fun ((a + b) / 2 + h .* t') * wt);
%!  endfor
%!endfunction

%!function s = sg_ (u, n)
%!  ## 1 + u + ... + u^(n-1), elementwise
%!  s = ones (size (u));  p = s;
%!  for k = 1:n-1
%!    p = p .* u;  s = s + p;
%!  endfor
%!endfunction

%!function [l, S] = strips_gl_ (d, fw, w, eps)
%!  ## widths and areas (S = A/(4G), G = ell = Lperp = 1, zh = 1) of the
%!  ## strips turning at z* = 1 - w (a column), f given as fw (x, 1 - x)
%!  ## with 1 - x carried exactly.  Width: z = z* (1 - t^2) on t in [0, 1],
%!  ## panels graded geometrically toward t = 0, where the integrand peaks
%!  ## on t ~ sqrt (w).  Area: the same for u = z/z* in [1/2, 1], and
%!  ## s = log u on [log (eps/z*), log (1/2)], where u^(1-d) du = u^(2-d) ds.
%!  [t, wt] = gl_ (30);
%!  w = w(:);  x = 1 - w;
%!  F = @(T) fw (x .* (1 - T.^2), w + x .* T.^2) .* sg_ (1 - T.^2, 2*d - 2);
%!  c = sqrt (w ./ x);
%!  E = [zeros(size(c)), min(sqrt(0.5), c .* (2 .^ (-6:25)))];
%!  l = 2 * x .* panels_ (@(T) 2 * (1 - T.^2).^(d-1) ./ sqrt (F (T)), [E, ones(size(c))], t, wt);
%!  A1 = panels_ (@(T) 2 * (1 - T.^2).^(1-d) ./ sqrt (F (T)), E, t, wt);
%!  s0 = log (eps ./ x);  s1 = log (0.5);
%!  G = @(Sm) exp ((2-d) * Sm) ./ sqrt (fw (x .* exp (Sm), 1 - x .* exp (Sm)) ...
%!                                     .* (1 - exp ((2*d-2) * Sm)));
%!  A2 = panels_ (G, s0 + (s1 - s0) .* linspace (0, 1, 9), t, wt);
%!  S = x.^(2-d) .* (A1 + A2) / 2;
%!endfunction

%!function check_paths_ (bg, l)
%!  ## series against the exact path, every width
%!  [S, i] = strip_entropy (bg, l);
%!  [Se, ie] = strip_entropy (bg, l, "method", "exact");
%!  assert (i.series, numel (l));
%!  assert (ie.series, 0);
%!  assert (isnan (ie.series_error) && i.series_error < 1e-11);
%!  d = bg.dimension;
%!  g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!  fv = 2^(d-1) * pi^((d-1)/2) / ((d - 2) * 4) * g^(d-1) ./ l.^(d-2);  # |finite| in vacuum
%!  assert (S, Se, 1e-10 * abs (Se));
%!  assert (i.z_star, ie.z_star, 1e-10 * ie.z_star);
%!  assert (i.delta, ie.delta, 1e-10 * abs (ie.delta));
%!  assert (i.finite, ie.finite, 1e-10 * max (abs (ie.finite), fv));
%!endfunction

%!test
%! ## black brane d = 3, 4: 3000 widths from 0.02 zh to 60 zh (z* within
%! ## e^-40 zh of the horizon for d = 4), series against the exact path
%! for d = [3 4]
%!   bg = ads_background (d, "black_brane", "zh", 1, "cutoff", 1e-3);
%!   l = [logspace(log10 (0.02), log10 (4), 2000), linspace(4, 60, 1000)(2:end)];
%!   check_paths_ (bg, l);
%! endfor

%!test
%! ## charged brane, q = 1 (zh = 1, T = 1/(2 pi)), 4000 exact samples:
%! ## series against the exact path, 2000 widths up to 20 zh
%! q = 1;  z = linspace (0, 1.2, 4000)';
%! bt = ads_background (4, "tabulated", "z", z, "f", 1 - (1+q) * z.^4 + q * z.^6,
%!                      "cutoff", 1e-3);
%! check_paths_ (bt, [logspace(-1.5, log10 (3), 1500), linspace(3, 20, 501)(2:end)]);

%!test
%! ## black brane d = 3, 4 against quadgk on the metric's integrals, at
%! ## turning points w = zh - z* from 0.5 down to 1e-9 (l up to 12 zh;
%! ## at w = 1e-12 quadgk stops at its interval limit short of 1e-10):
%! ## width and entropy at the cutoff to 1e-10
%! w = [0.5 0.1 1e-2 1e-4 1e-6 1e-9];
%! for d = [3 4]
%!   bg = ads_background (d, "black_brane", "zh", 1, "cutoff", 1e-3);
%!   fw = @(x, wz) wz .* reshape (sum (x(:)'.^((0:d-1)'), 1), size (x));  # (1-x^d)
%!   lr = Sr = zeros (size (w));
%!   for k = 1:numel (w)
%!     [lr(k), Sr(k)] = strip_by_w_ (d, fw, w(k), 1e-3);
%!   endfor
%!   [S, i] = strip_entropy (bg, lr, "method", "series");
%!   assert (i.series, numel (w));
%!   assert (S, Sr, 1e-10 * Sr);
%!   assert (1 - i.z_star, w, 1e-9 * w + 1e-15);
%! endfor

%!test
%! ## black brane d = 3, 4 and the charged brane q = 1 against composite
%! ## Gauss-Legendre quadrature of the metric's integrals (written here),
%! ## 1000 turning points from w = zh - z* = 0.9 down to 1e-12 each: the
%! ## series path's S to 1e-10 (widths 0.09 to 16 zh)
%! w = logspace (-12, log10 (0.9), 1000)';
%! q = 1;  z = linspace (0, 1.2, 4000)';
%! bt = ads_background (4, "tabulated", "z", z, "f", 1 - (1+q) * z.^4 + q * z.^6,
%!                      "cutoff", 1e-3);
%! cases = {3, ads_background(3, "black_brane", "zh", 1, "cutoff", 1e-3), @(x, wz) wz .* sg_ (x, 3);
%!          4, ads_background(4, "black_brane", "zh", 1, "cutoff", 1e-3), @(x, wz) wz .* sg_ (x, 4);
%!          4, bt, @(x, wz) wz .* (1 + x) .* (1 + x.^2 - q * x.^4)};
%! for k = 1:rows (cases)
%!   [l, Sr] = strips_gl_ (cases{k, 1}, cases{k, 3}, w, 1e-3);
%!   [S, i] = strip_entropy (cases{k, 2}, l');
%!   assert (i.series, numel (w));
%!   assert (S', Sr, 1e-10 * Sr);
%!   assert (1 - i.z_star', w, 1e-10 * w + 4e-16);
%! endfor

%!test
%! ## charged brane q = 1: f = 1 - 2 z^4 + z^6 = (1 - z^2)(1 + z^2 - z^4),
%! ## 1 - z^2 = (1 - z)(1 + z) with 1 - z carried exactly; samples of f
%! ## against quadgk on the exact f (the spline of 4000 samples is far
%! ## below 1e-10)
%! q = 1;  z = linspace (0, 1.2, 4000)';
%! bt = ads_background (4, "tabulated", "z", z, "f", 1 - (1+q) * z.^4 + q * z.^6,
%!                      "cutoff", 1e-3);
%! fw = @(x, wz) wz .* (1 + x) .* (1 + x.^2 - q * x.^4);
%! w = [0.5 0.1 1e-2 1e-4 1e-7];
%! lr = Sr = zeros (size (w));
%! for k = 1:numel (w)
%!   [lr(k), Sr(k)] = strip_by_w_ (4, fw, w(k), 1e-3);
%! endfor
%! [S, i] = strip_entropy (bt, lr, "method", "series");
%! assert (i.series, numel (w));
%! assert (S, Sr, 1e-10 * Sr);

%!test
%! ## vacuum: closed forms for 2000 widths (the vacuum never needs the
%! ## series), Ryu and Takayanagi 2006
%! for d = [3 4]
%!   bg = ads_background (d, "vacuum", "cutoff", 1e-4);
%!   l = logspace (-3, 2, 2000);
%!   [S, i] = strip_entropy (bg, l);
%!   g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!   assert (i.series, 0);
%!   assert (i.z_star, l / (2 * sqrt (pi) * g), 1e-13 * l);
%!   ref = -2^(d-1) * pi^((d-1)/2) / ((d - 2) * 4) * g^(d-1) ./ l.^(d-2);
%!   assert (i.finite, ref, 1e-12 * abs (ref));
%! endfor

%!test
%! ## widths the series does not cover: a strip turning within twice the
%! ## cutoff takes the exact path, the rest the series, in one call
%! warning ("off", "holent:cutoff", "local");
%! bg = ads_background (4, "black_brane", "zh", 1, "cutoff", 1e-2);
%! l = [0.01 0.015 linspace(0.1, 3, 200)];   # z* < 2 eps for the first two
%! [S, i] = strip_entropy (bg, l);
%! [Se, ie] = strip_entropy (bg, l, "method", "exact");
%! assert (i.series, numel (l) - 2);
%! assert (S, Se, 1e-10 * abs (Se));
%! ## noisy samples and a width not monotonic in z*: the exact path
%! z = linspace (0, 1.2, 1000)';  randn ("state", 3);
%! bn = ads_background (4, "tabulated", "z", z, "f", [1; 1 - z(2:end).^4 + 1e-8 * randn(999, 1)]);
%! [~, i] = strip_entropy (bn, linspace (0.1, 2, 100));
%! assert (i.series, 0);
%! z = linspace (0, 4, 2000)';
%! bm = ads_background (4, "tabulated", "z", z, "f", 1 - 1.96 * z.^4 ./ (1 + z.^8), "cutoff", 0.02);
%! [~, i] = strip_entropy (bm, linspace (0.5, 3.5, 100));
%! assert (i.series, 0);

%!error <method: must be "auto", "exact" or "series"> strip_entropy (ads_background (4, "vacuum"), 1, "method", "fast")
%!error <option 'method' applies to static strips> strip_entropy (ads_background (4, "vaidya", "zh", 1), 1, "t", 0, "method", "exact")
