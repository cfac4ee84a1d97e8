## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{surf} =} rt_surface (@var{bg}, @var{A})
## @deftypefnx {} {@var{surf} =} rt_surface (@dots{}, "tol", @var{tol}, "configuration", @var{which})
## The RT surface of the region @var{A} (as in @code{rt_entropy}: an
## n x 2 matrix of intervals, or a cell array of them) in the AdS3
## background @var{bg}, as curves in the bulk, ready to be drawn.
##
## The picture (@file{doc/surfaces.md}): on a line the half plane
## (x, z) with z = 1/r, the Poincare z in the vacuum and the
## Fefferman-Graham z of the static planar BTZ metric; on a circle the disk
## (R cos phi, R sin phi), phi = 2 pi x/L, R = r/(1 + sqrt(1 + r^2)) with r
## the areal radius, i.e. the Poincare disk in global and thermal AdS
## (geodesics are circles orthogonal to the unit circle).  With a conical
## defect R is the covering disk's radius and phi the true angle.  In
## rotating BTZ the HRT geodesic leaves the t = 0 slice: each point carries
## its time t in a third column and is drawn projected.
##
## Sampling: the curves are sampled so that no chord strays more than
## @var{tol} (default 1e-3, at least 1e-10, at most 0.5) from the curve in the picture's coordinates;
## each curve starts and ends exactly on the boundary.
##
## @var{which} is @qcode{"minimal"} (the default: the minimiser of
## @code{rt_entropy}) or @qcode{"runner_up"} (the best other candidate, for
## up to 8 intervals; @code{holent:domain} when there is none).
##
## @var{surf} (a struct array of the size of the cell) has fields
## @table @code
## @item picture
## @qcode{"half_plane"} or @qcode{"disk"}.
## @item curves
## a cell row, one k x 2 (k x 3 with t) array per geodesic, in the order
## of @code{pairs}.
## @item S, pairs, arcs, horizon, endpoints, intervals
## the entropy of the configuration and the fields of @code{rt_entropy}'s
## configuration.
## @item horizon_curve
## the horizon (a closed circle in the disk) when it is part of the
## surface, else empty.
## @item horizon_depth
## R of the horizon in the disk, z = 1/r_+ in the half plane, NaN without.
## @item defect
## true when the bulk has a conical defect (apex at the centre).
## @end table
##
## @seealso{rt_entropy, plot_rt_surface, surface_profile}
## @end deftypefn

function surf = rt_surface (bg, A, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  surf = __holent_rt_surface__ ("rt_surface", bg, A, varargin);
endfunction

%!test
%! ## Vacuum line: the geodesic is the semicircle (x - xc)^2 + z^2 = (l/2)^2
%! ## (common practice; Ryu and Takayanagi 2006, PRL 96, 181602), meeting
%! ## the boundary at the endpoints.
%! s = rt_surface (ads3_background ("vacuum", "line"), [-1 3], "tol", 1e-4);
%! c = s.curves{1};
%! assert (s.picture, "half_plane");
%! assert (hypot (c(:,1) - 1, c(:,2)), 2 * ones (rows (c), 1), 1e-12);
%! assert (c([1 end], :), [-1 0; 3 0], 1e-14);
%! ## the chords stay within tol of the circle
%! m = (c(1:end-1,:) + c(2:end,:)) / 2;
%! assert (max (2 - hypot (m(:,1) - 1, m(:,2))) <= 1e-4);

%!test
%! ## Runner-up of two close intervals is the disconnected pair (Headrick
%! ## 2010, PRD 82, 126010).
%! bg = ads3_background ("vacuum", "line");
%! s = rt_surface (bg, [0 1; 1.2 2.2], "configuration", "runner_up");
%! assert (s.pairs, [1 2; 3 4]);
%! assert (s.S, rt_entropy (bg, [0 1]) + rt_entropy (bg, [1.2 2.2]), 1e-12);
%! s = rt_surface (bg, [0 1; 1.2 2.2]);
%! assert (s.pairs, [1 4; 2 3]);

%!error <Invalid call> rt_surface (ads3_background ("vacuum", "line"))
%!error <configuration must be> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "best")
%!error <single RT candidate> rt_surface (ads3_background ("vacuum", "line"), [0 1], "configuration", "runner_up")
%!error <tol must lie> rt_surface (ads3_background ("vacuum", "line"), [0 1], "tol", 0)
%!error <overlap> rt_surface (ads3_background ("vacuum", "line"), [0 2; 1 3])
