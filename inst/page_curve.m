## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} page_curve (@var{bg}, @var{R}, @var{t})
## @deftypefnx {} {[@var{S}, @var{info}] =} page_curve (@var{bg}, @var{R}, @var{t})
## Entropy of a radiation region in the thermofield double of two BCFTs on
## half lines, at boundary time @var{t} on both sides.
##
## @var{bg} comes from @code{ads3_background ("bcft_tfd", "half_line",
## "beta", b, "tension", T)} (0 <= T < 1/ell): eternal planar BTZ with an
## end-of-the-world brane through the Einstein-Rosen bridge, the eternal
## black hole coupled to a bath in the double-holography reading.
## @var{R} is an n x 2 matrix of intervals [start, end] on x > 0 (a start
## at 0, on the boundary of the BCFT, is an error), taken on both sides (an
## end may be Inf); @var{t} a numeric array of times, both
## sides running forward.  @var{S} (the size of @var{t}) is the RT entropy
## of R_L u R_R, minimised exactly over every non-crossing configuration of
## geodesics within a side, through the bridge (growing with t) and ending
## on the brane (an island); see @file{doc/bcft.md}.
##
## @var{info} has fields
## @table @code
## @item phase
## cellstr of the size of @var{t}: @qcode{"island"} when the minimiser has
## no geodesic through the bridge and some ending on the brane,
## @qcode{"no_island"} otherwise;
## @item page_time
## the time after which S stays at its island value (0 if from the start);
## @item S_island
## the entropy without bridge geodesics (independent of t);
## @item S_no_island
## the least entropy with at least one bridge geodesic, per time (Inf
## when R has no endpoint);
## @item n_bridge, n_brane
## per time, geodesics through the bridge and onto the brane, per side;
## @item island
## the landing points [x, z] on the brane (one side; the other is its
## mirror) of the island configuration: the island's edges in the bulk;
## @item island_endpoints
## the boundary points those geodesics start from;
## @item island_pairs
## the geodesics of that configuration joining two points of R on one
## side, as [x1, x2] rows (@code{rt_surface} draws the whole
## configuration).
## @end table
##
## For R = [b, Inf] this is S = (c/3) min(log((beta/(pi eps)) cosh(2 pi t/beta)),
## log((beta/(pi eps)) sinh(2 pi b/beta)) + arctanh(T ell)), with Page time
## (beta/(2 pi)) arccosh(exp(rho) sinh(2 pi b/beta)).
## @seealso{ads3_background, rt_entropy}
## @end deftypefn
function [S, info] = page_curve (bg, R, t)
  fn = "page_curve";
  if (nargin != 3)
    print_usage ();
  endif
  if (! __holent_is_bcft__ (bg))
    error ("holent:background",
           "%s: BG must be a two-sided BCFT background from ads3_background (\"bcft_tfd\", ...)", fn);
  endif
  if (! isnumeric (R) || islogical (R) || ! isreal (R))
    error ("holent:type", "%s: R must be a real n x 2 matrix of [start, end] rows", fn);
  endif
  t = __holent_array__ (fn, "t", t);
  [S, kb, nb, Sno, pg] = __holent_bcft__ ("page", fn, bg, full (double (R)), t);
  if (nargout > 1)
    phase = repmat ({"no_island"}, size (t));
    phase(kb == 0 & nb > 0) = {"island"};
    info = struct ("phase", {phase}, "page_time", pg.page_time,
                   "S_island", pg.S_island, "S_no_island", Sno,
                   "n_bridge", kb, "n_brane", nb, "island", pg.island,
                   "island_endpoints", pg.island_endpoints,
                   "island_pairs", pg.island_pairs);
  endif
  if (pg.n_short > 0)
    warning ("holent:cutoff",
             "%s: some interval, gap or distance to the boundary is not longer than twice the cutoff %g",
             fn, bg.cutoff);
  endif
endfunction

%!shared bg
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6, "c", 6);

%!test
%! ## R = [b, Inf]: Hartman-Maldacena growth, then the island plateau
%! ## (Almheiri, Mahajan, Maldacena 2019, arXiv:1910.11077, from memory)
%! b = 1; eps = bg.cutoff;
%! t = linspace (0, 5, 11);
%! [S, info] = page_curve (bg, [b, Inf], t);
%! Shm = 2 * log (2 / (pi * eps) * cosh (pi * t));
%! Sis = 2 * (log (2 / (pi * eps) * sinh (pi * b)) + atanh (0.6));
%! assert (S, min (Shm, Sis), 1e-12);
%! assert (info.page_time, acosh (exp (atanh (0.6)) * sinh (pi * b)) / pi, 1e-12);
%! assert (info.phase{1}, "no_island");
%! assert (info.phase{end}, "island");
%! assert (size (info.island), [1 2]);

%!test
%! [S, info] = page_curve (bg, [0.5 1; 2 Inf], [0 1]);
%! assert (size (S), [1 2]);
%! assert (info.S_island >= S(2) - 1e-12);

%!error <Invalid call> page_curve (bg, [1 2])
%!error <two-sided> page_curve (ads3_background ("vacuum", "line"), [1 2], 0)
%!error <two-sided> page_curve (ads3_background ("bcft", "half_line"), [1 2], 0)
%!error <x > 0> page_curve (bg, [-1 2], 0)
%!error <NaN> page_curve (bg, [1 2], NaN)
%!error <overlap> page_curve (bg, [1 3; 2 4], 0)
