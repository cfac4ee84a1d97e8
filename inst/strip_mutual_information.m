## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{I} =} strip_mutual_information (@var{bg}, @var{l1}, @var{s}, @var{l2})
## @deftypefnx {} {[@var{I}, @var{info}] =} strip_mutual_information (@dots{}, "length", @var{Lperp})
## Holographic mutual information I = S(A) + S(B) - S(A u B) of two parallel
## strips of widths @var{l1} and @var{l2} at separation @var{s} (arrays of
## one common size, or scalars) in the AdS_(d+1) background @var{bg}.
##
## S(A u B) is the lesser of the disconnected surface, S(l1) + S(l2), and
## the connected one, S(s) + S(l1 + s + l2) (Headrick 2010, PRD 82, 126010,
## from memory), so
## @example
## I = max (0, S(l1) + S(l2) - S(s) - S(l1 + s + l2)),
## @end example
## cutoff-independent.  @var{info}.connected is true where the connected
## surface wins; @var{info}.s_transition (the common size of @var{l1} and
## @var{l2}) is, for each pair of widths, the separation at which it stops winning (found
## as in @code{find_transition ("strip_pair", @dots{})}; NaN if none is
## found within the widths the background can reach).
##
## @seealso{strip_entropy, ads_background}
## @end deftypefn

function [I, info] = strip_mutual_information (bg, l1, s, l2, varargin)
  fn = "strip_mutual_information";
  if (nargin < 4)
    print_usage ();
  endif
  l1 = __holent_array__ (fn, "L1", l1);
  s = __holent_array__ (fn, "S", s);
  l2 = __holent_array__ (fn, "L2", l2);
  o = __holent_opts__ (fn, {"length"}, varargin);
  Lp = 1;
  if (isfield (o, "length"))
    Lp = __holent_scalar__ (fn, "length", o.length, "positive");
  endif
  try
    [w1, w2] = common_size_ (l1, l2);   # the widths alone: s_transition
    [l1, s, l2] = common_size_ (l1, s, l2);
  catch
    error ("holent:size", "%s: L1, S and L2 must have one common size or be scalars", fn);
  end_try_catch
  ## finite parts only, one core call: the stored background is reused,
  ## nothing refitted; the core checks every width and names it
  [~, F] = __holent_hd__ ("strip", fn, bg, [l1(:); l2(:); s(:); l1(:) + s(:) + l2(:)],
                          Lp, {"L1", "L2", "S", "L1 + S + L2"});
  F = reshape (F, numel (l1), 4);
  g = reshape (F(:,1) + F(:,2) - F(:,3) - F(:,4), size (l1));
  I = max (0, g);
  info.connected = g > 0;
  ## the transition for each pair of widths, by root finding in the core
  info.s_transition = NaN (size (w1));
  if (! isempty (w1))
    [u, ~, j] = unique ([w1(:), w2(:)], "rows");
    st = __holent_transition__ ("strip_pair", fn, bg, u(:,1), u(:,2));
    info.s_transition = reshape (st(j), size (w1));
  endif
endfunction

function varargout = common_size_ (varargin)
  [err, varargout{1:nargin}] = common_size (varargin{:});
  if (err)
    error ("sizes");
  endif
endfunction

%!test
%! ## Vacuum, d = 3..5: S_fin(l) = -K/l^(d-2) (Ryu and Takayanagi 2006, JHEP 08
%! ## (2006) 045), so I = K (1/s^(d-2) + 1/(l1+s+l2)^(d-2) - 1/l1^(d-2) - 1/l2^(d-2))_+,
%! ## and the transition of equal strips at s/l = x solving
%! ## x^(2-d) + (2+x)^(2-d) = 2 (found here by fzero).
%! for d = 3:5
%!   bg = ads_background (d, "vacuum");
%!   [~, i1] = strip_entropy (bg, 1);
%!   K = -i1.finite;
%!   l1 = 1;  l2 = 1.7;  s = [0.05 0.2 0.5 2];
%!   [I, info] = strip_mutual_information (bg, l1, s, l2);
%!   ref = max (0, K * (s.^(2-d) + (l1 + s + l2).^(2-d) - l1^(2-d) - l2^(2-d)));
%!   assert (I, ref, 1e-10 * max (ref));
%!   assert (info.connected, ref > 0);
%!   [~, ie] = strip_mutual_information (bg, 1, 0.1, 1);
%!   x = fzero (@(x) x^(2-d) + (2 + x)^(2-d) - 2, [0.01 10]);
%!   assert (ie.s_transition, x, 1e-8);
%! endfor

%!test
%! ## Black brane: I >= 0, decreasing in s, and zero beyond the transition
%! bg = ads_background (4, "black_brane", "zh", 1);
%! s = linspace (0.02, 1.5, 30);
%! [I, info] = strip_mutual_information (bg, 1.2, s, 0.9, "length", 2);
%! assert (all (I >= 0) && all (diff (I) <= 0));
%! assert (any (I > 0) && any (I == 0));
%! assert (isfinite (info.s_transition));
%! assert (info.connected, s < info.s_transition);
%! ## thermal effects make the transition come earlier than in vacuum
%! [~, iv] = strip_mutual_information (ads_background (4, "vacuum"), 1.2, 0.1, 0.9);
%! assert (info.s_transition < iv.s_transition);

%!test
%! ## vector widths: one transition per element, each as for scalars
%! bg = ads_background (4, "black_brane", "zh", 1);
%! [~, info] = strip_mutual_information (bg, [1.2 0.5 1.2], 0.1, [0.9 0.5 0.9]);
%! [~, i1] = strip_mutual_information (bg, 1.2, 0.1, 0.9);
%! [~, i2] = strip_mutual_information (bg, 0.5, 0.1, 0.5);
%! assert (info.s_transition, [i1.s_transition, i2.s_transition, i1.s_transition]);
%! assert (all (isfinite (info.s_transition)));

%!error <Invalid call> strip_mutual_information (ads_background (4, "vacuum"), 1, 1)
%!error <common size> strip_mutual_information (ads_background (4, "vacuum"), [1 2], [1 2 3], 1)
%!error <must be positive> strip_mutual_information (ads_background (4, "vacuum"), 1, 0, 1)
%!error <strip_mutual_information: L2\(2\) = 1000 is beyond> strip_mutual_information (ads_background (4, "black_brane", "zh", 1), 0.5, 0.1, [0.5 1e3])
