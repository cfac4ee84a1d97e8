## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {} __holent_check_bg__ (@var{fn}, @var{bg})
## Raise @code{holent:background} unless @var{bg} is a background struct
## made by @code{ads3_background}: a scalar struct with the fields the
## wrappers and gateways read, each of the right type and range, and a
## bulk that matches its boundary (checked by the compiled
## @code{__holent_bgcheck__}).  The message names @var{fn} and the field.
## @end deftypefn
function __holent_check_bg__ (fn, bg)
  if (__holent_is_bcft__ (bg))
    __holent_call__ ("__holent_bcft__", "bgcheck", fn, bg);
    return;
  endif
  req = {"bulk", "boundary", "circumference", "cutoff", "beta_L", "beta_R", ...
         "alpha", "c", "S_BH", "horizon", "pure"};
  if (! isstruct (bg) || ! isscalar (bg) || ! all (isfield (bg, req)))
    error ("holent:background",
           "%s: BG must be a background struct made by ads3_background", fn);
  endif
  try
    __holent_bgcheck__ (bg);
  catch err
    __holent_rethrow__ (err, "__holent_bgcheck__", fn);
  end_try_catch
endfunction
