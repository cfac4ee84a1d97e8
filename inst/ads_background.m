## Copyright (C) 2026 The holent developers.
##
## This program is free software: you can redistribute it and/or modify it
## under the terms of the GNU General Public License as published by the
## Free Software Foundation, either version 3 of the License, or (at your
## option) any later version.  See the file COPYING.

## -*- texinfo -*-
## @deftypefn  {} {@var{bg} =} ads_background (@var{d}, @var{kind})
## @deftypefnx {} {@var{bg} =} ads_background (@dots{}, @var{name}, @var{value}, @dots{})
## A planar asymptotically AdS_(d+1) background, d >= 3, with metric
## @example
## ds^2 = (ell^2/z^2) (-f(z) dt^2 + dz^2/f(z) + dx_1^2 + ... + dx_(d-1)^2)
## @end example
## for the strips and balls of @code{strip_entropy} and @code{ball_entropy}.
##
## @var{kind} is one of
## @table @asis
## @item @qcode{"vacuum"}
## f = 1: Poincare AdS_(d+1), the CFT_d ground state.
## @item @qcode{"black_brane"}
## f = 1 - (z/zh)^d: the planar black brane, a thermal state; give
## @qcode{"zh"} (horizon depth) or @qcode{"T"} (temperature, T = d/(4 pi zh)).
## @item @qcode{"tabulated"}
## f from the user's own samples @qcode{"z"} and @qcode{"f"} (vectors of equal
## length, at least 5, with z(1) = 0 < z(2) < ... = z_max), interpolated by a
## cubic spline of (1 - f)/z^d.  f(0) = 1 and f - 1 = O(z^d) are checked; the
## horizon, if any, is the first zero of the interpolant.
## @end table
##
## Options: @qcode{"ell"} (AdS radius, default 1), @qcode{"G"} (Newton
## constant in d+1 dimensions, default 1), @qcode{"cutoff"} (UV cutoff
## z = epsilon, default 1e-6).  Entropies are Area/(4 G).
##
## Fields: @code{dimension} (d), @code{kind}, @code{ell}, @code{G},
## @code{cutoff}, @code{zh} (Inf without a horizon), @code{horizon}
## (logical), @code{T} = |f'(zh)|/(4 pi), @code{entropy_density}
## = ell^(d-1)/(4 G zh^(d-1)), @code{energy_density} = (d-1) ell^(d-1) m/(16 pi G)
## with f = 1 - m z^d + ... (first law dE = T ds for the brane; for tabulated f
## this is the Einstein-gravity value, see doc/higher_dimensional.md),
## @code{m}, @code{z_max} (Inf for analytic f), @code{z}, @code{f} (the samples,
## empty for analytic kinds).
##
## @seealso{strip_entropy, ball_entropy, strip_mutual_information}
## @end deftypefn

function bg = ads_background (d, kind, varargin)
  fn = "ads_background";
  if (nargin < 2)
    print_usage ();
  endif
  d = __holent_scalar__ (fn, "D", d, "positive");
  if (d != round (d) || d < 3 || d > 12)
    error ("holent:domain", "%s: D must be an integer from 3 to 12, got %g", fn, d);
  endif
  kinds = {"vacuum", "black_brane", "tabulated"};
  if (! ischar (kind) || ! isrow (kind) || ! any (strcmpi (kind, kinds)))
    error ("holent:option", "%s: KIND must be one of: %s", fn, strjoin (kinds, ", "));
  endif
  kind = lower (kind);
  o = __holent_opts__ (fn, {"ell", "G", "cutoff", "zh", "T", "z", "f"}, varargin);
  own = struct ("vacuum", {{}}, "black_brane", {{"zh", "T"}}, "tabulated", {{"z", "f"}});
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
  bg = struct ("dimension", d, "kind", kind, "ell", ell, "G", G,
               "cutoff", cutoff, "zh", Inf, "horizon", false, "T", 0,
               "entropy_density", 0, "energy_density", 0, "m", 0,
               "z_max", Inf, "z", zeros (0, 1), "f", zeros (0, 1));
  switch (kind)
    case "black_brane"
      if (isfield (o, "zh") == isfield (o, "T"))
        error ("holent:option", "%s: the black brane needs exactly one of 'zh' or 'T'", fn);
      elseif (isfield (o, "zh"))
        zh = __holent_scalar__ (fn, "zh", o.zh, "positive");
      else
        zh = d / (4 * pi * __holent_scalar__ (fn, "T", o.T, "positive"));
      endif
      bg.zh = zh;
      bg.m = 1 / zh^d;
      fph = -d / zh;
    case "tabulated"
      if (! isfield (o, "z") || ! isfield (o, "f"))
        error ("holent:option", "%s: the tabulated kind needs 'z' and 'f'", fn);
      endif
      z = __holent_array__ (fn, "z", o.z);
      f = __holent_array__ (fn, "f", o.f);
      if (! isvector (z) || ! isvector (f) || numel (z) != numel (f) || numel (z) < 5)
        error ("holent:domain", "%s: 'z' and 'f' must be vectors of equal length >= 5", fn);
      endif
      z = z(:);  f = f(:);
      if (z(1) != 0 || any (diff (z) <= 0))
        error ("holent:domain", "%s: 'z' must start at 0 and increase strictly", fn);
      endif
      if (abs (f(1) - 1) > 1e-10)
        error ("holent:domain", "%s: 'f' must be 1 at z = 0 (the AdS boundary), got %g", fn, f(1));
      endif
      try
        [zh, fph, m] = __holent_hd__ ("tabulated", d, z, f);
      catch err
        k = regexp (err.message, 'F\((\d+)\)', "tokens", "once");
        if (! isempty (k))
          error ("holent:domain",
                 "%s: f - 1 must vanish like z^%d at the boundary (sample %s, z = %g)",
                 fn, d, k{1}, z(str2double (k{1})));
        endif
        __holent_rethrow__ (err, "__holent_hd__", fn);
      end_try_catch
      bg.z = z;  bg.f = f;  bg.z_max = z(end);  bg.zh = zh;  bg.m = m;
  endswitch
  bg.energy_density = (d - 1) * ell^(d-1) * bg.m / (16 * pi * G);
  if (isfinite (bg.zh))
    bg.horizon = true;
    bg.T = abs (fph) / (4 * pi);
    bg.entropy_density = ell^(d-1) / (4 * G * bg.zh^(d-1));
  endif
  if (! all (isfinite ([bg.m, bg.energy_density, bg.entropy_density, bg.T])))
    txt = cellfun (@(f) sprintf ("%s = %g", f, o.(f)),
                   intersect (fieldnames (o), {"ell", "G", "zh", "T"}),
                   "uniformoutput", false);
    error ("holent:domain",
           "%s: %s: the energy or entropy density of this background is out of double precision range",
           fn, strjoin ([{sprintf("D = %d", d)}, txt(:)'], ", "));
  endif
  if (bg.horizon)
    if (cutoff > 1e-2 * bg.zh)
      warning ("holent:cutoff", "%s: cutoff %g is not small against zh = %g", fn, cutoff, bg.zh);
    endif
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

%!error <Invalid call> ads_background (4)
%!error <integer from 3> ads_background (2, "vacuum")
%!error <integer from 3> ads_background (3.5, "vacuum")
%!error <KIND must be> ads_background (4, "soliton")
%!error <exactly one> ads_background (4, "black_brane")
%!error <exactly one> ads_background (4, "black_brane", "zh", 1, "T", 1)
%!error <does not apply> ads_background (4, "vacuum", "zh", 1)
%!error <needs 'z' and 'f'> ads_background (4, "tabulated", "z", 0:4)
%!error <equal length> ads_background (4, "tabulated", "z", 0:4, "f", ones (1, 4))
%!error <start at 0> ads_background (4, "tabulated", "z", 1:5, "f", ones (1, 5))
%!error <must be 1 at z = 0> ads_background (4, "tabulated", "z", 0:4, "f", 2 * ones (1, 5))
%!error <vanish like z\^4> ads_background (4, "tabulated", "z", linspace (0, 1, 50), "f", 1 - linspace (0, 1, 50).^3)
%!error <positive> ads_background (4, "black_brane", "zh", -1)
%!error <NaN> ads_background (4, "tabulated", "z", [0 1 2 NaN 4], "f", ones (1, 5))
%!error <zh = 1e-308: .*out of double precision> ads_background (4, "black_brane", "zh", 1e-308)
