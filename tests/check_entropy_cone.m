## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of the holographic entropy cone: the shipped facet list is
## proved facet by facet by the package's contraction prover, each
## certificate re-checked here on all pairs of points (not only edges);
## each orbit is shown to be a facet by the rank test on min-cut vectors
## of random graphs; the N = 3, 4 cones have the extreme-ray counts of
## Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015 (JHEP 09 (2015) 130,
## arXiv:1505.07839, from memory: 7 and 20), each ray realised by a graph;
## the N = 5 list has the 372 facets in 8 orbits of Hernandez-Cuenca 2019
## (PRD 100, 026004, arXiv:1903.09148, from memory).

%!function ok = allpairs_check (cert)
%! ## independent of the C checker: every pair of points, and the boundary
%! ## conditions rebuilt from the regions
%! L = numel (cert.lhs);  R = numel (cert.rhs);  N = cert.N;
%! X = double (dec2bin (0:2^L-1, L) == "1")(:, end:-1:1);    # bit l -> column l
%! Y = double (cert.map);
%! Da = (X .* cert.a) * (1 - X)' + ((1 - X) .* cert.a) * X';
%! Db = (Y .* cert.b) * (1 - Y)' + ((1 - Y) .* cert.b) * Y';
%! ok = all (Db(:) <= Da(:) + 1e-12);
%! for p = 1:N
%!   x = cellfun (@(r) any (r == p), cert.lhs);
%!   y = cellfun (@(r) any (r == p), cert.rhs);
%!   ok = ok && isequal (Y(1 + sum (x .* 2.^(0:L-1)), :), double (y));
%! endfor
%! ok = ok && ! any (Y(1, :));                                  # the purifier
%!endfunction

%!function [ok, cert] = prove_row (c, N)
%! lhs = max (c, 0);  rhs = max (-c, 0);
%! [ok, cert] = contraction_proof (lhs(:), rhs(:), N);
%!endfunction

%!function P = graph_pool (N, ngraphs, seed)
%! ## min-cut vectors of graphs: every star (one bulk vertex joined to
%! ## two or more of the N + 1 boundary vertices, weights 1 or 2), then
%! ## random graphs: one boundary vertex per party and one for O, 0 .. 5
%! ## bulk vertices, weights 1 or 2
%! S = zeros (0, 2^N - 1);
%! for m = 1:2^(N+1)-1
%!   leaves = find (bitget (m, 1:N+1));
%!   if (numel (leaves) < 2)
%!     continue;
%!   endif
%!   for wm = 0:2^numel (leaves) - 1
%!     w = 1 + bitget (wm, 1:numel (leaves))';
%!     E = [ones(numel (leaves), 1), 1 + leaves(:)];
%!     S(end+1, :) = mincut_entropy_vector (E, w, [0, 1:N+1], "parties", N)';
%!   endfor
%! endfor
%! rand ("state", seed);
%! P = zeros (ngraphs, 2^N - 1);
%! for g = 1:ngraphs
%!   nb = floor (6 * rand ());  V = N + 1 + nb;
%!   [i, j] = find (triu (rand (V) < 0.15 + 0.5 * rand (), 1));
%!   keep = (i > N + 1) | (j > N + 1) | (rand (numel (i), 1) < 1/3);
%!   i = i(keep);  j = j(keep);
%!   w = 1 + (rand (numel (i), 1) < 0.25);
%!   P(g, :) = mincut_entropy_vector ([i j], w, [1:N+1, zeros(1, nb)], "parties", N)';
%! endfor
%! P = [S; P];
%!endfunction

%!test
%! ## counts: 1, 3, 7, 20 facets for N = 1 .. 4 (SA and MMI instances;
%! ## Bao et al. 2015), 372 in the orbits of sizes below for N = 5
%! ## (Hernandez-Cuenca 2019: 372 facets, 8 orbits, from memory)
%! for N = 1:4
%!   A = __holent_cone__ ("facets", "entropy_cone_test", N);
%!   assert (rows (A), [1 3 7 20](N));
%!   assert (rows (unique (A, "rows")), rows (A));
%! endfor
%! [A, orb, names] = __holent_cone__ ("facets", "entropy_cone_test", 5);
%! assert (rows (unique (A, "rows")), 372);
%! assert (accumarray (orb, 1)', [15 20 45 72 60 10 90 60]);
%! assert (numel (names), 8);
%! ## every facet but SA is balanced: each party appears as often on both
%! ## sides (Bao et al. 2015)
%! M = double (dec2bin (1:31, 5) == "1")(:, end:-1:1);
%! bal = A * M;
%! assert (all (all (bal(orb > 1, :) == 0)));

%!test
%! ## Every facet of N = 3 and 4 and every facet of the first seven N = 5
%! ## orbits proved by contraction, certificates re-checked on all pairs
%! for N = 3:5
%!   [A, orb] = __holent_cone__ ("facets", "entropy_cone_test", N);
%!   for f = find (orb <= 7)'
%!     [ok, cert] = prove_row (A(f, :), N);
%!     assert (ok, sprintf ("N = %d facet %d not proved", N, f));
%!     assert (allpairs_check (cert));
%!   endfor
%! endfor

%!test
%! ## the eighth N = 5 orbit (coefficients 3 and 2: the slowest), all 60
%! ## instances; the search size of the representative is printed
%! [A, orb] = __holent_cone__ ("facets", "entropy_cone_test", 5);
%! fs = find (orb == 8)';
%! for f = fs
%!   [ok, cert] = prove_row (A(f, :), 5);
%!   assert (ok, sprintf ("facet %d not proved", f));
%!   if (f == fs(1))
%!     assert (allpairs_check (cert));
%!     printf ("      orbit 8 representative: %d points, %d values each, log2 maps %.0f, %d nodes, %d backtracks\n",
%!             cert.points, cert.values, cert.log2_initial, cert.nodes, cert.backtracks);
%!   endif
%! endfor

%!test
%! ## rank test: for each orbit representative the min-cut vectors that
%! ## saturate it span a hyperplane (rank 2^N - 2), so it is a facet; and
%! ## every min-cut vector satisfies every facet (graph models are
%! ## holographic, Bao et al. 2015)
%! for N = 3:5
%!   P = graph_pool (N, [300 800 2000](N-2), N);
%!   [A, orb] = __holent_cone__ ("facets", "entropy_cone_test", N);
%!   assert (min (min (P * A')) >= 0);
%!   for j = 1:max (orb)
%!     c = A(find (orb == j, 1), :)';
%!     assert (rank (P(P * c == 0, :)), 2^N - 2);
%!   endfor
%! endfor

%!test
%! ## extreme rays of the cones cut out by SA and MMI for N = 3, 4: every
%! ## 2^N - 2 facets with a one-dimensional null space and the cone on one
%! ## side; 7 and 20 rays (Bao et al. 2015, from memory), each realised
%! ## (up to scale) by a min-cut vector of a graph (Bell pairs and stars)
%! for N = 3:4
%!   A = __holent_cone__ ("facets", "entropy_cone_test", N);
%!   K = 2^N - 1;
%!   C = nchoosek (1:rows (A), K - 1);
%!   Rr = zeros (0, K);
%!   for i = 1:rows (C)
%!     z = null (A(C(i, :), :));
%!     if (columns (z) != 1)
%!       continue;
%!     endif
%!     if (all (A * z <= 1e-9))
%!       z = -z;
%!     endif
%!     if (all (A * z >= -1e-9))
%!       Rr(end+1, :) = round (z' / min (abs (z(abs (z) > 1e-9))));
%!     endif
%!   endfor
%!   Rr = unique (Rr, "rows");
%!   assert (rows (Rr), [7 20](N-2));
%!   P = graph_pool (N, 200, 10 + N);
%!   Pn = unique (P(any (P, 2), :) ./ max (P(any (P, 2), :), [], 2), "rows");
%!   Rn = Rr ./ max (Rr, [], 2);
%!   assert (all (ismember (round (Rn * 1e9), round (Pn * 1e9), "rows")));
%! endfor

%!test
%! ## reversed MMI: no contraction map, and false: the four-leaf star
%! ## (perfect-tensor-like, A1 A2 A3 O) gives 4 < 6
%! [ok, cert] = contraction_proof ({1, 2, 3, [1 2 3]}, {[1 2], [2 3], [1 3]}, 3);
%! assert (! ok && cert.exhaustive);
%! S = mincut_entropy_vector ([1 2; 1 3; 1 4; 1 5], ones (4, 1), [0 1 2 3 4], "parties", 3);
%! assert (S(1) + S(2) + S(4) + S(7) - S(3) - S(6) - S(5), -2);
%! ## the five-party cyclic inequality is proved (Bao et al. 2015)
%! assert (contraction_proof ({[1 2 3], [2 3 4], [3 4 5], [1 4 5], [1 2 5]},
%!                            {[1 2], [2 3], [3 4], [4 5], [1 5], 1:5}, 5));

%!test
%! ## RT entropy vectors (any bulk) are inside the cone: intervals on the
%! ## BTZ circle and in the vacuum on a line, with and without purifier
%! bg = ads3_background ("thermal", "circle", "beta", 1, "c", 12);
%! S = entropy_vector (bg, {[0 0.7], [1 2.2], [2.5 3.1], [3.5 4.9], [5.2 6]});
%! rep = entropy_cone_test (S);
%! assert (rep.verdict, "inside");
%! S = entropy_vector (bg, {[0 0.7], [1 2.2], [2.5 3.1], [3.5 4.9]}, "purifier", true);
%! assert (entropy_cone_test (S).verdict, "inside");
%! vac = ads3_background ("vacuum", "line");
%! S = entropy_vector (vac, {[0 1], [1.5 2], [2.1 4], [5 6], [6 9]});
%! assert (entropy_cone_test (S).holographic);

%!test
%! ## random graphs with many vertices per party are inside for N = 5;
%! ## a GHZ-type vector on five parties (log 2 everywhere but S(all) = 0:
%! ## the 6-party GHZ state) is outside, violating MMI
%! rand ("state", 4);
%! for t = 1:5
%!   V = 40;  lab = [1:6, randi(6, 1, 6), zeros(1, V - 12)];
%!   [i, j] = find (triu (rand (V) < 0.12, 1));
%!   S = mincut_entropy_vector ([i j], rand (numel (i), 1), lab, "parties", 5);
%!   assert (entropy_cone_test (S).verdict, "inside");
%! endfor
%! S = log (2) * ones (31, 1);
%! rep = entropy_cone_test (S);
%! assert (rep.verdict, "outside");
%! assert (any (strcmp ({rep.violated.orbit}, "MMI")));
