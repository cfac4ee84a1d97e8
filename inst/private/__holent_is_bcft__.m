## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn {} {[@var{tf}, @var{gw}] =} __holent_is_bcft__ (@var{bg})
## True when @var{bg} is a BCFT background (a boundary in the CFT, branes
## in the bulk); @var{gw} is the gateway that minimises RT over its regions
## (@code{__holent_bcft__}, else @code{__holent_rt__}).
## @end deftypefn
function [tf, gw] = __holent_is_bcft__ (bg)
  tf = (isstruct (bg) && isscalar (bg) && isfield (bg, "state")
        && ischar (bg.state) && any (strcmp (bg.state, {"bcft", "bcft_tfd"})));
  gw = merge (tf, "__holent_bcft__", "__holent_rt__");
endfunction

%!assert (__holent_is_bcft__ (struct ("state", "bcft")))
%!assert (! __holent_is_bcft__ (struct ("state", "vacuum")))
%!test
%! [~, gw] = __holent_is_bcft__ (1);
%! assert (gw, "__holent_rt__");
