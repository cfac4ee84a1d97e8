## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{prof} =} __holent_surface_profile__ (@var{fn}, @var{bg}, @var{shape}, @var{sizes}, @var{opts})
## The work of @code{surface_profile} (see there), its messages naming
## the public function @var{fn} that asked (@code{surface_profile} or
## @code{plot_surface_profile}); @var{opts} the cell of option pairs.
## @end deftypefn
function prof = __holent_surface_profile__ (fn, bg, shape, sizes, opts)
  __holent_hd__ ("check", fn, bg);   # one core call checks BG
  if (! ischar (shape) || ! any (strcmp (shape, {"strip", "ball"})))
    error ("holent:option", "%s: SHAPE must be \"strip\" or \"ball\"", fn);
  endif
  sizes = __holent_array__ (fn, "SIZES", sizes);
  k = find (! (sizes(:) > 0), 1);
  if (! isempty (k))
    error ("holent:domain", "%s: SIZES(%d) = %g must be positive", fn, k, sizes(k));
  endif
  o = __holent_opts__ (fn, {"tol"}, opts);
  rtol = 1e-3;
  if (isfield (o, "tol"))
    rtol = __holent_scalar__ (fn, "tol", o.tol, {1e-10, 0.5, "[]"});
  endif
  ball = strcmp (shape, "ball");
  ## the solvers' messages name the sizes SIZES(k)
  if (ball)
    [~, ~, ~, top] = __holent_hd__ ("ball", fn, bg, sizes, {"SIZES"});
  else
    [~, ~, ~, top] = __holent_hd__ ("strip", fn, bg, sizes, 1, {"SIZES"});
  endif
  prof = struct ("shape", {}, "size", {}, "top", {}, "x", {}, "z", {}, "zh", {});
  for k = 1:numel (sizes)
    tol = rtol * sizes(k);
    c = __holent_surface__ ("profile", fn, bg, double (ball), top(k), tol);
    if (! ball)
      ## mirror the half profile: from -l/2 through the turning point
      c = [-flipud(c(2:end,1)), flipud(c(2:end,2)); c];
    endif
    prof(k).shape = shape;
    prof(k).size = sizes(k);
    prof(k).top = top(k);
    prof(k).x = c(:,1);
    prof(k).z = c(:,2);
    prof(k).zh = bg.zh;
  endfor
  prof = reshape (prof, size (sizes));
endfunction

%!test
%! p = __holent_surface_profile__ ("f", ads_background (3, "vacuum"), "strip", 1, {});
%! ## AdS4 (d = 3): z* = l Gamma(1/4) / (2 sqrt(pi) Gamma(3/4)) (Ryu and
%! ## Takayanagi 2006, JHEP 08 (2006) 045, strip of width l)
%! assert (p.top, gamma (1/4) / (2 * sqrt (pi) * gamma (3/4)), 1e-8);
%!error <^f: SHAPE> __holent_surface_profile__ ("f", ads_background (3, "vacuum"), "disk", 1, {})
