## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later; see COPYING.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{ok} =} contraction_check (@var{cert})
## @deftypefnx {} {[@var{ok}, @var{why}] =} contraction_check (@var{cert})
## Check a contraction-map certificate from @code{contraction_proof}.
##
## Independently of the search, in C: every party's occurrence vector
## (and the purifier's, 0) is mapped to its occurrence vector on the
## right, and |f(x) - f(x')|_b <= |x - x'|_a on every edge of the
## hypercube, which implies it for all pairs (the weighted Hamming
## distance is the path metric of the hypercube with edge weights a_l).
## @var{why} says what failed (empty when @var{ok}).
## @seealso{contraction_proof}
## @end deftypefn

function [ok, why] = contraction_check (cert)
  fn = "contraction_check";
  if (nargin != 1)
    print_usage ();
  endif
  need = {"N", "lhs", "a", "rhs", "b", "map"};
  if (! isstruct (cert) || ! isscalar (cert) || ! all (isfield (cert, need)))
    error ("holent:type", "%s: CERT must be a certificate struct from contraction_proof (fields %s)",
           fn, strjoin (need, ", "));
  endif
  N = __holent_scalar__ (fn, "CERT.N", cert.N, {1, 16, "[]"});
  lm = region_masks (fn, "CERT.lhs", cert.lhs, N);
  rm = region_masks (fn, "CERT.rhs", cert.rhs, N);
  a = __holent_array__ (fn, "CERT.a", cert.a);
  b = __holent_array__ (fn, "CERT.b", cert.b);
  map = cert.map;
  L = numel (lm);  R = numel (rm);
  if (! (islogical (map) || isnumeric (map)) || ! isequal (size (map), [2^L, R]))
    error ("holent:size", "%s: CERT.map must be a 2^L x R = %d x %d logical matrix", fn, 2^L, R);
  endif
  why = "";
  if (R == 0)
    ok = true;
    return;
  endif
  f = double (map != 0) * 2.^(0:R-1)';
  [ok, bx, bl] = __holent_cone__ ("check", fn, N, lm, a(:), rm, b(:), f);
  ok = ok != 0;
  if (! ok)
    if (bl < 0)
      why = sprintf ("boundary condition at point %d not met", bx);
    else
      why = sprintf ("not a contraction on the edge from point %d along term %d", bx, bl);
    endif
  endif
endfunction

function m = region_masks (fn, name, c, N)
  if (! iscell (c))
    error ("holent:type", "%s: %s must be a cell of party-index vectors", fn, name);
  endif
  m = zeros (numel (c), 1);
  for j = 1:numel (c)
    r = c{j};
    if (! isnumeric (r) || isempty (r) || any (r(:) != round (r(:))) || any (r(:) < 1)
        || any (r(:) > N) || numel (unique (r)) != numel (r))
      error ("holent:domain", "%s: %s{%d} must hold distinct party indices 1 .. %d", fn, name, j, N);
    endif
    m(j) = sum (2.^(r(:) - 1));
  endfor
endfunction

%!test
%! [ok, cert] = contraction_proof ({[1 2], [2 3], [1 3]}, {1, 2, 3, [1 2 3]}, 3);
%! assert (contraction_check (cert));
%! ## a wrong boundary value: party A2's point x = 5 (terms A1A2 and A2A3) must
%! ## go to the right-hand terms holding A2 (A2 and A1A2A3)
%! bad = cert;  bad.map(1 + 5, :) = ! bad.map(1 + 5, :);
%! [ok, why] = contraction_check (bad);
%! assert (! ok);
%! assert (! isempty (strfind (why, "boundary")));
%! ## an interior point sent far away: f(x = 7) = 1111, f(0) = 0000, |7|_a = 3
%! bad = cert;  bad.map(8, :) = true;
%! [ok, why] = contraction_check (bad);
%! assert (! ok);
%! assert (! isempty (strfind (why, "contraction")));

%!error <Invalid call> contraction_check ()
%!error <certificate struct> contraction_check (1)
%!error <certificate struct> contraction_check (struct ("N", 3))
%!error <logical matrix> contraction_check (struct ("N", 2, "lhs", {{1, 2}}, "a", [1 1], "rhs", {{[1 2]}}, "b", 1, "map", true (3, 1)))
%!error <party indices> contraction_check (struct ("N", 2, "lhs", {{1, 3}}, "a", [1 1], "rhs", {{[1 2]}}, "b", 1, "map", true (4, 1)))
