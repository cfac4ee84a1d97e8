## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn  {} {@var{x} =} __holent_array__ (@var{fn}, @var{name}, @var{x})
## @deftypefnx {} {@var{x} =} __holent_array__ (@var{fn}, @var{name}, @var{x}, "allow_inf")
## Check that @var{x} is a real, non-logical numeric array with no NaN
## or Inf, and return it as a full double (integer, single and sparse
## classes are accepted).  Empty arrays pass.  With
## @qcode{"allow_inf"}, +-Inf passes (the inverse temperature of a
## zero-temperature sector, say).
## Errors: @code{holent:type}, @code{holent:nan}, @code{holent:domain}.
## @end deftypefn
function x = __holent_array__ (fn, name, x, allow)
  if (! isnumeric (x) || islogical (x))
    error ("holent:type", "%s: %s must be a numeric array, got %s", fn, name, class (x));
  endif
  if (! isreal (x))
    error ("holent:type", "%s: %s must be real, not complex", fn, name);
  endif
  if (issparse (x))
    x = full (x);
  endif
  x = double (x);
  if (any (isnan (x(:))))
    error ("holent:nan", "%s: %s must not contain NaN (element %d)", fn, name,
           find (isnan (x(:)), 1));
  endif
  if (nargin < 4 && any (isinf (x(:))))
    error ("holent:domain", "%s: %s must be finite (element %d is Inf)", fn, name,
           find (isinf (x(:)), 1));
  endif
endfunction

%!assert (__holent_array__ ("f", "x", int8 ([1 2])), [1 2])
%!assert (__holent_array__ ("f", "x", zeros (0, 3)), zeros (0, 3))
%!test
%! y = __holent_array__ ("f", "x", sparse ([1 0 2]));
%! assert (y, [1 0 2]);
%! assert (! issparse (y) && isa (y, "double"));
%!assert (__holent_array__ ("f", "x", [Inf -1], "allow_inf"), [Inf -1])
%!error <f: x must not contain NaN \(element 2\)> __holent_array__ ("f", "x", [1 NaN])
%!error <f: x must be finite \(element 1 is Inf\)> __holent_array__ ("f", "x", [Inf 1])
%!error <f: x must be a numeric array, got logical> __holent_array__ ("f", "x", true)
%!error <f: x must be a numeric array, got char> __holent_array__ ("f", "x", "ab")
%!error <f: x must be real, not complex> __holent_array__ ("f", "x", [1 2i])
