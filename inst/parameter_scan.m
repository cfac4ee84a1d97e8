## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {@var{R} =} parameter_scan (@var{f}, @var{g1}, @var{g2}, @dots{})
## @deftypefnx {} {@var{R} =} parameter_scan (@dots{}, "workers", @var{n}, "cluster", @var{conns}, "progress", @var{tf}, "uniform", @var{tf})
## Evaluate @var{f} (a function handle of as many scalar arguments as
## there are grids) at every point of the grid @var{g1} x @var{g2} x ...
## (vectors; @code{ndgrid} order), and return the results in an array
## @var{R} of size [numel(@var{g1}), numel(@var{g2}), ...] (a column for
## one grid).  With @qcode{"uniform"} false (default true) @var{R} is a
## cell array, so @var{f} may return anything.
##
## Spreading the scan (optional, the results are the same numbers as the
## serial scan, in the same places):
## @table @asis
## @item @qcode{"workers"}, @var{n}
## evaluate in @var{n} local processes with @code{parcellfun} of the
## @code{parallel} package (Debian: @code{octave-parallel}); @var{n} = 1
## (the default) is serial.  Without the package a warning
## @code{holent:noparallel} is given and the scan runs serially.
## @item @qcode{"cluster"}, @var{conns}
## evaluate over the machines of a cluster connected with the package's
## @code{pconnect} (servers started with @code{pserver} on each machine),
## through @code{netcellfun}; every server must have holent installed when
## @var{f} uses it.  See @file{doc/scans.md} for a step-by-step setup.
## @end table
##
## Progress: with @qcode{"progress"} true (default), a scan that runs
## longer than two seconds prints how far it is (serial: a line updated
## every half second; parallel: the package's own progress display).
##
## An error raised by @var{f} is raised again as @code{holent:scan}, with
## the point where it happened.
##
## @seealso{plot_phase_diagram, find_transition}
## @end deftypefn

function R = parameter_scan (f, varargin)
  fn = "parameter_scan";
  if (nargin < 2)
    print_usage ();
  endif
  if (! is_function_handle (f))
    error ("holent:type", "%s: F must be a function handle", fn);
  endif
  k = find (cellfun ("ischar", varargin), 1);
  if (isempty (k))
    k = numel (varargin) + 1;
  endif
  grids = varargin(1:k-1);
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
  o = __holent_opts__ (fn, {"workers", "cluster", "progress", "uniform"}, varargin(k:end));
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

%!test
%! ## serial and over two local processes: the same numbers
%! f = @(a, b) rt_entropy (ads3_background ("thermal", "circle", "beta", b), [0 a]);
%! g1 = linspace (0.5, 5, 7);  g2 = [0.5 1 2];
%! R1 = parameter_scan (f, g1, g2);
%! assert (size (R1), [7 3]);
%! assert (R1(4,2), f (g1(4), g2(2)));
%! R2 = parameter_scan (f, g1, g2, "workers", 2, "progress", false);
%! assert (isequal (R1, R2));

%!test
%! R = parameter_scan (@(x) [x x], 1:3, "uniform", false);
%! assert (R, {[1 1]; [2 2]; [3 3]});

%!error <Invalid call> parameter_scan (@sin)
%!error <F must be a function handle> parameter_scan (1, 1:3)
%!error <non-scalar> parameter_scan (@(x) [x x], 1:3)
%!error <F failed at point 1 \(1\): boom> parameter_scan (@(x) error ("boom"), 1:3)
%!error <grid 2 must be a non-empty> parameter_scan (@plus, 1:3, [])
%!error <workers must> parameter_scan (@sin, 1:3, "workers", 1.5)
