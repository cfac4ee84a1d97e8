## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{v} =} entanglement_velocity (@var{bg})
## @deftypefnx {} {[@var{v}, @var{info}] =} entanglement_velocity (@var{bg})
## Entanglement (tsunami) velocity v_E of the planar AdS_(d+1) background
## @var{bg} from @code{ads_background} (analytic or tabulated, with a
## horizon): after a global quench the entropy of a large region of
## boundary area A grows as dS/dt = v_E s A, s the entropy density (Liu and
## Suh 2014, PRL 112, 011601 and PRD 89, 066012), with
## @example
## v_E = max over z > zh with f(z) < 0 of  sqrt(-f(z)) (zh/z)^(d-1),
## @end example
## the growth rate of the critical surface that sits at z = z_m inside the
## horizon.  f is needed past zh: a tabulated f must extend beyond z_m
## (for the d = 4 brane z_m = 1.19 zh; an error says how far the table
## reached).  An extremal horizon gives 0.  In d = 2 the brane (planar
## BTZ) gives v_E = 1 = v_B, the supremum approached as z_m -> Inf.
## @var{info} has fields
## @code{z_m} and @code{butterfly} (v_B, @pxref{butterfly_velocity}); v_E
## <= v_B.  Derivation: doc/higher_dimensional.md ("Velocities").
##
## @seealso{butterfly_velocity, ads_background, strip_entropy}
## @end deftypefn

function [v, info] = entanglement_velocity (bg)
  if (nargin != 1)
    print_usage ();
  endif
  [v, vB, zm] = __holent_hd__ ("velocity", "entanglement_velocity", bg);
  info = struct ("z_m", zm, "butterfly", vB);
endfunction

%!test
%! ## Schwarzschild brane: v_E = sqrt(d) (d-2)^(1/2-1/d)/(2(d-1))^(1-1/d)
%! ## (Liu and Suh 2014, PRD 89, 066012; from memory), checked here
%! ## against fminbnd on the metric function itself
%! for d = [3 4 6]
%!   bg = ads_background (d, "black_brane", "zh", 0.8);
%!   [v, info] = entanglement_velocity (bg);
%!   f = @(z) 1 - (z / 0.8).^d;
%!   [zm, r] = fminbnd (@(z) f(z) ./ z.^(2*d - 2), 0.8, 8, optimset ("TolX", 1e-12));
%!   assert (v, sqrt (-r) * 0.8^(d-1), 1e-9);
%!   assert (info.z_m, zm, 1e-5);
%!   assert (v, sqrt (d) * (d-2)^(1/2 - 1/d) / (2*(d-1))^(1 - 1/d), 1e-9);
%!   assert (v < info.butterfly);
%! endfor

%!test
%! ## d = 2 (planar BTZ): v_E = v_B = 1, the light-cone spreading of a 2D
%! ## CFT (Calabrese and Cardy 2005, J. Stat. Mech. P04010; Liu and Suh
%! ## 2014): the rate (zh/z)^2 (z^2/zh^2 - 1) = 1 - zh^2/z^2 tends to 1
%! [v, info] = entanglement_velocity (ads_background (2, "black_brane", "zh", 0.3));
%! assert ([v info.butterfly], [1 1], 1e-15);
%! assert (isinf (info.z_m));

%!test
%! ## charged brane f = 1 - (1+q) z^4 + q z^6, tabulated past the horizon:
%! ## against fminbnd between the horizon and the inner horizon
%! q = 1;  f = @(z) 1 - (1 + q) * z.^4 + q * z.^6;
%! z = linspace (0, 1.5, 3000)';
%! bg = ads_background (4, "tabulated", "z", z, "f", f (z));
%! zi = sqrt ((1 + sqrt (1 + 4*q)) / (2*q));
%! [zm, r] = fminbnd (@(z) f(z) ./ z.^6, 1, zi, optimset ("TolX", 1e-12));
%! [v, info] = entanglement_velocity (bg);
%! assert (v, sqrt (-r), 1e-7);
%! assert (info.z_m, zm, 1e-4);
%! assert (v <= info.butterfly);

%!error <Invalid call> entanglement_velocity ()
%!error <no horizon> entanglement_velocity (ads_background (4, "vacuum"))
%!error <extend past the maximum> entanglement_velocity (ads_background (4, "tabulated", "z", linspace (0, 1.05, 100), "f", 1 - linspace (0, 1.05, 100).^4))
%!error <background struct> entanglement_velocity (struct ())
