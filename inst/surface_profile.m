## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{prof} =} surface_profile (@var{bg}, @var{shape}, @var{sizes})
## @deftypefnx {} {@var{prof} =} surface_profile (@dots{}, "tol", @var{tol})
## Profiles of RT surfaces in the AdS_(d+1) background @var{bg} (from
## @code{ads_background}): z(x) of the strip of width @var{sizes}(k)
## (@var{shape} = @qcode{"strip"}) or z(r) of the ball of radius
## @var{sizes}(k) (@qcode{"ball"}).
##
## The turning point (z* of the strip, the tip of the ball) comes from
## @code{strip_entropy}'s and @code{ball_entropy}'s solvers; the profile is
## then integrated from it as a geodesic of the 2-metric
## (r^(d-2)/z^(d-1))^2 (dr^2 + dz^2/f) (the strip without the r factor),
## with steps short enough that no chord strays more than @var{tol}
## times the size (default 1e-3, from 1e-10 to 0.5) from the curve (@file{doc/surfaces.md}).
##
## @var{prof} is a struct array of the size of @var{sizes} with fields
## @code{shape}, @code{size}, @code{top} (z* or the tip depth),
## @code{x} and @code{z} (columns; the strip from -l/2 to l/2 through
## x = 0, the ball from r = 0 to R) and @code{zh} (the horizon, Inf
## without).
##
## @seealso{strip_entropy, ball_entropy, plot_surface_profile}
## @end deftypefn

function prof = surface_profile (bg, shape, sizes, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  prof = __holent_surface_profile__ ("surface_profile", bg, shape, sizes, varargin);
endfunction

%!test
%! ## Vacuum: the ball is the hemisphere r^2 + z^2 = R^2 (Ryu and
%! ## Takayanagi 2006, JHEP 08 (2006) 045).
%! p = surface_profile (ads_background (4, "vacuum"), "ball", 1.5, "tol", 1e-5);
%! assert (hypot (p.x, p.z), 1.5 * ones (size (p.x)), 1e-8);
%! assert (p.z(1), 1.5, 1e-12);

%!error <Invalid call> surface_profile (ads_background (4, "vacuum"), "ball")
%!error <SHAPE must be> surface_profile (ads_background (4, "vacuum"), "disk", 1)
%!error <SIZES\(2\) = -1 must be positive> surface_profile (ads_background (4, "vacuum"), "strip", [1 -1])
%!error <SIZES\(1\) = 1e\+06 is beyond> surface_profile (ads_background (4, "black_brane", "zh", 1), "ball", 1e6)
