## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later; see COPYING.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} mincut_entropy_vector (@var{edges}, @var{weights}, @var{labels})
## @deftypefnx {} {[@var{S}, @var{cuts}] =} mincut_entropy_vector (@dots{}, @qcode{"parties"}, @var{N})
## Entropy vector of a graph model: every entry a minimum cut.
##
## The graph is undirected: @var{edges} is an E x 2 matrix of vertex
## indices 1 .. V, @var{weights} E nonnegative finite weights (rational
## weights give exact cut values up to rounding), @var{labels} one
## integer per vertex: 0 for a bulk vertex, 1 .. N for a boundary vertex
## of party j, N + 1 for a boundary vertex of the purifier O.  A party may
## own several vertices; every party 1 .. N must own at least one.
## N is @code{max (labels)} unless given by the option
## @qcode{"parties"}; so a purifier needs @qcode{"parties"}.  Without O
## vertices the N parties together are pure (S(all) = 0).  N <= 16.
##
## @var{S} is the 2^N - 1 column in the order of
## @code{entropy_inequalities}: @code{S(k)} is the entropy of the union of
## the parties whose bits are set in k, the minimum total weight of edges
## cut to separate their vertices from every other boundary vertex (other
## parties and O) (Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015, JHEP
## 09 (2015) 130).  @var{cuts} is the V x (2^N - 1) logical matrix whose
## column k marks the vertices of the smallest minimal cut's side holding
## the parties of k (the homology region of the smallest minimal surface).
##
## Maximum flow by Dinic's algorithm in C (a 100 x 100 lattice, 10^4
## vertices, with N = 10: 1023 cuts in about 30 s; Ctrl-C stops it between
## two cuts, see @code{holent_progress}).  See @file{doc/entropy_cone.md}.
##
## @seealso{entropy_cone_test, contraction_proof, entropy_inequalities}
## @end deftypefn

function [S, cuts] = mincut_entropy_vector (edges, weights, labels, varargin)
  fn = "mincut_entropy_vector";
  if (nargin < 3)
    print_usage ();
  endif
  edges = __holent_array__ (fn, "EDGES", edges);
  weights = __holent_array__ (fn, "WEIGHTS", weights);
  labels = __holent_array__ (fn, "LABELS", labels);
  if (isempty (edges))
    edges = zeros (0, 2);
  endif
  if (ndims (edges) != 2 || columns (edges) != 2)
    error ("holent:size", "%s: EDGES must be an E x 2 matrix of vertex indices, got %s",
           fn, sprintf ("%dx", size (edges))(1:end-1));
  endif
  if (! (isvector (weights) || isempty (weights)) || numel (weights) != rows (edges))
    error ("holent:size", "%s: WEIGHTS must have one entry per row of EDGES (%d), got %d",
           fn, rows (edges), numel (weights));
  endif
  if (any (weights(:) < 0))
    error ("holent:domain", "%s: WEIGHTS must be nonnegative (weight %d is %g)",
           fn, find (weights < 0, 1), weights(find (weights < 0, 1)));
  endif
  if (isempty (labels) || ! isvector (labels))
    error ("holent:size", "%s: LABELS must be a non-empty vector, one label per vertex", fn);
  endif
  bad = find (labels != round (labels) | labels < 0, 1);
  if (! isempty (bad))
    error ("holent:domain", "%s: LABELS must be integers >= 0 (0 bulk, 1..N party, N+1 purifier); LABELS(%d) = %g",
           fn, bad, labels(bad));
  endif
  V = numel (labels);
  bad = find (edges != round (edges) | edges < 1 | edges > V, 1);
  if (! isempty (bad))
    error ("holent:domain", "%s: EDGES must hold vertex indices 1 .. %d (the number of LABELS); EDGES(%d) = %g",
           fn, V, bad, edges(bad));
  endif
  o = __holent_opts__ (fn, {"parties"}, varargin);
  if (isfield (o, "parties"))
    N = __holent_scalar__ (fn, "parties", o.parties, {1, 16, "[]"});
    if (N != round (N))
      error ("holent:domain", "%s: parties must be an integer, got %g", fn, N);
    endif
    if (max (labels) > N + 1)
      error ("holent:inconsistent", "%s: LABELS go up to %d but parties = %d allows 0 .. %d (N+1 = purifier)",
             fn, max (labels), N, N + 1);
    endif
  else
    N = max (labels);
    if (N < 1 || N > 16)
      error ("holent:domain", "%s: LABELS must name 1 .. 16 parties (max (LABELS) = %d)",
             fn, N);
    endif
  endif
  missing = setdiff (1:N, labels(:)');
  if (! isempty (missing))
    error ("holent:inconsistent", "%s: party %d has no boundary vertex (LABELS must use every party 1 .. %d)",
           fn, missing(1), N);
  endif
  if (nargout > 1)
    [S, cuts] = __holent_cone__ ("mincut", fn, edges, weights(:), labels(:), N);
  else
    S = __holent_cone__ ("mincut", fn, edges, weights(:), labels(:), N);
  endif
endfunction

%!function S = brute_cut (edges, w, labels, N)
%! ## every assignment of the bulk vertices to the two sides (independent
%! ## of the flow code; min-cut = max-flow, common practice)
%! V = numel (labels);  bulk = find (labels == 0);
%! S = zeros (2^N - 1, 1);
%! for k = 1:2^N-1
%!   best = Inf;
%!   for m = 0:2^numel (bulk) - 1
%!     in = false (V, 1);
%!     in(labels >= 1 & labels <= N) = bitget (k, labels(labels >= 1 & labels <= N));
%!     if (! isempty (bulk)), in(bulk) = bitget (m, 1:numel (bulk)); endif
%!     best = min (best, sum (w(in(edges(:,1)) != in(edges(:,2)))));
%!   endfor
%!   S(k) = best;
%! endfor
%!endfunction

%!test
%! ## A Bell pair between A1 and A2 (an edge of weight 1): S(A1) = S(A2) = 1,
%! ## S(A1A2) = 0 (Bao et al. 2015, JHEP 09 (2015) 130: a Bell pair is an
%! ## edge between two boundary vertices).
%! S = mincut_entropy_vector ([1 2], 1, [1 2]);
%! assert (S, [1; 1; 0]);

%!test
%! ## Four-leaf star with unit weights on A1, A2, A3 and the purifier: the
%! ## perfect-tensor-like vector S(I) = min(|I|, 4 - |I|) (Bao et al. 2015),
%! ## with the most negative tripartite information, I3 = 3 - 6 + 1 = -2.
%! [S, cuts] = mincut_entropy_vector ([1 2; 1 3; 1 4; 1 5], [1 1 1 1], [0 1 2 3 4],
%!                                    "parties", 3);
%! c = sum (dec2bin (1:7) == "1", 2);
%! assert (S, min (c, 4 - c));
%! assert (size (cuts), [5 7]);
%! assert (cuts(:, 1)', logical ([0 1 0 0 0]));     # smallest side of A1
%! assert (cuts(:, 3)', logical ([0 1 1 0 0]));     # A1A2: 2 = 2 tie, smallest side
%! assert (cuts(:, 7)', logical ([1 1 1 1 0]));     # A1A2A3 against O: centre joins

%!test
%! ## random graphs against the brute force above
%! rand ("state", 3);
%! for trial = 1:12
%!   N = 1 + mod (trial, 3);  nb = mod (trial, 6);
%!   labels = [1:N, N+1, zeros(1, nb), 1];
%!   V = numel (labels);
%!   [i, j] = find (triu (rand (V) < 0.5, 1));
%!   w = round (3 * rand (numel (i), 1)) / 2;
%!   S = mincut_entropy_vector ([i j], w, labels, "parties", N);
%!   assert (S, brute_cut ([i j], w, labels, N), 1e-12);
%! endfor

%!test
%! ## isolated vertices and no edges: every entropy 0
%! assert (mincut_entropy_vector (zeros (0, 2), [], [1 2 0]), zeros (3, 1));

%!error <Invalid call> mincut_entropy_vector ()
%!error <Invalid call> mincut_entropy_vector ([1 2], 1)
%!error <integers> mincut_entropy_vector ([1 2], 1, [1 1.5])
%!error <integers> mincut_entropy_vector ([1 2], 1, [1 -1])
%!error <nonnegative> mincut_entropy_vector ([1 2], -1, [1 2])
%!error <one entry per row of EDGES> mincut_entropy_vector ([1 2; 2 3], 1, [1 2 0])
%!error <E x 2> mincut_entropy_vector ([1 2 3], 1, [1 2 0])
%!error <vertex indices 1 .. 2> mincut_entropy_vector ([1 3], 1, [1 2])
%!error <party 2 has no boundary vertex> mincut_entropy_vector ([1 2], 1, [1 3], "parties", 2)
%!error <party 2 has no boundary vertex> mincut_entropy_vector ([1 2], 1, [1 0 3])
%!error <allows 0 .. 3> mincut_entropy_vector ([1 2], 1, [1 2 4], "parties", 2)
%!error <NaN> mincut_entropy_vector ([1 2], NaN, [1 2])
%!error <finite> mincut_entropy_vector ([1 2], Inf, [1 2])
%!error <1 .. 16 parties> mincut_entropy_vector ([1 2], 1, [0 0])
%!error <unknown option> mincut_entropy_vector ([1 2], 1, [1 2], "purifier", 1)
