## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn  {} {} __holent_rethrow__ (@var{err}, @var{gateway})
## @deftypefnx {} {} __holent_rethrow__ (@var{err}, @var{gateway}, @var{fn})
## Re-raise the error @var{err} caught from the compiled @var{gateway}
## with the gateway's name (which Octave puts in front of MEX messages)
## taken off, and, when @var{fn} is given, the public function's name put
## in front unless the message already starts with it.  The identifier is
## kept.
## @end deftypefn
function __holent_rethrow__ (err, gateway, fn)
  msg = regexprep (err.message, ['^(' gateway ': )+'], '');
  if (nargin > 2 && ! strncmp (msg, [fn ": "], numel (fn) + 2))
    msg = [fn ": " msg];
  endif
  error (struct ("message", msg, "identifier", err.identifier));
endfunction
