## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{I3} =} tripartite_information (@var{bg}, @var{A}, @var{B}, @var{C})
## @deftypefnx {} {@var{I3} =} tripartite_information (@dots{}, "t", @var{t})
## Tripartite information
## @example
## I3(A:B:C) = S(A) + S(B) + S(C) - S(AB) - S(AC) - S(BC) + S(ABC)
##           = I(A:B) + I(A:C) - I(A:BC)
## @end example
## of three mutually disjoint regions (n x 2 matrices of [start, end] rows,
## conventions of @code{rt_entropy}, or cell arrays of them, broadcast as
## in @code{mutual_information}).  Holographic states obey monogamy of
## mutual information, I3 <= 0 (Hayden, Headrick and Maloney 2011,
## arXiv:1107.2940).
##
## Cutoff: the interval counts cancel in the alternating sum, so I3 does
## not depend on the cutoff when the parties are at positive distance from
## each other; each contact point between two parties adds a term that
## cancels in I3 as well (it enters S(XY), S(XYZ) and, with the opposite
## sign, S(X) + S(Y) and S(XZ), S(YZ)), so I3 stays finite then too.
##
## @seealso{mutual_information, conditional_entropy, rt_entropy}
##
## Time (@file{doc/hrt_time.md}): regions may be n x 4 matrices
## @code{[start, end, t_start, t_end]}, or, on a thermofield double, structs
## with fields @code{left} and @code{right} (@file{doc/tfd_shock.md}); the
## option @qcode{"t"} (scalar or vector) shifts every time, or is the time
## after a quench; a vector gives one value per time.  Unions stack the
## rows (of each side).
## @end deftypefn

function I3 = tripartite_information (bg, A, B, C, varargin)
  fn = "tripartite_information";
  if (nargin != 4 && nargin != 6)
    print_usage ();
  endif
  [Sp, Su] = __holent_unions__ (fn, bg, {"A", "B", "C"}, {A, B, C},
                                {[1 2], [1 3], [2 3], [1 2 3]}, varargin);
  I3 = Sp{1} + Sp{2} + Sp{3} - Su{1} - Su{2} - Su{3} + Su{4};
endfunction

%!test
%! ## Holographic monogamy I3 <= 0 (Hayden, Headrick and Maloney 2013, PRD
%! ## 87, 046003) holds at every time after a quench.
%! q = ads3_background ("quench", "line", "beta", 1);
%! I3 = tripartite_information (q, [0 1], [1.1 2], [2.2 3.5], "t", linspace (0, 2, 9));
%! assert (all (I3 <= 1e-9));
%! assert (size (I3), [1 9]);

%!test
%! ## I3 = I(A:B) + I(A:C) - I(A:BC), and I3 <= 0 (MMI, Hayden, Headrick and
%! ## Maloney 2011, arXiv:1107.2940).
%! bg = ads3_background ("vacuum", "line");
%! A = [0 1]; B = [1.2 2]; C = [2.3 3.5];
%! I3 = tripartite_information (bg, A, B, C);
%! ref = mutual_information (bg, A, B) + mutual_information (bg, A, C) ...
%!       - mutual_information (bg, A, [B; C]);
%! assert (I3, ref, 1e-10);
%! assert (I3 <= 1e-12);
%! assert (I3 < -0.01);

%!test
%! ## cutoff independent, also for touching parties
%! v = [];
%! for cut = [1e-5 1e-9]
%!   bg = ads3_background ("thermal", "circle", "beta", 1.3, "cutoff", cut);
%!   v(end+1) = tripartite_information (bg, [0 1], [1 2; 4 5], [2.5 3.5]);
%! endfor
%! assert (v(1), v(2), 1e-8);

%!error <Invalid call> tripartite_information (ads3_background ("vacuum", "line"), [0 1], [2 3])
%!error <A\(1,:\) and C\(1,:\) overlap> tripartite_information (ads3_background ("vacuum", "line"), [0 1], [2 3], [0.5 1.5])
