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

%!test
%! hf = figure ("visible", "off");
%! unwind_protect
%!   h = line ([0 1], [0 1], "parent", axes ("parent", hf));
%!   __holent_fig_props__ ("f", h, {"linewidth", 3});
%!   assert (get (h, "linewidth"), 3);
%!   __holent_fig_props__ ("f", h, {});      # nothing to apply
%!   assert (get (h, "linewidth"), 3);
%!   fail ('__holent_fig_props__ ("f", h, {"nosuchproperty", 1})', "f: bad graphics property");
%! unwind_protect_cleanup
%!   close (hf);
%! end_unwind_protect
