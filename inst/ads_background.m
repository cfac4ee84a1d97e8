## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
##
## This program is free software: you can redistribute it and/or modify it
## under the terms of the GNU General Public License as published by the
## Free Software Foundation, either version 3 of the License, or (at your
## option) any later version.  See the file COPYING.

## -*- texinfo -*-
## @deftypefn  {} {@var{bg} =} ads_background (@var{d}, @var{kind})
## @deftypefnx {} {@var{bg} =} ads_background (@dots{}, @var{name}, @var{value}, @dots{})
## A planar asymptotically AdS_(d+1) background, d >= 2, with metric
## @example
## ds^2 = (ell^2/z^2) (-f(z) dt^2 + dz^2/f(z) + dx_1^2 + ... + dx_(d-1)^2)
## @end example
## for the strips and balls of @code{strip_entropy} and @code{ball_entropy}.
## In d = 2 (AdS3; the brane is planar BTZ with beta = 2 pi zh) a strip is
## an interval, with no transverse direction, S = (c/3) log(l/epsilon) in
## the vacuum for c = 3 ell/(2 G), and balls are refused (a ball of radius
## R is the interval of width 2 R); see doc/higher_dimensional.md.
## The background is built and checked by the C core, which computes every
## field below; later calls reuse it without recomputation.
##
## @var{kind} is one of
## @table @asis
## @item @qcode{"vacuum"}
## f = 1: Poincare AdS_(d+1), the CFT_d ground state.
## @item @qcode{"black_brane"}
## f = 1 - (z/zh)^d: the planar black brane, a thermal state; give
## @qcode{"zh"} (horizon depth) or @qcode{"T"} (temperature, T = d/(4 pi zh)).
## @item @qcode{"tabulated"}
## f from the user's own data: samples @qcode{"z"} and @qcode{"f"} (vectors
## of equal length, at least d + 7, with z(1) = 0 < z(2) < ... = z_max, f(1)
## = 1), or @qcode{"f"} a function handle evaluated (vectorised) on the grid
## @qcode{"z"} or on 4001 equally spaced points of [0, @qcode{"z_max"}].
## Rounded or noisy samples are expected: the accuracy of the samples
## (field @code{noise}) is estimated from the data unless given as
## @qcode{"noise"}.  m in f = 1 - m z^d + ... comes from a least-squares
## fit over a window chosen from the data, with an error estimate; data
## that are not 1 + O(z^d) are refused whatever the sampling.  The
## horizon is the first zero of f, a double zero (extremal, T = 0) when f
## touches zero within the noise, or the last sample when the table ends
## there within the noise.  (1 - f)/z^d is interpolated by a cubic spline
## clamped at both ends (doc/higher_dimensional.md).
## @item @qcode{"vaidya"}
## a global quench: Vaidya-AdS_(d+1), ds^2 = (1/z^2)(-f dv^2 - 2 dv dz +
## dx^2) with f(v, z) = 1 - s(v) (1 - F(z)), a shell that leaves the
## boundary at t = 0 into the final state F: the black brane (give
## @qcode{"zh"} or @qcode{"T"}) or a tabulated f (give @qcode{"z"} and
## @qcode{"f"}).  s = theta(v) (thin shell, default) or, with
## @qcode{"shell_width"} w > 0, s = (1 + tanh(v/w))/2.  Strips:
## @code{strip_entropy (bg, l, "t", t)}; every other function sees the
## final state.  The fields are those of the final state, with
## @code{kind} "vaidya", @code{final} (its kind) and @code{shell_width}.
## @end table
##
## Options: @qcode{"ell"} (AdS radius, default 1), @qcode{"G"} (Newton
## constant in d+1 dimensions, default 1), @qcode{"cutoff"} (UV cutoff
## z = epsilon, default 1e-6).  Entropies are Area/(4 G).
##
## Fields: @code{dimension} (d), @code{kind}, @code{ell}, @code{G},
## @code{cutoff}, @code{zh} (Inf without a horizon), @code{horizon}
## (logical), @code{extremal} (logical: a double zero), @code{T} =
## |f'(zh)|/(4 pi) and its error estimate @code{T_error}, @code{entropy_density}
## = ell^(d-1)/(4 G zh^(d-1)), @code{energy_density} = (d-1) ell^(d-1) m/(16 pi G)
## with f = 1 - m z^d + ... (first law dE = T ds for the brane; for tabulated f
## this is the Einstein-gravity value, see doc/higher_dimensional.md),
## @code{m} and its error estimate @code{m_error}, @code{noise} (accuracy of
## the samples of f; 0 for analytic kinds), @code{z_max} (Inf for analytic f),
## and @code{table}: @code{table.samples} (@code{z}, @code{f}: the
## samples, empty for analytic kinds) and @code{table.spline} (the
## interpolant: knots @code{z}, values @code{g} and second derivatives
## @code{g2} of (1 - f)/z^d), kept so that no later call refits.  They sit
## two levels down so that displaying a background shows their sizes,
## not every sample.
##
## The normalisation is the AdS radius @qcode{"ell"} and Newton's constant
## @qcode{"G"} (the central charge @qcode{"c"} of AdS3 is not an option
## here: the error says what to give instead; in d = 2, c = 3 ell/(2 G)).
##
## @seealso{strip_entropy, ball_entropy, strip_mutual_information,
## entanglement_velocity, butterfly_velocity}
## @end deftypefn

function bg = ads_background (d, kind, varargin)
  fn = "ads_background";
  if (nargin < 2)
    print_usage ();
  endif
  d = __holent_scalar__ (fn, "D", d, "positive");
  kinds = {"vacuum", "black_brane", "tabulated", "vaidya"};
  if (! ischar (kind) || ! isrow (kind) || ! any (strcmpi (kind, kinds)))
    error ("holent:option", "%s: KIND must be one of: %s", fn, strjoin (kinds, ", "));
  endif
  kind = lower (kind);
  o = __holent_opts__ (fn, {"ell", "G", "cutoff", "zh", "T", "z", "f", "noise", "z_max", "shell_width", "c"}, varargin);
  if (isfield (o, "c"))
    error ("holent:option", ["%s: option 'c' (the central charge 3 ell/(2 G) of AdS3) ", ...
           "is not an option of AdS_(d+1) backgrounds: give the AdS radius 'ell' and ", ...
           "Newton's constant 'G' in d+1 dimensions (entropies are Area/(4 G), ", ...
           "the normalisation ell^(d-1)/G; in d = 2, G = 3 ell/(2 c))"], fn);
  endif
  own = struct ("vacuum", {{}}, "black_brane", {{"zh", "T"}},
                "tabulated", {{"z", "f", "noise", "z_max"}},
                "vaidya", {{"zh", "T", "z", "f", "noise", "z_max", "shell_width"}});
  given = fieldnames (o);
  for k = 1:numel (given)
    if (! any (strcmp (given{k}, [{"ell", "G", "cutoff"}, own.(kind)])))
      error ("holent:option", "%s: option '%s' does not apply to kind %s",
             fn, given{k}, kind);
    endif
  endfor
  ell = 1;  G = 1;  cutoff = 1e-6;
  if (isfield (o, "ell"))
    ell = __holent_scalar__ (fn, "ell", o.ell, "positive");
  endif
  if (isfield (o, "G"))
    G = __holent_scalar__ (fn, "G", o.G, "positive");
  endif
  if (isfield (o, "cutoff"))
    cutoff = __holent_scalar__ (fn, "cutoff", o.cutoff, "positive");
  endif
  args = {kind, fn, d, ell, G, cutoff};
  if (strcmp (kind, "vaidya"))
    w = 0;
    if (isfield (o, "shell_width"))
      w = __holent_scalar__ (fn, "shell_width", o.shell_width, "nonnegative");
    endif
    ## the final state: a brane given zh or T, else tabulated
    if (isfield (o, "zh") || isfield (o, "T"))
      kind = "black_brane";
    else
      kind = "tabulated";
    endif
    args(end+1:end+2) = {w, kind};
  endif
  switch (kind)
    case "black_brane"
      if (isfield (o, "zh") == isfield (o, "T"))
        error ("holent:option", "%s: the black brane needs exactly one of 'zh' or 'T'", fn);
      elseif (isfield (o, "zh"))
        args(end+1:end+2) = {"zh", __holent_scalar__(fn, "zh", o.zh, "positive")};
      else
        args(end+1:end+2) = {"T", __holent_scalar__(fn, "T", o.T, "positive")};
      endif
    case "tabulated"
      if (! isfield (o, "f") || ! (isfield (o, "z") || isfield (o, "z_max")))
        error ("holent:option", "%s: the tabulated kind needs 'z' and 'f' (or 'f' a function handle and 'z_max')", fn);
      endif
      if (isfield (o, "z"))
        z = __holent_array__ (fn, "z", o.z);
      else
        z = linspace (0, __holent_scalar__ (fn, "z_max", o.z_max, "positive"), 4001)';
      endif
      if (is_function_handle (o.f))
        try
          f = o.f (z);
        catch err
          error ("holent:option", "%s: the function handle 'f' failed on the grid: %s", fn, err.message);
        end_try_catch
        if (! isreal (f) || ! isnumeric (f) || numel (f) != numel (z))
          error ("holent:option", "%s: the function handle 'f' must return real values of the grid's size", fn);
        endif
        f = double (f);
      else
        f = __holent_array__ (fn, "f", o.f);
      endif
      if (! isvector (z) || ! isvector (f) || numel (z) != numel (f))
        error ("holent:domain", "%s: 'z' and 'f' must be vectors of equal length", fn);
      endif
      noise = 0;
      if (isfield (o, "noise"))
        noise = __holent_scalar__ (fn, "noise", o.noise, "positive");
      endif
      args(end+1:end+3) = {z(:), f(:), noise};
  endswitch
  bg = __holent_hdbg__ (args{:});
  if (bg.horizon && cutoff > 1e-2 * bg.zh)
    warning ("holent:cutoff", "%s: cutoff %g is not small against zh = %g", fn, cutoff, bg.zh);
  endif
endfunction

%!test
%! ## Black brane thermodynamics (Witten 1998, ATMP 2, 505; from memory):
%! ## T = d/(4 pi zh), s = ell^(d-1)/(4 G zh^(d-1)); first law de = T ds
%! ## checked by a finite difference in zh.
%! for d = 3:6
%!   bg = ads_background (d, "black_brane", "T", 0.7, "ell", 1.3, "G", 0.2);
%!   assert (bg.T, 0.7, 1e-14);
%!   assert (bg.zh, d / (4 * pi * 0.7), 1e-14);
%!   assert (bg.entropy_density, 1.3^(d-1) / (0.8 * bg.zh^(d-1)), 1e-12);
%!   h = 1e-5;
%!   b1 = ads_background (d, "black_brane", "T", 0.7 + h, "ell", 1.3, "G", 0.2);
%!   b0 = ads_background (d, "black_brane", "T", 0.7 - h, "ell", 1.3, "G", 0.2);
%!   dedT = (b1.energy_density - b0.energy_density) / (2 * h);
%!   dsdT = (b1.entropy_density - b0.entropy_density) / (2 * h);
%!   assert (dedT, 0.7 * dsdT, 1e-7 * dedT);
%!   ## conformal: e = (d - 1) p and e + p = T s  ->  e = (d-1) T s / d
%!   assert (bg.energy_density, (d - 1) / d * bg.T * bg.entropy_density, 1e-12);
%! endfor

%!test
%! ## a tabulated brane: horizon, temperature and m recovered from samples
%! z = linspace (0, 1.3, 400)';
%! bg = ads_background (4, "tabulated", "z", z, "f", 1 - (z / 1.1).^4);
%! assert (bg.zh, 1.1, 1e-9);
%! assert (bg.T, 4 / (4 * pi * 1.1), 1e-7);
%! assert (bg.m, 1 / 1.1^4, 1e-6);
%! assert (bg.horizon);
%! bv = ads_background (5, "tabulated", "z", z, "f", 1 + 0.1 * z.^5);
%! assert (! bv.horizon && isinf (bv.zh) && bv.z_max == 1.3);

%!test
%! bg = ads_background (3, "vacuum");
%! assert (bg.energy_density, 0);
%! assert (isinf (bg.zh) && ! bg.horizon);

%!test
%! ## a tabulated background displays compactly: the samples' sizes only
%! z = linspace (0, 1.3, 400)';
%! bg = ads_background (4, "tabulated", "z", z, "f", 1 - (z / 1.1).^4);
%! txt = evalc ("disp (bg)");
%! assert (numel (strsplit (txt, "\n")) < 60);
%! assert (! isempty (strfind (txt, "400x1")));
%! assert (bg.table.samples.z, z);
%! assert (numel (bg.table.spline.g2), 400);

%!test
%! ## d = 2: the brane is planar BTZ, beta = 2 pi zh; with c = 3 ell/(2G)
%! ## (Brown and Henneaux 1986) the Cardy-regime densities s = pi c T/3
%! ## and e = pi c T^2/6 (common practice), and the AdS3 module's thermal
%! ## state agrees
%! bg = ads_background (2, "black_brane", "T", 0.7, "G", 0.3, "ell", 1.2);
%! c = 3 * 1.2 / (2 * 0.3);
%! assert (bg.zh, 1 / (2 * pi * 0.7), 1e-15);
%! assert (bg.entropy_density, pi * c * 0.7 / 3, 1e-13);
%! assert (bg.energy_density, pi * c * 0.7^2 / 6, 1e-13);
%! b3 = ads3_background ("thermal", "line", "T", 0.7, "G", 0.3, "ell", 1.2);
%! assert (bg.entropy_density, b3.entropy_density, 1e-13);

%!error <option 'c' .*is not an option.*give the AdS radius 'ell'> ads_background (4, "vacuum", "c", 12)

%!error <Invalid call> ads_background (4)
%!error <integer from 2> ads_background (1, "vacuum")
%!error <integer from 2> ads_background (3.5, "vacuum")
%!error <KIND must be> ads_background (4, "soliton")
%!error <exactly one> ads_background (4, "black_brane")
%!error <exactly one> ads_background (4, "black_brane", "zh", 1, "T", 1)
%!error <does not apply> ads_background (4, "vacuum", "zh", 1)
%!error <needs 'z' and 'f'> ads_background (4, "tabulated", "z", 0:4)
%!error <equal length> ads_background (4, "tabulated", "z", 0:4, "f", ones (1, 4))
%!error <z\(1\) = 0 < z\(2\)> ads_background (4, "tabulated", "z", 1:12, "f", ones (1, 12))
%!error <must be 1 at z = 0> ads_background (4, "tabulated", "z", 0:11, "f", 2 * ones (1, 12))
%!error <too few samples> ads_background (4, "tabulated", "z", 0:5, "f", ones (1, 6))
%!error <vanish like z\^4> ads_background (4, "tabulated", "z", linspace (0, 1, 50), "f", 1 - linspace (0, 1, 50).^3)
%!error <positive> ads_background (4, "black_brane", "zh", -1)
%!error <NaN> ads_background (4, "tabulated", "z", [0 1 2 NaN 4], "f", ones (1, 5))
%!error <zh = 1e-308: .*out of double precision> ads_background (4, "black_brane", "zh", 1e-308)
