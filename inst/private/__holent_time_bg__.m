## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{bg} =} __holent_time_bg__ (@var{fn}, @var{bg}, @var{o}, @var{beta})
## The background struct of the time-dependent states "tfd" and "quench"
## at inverse temperature @var{beta}, with the options @var{o}, from the
## partial struct @var{bg} of @code{ads3_background} (state, boundary, c,
## G, ell, cutoff, circumference).  Built entirely by the core
## constructors (holent_tfd_make, holent_quench_make: every check and
## derived quantity) through @code{__holent_time__ ("background", ...)}.
## The thermofield double carries the fields of one exterior (BTZ or
## planar BTZ) and @code{shock_alpha}, @code{shock_energy},
## @code{shock_time}, @code{shock_M}; the quench has the bulk "vaidya".
## @end deftypefn
function bg = __holent_time_bg__ (fn, bg, o, beta)
  sh = {"shock_alpha", "shock_energy", "shock_time"};
  v = cell (1, 3);
  for k = 1:3
    if (isfield (o, sh{k}))
      v{k} = o.(sh{k});
      if (! (isnumeric (v{k}) && isscalar (v{k}) && isreal (v{k})) || islogical (v{k}))
        error ("holent:type", "%s: %s must be a real numeric scalar", fn, sh{k});
      endif
      v{k} = full (double (v{k}));
    endif
  endfor
  bg = __holent_time__ ("background", fn, bg.state, bg.boundary, bg.c, bg.G,
                        bg.ell, bg.cutoff, bg.circumference, beta, v{:});
endfunction

%!test
%! ## alpha = (E/(4M)) exp(2 pi tw/beta), M = pi c L/(6 beta^2) (Shenker and
%! ## Stanford 2014, JHEP 03 (2014) 067; doc/tfd_shock.md for M).
%! bg = ads3_background ("tfd", "circle", "beta", 0.5, "c", 6, ...
%!                       "shock_energy", 1e-3, "shock_time", 2);
%! M = pi * 6 * 2 * pi / (6 * 0.25);
%! assert (bg.shock_M, M, 1e-12 * M);
%! assert (bg.shock_alpha, 1e-3 / (4 * M) * exp (2 * pi * 2 / 0.5), 1e-12 * bg.shock_alpha);
%! ## one exterior is the BTZ black hole of that temperature: its entropy
%! ## (pi c/3) L T and energy (pi c/6) L T^2 (Cardy; common practice)
%! assert (bg.S_BH, pi * 6 / 3 * 2 * pi / 0.5, 1e-12 * bg.S_BH);
%! assert (bg.M, M, 1e-12 * M);
%! q = ads3_background ("quench", "line", "beta", 2);
%! assert ({q.bulk, q.T, q.pure}, {"vaidya", 0.5, true});
%!error <f: shock_alpha: must be a nonnegative> __holent_time_bg__ ("f", setfield (ads3_background ("quench", "line", "beta", 1), "state", "tfd"), struct ("shock_alpha", -1), 1)
%!error <shock_alpha must be a real numeric> __holent_time_bg__ ("f", ads3_background ("quench", "line", "beta", 1), struct ("shock_alpha", "x"), 1)
