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
  if (nargin < 2)
    print_usage ();
  endif
  R = __holent_parameter_scan__ ("parameter_scan", f, varargin);
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
