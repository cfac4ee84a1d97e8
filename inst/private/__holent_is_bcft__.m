## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {[@var{tf}, @var{gw}] =} __holent_is_bcft__ (@var{bg})
## True when @var{bg} is a BCFT background (a boundary in the CFT, branes
## in the bulk); @var{gw} is the gateway that minimises RT over its regions,
## called as @code{feval (gw, "entropy", fn, name, bg, A)} and
## @code{feval (gw, "check", fn, bg, A)} (@code{__holent_bcft__}, else
## the RT gateway).
## @end deftypefn
function [tf, gw] = __holent_is_bcft__ (bg)
  tf = (isstruct (bg) && isscalar (bg) && isfield (bg, "state")
        && ischar (bg.state) && any (strcmp (bg.state, {"bcft", "bcft_tfd"})));
  if (tf)
    gw = "__holent_bcft__";
  else
    gw = @rt_gateway;
  endif
endfunction

## The RT gateway in the calling convention ("mode", fn, ...) until it
## takes it itself (issue 9: its owner converts it; then gw is its name).
function varargout = rt_gateway (mode, fn, varargin)
  if (strcmp (mode, "check"))
    [varargout{1:max (nargout, 1)}] = __holent_call__ ("__holent_rt__", mode, varargin{:});
  else
    [varargout{1:max (nargout, 1)}] = __holent_call__ ("__holent_rt__", mode, fn, varargin{:});
  endif
endfunction

%!assert (__holent_is_bcft__ (struct ("state", "bcft")))
%!assert (! __holent_is_bcft__ (struct ("state", "vacuum")))
%!test
%! [~, gw] = __holent_is_bcft__ (struct ("state", "bcft"));
%! assert (gw, "__holent_bcft__");
%!test
%! [~, gw] = __holent_is_bcft__ (1);
%! assert (is_function_handle (gw));
