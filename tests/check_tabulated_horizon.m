## SPDX-License-Identifier: GPL-3.0-or-later
## Tabulated blackening functions whose samples at the horizon are within
## rounding of zero (the calls of the issue-10 report).  The reference is
## the analytic black brane f = 1 - (z/zh)^d with the same zh: the same
## metric (common practice), so strip and ball entropies must agree to
## the accuracy of the spline through the samples.

%!function check_against_brane (z, f, d, zh, L, R)
%! bg = ads_background (d, "tabulated", "z", z, "f", f);
%! bb = ads_background (d, "black_brane", "zh", zh);
%! [~, in] = strip_entropy (bg, L);
%! [~, ib] = strip_entropy (bb, L);
%! fin = [in.finite];  finb = [ib.finite];
%! assert (fin, finb, 1e-5 * max (abs (finb)) + 1e-8);
%! if (nargin > 5)
%!   [~, in] = ball_entropy (bg, R);
%!   [~, ib] = ball_entropy (bb, R);
%!   fin = [in.finite];  finb = [ib.finite];
%!   assert (fin, finb, 1e-5 * max (abs (finb)) + 1e-8);
%! endif
%!endfunction

%!test
%! ## the horizon sample rounds to 1 - eps/2: every strip and ball call
%! ## used to fail with holent:noconv
%! z = linspace (0, 1.5, 601)';  z(401) = 1 - eps/2;  f = 1 - z.^4;
%! check_against_brane (z, f, 4, 1, [0.2 0.5 1 2], [0.2 0.5 1]);

%!test
%! ## tiny values of either sign at the horizon sample
%! z = linspace (0, 1.5, 601)';
%! for v = [0, 3*eps, -3*eps, realmin]
%!   f = 1 - z.^4;  f(401) = v;
%!   check_against_brane (z, f, 4, 1, [0.3 1.5]);
%! endfor

%!test
%! ## random exact-brane tables on linspace (0, 1.4*zh, N): 12 of 150
%! ## failed with holent:noconv
%! rand ("seed", 150);
%! for t = 1:150
%!   d = 3 + floor (4 * rand ());  zh = 10 ^ (4 * rand () - 2);
%!   N = 40 + floor (600 * rand ());
%!   z = linspace (0, 1.4 * zh, N)';  f = 1 - (z / zh) .^ d;
%!   check_against_brane (z, f, d, zh, zh * (0.1 + rand ()));
%! endfor
