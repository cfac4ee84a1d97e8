## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@dots{}] =} __holent_call__ (@var{gateway}, @dots{})
## Call the compiled gateway named @var{gateway} with the remaining
## arguments; an error it raises is re-raised by @code{__holent_rethrow__}
## without the gateway's name, identifier kept.
## @end deftypefn
function varargout = __holent_call__ (gateway, varargin)
  try
    [varargout{1:max (nargout, 1)}] = feval (gateway, varargin{:});
  catch err
    __holent_rethrow__ (err, gateway);
  end_try_catch
endfunction
