## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} strip_entropy (@var{bg}, @var{l})
## @deftypefnx {} {[@var{S}, @var{info}] =} strip_entropy (@var{bg}, @var{l}, "length", @var{Lperp})
## @deftypefnx {} {[@var{S}, @var{info}] =} strip_entropy (@dots{}, "method", @var{method})
## @deftypefnx {} {[@var{S}, @var{info}] =} strip_entropy (@var{bgq}, @var{l}, "t", @var{t})
## Ryu-Takayanagi entropy S = Area/(4 G) of a strip of width @var{l} (an
## array; outputs have its size) and transverse size @var{Lperp} (default 1)
## in the AdS_(d+1) background @var{bg} from @code{ads_background}.
##
## The minimal surface turns at the depth z* fixed by
## @example
## l/2 = int_0^z* dz (z/z*)^(d-1) / sqrt (f(z) (1 - (z/z*)^(2d-2)))
## @end example
## solved by Brent's method; the area integral has its 1/sqrt singularity
## at z* removed exactly by a substitution (doc/higher_dimensional.md).
## @var{S} is the area above the cutoff z = bg.cutoff.  @var{info} has fields
## @table @code
## @item finite
## S minus the area-law divergence 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4 G),
## in the limit eps -> 0 (it differs from S minus the divergence at the
## actual cutoff by O(eps^2)).  In d = 2 the strip is an interval (no
## transverse direction: @var{Lperp} has no effect) and the divergence is
## (2 ell/(4 G)) log(1/eps) = (c/3) log(1/eps), c = 3 ell/(2 G), so the
## vacuum has finite = (c/3) log(l), l in the boundary length unit;
## @item delta
## finite minus that of the vacuum strip of the same width: independent of
## the cutoff (zero in vacuum);
## @item z_star
## the turning point;
## @item divergence
## the subtracted term;
## @item reach
## the widest strip the background admits (Inf for the vacuum; for the
## brane, the turning point within 1e-250 zh of the horizon, hundreds of zh;
## for a tabulated f, the turning point at z_max, or within 1e-30 zh of its
## horizon, some tens of zh).
## @item accuracy
## for a tabulated f, the error of @code{finite} (and @code{delta}) that
## the accuracy of its data allows: the change of @code{finite} when 1 - f
## is scaled by 1 + rho, rho its relative accuracy (the samples' noise,
## or the error of m, see doc/higher_dimensional.md); Inf where that
## background cannot reach the size; 0 for analytic f.  Computed when
## @var{info} is requested (one more solve).
## @item series
## how many widths came from the series (below);
## @item series_error
## the estimated relative error of those (the largest tail of the fitted
## Chebyshev series, relative to their scale; NaN when none).
## @end table
## Wider strips raise @code{holent:reach}.
##
## Many widths (@var{method} @qcode{"auto"}, the default, from 64 widths
## on; @qcode{"series"} for any number; @qcode{"exact"} never): for the
## black brane and for tabulated f with noise up to 1e-12 whose width is
## monotonic in z*, the width's and the finite area's excess over the
## vacuum and the cutoff term are fitted once per call by piecewise
## Chebyshev series in y = log(z*/(Z - z*)) (degree and pieces chosen
## until the series' tails are below 1e-12), each width is inverted by
## Newton's method on the series, and every output follows from the
## series.  Agreement with the exact path is 1e-13 relative or better in
## S, z* and delta (tests/check_strip_series.m; doc/fast_paths.md);
## @code{finite} agrees to 1e-13 of the larger of |finite| and the
## vacuum's |finite| at the same width (finite changes sign for wide
## strips).  Widths outside the fitted range,
## noisier data, non-monotonic widths and series that do not converge
## take the exact path (per width: Brent's method on the width
## quadrature).  The vacuum always uses its closed forms.
##
## After a global quench (@var{bgq} from @code{ads_background (d, "vaidya",
## ...)}), @code{"t"} gives the boundary times (a vector; the shell leaves the
## boundary at t = 0) and @var{S} (of the size of @var{t}) is S(t) of one
## strip of width @var{l}: the extremal surface (z(x), v(x)) in ingoing
## coordinates is shot from its tip with a GSL ODE solver; for a thin shell
## the curve of surfaces of width l is traced in the tip's time v* from the
## vacuum to the static strip (through its folds) and each time refined on
## it, for a smooth shell the tip is followed continuously in t; where
## several extremal surfaces exist the one of least area is taken, and
## @code{info.jump} marks the times where the minimal surface changed
## branch.  @var{info} has @code{finite}, @code{z_star}, @code{v_star} (the
## tip), @code{jump} and @code{divergence}.  Before the quench S(t) is the
## vacuum strip; once the static strip of the final state lies after the
## shell (thin shell) it is that strip (doc/higher_dimensional.md, "Quench").  If the width of the extremal
## surfaces is not monotonic in z* (possible for a tabulated f), the one of
## least area is returned.
##
## @seealso{ads_background, ball_entropy, strip_mutual_information}
## @end deftypefn

function [S, info] = strip_entropy (bg, l, varargin)
  fn = "strip_entropy";
  if (nargin < 2)
    print_usage ();
  endif
  l = __holent_array__ (fn, "L", l);
  o = __holent_opts__ (fn, {"length", "t", "method"}, varargin);
  Lp = 1;
  if (isfield (o, "length"))
    Lp = __holent_scalar__ (fn, "length", o.length, "positive");
  endif
  if (isfield (o, "t") || (isstruct (bg) && isscalar (bg) && isfield (bg, "kind")
                           && strcmp (bg.kind, "vaidya")))
    [S, info] = quench_ (fn, bg, l, Lp, o);
    return;
  endif
  meth = {};
  if (isfield (o, "method"))
    meth = {[], o.method};   # the gateway checks the name
  endif
  if (nargout > 1)
    [S, fin, del, zs, reach, acc, div, nser, serr] = ...
      __holent_hd__ ("strip", fn, bg, l, Lp, meth{:});
  else
    [S, fin, del, zs, reach] = __holent_hd__ ("strip", fn, bg, l, Lp, meth{:});
    acc = [];  div = [];  nser = [];  serr = [];
  endif
  if (any (zs(:) <= 2 * bg.cutoff))
    warning ("holent:cutoff", "%s: %d strip(s) turn within twice the cutoff %g",
             fn, nnz (zs(:) <= 2 * bg.cutoff), bg.cutoff);
  endif
  info = struct ("finite", fin, "delta", del, "z_star", zs,
                 "divergence", div, "reach", reach, "accuracy", acc,
                 "series", nser, "series_error", serr);
endfunction

function [S, info] = quench_ (fn, bg, l, Lp, o)
  ## S(t) after a quench (Vaidya): the core follows the branch in t
  if (! isfield (o, "t"))
    error ("holent:option", "%s: BG is a quench: give the boundary times 't'", fn);
  endif
  if (! (isstruct (bg) && isscalar (bg) && isfield (bg, "kind")
         && strcmp (bg.kind, "vaidya")))
    error ("holent:option", "%s: option 't' needs a quench: BG from ads_background (d, \"vaidya\", ...)", fn);
  endif
  if (isfield (o, "method"))
    error ("holent:option", "%s: option 'method' applies to static strips, not to a quench", fn);
  endif
  l = __holent_scalar__ (fn, "L", l, "positive");
  t = __holent_array__ (fn, "t", o.t);
  [S, fin, zs, vs, jump, div] = __holent_hd__ ("vaidya", fn, bg, l, Lp, t);
  info = struct ("finite", fin, "z_star", zs, "v_star", vs, "jump", jump,
                 "divergence", div);
endfunction

%!test
%! ## Ryu and Takayanagi 2006 (PRL 96, 181602; JHEP 08 (2006) 045), vacuum
%! ## strip: l = 2 sqrt(pi) z* G(d/(2d-2))/G(1/(2d-2)) and
%! ## S_fin = -2^(d-1) pi^((d-1)/2) ell^(d-1)/((d-2) 4G) (G(d/(2d-2))/G(1/(2d-2)))^(d-1) (Lp/l)^(d-2).
%! for d = 3:7
%!   bg = ads_background (d, "vacuum", "ell", 1.2, "G", 0.3, "cutoff", 1e-4);
%!   l = [0.1 0.7 3];
%!   [S, info] = strip_entropy (bg, l, "length", 2);
%!   g = gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2));
%!   assert (info.z_star, l / (2 * sqrt (pi) * g), 1e-13);
%!   ref = -2^(d-1) * pi^((d-1)/2) * 1.2^(d-1) / ((d - 2) * 1.2) * g^(d-1) * (2 ./ l).^(d-2);
%!   assert (info.finite, ref, 1e-12 * max (abs (ref)));
%!   assert (info.delta, zeros (1, 3));
%!   ## S at the cutoff by Octave's integral of the area element, z from eps to z*
%!   for k = 1:3
%!     zs = info.z_star(k);
%!     A = integral (@(z) 1 ./ (z.^(d-1) .* sqrt (1 - (z / zs).^(2*d-2))), 1e-4, zs,
%!                   "AbsTol", 0, "RelTol", 1e-13);
%!     assert (S(k), 2 * 1.2^(d-1) * 2^(d-2) * A / 1.2, 1e-10 * S(k));
%!   endfor
%! endfor

%!test
%! ## Black brane, d = 4: z* and the area against fzero + integral written
%! ## here from the metric (substitution z = z* (1 - t^2) at the turning point;
%! ## 1 - (1 - t^2)^(2d-2) = t^2 sum_{k<2d-2} (1 - t^2)^k so that the integrand
%! ## is not 0/0 at t = 0, which would cost integral ~1e-7 near the horizon).
%! d = 4;  zh = 1.3;
%! bg = ads_background (d, "black_brane", "zh", zh, "cutoff", 1e-3);
%! f = @(z) 1 - (z / zh).^d;
%! sg = @(u) reshape (sum (u(:)'.^((0:2*d-3)'), 1), size (u));
%! wid = @(zs) 2 * integral (@(t) 2 * (1 - t.^2).^(d-1) ./ ...
%!          sqrt (f (zs * (1 - t.^2)) .* sg (1 - t.^2)), 0, 1, "RelTol", 1e-13, "AbsTol", 0) * zs;
%! l = [0.4 1.5 3];
%! [S, info] = strip_entropy (bg, l);
%! for k = 1:3
%!   zs = fzero (@(x) wid (x) - l(k), [0.01, zh * (1 - 1e-9)], optimset ("TolX", 1e-15));
%!   assert (info.z_star(k), zs, 1e-12 * zs);
%!   u0 = 1e-3 / zs;
%!   A = integral (@(t) 2 * (1 - t.^2).^(1-d) ./ ...
%!         sqrt (f (zs * (1 - t.^2)) .* sg (1 - t.^2)), 0, sqrt (1 - u0),
%!         "RelTol", 1e-13, "AbsTol", 0) * zs^(2-d);
%!   assert (S(k), 2 * A / 4, 1e-11 * S(k));
%! endfor

%!test
%! ## First law for the strip (derived in doc/higher_dimensional.md from the
%! ## first-order change of the area, as in Blanco, Casini, Hung and Myers
%! ## 2013, JHEP 08 (2013) 060): for f = 1 - m z^d,
%! ## delta S = ell^(d-1) Lp^(d-2) m z*^2 B(1/(d-1), 3/2)/(2 (d-1) 4G) + O(m^2).
%! ## delta is computed without cancellation down to tiny widths (narrower
%! ## than the default cutoff: only the cutoff-independent delta is used).
%! warning ("off", "holent:cutoff", "local");
%! for d = [3 4 7 12]
%!   bg = ads_background (d, "black_brane", "zh", 2, "G", 0.4, "ell", 1.1);
%!   l = [1e-6 1e-3 0.02];
%!   [~, info] = strip_entropy (bg, l, "length", 1.5);
%!   zs = l / (2 * sqrt (pi) * gamma (d / (2*d - 2)) / gamma (1 / (2*d - 2)));
%!   fl = 1.1^(d-1) * 1.5^(d-2) * bg.m * zs.^2 * beta (1 / (d-1), 1.5) / (2 * (d-1) * 1.6);
%!   assert (info.delta, fl, 1e-12 * fl + 2 * (zs / 2).^d .* fl);
%! endfor

%!test
%! ## z*(l) is monotonic and below the horizon; Hamilton-Jacobi dS/dl =
%! ## ell^(d-1) Lp^(d-2)/(4 G z*^(d-1)) (derived in doc/higher_dimensional.md)
%! ## checked by central differences.
%! d = 5;  bg = ads_background (d, "black_brane", "zh", 1, "G", 0.5);
%! l = linspace (0.05, 4, 60);
%! [~, info] = strip_entropy (bg, l, "length", 1.5);
%! assert (all (diff (info.z_star) > 0) && all (info.z_star < 1));
%! h = 1e-4;  l0 = [0.3 1 2.5];
%! [~, ip] = strip_entropy (bg, l0 + h, "length", 1.5);
%! [~, im] = strip_entropy (bg, l0 - h, "length", 1.5);
%! [~, i0] = strip_entropy (bg, l0, "length", 1.5);
%! assert ((ip.finite - im.finite) / (2 * h), 1.5^(d-2) ./ (4 * 0.5 * i0.z_star.^(d-1)), -1e-6);

%!test
%! ## Large strips: the area grows as s l Lp^(d-2) with s the brane's entropy
%! ## density (the surface runs along the horizon; Hubeny 2012, JHEP 07 (2012)
%! ## 093, from memory): the slope of finite converges exponentially, that of
%! ## delta up to the vacuum's (d-2) K/l^(d-1).
%! for d = [3 4 6]
%!   bg = ads_background (d, "black_brane", "T", 0.5, "G", 0.7);
%!   l = [12 14] * bg.zh;
%!   [~, info] = strip_entropy (bg, l, "length", 2);
%!   s = bg.entropy_density * 2^(d-2);
%!   assert (diff (info.finite) / diff (l), s, 1e-8 * s);
%!   [~, iv] = strip_entropy (ads_background (d, "vacuum", "G", 0.7), l, "length", 2);
%!   assert (info.delta, info.finite - iv.finite, 1e-12 * s * l);
%! endfor

%!test
%! ## Tabulated f sampled from the analytic brane reproduces it to the
%! ## spline's accuracy (h^4 for h = 1/1000).
%! d = 4;  z = linspace (0, 1.2, 1200)';
%! bt = ads_background (d, "tabulated", "z", z, "f", 1 - z.^d, "cutoff", 1e-4);
%! bb = ads_background (d, "black_brane", "zh", 1, "cutoff", 1e-4);
%! l = [0.2 1 2.5];
%! [St, it] = strip_entropy (bt, l);
%! [Sb, ib] = strip_entropy (bb, l);
%! assert (it.z_star, ib.z_star, 1e-9);
%! assert (it.delta, ib.delta, 1e-8);
%! assert (St, Sb, 1e-10 * Sb);
%! ## beyond the widest reachable strip: a clear error
%! assert (isfinite (it.reach) && it.reach > 2.5);
%! try
%!   strip_entropy (bt, 2 * it.reach);  error ("no error");
%! catch err
%!   assert (err.identifier, "holent:reach");
%!   assert (! isempty (strfind (err.message, "strip_entropy: L(1) = ")));
%!   assert (! isempty (strfind (err.message, "beyond the largest width reachable")));
%! end_try_catch

%!test
%! ## a tabulated f with no horizon: the reach is set by z_max
%! z = linspace (0, 1, 300)';
%! bg = ads_background (3, "tabulated", "z", z, "f", 1 - 0.5 * z.^3 ./ (1 + z));
%! [~, info] = strip_entropy (bg, 0.5);
%! assert (info.reach > 0.5 && info.z_star < 1);
%! try
%!   strip_entropy (bg, 1.01 * info.reach);  error ("no error");
%! catch err
%!   assert (err.identifier, "holent:reach");
%! end_try_catch

%!test
%! ## A tabulated f with a near-horizon (f dips to 0.02 at z = 1): the width
%! ## is not monotonic in z*, several extremal surfaces share a width, and RT
%! ## takes the least area (an entanglement phase transition).  Every branch
%! ## is found here independently: widths on a grid of z* by integral,
%! ## fzero at each sign change, the area above the cutoff by integral.
%! d = 4;  z = linspace (0, 4, 2000)';  f = 1 - 1.96 * z.^4 ./ (1 + z.^8);
%! eps = 0.02;
%! bg = ads_background (d, "tabulated", "z", z, "f", f, "cutoff", eps);
%! pp = spline (z, f);  F = @(x) ppval (pp, x);
%! q = @(x, t) sqrt (F (x * (1 - t.^2)) .* (1 - (1 - t.^2).^(2*d-2)));
%! wid = @(x) 2 * x * integral (@(t) 2 * t .* (1 - t.^2).^(d-1) ./ q (x, t), 0, 1, "RelTol", 1e-10);
%! area = @(x) x^(2-d) * integral (@(t) 2 * t .* (1 - t.^2).^(1-d) ./ q (x, t), 0, sqrt (1 - eps / x), "RelTol", 1e-10) / 2;
%! zg = [linspace(0.5, 0.9, 5), linspace(0.95, 1.15, 12), linspace(1.3, 3.99, 12)];
%! wg = arrayfun (wid, zg);
%! for l = [2 3.2 3.8]
%!   k = find (diff (sign (wg - l)));
%!   Sb = zeros (size (k));
%!   for j = 1:numel (k)
%!     Sb(j) = area (fzero (@(x) wid (x) - l, zg(k(j) + [0 1])));
%!   endfor
%!   S = strip_entropy (bg, l);
%!   assert (S, min (Sb), 1e-7 * S);
%!   if (l == 3.2)
%!     assert (numel (k), 3);   # three extremal surfaces
%!   endif
%! endfor
%! [~, info] = strip_entropy (bg, 3.9);
%! assert (info.reach >= max (wg) - 1e-6 && info.reach < max (wg) + 0.05);

%!test
%! ## many widths: the series path agrees with the exact path (more in
%! ## tests/check_strip_series.m) and says so in info
%! bg = ads_background (5, "black_brane", "zh", 2, "cutoff", 1e-3);
%! l = linspace (0.05, 20, 100);
%! [S, info] = strip_entropy (bg, l);
%! [Se, ie] = strip_entropy (bg, l, "method", "exact");
%! assert ([info.series, ie.series], [100, 0]);
%! assert (info.series_error < 1e-11 && isnan (ie.series_error));
%! assert (S, Se, 1e-10 * Se);
%! assert (info.z_star, ie.z_star, 1e-10 * ie.z_star);
%! [~, i3] = strip_entropy (bg, l(1:3), "method", "series");
%! assert (i3.series, 3);

%!test
%! [S, info] = strip_entropy (ads_background (4, "vacuum"), zeros (0, 3));
%! assert (size (S), [0 3]);

%!demo
%! ## Entanglement of a strip in the d = 4 black brane: the cutoff-independent
%! ## excess over the vacuum approaches the thermal entropy s l at large l.
%! bg = ads_background (4, "black_brane", "T", 1 / pi);
%! l = linspace (0.05, 5, 200) * bg.zh;
%! [~, info] = strip_entropy (bg, l);
%! plot (l / bg.zh, info.delta, l / bg.zh, bg.entropy_density * l, "--");
%! xlabel ("l / z_h");  ylabel ("\Delta S");
%! legend ("strip: S - S_{vacuum}", "s l", "location", "northwest");

%!warning <within twice the cutoff> strip_entropy (ads_background (3, "vacuum", "cutoff", 1e-2), 0.02);
%!error <Invalid call> strip_entropy (ads_background (4, "vacuum"))
%!error <L\(2\) = 0 must be positive \(a width\)> strip_entropy (ads_background (4, "vacuum"), [1 0])
%!error <NaN> strip_entropy (ads_background (4, "vacuum"), NaN)
%!error <complex> strip_entropy (ads_background (4, "vacuum"), 1i)
%!error <unknown option> strip_entropy (ads_background (4, "vacuum"), 1, "width", 2)
%!error <method: must be "auto", "exact" or "series"> strip_entropy (ads_background (4, "vacuum"), 1, "method", "fast")
%!error <background struct> strip_entropy (ads3_background ("vacuum", "line"), 1)
%!error <L\(1\) = 1e-300 gives an entropy out of double precision> strip_entropy (ads_background (4, "vacuum"), 1e-300)
%!error <strip_entropy: BG.kind must be a short string> strip_entropy (setfield (ads_background (4, "vacuum"), "kind", 3), 1)
