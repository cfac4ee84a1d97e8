## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{t} =} mi_vanishing_time (@var{bg}, @var{A})
## @deftypefnx {} {@var{t} =} mi_vanishing_time (@var{bg}, @var{A}, "tmax", @var{tmax})
## The first time shift t >= 0 (both sides' times moving forward) at which
## the two-sided mutual information I(A_L : A_R) of the region @var{A} (a
## struct with fields @code{left} and @code{right}) on the thermofield
## double @var{bg} vanishes: the bridge geodesics grow (Hartman and
## Maldacena 2013, JHEP 05 (2013) 014) until the one-sided surfaces win.
## Inf when I is still positive at @var{tmax} (default 100 beta); 0 when it
## vanishes already.  Found by bisection to 1e-14 relative
## (@file{doc/tfd_shock.md}).  For A_L = A_R = [0, l]:
## cosh(2 pi t/beta) = sinh(pi l/beta) (on a circle of circumference L while
## l < L/2; for l > L/2 the information saturates above zero: Inf).
##
## @seealso{scrambling_time, mutual_information, ads3_background}
## @end deftypefn

function t = mi_vanishing_time (bg, A, varargin)
  fn = "mi_vanishing_time";
  if (nargin != 2 && nargin != 4)
    print_usage ();
  endif
  o = __holent_opts__ (fn, {"tmax"}, varargin);
  tmax = {};   # the core's default, 100 beta
  if (isfield (o, "tmax"))
    tmax = __holent_time_entropy__ ("double", o.tmax);   # the gateway checks it
    tmax = {tmax};
  endif
  t = __holent_time__ ("mi_zero", fn, bg, A, tmax{:});
endfunction

%!test
%! ## Hartman and Maldacena 2013: cosh(2 pi t/beta) = sinh(pi l/beta).
%! bg = ads3_background ("tfd", "line", "beta", 2);
%! A = struct ("left", [0 3], "right", [0 3]);
%! assert (mi_vanishing_time (bg, A), 2 / (2 * pi) * acosh (sinh (pi * 3 / 2)), 1e-12);
%! assert (mi_vanishing_time (bg, A, "tmax", 0.1), Inf);
%! ## far apart on the two sides: no mutual information to begin with
%! assert (mi_vanishing_time (bg, struct ("left", [0 0.1], "right", [5 5.1])), 0);

%!error <Invalid call> mi_vanishing_time (1)
%!test
%! ## On a circle: the line's time while l < L/2 (windings are exponentially
%! ## suppressed); never for l > L/2, where the late surface is the pair of
%! ## geodesics over the complements (doc/tfd_shock.md, section 3).
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 6);
%! assert (mi_vanishing_time (bg, struct ("left", [0 1.5], "right", [0 1.5])), ...
%!         acosh (sinh (1.5 * pi)) / (2 * pi), 1e-10);
%! assert (mi_vanishing_time (bg, struct ("left", [0 4], "right", [0 4])), Inf);
%!error <thermofield double> mi_vanishing_time (ads3_background ("vacuum", "line"), struct ("left", [0 1], "right", [0 1]))
%!error <positive> mi_vanishing_time (ads3_background ("tfd", "line", "beta", 1), struct ("left", [0 1], "right", [0 1]), "tmax", -1)
%!error <must be a struct> mi_vanishing_time (ads3_background ("tfd", "line", "beta", 1), [0 1])
