## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{bg} =} __holent_time_bg__ (@var{fn}, @var{bg}, @var{o}, @var{beta})
## Fill the background struct @var{bg} (made by @code{ads3_background}) for
## the time-dependent states "tfd" and "quench" at inverse temperature
## @var{beta}, with the options @var{o}.  The thermofield double keeps the
## fields of one exterior (BTZ or planar BTZ: one-sided functions treat a
## side as that black hole) and adds @code{shock_alpha},
## @code{shock_energy}, @code{shock_time} and @code{shock_M}; the shift
## comes from the core (holent_tfd_shock_alpha).  The quench has the bulk
## "vaidya" and the temperature of its final state.
## @end deftypefn
function bg = __holent_time_bg__ (fn, bg, o, beta)
  circle = strcmp (bg.boundary, "circle");
  L = bg.circumference;
  c = bg.c;
  bg.beta = beta;
  bg.T = 1 / beta;
  bg.beta_L = bg.beta_R = beta;
  bg.T_L = bg.T_R = 1 / beta;
  if (strcmp (bg.state, "quench"))
    bg.bulk = "vaidya";
    bg.saddle = "btz";
    bg.pure = true;   # a pure state collapsing: S(A) = S(A^c)
    return;
  endif
  ## The eternal black hole: one exterior is BTZ at this temperature (the
  ## caller warns about the cutoff once).
  warning ("off", "holent:cutoff", "local");
  extra = {};
  if (circle)
    extra = {"circumference", L, "saddle", "btz"};
  endif
  th = ads3_background ("thermal", bg.boundary, "beta", beta, "c", c,
                        "cutoff", bg.cutoff, extra{:});
  keep = {"state", "boundary", "G", "ell", "cutoff", "circumference"};
  for f = setdiff (fieldnames (th), keep)'
    bg.(f{1}) = th.(f{1});
  endfor
  has = @(f) isfield (o, f);
  if (has ("shock_alpha") && (has ("shock_energy") || has ("shock_time")))
    error ("holent:option",
           "%s: give 'shock_alpha' or 'shock_energy' with 'shock_time', not both", fn);
  endif
  if (has ("shock_energy") != has ("shock_time"))
    error ("holent:option",
           "%s: 'shock_energy' and 'shock_time' go together", fn);
  endif
  alpha = 0;
  E = 0;
  tw = NaN;
  if (has ("shock_alpha"))
    alpha = __holent_scalar__ (fn, "shock_alpha", o.shock_alpha, "nonnegative");
  elseif (has ("shock_energy"))
    E = __holent_scalar__ (fn, "shock_energy", o.shock_energy, "nonnegative");
    tw = __holent_scalar__ (fn, "shock_time", o.shock_time, "real");
  endif
  try
    [a, M] = __holent_time__ ("shock", double (circle), merge (circle, L, 1), beta, c,
                              E, merge (isnan (tw), 0, tw));
  catch err
    __holent_rethrow__ (err, "__holent_time__", fn);
  end_try_catch
  if (has ("shock_energy"))
    alpha = a;
  endif
  bg.shock_alpha = alpha;
  bg.shock_energy = E;
  bg.shock_time = tw;
  bg.shock_M = M;
endfunction

%!test
%! ## alpha = (E/(4M)) exp(2 pi tw/beta), M = pi c L/(6 beta^2) (Shenker and
%! ## Stanford 2014, JHEP 03 (2014) 067; doc/tfd_shock.md for M).
%! bg = ads3_background ("tfd", "circle", "beta", 0.5, "c", 6, ...
%!                       "shock_energy", 1e-3, "shock_time", 2);
%! M = pi * 6 * 2 * pi / (6 * 0.25);
%! assert (bg.shock_M, M, 1e-12 * M);
%! assert (bg.shock_alpha, 1e-3 / (4 * M) * exp (2 * pi * 2 / 0.5), 1e-12 * bg.shock_alpha);
