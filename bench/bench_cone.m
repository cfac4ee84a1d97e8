## SPDX-License-Identifier: GPL-3.0-or-later
## bench_cone (): the holographic entropy cone tools.
##  1. mincut_entropy_vector (Dinic in C) on random graphs of 1000
##     vertices with N = 5 parties and a purifier (31 cuts each), against
##     a plain Octave Edmonds-Karp max-flow (breadth-first search on the
##     sparse residual matrix, one frontier at a time) on a few of the same
##     graphs; per-graph times, the ratio and the agreement are printed.
##  2. contraction proofs of the eight five-party orbit representatives,
##     with the search size and the total time.
function bench_cone (ngraphs, npeer)
  if (nargin < 1)
    ngraphs = 1000;
  endif
  if (nargin < 2)
    npeer = 3;
  endif
  N = 5;  V = 1000;
  rand ("state", 1);
  G = cell (ngraphs, 3);
  for g = 1:ngraphs
    [i, j] = find (triu (sprand (V, V, 3 / V) != 0, 1));
    ## a ring through every vertex keeps the graph connected
    E = [i j; (1:V)', [2:V 1]'];
    lab = zeros (1, V);
    lab(1:12) = [1:6, 1:6];              # two boundary vertices per party and O
    G(g, :) = {E, rand(rows (E), 1), lab};
  endfor
  t0 = tic ();
  S = zeros (2^N - 1, ngraphs);
  for g = 1:ngraphs
    S(:, g) = mincut_entropy_vector (G{g, 1}, G{g, 2}, G{g, 3}, "parties", N);
  endfor
  t_ours = toc (t0) / ngraphs;
  t0 = tic ();
  err = 0;
  for g = 1:npeer
    Sp = peer_vector (G{g, :}, N);
    err = max (err, max (abs (Sp - S(:, g)) ./ max (1, abs (S(:, g)))));
  endfor
  t_peer = toc (t0) / npeer;
  printf ("min-cut entropy vectors, N = %d (+ purifier), %d vertices, %d graphs (peer on %d)\n",
          N, V, ngraphs, npeer);
  printf ("%12s %12s %10s %14s\n", "holent [s]", "octave [s]", "ratio", "max rel diff");
  printf ("%12.5f %12.5f %10.4f %14.2e   (per graph, 31 cuts)\n", t_ours, t_peer,
          t_ours / t_peer, err);

  [A, orb, names] = __holent_cone__ ("facets", "entropy_cone_test", 5);
  printf ("\ncontraction proofs of the eight five-party orbit representatives\n");
  printf ("%-14s %4s %4s %8s %10s %8s %10s\n", "orbit", "L", "R", "nodes", "backtracks",
          "proved", "time [s]");
  ttot = tic ();
  for o = 1:max (orb)
    c = A(find (orb == o, 1), :);
    t0 = tic ();
    [ok, cert] = contraction_proof (max (c, 0)(:), max (-c, 0)(:), 5);
    printf ("%-14s %4d %4d %8d %10d %8d %10.3f\n", names{o}, numel (cert.lhs),
            numel (cert.rhs), cert.nodes, cert.backtracks, ok, toc (t0));
  endfor
  printf ("total: %.2f s\n", toc (ttot));
endfunction

## The entropy vector by Edmonds-Karp in plain Octave: super source and
## sink joined to the terminals with capacity sum (w) + 1.
function S = peer_vector (E, w, lab, N)
  V = numel (lab);
  S = zeros (2^N - 1, 1);
  big = sum (w) + 1;
  for k = 1:2^N-1
    src = find (lab >= 1 & lab <= N & bitget (k, max (lab, 1)));
    snk = find (lab >= 1 & ! ismember (1:V, src));
    s = V + 1;  t = V + 2;
    I = [E(:, 1); s * ones(numel (src), 1); snk(:)];
    J = [E(:, 2); src(:); t * ones(numel (snk), 1)];
    C = [w(:); big * ones(numel (src) + numel (snk), 1)];
    R = sparse (I, J, C, V + 2, V + 2);
    R = R + R';                          # undirected: both orientations
    flow = 0;
    while (true)
      ## breadth-first search from s, one frontier at a time
      parent = zeros (V + 2, 1);  parent(s) = s;
      front = s;
      while (! isempty (front) && parent(t) == 0)
        [fr, nb] = find (R(front, :) > 1e-12);   # residual R(u, v): u -> v
        fr = front(fr);
        nb = nb(:);  fr = fr(:);
        new = parent(nb) == 0;
        nb = nb(new);  fr = fr(new);
        [nb, first] = unique (nb, "first");
        parent(nb) = fr(first);
        front = nb';
      endwhile
      if (parent(t) == 0)
        break;
      endif
      path = t;
      while (path(end) != s)
        path(end+1) = parent(path(end));
      endwhile
      path = fliplr (path);
      idx = sub2ind (size (R), path(1:end-1), path(2:end));
      b = full (min (R(idx)));
      R(idx) -= b;
      ridx = sub2ind (size (R), path(2:end), path(1:end-1));
      R(ridx) += b;
      flow += b;
    endwhile
    S(k) = flow;
  endfor
endfunction
