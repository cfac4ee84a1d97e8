## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn {} {[@var{t_star}, @var{alpha_star}] =} scrambling_time (@var{bg}, @var{A})
## Scrambling under a shock wave (Shenker and Stanford 2014, JHEP 03 (2014)
## 067): the smallest shift @var{alpha_star} of the shock at which the
## two-sided mutual information I(A_L : A_R) of the region @var{A} (a struct
## with fields @code{left} and @code{right}, at the times it gives) vanishes,
## and the time @var{t_star} = (beta/(2 pi)) log(4 M alpha_star/E) at which a
## perturbation of energy E (@code{bg.shock_energy}) must be released on the
## left for that: the scrambling time.  @var{bg} is a thermofield double
## (@code{ads3_background ("tfd", ..., "shock_energy", E, "shock_time", tw)};
## the shift it carries is ignored here; without an energy @var{t_star} is
## NaN).  For A_L = A_R = [0, l] at t = 0, alpha* = 2 (sinh(pi l/beta) - 1).
## Both are Inf when no shock removes the correlation (on a circle of
## circumference L, e.g. A_L = A_R longer than L/2: the surfaces over the
## complements keep I > 0 without the bridge).
## Derivation: @file{doc/tfd_shock.md}.
##
## @seealso{mi_vanishing_time, ads3_background, mutual_information}
## @end deftypefn

function [tstar, astar] = scrambling_time (bg, A)
  fn = "scrambling_time";
  if (nargin != 2)
    print_usage ();
  endif
  [tstar, astar] = __holent_time__ ("scramble", fn, bg, A);
endfunction

%!test
%! ## Shenker and Stanford 2014: alpha* = 2 (sinh(pi l/beta) - 1) and
%! ## t* = (beta/(2 pi)) log(4 M alpha*/E).
%! E = 1e-4;  l = 2;  beta = 1;
%! bg = ads3_background ("tfd", "line", "beta", beta, "c", 6, "shock_energy", E, "shock_time", 0);
%! [ts, as] = scrambling_time (bg, struct ("left", [0 l], "right", [0 l]));
%! assert (as, 2 * (sinh (pi * l / beta) - 1), 1e-10 * as);
%! M = pi * 6 / (6 * beta^2);
%! assert (ts, beta / (2 * pi) * log (4 * M * as / E), 1e-10);
%! ## the mutual information indeed vanishes there
%! sh = ads3_background ("tfd", "line", "beta", beta, "c", 6, "shock_alpha", as * (1 + 1e-9));
%! assert (mutual_information (sh, struct ("left", [0 l]), struct ("right", [0 l])), 0, 1e-8);

%!error <Invalid call> scrambling_time (1)
%!test
%! ## On a circle: the line's alpha* while l < L/2; Inf for l > L/2
%! ## (doc/tfd_shock.md, section 3).
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 6, ...
%!                       "shock_energy", 1e-6, "shock_time", 0);
%! [~, a] = scrambling_time (bg, struct ("left", [0 1.5], "right", [0 1.5]));
%! assert (a, 2 * (sinh (1.5 * pi) - 1), 1e-9 * a);
%! [ts, a] = scrambling_time (bg, struct ("left", [0 4], "right", [0 4]));
%! assert ([ts, a], [Inf, Inf]);
%!error <thermofield double> scrambling_time (ads3_background ("thermal", "line", "beta", 1), struct ("left", [0 1], "right", [0 1]))
%!error <scrambling_time: A.left: has no intervals> scrambling_time (ads3_background ("tfd", "line", "beta", 1), struct ("right", [0 1]))
