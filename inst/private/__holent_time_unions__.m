## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn  {} {[@var{Sp}, @var{Su}] =} __holent_time_unions__ (@var{fn}, @var{bg}, @var{names}, @var{args}, @var{unions}, @var{t})
## @deftypefnx {} {[@var{Svec}, @var{masks}] =} __holent_time_unions__ ("vector", @var{fn}, @var{bg}, @var{parties}, @var{opts})
## The time path of @code{__holent_unions__}: the entropies of the parties
## @var{args} (regions: n x 2 or n x 4 matrices, structs with fields left
## and right on a thermofield double, or cells of them, batched like
## @code{__holent_parties__}) and of the unions listed in @var{unions}, at
## each time of @var{t}.  A union of matrices stacks their rows (n x 2
## rows get zero times when another party has times); on a thermofield
## double it stacks each side (a matrix is the right side).  Shapes as
## @code{__holent_time_entropy__ ("shape", ...)}.  "vector": the time path
## of @code{entropy_vector} (options @var{opts}: @qcode{"t"}, and
## @qcode{"purifier"} only false): the 2^N - 1 entropies, one column per
## time, and the subset masks.
## @end deftypefn
function varargout = __holent_time_unions__ (fn, varargin)
  if (strcmp (fn, "vector"))
    [varargout{1:max (nargout, 1)}] = time_vector (varargin{:});
  else
    [varargout{1:max (nargout, 1)}] = unions_at (fn, varargin{:});
  endif
endfunction

## Every union of the N parties (subset k: bit j-1 of k is party j).
function [Svec, masks] = time_vector (fn, bg, parties, opts)
  o = __holent_opts__ (fn, {"purifier", "t"}, opts);
  if (isfield (o, "purifier") && ! (isscalar (o.purifier) && o.purifier == 0))
    error ("holent:unsupported",
           "%s: 'purifier' is not available with endpoint times or time-dependent states", fn);
  endif
  N = numel (parties);
  if (N > 16)
    error ("holent:toobig", "%s: at most 16 parties, got %d", fn, N);
  endif
  for j = 1:N
    if (iscell (parties{j}))
      error ("holent:type", "%s: PARTIES{%d} must be a region (a matrix or a struct), not a cell", fn, j);
    endif
  endfor
  M = 2^N - 1;
  masks = logical (mod (floor ((1:M)' ./ 2.^(0:N-1)), 2));
  multi = find (sum (masks, 2) > 1);
  unions = arrayfun (@(k) find (masks(k,:)), multi, "uniformoutput", false);
  names = arrayfun (@(j) sprintf ("PARTIES{%d}", j), 1:N, "uniformoutput", false);
  t = __holent_time_entropy__ ("times", fn, o);
  [Sp, Su] = unions_at (fn, bg, names, parties(:)', unions, t);
  Svec = zeros (M, numel (t));
  Svec(2.^(0:N-1), :) = cell2mat (cellfun (@(s) s(:)', Sp, "uniformoutput", false));
  if (! isempty (multi))
    Svec(multi, :) = cell2mat (cellfun (@(s) s(:)', Su, "uniformoutput", false));
  endif
endfunction

function [Sp, Su] = unions_at (fn, bg, names, args, unions, t)
  np = numel (args);
  P = cell (np, 1);
  sz = [1 1];
  nel = 1;
  for i = 1:np
    a = args{i};
    if (iscell (a))
      if (isempty (a))
        error ("holent:empty", "%s: %s is an empty cell array", fn, names{i});
      endif
      P{i} = a;
      if (numel (a) != 1)
        if (nel != 1 && numel (a) != nel)
          error ("holent:size", "%s: %s has %d regions where %d were expected",
                 fn, names{i}, numel (a), nel);
        endif
        nel = numel (a);
        sz = size (a);
      endif
    else
      P{i} = {a};
    endif
  endfor
  for i = 1:np
    if (numel (P{i}) == 1)
      P{i} = repmat (P{i}, sz);
    endif
  endfor
  nu = numel (unions);
  R = N = cell (nel, np + nu);
  for i = 1:np
    R(:,i) = P{i}(:);
    N(:,i) = names(i);
  endfor
  for j = 1:nu
    N(:,np+j) = {["the union of " strjoin(names(unions{j}), " and ")]};
    for k = 1:nel
      R{k,np+j} = join (fn, cellfun (@(p) p{k}, P(unions{j}), "uniformoutput", false));
    endfor
  endfor
  if (nel > 1)
    N = cellfun (@(n, k) sprintf ("%s (instance %d)", n, k), N,
                 num2cell (repmat ((1:nel)', 1, np + nu)), "uniformoutput", false);
  endif
  S = __holent_time_entropy__ (fn, bg, R(:), t, N(:));
  S = reshape (S, nel, np + nu, numel (t));
  Sp = cell (np, 1);
  Su = cell (nu, 1);
  for i = 1:np
    Sp{i} = __holent_time_entropy__ ("shape", reshape (S(:,i,:), nel, []), sz, t);
  endfor
  for j = 1:nu
    Su{j} = __holent_time_entropy__ ("shape", reshape (S(:,np+j,:), nel, []), sz, t);
  endfor
endfunction

## The union of regions rs (a cell); n x 2 rows stay n x 2 unless some
## region has times.
function u = join (fn, rs)
  w4 = any (cellfun (@(r) isnumeric (r) && columns (r) == 4, rs)) ...
       || any (cellfun ("isstruct", rs));
  if (! w4)
    u = vertcat (rs{:});
  elseif (any (cellfun ("isstruct", rs)))
    u = struct ("left", zeros (0, 4), "right", zeros (0, 4));
    for k = 1:numel (rs)
      r = rs{k};
      if (! isstruct (r))
        r = struct ("right", r);
      endif
      for f = {"left", "right"}
        if (isfield (r, f{1}) && ! isempty (r.(f{1})))
          u.(f{1}) = [u.(f{1}); widen(fn, r.(f{1}))];
        endif
      endfor
    endfor
  else
    u = zeros (0, 4);
    for k = 1:numel (rs)
      u = [u; widen(fn, rs{k})];
    endfor
  endif
endfunction

## n x 2 rows as n x 4 with zero times.
function m = widen (fn, m)
  if (! isnumeric (m) || ! ismatrix (m) || ! any (columns (m) == [2 4]))
    error ("holent:type", "%s: a region must be an n x 2 or n x 4 real matrix", fn);
  endif
  m = double (m);
  if (columns (m) == 2)
    m = [m, zeros(rows (m), 2)];
  endif
endfunction

%!test
%! bg = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-6);
%! [Sp, Su] = __holent_time_unions__ ("f", bg, {"A", "B"}, {[0 1], [2 3 0.5 0.5]}, {[1 2]}, 0);
%! assert (Sp{1}, log (1e6), 1e-9);
%! assert (Su{1}, rt_entropy (bg, [0 1 0 0; 2 3 0.5 0.5]), 1e-12);
