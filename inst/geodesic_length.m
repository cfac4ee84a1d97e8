## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{len} =} geodesic_length (@var{bg}, @var{x1}, @var{x2})
## @deftypefnx {} {@var{len} =} geodesic_length (@dots{}, "class", @var{cls})
## @deftypefnx {} {@var{len} =} geodesic_length (@dots{}, "t1", @var{t1}, "t2", @var{t2}, "side1", @var{s1}, "side2", @var{s2}, "timelike", @var{tf}, "t", @var{t})
## Regulated length, in units of the AdS radius ell, of the boundary-anchored
## geodesic of background @var{bg} (from @code{ads3_background}) between the
## boundary points @var{x1} and @var{x2}.
##
## @var{x1} and @var{x2} are real arrays that broadcast against each other;
## @var{len} has the broadcast size.  The geodesic is cut off at the UV
## cutoff @code{bg.cutoff}: for an interval or arc of length l the result is
## the standard regulated length whose leading divergence is 2 log(l/eps);
## corrections of order (eps/l)^2, which depend on the regularisation scheme,
## are dropped.  The entropy of the surface is (c/6) * @var{len}.
##
## On a circle the boundary points are taken modulo the circumference L and
## the option @qcode{"class"} picks the homotopy class of the geodesic:
## @qcode{"positive"} (the geodesic over the arc running from @var{x1} to
## @var{x2} in the positive direction), @qcode{"negative"} (over the other
## arc) or @qcode{"shorter"} (the shorter of the two, the default).  In
## global and thermal AdS both classes give the same geodesic; in BTZ and the
## conical defect they differ.  On a line the option is ignored.
##
## Coincident points (on a circle: equal modulo L) are an error.
##
## @strong{Time} (@file{doc/hrt_time.md}): @qcode{"t1"} and @qcode{"t2"}
## (default 0, broadcast like the points) are the boundary times of the
## endpoints: the covariant (HRT) length, in every bulk.  The points must
## be spacelike separated (else @code{holent:timelike}) unless
## @qcode{"timelike"}, true, which returns the timelike branch as a
## complex number (imaginary part pi; Doi, Harper, Mollabashi, Takayanagi and
## Taki 2023, PRL 130, 031601).  On a thermofield double
## (@code{ads3_background ("tfd", ...)}) @qcode{"side1"} and
## @qcode{"side2"} are @qcode{"left"} or @qcode{"right"} (default right):
## points on different sides are joined through the Einstein-Rosen bridge
## (shortest winding on a circle; with the shock shift of the background),
## both times running forward (@file{doc/tfd_shock.md}).  @qcode{"t"} adds
## to both times, and on a quench is the time after it (t1, t2 must then
## be equal or absent; @file{doc/quench.md}).
##
## @seealso{ads3_background, interval_entropy}
## @end deftypefn

function len = geodesic_length (bg, x1, x2, varargin)
  fn = "geodesic_length";
  if (nargin < 3 || mod (nargin, 2) != 1)
    print_usage ();
  endif
  ## The static fast path (a static state, no option, X1 and X2 of one
  ## size): no time-path test, no option parsing, no isfield (it copies a
  ## struct's fields in Octave 7), and no type tests: the gateway refuses
  ## anything but real full doubles with holent:type, and then the general
  ## path below converts or explains (__holent_fast_error__,
  ## doc/fast_paths.md).
  if (nargin == 3)
    try
      switch (bg.state)
        case {"vacuum", "thermal", "rotating", "heavy"}
          if (size_equal (x1, x2))
            len = __holent_geodesic__ ("length", fn, bg, x1, x2, 0);
            return;
          endif
      endswitch
    catch err
      __holent_fast_error__ (err);
    end_try_catch
  endif
  o = struct ();
  if (nargin > 3)
    o = __holent_opts__ (fn, {"class", "t1", "t2", "side1", "side2", "timelike", "t"}, varargin);
  endif
  timed = (nargin > 3 && any (! strcmp (fieldnames (o), "class"))) ...
          || __holent_time_entropy__ ("timed", bg, {});
  cls = 0;
  if (isfield (o, "class"))
    v = o.class;
    choices = {"shorter", "positive", "negative"};
    if (! ischar (v) || ! any (strcmpi (v, choices)))
      error ("holent:option",
             "%s: 'class' must be \"shorter\", \"positive\" or \"negative\"", fn);
    endif
    cls = find (strcmpi (v, choices)) - 1;
  endif
  if (! (isa (x1, "double") && isreal (x1) && ! issparse (x1)
         && isa (x2, "double") && isreal (x2) && ! issparse (x2)))
    ## Slow path only for unusual input: full checks and conversion.
    x1 = __holent_array__ (fn, "X1", x1);
    x2 = __holent_array__ (fn, "X2", x2);
  endif
  if (! size_equal (x1, x2))
    try
      z = zeros (size (x1 + x2));
    catch
      error ("holent:size", "%s: X1 (%s) and X2 (%s) do not broadcast", fn,
             mat2str (size (x1)), mat2str (size (x2)));
    end_try_catch
    x1 = x1 + z;
    x2 = x2 + z;
  endif
  if (timed)
    x1 = __holent_array__ (fn, "X1", x1);
    x2 = __holent_array__ (fn, "X2", x2);
    len = timed_length (fn, bg, x1, x2, cls, o);
    return;
  endif
  ## NaN, Inf, overflow and coincident points are checked by the core in
  ## one pass, which explains a bad pair itself.
  len = __holent_geodesic__ ("length", fn, bg, x1, x2, cls);
endfunction

## Covariant lengths, two-sided lengths and the quench (doc/hrt_time.md).
function len = timed_length (fn, bg, x1, x2, cls, o)
  t1 = t2 = 0;
  if (isfield (o, "t1"))
    t1 = __holent_array__ (fn, "t1", o.t1);
  endif
  if (isfield (o, "t2"))
    t2 = __holent_array__ (fn, "t2", o.t2);
  endif
  t = 0;
  if (isfield (o, "t"))
    t = __holent_scalar__ (fn, "t", o.t, "real");
  endif
  ## [] is the right side; a side given is for a thermofield double only
  ## (the gateway says so), as is t1 == t2 on a quench.
  side = {[], []};
  names = {"side1", "side2"};
  for k = 1:2
    if (isfield (o, names{k}))
      v = o.(names{k});
      if (! ischar (v) || ! any (strcmpi (v, {"left", "right"})))
        error ("holent:option", "%s: '%s' must be \"left\" or \"right\"", fn, names{k});
      endif
      side{k} = double (strcmpi (v, "right"));
    endif
  endfor
  tl = __holent_time_entropy__ ("timelike", fn, o);
  [x1, x2, t1, t2] = __holent_time_entropy__ ("broadcast", fn, {"X1", "X2", "t1", "t2"},
                                              x1, x2, t1 + t, t2 + t);
  for k = find (! cellfun ("isempty", side))
    side{k} += zeros (size (x1));
  endfor
  [re, im] = __holent_time__ ("geodesic", fn, bg, x1, t1, side{1}, x2, t2,
                              side{2}, cls, double (tl));
  if (any (im(:)))
    len = complex (re, im);
  else
    len = re;
  endif
endfunction

%!shared bgl, bgc
%! bgl = ads3_background ("vacuum", "line", "cutoff", 1e-3);
%! bgc = ads3_background ("thermal", "circle", "beta", 1, "cutoff", 1e-4);

%!test
%! ## Calabrese and Cardy 2004 (J. Stat. Mech. P06002): vacuum on a line,
%! ## S = (c/3) log(l/eps), i.e. a regulated length 2 log(l/eps).
%! assert (geodesic_length (bgl, 0, [1 2 5]), 2 * log ([1 2 5] / 1e-3), 1e-12);
%! assert (geodesic_length (bgl, [1; 2], [3 4]), 2 * log (abs ([2 3; 1 2]) / 1e-3), 1e-12);

%!test
%! ## BTZ: the two homotopy classes over arcs l and L - l.
%! L = 2 * pi;  l = 1;
%! f = @(a) 2 * log (1 / (pi * 1e-4) * sinh (pi * a));
%! assert (geodesic_length (bgc, 0.5, 1.5, "class", "positive"), f (l), 1e-12);
%! assert (geodesic_length (bgc, 0.5, 1.5, "class", "negative"), f (L - l), 1e-10);
%! assert (geodesic_length (bgc, 1.5, 0.5), f (l), 1e-12);
%! assert (geodesic_length (bgc, 0.5 + 3 * L, 1.5 - L), f (l), 1e-10);

%!test
%! assert (size (geodesic_length (bgl, zeros (0, 3), 1)), [0 3]);

%!test
%! ## alpha = 1 is the vacuum: both classes are the same geodesic.
%! h1 = ads3_background ("heavy", "circle", "alpha", 1);
%! v = ads3_background ("vacuum", "circle");
%! assert (geodesic_length (h1, 0, 5, "class", "positive"), geodesic_length (v, 0, 5), 1e-12);
%! assert (geodesic_length (h1, 0, 5, "class", "negative"), geodesic_length (v, 0, 5), 1e-12);

%!test
%! ## Covariant lengths: the vacuum line depends on dx^2 - dt^2 (Hubeny,
%! ## Rangamani and Takayanagi 2007); the timelike branch adds i pi (Doi et
%! ## al. 2023); the thermofield double grows like 2 log cosh(2 pi t/beta)
%! ## through the bridge (Hartman and Maldacena 2013) and the shock adds
%! ## alpha/2 inside (Shenker and Stanford 2014).
%! assert (geodesic_length (bgl, 0, 5, "t2", 3), 2 * log (4 / 1e-3), 1e-12);
%! assert (geodesic_length (bgl, 0, [5 6], "t1", 1, "t2", 1), 2 * log ([5 6] / 1e-3), 1e-12);
%! len = geodesic_length (bgl, 0, 3, "t2", 5, "timelike", true);
%! assert (len, 2 * log (4 / 1e-3) + 1i * pi, 1e-12);
%! tfd = ads3_background ("tfd", "line", "beta", 2, "cutoff", 1e-4);
%! t = [0 0.5 2];
%! assert (geodesic_length (tfd, 0, 0, "side1", "left", "t", 0, "t1", t, "t2", t),
%!         2 * log (2 / (pi * 1e-4) * cosh (2 * pi * t / 2)), 1e-12);
%! sh = ads3_background ("tfd", "line", "beta", 2, "cutoff", 1e-4, "shock_alpha", 3);
%! assert (geodesic_length (sh, 1, 1, "side1", "left"), 2 * log (2 / (pi * 1e-4)) + 2 * log (2.5), 1e-12);
%! assert (geodesic_length (sh, 0, 1), geodesic_length (tfd, 0, 1), 1e-12);

%!error <timelike or null> geodesic_length (bgl, 0, 1, "t2", 2)
%!error <applies to a thermofield double> geodesic_length (bgl, 0, 1, "side1", "left")
%!error <must be "left" or "right"> geodesic_length (ads3_background ("tfd", "line", "beta", 1), 0, 1, "side1", "middle")
%!error <t1 and t2 must agree> geodesic_length (ads3_background ("quench", "line", "beta", 1), 0, 1, "t1", 1)
%!error <Invalid call> geodesic_length (bgl, 1)
%!error <coincide> geodesic_length (bgl, 1, [2 1])
%!error <coincide> geodesic_length (bgc, 1, 1 + 2 * pi)
%!error <do not broadcast> geodesic_length (bgl, [1 2 3], [4 5])
%!error <NaN> geodesic_length (bgl, NaN, 1)
%!error <finite> geodesic_length (bgl, Inf, 1)
%!error <real> geodesic_length (bgl, 1i, 1)
%!test
%! ## the static fast path leaves other types to the general path
%! bgl = ads3_background ("vacuum", "line", "cutoff", 1e-3);
%! assert (geodesic_length (bgl, single (0.5), 2), geodesic_length (bgl, 0.5, 2));
%! assert (geodesic_length (bgl, sparse (0.5), 2), geodesic_length (bgl, 0.5, 2));
%! assert (geodesic_length (bgl, int8 (1), [2 3]), geodesic_length (bgl, [1 1], [2 3]));
%!error <numeric array> geodesic_length (bgl, true, 2)
%!error <numeric array> geodesic_length (bgl, "a", 2)
%!error <background struct> geodesic_length (struct (), 1, 2)
%!error <'class' must be> geodesic_length (bgc, 1, 2, "class", "long")
%!error <unknown option> geodesic_length (bgc, 1, 2, "klass", "shorter")
%!error <geodesic_length: BG.bulk must be a short string> geodesic_length (setfield (bgl, "bulk", 7), 1, 2)
%!error <geodesic_length: X2\(1\): its distance to the first point overflows> geodesic_length (bgl, -1e308, 1e308)
%!error <BCFT background> geodesic_length (ads3_background ("bcft", "half_line"), [0 1], [2 3])
