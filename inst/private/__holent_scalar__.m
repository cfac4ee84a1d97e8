## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{x} =} __holent_scalar__ (@var{fn}, @var{name}, @var{x}, @var{range})
## Check that @var{x} is a real finite numeric scalar (returned as a full
## double; integer, single and sparse classes are accepted, logical is not)
## inside @var{range}: @qcode{"positive"}, @qcode{"nonnegative"},
## @qcode{"any"}, or a two-element cell @{lo, hi, "()"|"(]"|"[]"|"[)"@}.
## Errors: @code{holent:type}, @code{holent:nan}, @code{holent:domain}.
## @end deftypefn
function x = __holent_scalar__ (fn, name, x, range)
  if (! (isnumeric (x) && isscalar (x)) || islogical (x))
    error ("holent:type", "%s: %s must be a real numeric scalar", fn, name);
  endif
  if (! isreal (x))
    error ("holent:type", "%s: %s must be real, not complex", fn, name);
  endif
  x = full (double (x));
  if (isnan (x))
    error ("holent:nan", "%s: %s must not be NaN", fn, name);
  endif
  if (isinf (x))
    error ("holent:domain", "%s: %s must be finite", fn, name);
  endif
  if (ischar (range))
    switch (range)
      case "positive"
        if (! (x > 0))
          error ("holent:domain", "%s: %s must be positive, got %g", fn, name, x);
        endif
      case "nonnegative"
        if (! (x >= 0))
          error ("holent:domain", "%s: %s must be nonnegative, got %g", fn, name, x);
        endif
    endswitch
  else
    [lo, hi, kind] = deal (range{:});
    okl = merge (kind(1) == "(", x > lo, x >= lo);
    okh = merge (kind(2) == ")", x < hi, x <= hi);
    if (! (okl && okh))
      error ("holent:domain", "%s: %s must lie in %s%g, %g%s, got %g",
             fn, name, kind(1), lo, hi, kind(2), x);
    endif
  endif
endfunction

%!assert (__holent_scalar__ ("f", "x", int8 (3), "positive"), 3)
%!assert (__holent_scalar__ ("f", "x", sparse (0.5), {0, 1, "(]"}), 0.5)
%!assert (issparse (__holent_scalar__ ("f", "x", sparse (0.5), "any")), false)
%!assert (__holent_scalar__ ("f", "x", 0, "nonnegative"), 0)
%!assert (__holent_scalar__ ("f", "x", 1, {0, 1, "(]"}), 1)
%!error <f: x must lie in \(0, 1\), got 1> __holent_scalar__ ("f", "x", 1, {0, 1, "()"})
%!error <f: x must be positive, got 0> __holent_scalar__ ("f", "x", 0, "positive")
%!error <f: x must be nonnegative> __holent_scalar__ ("f", "x", -1, "nonnegative")
%!error <f: x must be a real numeric scalar> __holent_scalar__ ("f", "x", [1 2], "any")
%!error <f: x must be a real numeric scalar> __holent_scalar__ ("f", "x", true, "any")
%!error <f: x must be real, not complex> __holent_scalar__ ("f", "x", 1i, "any")
%!error <f: x must not be NaN> __holent_scalar__ ("f", "x", NaN, "any")
%!error <f: x must be finite> __holent_scalar__ ("f", "x", -Inf, "any")
