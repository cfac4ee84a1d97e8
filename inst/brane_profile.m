## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{x} =} brane_profile (@var{bg}, @var{z})
## @deftypefnx {} {@var{x} =} brane_profile (@var{bg}, @var{z}, @var{end})
## The end-of-the-world brane of a BCFT background on the time-symmetric
## slice: the boundary coordinate @var{x} of the brane at bulk depth
## @var{z} (a positive array; @var{x} has its size), for the brane anchored at
## x = 0 (@var{end} = 0, the default) or at x = length (@var{end} = 1, an
## interval in the BTZ saddle).  NaN where the brane does not reach that
## depth.  The bulk coordinates and the profiles (Poincare, planar BTZ,
## thermal AdS) are those of @file{doc/bcft.md} and @code{bg.brane_profile}.
## @seealso{ads3_background, rt_entropy}
## @end deftypefn
function x = brane_profile (bg, z, e)
  fn = "brane_profile";
  if (nargin < 2 || nargin > 3)
    print_usage ();
  endif
  if (! __holent_is_bcft__ (bg))
    error ("holent:background", "%s: BG must be a BCFT background from ads3_background", fn);
  endif
  if (nargin < 3)
    e = 0;
  endif
  z = __holent_array__ (fn, "Z", z);
  k = find (! (z(:) > 0), 1);
  if (! isempty (k))
    error ("holent:domain", "%s: Z(%d) = %g must be a positive depth", fn, k, z(k));
  endif
  e = __holent_scalar__ (fn, "END", e, {0, 1, "[]"});
  x = __holent_bcft__ ("profile", fn, bg, z, e);
endfunction

%!test
%! ## tension T: the brane leaves the boundary at angle arcsin(T ell) into x < 0
%! ## (Takayanagi 2011, PRL 107, 101602)
%! bg = ads3_background ("bcft", "half_line", "tension", 0.5);
%! assert (brane_profile (bg, [1 2]), -[1 2] * 0.5 / sqrt (0.75), 1e-15);
%!test
%! bg = ads3_background ("bcft", "interval", "length", 2, "beta", 1, "tension", [0.2 0.3]);
%! assert (brane_profile (bg, 0.01, 1) > 2);
%! assert (isnan (brane_profile (bg, 10)));
%!error <Invalid call> brane_profile (1)
%!error <BCFT background> brane_profile (ads3_background ("vacuum", "line"), 1)
