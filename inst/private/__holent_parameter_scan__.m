## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{R} =} __holent_parameter_scan__ (@var{fn}, @var{f}, @var{in})
## The work of @code{parameter_scan} (see there; @var{in} its grids and
## options) for the public function @var{fn} that asked
## (@code{parameter_scan} or @code{plot_phase_diagram}, whose messages then
## name it).
## @end deftypefn
function R = __holent_parameter_scan__ (fn, f, in)
  if (! is_function_handle (f))
    error ("holent:type", "%s: F must be a function handle", fn);
  endif
  k = find (cellfun ("ischar", in), 1);
  if (isempty (k))
    k = numel (in) + 1;
  endif
  grids = in(1:k-1);
  if (isempty (grids))
    error ("holent:nargs", "%s: give at least one grid", fn);
  endif
  for j = 1:numel (grids)
    g = grids{j};
    if (! (isnumeric (g) || islogical (g)) || ! isvector (g) || isempty (g))
      error ("holent:type", "%s: grid %d must be a non-empty numeric vector", fn, j);
    endif
    grids{j} = full (g(:));
  endfor
  o = __holent_opts__ (fn, {"workers", "cluster", "progress", "uniform"}, in(k:end));
  nw = 1;
  if (isfield (o, "workers"))
    nw = __holent_scalar__ (fn, "workers", o.workers, {1, 1024, "[]"});
    if (nw != round (nw))
      error ("holent:domain", "%s: workers must be a whole number", fn);
    endif
  endif
  progress = ! isfield (o, "progress") || __holent_bool__ (fn, "progress", o.progress);
  uniform = ! isfield (o, "uniform") || __holent_bool__ (fn, "uniform", o.uniform);
  sz = cellfun ("numel", grids)';
  if (numel (sz) == 1)
    sz = [sz 1];
  endif
  G = cell (1, numel (grids));
  [G{:}] = ndgrid (grids{:});
  args = cellfun (@(g) num2cell (g(:)), G, "uniformoutput", false);
  n = prod (sz);
  if (isfield (o, "cluster"))
    have = load_parallel_ (fn);
    if (! have)
      error ("holent:noparallel", "%s: the cluster mode needs the parallel package", fn);
    endif
    try
      C = netcellfun (o.cluster, f, args{:}, "UniformOutput", false,
                      "VerboseLevel", 0);
    catch err
      error ("holent:scan", "%s: the cluster scan failed: %s", fn, err.message);
    end_try_catch
  elseif (nw > 1 && n > 1 && load_parallel_ (fn))
    try
      C = parcellfun (min (nw, n), f, args{:}, "UniformOutput", false,
                      "VerboseLevel", double (progress));
    catch err
      error ("holent:scan", "%s: F failed in a worker: %s", fn, err.message);
    end_try_catch
  else
    C = cell (n, 1);
    t0 = tic ();  last = 0;  shown = false;
    for i = 1:n
      a = cellfun (@(c) c{i}, args, "uniformoutput", false);
      try
        C{i} = f (a{:});
      catch err
        error ("holent:scan", "%s: F failed at point %d (%s): %s", fn, i,
               strjoin (cellfun (@(v) sprintf ("%g", v), a, "uniformoutput", false), ", "),
               err.message);
      end_try_catch
      if (progress)
        t = toc (t0);
        if (t > 2 && t - last > 0.5)
          printf ("\r%s: %d of %d points (%.0f%%), %.0f s", fn, i, n, 100 * i / n, t);
          fflush (stdout);
          last = t;  shown = true;
        endif
      endif
    endfor
    if (shown)
      printf ("\r%s: %d of %d points, %.1f s\n", fn, n, n, toc (t0));
    endif
  endif
  C = reshape (C, sz);
  if (uniform)
    ok = cellfun (@(c) (isnumeric (c) || islogical (c)) && isscalar (c), C);
    if (! all (ok(:)))
      error ("holent:type", "%s: F returned a non-scalar at point %d: use \"uniform\", false",
             fn, find (! ok, 1));
    endif
    R = reshape ([C{:}], sz);
  else
    R = C;
  endif
endfunction

## Load the parallel package if it is installed; warn (once per call) and
## return false if it is not.
function ok = load_parallel_ (fn)
  ok = true;
  if (exist ("parcellfun") == 2 || exist ("parcellfun") == 3)
    return;
  endif
  try
    pkg ("load", "parallel");
  catch
    ok = false;
    warning ("holent:noparallel",
             "%s: the parallel package is not installed (Debian: octave-parallel); scanning serially", fn);
  end_try_catch
endfunction

%!assert (__holent_parameter_scan__ ("f", @plus, {1:2, 3, "progress", false}), [4; 5])
%!error <^f: F must be a function handle> __holent_parameter_scan__ ("f", 1, {1:3})
