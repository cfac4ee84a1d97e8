## SPDX-License-Identifier: GPL-3.0-or-later
## No wrong number without a word: parameters whose derived constants
## overflow, or whose cutoff-scale arcs would lose every digit in
## subnormal numbers, are refused with a holent: error instead of giving
## Inf (the calls of the issue-10 report); nearby sane parameters still
## give the closed form of Calabrese and Cardy 2004 (J. Stat. Mech.
## P06002) for an interval on a circle, S = (c/3) log((L/(pi eps))
## sin(pi l/L)).

%!function id = error_of (varargin)
%! id = "";
%! try
%!   bg = ads3_background (varargin{:});
%!   s = interval_entropy (bg, 1);
%!   id = sprintf ("no error: S = %g", s);
%! catch e
%!   id = e.identifier;
%! end_try_catch
%!endfunction

%!test
%! ## vacuum circle with cutoff 1e-320 and circumference 1e308: used to
%! ## give S = Inf without an error
%! id = error_of ("vacuum", "circle", "cutoff", 1e-320, "circumference", 1e308);
%! assert (strncmp (id, "holent:", 7), id);
%! id = error_of ("vacuum", "circle", "cutoff", 1e-320);
%! assert (strncmp (id, "holent:", 7), id);

%!test
%! ## large but representable ratios keep working, against the closed form
%! ## (log of the ratio taken in pieces, so it does not overflow)
%! L = 1e200;  e = 1e-100;  c = 3;
%! bg = ads3_background ("vacuum", "circle", "cutoff", e, "circumference", L, "c", c);
%! l = 1e150;
%! want = (c / 3) * (log (L) - log (pi) - log (e) + log (sin (pi * l / L)));
%! assert (interval_entropy (bg, l), want, 1e-13 * want);
