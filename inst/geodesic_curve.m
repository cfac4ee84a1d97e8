## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{C} =} geodesic_curve (@var{bg}, @var{P1}, @var{P2})
## @deftypefnx {} {@var{C} =} geodesic_curve (@dots{}, "tol", @var{tol})
## The bulk geodesic between the boundary points @var{P1} = [x1, t1] and
## @var{P2} = [x2, t2] (rows; n x 2 each for n geodesics) of the AdS3
## background @var{bg}, endpoints at different times allowed (a boosted
## interval): the curve leaves the constant-time slice, and its points come
## with their boundary time.
##
## @var{C} is an n x 1 cell of k x 3 arrays [X, Y, t]: X, Y in the picture
## of @code{rt_surface} (half plane (x, z = 1/r) on a line, disk on a
## circle) and t the time coordinate of the point (the boundary time at
## the ends; Schwarzschild time in BTZ, global time in global AdS).  On a
## circle the geodesic runs over the arc from x1 to x2 in the positive
## direction.  Sampled to @var{tol} (default 1e-3) as in
## @code{rt_surface}; built in the embedding space (@file{doc/surfaces.md}).
## Endpoints that are not spacelike separated raise
## @code{holent:timelike}.
##
## @seealso{rt_surface, geodesic_length}
## @end deftypefn

function C = geodesic_curve (bg, P1, P2, varargin)
  fn = "geodesic_curve";
  if (nargin < 3)
    print_usage ();
  endif
  P1 = __holent_array__ (fn, "P1", P1);
  P2 = __holent_array__ (fn, "P2", P2);
  if (columns (P1) != 2 || columns (P2) != 2 || ndims (P1) > 2 || ndims (P2) > 2
      || rows (P1) != rows (P2) || isempty (P1))
    error ("holent:size", "%s: P1 and P2 must be n x 2 arrays of [x, t] rows, n >= 1, of one size", fn);
  endif
  o = __holent_opts__ (fn, {"tol"}, varargin);
  tol = 1e-3;
  if (isfield (o, "tol"))
    tol = __holent_scalar__ (fn, "tol", o.tol, {1e-10, 0.5, "[]"});
  endif
  C = __holent_surface__ ("boosted", fn, bg, P1(:,1), P1(:,2),
                          P2(:,1), P2(:,2), tol);
endfunction

%!test
%! ## t1 = t2: the curve of rt_surface
%! bg = ads3_background ("thermal", "circle", "beta", 2);
%! C = geodesic_curve (bg, [0.5 0], [2 0], "tol", 1e-4);
%! s = rt_surface (bg, [0.5 2], "tol", 1e-4);
%! assert (C{1}(:, 1:2), s.curves{1}, 1e-12);
%! assert (C{1}(:, 3), zeros (rows (C{1}), 1));

%!test
%! ## Poincare, boosted: the curve lies on z^2 + (x - xc)^2 - (t - tc)^2 = R^2
%! ## with R^2 = (dx^2 - dt^2)/4 (common practice).
%! C = geodesic_curve (ads3_background ("vacuum", "line"), [0 0], [2 1]);
%! c = C{1};
%! assert (c(:,2).^2 + (c(:,1) - 1).^2 - (c(:,3) - 0.5).^2, (4 - 1) / 4 * ones (rows (c), 1), 1e-12);
%! assert (c([1 end], :), [0 0 0; 2 0 1], 1e-14);

%!error <Invalid call> geodesic_curve (ads3_background ("vacuum", "line"), [0 0])
%!error <not spacelike separated> geodesic_curve (ads3_background ("vacuum", "line"), [0 0], [1 2])
%!error <not spacelike separated> geodesic_curve (ads3_background ("thermal", "line", "beta", 1), [0 0], [1 1])
%!error <n x 2> geodesic_curve (ads3_background ("vacuum", "line"), [0 0 0], [1 0])
