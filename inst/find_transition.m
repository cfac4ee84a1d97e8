## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {[@var{x}, @var{info}] =} find_transition ("plateau", @var{bg})
## @deftypefnx {} {[@var{x}, @var{info}] =} find_transition ("mutual_information", @var{bg}, @var{l1}, @var{l2})
## @deftypefnx {} {[@var{x}, @var{info}] =} find_transition ("wedge", @var{bg}, @var{l1}, @var{l2})
## @deftypefnx {} {[@var{x}, @var{info}] =} find_transition ("hawking_page", "Omega", @var{Omega}, "circumference", @var{L})
## @deftypefnx {} {[@var{x}, @var{info}] =} find_transition ("strip_pair", @var{hdbg}, @var{l1}, @var{l2})
## @deftypefnx {} {[@var{x}, @var{info}] =} find_transition ("page_time", @var{bg}, @var{R})
## The parameter value at which the winning configuration changes, found
## by bracketing root finding (Brent, to a few units in the last place) on
## the exact difference of the two competing configurations
## (@file{doc/transitions.md}):
## @table @asis
## @item @qcode{"plateau"}
## the interval length l* on a BTZ circle (rotating or not) beyond which
## the complement's geodesic plus the horizon wins over the interval's own
## geodesic; @var{bg} may be a cell array of backgrounds (one l* each).
## @item @qcode{"mutual_information"}, @qcode{"wedge"}
## the gap d* between two intervals of lengths @var{l1} and @var{l2} (arrays
## of one size, or scalars) at which the connected surface stops winning:
## the mutual information drops to zero and the entanglement wedge of the
## union disconnects, at the same point.  Lines and circles without a
## horizon or a defect.
## @item @qcode{"hawking_page"}
## the temperature at which BTZ and thermal AdS exchange dominance at
## boundary velocity @var{Omega} on a circle of circumference @var{L}
## (arrays of one size or scalars; defaults 0 and 2 pi).
## @item @qcode{"strip_pair"}
## the separation s* of two parallel strips of widths @var{l1}, @var{l2} in
## the AdS_(d+1) background @var{hdbg} beyond which the disconnected surface
## wins; NaN when the reachable widths run out first.
## @item @qcode{"page_time"}
## the Page time of the radiation region @var{R} (an n x 2 matrix, or a
## cell array of them) in the two-sided BCFT background @var{bg}
## (@code{ads3_background ("bcft_tfd", ...)}; @code{page_curve}): the time
## at which the least entropy with geodesics through the bridge reaches the
## island entropy; 0 when the island wins from the start.  Found by the
## core in closed form from its exact minimisation (@file{doc/bcft.md}:
## S(t) = (c/3) min_k (A_k + k h(t)), so the Page time solves
## h(t) = max_k (A_0 - A_k)/k); @code{conf_below}/@code{conf_above} give
## the geodesics through the bridge and onto the brane on each side.
## @end table
##
## @var{x} has the size of the parameter arrays (NaN where there is no
## transition).  @var{info} has fields @code{below} and @code{above}: the
## configurations just below and just above @var{x} (cell arrays of names:
## @qcode{"geodesic"} / @qcode{"complement+horizon"}, @qcode{"connected"} /
## @qcode{"disconnected"}, @qcode{"thermal_ads"} / @qcode{"btz"}), and for
## the AdS3 kinds @code{conf_below}, @code{conf_above}: the minimiser's
## configuration (as from @code{rt_entropy}) at x (1 -+ 1e-6); @code{found}
## (logical).
##
## @seealso{rt_entropy, mutual_information, hawking_page, strip_mutual_information}
## @end deftypefn

function [x, info] = find_transition (kind, varargin)
  fn = "find_transition";
  if (nargin < 1)
    print_usage ();
  endif
  if (! ischar (kind) || ! isrow (kind))
    error ("holent:option", "%s: KIND must be a string", fn);
  endif
  info = struct ();
  switch (kind)
    case "plateau"
      if (numel (varargin) != 1)
        print_usage ();
      endif
      bgs = varargin{1};
      if (iscell (bgs) && isempty (bgs))
        error ("holent:background", "%s: BG is an empty cell: give a background or a cell array of them", fn);
      endif
      if (! iscell (bgs))
        bgs = {bgs};
      endif
      x = zeros (size (bgs));  found = false (size (bgs));
      for k = 1:numel (bgs)
        [x(k), found(k)] = __holent_transition__ ("plateau", fn, bgs{k});
      endfor
      info.below = repmat ({"geodesic"}, size (x));
      info.above = repmat ({"complement+horizon"}, size (x));
      if (nargout > 1)
        [info.conf_below, info.conf_above] = confs_ (fn, bgs, @(k, y) [0, y], x);
      endif
    case {"mutual_information", "wedge"}
      if (numel (varargin) != 3)
        print_usage ();
      endif
      [bg, l1, l2] = deal (varargin{:});
      [l1, l2] = sizes_ (fn, l1, l2, "L1", "L2");
      [x, found] = __holent_transition__ ("separation", fn, bg, l1, l2);
      info.below = repmat ({"connected"}, size (x));
      info.above = repmat ({"disconnected"}, size (x));
      if (nargout > 1)
        [info.conf_below, info.conf_above] = confs_ (fn, bg, @(k, d) [0, l1(k); l1(k) + d, l1(k) + d + l2(k)], x);
      endif
    case "hawking_page"
      o = __holent_opts__ (fn, {"omega", "circumference"}, varargin);
      w = 0;  L = 2 * pi;
      if (isfield (o, "omega"))
        w = __holent_array__ (fn, "Omega", o.omega);
        k = find (! (abs (w(:)) < 1), 1);
        if (! isempty (k))
          error ("holent:domain", "%s: Omega(%d) = %g must lie in (-1, 1)", fn, k, w(k));
        endif
      endif
      if (isfield (o, "circumference"))
        L = __holent_array__ (fn, "circumference", o.circumference);
        k = find (! (L(:) > 0), 1);
        if (! isempty (k))
          error ("holent:domain", "%s: circumference(%d) = %g must be positive", fn, k, L(k));
        endif
      endif
      [w, L] = sizes_ (fn, w, L, "Omega", "circumference");
      [x, found] = __holent_transition__ ("hawking_page", fn, w, L);
      info.below = repmat ({"thermal_ads"}, size (x));
      info.above = repmat ({"btz"}, size (x));
    case "strip_pair"
      if (numel (varargin) != 3)
        print_usage ();
      endif
      [bg, l1, l2] = deal (varargin{:});
      __holent_hd__ ("check", fn, bg);   # one core call checks BG
      [l1, l2] = sizes_ (fn, l1, l2, "L1", "L2");
      [x, found] = __holent_transition__ ("strip_pair", fn, bg, l1, l2);
      info.below = repmat ({"connected"}, size (x));
      info.above = repmat ({"disconnected"}, size (x));
    case "page_time"
      if (numel (varargin) != 2)
        print_usage ();
      endif
      [bg, R] = deal (varargin{:});
      if (! __holent_is_bcft__ (bg) || ! strcmp (bg.state, "bcft_tfd"))
        error ("holent:background", "%s: BG must be a two-sided BCFT background from ads3_background (\"bcft_tfd\", ...)", fn);
      endif
      if (! iscell (R))
        R = {R};
      elseif (isempty (R))
        error ("holent:empty", "%s: R is an empty cell: give a region or a cell array of them", fn);
      endif
      x = zeros (size (R));  found = true (size (R));
      info.conf_below = cell (size (R));  info.conf_above = info.conf_below;
      for k = 1:numel (R)
        if (! isnumeric (R{k}) || islogical (R{k}) || ! isreal (R{k}))
          error ("holent:type", "%s: R must be a real n x 2 matrix of [start, end] rows", fn);
        endif
        r = full (double (R{k}));
        ## the core finds the Page time (the first time from which the
        ## island configuration wins for good)
        [~, ~, ~, ~, pg] = __holent_bcft__ ("page", fn, bg, r, 0);
        x(k) = pg.page_time;
        [~, kb, nb] = __holent_bcft__ ("page", fn, bg, r,
                                       x(k) * [1 - 1e-6, 1 + 1e-6] + [0 1e-9]);
        info.conf_below{k} = struct ("n_bridge", kb(1), "n_brane", nb(1));
        info.conf_above{k} = struct ("n_bridge", kb(2), "n_brane", nb(2));
      endfor
      info.below = repmat ({"no_island"}, size (x));
      info.above = repmat ({"island"}, size (x));
    otherwise
      error ("holent:option", "%s: unknown KIND '%s' (expected plateau, mutual_information, wedge, hawking_page, strip_pair or page_time)",
             fn, kind);
  endswitch
  info.found = logical (found);
  info.below(! info.found) = {""};
  info.above(! info.found) = {""};
endfunction

## Broadcast two positive arrays to one size.
function [a, b] = sizes_ (fn, a, b, na, nb)
  a = __holent_array__ (fn, na, a);
  b = __holent_array__ (fn, nb, b);
  for v = {{a, na}, {b, nb}}
    k = find (! (v{1}{1}(:) > 0), 1);
    if (! isempty (k) && ! strcmp (v{1}{2}, "Omega"))
      error ("holent:domain", "%s: %s(%d) = %g must be positive", fn, v{1}{2}, k, v{1}{1}(k));
    endif
  endfor
  if (isscalar (a) && ! isscalar (b))
    a = repmat (a, size (b));
  elseif (isscalar (b) && ! isscalar (a))
    b = repmat (b, size (a));
  elseif (! isequal (size (a), size (b)))
    error ("holent:size", "%s: %s and %s must have one size or be scalars", fn, na, nb);
  endif
endfunction

## The minimiser's configuration at x (1 -+ 1e-6), region built by REG.
function [cb, ca] = confs_ (fn, bgs, reg, x)
  cb = cell (size (x));  ca = cb;
  for k = 1:numel (x)
    if (! isfinite (x(k)))
      continue;
    endif
    bg = bgs;
    if (iscell (bgs))
      bg = bgs{k};
    endif
    [~, gw] = __holent_is_bcft__ (bg);
    [~, ~, c] = feval (gw, "entropy", fn, "A", bg,
                       {reg(k, x(k) * (1 - 1e-6)), reg(k, x(k) * (1 + 1e-6))});
    cb{k} = c(1);  ca{k} = c(2);
  endfor
endfunction

%!test
%! ## Plateau on the BTZ circle, against the closed form derived from the
%! ## geodesic lengths (doc/transitions.md; Hubeny, Maxfield, Rangamani and
%! ## Tonni 2013, JHEP 08, 092 for the plateau, from memory):
%! ## exp(2 pi l*/beta) = (1 + exp(2 pi L/beta))/2.
%! betas = [0.5 1 2 4 6];
%! bgs = arrayfun (@(b) ads3_background ("thermal", "circle", "beta", b), betas,
%!                "uniformoutput", false);
%! [l, info] = find_transition ("plateau", bgs);
%! ref = betas / (2*pi) .* log ((1 + exp (2*pi*2*pi ./ betas)) / 2);
%! assert (l, ref, 1e-10 * 2 * pi);
%! assert (info.below{1}, "geodesic");
%! assert (! info.conf_below{3}.horizon && info.conf_above{3}.horizon);

%!test
%! ## Vacuum line, two unit intervals: d* = sqrt(2) - 1 (from
%! ## (2 + d) d = 1; Headrick 2010, PRD 82, 126010).  Unequal lengths:
%! ## d (l1 + l2 + d) = l1 l2.
%! vac = ads3_background ("vacuum", "line");
%! [d, info] = find_transition ("mutual_information", vac, [1 2 0.3], [1 0.5 7]);
%! l1 = [1 2 0.3];  l2 = [1 0.5 7];
%! ref = (-(l1 + l2) + sqrt ((l1 + l2).^2 + 4 * l1 .* l2)) / 2;
%! assert (d, ref, 1e-12);
%! assert (d(1), sqrt (2) - 1, 1e-14);
%! assert (info.conf_below{1}.pairs, [1 4; 2 3]);
%! assert (info.conf_above{1}.pairs, [1 2; 3 4]);
%! assert (find_transition ("wedge", vac, 1, 1), sqrt (2) - 1, 1e-14);

%!test
%! ## Hawking-Page: T = sqrt(1 - Omega^2)/L (Hawking and Page 1983; the
%! ## rotating case from memory).
%! [T, info] = find_transition ("hawking_page", "Omega", [0 0.3 -0.8], "circumference", [2*pi 1 3]);
%! assert (T, sqrt (1 - [0 0.3 -0.8].^2) ./ [2*pi 1 3], 1e-10);
%! assert (info.below{2}, "thermal_ads");  assert (info.above{2}, "btz");

%!test
%! ## Strips in vacuum AdS_{d+1}: equal strips disconnect at s/l = x with
%! ## x^(2-d) + (2+x)^(2-d) = 2 (Ryu and Takayanagi 2006, JHEP 08, 045 for
%! ## the areas), found here by fzero.
%! for d = [3 4]
%!   s = find_transition ("strip_pair", ads_background (d, "vacuum"), [1 2], [1 2]);
%!   x = fzero (@(x) x^(2-d) + (2 + x)^(2-d) - 2, [0.01 10]);
%!   assert (s, [1 2] * x, 1e-9);
%! endfor

%!test
%! ## Page time of R = [b, Inf] in the BCFT thermofield double:
%! ## cosh(2 pi t/beta) = e^{atanh T} sinh(2 pi b/beta) (Almheiri, Mahajan
%! ## and Maldacena 2019, arXiv:1910.11077, from memory).
%! bg = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.6, "c", 6);
%! [t, info] = find_transition ("page_time", bg, {[1, Inf], [0.7, Inf]});
%! b = [1 0.7];
%! assert (t, acosh (exp (atanh (0.6)) * sinh (pi * b)) / pi, 1e-10);
%! assert (info.conf_below{1}.n_bridge > 0 && info.conf_above{1}.n_bridge == 0);
%! assert (info.above{2}, "island");

%!error <Invalid call> find_transition ()
%!error <unknown KIND> find_transition ("page", 1)
%!error <needs a circle with a horizon> find_transition ("plateau", ads3_background ("vacuum", "line"))
%!error <not in btz> find_transition ("wedge", ads3_background ("thermal", "circle", "beta", 1), 1, 1)
%!error <L1\(2\) = -1 must be positive> find_transition ("mutual_information", ads3_background ("vacuum", "line"), [1 -1], 1)
%!error <Omega\(1\) = 2 must lie> find_transition ("hawking_page", "Omega", 2)
