## SPDX-License-Identifier: GPL-3.0-or-later
## Copyright (C) 2026 The holent developers.
## -*- texinfo -*-
## @deftypefn {} {[@var{hax}, @var{args}, @var{opts}, @var{props}] =} __holent_fig_args__ (@var{fn}, @var{args}, @var{nfixed}, @var{names})
## Arguments of a figure function: an optional axes handle first, then
## @var{nfixed} positional arguments (returned in @var{args}), then
## name/value pairs: those named in @var{names} (case-insensitive) go to the
## struct @var{opts}, the others are graphics properties, returned as a
## cell @var{props} for the drawn curves.  Without an axes handle
## @var{hax} is empty: the caller takes the current axes (@code{newplot})
## once its arguments are checked, so that bad input opens no figure.
## @end deftypefn
function [hax, args, opts, props] = __holent_fig_args__ (fn, args, nfixed, names)
  hax = [];
  if (! isempty (args) && isscalar (args{1}) && isaxes (args{1}))
    hax = args{1};
    args(1) = [];
  endif
  if (numel (args) < nfixed)
    error ("holent:nargs", "%s: expected %d arguments before the options", fn, nfixed);
  endif
  rest = args(nfixed+1:end);
  args = args(1:nfixed);
  if (mod (numel (rest), 2) != 0)
    error ("holent:option", "%s: options and properties must come in name/value pairs", fn);
  endif
  mine = false (1, numel (rest));
  for k = 1:2:numel (rest)
    if (! ischar (rest{k}))
      error ("holent:option", "%s: option name %d must be a string", fn, (k+1)/2);
    endif
    mine(k:k+1) = any (strcmpi (rest{k}, names));
  endfor
  opts = __holent_opts__ (fn, names, rest(mine));
  props = rest(! mine);
endfunction

%!test
%! ## options (case-insensitive) and graphics properties are split apart
%! [hax, a, o, p] = __holent_fig_args__ ("f", {1, "Tol", 0.1, "linewidth", 2}, 1, {"tol"});
%! assert (isempty (hax));
%! assert (a, {1});
%! assert (o.tol, 0.1);
%! assert (p, {"linewidth", 2});
%!test
%! ## an axes handle first is taken off the arguments
%! hf = figure ("visible", "off");
%! unwind_protect
%!   ax = axes ("parent", hf);
%!   [hax, a] = __holent_fig_args__ ("f", {ax, 3, 4}, 2, {});
%!   assert (hax, ax);
%!   assert (a, {3, 4});
%! unwind_protect_cleanup
%!   close (hf);
%! end_unwind_protect
%!error <f: expected 2 arguments> __holent_fig_args__ ("f", {1}, 2, {})
%!error <name/value pairs> __holent_fig_args__ ("f", {1, "tol"}, 1, {"tol"})
%!error <option name 1 must be a string> __holent_fig_args__ ("f", {1, 3, 4}, 1, {"tol"})
