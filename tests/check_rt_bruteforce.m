## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Cross-check of rt_entropy against an exhaustive enumeration written here,
## independently of the package: every non-crossing pairing of the sorted
## endpoints, every face of its chord diagram for the horizon or the
## defect, the regulated geodesic lengths in closed form (Ryu and
## Takayanagi 2006, PRL 96, 181602; Hubeny, Rangamani and Takayanagi 2007,
## JHEP 07, 062 for rotating BTZ; the defect form with its apex cap as in
## doc/conventions.md) and the homology rule with the horizon (Headrick and
## Takayanagi 2007, PRD 76, 106013).  Random region sets up to n = 8 in
## every background; the minimising configuration is compared when the
## runner-up is more than 1e-8 away.

%!function P = bf_pairings (N)
%!  ## all non-crossing perfect matchings of points 1..N, as rows of
%!  ## partners (N must be even): pair 1 with j (j even), recurse inside and
%!  ## outside
%!  persistent memo
%!  if (N == 0)
%!    P = zeros (1, 0);
%!    return;
%!  endif
%!  if (iscell (memo) && numel (memo) >= N && ! isempty (memo{N}))
%!    P = memo{N};
%!    return;
%!  endif
%!  P = zeros (0, N);
%!  for j = 2:2:N
%!    In = bf_pairings (j - 2);
%!    Out = bf_pairings (N - j);
%!    for a = 1:rows (In)
%!      for b = 1:rows (Out)
%!        row = zeros (1, N);
%!        row(1) = j;  row(j) = 1;
%!        row(2:j-1) = In(a,:) + 1;
%!        row(j+1:N) = Out(b,:) + j;
%!        P(end+1,:) = row;
%!      endfor
%!    endfor
%!  endfor
%!  memo{N} = P;
%!endfunction

%!function C = bf_candidates (n, faces)
%!  ## C.a, C.b: chord endpoints (K x n), C.mask: chords enclosing the face
%!  ## (K x n logical), C.seg: a boundary segment of the face (segment g
%!  ## runs from point g to point g+1, segment N from N to 1 round the circle)
%!  persistent cache
%!  key = sprintf ("n%d_%d", n, faces);
%!  if (isstruct (cache) && isfield (cache, key))
%!    C = cache.(key);
%!    return;
%!  endif
%!  N = 2 * n;
%!  P = bf_pairings (N);
%!  nm = rows (P);
%!  [~, cols] = sort (! (P > (1:N)), 2);     # stable: chord starts ascending
%!  a = cols(:, 1:n);
%!  b = P(sub2ind (size (P), repmat ((1:nm)', 1, n), a));
%!  if (! faces)
%!    C.a = a; C.b = b; C.mask = false (nm, n); C.seg = N * ones (nm, 1);
%!  else
%!    ## code(r, g): the set of chords of pairing r enclosing segment g, as bits
%!    code = zeros (nm, N);
%!    for k = 1:n
%!      code += 2^(k-1) * ((1:N) >= a(:,k) & (1:N) < b(:,k));
%!    endfor
%!    [sc, idx] = sort (code, 2);
%!    isnew = [true(nm, 1), diff(sc, 1, 2) != 0];   # one entry per face
%!    [r, col] = find (isnew);
%!    lin = sub2ind (size (sc), r, col);
%!    C.a = a(r,:); C.b = b(r,:);
%!    C.mask = mod (floor (sc(lin) ./ 2.^(0:n-1)), 2) > 0;
%!    C.seg = idx(lin);
%!  endif
%!  if (! isstruct (cache))
%!    cache = struct ();
%!  endif
%!  cache.(key) = C;
%!endfunction

%!function len = bf_length (m, l)
%!  ## regulated geodesic length over a boundary arc l (ell = 1)
%!  e = m.eps;
%!  switch (m.kind)
%!    case "poincare"
%!      len = 2 * log (l / e);
%!    case {"global", "thermal_ads"}
%!      len = 2 * log (m.L / (pi * e) * sin (pi * l / m.L));
%!    case "defect"
%!      len = 2 * log (m.L / (pi * m.alpha * e) * sin (min (pi * m.alpha * l / m.L, pi / 2)));
%!    otherwise   # BTZ family: beta_L, beta_R
%!      len = log (m.bl * m.br / (pi^2 * e^2) * sinh (pi * l / m.bl) .* sinh (pi * l / m.br));
%!  endswitch
%!endfunction

%!function [A, p, inA] = bf_random_region (n, m)
%!  ## n disjoint intervals with endpoints at least 1e-3 apart; rows
%!  ## shuffled and, on a circle, shifted by whole turns.  p: the sorted
%!  ## endpoints (mod L); inA(g): segment g inside A (own midpoint test).
%!  do
%!    if (m.circle)
%!      p = sort (m.L * rand (2 * n, 1));
%!      gaps = diff ([p; p(1) + m.L]);
%!    else
%!      p = sort (10 * rand (2 * n, 1));
%!      gaps = diff (p);
%!    endif
%!  until (min (gaps) > 1e-3)
%!  wrap = m.circle && rand () < 0.5;
%!  if (wrap)
%!    A = [p(2:2:end), [p(3:2:end); p(1) + m.L]];
%!  else
%!    A = [p(1:2:end), p(2:2:end)];
%!  endif
%!  A = A(randperm (n), :);
%!  if (m.circle)
%!    A = A + m.L * randi ([-2 2], n, 1);
%!  endif
%!  N = 2 * n;
%!  if (m.circle)
%!    mid = mod ((p + [p(2:end); p(1) + m.L]) / 2, m.L);
%!    inA = false (N, 1);
%!    for k = 1:n
%!      s = mod (A(k,1), m.L);  len = mod (A(k,2) - A(k,1), m.L);
%!      inA |= mod (mid - s, m.L) < len;
%!    endfor
%!  else
%!    inA = mod ((1:N)', 2) == 1;
%!    inA(N) = false;
%!  endif
%!endfunction

%!function [Sbest, cfg, gap] = bf_minimum (m, n, p, inA)
%!  ## exhaustive minimum; cfg.pairs (sorted rows), cfg.arcs, cfg.horizon
%!  faces = m.circle && any (strcmp (m.kind, {"btz", "rotating", "defect"}));
%!  C = bf_candidates (n, faces);
%!  inner = p(C.b) - p(C.a);
%!  if (isvector (inner) && n == 1)
%!    inner = inner(:);
%!  endif
%!  arcs = inner;
%!  if (faces)
%!    arcs(C.mask) = m.L - inner(C.mask);
%!  elseif (m.circle)
%!    arcs = min (inner, m.L - inner);
%!  endif
%!  S = m.c / 6 * sum (bf_length (m, arcs), 2);
%!  hor = false (rows (S), 1);
%!  if (faces && m.horizon)
%!    hor = inA(C.seg);
%!    S(hor) += m.SBH;
%!  endif
%!  [Ss, order] = sort (S);
%!  Sbest = Ss(1);
%!  gap = Inf;
%!  if (numel (Ss) > 1)
%!    gap = Ss(2) - Ss(1);
%!  endif
%!  k = order(1);
%!  [~, o] = sort (C.a(k,:));
%!  cfg.pairs = [C.a(k,o)', C.b(k,o)'];
%!  cfg.arcs = arcs(k,o)';
%!  cfg.horizon = hor(k);
%!  cfg.count = rows (S);
%!endfunction

%!function m = bf_model (bg, kind)
%!  m.kind = kind;
%!  m.eps = bg.cutoff;  m.c = bg.c;  m.L = bg.circumference;
%!  m.circle = strcmp (bg.boundary, "circle");
%!  m.bl = bg.beta_L;  m.br = bg.beta_R;  m.alpha = bg.alpha;
%!  m.horizon = bg.horizon;  m.SBH = bg.S_BH;
%!endfunction

%!function bf_run (bg, kind, nsets)
%!  ## errors are collected and asserted once at the end (fast)
%!  m = bf_model (bg, kind);
%!  ncmp = 0;
%!  errS = errSc = errArc = errXY = 0;
%!  bad = {};
%!  for trial = 1:nsets
%!    n = merge (trial <= 2, 8, randi (8));   # n = 8 in every background
%!    [A, p, inA] = bf_random_region (n, m);
%!    [S, conf] = rt_entropy (bg, A);
%!    [Sb, cfg, gap] = bf_minimum (m, n, p, inA);
%!    sc = max (1, abs (Sb));
%!    errS = max (errS, abs (S - Sb) / sc);
%!    ## the entropy is what the configuration's own lengths add up to
%!    Sc = m.c / 6 * sum (bf_length (m, conf.arcs));
%!    if (conf.horizon)
%!      Sc += m.SBH;
%!    endif
%!    errSc = max (errSc, abs (Sc - S) / sc);
%!    if (conf.candidates != cfg.count || max (abs (conf.endpoints - p)) > 1e-12)
%!      bad{end+1} = sprintf ("set %d: candidates %g vs %g or endpoints differ", trial, conf.candidates, cfg.count);
%!    endif
%!    if (gap > 1e-8 * sc)
%!      ncmp++;
%!      if (! isequal (conf.pairs, cfg.pairs) || conf.horizon != cfg.horizon)
%!        bad{end+1} = sprintf ("set %d (n = %d): configuration differs", trial, n);
%!        continue;
%!      endif
%!      errArc = max (errArc, max (abs (conf.arcs - cfg.arcs)));
%!      errXY = max (errXY, max (max (abs (conf.pair_coords - reshape (p(cfg.pairs), size (cfg.pairs))))));
%!    endif
%!  endfor
%!  assert (bad, {});
%!  assert ([errS, errSc] < 1e-10);
%!  assert ([errArc, errXY] < 1e-10);
%!  assert (ncmp >= nsets / 2);
%!endfunction

%!test
%! rand ("seed", 11);
%! bf_run (ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6), "poincare", 40);

%!test
%! rand ("seed", 12);
%! bf_run (ads3_background ("thermal", "line", "beta", 1.7, "cutoff", 1e-6), "btz", 40);

%!test
%! rand ("seed", 13);
%! bf_run (ads3_background ("rotating", "line", "beta_L", 0.9, "beta_R", 2.6, "cutoff", 1e-6), "rotating", 40);

%!test
%! rand ("seed", 14);
%! bf_run (ads3_background ("vacuum", "circle", "c", 2, "circumference", 7, "cutoff", 1e-6), "global", 40);

%!test
%! rand ("seed", 15);
%! bf_run (ads3_background ("thermal", "circle", "beta", 9, "cutoff", 1e-6), "thermal_ads", 40);

%!test
%! rand ("seed", 16);
%! bg = ads3_background ("thermal", "circle", "beta", 1.3, "cutoff", 1e-6);
%! assert (bg.bulk, "btz");
%! bf_run (bg, "btz", 40);

%!test
%! ## a hot black hole: the horizon term is often part of the minimum
%! rand ("seed", 17);
%! bf_run (ads3_background ("thermal", "circle", "beta", 0.35, "c", 5, "cutoff", 1e-6), "btz", 40);

%!test
%! rand ("seed", 18);
%! bg = ads3_background ("rotating", "circle", "beta_L", 0.5, "beta_R", 1.4, "cutoff", 1e-6);
%! assert (bg.bulk, "rotating_btz");
%! bf_run (bg, "rotating", 40);

%!test
%! rand ("seed", 19);
%! bf_run (ads3_background ("heavy", "circle", "alpha", 0.45, "cutoff", 1e-6), "defect", 40);

%!test
%! rand ("seed", 20);
%! bf_run (ads3_background ("heavy", "circle", "alpha", 0.9, "circumference", 3, "cutoff", 1e-6), "defect", 40);

%!function S = plain_recurrence (m, p, inA)
%!  ## the recurrence of doc/rt_regions.md coded again, plainly, with this
%!  ## file's own lengths: endpoints over two turns, best run per cut
%!  N = numel (p);  n = N / 2;
%!  q = [p; p + m.L];
%!  T = Inf (2 * N + 1, n + 1);
%!  T(:, 1) = 0;
%!  for s = 2 * N:-1:1
%!    for k = 1:min (n, floor ((2 * N - s + 1) / 2))
%!      t = 0:k-1;
%!      v = bf_length (m, q(s + 2 * t + 1) - q(s))' + T(s + 1, t + 1) ...
%!          + T(sub2ind (size (T), s + 2 * t + 2, k - t));
%!      T(s, k + 1) = min (v);
%!    endfor
%!  endfor
%!  full = T(2:N+1, n + 1);        # cut in segment g = 1..N (g -> g+1)
%!  if (m.horizon)
%!    S = min (m.c / 6 * min (full(! inA)), m.c / 6 * min (full(inA)) + m.SBH);
%!  else
%!    S = m.c / 6 * min (full);
%!  endif
%!endfunction

%!test
%! ## Larger n (25 and 45) with a horizon or a defect, beyond reach of the
%! ## enumeration: the C programme against the recurrence coded plainly here.
%! rand ("seed", 21);
%! cases = {ads3_background("thermal", "circle", "beta", 0.4, "cutoff", 1e-6), "btz";
%!          ads3_background("rotating", "circle", "beta_L", 0.3, "beta_R", 0.8, "cutoff", 1e-6), "rotating";
%!          ads3_background("heavy", "circle", "alpha", 0.7, "cutoff", 1e-6), "defect"};
%! for ic = 1:rows (cases)
%!   m = bf_model (cases{ic,1}, cases{ic,2});
%!   for n = [25 45]
%!     [A, p, inA] = bf_random_region (n, m);
%!     assert (rt_entropy (cases{ic,1}, A), plain_recurrence (m, p, inA), 1e-10 * n);
%!   endfor
%! endfor
