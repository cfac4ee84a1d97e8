## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{Svec} =} entropy_vector (@var{bg}, @var{parties})
## @deftypefnx {} {[@var{Svec}, @var{masks}] =} entropy_vector (@var{bg}, @var{parties}, @qcode{"purifier"}, @var{tf})
## Holographic entropy vector of N disjoint boundary regions: the RT
## entropies of all 2^N - 1 unions of them.
##
## @var{bg} is a background from @code{ads3_background}; @var{parties} a
## cell array of N regions (1 <= N <= 16), each an n x 2 matrix of
## intervals @code{[start, end]} as for @code{rt_entropy}.  Parties must be
## disjoint from each other (touching is allowed; overlapping raises
## @code{holent:overlap} naming the two parties).
##
## @var{Svec} is a column of 2^N - 1 entropies: @code{Svec(k)} is the
## entropy of the union of the parties whose bits are set in k (bit 0 =
## party 1), computed by @code{rt_entropy} with the same minimisation over
## every RT candidate.  An error in one party names it
## (@qcode{"PARTIES@{2@}"}), an overlap of two parties names both rows.
## @var{masks} is the (2^N - 1) x N logical matrix
## with @code{masks(k, j)} true when party j is in subset k, i.e.
## @code{bitget (k, j)}.
##
## Option @qcode{"purifier"} (default false): when true a party N + 1, the
## purifier O, is appended so that the N + 1 parties are in a pure state,
## using S(X u O) = S(P \ X) for every subset X of the N parties P (and
## S(O) = S(P)); N <= 15 then.  For a pure state (@code{bg.pure}: the
## vacuum, the conical defect) O is the boundary complement of the parties.
## For a state with a horizon (planar, static or rotating BTZ) the thermal
## state is mixed and its purifier is not a boundary region: O is then the
## boundary complement together with the second asymptotic boundary of the
## two-sided black hole (the thermofield double), whose RT surfaces are
## those of @code{rt_entropy} with the horizon.  For thermal AdS (mixed,
## no horizon) the purifier is refused (@code{holent:mixed}).
##
## The cost is 2^N - 1 calls of the RT minimiser on unions of up to all
## the intervals.  See @file{doc/entropy_inequalities.md} for the ordering.
##
## Time (@file{doc/hrt_time.md}): parties may be n x 4 matrices
## @code{[start, end, t_start, t_end]} (a time per endpoint), or, on a
## thermofield double, structs with fields @code{left} and @code{right};
## on the time-dependent states (@code{ads3_background ("tfd", @dots{})},
## @code{("quench", @dots{})}) the option @qcode{"t"} (scalar or vector)
## shifts every time, or is the time after the quench, and @var{Svec} has
## one column per time.  Unions stack the rows (of each side); the
## purifier is not available on this path.
##
## @seealso{entropy_inequalities, rt_entropy, mutual_information}
## @end deftypefn

function [Svec, masks] = entropy_vector (bg, parties, varargin)
  fn = "entropy_vector";
  if (nargin < 2)
    print_usage ();
  endif
  if (iscell (parties) && (__holent_time_entropy__ ("timed", bg, parties)
                           || any (strcmp (varargin(1:2:end), "t"))))
    ## parties with endpoint times, time-dependent states (issue 12)
    [Svec, masks] = __holent_time_unions__ ("vector", fn, bg, parties, varargin);
    return;
  endif
  if (! iscell (parties) || isempty (parties))
    error ("holent:type", "%s: PARTIES must be a non-empty cell array of regions (n x 2 matrices)", fn);
  endif
  o = __holent_opts__ (fn, {"purifier"}, varargin);
  purifier = false;
  if (isfield (o, "purifier"))
    p = o.purifier;
    if (! ((islogical (p) || isnumeric (p)) && isscalar (p) && isreal (p)
           && (p == 0 || p == 1)))
      error ("holent:option", "%s: 'purifier' must be true or false", fn);
    endif
    purifier = logical (full (p));
  endif
  N = numel (parties);
  Nmax = 16 - purifier;
  if (N > Nmax)
    error ("holent:toobig", "%s: at most %d parties%s, got %d", fn, Nmax,
           merge (purifier, " besides the purifier", ""), N);
  endif
  parties = parties(:).';
  for j = 1:N
    a = parties{j};
    if (! isnumeric (a) || islogical (a) || ! isreal (a))
      error ("holent:type", "%s: party %d must be a real n x 2 matrix of intervals (PARTIES{%d}), got %s",
             fn, j, j, class (a));
    endif
    if (isempty (a) || ndims (a) != 2 || columns (a) != 2)
      error ("holent:type", "%s: party %d must be a non-empty n x 2 matrix of intervals (PARTIES{%d}), got %s",
             fn, j, j, sprintf ("%dx", size (a))(1:end-1));
    endif
    parties{j} = full (double (a));
  endfor

  ## Each party alone first (the core names it, PARTIES{j}), then the
  ## parties for disjointness (naming the two rows that meet).
  [S1, nshort] = __holent_rt__ ("entropy", fn, "PARTIES", bg, parties);
  ## BG is read only now, after its gateway checked it
  if (purifier && ! bg.pure && ! bg.horizon)
    error ("holent:mixed",
           ["%s: BG (%s) is a mixed state without a horizon: its purifier is " ...
            "not a boundary region and has no RT surface here; the purifier " ...
            "is available for pure states and, as the thermofield double, " ...
            "for backgrounds with a horizon"], fn, bg.bulk);
  endif
  if (N > 1)
    names = arrayfun (@(j) sprintf ("PARTIES{%d}", j), 1:N, "uniformoutput", false);
    __holent_rt__ ("parties", fn, names(:), false (N, 1), bg.circumference, parties(:));
  endif

  ## Unions: subset 2^(j-1) + r (r < 2^(j-1)) is subset r plus party j.
  M = 2^N - 1;
  U = cell (M, 1);
  for j = 1:N
    h = 2^(j-1);
    U{h} = parties{j};
    if (j > 1)
      pj = parties{j};
      U(h+1:2*h-1) = cellfun (@(u) [u; pj], U(1:h-1), "uniformoutput", false);
    endif
  endfor
  single = (2 .^ (0:N-1))';
  multi = true (M, 1);
  multi(single) = false;
  Svec = zeros (M, 1);
  Svec(single) = S1(:);
  ## In blocks, to bound the memory held by one call.
  idx = find (multi);
  blk = 4096;
  for b = 1:blk:numel (idx)
    sel = idx(b:min (b + blk - 1, numel (idx)));
    [Svec(sel), ns] = __holent_rt__ ("entropy", fn, "a union of the parties", bg, U(sel));
    nshort += ns;
  endfor
  if (nshort > 0)
    warning ("holent:cutoff",
             "%s: some interval or gap is not longer than twice the cutoff %g",
             fn, bg.cutoff);
  endif

  if (purifier)
    ## S(X u O) = S(P \ X) (purity of the global state), S(O) = S(P).
    comp = M - (0:M)';           # P \ X for X = 0 .. M
    S0 = [0; Svec];              # S0(k + 1) = S(subset k), S(empty) = 0
    Svec = [Svec; S0(comp + 1)];
    N += 1;
    M = 2^N - 1;
  endif
  if (nargout > 1)
    masks = logical (mod (floor ((1:M)' ./ 2.^(0:N-1)), 2));
  endif
endfunction


%!function S = two_intervals (bg, a, b)
%! ## Two disjoint intervals a = [a1 a2], b = [b1 b2] on a line with a < b:
%! ## the smaller of the disconnected and the connected surface (Headrick
%! ## 2010, Phys. Rev. D 82, 126010), from the single-interval formula.
%! S = min (interval_entropy (bg, diff (a)) + interval_entropy (bg, diff (b)),
%!          interval_entropy (bg, b(2) - a(1)) + interval_entropy (bg, b(1) - a(2)));
%!endfunction


%!function A = random_parties (N, L, circle)
%! ## N disjoint parties of 1 to 3 intervals each: 2m + 1 sorted random
%! ## points of [0, L) (the last one only keeps a gap before the first), the
%! ## consecutive pairs are the intervals, dealt to the parties at random;
%! ## on a circle everything is rotated at random, so one may wrap.
%! nint = randi (3, 1, N);
%! m = sum (nint);
%! do
%!   x = sort (rand (1, 2 * m + 1)) * L;
%! until (all (diff (x) > 2e-3 * L))
%! I = [x(1:2:2*m)', x(2:2:2*m)'];
%! if (circle)
%!   len = I(:,2) - I(:,1);
%!   I(:,1) = mod (I(:,1) + rand () * L, L);
%!   I(:,2) = I(:,1) + len;
%! endif
%! owner = repelem (1:N, nint);
%! owner = owner(randperm (m));
%! A = arrayfun (@(j) I(owner == j, :), 1:N, "uniformoutput", false);
%!endfunction

%!test
%! ## Ordering and masks; one- and two-interval entries against the
%! ## single-interval formula (Calabrese and Cardy 2004) and the two-interval
%! ## phases (Headrick 2010).
%! bg = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);
%! P = {[0 1], [1.2 2], [5 7]};
%! [S, masks] = entropy_vector (bg, P);
%! assert (size (S), [7 1]);
%! assert (masks, logical ([1 0 0; 0 1 0; 1 1 0; 0 0 1; 1 0 1; 0 1 1; 1 1 1]));
%! assert (S([1 2 4]), interval_entropy (bg, [1; 0.8; 2]), 1e-12);
%! assert (S(3), two_intervals (bg, P{1}, P{2}), 1e-12);
%! assert (S(5), two_intervals (bg, P{1}, P{3}), 1e-12);
%! assert (S(6), two_intervals (bg, P{2}, P{3}), 1e-12);
%! ## the connected phase wins for A1A2 (cross-ratio above 1/2), not for A1A3
%! assert (S(3) < S(1) + S(2));
%! assert (S(5), S(1) + S(4), 1e-12);
%! assert (S(7), rt_entropy (bg, vertcat (P{:})), 1e-12);

%!test
%! ## Parties with endpoint times: every entry is the HRT entropy of that
%! ## union (rt_entropy of the stacked rows); equal times give the static
%! ## vector; a quench gives one column per time.
%! bg = ads3_background ("thermal", "line", "beta", 1, "c", 3);
%! P = {[0 1 0 0.2], [1.5 2 0.1 0], [3 4.5 0 0]};
%! [S, masks] = entropy_vector (bg, P);
%! assert (size (masks), [7 3]);
%! for k = 1:7
%!   assert (S(k), rt_entropy (bg, vertcat (P{masks(k,:)})), 1e-12);
%! endfor
%! P0 = cellfun (@(p) [p(:,1:2), 0.3 * ones(rows (p), 2)], P, "uniformoutput", false);
%! assert (entropy_vector (bg, P0), entropy_vector (bg, cellfun (@(p) p(:,1:2), P, "uniformoutput", false)), 1e-12);
%! q = ads3_background ("quench", "line", "beta", 1);
%! S = entropy_vector (q, {[0 1], [1.2 2]}, "t", [-1 0.3 9]);
%! assert (size (S), [3 3]);
%! assert (S(:,1), entropy_vector (ads3_background ("vacuum", "line"), {[0 1], [1.2 2]}), 1e-12);
%! assert (S(:,3), entropy_vector (ads3_background ("thermal", "line", "beta", 1), {[0 1], [1.2 2]}), 1e-12);
%! assert (entropy_inequalities (S(:,2)).holds);
%!error <entropy_vector: the union of PARTIES\{1\} and PARTIES\{2\}(\(\d\))?: .*overlap> entropy_vector (ads3_background ("vacuum", "line"), {[0 1 0 0], [0.5 2 0 0]})
%!error <not available with endpoint times> entropy_vector (ads3_background ("vacuum", "line"), {[0 1 0 0]}, "purifier", true)

%!test
%! ## The purifier of a pure state is the boundary complement: S(X u O)
%! ## computed by purity equals rt_entropy of the actual region X u P^c.
%! bg = ads3_background ("vacuum", "circle", "circumference", 10);
%! P = {[1 2], [3 4.5; 8 9], [5 6]};
%! [S, masks] = entropy_vector (bg, P, "purifier", true);
%! assert (size (S), [15 1]);
%! assert (size (masks), [15 4]);
%! O = [2 3; 4.5 5; 6 8; 9 11];               # the complement (wraps at 10)
%! for k = 1:15
%!   R = vertcat (P{masks(k, 1:3)});
%!   if (masks(k, 4))
%!     R = [R; O];
%!   endif
%!   assert (S(k), rt_entropy (bg, R), 1e-10);
%! endfor
%! assert (S(15), 0, 1e-10);
%! rep = entropy_inequalities (S);
%! assert (rep.holds);
%! ## a pure state saturates Araki-Lieb: S(X O) + S(O) = S(X) for X = P
%! assert (rep.al.worst_value, 0, 1e-10);

%!test
%! ## With a horizon: the purifier is the complement plus the second boundary
%! ## of the two-sided black hole.  S(O) = S(P), S(P u O) = 0, and the whole
%! ## circle as one party gives S_BH both for P and for O (TFD purity).
%! bg = ads3_background ("thermal", "circle", "beta", 1);
%! S = entropy_vector (bg, {[0 2*pi]}, "purifier", true);
%! assert (S, [bg.S_BH; bg.S_BH; 0], 1e-9 * bg.S_BH);
%! P = {[0 1], [2 3.5], [4 5]};
%! S = entropy_vector (bg, P, "purifier", true);
%! assert (S(8), S(7), 1e-12);
%! assert (S(15), 0);
%! assert (S(9), S(6), 1e-12);        # S(A1 O) = S(A2 A3)
%! assert (entropy_inequalities (S).holds);

%!test
%! ## Two-sided parties on the circle thermofield double: every inequality
%! ## of the holographic entropy cone holds at each time.
%! tfd = ads3_background ("tfd", "circle", "beta", 1);
%! St = entropy_vector (tfd, {struct("left", [0 1]), struct("right", [0 1]), struct("left", [2 3], "right", [2.5 4])}, "t", [0 0.7]);
%! assert (entropy_inequalities (St(:, 1)).holds && entropy_inequalities (St(:, 2)).holds);

%!test
%! ## Holographic entropy vectors of random region sets satisfy every family:
%! ## SSA (Headrick and Takayanagi 2007, Phys. Rev. D 76, 106013), MMI (Hayden,
%! ## Headrick and Maloney 2011, arXiv:1107.2940) and the cyclic family (Bao,
%! ## Nezami, Ooguri, Stoica, Sully and Walter 2015, JHEP 09 (2015) 130), all
%! ## instances for N <= 5, in every background; with the purifier where one
%! ## exists.
%! rand ("state", 2026);  randn ("state", 2026);
%! bgs = {ads3_background("vacuum", "line"), ...
%!        ads3_background("vacuum", "circle"), ...
%!        ads3_background("thermal", "line", "beta", 0.7), ...
%!        ads3_background("thermal", "circle", "beta", 1.3), ...
%!        ads3_background("thermal", "circle", "beta", 9), ...
%!        ads3_background("rotating", "circle", "beta_L", 0.6, "beta_R", 2.1), ...
%!        ads3_background("rotating", "line", "beta_L", 0.5, "beta_R", 1.5), ...
%!        ads3_background("heavy", "circle", "alpha", 0.4)};
%! assert (strcmp (bgs{5}.bulk, "thermal_ads"));
%! for b = 1:numel (bgs)
%!   bg = bgs{b};
%!   circle = isfinite (bg.circumference);
%!   L = merge (circle, bg.circumference, 6);
%!   for trial = 1:8
%!     N = 3 + mod (trial, 3);                 # 4, 5, 3, 4, ...
%!     P = random_parties (N, L, circle);
%!     S = entropy_vector (bg, P);
%!     rep = entropy_inequalities (S);
%!     assert (rep.holds, "%s, trial %d: %d violated", bg.bulk, trial,
%!             rep.sa.violated + rep.al.violated + rep.ssa.violated
%!             + rep.wm.violated + rep.mmi.violated + rep.cyclic.violated);
%!     if (bg.pure || bg.horizon)
%!       rep = entropy_inequalities (entropy_vector (bg, P(1:min (N, 4)), "purifier", true));
%!       assert (rep.holds, "%s, purified, trial %d", bg.bulk, trial);
%!     endif
%!   endfor
%! endfor

%!test
%! ## Five equal arcs tiling the global AdS3 circle (a pure state): the
%! ## five-region cyclic inequality (Bao et al 2015) in the cyclic order of
%! ## the arcs is saturated, S(3 arcs) = S(2 arcs) by purity.
%! bg = ads3_background ("vacuum", "circle");
%! a = 2 * pi / 5;
%! P = arrayfun (@(j) [j-1, j] * a, 1:5, "uniformoutput", false);
%! S = entropy_vector (bg, P);
%! assert (S(end), 0, 1e-12);
%! rep = entropy_inequalities (S);
%! assert (rep.holds);
%! assert (rep.cyclic.by_size(2).m, 5);
%! assert (rep.cyclic.by_size(2).worst_value, 0, 1e-10);
%! assert (rep.cyclic.by_size(2).worst_regions, {1, 2, 3, 4, 5});

%!test
%! ## N = 10 single intervals on a line: the documented subset, all holding
%! rand ("state", 4);
%! x = sort (rand (1, 20)) * 10;
%! P = num2cell (reshape (x, 2, 10)', 2)';
%! S = entropy_vector (ads3_background ("thermal", "line", "beta", 2), P);
%! assert (numel (S), 1023);
%! rep = entropy_inequalities (S);
%! assert (rep.holds);

%!error <Invalid call> entropy_vector (ads3_background ("vacuum", "line"))
%!error <background struct> entropy_vector (1, {[0 1]})
%!error <non-empty cell> entropy_vector (ads3_background ("vacuum", "line"), [0 1])
%!error <non-empty cell> entropy_vector (ads3_background ("vacuum", "line"), {})
%!error <party 2 must be a non-empty n x 2> entropy_vector (ads3_background ("vacuum", "line"), {[0 1], [2 3 4]})
%!error <party 2 must be a non-empty n x 2> entropy_vector (ads3_background ("vacuum", "line"), {[0 1], zeros(0, 2)})
%!error <party 1 must be a real> entropy_vector (ads3_background ("vacuum", "line"), {"ab"})
%!error <party 1 must be a real> entropy_vector (ads3_background ("vacuum", "line"), {[0 1i]})
%!error <PARTIES\{1\}\(1,:\) and PARTIES\{3\}\(1,:\) overlap> entropy_vector (ads3_background ("vacuum", "line"), {[0 1], [2 3], [0.5 1.5]})
%!error <entropy_vector: PARTIES\{2\}: row 1 must have start < end> entropy_vector (ads3_background ("vacuum", "line"), {[0 1], [3 2]})
%!error <at most 16 parties> entropy_vector (ads3_background ("vacuum", "line"), num2cell ([(0:16)' (0:16)' + 0.5], 2))
%!error <at most 15 parties besides> entropy_vector (ads3_background ("vacuum", "line"), num2cell ([(0:15)' (0:15)' + 0.5], 2), "purifier", true)
%!error <mixed state without a horizon> entropy_vector (ads3_background ("thermal", "circle", "beta", 9), {[0 1]}, "purifier", true)
%!error <true or false> entropy_vector (ads3_background ("vacuum", "line"), {[0 1]}, "purifier", "yes")
%!error <unknown option> entropy_vector (ads3_background ("vacuum", "line"), {[0 1]}, "purify", true)
%!error <true or false> entropy_vector (ads3_background ("vacuum", "line"), {[0 1]}, "purifier", 2)
%!error <entropy_vector: PARTIES\{2\}: row 1 must be numbers, not NaN> entropy_vector (ads3_background ("vacuum", "line"), {[0 1], [0 NaN]})
