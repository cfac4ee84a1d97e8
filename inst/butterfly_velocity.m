## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{v} =} butterfly_velocity (@var{bg})
## Butterfly velocity v_B of the planar AdS_(d+1) background @var{bg} from
## @code{ads_background} (analytic or tabulated, with a horizon): the speed
## at which a perturbation spreads in the boundary theory, read off from
## the transverse profile of a shock wave on the horizon (Shenker and
## Stanford 2014, JHEP 03 (2014) 067; Roberts, Stanford and Susskind 2015,
## JHEP 03 (2015) 051):
## @example
## v_B^2 = 4 pi T / ((d-1) V'(r_h)),  V = r^2, r = 1/z,
##       = |f'(zh)| zh / (2 (d-1)),
## @end example
## sqrt(d/(2(d-1))) for the Schwarzschild brane, 0 for an extremal horizon.
## For a tabulated f, f'(zh) (and hence v_B) is as accurate as
## @code{bg.T_error} says.  Derivation: doc/higher_dimensional.md
## ("Velocities").
##
## @seealso{entanglement_velocity, ads_background}
## @end deftypefn

function v = butterfly_velocity (bg)
  if (nargin != 1)
    print_usage ();
  endif
  [~, v] = __holent_hd__ ("velocity", "butterfly_velocity", bg);
endfunction

%!test
%! ## Schwarzschild brane: v_B = sqrt(d/(2(d-1))) (Shenker and Stanford 2014;
%! ## Roberts, Stanford and Susskind 2015; from memory), any zh
%! for d = 3:7
%!   assert (butterfly_velocity (ads_background (d, "black_brane", "T", 0.3)),
%!           sqrt (d / (2*(d-1))), 1e-14);
%! endfor

%!test
%! ## charged brane (tabulated): v_B^2 = U'(r_h)/(2 (d-1) r_h) with the
%! ## blackening U(r) = r^2 f(1/r) of the r = 1/z form of the metric,
%! ## U'(r_h) by a central difference here; v_E <= v_B
%! q = 1.5;  f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%! z = linspace (0, 1.3, 2000)';
%! bg = ads_background (4, "tabulated", "z", z, "f", f (z));
%! U = @(r) r.^2 .* f (1 ./ r);  h = 1e-5;
%! assert (butterfly_velocity (bg), sqrt ((U (1 + h) - U (1 - h)) / (2*h) / 6), 1e-7);
%! assert (entanglement_velocity (bg) <= butterfly_velocity (bg));
%! ## extremal q = 2: zero
%! bx = ads_background (4, "tabulated", "z", z, "f", 1 - 3 * z.^4 + 2 * z.^6);
%! assert (butterfly_velocity (bx), 0);

%!error <Invalid call> butterfly_velocity ()
%!error <no horizon> butterfly_velocity (ads_background (3, "vacuum"))
