## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{S} =} interval_entropy (@var{bg}, @var{len})
## @deftypefnx {} {[@var{S}, @var{branch}] =} interval_entropy (@var{bg}, @var{len})
## @deftypefnx {} {[@dots{}] =} interval_entropy (@var{bg}, @var{len}, "at", @var{x0})
## @deftypefnx {} {@dots{} =} interval_entropy (@dots{}, "dt", @var{dt}, "t", @var{t}, "timelike", @var{tf})
## Ryu-Takayanagi entropy of a single boundary interval of length @var{len}
## (an array; @var{S} has its size) in background @var{bg} from
## @code{ads3_background}.
##
## @var{S} = (c/6) * (regulated geodesic length), cutoff @code{bg.cutoff}.
## On a line @var{len} > 0.  On a circle of circumference L
## (@code{bg.circumference}) each length lies in (0, L], and the homology
## constraint picks the smaller of the geodesic over the
## interval and the geodesic over its complement plus the horizon:
## @example
## S(l) = min (S_geo(l), S_geo(L - l) + S_BH)
## @end example
## which gives the entanglement plateau of the BTZ black hole; l = L (the
## whole circle) gives S_BH.  Without a horizon (global AdS, thermal AdS,
## conical defect) S(l) = S(L - l).
##
## @var{branch} is a logical array, true where the surface runs round the
## complement: with a horizon, where the complementary geodesic plus the
## horizon wins (ties count as false); without one, where l > L/2.
##
## A warning @code{holent:cutoff} is issued when some l is not longer than
## twice the cutoff, where the regulated formula has no meaning.
##
## On a BCFT background (@code{ads3_background ("bcft", @dots{})}) the
## interval is [x0, x0 + @var{len}] with x0 set by the option
## @qcode{"at"} (an array of the size of @var{len}, or a scalar; default 0:
## adjacent to the boundary).  The minimum is taken over the connected
## geodesic, geodesics ending orthogonally on the brane(s), and the horizon
## where the homology needs it (@code{rt_entropy}); @var{branch} is true where
## some geodesic ends on a brane.  Calabrese and Cardy (2004): S = (c/6)
## log(2 l/eps) + log g adjacent to the boundary of a half line at zero
## temperature.
##
## @strong{Time} (@file{doc/hrt_time.md}): @qcode{"dt"} (broadcast against
## @var{len}) makes the interval boosted: its right end sits dt later than its
## left end (covariant HRT entropy, with the homology constraint as above).
## The endpoints must be spacelike (|dt| below the distance, on a circle
## the circle distance), else @code{holent:timelike}, unless
## @qcode{"timelike"}, true asks for the timelike entanglement entropy of
## Doi, Harper, Mollabashi, Takayanagi and Taki 2023 (PRL 130, 031601): the
## complex value (c/6)(log|P| + prefactor) + i pi c/6 of one geodesic, no
## homology term (the branch is documented in @file{doc/hrt_time.md}).
## @qcode{"t"} (scalar or vector) is the time after a quench
## (@code{ads3_background ("quench", ...)}) or a shift of both endpoint
## times; a vector gives one result per time (the shape of @var{t} for a
## scalar @var{len}, numel(l) x numel(t) otherwise).  On this path
## @var{branch} is true where the horizon is part of the surface.
##
## @seealso{ads3_background, geodesic_length, rt_entropy}
## @end deftypefn

function [S, branch] = interval_entropy (bg, l, varargin)
  fn = "interval_entropy";
  ## The static fast path (a static state, no option) tests the state in
  ## one line: no BCFT or time-path test, no option parsing; no isfield,
  ## which copies a struct's fields in Octave 7 (doc/fast_paths.md).
  try
    fast = nargin == 2 && any (strcmp (bg.state, {"vacuum", "thermal", "rotating", "heavy"}));
  catch
    fast = false;   # not a scalar struct with a state
  end_try_catch
  if (! fast)
    if (nargin < 2)
      print_usage ();
    endif
    if (__holent_is_bcft__ (bg))
      [S, branch] = bcft_intervals (fn, bg, l, varargin);
      return;
    endif
    if (mod (nargin, 2) != 0)
      print_usage ();
    endif
    if (! (isstruct (bg) && isscalar (bg) && isfield (bg, "bulk")))
      error ("holent:background",
             "%s: BG must be a background struct made by ads3_background", fn);
    endif
    if (nargin > 2 || __holent_time_entropy__ ("timed", bg, {}))
      [S, branch] = timed (fn, bg, l, varargin);
      return;
    endif
  endif
  if (! (isa (l, "double") && isreal (l)) || issparse (l))
    ## Slow path only for unusual input: full checks and conversion.
    l = __holent_array__ (fn, "L", l);
  endif
  ## Range, NaN and Inf are checked by the core in the same pass as the
  ## evaluation, which explains a bad length itself.
  if (nargout > 1)
    [S, branch, nshort] = __holent_interval__ ("entropy", fn, bg, l);
  else
    [S, ~, nshort] = __holent_interval__ ("entropy", fn, bg, l);
  endif
  if (nshort > 0)
    warning ("holent:cutoff",
             "%s: %d interval(s) not longer than twice the cutoff %g", fn,
             nshort, bg.cutoff);
  endif
endfunction

## Intervals [x0, x0 + l] of a BCFT: the minimiser over the connected
## geodesic and the brane-ending ones; BRANCH is true where some geodesic
## ends on a brane.
function [S, branch] = bcft_intervals (fn, bg, l, args)
  o = __holent_opts__ (fn, {"at"}, args);
  l = __holent_array__ (fn, "L", l);
  x0 = 0;
  if (isfield (o, "at"))
    x0 = __holent_array__ (fn, "at", o.at);
  endif
  if (! isscalar (x0) && ! isscalar (l) && ! size_equal (x0, l))
    error ("holent:size", "%s: L and 'at' must have the same size or be scalars", fn);
  endif
  k = find (! (l(:) > 0), 1);
  if (! isempty (k))
    error ("holent:domain", "%s: L(%d) = %g must be a positive length", fn, k, l(k));
  endif
  [l, x0] = deal (l + 0 * x0, x0 + 0 * l);
  A = arrayfun (@(a, b) [a, a + b], x0, l, "uniformoutput", false);
  [S, nshort, conf] = __holent_bcft__ ("entropy", fn, "[at, at + L]", bg, A);
  branch = arrayfun (@(c) ! isempty (c.brane.endpoint), conf);
  if (nshort > 0)
    warning ("holent:cutoff",
             "%s: some interval, or its distance to the boundary, is not longer than twice the cutoff %g",
             fn, bg.cutoff);
  endif
endfunction

## The time path: boosted intervals, the quench, the timelike branch.  The
## gateway checks BG, the lengths against the boundary and 'dt' against
## the state, and returns the entropies (the core's, c/6 included).
function [S, branch] = timed (fn, bg, l, args)
  o = __holent_opts__ (fn, {"dt", "t", "timelike", "at"}, args);
  if (isfield (o, "at"))
    error ("holent:option", "%s: 'at' applies to a BCFT background only (BG from ads3_background (\"bcft\", ...))", fn);
  endif
  l = __holent_array__ (fn, "L", l);
  dt = 0;
  if (isfield (o, "dt"))
    dt = __holent_array__ (fn, "dt", o.dt);
  endif
  tl = __holent_time_entropy__ ("timelike", fn, o);
  t = __holent_time_entropy__ ("times", fn, o);
  [l, dt] = __holent_time_entropy__ ("broadcast", fn, {"L", "dt"}, l, dt);
  [S, branch] = __holent_time__ ("interval", fn, bg, l(:), dt(:), t(:), double (tl));
  S = __holent_time_entropy__ ("shape", S, size (l), t);
  branch = __holent_time_entropy__ ("shape", branch, size (l), t);
endfunction

%!test
%! ## BCFT half line (Calabrese and Cardy 2004, J. Stat. Mech. P06002)
%! bg = ads3_background ("bcft", "half_line", "tension", 0.3, "c", 6);
%! [S, br] = interval_entropy (bg, [1 2], "at", 0);
%! assert (S, log (2 * [1 2] / bg.cutoff) + atanh (0.3), 1e-12);
%! assert (br, [true true]);
%! [S, br] = interval_entropy (bg, 0.1, "at", [5 10]);
%! assert (S, 2 * log (0.1 / bg.cutoff) * [1 1], 1e-12);
%! assert (br, [false false]);
%!error <same size> interval_entropy (ads3_background ("bcft", "half_line"), [1 2], "at", [1 2 3])
%!error <positive> interval_entropy (ads3_background ("bcft", "half_line"), -1)
%!test
%! ## Calabrese and Cardy 2004 (J. Stat. Mech. P06002), vacuum on a circle:
%! ## S = (c/3) log((L/(pi eps)) sin(pi l/L)).
%! bg = ads3_background ("vacuum", "circle", "c", 6, "circumference", 10, "cutoff", 1e-5);
%! l = [0.5 2 5 8];
%! assert (interval_entropy (bg, l), 2 * log (10 / (pi * 1e-5) * sin (pi * l / 10)), 1e-11);
%! ## purity: S(l) = S(L - l)
%! assert (interval_entropy (bg, l), interval_entropy (bg, 10 - l), 1e-11);

%!test
%! ## Entanglement plateau on the BTZ circle: S(l) - S(L - l) = S_BH once the
%! ## complement wins (Araki-Lieb saturation; Hubeny, Maxfield, Rangamani and
%! ## Tonni 2013, JHEP 08 (2013) 092; reference from memory).  The plateau
%! ## starts where L - l = (beta/(2 pi)) log(2/(1 + exp(-2 pi L/beta))), for any
%! ## cutoff (derived in doc/ads3_geodesics.md); here L >> beta.
%! bg = ads3_background ("thermal", "circle", "beta", 0.5, "c", 3, "cutoff", 1e-6);
%! L = 2 * pi;
%! l = [linspace(0.1, L - 0.1, 41), L - [0.05 0.02 0.005]];
%! [S, b] = interval_entropy (bg, l);
%! Sgeo = @(a) 0.5 * 2 * log (0.5 / (pi * 1e-6) * sinh (pi * a / 0.5));
%! assert (S, min (Sgeo (l), Sgeo (L - l) + bg.S_BH), 1e-10);
%! assert (b, Sgeo (L - l) + bg.S_BH < Sgeo (l));
%! assert (any (b) && ! all (b));
%! assert (b, L - l < 0.5 / (2 * pi) * log (2 / (1 + exp (-2 * pi * L / 0.5))));
%! assert (interval_entropy (bg, L), bg.S_BH, 1e-12);

%!test
%! ## Hubeny, Rangamani and Takayanagi 2007 (JHEP 07 (2007) 062), rotating BTZ:
%! ## S = (c/6) log((beta_L beta_R/(pi^2 eps^2)) sinh(pi l/beta_L) sinh(pi l/beta_R)).
%! bg = ads3_background ("rotating", "line", "beta_L", 0.7, "beta_R", 1.9, "c", 6, "cutoff", 1e-6);
%! l = [0.01 0.3 2 40];
%! ref = log (0.7 * 1.9 / (pi^2 * 1e-12) * sinh (pi * l / 0.7) .* sinh (pi * l / 1.9));
%! assert (interval_entropy (bg, l), ref, 1e-10);

%!test
%! ## Long intervals do not overflow: log sinh x ~ x - log 2.
%! bg = ads3_background ("thermal", "line", "beta", 1e-3, "cutoff", 1e-9);
%! S = interval_entropy (bg, 1e3);
%! assert (S, (1/3) * (log (1e-3 / (pi * 1e-9)) + pi * 1e6 - log (2)), 1e-9 * S);

%!test
%! bg = ads3_background ("vacuum", "line");
%! [S, b] = interval_entropy (bg, zeros (2, 0));
%! assert (size (S), [2 0]);
%! assert (islogical (b));

%!demo
%! ## Entanglement plateau: S(l) on a BTZ circle against the complement rule.
%! bg = ads3_background ("thermal", "circle", "beta", 1, "c", 6, "cutoff", 1e-3);
%! L = bg.circumference;
%! l = linspace (0.01, L, 400);
%! [S, b] = interval_entropy (bg, l);
%! plot (l / L, S, "-", l(b) / L, S(b), "r.");
%! xlabel ("l / L");  ylabel ("S(l)");
%! legend ("RT entropy", "complement + horizon", "location", "southeast");
%! title (sprintf ("BTZ, beta = %g, c = %g: plateau near l = L", bg.beta, bg.c));

%!warning <twice the cutoff> interval_entropy (ads3_background ("vacuum", "line", "cutoff", 1e-3), 1e-3);
%!test
%! ## Boosted interval on the thermal line (Hubeny, Rangamani and Takayanagi
%! ## 2007): S = (c/6) log((beta/(pi eps))^2 sinh(pi(l - dt)/beta) sinh(pi(l + dt)/beta)).
%! bg = ads3_background ("thermal", "line", "beta", 2, "c", 6, "cutoff", 1e-6);
%! f = @(l, dt) log ((2 / (pi * 1e-6))^2 * sinh (pi * (l - dt) / 2) .* sinh (pi * (l + dt) / 2));
%! assert (interval_entropy (bg, [1 3], "dt", 0.5), f ([1 3], 0.5), 1e-12);
%! ## timelike branch (Doi, Harper, Mollabashi, Takayanagi and Taki 2023):
%! ## (c/3) log((beta/(pi eps)) sinh(pi T0/beta)) + i pi c/6 for dx -> 0
%! S = interval_entropy (bg, 1e-9, "dt", 1.5, "timelike", true);
%! assert (real (S), 2 * log (2 / (pi * 1e-6) * sinh (pi * 1.5 / 2)), 1e-7);
%! assert (imag (S), pi, 1e-12);
%! ## spacelike ones stay real on that path
%! assert (interval_entropy (bg, 3, "dt", 0.5, "timelike", true), f (3, 0.5), 1e-12);

%!test
%! ## Quench on a line: the vacuum before, the thermal value once t >= l/2
%! ## (Balasubramanian et al. 2011, PRD 84, 026010).
%! bg = ads3_background ("quench", "line", "beta", 1, "c", 3, "cutoff", 1e-6);
%! S = interval_entropy (bg, 2, "t", [-1 1 1.5]);
%! assert (S, [log(2 / 1e-6), log(1 / (pi * 1e-6) * sinh (2 * pi)) * [1 1]], 1e-12);
%! assert (size (interval_entropy (bg, [1 2 3], "t", [0 1])), [3 2]);

%!error <timelike> interval_entropy (ads3_background ("vacuum", "line"), 1, "dt", 2)
%!error <timelike> interval_entropy (ads3_background ("vacuum", "line"), 1, "dt", 1)
%!error <'timelike' must be> interval_entropy (ads3_background ("vacuum", "line"), 1, "timelike", 3)
%!error <'at' applies to a BCFT background only> interval_entropy (ads3_background ("vacuum", "line"), 1, "at", 0)
%!error <not supported on a quench> interval_entropy (ads3_background ("quench", "line", "beta", 1), 1, "dt", 0.1)
%!error <do not broadcast> interval_entropy (ads3_background ("vacuum", "line"), [1 2], "dt", [0 0 0])
%!error <Invalid call> interval_entropy (ads3_background ("vacuum", "line"))
%!error <positive length> interval_entropy (ads3_background ("vacuum", "line"), [1 -1])
%!error <must lie in> interval_entropy (ads3_background ("vacuum", "circle"), 7)
%!error <NaN> interval_entropy (ads3_background ("vacuum", "circle"), NaN)
%!error <complex> interval_entropy (ads3_background ("vacuum", "circle"), 1+1i)
%!error <background struct> interval_entropy (1, 1)
%!error <BG.circumference must be Inf on a line> interval_entropy (setfield (ads3_background ("vacuum", "line"), "circumference", 3), 1)
