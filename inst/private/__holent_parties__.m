## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@var{P}, @var{sz}] =} __holent_parties__ (@var{fn}, @var{bg}, @var{names}, @var{args})
## Parties of an information quantity: each of @var{args} is an n x 2
## region or a cell array of regions.  Cells of one element (and plain
## matrices) are broadcast against the others, which must all have the same
## number of elements.  Returns @var{P}, a cell of cells of size @var{sz},
## as double matrices, @var{Sp}, a cell of the parties' entropies (arrays
## of size @var{sz}), and @var{nshort}, the count of segments not longer
## than twice the cutoff.  Each region is checked on its own (errors name it,
## e.g. @qcode{"B@{3@}"}), then the parties of each instance are checked to
## be mutually disjoint (@code{holent:overlap} naming the two rows); touching
## parties are allowed.
## @end deftypefn
function [P, sz, Sp, nshort] = __holent_parties__ (fn, bg, names, args)
  [~, gw] = __holent_is_bcft__ (bg);
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
      if (! isnumeric (r) || islogical (r))
        error ("holent:type", "%s: %s{%d} must be a numeric n x 2 matrix, got %s",
               fn, names{i}, k, class (r));
      endif
      if (! isreal (r))
        error ("holent:type", "%s: %s must be real, not complex", fn, names{i});
      endif
      P{i}{k} = full (double (r));
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
  for i = 1:np
    if (numel (P{i}) == 1 && nel != 1)
      P{i} = repmat (P{i}, sz);
    else
      P{i} = reshape (P{i}, sz);
    endif
  endfor
  Sp = cell (np, 1);
  nshort = 0;
  for i = 1:np
    ## each region alone: raises with the region's name
    if (iscl(i))
      [Sp{i}, ns] = feval (gw, "entropy", fn, names{i}, bg, P{i});
    else
      [s1, ns] = feval (gw, "entropy", fn, names{i}, bg, P{i}{1});
      Sp{i} = repmat (s1, sz);
    endif
    nshort += ns;
  endfor
  ## mutual disjointness, instance by instance
  for k = 1:nel
    rows = cellfun (@(p) rows_of (p{k}), P);
    [st, r1, r2] = feval (gw, "check", fn, bg, cell2mat (cellfun (@(p) p{k}, P, "uniformoutput", false)));
    if (st != 0)
      [i1, j1] = which_party (r1, rows);
      [i2, j2] = which_party (r2, rows);
      inst = "";
      if (nel > 1)
        inst = sprintf (" (instance %d)", k);
      endif
      error ("holent:overlap", "%s: %s(%d,:) and %s(%d,:) overlap%s: the parties must be disjoint",
             fn, names{i1}, j1, names{i2}, j2, inst);
    endif
  endfor
endfunction

function n = rows_of (a)
  n = rows (a);
endfunction

function [i, j] = which_party (r, rows)
  c = cumsum (rows(:));
  i = find (r <= c, 1);
  j = r - (c(i) - rows(i));
endfunction
