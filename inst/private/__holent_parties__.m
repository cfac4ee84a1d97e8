## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {[@var{P}, @var{sz}, @var{Sp}, @var{nshort}] =} __holent_parties__ (@var{fn}, @var{bg}, @var{names}, @var{args})
## Parties of an information quantity: each of @var{args} is an n x 2
## region or a cell array of regions (the batch convention of
## @file{doc/conventions.md}).  Cells of one element (and plain matrices)
## are broadcast against the others, which must all have the same number
## of elements.  Returns @var{P}, a cell of cells of size @var{sz}, as
## double matrices, @var{Sp}, a cell of the parties' entropies (arrays of
## size @var{sz}), and @var{nshort}, the count of segments not longer than
## twice the cutoff.  Each region is checked on its own by the core (errors
## name it, e.g. @qcode{"B@{3@}"}), then the parties of each instance are
## checked to be mutually disjoint (@code{holent:overlap} naming the two
## rows, e.g. @qcode{"A@{2@}(1,:) and B(1,:)"}); touching parties are
## allowed.
## @end deftypefn
function [P, sz, Sp, nshort] = __holent_parties__ (fn, bg, names, args)
  [isb, gw] = __holent_is_bcft__ (bg);
  np = numel (args);
  iscl = false (np, 1);
  P = cell (np, 1);
  sz = [1 1];
  nel = 1;
  for i = 1:np
    a = args{i};
    iscl(i) = iscell (a);
    if (iscell (a))
      if (isempty (a))
        error ("holent:empty", "%s: %s is an empty cell array: give a region or a non-empty cell of regions",
               fn, names{i});
      endif
      P{i} = a;
    elseif (isnumeric (a) && ! islogical (a))
      P{i} = {a};
    else
      error ("holent:type", "%s: %s must be an n x 2 region or a cell array of regions, got %s",
             fn, names{i}, class (a));
    endif
    for k = 1:numel (P{i})
      r = P{i}{k};
      if (! isnumeric (r) || islogical (r) || ! isreal (r))
        error ("holent:type", "%s: %s must be a real numeric n x 2 matrix, got %s",
               fn, merge (iscl(i), sprintf ("%s{%d}", names{i}, k), names{i}),
               merge (isreal (r), class (r), "complex values"));
      endif
      if (! isa (r, "double") || issparse (r))
        P{i}{k} = full (double (r));   # sparse and integer input accepted
      endif
    endfor
    ne = numel (P{i});
    if (ne != 1)
      if (nel != 1 && ne != nel)
        error ("holent:size", "%s: %s has %d regions where %d were expected (cells must match or have one element)",
               fn, names{i}, ne, nel);
      endif
      nel = ne;
      sz = size (P{i});
    endif
  endfor
  Sp = cell (np, 1);
  nshort = 0;
  for i = 1:np
    ## each region alone: the core raises with the region's name
    if (iscl(i) && numel (P{i}) == nel)
      [Sp{i}, ns] = feval (gw, "entropy", fn, names{i}, bg, reshape (P{i}, sz));
    else
      [s1, ns] = feval (gw, "entropy", fn, names{i}, bg, P{i}{1});
      Sp{i} = repmat (s1, sz);
    endif
    nshort += ns;
  endfor
  for i = 1:np
    if (numel (P{i}) == 1 && nel != 1)
      P{i} = repmat (P{i}, sz);
    else
      P{i} = reshape (P{i}, sz);
    endif
  endfor
  ## mutual disjointness of every instance, in one core call (a line for
  ## a BCFT: its regions lie in [0, Inf) or [0, length])
  if (np > 1)
    L = Inf;
    if (! isb)
      L = bg.circumference;
    endif
    R = reshape ([P{:}], nel, np).';
    named = iscl & (cellfun ("numel", args(:)) == nel);   # named A{k}
    __holent_rt__ ("parties", fn, names(:), named, L, R);
  endif
endfunction

%!shared bg
%! bg = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);

%!test
%! ## broadcast of a matrix party against a cell; entropies of each party
%! ## are the single-interval values (c/3) log(l/eps) (Calabrese and Cardy
%! ## 2004, J. Stat. Mech. P06002)
%! [P, sz, Sp, ns] = __holent_parties__ ("f", bg, {"A", "B"}, {{[0 1], [0 2]}, [3 4]});
%! assert (sz, [1 2]);
%! assert (P{2}, {[3 4], [3 4]});
%! assert (Sp{1}, log ([1 2] / 1e-6), 1e-12);
%! assert (Sp{2}, log (1 / 1e-6) * [1 1], 1e-12);
%! assert (ns, 0);

%!test
%! ## integer and sparse regions are accepted as their double values
%! [P, ~, Sp] = __holent_parties__ ("f", bg, {"A"}, {int8([0 2])});
%! assert (P{1}, {[0 2]});
%! [~, ~, Sp2] = __holent_parties__ ("f", bg, {"A"}, {sparse([0 2])});
%! assert (Sp2{1}, Sp{1});

%!error <f: A\{2\}\(1,:\) and B\(1,:\) overlap> __holent_parties__ ("f", bg, {"A", "B"}, {{[0 1], [2 3]}, [2.5 4]})
%!error <f: B: rows 1 and 2 overlap> __holent_parties__ ("f", bg, {"A", "B"}, {[0 1], [3 4; 3.5 5]})
%!error <f: A\{2\}: row 1 must have start < end> __holent_parties__ ("f", bg, {"A", "B"}, {{[0 1], [2 1]}, [5 6]})
%!error <2 regions where 3> __holent_parties__ ("f", bg, {"A", "B"}, {{[0 1], [2 3], [4 5]}, {[7 8], [9 10]}})
%!error <A is an empty cell> __holent_parties__ ("f", bg, {"A", "B"}, {{}, [2 3]})
%!error <B must be an n x 2 region> __holent_parties__ ("f", bg, {"A", "B"}, {[0 1], "x"})
