## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {} __holent_fig_props__ (@var{fn}, @var{h}, @var{props})
## Apply the property/value pairs @var{props} to the graphics objects
## @var{h}; an unknown property or a bad value raises @code{holent:option}.
## @end deftypefn
function __holent_fig_props__ (fn, h, props)
  if (isempty (props) || isempty (h))
    return;
  endif
  try
    set (h, props{:});
  catch err
    error ("holent:option", "%s: bad graphics property or value (%s)", fn, err.message);
  end_try_catch
endfunction
