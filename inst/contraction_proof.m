## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later; see COPYING.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{ok} =} contraction_proof (@var{lhs}, @var{rhs}, @var{N})
## @deftypefnx {} {[@var{ok}, @var{cert}] =} contraction_proof (@dots{}, @var{name}, @var{value}, @dots{})
## @deftypefnx {} {} contraction_proof (@dots{})
## Prove a candidate holographic entropy inequality by a contraction map.
##
## The candidate is sum(lhs) >= sum(rhs) for N parties A1 .. AN and the
## purifier O (party N + 1).  Each side is either
## @itemize
## @item a cell array of regions, each a vector of party indices 1 .. N+1
## (N+1 = O, a region holding O standing for its complement); a region
## listed k times has coefficient k; or
## @item a numeric vector of 2^N - 1 nonnegative coefficients in the order
## of entropy vectors (entry k multiplies S of the parties whose bits are
## set in k); rational coefficients are allowed.
## @end itemize
## A single region in cell form must still be in a cell: @code{@{[1 2]@}}.
## Regions common to both sides cancel; the coefficients are scaled to
## coprime integers.
##
## The method (Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015, JHEP 09
## (2015) 130): with the L terms of the left (weights a_l) and R terms of
## the right (weights b_r), the inequality holds for every holographic
## state if some f: @{0,1@}^L -> @{0,1@}^R is a contraction,
## |f(x) - f(x')|_b <= |x - x'|_a, and maps the occurrence vector of each
## party (x_l = 1 when the party is in the l-th region) and of O (x = 0)
## to its occurrence vector on the right.  Right-hand terms with
## coefficient k are split into k terms of weight 1 (a map for the merged
## term is a map for the split ones, not conversely: the five-party facet
## with coefficients 3 and 2 needs the split).  The search in C keeps
## candidate sets arc consistent on the edges of the hypercube and
## branches on the point with fewest candidates.
##
## @var{ok} is true when a map was found and passed the independent
## checker.  @var{cert} is a struct: @code{N}; @code{lhs}, @code{rhs} (cells
## of party-index vectors, the right split into unit terms) with weights
## @code{a}, @code{b}; @code{scale} (the factor applied to the input
## coefficients); @code{map}, the 2^L x R logical matrix whose row x + 1 is
## f(x), bit l of x being term l of @code{lhs}; @code{found} (1 map, 0
## none exists, -1 stopped at @qcode{"max_nodes"}); @code{exhaustive} (the
## search finished); @code{verified} (the checker accepted the map);
## @code{conflict_parties} (two parties, N+1 = O, whose boundary conditions
## already violate the contraction property: the inequality then fails on
## a Bell pair between them, so it is false); and the search size
## @code{points} (2^L), @code{values} (2^R), @code{log2_initial} (log2 of
## the number of maps left after the boundary conditions and the first
## propagation), @code{forced}, @code{nodes} and @code{backtracks}.
##
## A finished search with no map (@code{ok} false, @code{exhaustive} true)
## proves only that this method, with these terms, fails; the inequality
## may still be true (contraction is sufficient, not known to be
## necessary) unless @code{conflict_parties} is set.  A false inequality
## is refuted by a graph whose @code{mincut_entropy_vector} violates it.
##
## Options: @qcode{"max_nodes"} bounds the search (default 1e7, 0 for
## none).  Limits: L <= 20, R <= 24, L + R <= 28, N <= 16.  Ctrl-C stops
## a long search (and a progress line shows, see @code{holent_progress}).
## Without outputs a summary is printed.  See @file{doc/entropy_cone.md}.
##
## @seealso{contraction_check, entropy_cone_test, mincut_entropy_vector}
## @end deftypefn

function [ok, cert] = contraction_proof (lhs, rhs, N, varargin)
  fn = "contraction_proof";
  if (nargin < 3)
    print_usage ();
  endif
  N = __holent_scalar__ (fn, "N", N, {1, 16, "[]"});
  if (N != round (N))
    error ("holent:domain", "%s: N must be an integer, got %g", fn, N);
  endif
  o = __holent_opts__ (fn, {"max_nodes"}, varargin);
  maxn = 1e7;
  if (isfield (o, "max_nodes"))
    maxn = __holent_scalar__ (fn, "max_nodes", o.max_nodes, "nonnegative");
  endif
  c = side_vector (fn, "LHS", lhs, N) - side_vector (fn, "RHS", rhs, N);
  ## coprime integers
  [num, den] = rat (c);
  sc = 1;
  for d = unique (den(:))'
    sc = lcm (sc, d);
  endfor
  ci = round (c * sc);
  if (any (abs (ci - c * sc) > 1e-9 * max (1, abs (c * sc))) || any (abs (ci) > 2^40))
    error ("holent:domain", "%s: the coefficients must be rational with small denominators", fn);
  endif
  g = 0;
  for v = ci(ci != 0)'
    g = gcd (g, abs (v));
  endfor
  if (g > 1)
    ci /= g;  sc /= g;
  endif
  lm = find (ci > 0);  a = ci(lm);
  rm0 = find (ci < 0);
  rm = zeros (0, 1);
  if (! isempty (rm0))
    rm = repelem (rm0, -ci(rm0));
  endif
  L = numel (lm);  R = numel (rm);
  cert = struct ("N", N, "lhs", {masks_to_regions(lm, N)}, "a", a',
                 "rhs", {masks_to_regions(rm, N)}, "b", ones(1, R), "scale", sc,
                 "map", false (2^L, R), "found", 0, "exhaustive", true,
                 "verified", false, "conflict_parties", zeros (1, 0),
                 "points", 2^L, "values", 2^R, "log2_initial", 0,
                 "forced", 0, "nodes", 0, "backtracks", 0);
  if (R == 0)
    ## nothing on the right: entropies are nonnegative, any map works
    cert.found = 1;  cert.verified = true;
  elseif (L > 0)
    [found, f, info] = __holent_cone__ ("prove", fn, N, lm, a, rm,
                                        ones (R, 1), maxn);
    cert.found = found;
    cert.exhaustive = found != -1;
    for fld = {"log2_initial", "forced", "nodes", "backtracks", "conflict_parties"}
      cert.(fld{1}) = info.(fld{1});
    endfor
    if (found == 1)
      cert.map = logical (bitget (repmat (f, 1, R), repmat (1:R, 2^L, 1)));
      cert.verified = contraction_check (cert);
    endif
  else
    ## nothing on the left: 0 >= a positive combination fails on the Bell
    ## pair of a party on the right with O
    p = find (bitget (rm(1), 1:N), 1);
    cert.conflict_parties = [p, N + 1];
  endif
  if (nargout > 0)
    ok = cert.found == 1 && cert.verified;
  else
    print_summary (cert);
  endif
endfunction

## The coefficient vector (2^N - 1 entries) of one side.
function v = side_vector (fn, name, s, N)
  K = 2^N - 1;
  if (iscell (s))
    v = zeros (K, 1);
    for j = 1:numel (s)
      r = s{j};
      if (! isnumeric (r) || ! isreal (r) || isempty (r) || ! isvector (r)
          || any (r != round (r)) || any (r < 1) || any (r > N + 1)
          || numel (unique (r)) != numel (r))
        error ("holent:domain", "%s: %s{%d} must be a vector of distinct party indices 1 .. N+1 = %d (N+1 = purifier)",
               fn, name, j, N + 1);
      endif
      m = sum (2.^(r(r <= N) - 1));
      if (any (r == N + 1))
        m = K - m;          # S(X u O) = S(complement of X)
      endif
      if (m > 0)
        v(m) += 1;
      endif
    endfor
  elseif (isnumeric (s) && ! islogical (s))
    v = __holent_array__ ("contraction_proof", name, s);
    if (! isvector (v) || numel (v) != K)
      error ("holent:size", "%s: %s as coefficients must have 2^N - 1 = %d entries (got %d); use a cell for regions",
             fn, name, K, numel (v));
    endif
    if (any (v < 0))
      error ("holent:domain", "%s: %s coefficients must be nonnegative (move terms to the other side)",
             fn, name);
    endif
    v = v(:);
  else
    error ("holent:type", "%s: %s must be a cell array of regions or a coefficient vector, got %s",
           fn, name, class (s));
  endif
endfunction

function c = masks_to_regions (m, N)
  c = arrayfun (@(x) find (bitget (x, 1:N)), m(:)', "uniformoutput", false);
endfunction

function print_summary (cert)
  nm = @(rs) strjoin (cellfun (@(r) ["S(" sprintf("A%d", r) ")"], rs, "uniformoutput", false), " + ");
  printf ("contraction proof, N = %d: %d terms on the left, %d on the right\n",
          cert.N, numel (cert.lhs), numel (cert.rhs));
  printf ("  search: %d points x %d values, log2 of the maps left %.1f, %d forced, %d nodes, %d backtracks\n",
          cert.points, cert.values, cert.log2_initial, cert.forced, cert.nodes, cert.backtracks);
  if (cert.found == 1)
    printf ("  proved: contraction map found and verified (%s)\n",
            {"NOT verified", "verified"}{cert.verified + 1});
  elseif (! isempty (cert.conflict_parties))
    printf ("  false: the boundary conditions of parties %d and %d clash (a Bell pair between them violates it)\n",
            cert.conflict_parties);
  elseif (cert.exhaustive)
    printf ("  no contraction map exists (the search was exhaustive); validity not decided\n");
  else
    printf ("  undecided: node limit reached\n");
  endif
endfunction

%!test
%! ## MMI is proved by contraction (Bao et al. 2015, JHEP 09 (2015) 130;
%! ## Hayden, Headrick and Maloney 2013 for MMI itself, from memory)
%! [ok, cert] = contraction_proof ({[1 2], [2 3], [1 3]}, {1, 2, 3, [1 2 3]}, 3);
%! assert (ok);
%! assert (cert.verified && cert.exhaustive);
%! assert (size (cert.map), [8 4]);
%! assert ([cert.points, cert.values], [8 16]);

%!test
%! ## SSA and SA; reversed MMI fails (exhaustively) and is not valid
%! assert (contraction_proof ({[1 2], [2 3]}, {2, [1 2 3]}, 3));
%! assert (contraction_proof ({1, 2}, {[1 2]}, 2));
%! [ok, cert] = contraction_proof ({1, 2, 3, [1 2 3]}, {[1 2], [2 3], [1 3]}, 3);
%! assert (! ok);
%! assert (cert.exhaustive && cert.found == 0);

%!test
%! ## the same inequality as coefficient vectors, rational and scaled
%! c = zeros (7, 1);  c([3 6 5]) = 1/2;
%! d = zeros (7, 1);  d([1 2 4 7]) = 1/2;
%! [ok, cert] = contraction_proof (c, d, 3);
%! assert (ok);
%! assert (cert.scale, 2);
%! ## purifier index: S(A1) + S(O) >= S(A1 O) is S(A1) + S(A1A2) >= S(A2)
%! [ok, cert] = contraction_proof ({1, 3}, {[1 3]}, 2);
%! assert (ok);
%! assert (cert.lhs, {1, [1 2]});
%! assert (cert.rhs, {2});

%!test
%! ## S(A1) >= S(A1A2) fails on a Bell pair between A2 and O
%! [ok, cert] = contraction_proof ({1}, {[1 2]}, 2);
%! assert (! ok);
%! assert (cert.conflict_parties, [2 3]);
%! [ok, cert] = contraction_proof ({}, {1}, 2);
%! assert (! ok);
%! assert (cert.conflict_parties, [1 3]);
%! assert (contraction_proof ({1}, {}, 2));

%!test
%! out = evalc ("contraction_proof ({[1 2], [2 3], [1 3]}, {1, 2, 3, [1 2 3]}, 3)");
%! assert (! isempty (strfind (out, "proved")));

%!error <Invalid call> contraction_proof ()
%!error <Invalid call> contraction_proof ({1}, {2})
%!error <party indices> contraction_proof ({1.5}, {2}, 2)
%!error <party indices> contraction_proof ({4}, {2}, 2)
%!error <party indices> contraction_proof ({[1 1]}, {2}, 2)
%!error <2\^N - 1 = 3 entries> contraction_proof ([1 2], {2}, 2)
%!error <nonnegative> contraction_proof ([1 -1 0], {2}, 2)
%!error <cell array of regions> contraction_proof ("A", {2}, 2)
%!error <integer> contraction_proof ({1}, {2}, 2.5)
%!error <unknown option> contraction_proof ({1}, {2}, 2, "nodes", 3)
%!error <nonnegative> contraction_proof ({1}, {2}, 2, "max_nodes", -1)
