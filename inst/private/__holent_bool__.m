## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {@var{tf} =} __holent_bool__ (@var{fn}, @var{name}, @var{v})
## @var{v} as a logical scalar: true, false, 0 or 1 (any real numeric
## class, sparse included); anything else raises
## @code{holent:option} naming @var{name}.
## @end deftypefn
function tf = __holent_bool__ (fn, name, v)
  if (! ((islogical (v) || isnumeric (v)) && isscalar (v) && isreal (v)
         && (v == 0 || v == 1)))
    error ("holent:option", "%s: %s must be true or false", fn, name);
  endif
  tf = logical (full (v));
endfunction

%!assert (__holent_bool__ ("f", "x", true), true)
%!assert (__holent_bool__ ("f", "x", 0), false)
%!assert (__holent_bool__ ("f", "x", int8 (1)), true)
%!assert (__holent_bool__ ("f", "x", sparse (1)), true)
%!assert (issparse (__holent_bool__ ("f", "x", sparse (1))), false)
%!error <f: x must be true or false> __holent_bool__ ("f", "x", 2)
%!error <f: x must be true or false> __holent_bool__ ("f", "x", "yes")
%!error <f: x must be true or false> __holent_bool__ ("f", "x", [1 0])
%!error <f: x must be true or false> __holent_bool__ ("f", "x", NaN)
