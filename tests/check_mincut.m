## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of mincut_entropy_vector against Octave's glpk: the maximum
## flow written as a linear programme (flow on both orientations of every
## edge within its weight, conservation at bulk vertices, maximise the net
## flow out of the source vertices), whose optimum equals the minimum cut
## (max-flow min-cut theorem, Ford and Fulkerson 1956, common practice).

%!function v = lp_maxflow (edges, w, labels, N, k)
%! V = numel (labels);  E = rows (edges);
%! src = labels >= 1 & labels <= N & bitget (k, max (labels, 1)) == 1;
%! snk = labels >= 1 & ! src;
%! tl = [edges(:,1); edges(:,2)];  hd = [edges(:,2); edges(:,1)];   # 2E arcs
%! B = sparse (hd, 1:2*E, 1, V, 2*E) - sparse (tl, 1:2*E, 1, V, 2*E);   # inflow - outflow
%! inner = find (! src & ! snk);
%! c = -sum (B(src, :), 1)';             # net outflow of the sources
%! ub = [w(:); w(:)];
%! [~, fmax] = glpk (c, B(inner, :), zeros (numel (inner), 1), zeros (2*E, 1), ub,
%!                   repmat ("S", 1, numel (inner)), repmat ("C", 1, 2*E), -1);
%! v = fmax;
%!endfunction

%!test
%! ## random sparse graphs, 3 parties + purifier, several vertices per party
%! rand ("state", 11);
%! for trial = 1:3
%!   V = 150;  N = 3;
%!   labels = zeros (1, V);  labels(1:8) = [1 1 2 2 3 3 4 4];
%!   [i, j] = find (triu (rand (V) < 4 / V, 1));
%!   w = rand (numel (i), 1);
%!   S = mincut_entropy_vector ([i j], w, labels, "parties", N);
%!   for k = 1:2^N-1
%!     assert (S(k), lp_maxflow ([i j], w, labels, N, k), 1e-9);
%!   endfor
%! endfor

%!test
%! ## N = 8 parties on a 60 x 60 lattice (3600 vertices, planar, with
%! ## random weights): without a purifier the parties are pure, so S(I) =
%! ## S(I^c) must hold entry by entry although the two cuts are computed
%! ## from opposite sides; subadditivity, SSA and MMI (holographic
%! ## inequalities, Bao et al. 2015, JHEP 09 (2015) 130) hold; three
%! ## entries against glpk.
%! rand ("state", 2);
%! n = 60;  V = n^2;  N = 8;
%! id = reshape (1:V, n, n);
%! edges = [reshape(id(1:end-1, :), [], 1), reshape(id(2:end, :), [], 1);
%!          reshape(id(:, 1:end-1), [], 1), reshape(id(:, 2:end), [], 1)];
%! w = 0.5 + rand (rows (edges), 1);
%! labels = zeros (1, V);
%! ring = [id(1, :), id(2:end, end)', id(end, end-1:-1:1), id(end-1:-1:2, 1)'];
%! labels(ring) = floor ((0:numel (ring) - 1) * N / numel (ring)) + 1;
%! S = mincut_entropy_vector (edges, w, labels);
%! K = 2^N - 1;
%! assert (S(1:K-1), S(K - (1:K-1)), 1e-9);
%! assert (S(K), 0);
%! rep = entropy_inequalities (S);
%! assert ([rep.sa.holds, rep.ssa.holds, rep.mmi.holds], true (1, 3));
%! for k = [1 5 85]
%!   assert (S(k), lp_maxflow (edges, w, labels, N, k), 1e-7 * S(k));
%! endfor
