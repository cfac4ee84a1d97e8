## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {[@var{t_bulk}, @var{t_boundary}] =} bulk_light_time (@var{bg}, @var{x1}, @var{x2})
## @deftypefnx {} {[@dots{}] =} bulk_light_time (@dots{}, "tol", @var{tol})
## The earliest boundary time at which a null signal sent into the bulk
## from the boundary point @var{x1} at t = 0 first returns to the boundary
## at @var{x2}, and next to it the boundary light time (|x2 - x1| on a line,
## the circle distance on a circle).  @var{x1} and @var{x2} broadcast.
##
## @var{t_bulk} is Inf when no ray lands at @var{x2}: in Poincare AdS (the
## rays never come back), through every black hole (BTZ, planar BTZ,
## rotating, the thermofield double, after a quench: every ray falls in).
## In global and thermal AdS every ray lands on the antipode at exactly
## half the circumference; with a conical defect at x1 +- L/(2 alpha), at
## t = L/(2 alpha), later than light along the boundary (Gao and Wald 2000,
## Class. Quant. Grav. 17, 4999: the bulk never beats the boundary).  A
## point counts as a landing point within @var{tol} (default 1e-9 times
## the circumference).  Derivation: @file{doc/bulk_causality.md}.
##
## @seealso{ads3_background, geodesic_length}
## @end deftypefn

function [tb, tl] = bulk_light_time (bg, x1, x2, varargin)
  fn = "bulk_light_time";
  if (nargin != 3 && nargin != 5)
    print_usage ();
  endif
  o = __holent_opts__ (fn, {"tol"}, varargin);
  tol = {};   # the core's default, 1e-9 times the circumference
  if (isfield (o, "tol"))
    tol = __holent_time_entropy__ ("double", o.tol);   # the gateway checks it
    tol = {tol};
  endif
  if (! isscalar (x1) && ! isscalar (x2))
    ## the gateway repeats a scalar itself: no full-size copy of it
    [x1, x2] = __holent_time_entropy__ ("broadcast", fn, {"X1", "X2"}, x1, x2);
  endif
  [tb, tl] = __holent_time__ ("light", fn, bg, x1, x2, tol{:});
endfunction

%!test
%! ## Global AdS: the antipode at L/2, equal to the boundary light time.
%! bg = ads3_background ("vacuum", "circle", "circumference", 10);
%! [tb, tl] = bulk_light_time (bg, 1, [6, 5]);
%! assert (tb, [5, Inf]);
%! assert (tl, [5, 4], 1e-14);

%!test
%! ## Conical defect: later than the boundary (Gao and Wald 2000).
%! bg = ads3_background ("heavy", "circle", "alpha", 0.8, "circumference", 10);
%! [tb, tl] = bulk_light_time (bg, 0, 10 / 1.6);
%! assert (tb, 10 / 1.6, 1e-12);
%! assert (tb > tl);

%!test
%! ## Black holes: nothing comes back.
%! assert (bulk_light_time (ads3_background ("thermal", "circle", "beta", 1), 0, pi), Inf);
%! assert (bulk_light_time (ads3_background ("tfd", "line", "beta", 1), 0, 1), Inf);
%! assert (bulk_light_time (ads3_background ("vacuum", "line"), 0, 1), Inf);

%!error <Invalid call> bulk_light_time (1, 2)
%!error <background struct> bulk_light_time (1, 2, 3)
%!error <do not broadcast> bulk_light_time (ads3_background ("vacuum", "line"), [1 2], [1 2 3])
%!error <nonnegative> bulk_light_time (ads3_background ("vacuum", "line"), 1, 2, "tol", -1)
%!error <bulk_light_time: X1\(1\): must not be NaN> bulk_light_time (ads3_background ("vacuum", "line"), NaN, 2)
%!error <X2\(2\): must be finite> bulk_light_time (ads3_background ("vacuum", "line"), 1, [2 Inf])
%!error <X1 must be a real> bulk_light_time (ads3_background ("vacuum", "line"), 1i, 2)
%!test
%! ## a row against a column broadcasts
%! [tb, tl] = bulk_light_time (ads3_background ("vacuum", "line"), [0; 1], [2 3]);
%! assert (tl, [2 3; 1 2]);
%! assert (tb, Inf (2, 2));
