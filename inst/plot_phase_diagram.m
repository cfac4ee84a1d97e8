## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.

## -*- texinfo -*-
## @deftypefn  {} {[@var{h}, @var{P}, @var{labels}] =} plot_phase_diagram (@var{f}, @var{x}, @var{y})
## @deftypefnx {} {@var{h} =} plot_phase_diagram (@var{x}, @var{y}, @var{P})
## @deftypefnx {} {@dots{} =} plot_phase_diagram (@var{hax}, @dots{})
## @deftypefnx {} {@dots{} =} plot_phase_diagram (@dots{}, "labels", @var{labels}, "workers", @var{n}, "xlabel", @var{sx}, "ylabel", @var{sy}, @var{prop}, @var{val}, @dots{})
## Draw which configuration (phase) wins over a two-parameter grid.
##
## With a function handle, @var{f}(@var{x}(i), @var{y}(j)) names the phase
## at each grid point, as a string (e.g. @qcode{"connected"}) or a
## positive integer; the grid is evaluated by @code{parameter_scan} (so
## @qcode{"workers"} spreads it over local processes).  Otherwise @var{P}
## is a numel(@var{x}) x numel(@var{y}) matrix of positive integers or a
## cell array of strings.  @var{labels} names the integer phases (default
## the phase numbers; taken from the strings when @var{f} returns strings).
##
## Each grid point is drawn as a cell (cell edges half way between grid
## values, so grids need not be uniform), one colour per phase, each phase
## named inside its region, and the phase boundaries as lines along the
## cell edges that separate different phases.  Other property/value pairs
## go to the boundary line.  @var{h} is a struct of handles: @code{axes},
## @code{cells}, @code{boundary}, @code{labels} (the text objects); @var{P}
## holds the phase numbers and @var{labels} their names.
##
## @seealso{parameter_scan, find_transition, plot_rt_surface}
## @end deftypefn

function [h, P, labels] = plot_phase_diagram (varargin)
  fn = "plot_phase_diagram";
  if (nargin < 3)
    print_usage ();
  endif
  [hax, args, o, props] = __holent_fig_args__ (fn, varargin, 3,
                                               {"labels", "workers", "xlabel", "ylabel"});
  if (is_function_handle (args{1}))
    [f, x, y] = deal (args{:});
    x = __holent_array__ (fn, "X", x)(:);
    y = __holent_array__ (fn, "Y", y)(:);
    w = 1;
    if (isfield (o, "workers"))
      w = o.workers;
    endif
    ## parameter_scan's own path, its messages naming this function
    P = __holent_parameter_scan__ (fn, f, {x, y, "workers", w, "uniform", false});
  else
    [x, y, P] = deal (args{:});
    x = __holent_array__ (fn, "X", x)(:);
    y = __holent_array__ (fn, "Y", y)(:);
  endif
  if (! isequal (size (P), [numel(x), numel(y)]))
    error ("holent:size", "%s: P must be numel (X) x numel (Y) = %d x %d", fn,
           numel (x), numel (y));
  endif
  labels = {};
  if (iscell (P))
    if (all (cellfun ("ischar", P(:))))
      [labels, ~, j] = unique (P(:));
      P = reshape (j, size (P));
    elseif (all (cellfun (@(p) isnumeric (p) && isscalar (p), P(:))))
      P = cell2mat (P);
    else
      error ("holent:type", "%s: the phases must be strings or positive integers", fn);
    endif
  endif
  if (! isnumeric (P) || any (P(:) < 1) || any (P(:) != round (P(:))))
    error ("holent:type", "%s: the phases must be strings or positive integers", fn);
  endif
  K = max (P(:));
  if (isfield (o, "labels"))
    labels = o.labels;
  endif
  if (isempty (labels))
    labels = arrayfun (@(k) sprintf ("phase %d", k), 1:K, "uniformoutput", false);
  endif
  if (! iscellstr (labels) || numel (labels) < K)
    error ("holent:option", "%s: labels must be a cell array of at least %d strings", fn, K);
  endif
  phc = __holent_palette__ ().phases;
  cols = phc(mod ((1:K) - 1, rows (phc)) + 1, :);
  ## cell edges half way between the grid values
  ex = edges_ (x);  ey = edges_ (y);
  [I, J] = ndgrid (1:numel (x), 1:numel (y));
  V = [ex(I(:)), ey(J(:)); ex(I(:)+1), ey(J(:)); ex(I(:)+1), ey(J(:)+1); ex(I(:)), ey(J(:)+1)];
  n = numel (I);
  F = [(1:n)', (1:n)' + n, (1:n)' + 2*n, (1:n)' + 3*n];
  [hax, held, pal] = __holent_fig_begin__ (hax);
  h = struct ("axes", hax, "cells", [], "boundary", [], "labels", []);
  h.cells = patch (hax, "faces", F, "vertices", V, "facevertexcdata", cols(P(:), :),
                   "facecolor", "flat", "edgecolor", "none");
  ## boundaries: edges between neighbouring cells of different phases
  bx = [];  by = [];
  [i, j] = find (diff (P, 1, 1) != 0);
  for k = 1:numel (i)
    bx = [bx, ex(i(k)+1), ex(i(k)+1), NaN];
    by = [by, ey(j(k)), ey(j(k)+1), NaN];
  endfor
  [i, j] = find (diff (P, 1, 2) != 0);
  for k = 1:numel (i)
    bx = [bx, ex(i(k)), ex(i(k)+1), NaN];
    by = [by, ey(j(k)+1), ey(j(k)+1), NaN];
  endfor
  if (isempty (bx))
    bx = NaN;  by = NaN;
  endif
  h.boundary = plot (hax, bx, by, "color", pal.boundary, "linewidth", 1.5);
  __holent_fig_props__ (fn, h.boundary, props);
  ## each phase named inside its region, at its cell nearest the centroid
  cx = (ex(1:end-1) + ex(2:end)) / 2;  cy = (ey(1:end-1) + ey(2:end)) / 2;
  [CX, CY] = ndgrid (cx, cy);
  sx = diff (ex([1 end]));  sy = diff (ey([1 end]));
  for k = unique (P(:))'
    in = find (P == k);
    m = [mean(CX(in)), mean(CY(in))];
    [~, j] = min (((CX(in) - m(1)) / sx).^2 + ((CY(in) - m(2)) / sy).^2);
    h.labels(end+1) = text (hax, CX(in(j)), CY(in(j)), labels{k}, "color", pal.boundary,
                            "horizontalalignment", "center", "fontweight", "bold");
  endfor
  set (hax, "xlim", ex([1 end]), "ylim", ey([1 end]), "box", "on", "layer", "top");
  if (isfield (o, "xlabel"))
    xlabel (hax, o.xlabel);
  endif
  if (isfield (o, "ylabel"))
    ylabel (hax, o.ylabel);
  endif
  if (! held)
    hold (hax, "off");
  endif
  labels = labels(:)';
endfunction

function e = edges_ (v)
  if (numel (v) == 1)
    e = v + [-0.5; 0.5];
    return;
  endif
  if (any (diff (v) <= 0))
    error ("holent:domain", "plot_phase_diagram: grids must be strictly increasing");
  endif
  m = (v(1:end-1) + v(2:end)) / 2;
  e = [v(1) - (m(1) - v(1)); m; v(end) + (v(end) - m(end))];
endfunction

%!demo
%! ## Two equal intervals on the vacuum line: connected for small separation
%! ## d relative to the width w (the boundary is d = (sqrt(2) - 1) w).
%! figure ("visible", "off");
%! vac = ads3_background ("vacuum", "line");
%! ph = @(d, w) merge (mutual_information (vac, [0 w], [w + d, 2*w + d]) > 1e-9, ...
%!                     "connected", "disconnected");
%! plot_phase_diagram (ph, linspace (0.05, 1, 25), linspace (0.2, 2, 25), ...
%!                     "xlabel", "separation d", "ylabel", "width w");
%! print (gcf, "-dpng", fullfile (tempdir (), "holent_phase_demo.png"));

%!test
%! warning ("off", "Octave:gnuplot-graphics", "local");
%! f = figure ("visible", "off");
%! unwind_protect
%!   [h, P, lab] = plot_phase_diagram (@(a, b) merge (a < b, "below", "above"), 1:4, 1:3);
%!   assert (lab, {"above", "below"});
%!   assert (P, [1 2 2; 1 1 2; 1 1 1; 1 1 1]);
%!   assert (ishghandle (h.cells) && ishghandle (h.boundary));
%!   ## the boundary runs along cell edges between different phases only
%!   bx = get (h.boundary, "xdata");  by = get (h.boundary, "ydata");
%!   assert (sum (isnan (bx)), 4);
%!   h2 = plot_phase_diagram (axes ("parent", figure ("visible", "off")), [1 2], [1 2 3], [1 2 2; 2 2 1], "labels", {"a", "b"}, "linestyle", ":");
%!   assert (get (h2.boundary, "linestyle"), ":");
%!   close (get (h2.axes, "parent"));
%! unwind_protect_cleanup
%!   close (f);
%! end_unwind_protect

%!error <Invalid call> plot_phase_diagram (1, 2)
%!error <P must be> plot_phase_diagram (1:2, 1:3, ones (3, 2))
%!error <positive integers> plot_phase_diagram (1:2, 1:2, zeros (2))
