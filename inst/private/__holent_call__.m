## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@dots{}] =} __holent_call__ (@var{gateway}, @dots{})
## Call the compiled gateway named @var{gateway} with the remaining
## arguments.  Octave puts the gateway's name in front of the messages of
## the errors it raises; this takes it off, so that messages start with the
## public function's name, and keeps the identifier.
## @end deftypefn
function varargout = __holent_call__ (gateway, varargin)
  try
    [varargout{1:max (nargout, 1)}] = feval (gateway, varargin{:});
  catch err
    msg = regexprep (err.message, ['^' gateway ': '], '');
    error (err.identifier, "%s", msg);
  end_try_catch
endfunction
