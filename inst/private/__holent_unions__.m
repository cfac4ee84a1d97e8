## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@var{Sp}, @var{Su}] =} __holent_unions__ (@var{fn}, @var{bg}, @var{names}, @var{args}, @var{unions})
## The entropies an information quantity is built from: the parties
## @var{args} (named @var{names}) are checked and broadcast by
## @code{__holent_parties__}, whose single-party entropies come back in
## @var{Sp}; @var{Su}@{j@} is the entropy of the union of the parties listed
## in @var{unions}@{j@} (a vector of party indices), an array of the broadcast
## size.  All unions go to the minimiser in one call.  Warns
## @code{holent:cutoff} when some interval or gap is not longer than twice
## the cutoff.
## @end deftypefn
function [Sp, Su] = __holent_unions__ (fn, bg, names, args, unions, opts)
  ## Time-dependent states and regions with times (issue 12).
  o = struct ();
  if (nargin > 5)
    o = __holent_opts__ (fn, {"t"}, opts);
  endif
  if (isfield (o, "t") || __holent_time_entropy__ ("timed", bg, args))
    [Sp, Su] = __holent_time_unions__ (fn, bg, names, args, unions,
                                       __holent_time_entropy__ ("times", fn, o));
    return;
  endif
  [~, gw] = __holent_is_bcft__ (bg);
  [P, sz, Sp, nshort] = __holent_parties__ (fn, bg, names, args);
  nu = numel (unions);
  U = cell (prod (sz), nu);
  for j = 1:nu
    U(:,j) = cellfun (@(varargin) vertcat (varargin{:}), P{unions{j}},
                      "uniformoutput", false)(:);
  endfor
  if (nu == 1)
    what = ["the union of " strjoin(names(unions{1}), " and ")];
  else
    what = "a union of the parties";
  endif
  [S, ns] = feval (gw, "entropy", fn, what, bg, U(:));
  S = reshape (S, [], nu);
  Su = cell (nu, 1);
  for j = 1:nu
    Su{j} = reshape (S(:,j), sz);
  endfor
  if (nshort + ns > 0)
    warning ("holent:cutoff",
             "%s: some interval or gap is not longer than twice the cutoff %g",
             fn, bg.cutoff);
  endif
endfunction
