## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## This program is free software: you can redistribute it and/or modify it
## under the terms of the GNU General Public License as published by the
## Free Software Foundation, either version 3 of the License, or (at your
## option) any later version.  See the file COPYING.

## -*- texinfo -*-
## @deftypefn  {} {@var{bg} =} ads3_background (@var{state}, @var{boundary})
## @deftypefnx {} {@var{bg} =} ads3_background (@dots{}, @var{name}, @var{value}, @dots{})
## The AdS3 bulk dual of a state of a 2D CFT.
##
## @var{state} is one of
## @table @asis
## @item @qcode{"vacuum"}
## the ground state: Poincare AdS3 on a line, global AdS3 on a circle.
## @item @qcode{"thermal"}
## a thermal state at inverse temperature beta: the planar BTZ black brane on
## a line; on a circle the BTZ black hole or thermal AdS, whichever saddle
## dominates (option @qcode{"saddle"}).
## @item @qcode{"rotating"}
## a thermal state with different left and right temperatures (angular
## velocity Omega): planar rotating BTZ on a line, rotating BTZ (or thermal
## AdS) on a circle.
## @item @qcode{"heavy"}
## a spinless heavy primary of weight h = hbar = (c/24)(1 - alpha^2) below the
## black hole threshold, dual to a conical defect; circle only.
## @item @qcode{"tfd"}
## the thermofield double: the eternal two-sided black hole at inverse
## temperature beta (two copies of planar BTZ or BTZ joined by the
## Einstein-Rosen bridge); both sides' times run forward.  Options
## @qcode{"shock_alpha"} (the Kruskal shift of a shock wave, default 0) or
## @qcode{"shock_energy"} E with @qcode{"shock_time"} t_w (a shell released
## from the left boundary at time -t_w: alpha = (E/(4M)) exp(2 pi t_w/beta),
## M = pi c L/(6 beta^2) the black hole's energy; on a line E and M are
## densities).  Regions are structs with fields @code{left} and
## @code{right}; a plain matrix is the right side.  On a circle the slice
## through the bridge is an annulus: two-sided regions are minimised over
## both classes within a side, every winding through the bridge and the
## horizon as homology asks.  @file{doc/tfd_shock.md}.
## @item @qcode{"quench"}
## a global quench: a null shell sent in from the boundary at t = 0 turns
## the vacuum into the black hole of inverse temperature beta (thin-shell
## AdS3-Vaidya); give the time with the option @qcode{"t"} of the entropy
## functions.  @file{doc/quench.md}.
## @end table
##
## @var{boundary} is @qcode{"line"} or @qcode{"circle"}.
##
## Options (name/value pairs, names case-insensitive):
## @table @asis
## @item @qcode{"c"}
## central charge (default 1, unless @qcode{"G"} is given).
## @item @qcode{"G"}, @qcode{"ell"}
## three-dimensional Newton constant and AdS radius (default ell = 1);
## Brown-Henneaux c = 3 ell/(2 G).  Giving c, G and ell that disagree is an
## error.
## @item @qcode{"cutoff"}
## the UV cutoff epsilon, a length in boundary units (default 1e-6).  A
## warning @code{holent:cutoff} is issued when it is not below 1/100 of every
## length scale of the state (circumference, beta_L, beta_R).
## @item @qcode{"circumference"}
## circumference L of the boundary circle (default 2*pi); circle only.
## @item @qcode{"beta"}, @qcode{"T"}
## inverse temperature or temperature (thermal; or with Omega, rotating).
## @item @qcode{"beta_L"}, @qcode{"beta_R"}
## left and right inverse temperatures (rotating), or instead
## @item @qcode{"Omega"}
## the angular velocity, |Omega| < 1, with beta_L = beta (1 - Omega) and
## beta_R = beta (1 + Omega).
## @item @qcode{"alpha"}, @qcode{"h"}
## defect parameter in (0, 1] or conformal weight h in [0, c/24) (heavy).
## @item @qcode{"saddle"}
## thermal or rotating state on a circle: @qcode{"dominant"} (default: BTZ
## when beta_L beta_R < L^2, i.e. above the Hawking-Page temperature, thermal
## AdS otherwise), @qcode{"btz"} or @qcode{"thermal_ads"}.
## @end table
##
## The result is a scalar struct with fields @code{state}, @code{boundary},
## @code{bulk} (one of @qcode{"poincare"}, @qcode{"global_ads"},
## @qcode{"planar_btz"}, @qcode{"btz"}, @qcode{"thermal_ads"},
## @qcode{"rotating_btz"}, @qcode{"planar_rotating_btz"},
## @qcode{"conical_defect"}), @code{c}, @code{G}, @code{ell}, @code{cutoff},
## @code{circumference} (Inf on a line), @code{beta}, @code{T}, @code{beta_L},
## @code{beta_R}, @code{T_L}, @code{T_R}, @code{Omega} (Inf/0 where not
## thermal), @code{alpha}, @code{h}, @code{saddle}, @code{horizon} (logical),
## @code{pure} (logical: the state is pure, so S(A) = S(A^c)),
## @code{S_BH} (horizon entropy, (pi c/6) L (1/beta_L + 1/beta_R); 0 without
## a horizon, Inf on a line), @code{entropy_density} (horizon entropy per unit
## boundary length) and @code{r_plus}, @code{r_minus} (horizon radii, in units
## of ell, for the circle rescaled to circumference 2 pi; 0 without a horizon),
## @code{M}, @code{J} (energy on the circle, (2 pi/L)(L0 + Lbar0 - c/12), and
## angular momentum L0 - Lbar0, as in @code{btz_thermodynamics}; on a line 0
## for the vacuum and Inf (extensive) for a thermal state; M is the Casimir
## energy -pi c/(6 L) for the vacuum and thermal AdS), @code{L0},
## @code{Lbar0} (the Virasoro zero modes of the state: 0 for the vacuum and
## thermal AdS, h for the heavy state, Inf on a thermal line).
##
## The struct is built and checked once, by the compiled core; every
## function that takes it checks it again in one compiled call (its
## parameters rebuild it, and each derived field must match), so a struct
## edited by hand raises @code{holent:background}.
##
## @strong{Boundaries (BCFT) and end-of-the-world branes.}
## @code{ads3_background ("bcft", "half_line" | "interval", @dots{})} is a 2D
## CFT with a boundary: on the half line x > 0, or on the interval
## 0 < x < length (option @qcode{"length"}, required there).  Its bulk is
## AdS3 cut off by a brane of tension T, |T| < 1/ell (Takayanagi 2011, PRL
## 107, 101602), set by @qcode{"tension"} or by the boundary entropy
## @qcode{"log_g"}, log g = (c/6) arctanh(T ell) (default 0); on an interval
## one value or one per end [T0, T1].  @qcode{"beta"} or @qcode{"T"} gives a
## temperature (default zero).  The half line at zero temperature is Poincare
## AdS3 with the brane x = -z sinh(rho), rho = arctanh(T ell); at finite
## temperature planar BTZ with sinh(x/zh) = -sinh(rho) z/zh, zh = beta/(2 pi).
## The interval has two saddles: thermal AdS (one brane joining the two ends;
## equal tensions only) and BTZ (a brane per end and a horizon), the BTZ one
## dominating for beta < beta_c = (2 length/pi)(rho0 + rho1 +
## sqrt((rho0 + rho1)^2 + pi^2)); option @qcode{"saddle"} forces one.
## @code{ads3_background ("bcft_tfd", "half_line", "beta", b, "tension", T)}
## is the thermofield double of two such BCFTs (eternal planar BTZ with the
## brane through the Einstein-Rosen bridge, 0 <= T < 1/ell), for
## @code{page_curve}.  The struct has fields @code{state}, @code{boundary},
## @code{bulk} (@qcode{"poincare"}, @qcode{"planar_btz"},
## @qcode{"thermal_ads"} or @qcode{"eternal_planar_btz"}), @code{c},
## @code{G}, @code{ell}, @code{cutoff}, @code{length}, @code{beta}, @code{T},
## @code{tension}, @code{log_g}, @code{rho} (each 1 x 2: ends x = 0 and
## x = length), @code{saddle}, @code{beta_c}, @code{horizon}, @code{S_H} (the
## horizon entropy between the branes, (c/6)(length/zh + rho0 + rho1) in the
## BTZ saddle of an interval; Inf on a thermal half line), @code{pure},
## @code{zh}, @code{z0} (tip of the thermal AdS saddle, length/pi) and
## @code{brane_profile} (the profile in words; @code{brane_profile} evaluates
## it).  Derivations: @file{doc/bcft.md}.
##
## Conventions are in @file{doc/conventions.md} of the package.
##
## @seealso{geodesic_length, interval_entropy, btz_thermodynamics, hawking_page, page_curve, brane_profile}
## @end deftypefn

function bg = ads3_background (state, boundary, varargin)

  fn = "ads3_background";
  if (nargin < 2)
    print_usage ();
  endif
  if (ischar (state) && any (strcmpi (state, {"bcft", "bcft_tfd"})))
    bg = __holent_bcft__ ("bg", fn, lower (state), boundary, varargin{:});
    return;
  endif
  names = {"c", "G", "ell", "cutoff", "circumference", "beta", "T", ...
           "beta_L", "beta_R", "Omega", "alpha", "h", "saddle", ...
           "shock_alpha", "shock_energy", "shock_time"};
  o = __holent_opts__ (fn, names, varargin);
  ## Built and checked by the core (holent_bg3): parameters, saddle, M, J, ...
  bg = __holent_background__ ("ads3", fn, state, boundary, o);
  if (any (strcmp (bg.state, {"tfd", "quench"})))
    bg = __holent_time_bg__ (fn, bg, o, bg.beta);
  endif
endfunction


%!test
%! bg = ads3_background ("bcft", "interval", "length", 2, "log_g", [0.1 0.2], "beta", 0.5);
%! assert (bg.saddle, "btz");
%! assert (bg.log_g, [0.1 0.2], 1e-15);
%! assert (bg.S_H, (1/6) * (2 * 4 * pi + sum (bg.rho)), 1e-13);
%!error <'length' is required> ads3_background ("bcft", "interval")
%!error <applies to an interval> ads3_background ("bcft", "half_line", "saddle", "btz")
%!test
%! bg = ads3_background ("vacuum", "line");
%! assert (bg.bulk, "poincare");
%! assert (bg.c, 1);
%! assert (bg.pure);
%! assert (bg.S_BH, 0);

%!test
%! ## Brown and Henneaux 1986 (Commun. Math. Phys. 104, 207): c = 3 ell/(2G).
%! bg = ads3_background ("vacuum", "circle", "G", 0.01, "ell", 2);
%! assert (bg.c, 3 * 2 / (2 * 0.01), 1e-12);
%! bg = ads3_background ("vacuum", "circle", "c", 600, "ell", 2);
%! assert (bg.G, 3 * 2 / (2 * 600), 1e-15);
%! assert (bg.bulk, "global_ads");
%! assert (bg.circumference, 2 * pi);

%!test
%! ## Thermal entropy density s = pi c T / 3 (Cardy 1986; Bekenstein-Hawking for BTZ).
%! bg = ads3_background ("thermal", "line", "T", 2.5, "c", 12);
%! assert (bg.bulk, "planar_btz");
%! assert (bg.entropy_density, pi * 12 * 2.5 / 3, 1e-12);
%! assert (bg.S_BH, Inf);

%!test
%! ## Above the Hawking-Page temperature T = 1/L the BTZ saddle dominates.
%! bg = ads3_background ("thermal", "circle", "beta", 1, "circumference", 3);
%! assert (bg.bulk, "btz");
%! assert (bg.horizon);
%! assert (bg.S_BH, pi * 1 / 3 * 3 / 1, 1e-12);
%! assert (bg.r_plus, 3 / 1, 1e-12);
%! bg = ads3_background ("thermal", "circle", "beta", 4, "circumference", 3);
%! assert (bg.bulk, "thermal_ads");
%! assert (bg.S_BH, 0);
%! bg = ads3_background ("thermal", "circle", "beta", 4, "circumference", 3, "saddle", "btz");
%! assert (bg.bulk, "btz");

%!test
%! bg = ads3_background ("rotating", "circle", "beta", 0.5, "Omega", 0.3);
%! assert (bg.bulk, "rotating_btz");
%! assert ([bg.beta_L, bg.beta_R], [0.35, 0.65], 1e-14);
%! assert (bg.Omega, 0.3, 1e-14);
%! assert (bg.r_minus / bg.r_plus, 0.3, 1e-14);
%! bg2 = ads3_background ("rotating", "circle", "beta_L", 0.35, "beta_R", 0.65);
%! assert (bg2.S_BH, bg.S_BH, 1e-12);
%! bg = ads3_background ("rotating", "line", "T", 2, "Omega", -0.5);
%! assert (bg.bulk, "planar_rotating_btz");

%!test
%! bg = ads3_background ("heavy", "circle", "h", 1, "c", 48);
%! assert (bg.alpha, sqrt (1 - 24 / 48), 1e-15);
%! assert (bg.bulk, "conical_defect");
%! bg = ads3_background ("heavy", "circle", "alpha", 0.5, "c", 24);
%! assert (bg.h, 0.75, 1e-15);

%!test
%! ## Energy of the conical defect, M = -alpha^2/(8G) on the circle 2 pi ell,
%! ## read off the metric -(r^2 + alpha^2) dt^2 + ... (Balasubramanian and
%! ## Kraus 1999, Commun. Math. Phys. 208, 413; from memory); L0 = Lbar0 = h.
%! bg = ads3_background ("heavy", "circle", "alpha", 0.5, "G", 0.1);
%! assert (bg.M, -0.25 / 0.8, 1e-13);
%! assert ([bg.L0, bg.Lbar0], [bg.h, bg.h], 1e-15);
%! ## M = (2 pi/L)(L0 + Lbar0 - c/12) for BTZ too (btz_thermodynamics)
%! bg = ads3_background ("rotating", "circle", "beta_L", 0.3, "beta_R", 0.5, "c", 6, "circumference", 4);
%! assert (bg.M, (2 * pi / 4) * (bg.L0 + bg.Lbar0 - 6 / 12), 1e-12 * bg.M);
%! assert (bg.J, bg.L0 - bg.Lbar0, 1e-12 * bg.J);

## A struct edited by hand is refused by the function it is passed to.
%!error <interval_entropy: BG.S_BH = 3 does not match> interval_entropy (setfield (ads3_background ("thermal", "circle", "beta", 1), "S_BH", 3), 1)
%!error id=holent:background rt_entropy (setfield (ads3_background ("vacuum", "circle"), "c", 3), [0 1])
%!error id=holent:background rt_entropy (rmfield (ads3_background ("vacuum", "line"), "L0"), [0 1])

%!warning <cutoff> ads3_background ("thermal", "line", "beta", 1e-3, "cutoff", 1e-4);

%!test
%! ## Time-dependent states (doc/tfd_shock.md, doc/quench.md).
%! bg = ads3_background ("tfd", "line", "beta", 2);
%! assert (bg.bulk, "planar_btz");
%! assert ([bg.state, bg.boundary], "tfdline");
%! assert (bg.shock_alpha, 0);
%! bg = ads3_background ("tfd", "circle", "beta", 4, "circumference", 3);
%! assert (bg.bulk, "btz");   # the eternal black hole, whatever Hawking-Page says
%! bg = ads3_background ("quench", "circle", "beta", 1);
%! assert (bg.bulk, "vaidya");
%! assert (bg.pure);

%!error <does not apply> ads3_background ("tfd", "line", "beta", 1, "alpha", 0.5)
%!error <shock_alpha> ads3_background ("tfd", "line", "beta", 1, "shock_alpha", -1)
%!error <shock_alpha> ads3_background ("tfd", "line", "beta", 1, "shock_alpha", NaN)
%!error <shock_energy> ads3_background ("tfd", "line", "beta", 1, "shock_energy", -1, "shock_time", 1)
%!error <together> ads3_background ("tfd", "line", "beta", 1, "shock_energy", 1)
%!error <not both> ads3_background ("tfd", "line", "beta", 1, "shock_energy", 1, "shock_time", 1, "shock_alpha", 2)
%!error <finite> ads3_background ("tfd", "line", "beta", 1, "shock_energy", 1, "shock_time", Inf)
%!error <needs 'beta' or 'T'> ads3_background ("quench", "line")
%!error <does not apply> ads3_background ("quench", "line", "beta", 1, "shock_alpha", 1)
%!error <Invalid call> ads3_background ("vacuum")
%!error <unknown STATE> ads3_background ("excited", "line")
%!error <unknown BOUNDARY> ads3_background ("vacuum", "torus")
%!error <unknown option 'colour'> ads3_background ("vacuum", "line", "colour", 1)
%!error <must be positive> ads3_background ("thermal", "line", "beta", -1)
%!error <must be positive> ads3_background ("thermal", "line", "beta", 0)
%!error <must lie in> ads3_background ("rotating", "line", "beta", 1, "Omega", 1)
%!error <must lie in> ads3_background ("rotating", "line", "beta", 1, "Omega", -1.5)
%!error <must lie in> ads3_background ("heavy", "circle", "alpha", 0)
%!error <must lie in> ads3_background ("heavy", "circle", "alpha", 1.2)
%!error <must lie in> ads3_background ("heavy", "circle", "h", 1, "c", 24)
%!error <cutoff must be positive> ads3_background ("vacuum", "line", "cutoff", 0)
%!error <disagrees> ads3_background ("vacuum", "line", "c", 10, "G", 1)
%!error <circle, not a line> ads3_background ("heavy", "line", "alpha", 0.5)
%!error <does not apply> ads3_background ("vacuum", "line", "beta", 1)
%!error <needs 'beta' or 'T'> ads3_background ("thermal", "line")
%!error <NaN> ads3_background ("thermal", "line", "beta", NaN)
%!error <real and full> ads3_background ("thermal", "line", "beta", 1i)
%!error <real numeric scalar> ads3_background ("thermal", "line", "beta", [1 2])
%!error <real numeric scalar> ads3_background ("thermal", "line", "beta", "1")
%!error <finite> ads3_background ("thermal", "line", "beta", Inf)
%!error <circle only> ads3_background ("thermal", "line", "beta", 1, "saddle", "btz")
%!error <name/value pairs> ads3_background ("vacuum", "line", "c")
%!error <ads3_background: beta = 1e-308: .* overflows> ads3_background ("thermal", "circle", "beta", 1e-308)
%!error <ads3_background: .*out of double precision> ads3_background ("thermal", "line", "beta", 1e-308)
