## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} rt_entropy (@var{bg}, @var{A})
## @deftypefnx {} {[@var{S}, @var{conf}] =} rt_entropy (@var{bg}, @var{A})
## @deftypefnx {} {[@var{S}, @var{conf}] =} rt_entropy (@dots{}, "t", @var{t})
## Holographic (Ryu-Takayanagi) entanglement entropy of a region made of
## many boundary intervals, minimised exactly over every RT candidate.
##
## @var{bg} is a background from @code{ads3_background}.  @var{A} is an
## n x 2 real matrix, one row @code{[start, end]} per interval, or a cell
## array of such matrices, in which case @var{S} is an array of the size of
## the cell with one entropy per region.
##
## Region conventions: on a line start < end.  On a circle of
## circumference L each interval runs from start to end in the positive
## direction, coordinates modulo L, so it may wrap through 0; a row
## @code{[a, a + L]} is the whole circle, which gives S_BH (zero for a pure
## state).  Rows may come in any order; intervals that touch are merged;
## overlapping rows raise @code{holent:overlap} naming them; zero-length rows
## raise @code{holent:empty}.  Coordinates closer than 16 times the machine
## epsilon times the largest coordinate (or L) count as equal.
##
## Candidates: the non-crossing pairings of the 2n sorted endpoints, one
## geodesic per pair.  In a background with a horizon on a circle (BTZ,
## rotating BTZ) a candidate also picks the face of its chord diagram that
## holds the horizon; each geodesic runs round the side away from that
## face, and S_BH is added when the face lies in A (homology constraint):
## @example
## S(A) = min (Sigma(A), Sigma(A^c) + S_BH)
## @end example
## with Sigma(X) the best candidate whose horizon face lies outside X.  With
## a conical defect the defect may sit in any face and adds nothing.  The
## minimum is found without enumeration, by a sweep over the sorted
## endpoints in O(n^2) time and O(n) memory that uses the concavity of
## every AdS3 geodesic length in the arc it spans (no cap on n; it agrees
## with the O(n^3) dynamic programme on every test region, see
## @file{doc/rt_fast.md} for what is and is not proven).  The regions of a
## cell array (16 or more) are spread over OpenMP threads, with or without
## @var{conf}; a single large region on a circle with a horizon or a defect
## uses two threads for its own sweep.  See @file{doc/rt_regions.md}.
##
## @var{conf} (a struct array of the size of the cell) describes the
## minimiser:
## @table @code
## @item pairs
## m x 2 indices into @code{endpoints} of the paired endpoints, each row
## ascending, rows sorted by their first index.
## @item pair_coords
## the same pairs as boundary coordinates (modulo L on a circle).
## @item arcs
## length of the boundary arc each geodesic subtends: the arc away from
## the horizon or defect face; in global and thermal AdS, where both arcs
## give the same geodesic, the shorter one.
## @item horizon
## true when the horizon is part of the surface.
## @item candidates
## how many candidates the minimum was taken over: Catalan(n) =
## binom(2n,n)/(n+1) pairings on a line and in global or thermal AdS;
## binom(2n,n) (each pairing with its n+1 faces) with a horizon or a
## defect (alpha < 1); 1 for the whole circle.  Exact below 2^53, rounded
## above, Inf beyond realmax (from n = 515 with faces, n = 520 without);
## @code{log_candidates} is its natural logarithm, always finite.
## @item endpoints
## the 2n endpoints, ascending (in [0, L) on a circle).
## @item intervals
## the normalised region: merged rows [start, end], start ascending (in
## [0, L) on a circle, where the last end may exceed L when it wraps).
## @item length
## the regulated length of the geodesics in units of ell, so that
## S = (c/6) length (+ S_BH when horizon).
## @end table
##
## A warning @code{holent:cutoff} is issued when an interval or a gap is not
## longer than twice the cutoff.
##
## @strong{With a boundary (BCFT backgrounds).}  On
## @code{ads3_background ("bcft", "half_line" | "interval", @dots{})} the rows
## lie in [0, Inf) or [0, length]; a row may start at 0 or end at length
## (adjacent to the boundary: that end needs no surface).  Every other
## endpoint either pairs with another endpoint or ends orthogonally on a
## brane, without crossings; in the BTZ saddle of an interval the horizon
## joins the surface when the homology region needs it (S_H added).  The
## minimum over all such configurations is exact (dynamic programming, O(m^3)
## for m endpoints, at most 1024 rows; @file{doc/bcft.md}).  @var{conf} then
## has fields @code{pairs}, @code{pair_coords}, @code{horizon},
## @code{endpoints} (the endpoints that need a surface), @code{intervals},
## @code{length} and @code{brane}, a struct with @code{endpoint} (indices
## into @code{endpoints} of those ending on a brane), @code{x} (their
## coordinates), @code{end} (0 or length: which brane) and @code{landing}
## (k x 2, where they land, [x, z] in the bulk coordinates of
## @file{doc/bcft.md}).
##
## @strong{Time} (covariant HRT entropies, @file{doc/hrt_time.md}): a row
## @code{[start, end, t_start, t_end]} (an n x 4 matrix) gives each endpoint
## its own boundary time, in every bulk; the endpoints must be pairwise
## spacelike (else @code{holent:timelike}) and intervals with times must
## not touch.  On a thermofield double (@code{ads3_background ("tfd", ...)})
## a region is a struct with fields @code{left} and @code{right} (each n x 2
## or n x 4, possibly empty; a plain matrix is the right side), minimised
## over geodesics within a side and through the bridge, on the line and on
## the circle (the annulus of the two-sided BTZ: both homotopy classes,
## every winding through the bridge, the horizon as homology asks;
## @file{doc/tfd_shock.md}).  A side may be the whole circle.  The
## option @qcode{"t"} (scalar or vector) adds t to every endpoint time (on
## a thermofield double: both sides move forward) and, on a quench
## (@code{ads3_background ("quench", ...)}), is the boundary time after the
## quench (@file{doc/quench.md}); a vector gives one entropy per time (the
## shape of @var{t} for one region, numel(A) x numel(t) for a cell).  On this
## path @var{conf} has the fields @code{crossings} (geodesics through the
## bridge) and @code{horizon}, arrays like @var{S}.
##
## @seealso{interval_entropy, mutual_information, tripartite_information,
## conditional_entropy, ads3_background, page_curve}
## @end deftypefn

function [S, conf] = rt_entropy (bg, A, varargin)
  fn = "rt_entropy";
  ## The static fast path (a static state, one double matrix of intervals
  ## without endpoint times, no option): no BCFT or time-path test, no
  ## isfield (it copies a struct's fields in Octave 7), no test of
  ## complex or sparse: the gateway refuses those with holent:type, and
  ## then the general path below converts or explains
  ## (__holent_fast_error__, doc/fast_paths.md).
  if (nargin == 2)
    try
      switch (bg.state)
        case {"vacuum", "thermal", "rotating", "heavy"}
          if (isa (A, "double") && columns (A) != 4)
            if (nargout > 1)
              [S, nshort, conf] = __holent_rt__ ("entropy", fn, "A", bg, A);
            else
              [S, nshort] = __holent_rt__ ("entropy", fn, "A", bg, A);
            endif
            if (nshort > 0)
              cutoff_warning (fn, nshort, bg.cutoff);
            endif
            return;
          endif
      endswitch
    catch err
      __holent_fast_error__ (err);
    end_try_catch
  endif
  if (nargin != 2 && nargin != 4)
    print_usage ();
  endif
  o = struct ();
  if (nargin > 2)
    o = __holent_opts__ (fn, {"t"}, varargin);
  endif
  if (isfield (o, "t") || __holent_time_entropy__ ("timed", bg, {A}))
    t = __holent_time_entropy__ ("times", fn, o);
    [S, nc, hz] = __holent_time_entropy__ (fn, bg, A, t);
    sz = merge (iscell (A), size (A), [1 1]);
    S = __holent_time_entropy__ ("shape", S, sz, t);
    conf = struct ("crossings", __holent_time_entropy__ ("shape", nc, sz, t),
                   "horizon", __holent_time_entropy__ ("shape", hz != 0, sz, t));
    return;
  endif
  [~, gw] = __holent_is_bcft__ (bg);
  if (iscell (A))
    ok = cellfun ("isclass", A, "double");
    if (! all (ok(:)))
      A(! ok) = cellfun (@(a) to_double (fn, a), A(! ok), "uniformoutput", false);
    endif
    ok = ! cellfun ("issparse", A);
    if (! all (ok(:)))
      A(! ok) = cellfun (@full, A(! ok), "uniformoutput", false);
    endif
  elseif (! (isa (A, "double") && isreal (A)) || issparse (A))
    A = to_double (fn, A);   # integer, single, sparse: their double values
  endif
  if (nargout > 1)
    [S, nshort, conf] = feval (gw, "entropy", fn, "A", bg, A);
  else
    [S, nshort] = feval (gw, "entropy", fn, "A", bg, A);
  endif
  if (nshort > 0)
    cutoff_warning (fn, nshort, bg.cutoff);
  endif
endfunction

function cutoff_warning (fn, nshort, cutoff)
  warning ("holent:cutoff",
           "%s: %d interval(s) or gap(s) not longer than twice the cutoff %g",
           fn, nshort, cutoff);
endfunction

function a = to_double (fn, a)
  if (! isnumeric (a) || islogical (a))
    error ("holent:type", "%s: A must be a numeric n x 2 matrix or a cell array of them, got %s",
           fn, class (a));
  endif
  if (! isreal (a))
    error ("holent:type", "%s: A must be real, not complex", fn);
  endif
  a = full (double (a));
endfunction

%!test
%! ## BCFT: two intervals, one adjacent to the boundary
%! bg = ads3_background ("bcft", "half_line", "tension", 0.2);
%! [S, conf] = rt_entropy (bg, [0 1; 5 5.1]);
%! assert (conf.brane.endpoint, 1);
%! assert (conf.brane.landing, [-0.2, sqrt(1 - 0.04)], 1e-14);
%! assert (conf.pairs, [2 3]);
%! assert (S, (log (2 / bg.cutoff) + atanh (0.2) + 2 * log (0.1 / bg.cutoff)) / 6, 1e-12);

%!test
%! ## Endpoint times: equal times give the static value; a boosted interval
%! ## on the vacuum line depends on dx^2 - dt^2 only (Lorentz invariance;
%! ## Hubeny, Rangamani and Takayanagi 2007, JHEP 07 (2007) 062).
%! bg = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);
%! assert (rt_entropy (bg, [0 1 0.2 0.2; 2 3 0.2 0.2]), rt_entropy (bg, [0 1; 2 3]), 1e-12);
%! assert (rt_entropy (bg, [0 5 0 3]), log (4 / 1e-6), 1e-12);
%! S = rt_entropy (bg, {[0 1], [0 5 0 3]}, "t", [0 1 2]);
%! assert (size (S), [2 3]);
%! assert (S(2,:), log (4 / 1e-6) * [1 1 1], 1e-12);

%!test
%! ## Hartman and Maldacena 2013 (JHEP 05 (2013) 014): S(A_L u A_R) grows
%! ## like 2 (c/3) log cosh(2 pi t/beta) and saturates at 2 S(A).
%! bg = ads3_background ("tfd", "line", "beta", 1, "c", 3, "cutoff", 1e-6);
%! A = struct ("left", [0 2], "right", [0 2]);
%! t = [0 0.3 0.6 1.5];
%! [S, conf] = rt_entropy (bg, A, "t", t);
%! h = 2 * log (1 / (pi * 1e-6) * cosh (2 * pi * t));
%! s1 = 2 * log (1 / (pi * 1e-6) * sinh (2 * pi));
%! assert (S, min (h, s1), 1e-10);
%! assert (conf.crossings, 2 * (h < s1));

%!error <timelike> rt_entropy (ads3_background ("vacuum", "line"), [0 1 0 2])
%!error <achronal> rt_entropy (ads3_background ("vacuum", "line"), [0 1 0 0; 1.5 2 1 1])
%!error <touches> rt_entropy (ads3_background ("vacuum", "line"), [0 1 0 0; 1 2 0 0])
%!error <thermofield double> rt_entropy (ads3_background ("vacuum", "line"), struct ("left", [0 1]))
%!error <sides are 'left' and 'right'> rt_entropy (ads3_background ("tfd", "line", "beta", 1), struct ("middle", [0 1]))
%!error <own times> rt_entropy (ads3_background ("quench", "line", "beta", 1), [0 1 0 0])
%!test
%! ## Purity of the thermofield double on a circle: S(A) = S(A^c), the
%! ## complement taken on both sides (common practice).
%! bg = ads3_background ("tfd", "circle", "beta", 1, "circumference", 3);
%! A = struct ("left", [0.2 0.9; 1.5 2.1], "right", [0.1 0.7; 1.3 2.6]);
%! Ac = struct ("left", [0.9 1.5; 2.1 3.2], "right", [0.7 1.3; 2.6 3.1]);
%! t = [0 0.3 3];
%! assert (rt_entropy (bg, A, "t", t), rt_entropy (bg, Ac, "t", t), 1e-12);
%! assert (rt_entropy (bg, struct ("left", [0 3], "right", [0 3])), 0);
%!error <has no intervals> rt_entropy (ads3_background ("tfd", "line", "beta", 1), struct ("left", zeros (0, 2)))
%!error <NaN> rt_entropy (ads3_background ("vacuum", "line"), [0 1], "t", NaN)

%!test
%! ## One interval reproduces interval_entropy (Calabrese and Cardy 2004,
%! ## J. Stat. Mech. P06002: S = (c/3) log(l/eps) on a line).
%! bg = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);
%! [S, conf] = rt_entropy (bg, [0.5 2.5]);
%! assert (S, log (2 / 1e-6), 1e-12);
%! assert (conf.pairs, [1 2]);
%! assert (conf.pair_coords, [0.5 2.5]);
%! assert (conf.arcs, 2, 1e-15);
%! assert (conf.candidates, 1);
%! assert (! conf.horizon);

%!test
%! ## Two intervals on a line: the connected surface wins for small
%! ## separation (Headrick 2010, Phys. Rev. D 82, 126010).
%! bg = ads3_background ("vacuum", "line", "cutoff", 1e-6);
%! [S, conf] = rt_entropy (bg, [0 1; 1.1 2.1]);
%! assert (conf.pairs, [1 4; 2 3]);
%! assert (S, (1/3) * (log (2.1 / 1e-6) + log (0.1 / 1e-6)), 1e-12);
%! [S, conf] = rt_entropy (bg, [0 1; 3 4]);
%! assert (conf.pairs, [1 2; 3 4]);
%! assert (conf.candidates, 2);

%!test
%! ## Cell form: one entropy per region, shaped like the cell.
%! bg = ads3_background ("thermal", "circle", "beta", 1);
%! R = {[0 1], [0 1; 2 3]; [1 2], [5 1]};
%! [S, conf] = rt_entropy (bg, R);
%! assert (size (S), [2 2]);
%! assert (size (conf), [2 2]);
%! for k = 1:4
%!   assert (S(k), rt_entropy (bg, R{k}), 1e-12);
%! endfor
%! ## the wrapping interval [5, 1] has length 1 + 2 pi - 5
%! assert (conf(2,2).intervals, [5, 1 + 2 * pi], 1e-12);
%! assert (S(2,2), interval_entropy (bg, 1 + 2 * pi - 5), 1e-10);

%!test
%! ## Whole circle: S_BH with a horizon, 0 in a pure state; touching rows
%! ## are merged into it.
%! bg = ads3_background ("thermal", "circle", "beta", 0.7);
%! [S, conf] = rt_entropy (bg, [1, 1 + 2 * pi]);
%! assert (S, bg.S_BH, 1e-12);
%! assert (conf.horizon);
%! assert (size (conf.pairs), [0 2]);
%! assert (rt_entropy (bg, [0 2; 2 4; 4 2 * pi]), bg.S_BH, 1e-12);
%! assert (rt_entropy (ads3_background ("vacuum", "circle"), [0 2 * pi]), 0);

%!test
%! ## Rows in any order; touching rows merged.
%! bg = ads3_background ("vacuum", "circle", "circumference", 10);
%! S1 = rt_entropy (bg, [6 7; 1 2; 2 3]);
%! S2 = rt_entropy (bg, [1 3; 6 7]);
%! assert (S1, S2, 1e-12);

%!warning <twice the cutoff> rt_entropy (ads3_background ("vacuum", "line", "cutoff", 1e-3), [0 1; 1.001 2]);
%!error <Invalid call> rt_entropy (ads3_background ("vacuum", "line"))
%!error <A: rows 1 and 2 overlap> rt_entropy (ads3_background ("vacuum", "line"), [0 2; 1 3])
%!error <A\{2\}: rows 2 and 3 overlap> rt_entropy (ads3_background ("vacuum", "line"), {[0 1], [5 6; 0 2; 1 3]})
%!error <zero-length> rt_entropy (ads3_background ("vacuum", "line"), [1 1])
%!error <start < end> rt_entropy (ads3_background ("vacuum", "line"), [2 1])
%!error <longer than the circle> rt_entropy (ads3_background ("vacuum", "circle"), [0 7])
%!error <overlap> rt_entropy (ads3_background ("vacuum", "circle"), [0 2*pi; 1 2])
%!error <no intervals> rt_entropy (ads3_background ("vacuum", "line"), zeros (0, 2))
%!error <n x 2> rt_entropy (ads3_background ("vacuum", "line"), [1 2 3])
%!error <NaN> rt_entropy (ads3_background ("vacuum", "line"), [1 NaN])
%!error <finite> rt_entropy (ads3_background ("vacuum", "line"), [1 Inf])
%!error <complex> rt_entropy (ads3_background ("vacuum", "line"), [1 2i])
%!error <numeric> rt_entropy (ads3_background ("vacuum", "line"), "ab")
%!error <numeric> rt_entropy (ads3_background ("vacuum", "line"), {[0 1], true(1,2)})
%!error <background struct> rt_entropy (struct (), [0 1])

%!test
%! ## no cap at 4096 intervals: 4097 unit intervals 10 apart on the line are
%! ## disconnected (cross-ratio 1/121 < 1/2 for every pair), so S is the sum
%! ## of the single-interval entropies (c/3) log(l/eps) (Calabrese and
%! ## Cardy 2004, J. Stat. Mech. P06002; Ryu and Takayanagi 2006, PRL 96,
%! ## 181602)
%! bg = ads3_background ("vacuum", "line", "c", 6, "cutoff", 1e-3);
%! A = [11 * (0:4096)', 11 * (0:4096)' + 1];
%! [S, conf] = rt_entropy (bg, A);
%! assert (S, 4097 * 2 * log (1 / 1e-3), -1e-12);
%! assert (conf.pairs, [1:2:8194; 2:2:8194]');
%!error <overflows> rt_entropy (ads3_background ("vacuum", "line"), [-1e308 1e308])

%!test
%! ## many regions are spread over threads, with or without configurations;
%! ## the result is the same as one region at a time (serial)
%! rand ("seed", 5);
%! bg = ads3_background ("rotating", "circle", "beta", 0.8, "Omega", 0.2);
%! R = arrayfun (@(k) sort (2 * pi * rand (2 * randi (6), 1))' , 1:300, "uniformoutput", false);
%! R = cellfun (@(p) reshape (p, 2, [])', R, "uniformoutput", false);
%! S1 = rt_entropy (bg, R);
%! [S2, conf] = rt_entropy (bg, R);
%! assert (S1, S2);
%! assert (size (conf), [1 300]);
%! for k = [1 77 300]
%!   [s, c] = rt_entropy (bg, R{k});
%!   assert (S1(k), s);
%!   assert (conf(k), c);
%! endfor

%!test
%! ## an empty cell gives an empty result
%! [S, conf] = rt_entropy (ads3_background ("vacuum", "line"), cell (0, 3));
%! assert (size (S), [0 3]);
%! assert (size (conf), [0 3]);
%! ## integer and single coordinates are accepted
%! bg = ads3_background ("vacuum", "line");
%! assert (rt_entropy (bg, int8 ([0 2])), rt_entropy (bg, [0 2]));
%! assert (rt_entropy (bg, {single([0 2])}), rt_entropy (bg, [0 2]));
%! ## the static fast path leaves sparse input to the general path
%! assert (rt_entropy (bg, sparse ([0 2])), rt_entropy (bg, [0 2]));
%!error <real> rt_entropy (ads3_background ("vacuum", "line"), [0 1i])
%!error <BG.boundary must be> rt_entropy (setfield (ads3_background ("vacuum", "line"), "boundary", 3), [0 1])
