## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {@var{c} =} __holent_palette__ ()
## The colours of holent's figures, one field per role.
## @end deftypefn
function c = __holent_palette__ ()
  c.bulk = [0.965 0.955 0.925];      # pale sand: the bulk slice
  c.boundary = [0.23 0.25 0.29];     # slate: the AdS boundary
  c.region = [0.90 0.56 0.12];       # amber: the boundary regions
  c.surface = [0.02 0.43 0.47];      # deep teal: the minimal surface
  c.runner = [0.68 0.24 0.20];       # rust: the runner-up (dashed)
  c.horizon = [0.16 0.16 0.19];      # near black: inside the horizon
  c.defect = [0.42 0.22 0.50];       # plum: the conical defect
  c.brane = [0.36 0.44 0.20];        # olive: an end-of-the-world brane
  c.cut = [0.86 0.85 0.82];          # warm grey: beyond the brane
  c.shock = [0.80 0.27 0.49];        # rose: a shock wave and its shift
  c.phases = [0.55 0.74 0.70; 0.95 0.80 0.55; 0.80 0.62 0.74;
              0.68 0.75 0.88; 0.86 0.86 0.62; 0.75 0.68 0.60];
endfunction

%!test
%! c = __holent_palette__ ();
%! f = fieldnames (c);
%! for k = 1:numel (f)
%!   v = c.(f{k});
%!   assert (columns (v), 3);
%!   assert (all (v(:) >= 0 & v(:) <= 1));   # valid RGB triples
%! endfor
%! ## roles drawn on top of each other must be told apart
%! assert (norm (c.surface - c.runner) > 0.3);
%! assert (norm (c.bulk - c.horizon) > 0.5);
%! assert (rows (unique (c.phases, "rows")), rows (c.phases));
