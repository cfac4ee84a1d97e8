## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{surf} =} __holent_rt_surface__ (@var{fn}, @var{bg}, @var{A}, @var{opts})
## The work of @code{rt_surface} (see there) for the public function
## @var{fn} that asked (@code{rt_surface} or @code{plot_rt_surface}, whose
## messages then name it); @var{opts} the cell of option pairs.
## @end deftypefn
function surf = __holent_rt_surface__ (fn, bg, A, opts)
  o = __holent_opts__ (fn, {"tol", "configuration", "t"}, opts);
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
  surf = struct ("picture", {}, "curves", {}, "S", {}, "pairs", {}, "arcs", {},
                 "horizon", {}, "endpoints", {}, "intervals", {},
                 "horizon_curve", {}, "horizon_depth", {}, "defect", {},
                 "brane", {}, "brane_curves", {}, "times", {}, "sides", {},
                 "windings", {}, "columns", {});
  ## a BCFT thermofield double takes "t" on its own path (below)
  if ((isfield (o, "t") && ! __holent_is_bcft__ (bg))
      || __holent_time_entropy__ ("timed", bg, A))
    ## endpoint times, a thermofield double or a quench: the core's
    ## minimiser and its geodesics in the picture of the state
    ru = strcmp (which, "runner_up");   # the gateway says where it exists
    t = 0;
    if (isfield (o, "t"))
      t = __holent_scalar__ (fn, "t", o.t, {-Inf, Inf, "()"});
    endif
    for k = 1:numel (A)
      surf(k) = orderfields (timed_surface (fn, bg, A{k}, t, tol, ru), surf);
    endfor
    surf = reshape (surf, size (A));
    return;
  endif
  for k = 1:numel (A)
    if (! isnumeric (A{k}) || islogical (A{k}) || ! isreal (A{k}))
      error ("holent:type", "%s: A must be a real numeric n x 2 matrix or a cell array of them", fn);
    endif
    A{k} = full (double (A{k}));
  endfor
  [bcft, gw] = __holent_is_bcft__ (bg);
  if (bcft)
    ## surfaces ending on the branes, and the branes (the core's minimiser)
    ru = strcmp (which, "runner_up");
    targ = {};
    if (isfield (o, "t"))
      ## "bcft_tfd" at a boundary time: the Kruskal picture
      targ = {__holent_scalar__(fn, "t", o.t, {-Inf, Inf, "()"})};
    endif
    if (wascell)
      s = __holent_bcft__ ("surface", fn, bg, A, tol, double (ru), targ{:});
    else
      s = __holent_bcft__ ("surface", fn, bg, A{1}, tol, double (ru), targ{:});
    endif
    [s.arcs] = deal (zeros (0, 1));
    [s.defect] = deal (false);
    if (isempty (targ))
      s = static_fields (s);
    else
      [s.columns] = deal ({"X_K", "T_K", "x"});
      for k = 1:numel (s)
        s(k).windings = zeros (rows (s(k).pairs), 1);   # no bridge winds on a half line
      endfor
    endif
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
    s = static_fields (s);
    surf(k) = orderfields (s, surf);
  endfor
  surf = reshape (surf, size (A));
endfunction

## The fields of a constant-time configuration: times 0, the right side,
## no windings, the names of the curves' columns.
function s = static_fields (s)
  for k = 1:numel (s)
    s(k).times = zeros (size (s(k).endpoints));
    s(k).sides = ones (size (s(k).endpoints));
    s(k).windings = zeros (rows (s(k).pairs), 1);
    s(k).columns = merge (strcmp (s(k).picture, "disk"), {"X", "Y", "t"},
                          {"x", "z", "t"});
  endfor
endfunction

## One region with times, on a thermofield double or a quench.
function s = timed_surface (fn, bg, A, t, tol, ru)
  if (isnumeric (A))
    A = __holent_time_entropy__ ("double", A);
  elseif (isstruct (A) && isscalar (A))
    for f = fieldnames (A)'
      A.(f{1}) = __holent_time_entropy__ ("double", A.(f{1}));
    endfor
  endif
  [s.curves, s.endpoints, s.times, s.sides, s.pairs, s.arcs, s.S, s.horizon, ...
   s.horizon_curve, s.picture, s.windings] = __holent_time__ ("surface", fn, bg, A, t, tol, double (ru));
  quench = strcmp (bg.state, "quench");
  switch (s.picture)
    case "kruskal"
      s.columns = {"X_K", "T_K", "x"};
    case "disk"
      s.columns = {"X", "Y", merge(quench, "v", "t")};
    otherwise
      s.columns = {"x", "z", merge(quench, "v", "t")};
  endswitch
  if (isstruct (A))
    iv = zeros (0, 3);
    for f = {"left", "right"}
      if (isfield (A, f{1}) && ! isempty (A.(f{1})))
        a = A.(f{1});
        iv = [iv; a(:, 1:2), strcmp(f{1}, "right") * ones(rows (a), 1)];
      endif
    endfor
    s.intervals = iv;
  else
    s.intervals = A(:, 1:2);
  endif
  s.horizon_depth = NaN;
  s.defect = isfield (bg, "bulk") && strcmp (bg.bulk, "conical_defect") && bg.alpha < 1;
  if (! strcmp (s.picture, "kruskal") && ! quench && bg.horizon)
    [~, s.horizon_depth] = __holent_surface__ ("horizon", fn, bg, 0, 0, tol);
  endif
  s.brane = struct ("endpoint", zeros (0, 1), "x", zeros (0, 1),
                    "end", zeros (0, 1), "landing", zeros (0, 2));
  s.brane_curves = {};
endfunction

%!test
%! s = __holent_rt_surface__ ("f", ads3_background ("vacuum", "line"), [0 2], {});
%! assert (s.picture, "half_plane");
%! assert (isempty (s.brane_curves));
%!error <^f: tol> __holent_rt_surface__ ("f", ads3_background ("vacuum", "line"), [0 2], {"tol", 0})
