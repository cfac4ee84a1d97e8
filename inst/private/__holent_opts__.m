## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {@var{opts} =} __holent_opts__ (@var{fn}, @var{names}, @var{args})
## Parse name/value pairs @var{args} (a cell) against the allowed option
## @var{names} (a cellstr, lower case).  Returns a struct holding only the
## options given, under their canonical names.  Names match case-insensitively.
## Unknown, repeated or malformed options raise @code{holent:option}.
## @end deftypefn
function opts = __holent_opts__ (fn, names, args)
  opts = struct ();
  if (mod (numel (args), 2) != 0)
    error ("holent:option", "%s: options must come in name/value pairs", fn);
  endif
  for k = 1:2:numel (args)
    nm = args{k};
    if (! ischar (nm) || ! isrow (nm))
      error ("holent:option", "%s: option name %d must be a string", fn, (k+1)/2);
    endif
    idx = find (strcmpi (nm, names));
    if (isempty (idx))
      error ("holent:option", "%s: unknown option '%s' (expected one of: %s)",
             fn, nm, strjoin (names, ", "));
    endif
    canon = names{idx(1)};
    if (isfield (opts, canon))
      error ("holent:option", "%s: option '%s' given twice", fn, canon);
    endif
    opts.(canon) = args{k+1};
  endfor
endfunction

%!test
%! o = __holent_opts__ ("f", {"tol", "names"}, {"TOL", 1, "names", {"a"}});
%! assert (o, struct ("tol", 1, "names", {{"a"}}));
%!assert (__holent_opts__ ("f", {"tol"}, {}), struct ())
%!error <f: options must come in name/value pairs> __holent_opts__ ("f", {"tol"}, {"tol"})
%!error <f: option name 1 must be a string> __holent_opts__ ("f", {"tol"}, {1, 2})
%!error <f: unknown option 'x' \(expected one of: tol, t\)> __holent_opts__ ("f", {"tol", "t"}, {"x", 2})
%!error <f: option 'tol' given twice> __holent_opts__ ("f", {"tol"}, {"tol", 1, "Tol", 2})
