## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn {} {@var{bg} =} __holent_bcft_background__ (@var{fn}, @var{state}, @var{boundary}, @dots{})
## The BCFT backgrounds of @code{ads3_background}: @var{state}
## @qcode{"bcft"} (on @qcode{"half_line"} or @qcode{"interval"}) or
## @qcode{"bcft_tfd"} (on @qcode{"half_line"}).  Options are parsed here;
## every parameter is checked, and every derived quantity computed, once by
## the compiled core (@file{src/core/holent_bcft.c}).
## @end deftypefn
function bg = __holent_bcft_background__ (fn, state, boundary, varargin)
  if (! (ischar (boundary) && isrow (boundary)))
    error ("holent:type", "%s: BOUNDARY must be a string", fn);
  endif
  allowed = {"half_line", "interval"};
  if (strcmp (state, "bcft_tfd"))
    allowed = {"half_line"};
  endif
  k = find (strcmpi (boundary, allowed));
  if (isempty (k))
    error ("holent:boundary", "%s: BOUNDARY must be %s for the %s state, got '%s'",
           fn, strjoin (strcat ("'", allowed, "'"), " or "), state, boundary);
  endif
  boundary = allowed{k};
  names = {"c", "G", "ell", "cutoff", "length", "beta", "T", "tension", ...
           "log_g", "saddle"};
  o = __holent_opts__ (fn, names, varargin);
  interval = strcmp (boundary, "interval");
  if (interval != isfield (o, "length"))
    error ("holent:option", "%s: option 'length' is %s", fn,
           merge (interval, "required on an interval", "for an interval only"));
  endif
  if (isfield (o, "saddle") && ! interval)
    error ("holent:option", "%s: option 'saddle' applies to an interval only", fn);
  endif
  if (isfield (o, "tension") && isfield (o, "log_g"))
    error ("holent:option", "%s: give either 'tension' or 'log_g', not both", fn);
  endif
  if (isfield (o, "beta") && isfield (o, "T"))
    error ("holent:option", "%s: give either 'beta' or 'T', not both", fn);
  endif
  [c, G, ell] = __holent_background__ ("units", fn, o);
  cutoff = 1e-6;
  if (isfield (o, "cutoff"))
    cutoff = __holent_scalar__ (fn, "cutoff", o.cutoff, "positive");
  endif
  len = Inf;
  if (interval)
    len = __holent_scalar__ (fn, "length", o.length, "positive");
  endif
  beta = Inf;
  if (isfield (o, "beta"))
    beta = __holent_scalar__ (fn, "beta", o.beta, "positive");
  elseif (isfield (o, "T"))
    beta = 1 / __holent_scalar__ (fn, "T", o.T, "positive");
  elseif (strcmp (state, "bcft_tfd"))
    error ("holent:option", "%s: the two-sided state needs 'beta' or 'T'", fn);
  endif
  is_g = isfield (o, "log_g");
  vals = 0;
  if (is_g || isfield (o, "tension"))
    what = merge (is_g, "log_g", "tension");
    vals = o.(what);
    if (! isnumeric (vals) || islogical (vals) || ! isreal (vals) || issparse (vals))
      error ("holent:type", "%s: '%s' must be real numeric", fn, what);
    endif
    vals = double (vals);
  endif
  saddle = "dominant";
  if (isfield (o, "saddle"))
    saddle = o.saddle;
    if (! (ischar (saddle) && isrow (saddle)))
      error ("holent:type", "%s: 'saddle' must be a string", fn);
    endif
  endif
  d = __holent_call__ ("__holent_bcft__", "bg", fn, state, boundary, len,
                       cutoff, beta, vals, is_g, c, ell, saddle);
  switch (d.saddle)
    case "btz"
      bulk = merge (strcmp (state, "bcft_tfd"), "eternal_planar_btz", "planar_btz");
      profile = "sinh(x/zh) = -sinh(rho) z/zh from each end (x measured away from the BCFT), zh = beta/(2 pi)";
    case "thermal_ads"
      bulk = "thermal_ads";
      profile = "sinh(r) sin(pi x/length) = -sinh(rho), cosh(r) = z0/z, z0 = length/pi: one brane joining both ends";
    otherwise
      bulk = "poincare";
      profile = "x = -z sinh(rho)";
  endswitch
  bg = struct ("state", state, "boundary", boundary, "bulk", bulk, "c", c,
               "G", G, "ell", ell, "cutoff", cutoff, "length", len,
               "beta", beta, "T", 1 / beta, "tension", d.tension,
               "log_g", d.log_g, "rho", d.rho, "saddle", d.saddle,
               "beta_c", d.beta_c, "horizon", d.btz, "S_H", d.S_H,
               "pure", ! d.btz && isinf (beta), "zh", d.zh * ell,
               "z0", d.z0 * ell, "brane_profile", profile);
endfunction

%!test
%! bg = __holent_bcft_background__ ("f", "bcft", "half_line", "tension", 0.5);
%! assert (bg.bulk, "poincare");
%! assert (bg.log_g, [1 1] * atanh (0.5) / 6, 1e-15);   # c = 1 (Takayanagi 2011)
%!error <length> __holent_bcft_background__ ("f", "bcft", "interval")
%!error <BOUNDARY> __holent_bcft_background__ ("f", "bcft_tfd", "interval", "beta", 1)
