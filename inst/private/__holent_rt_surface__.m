## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{surf} =} __holent_rt_surface__ (@var{fn}, @var{bg}, @var{A}, @var{opts})
## The work of @code{rt_surface} (see there) for the public function
## @var{fn} that asked (@code{rt_surface} or @code{plot_rt_surface}, whose
## messages then name it); @var{opts} the cell of option pairs.
## @end deftypefn
function surf = __holent_rt_surface__ (fn, bg, A, opts)
  o = __holent_opts__ (fn, {"tol", "configuration"}, opts);
  tol = 1e-3;
  if (isfield (o, "tol"))
    tol = __holent_scalar__ (fn, "tol", o.tol, {1e-10, 0.5, "[]"});
  endif
  which = "minimal";
  if (isfield (o, "configuration"))
    which = o.configuration;
    if (! ischar (which) || ! any (strcmp (which, {"minimal", "runner_up"})))
      error ("holent:option", "%s: configuration must be \"minimal\" or \"runner_up\"", fn);
    endif
  endif
  wascell = iscell (A);
  if (! wascell)
    A = {A};
  endif
  for k = 1:numel (A)
    if (! isnumeric (A{k}) || islogical (A{k}) || ! isreal (A{k}))
      error ("holent:type", "%s: A must be a real numeric n x 2 matrix or a cell array of them", fn);
    endif
    A{k} = full (double (A{k}));
  endfor
  [bcft, gw] = __holent_is_bcft__ (bg);
  surf = struct ("picture", {}, "curves", {}, "S", {}, "pairs", {}, "arcs", {},
                 "horizon", {}, "endpoints", {}, "intervals", {},
                 "horizon_curve", {}, "horizon_depth", {}, "defect", {},
                 "brane", {}, "brane_curves", {});
  if (bcft)
    ## surfaces ending on the branes, and the branes (the core's minimiser)
    if (strcmp (which, "runner_up"))
      error ("holent:unsupported", "%s: configuration \"runner_up\" is not available on a BCFT background", fn);
    endif
    if (wascell)
      s = __holent_bcft__ ("surface", fn, bg, A, tol);
    else
      s = __holent_bcft__ ("surface", fn, bg, A{1}, tol);
    endif
    [s.arcs] = deal (zeros (0, 1));
    [s.defect] = deal (false);
    surf = reshape (orderfields (s, surf), size (A));
    return;
  endif
  [S, ~, conf] = feval (gw, "entropy", fn, "A", bg, A);
  circle = strcmp (bg.boundary, "circle");
  nobrane = struct ("endpoint", zeros (0, 1), "x", zeros (0, 1),
                    "end", zeros (0, 1), "landing", zeros (0, 2));
  for k = 1:numel (A)
    c = conf(k);
    s.picture = merge (circle, "disk", "half_plane");
    s.S = S(k);
    s.pairs = c.pairs;  s.arcs = c.arcs;  s.horizon = c.horizon;
    if (strcmp (which, "runner_up"))
      [s.pairs, s.arcs, s.horizon, s.S] = __holent_surface__ ("runner", fn, bg,
        c.intervals, c.pairs, c.arcs, double (c.horizon));
    endif
    s.endpoints = c.endpoints;  s.intervals = c.intervals;
    s.curves = __holent_surface__ ("curves", fn, bg,
                                c.endpoints, s.pairs, s.arcs, tol);
    s.horizon_depth = NaN;
    s.horizon_curve = zeros (0, 2);
    if (bg.horizon)
      [hc, s.horizon_depth] = __holent_surface__ ("horizon", fn,
                                               bg, min (c.endpoints), max (c.endpoints), tol);
      if (s.horizon)
        s.horizon_curve = hc;
      endif
    endif
    s.defect = strcmp (bg.bulk, "conical_defect") && bg.alpha < 1;
    s.brane = nobrane;
    s.brane_curves = {};
    surf(k) = orderfields (s, surf);
  endfor
  surf = reshape (surf, size (A));
endfunction

%!test
%! s = __holent_rt_surface__ ("f", ads3_background ("vacuum", "line"), [0 2], {});
%! assert (s.picture, "half_plane");
%! assert (isempty (s.brane_curves));
%!error <^f: tol> __holent_rt_surface__ ("f", ads3_background ("vacuum", "line"), [0 2], {"tol", 0})
