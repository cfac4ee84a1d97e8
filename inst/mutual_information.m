## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{I} =} mutual_information (@var{bg}, @var{A}, @var{B})
## @deftypefnx {} {@var{I} =} mutual_information (@dots{}, "t", @var{t})
## Holographic mutual information I(A:B) = S(A) + S(B) - S(AB) of two
## disjoint regions, each an n x 2 matrix of [start, end] rows with any
## number of intervals (conventions of @code{rt_entropy}), in background
## @var{bg} from @code{ads3_background}.
##
## @var{A} and @var{B} may be cell arrays of regions of one size (or one of
## them a single region); @var{I} then has that size.  Overlapping parties
## raise @code{holent:overlap}; parties may touch.
##
## Cutoff: every RT candidate of a region with m intervals has exactly m
## geodesics, each carrying 2 log(1/eps), so S = (c/3) m log(1/eps) +
## finite.  For A and B at positive distance the counts cancel and I(A:B)
## does not depend on the cutoff; when they touch, the shared endpoints
## are no longer endpoints of AB and I grows like (c/3) log(1/eps) per
## contact point.
##
## @seealso{rt_entropy, tripartite_information, conditional_entropy}
##
## Time (@file{doc/hrt_time.md}): regions may be n x 4 matrices
## @code{[start, end, t_start, t_end]}, or, on a thermofield double, structs
## with fields @code{left} and @code{right} (@file{doc/tfd_shock.md}); the
## option @qcode{"t"} (scalar or vector) shifts every time, or is the time
## after a quench; a vector gives one value per time.  Unions stack the
## rows (of each side).
## @end deftypefn

function I = mutual_information (bg, A, B, varargin)
  fn = "mutual_information";
  if (nargin != 3 && nargin != 5)
    print_usage ();
  endif
  [Sp, Su] = __holent_unions__ (fn, bg, {"A", "B"}, {A, B}, {[1 2]}, varargin);
  I = Sp{1} + Sp{2} - Su{1};
endfunction

%!test
%! ## Two-sided mutual information of A_L = A_R = [0, l]: positive until
%! ## cosh(2 pi t/beta) = sinh(pi l/beta) (Hartman and Maldacena 2013,
%! ## JHEP 05 (2013) 014), and zero after.
%! bg = ads3_background ("tfd", "line", "beta", 1, "c", 3, "cutoff", 1e-6);
%! l = 1.5;
%! ts = acosh (sinh (pi * l)) / (2 * pi);
%! I = mutual_information (bg, struct ("left", [0 l]), struct ("right", [0 l]), "t", [0, 0.9 * ts, 1.1 * ts]);
%! I0 = 2 * (log (1 / (pi * 1e-6) * sinh (pi * l)) - log (1 / (pi * 1e-6)));
%! assert (I(1), I0, 1e-9);
%! assert (I(2) > 0 && I(3) == 0);
%! ## quench: mutual information of two intervals against time
%! q = ads3_background ("quench", "line", "beta", 1);
%! I = mutual_information (q, [0 1], [1.2 2.2], "t", [-1 0.05 5]);
%! assert (I(1), mutual_information (ads3_background ("vacuum", "line"), [0 1], [1.2 2.2]), 1e-12);
%! assert (I(3), mutual_information (ads3_background ("thermal", "line", "beta", 1), [0 1], [1.2 2.2]), 1e-12);

%!test
%! ## Headrick 2010 (Phys. Rev. D 82, 126010), two intervals in the vacuum on
%! ## a line: I = max(0, (c/3) log(l1 l2 / (d (l1 + l2 + d)))).
%! bg = ads3_background ("vacuum", "line", "c", 12);
%! l1 = 1; l2 = 2;
%! for d = [0.05 0.3 0.6 1 3]
%!   ref = max (0, 4 * log (l1 * l2 / (d * (l1 + l2 + d))));
%!   assert (mutual_information (bg, [0 l1], [l1 + d, l1 + d + l2]), ref, 1e-10);
%! endfor

%!test
%! ## Cell form, broadcasting B; cutoff independence at positive distance.
%! bg = ads3_background ("thermal", "circle", "beta", 0.9, "cutoff", 1e-4);
%! bg2 = ads3_background ("thermal", "circle", "beta", 0.9, "cutoff", 1e-8);
%! A = {[0 1], [0 0.5; 0.7 1.2], [5 0.3]};
%! B = [1.3 2.4; 3 4];
%! I = mutual_information (bg, A, B);
%! assert (size (I), [1 3]);
%! assert (I, mutual_information (bg2, A, B), 1e-9);
%! for k = 1:3
%!   assert (I(k), rt_entropy (bg, A{k}) + rt_entropy (bg, B) - rt_entropy (bg, [A{k}; B]), 1e-10);
%! endfor

%!test
%! ## Touching parties: I grows like (c/3) log(1/eps) (one contact point).
%! bg1 = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-4);
%! bg2 = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);
%! I1 = mutual_information (bg1, [0 1], [1 2]);
%! I2 = mutual_information (bg2, [0 1], [1 2]);
%! assert (I2 - I1, log (100), 1e-10);

%!demo
%! ## Mutual information of two intervals of length 1 against their
%! ## separation: vacuum (transition at cross-ratio 1/2) and thermal states.
%! d = linspace (0.01, 0.6, 120);
%! A = [0 1];
%! B = arrayfun (@(x) [1 + x, 2 + x], d, "uniformoutput", false);
%! clf; hold on;
%! plot (d, mutual_information (ads3_background ("vacuum", "line", "c", 3), A, B), "k-");
%! for beta = [2 1 0.5]
%!   plot (d, mutual_information (ads3_background ("thermal", "line", "beta", beta, "c", 3), A, B));
%! endfor
%! hold off;
%! xlabel ("separation d"); ylabel ("I(A:B)  [c = 3]");
%! legend ("vacuum", "beta = 2", "beta = 1", "beta = 0.5");
%! title ("two unit intervals: connected surface (I > 0) at small separation");

%!error <Invalid call> mutual_information (ads3_background ("vacuum", "line"), [0 1])
%!error <A\(1,:\) and B\(2,:\) overlap> mutual_information (ads3_background ("vacuum", "line"), [0 1], [3 4; 0.5 2])
%!error <A\{2\}\(1,:\) and B\(1,:\) overlap> mutual_information (ads3_background ("vacuum", "line"), {[0 1], [2 3]}, [2.5 4])
%!error <B: rows 1 and 2 overlap> mutual_information (ads3_background ("vacuum", "line"), [0 1], [3 4; 3.5 5])
%!error <2 regions where 3> mutual_information (ads3_background ("vacuum", "line"), {[0 1], [2 3], [4 5]}, {[7 8], [9 10]})
%!error <cell array of regions> mutual_information (ads3_background ("vacuum", "line"), [0 1], "x")
%!error <A is an empty cell> mutual_information (ads3_background ("vacuum", "line"), {}, [2 3])
