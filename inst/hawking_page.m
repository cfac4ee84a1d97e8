## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{T_hp} =} hawking_page (@var{name}, @var{value}, @dots{})
## @deftypefnx {} {[@var{T_hp}, @var{info}] =} hawking_page (@dots{})
## Hawking-Page transition between thermal AdS3 and the BTZ black hole for
## a CFT on a circle.
##
## Options (name/value pairs; array values broadcast against each other):
## @table @asis
## @item @qcode{"circumference"}
## circumference L of the boundary circle (default 2 pi ell);
## @item @qcode{"Omega"}
## boundary velocity, |Omega| < 1 (default 0);
## @item @qcode{"T"} or @qcode{"beta"}
## a temperature at which to compare the two saddles (optional);
## @item @qcode{"beta_L"}, @qcode{"beta_R"}
## instead of T (or beta) and Omega: the left and right inverse
## temperatures, Omega = (beta_R - beta_L)/(beta_R + beta_L);
## @item @qcode{"c"}, @qcode{"G"}, @qcode{"ell"}
## central charge, Newton constant, AdS radius as in
## @code{btz_thermodynamics} (they set the grand potentials, not T_hp).
## @end table
##
## With beta_L = beta (1 - Omega) and beta_R = beta (1 + Omega) the grand
## potentials are F_btz = -(pi c L/6)/(beta_L beta_R) and
## F_thermal_ads = -pi c/(6 L), so the black hole dominates when
## beta_L beta_R < L^2, i.e. above
## @example
## T_hp = sqrt (1 - Omega^2) / L
## @end example
## (T_hp = 1/L without rotation, 1/(2 pi ell) on the circle 2 pi ell).
##
## @var{info} is a struct with fields @code{T_hp}, @code{beta_hp}
## (= 1/T_hp), @code{Omega}, @code{circumference}, @code{c}, and the
## comparison @code{T}, @code{F_btz}, @code{F_thermal_ads},
## @code{saddle} (@qcode{"btz"} if F_btz < F_thermal_ads, otherwise
## @qcode{"thermal_ads"}, ties included; a cell array unless scalar).  When
## no temperature is given the comparison is made at T = T_hp, where the
## two grand potentials are equal, and @code{saddle} is
## @qcode{"transition"}.
##
## @seealso{btz_thermodynamics, ads3_background}
## @end deftypefn

function [T_hp, info] = hawking_page (varargin)
  fn = "hawking_page";
  ## No arguments is meaningful: the non-rotating transition on 2 pi ell.
  names = {"circumference", "Omega", "T", "beta", "beta_L", "beta_R", ...
           "c", "G", "ell"};
  o = __holent_opts__ (fn, names, varargin);
  has = @(f) isfield (o, f);

  if (has ("T") && has ("beta"))
    error ("holent:option", "%s: give either 'T' or 'beta', not both", fn);
  endif
  if (has ("beta_L") || has ("beta_R"))
    if (! (has ("beta_L") && has ("beta_R")))
      error ("holent:option", "%s: give both 'beta_L' and 'beta_R'", fn);
    endif
    if (has ("T") || has ("beta") || has ("Omega"))
      error ("holent:option",
             "%s: give 'beta_L' with 'beta_R', or 'T' (or 'beta') with 'Omega', not both", fn);
    endif
    pair = "beta_LR";
    x = {__holent_array__(fn, "beta_L", o.beta_L), __holent_array__(fn, "beta_R", o.beta_R)};
  else
    pair = "Omega";
    x = {[], 0};
    if (has ("Omega"))
      x{2} = __holent_array__ (fn, "Omega", o.Omega);
    endif
    if (has ("T"))
      pair = "T_Omega";
      x{1} = __holent_array__ (fn, "T", o.T);
    elseif (has ("beta"))
      pair = "beta_Omega";
      x{1} = __holent_array__ (fn, "beta", o.beta);
    endif
  endif
  L = [];
  if (has ("circumference"))
    x{3} = L = __holent_array__ (fn, "circumference", o.circumference);
  endif

  ## Broadcast the arrays given (T or beta is absent for "Omega").
  used = 1 + strcmp (pair, "Omega"):numel (x);
  try
    z = 0;
    for k = used
      z = zeros (size (z + x{k}));
    endfor
  catch
    given = intersect ({"beta_L", "beta_R", "T", "beta", "Omega", "circumference"},
                       fieldnames (o));
    error ("holent:size", "%s: the option values (%s) must have compatible sizes",
           fn, strjoin (given, ", "));
  end_try_catch
  for k = used
    x{k} = x{k} + z;
  endfor
  if (! isempty (L))
    L = x{3};
  endif
  [T_hp, info] = __holent_thermo__ ("hawking_page", fn, pair, x{1}, x{2}, L, o);
  if (nargout < 2)
    return;
  endif
  if (strcmp (pair, "Omega"))
    sad = repmat ({"transition"}, size (z));
  else
    sad = repmat ({"thermal_ads"}, size (z));
    sad(info.btz_dominates) = {"btz"};
  endif
  if (isscalar (z))
    sad = sad{1};
  endif
  info = struct ("T_hp", T_hp, "beta_hp", 1 ./ T_hp, "Omega", info.Omega,
                 "circumference", info.circumference, "c", info.c,
                 "T", info.T, "F_btz", info.F_btz,
                 "F_thermal_ads", info.F_thermal_ads);
  info.saddle = sad;
endfunction


%!test
%! ## Non-rotating: T_hp = 1/L (Hawking and Page 1983, Commun. Math. Phys.
%! ## 87, 577, in AdS3 form; from memory).
%! assert (hawking_page (), 1 / (2 * pi), 1e-15);
%! assert (hawking_page ("circumference", [1 2 4]), [1 0.5 0.25], 1e-15);
%! assert (hawking_page ("ell", 3), 1 / (6 * pi), 1e-15);

%!test
%! ## With rotation: beta_L beta_R = L^2 at the transition.
%! L = 3;  Om = [-0.9 0 0.3 0.99];
%! Th = hawking_page ("circumference", L, "Omega", Om);
%! beta = 1 ./ Th;
%! assert (beta .* (1 - Om) .* beta .* (1 + Om), L^2 * ones (1, 4), 1e-12);

%!test
%! ## The saddles at a given temperature; the tie at T_hp.
%! [Th, info] = hawking_page ("circumference", 2, "Omega", 0.6, "T", [0.3 0.5], "c", 12);
%! assert (Th, [0.4 0.4], 1e-15);
%! assert (info.saddle, {"thermal_ads", "btz"});
%! assert (info.F_thermal_ads, -pi * 12 / (6 * 2) * [1 1], 1e-14);
%! bl = (1 - 0.6) ./ [0.3 0.5];  br = (1 + 0.6) ./ [0.3 0.5];
%! assert (info.F_btz, -(pi * 12 * 2 / 6) ./ (bl .* br), 1e-13);
%! [~, info] = hawking_page ("circumference", 2, "Omega", 0.6);
%! assert (info.saddle, "transition");
%! assert (info.F_btz, info.F_thermal_ads, 1e-13);
%! [~, info] = hawking_page ("circumference", 2, "beta_L", 0.5, "beta_R", 9);
%! assert (info.saddle, "thermal_ads");
%! [~, info] = hawking_page ("circumference", 2, "beta_L", 0.5, "beta_R", 7.9);
%! assert (info.saddle, "btz");
%! assert (info.Omega, 7.4 / 8.4, 1e-15);

%!error <must lie in \(-1, 1\)> hawking_page ("Omega", 1)
%!error <circumference\(1\) = 0 must be positive> hawking_page ("circumference", 0)
%!error <^hawking_page: T\(1\) = -1 must be positive> [~, i] = hawking_page ("T", -1)
%!error <not both> hawking_page ("beta_L", 1, "beta_R", 2, "Omega", 0)
%!error <give both> hawking_page ("beta_L", 1)
%!error <either 'T' or 'beta'> hawking_page ("T", 1, "beta", 1)
%!error <compatible sizes> hawking_page ("Omega", [0 0.1], "circumference", [1 2 3])
%!error <NaN> hawking_page ("Omega", NaN)
%!error <unknown option> hawking_page ("M", 1)
%!error <^hawking_page: T\(2\) = 0 must be positive> hawking_page ("T", [1 0])
