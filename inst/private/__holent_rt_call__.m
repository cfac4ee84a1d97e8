## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@dots{}] =} __holent_rt_call__ (@dots{})
## Call the gateway @code{__holent_rt__} with the same arguments, and
## rethrow its errors without the gateway name Octave puts in front, so
## that messages start with the public function's name.
## @end deftypefn
function varargout = __holent_rt_call__ (varargin)
  try
    [varargout{1:max (nargout, 1)}] = __holent_rt__ (varargin{:});
  catch err
    msg = regexprep (err.message, '^__holent_rt__: ', '');
    error (err.identifier, "%s", msg);
  end_try_catch
endfunction
