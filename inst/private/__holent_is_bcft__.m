## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {[@var{tf}, @var{gw}] =} __holent_is_bcft__ (@var{bg})
## True when @var{bg} is a BCFT background (a boundary in the CFT, branes
## in the bulk); @var{gw} is the gateway that minimises RT over its regions
## (@code{__holent_bcft__}, else @code{__holent_rt__}), called as
## @code{feval (@var{gw}, "entropy", fn, name, bg, A)}.
## @end deftypefn
function [tf, gw] = __holent_is_bcft__ (bg)
  tf = (isstruct (bg) && isscalar (bg) && isfield (bg, "state")
        && ischar (bg.state) && any (strcmp (bg.state, {"bcft", "bcft_tfd"})));
  gw = merge (tf, "__holent_bcft__", "__holent_rt__");
endfunction

%!assert (__holent_is_bcft__ (struct ("state", "bcft")))
%!assert (__holent_is_bcft__ (struct ("state", "bcft_tfd")))
%!assert (! __holent_is_bcft__ (struct ("state", 3)))
%!assert (! __holent_is_bcft__ (struct ("state", {"bcft", "bcft"})))
%!assert (! __holent_is_bcft__ (struct ("state", "vacuum")))
%!test
%! [~, gw] = __holent_is_bcft__ (struct ("state", "bcft"));
%! assert (gw, "__holent_bcft__");
%!test
%! [~, gw] = __holent_is_bcft__ (1);
%! assert (gw, "__holent_rt__");
%!test
%! ## the BCFT gateway's entropy of an interval at the boundary of a half
%! ## line: (c/6) log(2 l/eps) + log g (Calabrese and Cardy 2004, J. Stat.
%! ## Mech. P06002), log g = (c/6) atanh(T)
%! bg = ads3_background ("bcft", "half_line", "tension", 0.3, "c", 6);
%! [tf, gw] = __holent_is_bcft__ (bg);
%! assert (tf);
%! S = feval (gw, "entropy", "f", "A", bg, [0 1]);
%! assert (S, log (2 / bg.cutoff) + atanh (0.3), 1e-12);
