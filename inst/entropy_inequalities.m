## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{rep} =} entropy_inequalities (@var{Svec})
## @deftypefnx {} {@var{rep} =} entropy_inequalities (@var{Svec}, @var{name}, @var{value}, @dots{})
## @deftypefnx {} {} entropy_inequalities (@dots{})
## Evaluate the entropy inequalities on an entropy vector.
##
## @var{Svec} is any real vector with 2^N - 1 entries, 1 <= N <= 16 (from
## @code{entropy_vector} or the user's own numbers): @code{Svec(k)} is the
## entropy of subset k, the parties whose bits are set in k (bit 0 =
## party 1), so @code{Svec(1)} = S(A1), @code{Svec(2)} = S(A2),
## @code{Svec(3)} = S(A1A2), @dots{}, @code{Svec(end)} = S(A1@dots{}AN).
## No purification is assumed: to test a pure state include its purifier
## as a party.
##
## Every instance is a choice of disjoint, non-empty unions of parties
## X, Y, Z, @dots{} in the inequality written lhs - rhs >= 0:
## @table @asis
## @item @code{sa} (subadditivity)
## S(X) + S(Y) >= S(XY)
## @item @code{al} (Araki-Lieb)
## S(XY) + S(Y) >= S(X)
## @item @code{ssa} (strong subadditivity)
## S(XY) + S(YZ) >= S(Y) + S(XYZ)
## @item @code{wm} (weak monotonicity)
## S(XY) + S(YZ) >= S(X) + S(Z)
## @item @code{mmi} (monogamy of mutual information)
## S(XY) + S(YZ) + S(XZ) >= S(X) + S(Y) + S(Z) + S(XYZ)
## @item @code{cyclic} (for m = 2k+1 regions X_1 @dots{} X_m, indices mod m)
## sum_i S(X_i | X_@{i+1@} @dots{} X_@{i+k@}) >= S(X_1 @dots{} X_m), i.e.
## sum_i S(X_i @dots{} X_@{i+k@}) >= sum_i S(X_@{i+1@} @dots{} X_@{i+k@}) + S(X_1 @dots{} X_m);
## m = 3 is MMI.  Present when N >= 3; m = 3, 5, @dots{} <= N.
## @end table
## Instances equal under the symmetry of their family are evaluated once:
## X <-> Y for sa; none for al; X <-> Z for ssa and wm; all permutations
## of X, Y, Z for mmi; rotations and reflections of the cycle for cyclic.
## For N <= 5 every instance is evaluated.  Above that sa and al are still
## complete, while ssa, wm, mmi and cyclic with m = 3 take the instances
## whose three regions are single parties plus those whose regions cover
## all N parties, and cyclic with m >= 5 takes m single parties in
## increasing index order plus the cuts of A1 @dots{} AN, in order, into m
## consecutive blocks.  The rules and counts are in
## @file{doc/entropy_inequalities.md}.
##
## Options:
## @table @asis
## @item @qcode{"tol"}
## an instance holds when lhs - rhs >= -tol (default
## 1e-10 * max (1, max (abs (Svec)))).
## @item @qcode{"names"}
## a cellstr of N party names used in the readable instances (default
## A1, A2, @dots{}).
## @item @qcode{"complete"}
## true to evaluate every instance also for N > 5 (refused with
## @code{holent:toobig} when it would mean more than 2^30 cases); false for
## the subset even when N <= 5.  Default N <= 5.
## @end table
##
## @var{rep} has fields @code{N}, @code{tol}, @code{holds} (every family
## holds) and one struct per family, @code{sa}, @code{al}, @code{ssa},
## @code{wm}, @code{mmi}, @code{cyclic}, each with @code{count} (instances
## evaluated), @code{violated} (how many have lhs - rhs < -tol),
## @code{undecided} (how many evaluated to NaN: counted neither as holding
## nor as violated; the values are computed on @var{Svec} scaled by a
## power of two, so entries near the double range do not overflow and this
## is 0 for every finite @var{Svec}), @code{holds} (logical: none violated
## and none undecided), @code{worst_value} (the smallest lhs - rhs; Inf
## when there is no instance; -Inf or Inf only when that value itself is
## beyond the double range), @code{worst_instance} (that
## inequality as text, e.g. @qcode{"S(A1A2) + S(A2A3) >= S(A2) + S(A1A2A3)"}),
## @code{worst_regions} (a cell of its regions as party index vectors, in
## the order X, Y, Z, @dots{}) and @code{complete} (every instance was
## evaluated).  @code{cyclic} also has @code{by_size}, a struct array with
## the same fields and @code{m} for each number of regions m.
##
## Called without an output, a summary table is printed instead.
##
## @seealso{entropy_vector, rt_entropy}
## @end deftypefn

function rep = entropy_inequalities (Svec, varargin)
  fn = "entropy_inequalities";
  if (nargin < 1)
    print_usage ();
  endif
  Svec = __holent_array__ (fn, "SVEC", Svec);
  if (! isvector (Svec))
    error ("holent:size", "%s: SVEC must be a vector, got a %s array", fn,
           sprintf ("%dx", size (Svec))(1:end-1));
  endif
  N = log2 (numel (Svec) + 1);
  if (N != round (N) || N < 1 || N > 16)
    error ("holent:size", "%s: SVEC must have 2^N - 1 entries with N = 1 .. 16, got %d",
           fn, numel (Svec));
  endif
  o = __holent_opts__ (fn, {"tol", "names", "complete"}, varargin);
  if (isfield (o, "tol"))
    tol = __holent_scalar__ (fn, "tol", o.tol, "nonnegative");
  else
    tol = 1e-10 * max (1, max (abs (Svec)));
  endif
  names = arrayfun (@(j) sprintf ("A%d", j), 1:N, "uniformoutput", false);
  if (isfield (o, "names"))
    names = o.names;
    if (! iscellstr (names) || numel (names) != N
        || any (cellfun (@(s) isempty (s) || ! isrow (s), names)))
      error ("holent:option", "%s: 'names' must be a cellstr of N = %d non-empty names",
             fn, N);
    endif
  endif
  complete = N <= 5;
  if (isfield (o, "complete"))
    c = o.complete;
    if (! ((islogical (c) || isnumeric (c)) && isscalar (c) && isreal (c)
           && (c == 0 || c == 1)))
      error ("holent:option", "%s: 'complete' must be true or false", fn);
    endif
    complete = logical (full (c));
  endif

  r.N = N;
  r.tol = tol;
  fams = {"sa", "al", "ssa", "wm", "mmi"};
  for f = 1:numel (fams)
    r.(fams{f}) = one_family (Svec, fams{f}, 0, complete, tol, names);
  endfor
  if (N >= 3)
    ms = 3:2:N;
    for j = 1:numel (ms)
      b = one_family (Svec, "cyclic", ms(j), complete, tol, names);
      b.m = ms(j);
      bs(j) = b;
    endfor
    cy = bs(1);
    cy.count = sum ([bs.count]);
    cy.violated = sum ([bs.violated]);
    cy.undecided = sum ([bs.undecided]);
    cy.holds = all ([bs.holds]);
    cy.complete = all ([bs.complete]);
    [~, jw] = min ([bs.worst_value]);
    for fld = {"worst_value", "worst_instance", "worst_regions"}
      cy.(fld{1}) = bs(jw).(fld{1});
    endfor
    cy = rmfield (cy, "m");
    cy.by_size = bs;
    r.cyclic = cy;
    fams{end+1} = "cyclic";
  endif
  r.holds = all (cellfun (@(f) r.(f).holds, fams));

  if (nargout > 0)
    rep = r;
  else
    print_summary (r, fams, complete);
  endif
endfunction

function s = one_family (Svec, fam, m, complete, tol, names)
  [cnt, viol, worst, masks, und] = __holent_ineq__ ("eval", "entropy_inequalities", Svec, fam, m, double (complete), tol);
  s.count = cnt;
  s.violated = viol;
  s.undecided = und;
  s.holds = viol == 0 && und == 0;
  s.worst_value = worst;
  regs = arrayfun (@(x) find (bitget (x, 1:numel (names))), masks,
                   "uniformoutput", false);
  s.worst_regions = regs;
  if (isempty (regs))
    s.worst_instance = "";
  else
    s.worst_instance = instance_text (fam, regs, names);
  endif
  s.complete = complete || any (strcmp (fam, {"sa", "al"}));
endfunction

## The inequality as text, lhs >= rhs.
function t = instance_text (fam, regs, names)
  u = @(varargin) ["S(" strjoin(names(unique ([varargin{:}])), "") ")"];
  switch (fam)
    case "sa"
      [X, Y] = regs{:};
      lhs = {u(X), u(Y)};  rhs = {u(X, Y)};
    case "al"
      [X, Y] = regs{:};
      lhs = {u(X, Y), u(Y)};  rhs = {u(X)};
    case "ssa"
      [X, Y, Z] = regs{:};
      lhs = {u(X, Y), u(Y, Z)};  rhs = {u(Y), u(X, Y, Z)};
    case "wm"
      [X, Y, Z] = regs{:};
      lhs = {u(X, Y), u(Y, Z)};  rhs = {u(X), u(Z)};
    case "mmi"
      [X, Y, Z] = regs{:};
      lhs = {u(X, Y), u(Y, Z), u(X, Z)};  rhs = {u(X), u(Y), u(Z), u(X, Y, Z)};
    case "cyclic"
      m = numel (regs);
      k = (m - 1) / 2;
      lhs = rhs = cell (1, m);
      for i = 0:m-1
        lhs{i+1} = u(regs{mod (i + (0:k), m) + 1});
        rhs{i+1} = u(regs{mod (i + (1:k), m) + 1});
      endfor
      rhs{end+1} = u(regs{:});
  endswitch
  t = [strjoin(lhs, " + ") " >= " strjoin(rhs, " + ")];
endfunction

function print_summary (r, fams, complete)
  label = struct ("sa", "subadditivity", "al", "Araki-Lieb",
                  "ssa", "strong subadditivity", "wm", "weak monotonicity",
                  "mmi", "MMI", "cyclic", "cyclic");
  if (complete)
    what = "every instance";
  else
    what = "documented subset for the families marked *";
  endif
  printf ("entropy inequalities on N = %d parties (tol %.3g; %s)\n", r.N, r.tol, what);
  printf ("  %-22s %10s %9s %12s  %-5s  %s\n", "family", "instances", "violated",
          "worst", "holds", "worst instance (lhs >= rhs)");
  for f = 1:numel (fams)
    s = r.(fams{f});
    nm = label.(fams{f});
    if (strcmp (fams{f}, "cyclic"))
      nm = sprintf ("cyclic (m = %s)", strjoin (arrayfun (@num2str, [s.by_size.m],
                                                          "uniformoutput", false), ","));
    endif
    if (! s.complete)
      nm = [nm "*"];
    endif
    yn = {"no", "yes"}{s.holds + 1};
    printf ("  %-22s %10d %9d %12.5g  %-5s  %s\n", nm, s.count, s.violated,
            s.worst_value, yn, s.worst_instance);
  endfor
endfunction

%!function S = ghz_vector ()
%! ## 4-party GHZ-type vector: S = log 2 on every non-empty proper subset of
%! ## the four parties, S(ABCD) = 0 (a pure state).
%! S = log (2) * ones (15, 1);
%! S(15) = 0;
%!endfunction

%!function S = qstate_vector (rho, n)
%! ## von Neumann entropies of every subset of n qubits of rho (2^n x 2^n),
%! ## by partial trace and eig: an independent quantum entropy vector.
%! S = zeros (2^n - 1, 1);
%! for k = 1:2^n-1
%!   keep = find (bitget (k, 1:n));
%!   r = ptrace_keep (rho, n, keep);
%!   e = eig ((r + r') / 2);
%!   e = e(e > 1e-15);
%!   S(k) = -sum (e .* log (e));
%! endfor
%!endfunction

%!function r = ptrace_keep (rho, n, keep)
%! ## qubit j is the j-th tensor factor counted from the least significant
%! ## bit of the basis index, so party j <-> bit j-1 as in the vector.
%! d = 2 * ones (1, n);
%! T = reshape (rho, [d d]);      # indices (i_1..i_n, j_1..j_n), i_1 fastest
%! tr = setdiff (1:n, keep);
%! T = permute (T, [keep, n + keep, tr, n + tr]);
%! dk = 2^numel (keep);  dt = 2^numel (tr);
%! T = reshape (T, dk, dk, dt, dt);
%! r = zeros (dk);
%! for a = 1:dt
%!   r += T(:, :, a, a);
%! endfor
%!endfunction

%!function [cnt, worst] = brute_family (S, N, fam, m)
%! ## Independent enumeration: every way of giving each party to one of
%! ## the t regions or to none, keeping those with no region empty, then
%! ## one key per symmetry orbit with unique ().
%! switch (fam)
%!   case {"sa", "al"}, t = 2;
%!   case {"ssa", "wm", "mmi"}, t = 3;
%!   otherwise, t = m;
%! endswitch
%! lab = mod (floor ((0:(t+1)^N-1)' ./ (t+1).^(0:N-1)), t + 1);
%! T = zeros (rows (lab), t);
%! for a = 1:t
%!   T(:, a) = (lab == a) * 2.^(0:N-1)';
%! endfor
%! T = T(all (T > 0, 2), :);
%! v = zeros (rows (T), 1);
%! s = @(x) S(x);
%! for i = 1:rows (T)
%!   r = T(i, :);
%!   switch (fam)
%!     case "sa",  v(i) = s(r(1)) + s(r(2)) - s(bitor (r(1), r(2)));
%!     case "al",  v(i) = s(bitor (r(1), r(2))) - s(r(1)) + s(r(2));
%!     case "ssa", v(i) = s(bitor (r(1), r(2))) + s(bitor (r(2), r(3))) - s(r(2)) - s(bitor (r(1), bitor (r(2), r(3))));
%!     case "wm",  v(i) = s(bitor (r(1), r(2))) + s(bitor (r(2), r(3))) - s(r(1)) - s(r(3));
%!     case "mmi", v(i) = s(bitor (r(1), r(2))) + s(bitor (r(2), r(3))) + s(bitor (r(1), r(3))) ...
%!                        - s(r(1)) - s(r(2)) - s(r(3)) - s(bitor (r(1), bitor (r(2), r(3))));
%!     otherwise
%!       k = (t - 1) / 2;  all = 0;  v(i) = 0;
%!       for j = 0:t-1
%!         b1 = 0;  b0 = 0;
%!         for q = 0:k,   b1 = bitor (b1, r(mod (j + q, t) + 1)); endfor
%!         for q = 0:k-1, b0 = bitor (b0, r(mod (j + q, t) + 1)); endfor
%!         v(i) += s(b1) - s(b0);
%!         all = bitor (all, r(j+1));
%!       endfor
%!       v(i) -= s(all);
%!   endswitch
%! endfor
%! switch (fam)
%!   case "sa", K = sort (T, 2);
%!   case "al", K = T;
%!   case {"ssa", "wm"}, K = [min(T(:,1), T(:,3)), T(:,2), max(T(:,1), T(:,3))];
%!   case "mmi", K = sort (T, 2);
%!   otherwise
%!     ## dihedral orbit key: the smallest of the 2t rotated/reflected rows
%!     K = T;
%!     for sh = 0:t-1
%!       for refl = [false true]
%!         p = mod ((0:t-1) + sh, t) + 1;
%!         if (refl), p = fliplr (p); endif
%!         P = T(:, p);
%!         for i = 1:rows (T)
%!           d = find (P(i, :) != K(i, :), 1);
%!           if (! isempty (d) && P(i, d) < K(i, d)), K(i, :) = P(i, :); endif
%!         endfor
%!       endfor
%!     endfor
%! endswitch
%! cnt = rows (unique (K, "rows"));
%! worst = min ([v; Inf]);
%!endfunction

%!test
%! ## The 4-party GHZ state violates MMI: I3 = -log 2 on three of the four
%! ## parties (Hayden, Headrick and Maloney 2011, arXiv:1107.2940, from
%! ## memory), while being a quantum state it obeys SA, AL, SSA and WM
%! ## (Lieb and Ruskai 1973, J. Math. Phys. 14, 1938 for SSA).
%! S = ghz_vector ();
%! ## the hand-made vector is that of the state (|0000> + |1111>)/sqrt 2
%! psi = zeros (16, 1);  psi([1 16]) = 1 / sqrt (2);
%! assert (qstate_vector (psi * psi', 4), S, 1e-12);
%! rep = entropy_inequalities (S);
%! assert (! rep.mmi.holds);
%! assert (! rep.holds);
%! assert (rep.mmi.worst_value, -log (2), 1e-14);
%! assert (rep.mmi.violated, 4);
%! assert (cellfun (@numel, rep.mmi.worst_regions), [1 1 1]);
%! assert (rep.mmi.worst_instance, "S(A1A2) + S(A2A3) + S(A1A3) >= S(A1) + S(A2) + S(A3) + S(A1A2A3)");
%! assert ([rep.sa.holds, rep.al.holds, rep.ssa.holds, rep.wm.holds], true (1, 4));
%! ## the cyclic family with m = 3 is MMI
%! assert (! rep.cyclic.holds);
%! assert (rep.cyclic.by_size(1).worst_value, -log (2), 1e-14);
%! ## the same three parties alone (GHZ reduced to ABC, a mixed state)
%! rep3 = entropy_inequalities (log (2) * ones (7, 1));
%! assert (rep3.mmi.count, 1);
%! assert (rep3.mmi.worst_value, -log (2), 1e-14);

%!test
%! ## Quantum entropy vectors from random density matrices (eig of partial
%! ## traces): SA, AL, SSA and WM hold for every quantum state (Araki and Lieb
%! ## 1970, Commun. Math. Phys. 18, 160; Lieb and Ruskai 1973); MMI may fail.
%! ## Every family's worst value and count agree with brute_family.
%! ## A Bell pair (common practice): S(A1) = S(A2) = log 2, S(A1A2) = 0,
%! ## saturating Araki-Lieb; with a third, unentangled qubit in a mixed
%! ## state of entropy h the vector is checked family by family.
%! bell = [1; 0; 0; 1] / sqrt (2);
%! S = qstate_vector (bell * bell', 2);
%! assert (S, [log(2); log(2); 0], 1e-12);
%! rep = entropy_inequalities (S);
%! assert (rep.holds);
%! assert ([rep.sa.worst_value, rep.al.worst_value], [2*log(2), 0], 1e-12);
%! rho3 = kron (diag ([0.8 0.2]), bell * bell');   # qubit 3 is the slow index
%! S = qstate_vector (rho3, 3);
%! h = -0.8 * log (0.8) - 0.2 * log (0.2);
%! assert (S, [log(2); log(2); 0; h; log(2)+h; log(2)+h; h], 1e-12);
%! rep = entropy_inequalities (S);
%! assert ([rep.sa.holds, rep.al.holds, rep.ssa.holds, rep.wm.holds, rep.mmi.holds], true (1, 5));
%! assert (rep.sa.worst_value, 0, 1e-12);      # S(A1A2) + S(A3) = S(A1A2A3)
%! assert (rep.mmi.worst_value, 0, 1e-12);     # I3 = 0 for a product with A3
%! randn ("state", 7);  rand ("state", 7);
%! for trial = 1:3
%!   G = randn (8, 3) + 1i * randn (8, 3);         # rank-3 mixed state, 3 qubits
%!   rho = G * G';  rho /= trace (rho);
%!   S3 = qstate_vector (rho, 3);
%!   psi = randn (16, 1) + 1i * randn (16, 1);     # pure state, 4 qubits
%!   S4 = qstate_vector (psi * psi' / (psi' * psi), 4);
%!   for SS = {S3, S4}
%!     S = SS{1};  N = log2 (numel (S) + 1);
%!     rep = entropy_inequalities (S);
%!     assert ([rep.sa.holds, rep.al.holds, rep.ssa.holds, rep.wm.holds], true (1, 4));
%!     for f = {"sa", "al", "ssa", "wm", "mmi"}
%!       [c, w] = brute_family (S, N, f{1}, 0);
%!       assert (rep.(f{1}).count, c);
%!       assert (rep.(f{1}).worst_value, w, 1e-13);
%!     endfor
%!   endfor
%!   ## a pure state: S(X) = S(X^c) and AL saturates on X = complement of Y
%!   assert (S4(1), S4(14), 1e-10);
%!   assert (rep.al.worst_value, 0, 1e-10);
%! endfor

%!test
%! ## Instance counts for N = 2, 3 (and 4) against brute_family, an
%! ## enumeration of all tuples reduced by the symmetries with unique ().
%! rand ("state", 3);
%! for N = 2:4
%!   S = rand (2^N - 1, 1) .* sum (dec2bin (1:2^N-1) == "1", 2);
%!   rep = entropy_inequalities (S);
%!   for f = {"sa", "al", "ssa", "wm", "mmi"}
%!     [c, w] = brute_family (S, N, f{1}, 0);
%!     assert (rep.(f{1}).count, c);
%!     assert (rep.(f{1}).worst_value, w, 1e-13);
%!     assert (rep.(f{1}).complete);
%!   endfor
%!   if (N >= 3)
%!     [c, w] = brute_family (S, N, "cyclic", 3);
%!     assert (rep.cyclic.count, c);
%!     assert (rep.cyclic.worst_value, w, 1e-13);
%!   else
%!     assert (! isfield (rep, "cyclic"));
%!   endif
%! endfor
%! ## the closed counts of doc/entropy_inequalities.md: N = 2 and N = 3
%! r2 = entropy_inequalities (rand (3, 1));
%! assert ([r2.sa.count, r2.al.count, r2.ssa.count, r2.wm.count, r2.mmi.count], [1 2 0 0 0]);
%! r3 = entropy_inequalities (rand (7, 1));
%! assert ([r3.sa.count, r3.al.count, r3.ssa.count, r3.wm.count, r3.mmi.count, r3.cyclic.count],
%!         [6 12 3 3 1 1]);
%! assert (isinf (r2.ssa.worst_value) && r2.ssa.holds && isempty (r2.ssa.worst_regions));

%!test
%! ## Cyclic family, Bao, Nezami, Ooguri, Stoica, Sully and Walter 2015
%! ## (JHEP 09 (2015) 130), in the form sum_i S(A_i | A_{i+1}..A_{i+k}) >=
%! ## S(A_1..A_{2k+1}).  k = 1 reduces to MMI: same instances, same values.
%! rand ("state", 11);
%! for N = 3:5
%!   S = rand (2^N - 1, 1) .* sum (dec2bin (1:2^N-1) == "1", 2) - 0.2;
%!   rep = entropy_inequalities (S);
%!   assert (rep.cyclic.by_size(1).m, 3);
%!   assert (rep.cyclic.by_size(1).count, rep.mmi.count);
%!   assert (rep.cyclic.by_size(1).violated, rep.mmi.violated);
%!   assert (rep.cyclic.by_size(1).worst_value, rep.mmi.worst_value, 1e-13);
%! endfor
%! ## m = 5 on five parties: 5!/10 = 12 cyclic orders, against brute_family
%! [c, w] = brute_family (S, 5, "cyclic", 5);
%! assert (c, 12);
%! assert (rep.cyclic.by_size(2).count, 12);
%! assert (rep.cyclic.by_size(2).worst_value, w, 1e-13);
%! assert (rep.cyclic.count, 12 + rep.mmi.count);
%! ## the text of an instance: 3-blocks >= 2-blocks + all
%! t = rep.cyclic.by_size(2).worst_instance;
%! assert (numel (strfind (t, "+")), 4 + 5);
%! assert (! isempty (regexp (t, '^S\(A\d+A\d+A\d+\) \+ ')));

%!test
%! ## Which cyclic form is right.  Five equal arcs tiling the boundary
%! ## circle of global AdS3 exactly (a pure state): S of j consecutive arcs
%! ## is the single-interval formula for length jL/5 (Calabrese and Cardy
%! ## 2004), so S(1 arc) = S(4 arcs) = s1 < S(2) = S(3) = s2, S(all) = 0.
%! ## The form used here, sum (3-blocks) - sum (2-blocks) - S(all) =
%! ## 5 s2 - 5 s2 = 0, saturates; the form sum_i S(A_i A_{i+1} | A_{i+2}
%! ## A_{i+3}) >= S(all) (4-blocks minus 2-blocks) would give 5 (s1 - s2) < 0
%! ## for a holographic state, so it is not a holographic inequality.
%! bg = ads3_background ("vacuum", "circle");
%! s = interval_entropy (bg, (1:4) * 2 * pi / 5);
%! ours = 5 * s(3) - 5 * s(2) - 0;
%! other = 5 * s(4) - 5 * s(2) - 0;
%! assert (ours, 0, 1e-12);
%! assert (other, -(5/3) * log (sin (2*pi/5) / sin (pi/5)), 1e-12);

%!test
%! ## N = 16: sa and al complete, the others the documented subset, counts
%! ## against the closed forms (derived in doc/entropy_inequalities.md),
%! ## in well under a few seconds.
%! N = 16;
%! S = sum (dec2bin (1:2^N-1) == "1", 2);    # additive: every family holds
%! t0 = tic ();
%! rep = entropy_inequalities (S);
%! assert (toc (t0) < 20);
%! pairs = 3^N - 2 * 2^N + 1;               # ordered pairs of disjoint non-empty sets
%! cover = 3^N - 3 * 2^N + 3;               # ordered covering triples
%! assert (rep.sa.count, pairs / 2);
%! assert (rep.al.count, pairs);
%! assert (rep.ssa.count, (N * (N-1) * (N-2) + cover) / 2);
%! assert (rep.mmi.count, (N * (N-1) * (N-2) + cover) / 6);
%! ms = 5:2:N;
%! cyc = arrayfun (@(m) nchoosek (N, m) + nchoosek (N-1, m-1) - (m == N), ms);
%! assert ([rep.cyclic.by_size.count], [rep.mmi.count, cyc]);
%! assert (rep.holds);
%! assert (! rep.mmi.complete && rep.sa.complete);
%! ## additive entropies saturate SA, SSA, MMI and every cyclic instance
%! assert ([rep.sa.worst_value, rep.ssa.worst_value, rep.mmi.worst_value, rep.cyclic.worst_value], [0 0 0 0]);

%!test
%! ## complete on request above N = 5, matching brute_family for N = 6
%! rand ("state", 5);
%! S = rand (63, 1) * 3;
%! rep = entropy_inequalities (S, "complete", true, "tol", 0.1);
%! [c, w] = brute_family (S, 6, "mmi", 0);
%! assert ([rep.mmi.count, rep.mmi.worst_value], [c, w], 1e-12);
%! assert (rep.tol, 0.1);
%! rep0 = entropy_inequalities (S(1:31), "complete", false);
%! assert (rep0.mmi.count, 5 * 4 * 3 / 6 + (3^5 - 3 * 2^5 + 3) / 6);
%! assert (! rep0.mmi.complete);

%!test
%! ## names, the printed summary
%! S = ghz_vector ();
%! rep = entropy_inequalities (S, "names", {"A", "B", "C", "O"});
%! assert (rep.mmi.worst_instance, "S(AB) + S(BC) + S(AC) >= S(A) + S(B) + S(C) + S(ABC)");
%! out = evalc ("entropy_inequalities (S)");
%! assert (! isempty (strfind (out, "MMI")));
%! assert (! isempty (regexp (out, 'MMI\s+10\s+4\s+-0.693')));
%! assert (! isempty (strfind (out, "every instance")));

%!test
%! ## Entries near the double range (regression): with S = a on every
%! ## subset of three parties MMI = 3a - 3a - a = -a by hand; the unscaled
%! ## sum 3e308 used to overflow to Inf and count as holding.
%! rep = entropy_inequalities (1e308 * ones (7, 1));
%! assert (rep.mmi.worst_value, -1e308, 1e293);
%! assert (! rep.mmi.holds && rep.mmi.violated == 1 && rep.mmi.undecided == 0);
%! assert (! rep.cyclic.holds && ! rep.holds);
%! ## mixed signs near the range, where the cyclic sum used to meet
%! ## Inf - Inf = NaN: the values agree with brute_family on the vector
%! ## scaled by 2^-1000 (exact), and no instance is undecided
%! S = 8e307 * (-1) .^ (1:31)' .* (1 + (1:31)' / 31);
%! rep = entropy_inequalities (S);
%! [c, w] = brute_family (S * 2^-1000, 5, "cyclic", 5);
%! assert (rep.cyclic.by_size(2).count, c);
%! assert (rep.cyclic.by_size(2).worst_value * 2^-1000, w, 1e-12 * abs (w));
%! assert (rep.cyclic.undecided, 0);
%! [~, w] = brute_family (S * 2^-1000, 5, "mmi", 0);
%! assert (rep.mmi.worst_value * 2^-1000, w, 1e-12 * abs (w));

%!error <Invalid call> entropy_inequalities ()
%!error <2\^N - 1 entries> entropy_inequalities ([1 2])
%!error <2\^N - 1 entries> entropy_inequalities (zeros (0, 1))
%!error <2\^N - 1 entries> entropy_inequalities (ones (2^17 - 1, 1))
%!error <must be a vector> entropy_inequalities (ones (3, 3))
%!error <NaN> entropy_inequalities ([1 NaN 1])
%!error <finite> entropy_inequalities ([1 Inf 1])
%!error <complex> entropy_inequalities ([1 1i 1])
%!error <numeric> entropy_inequalities ({1, 2, 3})
%!error <numeric> entropy_inequalities (true (3, 1))
%!error <unknown option> entropy_inequalities ([1 1 1], "tolerance", 1)
%!error <nonnegative> entropy_inequalities ([1 1 1], "tol", -1)
%!error <names> entropy_inequalities ([1 1 1], "names", {"A"})
%!error <names> entropy_inequalities ([1 1 1], "names", {"A", ""})
%!error <true or false> entropy_inequalities ([1 1 1], "complete", "yes")
%!error <exceeds> entropy_inequalities (ones (2^16 - 1, 1), "complete", true)
%!error <'complete' must be true or false> entropy_inequalities ([1 1 1], "complete", 2)
