## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{H} =} conditional_entropy (@var{bg}, @var{A}, @var{B})
## @deftypefnx {} {@var{H} =} conditional_entropy (@dots{}, "t", @var{t})
## Holographic conditional entropy H(A|B) = S(AB) - S(B) of two disjoint
## regions (n x 2 matrices of [start, end] rows, conventions of
## @code{rt_entropy}, or cell arrays of them, broadcast as in
## @code{mutual_information}).  H(A|B) = S(A) - I(A:B); it may be negative
## (entanglement), and Araki-Lieb gives H(A|B) >= -S(B).
##
## Cutoff: H(A|B) is not cutoff independent: S(AB) carries (c/3) n_AB
## log(1/eps) and S(B) only (c/3) n_B log(1/eps), so H shifts by
## (c/3) n_A log(eps1/eps2) between two cutoffs when A has n_A intervals
## at positive distance from B (fewer where they touch).
##
## @seealso{mutual_information, tripartite_information, rt_entropy}
##
## Time (@file{doc/hrt_time.md}): regions may be n x 4 matrices
## @code{[start, end, t_start, t_end]}, or, on a thermofield double, structs
## with fields @code{left} and @code{right} (@file{doc/tfd_shock.md}); the
## option @qcode{"t"} (scalar or vector) shifts every time, or is the time
## after a quench; a vector gives one value per time.  Unions stack the
## rows (of each side).
## @end deftypefn

function H = conditional_entropy (bg, A, B, varargin)
  fn = "conditional_entropy";
  if (nargin != 3 && nargin != 5)
    print_usage ();
  endif
  [Sp, Su] = __holent_unions__ (fn, bg, {"A", "B"}, {A, B}, {[1 2]}, varargin);
  H = Su{1} - Sp{2};
endfunction

%!test
%! ## S(A|B) = S(AB) - S(B) with boosted regions.
%! bg = ads3_background ("thermal", "line", "beta", 1);
%! A = [0 1 0 0.3];  B = [2 3 0.1 0];
%! assert (conditional_entropy (bg, A, B), rt_entropy (bg, [A; B]) - rt_entropy (bg, B), 1e-12);

%!test
%! ## H(A|B) = S(A) - I(A:B); shifts by (c/3) n_A log(eps1/eps2) with the cutoff.
%! c = 6;
%! bg1 = ads3_background ("thermal", "line", "beta", 2, "c", c, "cutoff", 1e-4);
%! bg2 = ads3_background ("thermal", "line", "beta", 2, "c", c, "cutoff", 1e-7);
%! A = [0 1; 1.5 2]; B = [2.2 4];
%! H1 = conditional_entropy (bg1, A, B);
%! H2 = conditional_entropy (bg2, A, B);
%! assert (H1, rt_entropy (bg1, A) - mutual_information (bg1, A, B), 1e-10);
%! assert (H2 - H1, (c / 3) * 2 * log (1e3), 1e-9);

%!test
%! ## Global vacuum, pure: H(A|A^c) = -S(A^c) = -S(A) (Araki-Lieb saturated).
%! bg = ads3_background ("vacuum", "circle");
%! A = [0 1; 2 3]; Ac = [1 2; 3 2 * pi];
%! assert (conditional_entropy (bg, A, Ac), -rt_entropy (bg, A), 1e-10);

%!error <Invalid call> conditional_entropy (ads3_background ("vacuum", "line"), [0 1])
%!error <overlap> conditional_entropy (ads3_background ("vacuum", "line"), [0 1], [0.5 2])
%!error <B is an empty cell> conditional_entropy (ads3_background ("vacuum", "line"), [0 1], {})
