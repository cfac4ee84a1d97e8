## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{E} =} wedge_cross_section (@var{bg}, @var{A}, @var{B})
## @deftypefnx {} {[@var{E}, @var{info}] =} wedge_cross_section (@var{bg}, @var{A}, @var{B})
## @deftypefnx {} {[@dots{}] =} wedge_cross_section (@dots{}, "reflected", @var{tf})
## Entanglement wedge cross section E_W of two disjoint boundary intervals
## @var{A} and @var{B} in background @var{bg} (from @code{ads3_background}),
## in entropy units: (length of the minimal cross section)/(4G) =
## (c/6) (length/ell).
##
## @var{A} and @var{B} are each one interval, a row @code{[start, end]}, or
## a cell array of such rows (the batch convention of
## @file{doc/conventions.md}): @var{E} then has the size of the cell, and a
## row or a one-element cell is paired with every element of the other.
## A k x 2 matrix is one region of k intervals, not k pairs, and is
## refused here (@code{holent:type}): E_W is of two intervals.
## On a line start < end; on a circle of circumference L an interval runs
## from start to end in the positive direction, coordinates modulo L, and
## must be shorter than L.  Overlapping intervals raise
## @code{holent:overlap}; intervals that touch raise
## @code{holent:coincident} (E_W of adjacent intervals diverges with the
## cutoff and is not returned).
##
## @var{E} is zero when the entanglement wedge of AB is disconnected.  The
## phase is the core's two-interval minimisation (the one of
## @code{rt_entropy}): the wedge is connected when the minimal surface of
## A u B pairs endpoints of A with endpoints of B, i.e. z_L z_R > 1 (ties
## count as disconnected).  In
## the connected phase, with the chord function g of the background,
## @example
## z = g(l_A) g(l_B) / (g(d_1) g(d_2)),
## E_W = (c/6) log (1 + 2z + 2 sqrt (z (z + 1)))
## @end example
## (Takayanagi and Umemoto 2017), d_1, d_2 the two gaps (on a line d_2 is
## the span l_A + d_1 + l_B); g(y) = y on the vacuum line,
## (L/pi) sin (pi y/L) on the circle (global AdS, thermal AdS),
## (beta/pi) sinh (pi y/beta) on the thermal line.  In the rotating state on
## a line each chiral half contributes half a cross section:
## @example
## E_W = (c/12) [log (1 + 2z_L + 2 sqrt (z_L (z_L + 1))) + (same for z_R)]
## @end example
## with z_L, z_R built from g at beta_L and beta_R.  Derivation in
## @file{doc/wedge_cross_section.md}.
##
## Option @qcode{"reflected"}, true: return the reflected entropy
## S_R = 2 E_W (Dutta and Faulkner 2019) instead of E_W.
##
## @var{info} is a struct array of the size of @var{E} with fields
## @table @code
## @item phase
## @qcode{"connected"} or @qcode{"disconnected"}.
## @item E_W, S_R
## the cross section and the reflected entropy (whatever @qcode{"reflected"}).
## @item E_connected
## the cross section of the connected wedge, whether or not it dominates
## (so E_W is E_connected or 0).
## @item cross_ratio
## z; in the rotating state the pair [z_L, z_R].
## @item geodesics
## 2 x 2: the endpoints of the two RT geodesics of the connected surface,
## row 1 from the end of A to the start of B, row 2 from the end of B to the
## start of A (modulo L on a circle).
## @item points
## 2 x 3: the bulk points (t, x, r) where the minimal cross section meets
## the geodesic of row 1 and of row 2 (NaN in the disconnected phase).
## @item coordinates
## the bulk coordinates of @code{points}, in words.
## @end table
## The coordinates (t, x, r) are those of
## @example
## ds^2 = -f dt^2 + dr^2/f + r^2 (dx - (r_+ r_-/r^2) dt)^2,
## f = (r^2 - r_+^2)(r^2 - r_-^2)/r^2
## @end example
## with x the boundary coordinate: Poincare AdS has r_+ = r_- = 0 and
## r = 1/z (z the Poincare radial coordinate); global and thermal AdS have
## r_+^2 = -(2 pi/L)^2, r_- = 0, so r = (2 pi/L) sinh (rho) and the angle is
## 2 pi x/L; planar BTZ r_+ = 2 pi/beta, r_- = 0; planar rotating BTZ
## r_+- = pi (1/beta_L +- 1/beta_R).  t = 0 except in the rotating state,
## where the RT geodesics leave the t = 0 slice.
##
## Not implemented (error @code{holent:unsupported}): the BTZ black hole and
## the rotating BTZ black hole on a circle, where the wedge may contain the
## horizon and the cross section may end on it, and the conical defect.
##
## A warning @code{holent:cutoff} is issued when an interval or a gap is not
## longer than twice the cutoff, where the closed forms lose their meaning.
##
## @seealso{rt_entropy, interval_entropy, ads3_background}
## @end deftypefn

function [E, info] = wedge_cross_section (bg, A, B, varargin)
  fn = "wedge_cross_section";
  if (nargin < 3)
    print_usage ();
  endif
  reflected = false;
  if (nargin > 3)
    o = __holent_opts__ (fn, {"reflected"}, varargin);
    if (isfield (o, "reflected"))
      reflected = __holent_bool__ (fn, "'reflected'", o.reflected);
    endif
  endif
  A = interval_arg (fn, "A", A);
  B = interval_arg (fn, "B", B);
  ## the core checks the pairs (naming A{k} or B{k}) and decides the phase
  [Ec, conn, zL, zR, P, G, nshort] = __holent_ewcs__ ("pairs", fn, bg, A, B);
  if (nshort > 0)
    warning ("holent:cutoff",
             "%s: %d pair(s) with an interval or a gap not longer than twice the cutoff %g",
             fn, nshort, bg.cutoff);
  endif
  EW = Ec .* conn;
  if (reflected)
    E = 2 * EW;
  else
    E = EW;
  endif

  if (nargout > 1)
    rot = strcmp (bg.bulk, "planar_rotating_btz");
    words = coordinates (bg);
    info = repmat (struct ("phase", "", "E_W", 0, "S_R", 0, "E_connected", 0,
                           "cross_ratio", 0, "geodesics", zeros (2),
                           "points", zeros (2, 3), "coordinates", words), size (E));
    for j = 1:numel (E)
      info(j).phase = merge (conn(j), "connected", "disconnected");
      info(j).E_W = EW(j);
      info(j).S_R = 2 * EW(j);
      info(j).E_connected = Ec(j);
      info(j).cross_ratio = merge (rot, [zL(j), zR(j)], zL(j));
      info(j).geodesics = reshape (G(j,:), 2, 2).';
      if (conn(j))
        info(j).points = reshape (P(j,:), 3, 2).';
      else
        info(j).points = NaN (2, 3);
      endif
    endfor
  endif
endfunction

## Numeric input as full double (sparse and integer accepted), in a cell
## or not; classes and shapes are the gateway's.
function x = interval_arg (fn, name, x)
  if (iscell (x))
    for k = 1:numel (x)
      x{k} = as_double (fn, sprintf ("%s{%d}", name, k), x{k});
    endfor
  else
    x = as_double (fn, name, x);
  endif
endfunction

function x = as_double (fn, name, x)
  if (! isnumeric (x) || islogical (x))
    error ("holent:type", "%s: %s must be a numeric row [start, end], got %s",
           fn, name, class (x));
  endif
  if (! isreal (x))
    error ("holent:type", "%s: %s must be real, not complex", fn, name);
  endif
  if (! isa (x, "double") || issparse (x))
    x = full (double (x));
  endif
endfunction

function s = coordinates (bg)
  switch (bg.bulk)
    case "poincare"
      s = "(t, x, r), r = 1/z: ds^2 = (dz^2 - dt^2 + dx^2)/z^2";
    case {"global_ads", "thermal_ads"}
      s = ["(t, x, r), r = (2 pi/L) sinh(rho), angle 2 pi x/L: ds^2 = ", ...
           "-(r^2 + (2 pi/L)^2) dt^2 + dr^2/(r^2 + (2 pi/L)^2) + r^2 dx^2"];
    case "planar_btz"
      s = ["(t, x, r): ds^2 = -(r^2 - r_+^2) dt^2 + dr^2/(r^2 - r_+^2) + r^2 dx^2,", ...
           " r_+ = 2 pi/beta"];
    otherwise
      s = ["(t, x, r): ds^2 = -f dt^2 + dr^2/f + r^2 (dx - (r_+ r_-/r^2) dt)^2,", ...
           " f = (r^2 - r_+^2)(r^2 - r_-^2)/r^2, r_+- = pi (1/beta_L +- 1/beta_R)"];
  endswitch
endfunction


%!test
%! ## Takayanagi and Umemoto 2017 (arXiv:1708.09393, Nature Phys. 14, 573
%! ## (2018)): two intervals in the Poincare vacuum,
%! ## E_W = (c/6) log(1 + 2z + 2 sqrt(z(z+1))),
%! ## z = (a2-a1)(b2-b1)/((b1-a2)(b2-a1)), connected for z > 1.
%! bg = ads3_background ("vacuum", "line", "c", 12);
%! A = [0 1; -3 -0.5; 0 2];  B = [1.2 2; 0.5 3; 5 6];
%! z = (A(:,2) - A(:,1)) .* (B(:,2) - B(:,1)) ./ ((B(:,1) - A(:,2)) .* (B(:,2) - A(:,1)));
%! ref = 2 * log (1 + 2*z + 2*sqrt (z .* (z + 1))) .* (z > 1);
%! [E, info] = wedge_cross_section (bg, num2cell (A, 2), num2cell (B, 2));
%! assert (E, ref, 1e-12);
%! assert ({info.phase}, {"connected", "connected", "disconnected"});
%! assert ([info.cross_ratio], z.', 1e-14);
%! ## symmetric pair: the cross section is x = 0 from z = 1/2 to z = 3,
%! ## of length log 6 (by hand)
%! assert (info(2).E_W, 2 * log (6), 1e-12);
%! assert (info(2).points, [0 0 2; 0 0 1/3], 1e-12);
%! assert (info(2).geodesics, [-0.5 0.5; 3 -3]);
%! assert (all (isnan (info(3).points(:))));
%! assert (info(3).E_connected > 0);

%!test
%! ## Reflected entropy S_R = 2 E_W (Dutta and Faulkner 2019, arXiv:1905.00577).
%! bg = ads3_background ("thermal", "line", "beta", 2, "c", 6);
%! [E, info] = wedge_cross_section (bg, [0 3], [3.2 5]);
%! SR = wedge_cross_section (bg, [0 3], [3.2 5], "reflected", true);
%! assert (SR, 2 * E, 1e-14);
%! assert (info.S_R, SR, 1e-14);
%! assert (E > 0);

%!test
%! ## Thermal line: cross-ratio of w = exp(2 pi x/beta) equals the sinh form.
%! bg = ads3_background ("thermal", "line", "beta", 1.5);
%! [~, info] = wedge_cross_section (bg, [0.3 1.1], [1.25 2.9]);
%! w = exp (2 * pi * [0.3 1.1 1.25 2.9] / 1.5);
%! z = (w(2) - w(1)) * (w(4) - w(3)) / ((w(3) - w(2)) * (w(4) - w(1)));
%! assert (info.cross_ratio, z, 1e-10);

%!test
%! ## Rotating line: [z_L, z_R]; the points leave t = 0; B before A works.
%! bg = ads3_background ("rotating", "line", "beta_L", 0.8, "beta_R", 1.6);
%! [E, info] = wedge_cross_section (bg, [0 2], [2.05 3]);
%! [E2, info2] = wedge_cross_section (bg, [2.05 3], [0 2]);
%! assert (E2, E, 1e-13);
%! assert (info2.points, flipud (info.points), 1e-10);
%! assert (numel (info.cross_ratio), 2);
%! assert (any (abs (info.points(:,1)) > 1e-3));
%! assert (E, 1/6 * sum (asinh (sqrt (info.cross_ratio))), 1e-13);

%!test
%! ## Circle: wrapping intervals, A and B written either way modulo L.
%! bg = ads3_background ("vacuum", "circle", "circumference", 10);
%! E1 = wedge_cross_section (bg, [9 12], [2.5 8]);
%! E2 = wedge_cross_section (bg, [-1 2], [2.5 -2]);
%! assert (E1, E2, 1e-12);
%! s = @(y) sin (pi * y / 10);
%! z = s(3) * s(5.5) / (s(0.5) * s(1));
%! assert (E1, (1/6) * log (1 + 2*z + 2*sqrt (z*(z+1))), 1e-12);

%!test
%! bg = ads3_background ("vacuum", "line");
%! [E, info] = wedge_cross_section (bg, cell (0, 1), cell (0, 1));
%! assert (size (E), [0 1]);
%! assert (size (info), [0 1]);
%! E = wedge_cross_section (bg, [0 1], {[1.1 2]; [3 4]; [1.01 9]});
%! assert (size (E), [3 1]);
%! ## a row, a one-element cell and integer or sparse input: one convention
%! E1 = wedge_cross_section (bg, {[0 1]}, {[1.1 2], [3 4]});
%! assert (size (E1), [1 2]);
%! assert (E1, E(1:2).', 0);
%! assert (wedge_cross_section (bg, int8 ([0 1]), sparse ([1.1 2])), E(1));

%!warning <twice the cutoff> wedge_cross_section (ads3_background ("vacuum", "line", "cutoff", 1e-3), [0 1], [1.001 2]);
%!error <Invalid call> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1])
%!error <not implemented for the 'btz'> wedge_cross_section (ads3_background ("thermal", "circle", "beta", 1), [0 1], [2 3])
%!error <not implemented for the 'rotating_btz'> wedge_cross_section (ads3_background ("rotating", "circle", "beta_L", 1, "beta_R", 2), [0 1], [2 3])
%!error <not implemented for the 'conical_defect'> wedge_cross_section (ads3_background ("heavy", "circle", "alpha", 0.5), [0 1], [2 3])
%!error <A and B overlap> wedge_cross_section (ads3_background ("vacuum", "line"), [0 2], [1 3])
%!error <B\{2\}: A and B overlap> wedge_cross_section (ads3_background ("vacuum", "line"), {[0 1], [0 2]}, {[2 3], [1 3]})
%!error <touch> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1], [1 3])
%!error <touch> wedge_cross_section (ads3_background ("vacuum", "circle"), [0 1], [3 2*pi])
%!error <B: must have start < end> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1], [3 2])
%!error <A: has zero length> wedge_cross_section (ads3_background ("vacuum", "line"), [1 1], [3 4])
%!error <shorter than the circle> wedge_cross_section (ads3_background ("vacuum", "circle"), [0 1], [2 2 + 2*pi])
%!error <overlap> wedge_cross_section (ads3_background ("vacuum", "circle"), [0 1], [2 0.5])
%!error <A: must be one interval, a real 1 x 2 row> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1 2], [3 4])
%!error <B: must be one interval> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1], [3 4; 5 6])
%!error <as many elements> wedge_cross_section (ads3_background ("vacuum", "line"), {[0 1], [2 3]}, {[4 5], [6 7], [8 9]})
%!error <NaN> wedge_cross_section (ads3_background ("vacuum", "line"), [0 NaN], [3 4])
%!error <complex> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1i], [3 4])
%!error <'reflected' must be> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1], [3 4], "reflected", "yes")
%!error <unknown option> wedge_cross_section (ads3_background ("vacuum", "line"), [0 1], [3 4], "mirror", 1)
%!error <background struct> wedge_cross_section (1, [0 1], [3 4])

%!demo
%! ## The minimal cross section between the two RT geodesics of a connected
%! ## wedge in Poincare AdS3 (plotted in the (x, z) half-plane, z = 1/r).
%! bg = ads3_background ("vacuum", "line");
%! A = [-2 -0.4];  B = [0.1 1.5];
%! [E, info] = wedge_cross_section (bg, A, B);
%! th = linspace (0, pi, 200);
%! clf; hold on;
%! for g = 1:2
%!   e = info.geodesics(g,:);
%!   plot (mean (e) + abs (diff (e)) / 2 * cos (th), abs (diff (e)) / 2 * sin (th), "b");
%! endfor
%! ## the cross section is an arc of the geodesic through the two points
%! p = info.points;  x = p(:,2);  z = 1 ./ p(:,3);
%! xc = (x(2)^2 + z(2)^2 - x(1)^2 - z(1)^2) / (2 * (x(2) - x(1)));
%! R = hypot (x(1) - xc, z(1));
%! a = atan2 (z, x - xc);  t = linspace (a(1), a(2), 50);
%! plot (xc + R * cos (t), R * sin (t), "r", "linewidth", 2);
%! plot ([A; B].', zeros (2), "k", "linewidth", 4);
%! axis equal; xlabel ("x"); ylabel ("z");
%! title (sprintf ("E_W = %.3f (c = 1)", E));
%!error <BG.horizon must be true or false> wedge_cross_section (setfield (ads3_background ("vacuum", "line"), "horizon", "yes"), [0 1], [2 3])
%!error <BCFT background> wedge_cross_section (ads3_background ("bcft", "half_line"), [0 1], [2 3])
