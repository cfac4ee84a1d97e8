## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {} __holent_check_hd__ (@var{fn}, @var{bg})
## Raise @code{holent:background} unless @var{bg} is a background struct
## made by @code{ads_background}: a scalar struct with the fields the
## wrappers and the gateway read, each of the right type and range
## (checked by the compiled @code{__holent_bgcheck__}).  The message names
## @var{fn} and the field.
## @end deftypefn
function __holent_check_hd__ (fn, bg)
  req = {"dimension", "kind", "ell", "G", "cutoff", "zh", "z", "f", "horizon"};
  if (! isstruct (bg) || ! isscalar (bg) || ! all (isfield (bg, req)))
    error ("holent:background",
           "%s: BG must be a background struct made by ads_background", fn);
  endif
  try
    __holent_bgcheck__ (bg, "hd");
  catch err
    __holent_rethrow__ (err, "__holent_bgcheck__", fn);
  end_try_catch
endfunction
