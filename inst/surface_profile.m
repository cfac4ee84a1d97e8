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
  fn = "surface_profile";
  if (nargin < 3)
    print_usage ();
  endif
  __holent_hd__ ("check", fn, bg);   # one core call checks BG
  if (! ischar (shape) || ! any (strcmp (shape, {"strip", "ball"})))
    error ("holent:option", "%s: SHAPE must be \"strip\" or \"ball\"", fn);
  endif
  sizes = __holent_array__ (fn, "SIZES", sizes);
  k = find (! (sizes(:) > 0), 1);
  if (! isempty (k))
    error ("holent:domain", "%s: SIZES(%d) = %g must be positive", fn, k, sizes(k));
  endif
  o = __holent_opts__ (fn, {"tol"}, varargin);
  rtol = 1e-3;
  if (isfield (o, "tol"))
    rtol = __holent_scalar__ (fn, "tol", o.tol, {1e-10, 0.5, "[]"});
  endif
  ball = strcmp (shape, "ball");
  try
    if (ball)
      [~, ~, ~, top] = __holent_hd__ ("ball", fn, bg, sizes);
    else
      [~, ~, ~, top] = __holent_hd__ ("strip", fn, bg, sizes, 1);
    endif
  catch err
    ## the solvers name the sizes R(k) or L(k): here they are SIZES(k)
    err.message = regexprep (err.message, '(^|: )(R|L)\(', '$1SIZES(');
    __holent_rethrow__ (err, "__holent_hd__", fn);
  end_try_catch
  prof = struct ("shape", {}, "size", {}, "top", {}, "x", {}, "z", {}, "zh", {});
  for k = 1:numel (sizes)
    tol = rtol * sizes(k);
    c = __holent_call_fn__ (fn, "__holent_surface__", "profile", bg, double (ball), top(k), tol);
    if (! ball)
      ## mirror the half profile: from -l/2 through the turning point
      c = [-flipud(c(2:end,1)), flipud(c(2:end,2)); c];
    endif
    prof(k).shape = shape;
    prof(k).size = sizes(k);
    prof(k).top = top(k);
    prof(k).x = c(:,1);
    prof(k).z = c(:,2);
    prof(k).zh = bg.zh;
  endfor
  prof = reshape (prof, size (sizes));
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
