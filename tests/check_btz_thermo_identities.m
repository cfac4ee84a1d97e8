## SPDX-License-Identifier: GPL-3.0-or-later
## BTZ thermodynamics against relations written out here from the metric
## and from the CFT (every reference derived in this file, not from the
## package): the heat capacity at fixed J, the Cardy formula on the
## package's own L0 and Lbar0, and the continuity of the extremal limit.

%!test
%! ## BTZ heat capacity at fixed J written out from the metric: with
%! ## J = r_+ r_-/(4G) fixed, T(r_+) = (r_+^4 - (4GJ)^2)/(2 pi r_+^3) and
%! ## S = pi r_+/(2G), C_J = T (dS/dr_+)/(dT/dr_+), the derivative of T by
%! ## a complex step (Banados, Teitelboim and Zanelli 1992 for T and S;
%! ## ell = 1, circle 2 pi).
%! G = 0.07;
%! for rp = [0.3 1 2.5]
%!   for rm = [0 0.2 -0.9] * rp
%!     J = rp * rm / (4 * G);
%!     T = @(r) (r.^4 - (4 * G * J)^2) ./ (2 * pi * r.^3);
%!     h = 1e-30;
%!     dT = imag (T (rp + 1i * h)) / h;
%!     CJ = T (rp) * (pi / (2 * G)) / dT;
%!     th = btz_thermodynamics ("r_plus", rp, "r_minus", rm, "G", G);
%!     assert (th.C_J, CJ, 1e-12 * CJ);
%!     assert (th.C_Omega, th.S, 0);     # S = (pi c/3) T/(1 - Omega^2) at fixed Omega
%!   endfor
%! endfor

%!test
%! ## Cardy formula (Cardy 1986, Nucl. Phys. B 270, 186) on the package's own
%! ## L0, Lbar0 equals its S on any circle (Strominger 1998, JHEP 02 (1998)
%! ## 009), and L0, Lbar0 follow from M, J as M L/(2 pi) = L0 + Lbar0 - c/12,
%! ## J = L0 - Lbar0.
%! rand ("seed", 11);
%! TL = 0.05 + 2 * rand (1, 20);  TR = 0.05 + 2 * rand (1, 20);
%! L = 0.5 + 8 * rand (1, 20);  c = 37;
%! th = btz_thermodynamics ("T_L", TL, "T_R", TR, "circumference", L, "c", c);
%! cardy = 2 * pi * sqrt (c / 6 * (th.L0 - c / 24)) + 2 * pi * sqrt (c / 6 * (th.Lbar0 - c / 24));
%! assert (th.S, cardy, 1e-12 * max (th.S));
%! assert (th.M .* L / (2 * pi), th.L0 + th.Lbar0 - c / 12, 1e-12 * max (th.L0));
%! assert (th.J, th.L0 - th.Lbar0, 1e-12 * max (th.L0));
%! ## thermal entropy S = (pi c L/6)(T_L + T_R) (doc/conventions.md)
%! assert (th.S, pi * c * L / 6 .* (TL + TR), 1e-12 * max (th.S));

%!test
%! ## The extremal limit is continuous: T_R -> 0 approaches the T_R = 0 state
%! ## (no NaN there, no jump), and |J| = M ell is reached from below.
%! o = {"c", 12, "circumference", 3};
%! e = btz_thermodynamics ("T_L", 0.7, "T_R", 0, o{:});
%! n = btz_thermodynamics ("T_L", 0.7, "T_R", 1e-9, o{:});
%! for f = {"r_plus", "r_minus", "M", "J", "T", "Omega", "S", "F", "C_Omega", "C_J", "L0", "Lbar0"}
%!   assert (isfinite (e.(f{1})));
%!   assert (n.(f{1}), e.(f{1}), 1e-7 * max (1, abs (e.(f{1}))));
%! endfor
%! assert ([e.T, e.Omega, e.C_J], [0, 1, 0]);
%! assert (e.J, e.M * 3 / (2 * pi), 1e-14 * e.J);
