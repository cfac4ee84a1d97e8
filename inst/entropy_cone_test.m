## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later; see COPYING.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{rep} =} entropy_cone_test (@var{S})
## @deftypefnx {} {@var{rep} =} entropy_cone_test (@var{S}, @var{name}, @var{value}, @dots{})
## @deftypefnx {} {} entropy_cone_test (@dots{})
## Is an entropy vector inside the holographic entropy cone?
##
## @var{S} has 2^N - 1 entries in the order of @code{entropy_inequalities}
## (from @code{entropy_vector}, @code{mincut_entropy_vector} or anywhere):
## N parties with an implicit purifier O (do not include O; a pure state
## of N parties is simply a vector with S(all) = 0).
##
## For N <= 5 the answer is decided against the complete facet list of
## the cone (1, 3, 7, 20 and 372 facets for N = 1 .. 5: SA and MMI for
## N <= 4, Bao et al. 2015, JHEP 09 (2015) 130; eight orbits for N = 5,
## Hernandez-Cuenca 2019, PRD 100, 026004), every instance generated from
## its orbit representative by the permutations of A1 .. AN O; each
## representative is proved by @code{contraction_proof} and shown to be a
## facet in the package's tests.  For N > 5 the known necessary
## conditions are evaluated (the families of @code{entropy_inequalities},
## which include the cyclic family, plus the user's valid inequalities)
## and, as sufficient evidence, S is written as a nonnegative combination
## of user-given extreme rays (graph-model vectors) by linear programming
## with @code{glpk}.
##
## Options:
## @table @asis
## @item @qcode{"tol"}
## a facet holds when its value is >= -tol (default
## 1e-10 * max (1, max (abs (S)))).
## @item @qcode{"inequalities"}
## a K x (2^N - 1) matrix, row c meaning c * S >= 0, valid inequalities
## of the user's (any N).
## @item @qcode{"rays"}
## an M x (2^N - 1) matrix of entropy vectors inside the cone (rows), for
## instance from @code{mincut_entropy_vector}.
## @end table
##
## @var{rep} has @code{N}, @code{tol}, @code{verdict} (@qcode{"inside"},
## @qcode{"outside"} or @qcode{"undecided"}), @code{holographic} (true
## only when inside), @code{decided}; for N <= 5 @code{facets} (number),
## @code{orbits} (struct array: @code{name}, @code{representative},
## @code{count}, @code{violated}, @code{worst}) and @code{violated} (struct
## array of the violated facets: @code{orbit}, @code{value},
## @code{inequality} as text, @code{coefficients}); for N > 5
## @code{families} (the report of @code{entropy_inequalities});
## @code{user} (@code{count}, @code{violated} row indices, @code{values})
## when inequalities were given; @code{combination} (@code{weights}, one
## per ray, @code{residual}, @code{found}) when rays were given.
## Without outputs a summary is printed.  See @file{doc/entropy_cone.md}.
##
## @seealso{mincut_entropy_vector, contraction_proof, entropy_inequalities}
## @end deftypefn

function rep = entropy_cone_test (S, varargin)
  fn = "entropy_cone_test";
  if (nargin < 1)
    print_usage ();
  endif
  S = __holent_array__ (fn, "S", S);
  if (! isvector (S))
    error ("holent:size", "%s: S must be a vector, got a %s array", fn,
           sprintf ("%dx", size (S))(1:end-1));
  endif
  S = S(:);
  N = log2 (numel (S) + 1);
  if (N != round (N) || N < 1 || N > 16)
    error ("holent:size", "%s: S must have 2^N - 1 entries with N = 1 .. 16, got %d",
           fn, numel (S));
  endif
  K = numel (S);
  o = __holent_opts__ (fn, {"tol", "inequalities", "rays"}, varargin);
  tol = 1e-10 * max (1, max (abs (S)));
  if (isfield (o, "tol"))
    tol = __holent_scalar__ (fn, "tol", o.tol, "nonnegative");
  endif
  r.N = N;
  r.tol = tol;
  outside = false;
  if (N <= 5)
    [A, orb, names, texts] = __holent_cone__ ("facets", fn, N);
    v = A * S;
    bad = find (v < -tol);
    r.facets = rows (A);
    for j = 1:numel (names)
      in = orb == j;
      r.orbits(j) = struct ("name", names{j}, "representative", texts{j},
                            "count", sum (in), "violated", sum (v(in) < -tol),
                            "worst", min (v(in)));
    endfor
    r.violated = struct ("orbit", {}, "value", {}, "inequality", {}, "coefficients", {});
    for j = 1:numel (bad)
      f = bad(j);
      r.violated(j, 1) = struct ("orbit", names{orb(f)}, "value", v(f),
                                 "inequality", facet_text (A(f, :), N),
                                 "coefficients", A(f, :));
    endfor
    outside = ! isempty (bad);
  else
    r.families = entropy_inequalities (S, "tol", tol);
    outside = ! r.families.holds;
  endif
  if (isfield (o, "inequalities"))
    C = __holent_array__ (fn, "inequalities", o.inequalities);
    if (ndims (C) != 2 || columns (C) != K)
      error ("holent:size", "%s: 'inequalities' must have 2^N - 1 = %d columns, got %s",
             fn, K, sprintf ("%dx", size (C))(1:end-1));
    endif
    u = C * S;
    r.user = struct ("count", rows (C), "violated", find (u < -tol)', "values", u');
    outside = outside || any (u < -tol);
  endif
  if (isfield (o, "rays"))
    Rm = __holent_array__ (fn, "rays", o.rays);
    if (ndims (Rm) != 2 || columns (Rm) != K || rows (Rm) == 0)
      error ("holent:size", "%s: 'rays' must be a non-empty M x %d matrix (one entropy vector per row), got %s",
             fn, K, sprintf ("%dx", size (Rm))(1:end-1));
    endif
    r.combination = combination (Rm, S, tol);
  endif
  if (outside)
    r.verdict = "outside";
  elseif (N <= 5 || (isfield (r, "combination") && r.combination.found))
    r.verdict = "inside";
  else
    r.verdict = "undecided";
  endif
  r.holographic = strcmp (r.verdict, "inside");
  r.decided = ! strcmp (r.verdict, "undecided");
  if (nargout > 0)
    rep = r;
  else
    print_summary (r);
  endif
endfunction

## S = Rm' * w with w >= 0, by glpk with slacks: minimise the l1 residual.
function c = combination (Rm, S, tol)
  [M, K] = size (Rm);
  Aeq = [Rm', eye(K), -eye(K)];
  cost = [zeros(M, 1); ones(2 * K, 1)];
  [x, fmin, status] = glpk (cost, Aeq, S, zeros (M + 2 * K, 1), [],
                            repmat ("S", 1, K), repmat ("C", 1, M + 2 * K), 1);
  if (status != 0 || isempty (x))
    x = zeros (M + 2 * K, 1);
    fmin = Inf;
  endif
  w = x(1:M);
  c = struct ("weights", w, "residual", fmin, "found", fmin <= max (tol, 1e-9) * K);
endfunction

function t = facet_text (c, N)
  term = @(k, co) [merge(abs (co) == 1, "", sprintf("%d ", abs (co))) ...
                   "S(" sprintf("A%d", find (bitget (k, 1:N))) ")"];
  L = arrayfun (@(k) term (k, c(k)), find (c > 0), "uniformoutput", false);
  R = arrayfun (@(k) term (k, c(k)), find (c < 0), "uniformoutput", false);
  if (isempty (R))
    R = {"0"};
  endif
  t = [strjoin(L, " + ") " >= " strjoin(R, " + ")];
endfunction

function print_summary (r)
  printf ("holographic entropy cone, N = %d (tol %.3g): %s\n", r.N, r.tol, r.verdict);
  if (isfield (r, "orbits"))
    printf ("  %-14s %8s %9s %12s\n", "orbit", "facets", "violated", "worst");
    for j = 1:numel (r.orbits)
      printf ("  %-14s %8d %9d %12.5g\n", r.orbits(j).name, r.orbits(j).count,
              r.orbits(j).violated, r.orbits(j).worst);
    endfor
    for j = 1:min (5, numel (r.violated))
      printf ("  violated (%s, %.5g): %s\n", r.violated(j).orbit, r.violated(j).value,
              r.violated(j).inequality);
    endfor
  else
    printf ("  known families hold: %s\n", {"no", "yes"}{r.families.holds + 1});
  endif
  if (isfield (r, "combination"))
    printf ("  nonnegative combination of the rays: %s (residual %.3g)\n",
            {"not found", "found"}{r.combination.found + 1}, r.combination.residual);
  endif
endfunction

%!test
%! ## A 3-party GHZ-type vector (S = log 2 on every subset of A1 A2 A3,
%! ## i.e. the 4-party GHZ state with O): MMI is violated (Hayden, Headrick
%! ## and Maloney 2013, from memory), so it is outside.
%! rep = entropy_cone_test (log (2) * ones (7, 1));
%! assert (rep.verdict, "outside");
%! assert (rep.facets, 7);
%! assert (numel (rep.violated), 1);
%! assert (rep.violated(1).orbit, "MMI");
%! assert (rep.violated(1).value, -log (2), 1e-14);
%! assert ([rep.orbits.count], [6 1]);

%!test
%! ## Bell pairs and the four-leaf star are inside (graph models)
%! assert (entropy_cone_test ([1; 1; 0]).holographic);
%! c = sum (dec2bin (1:7) == "1", 2);
%! rep = entropy_cone_test (min (c, 4 - c));
%! assert (rep.holographic && rep.decided);
%! ## SA saturated (S(A1) + S(A2) = S(A1A2)); MMI strict: -I3 = 6 - 3 - 1 = 2
%! assert ([rep.orbits.worst], [0 2]);
%! assert ([entropy_cone_test(ones (15, 1)).facets, entropy_cone_test(ones (31, 1)).facets], [20 372]);

%!test
%! ## N = 6: necessary conditions, user inequalities and a combination of rays
%! N = 6;  K = 2^N - 1;  k = (1:K)';
%! ## Bell-pair vectors between parties i and j (O = 7): S(I) = 1 when I
%! ## separates them
%! P = nchoosek (1:N+1, 2);
%! B = zeros (rows (P), K);
%! for q = 1:rows (P)
%!   in_i = bitget (k, P(q, 1));  in_j = P(q, 2) <= N & bitget (k, min (P(q, 2), N));
%!   B(q, :) = xor (in_i, in_j)';
%! endfor
%! S = B' * (1:rows (P))';
%! rep = entropy_cone_test (S, "rays", B);
%! assert (rep.verdict, "inside");
%! assert (B' * rep.combination.weights, S, 1e-8);
%! rep = entropy_cone_test (S);
%! assert (rep.verdict, "undecided");
%! rep = entropy_cone_test (S, "inequalities", -eye (K)(1, :));   # S(A1) <= 0: false claim
%! assert (rep.verdict, "outside");
%! assert (rep.user.violated, 1);

%!test
%! out = evalc ("entropy_cone_test (log (2) * ones (7, 1))");
%! assert (! isempty (strfind (out, "outside")));

%!error <Invalid call> entropy_cone_test ()
%!error <2\^N - 1 entries> entropy_cone_test ([1 2])
%!error <must be a vector> entropy_cone_test (ones (3, 3))
%!error <NaN> entropy_cone_test ([1 NaN 1])
%!error <7 columns> entropy_cone_test (ones (7, 1), "inequalities", ones (2, 3))
%!error <M x 7> entropy_cone_test (ones (7, 1), "rays", ones (2, 3))
%!error <unknown option> entropy_cone_test (ones (7, 1), "facets", 1)
