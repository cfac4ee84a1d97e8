## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {[@var{hax}, @var{held}, @var{pal}] =} __holent_fig_begin__ (@var{hax})
## Prepare the axes @var{hax} (the current axes when empty) for drawing,
## like @code{plot}: cleared unless held; then held on while the figure
## function draws.  @var{held} is the hold state to restore with
## @code{hold (@var{hax}, "off")} when false; @var{pal} the palette.
## @end deftypefn
function [hax, held, pal] = __holent_fig_begin__ (hax)
  if (isempty (hax))
    hax = newplot ();
  else
    hax = newplot (hax);
  endif
  held = ishold (hax);
  hold (hax, "on");
  pal = __holent_palette__ ();
endfunction

%!test
%! hf = figure ("visible", "off");
%! unwind_protect
%!   ax = axes ("parent", hf);
%!   plot (ax, 1:3);
%!   [h, held, pal] = __holent_fig_begin__ (ax);
%!   assert (h, ax);
%!   assert (held, false);           # a plot replaces what was there
%!   assert (ishold (ax));           # held while the caller draws
%!   assert (isempty (get (ax, "children")));
%!   assert (isfield (pal, "surface"));
%!   plot (ax, 1:3);
%!   [~, held] = __holent_fig_begin__ (ax);
%!   assert (held, true);            # hold on stays on
%!   assert (numel (get (ax, "children")), 1);
%! unwind_protect_cleanup
%!   close (hf);
%! end_unwind_protect
