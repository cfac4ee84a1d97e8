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
