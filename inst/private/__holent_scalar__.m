## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {@var{x} =} __holent_scalar__ (@var{fn}, @var{name}, @var{x}, @var{range})
## Check that @var{x} is a real finite numeric scalar (returned as double)
## inside @var{range}: @qcode{"positive"}, @qcode{"nonnegative"},
## @qcode{"any"}, or a two-element cell @{lo, hi, "()"|"(]"|"[]"|"[)"@}.
## Errors: @code{holent:type}, @code{holent:nan}, @code{holent:domain}.
## @end deftypefn
function x = __holent_scalar__ (fn, name, x, range)
  if (! (isnumeric (x) && isscalar (x)) || islogical (x))
    error ("holent:type", "%s: %s must be a real numeric scalar", fn, name);
  endif
  if (! isreal (x) || issparse (x))
    error ("holent:type", "%s: %s must be real and full, not complex or sparse", fn, name);
  endif
  x = double (x);
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

