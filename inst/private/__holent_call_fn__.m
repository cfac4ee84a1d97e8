## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {[@dots{}] =} __holent_call_fn__ (@var{fn}, @var{gateway}, @dots{})
## Call the compiled @var{gateway} with the remaining arguments; an error
## it raises is re-raised without the gateway's name and with the public
## function's name @var{fn} in front (identifier kept).
## @end deftypefn
function varargout = __holent_call_fn__ (fn, gateway, varargin)
  try
    [varargout{1:max (nargout, 1)}] = feval (gateway, varargin{:});
  catch err
    __holent_rethrow__ (err, gateway, fn);
  end_try_catch
endfunction
