## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn  {} {@var{tf} =} __holent_time_entropy__ ("timed", @var{bg}, @var{regions})
## @deftypefnx {} {@var{t} =} __holent_time_entropy__ ("times", @var{fn}, @var{o})
## @deftypefnx {} {@var{tf} =} __holent_time_entropy__ ("timelike", @var{fn}, @var{o})
## @deftypefnx {} {@var{x} =} __holent_time_entropy__ ("double", @var{x})
## @deftypefnx {} {[@var{a}, @var{b}, @dots{}] =} __holent_time_entropy__ ("broadcast", @var{fn}, @var{names}, @var{a}, @var{b}, @dots{})
## @deftypefnx {} {[@var{S}, @var{ncross}, @var{horizon}] =} __holent_time_entropy__ (@var{fn}, @var{bg}, @var{A}, @var{t}, @var{names})
## @deftypefnx {} {@var{S} =} __holent_time_entropy__ ("shape", @var{R}, @var{sz}, @var{t})
## The time path of the entropy functions.  "timed": true when @var{bg} is a
## thermofield double or a quench, or a region of the cell @var{regions} is
## a struct or has four columns (endpoint times).  "times": the option
## @qcode{"t"} of @var{o} as a real finite vector (0 when absent).
## "timelike": the option @qcode{"timelike"} of @var{o} (false when absent)
## as a logical.  "broadcast": the arrays expanded to their common size
## (@code{holent:size} naming them, from the cell @var{names}, when they do
## not broadcast); unchanged when one is not a real double array (the
## gateway names it).  "double": a numeric (not logical) @var{x} as a full double
## (anything else unchanged, for the gateway to name).  No form checks
## @var{bg} ("timed" reads only its state's name, to pick the path): the
## gateway @code{__holent_time__} is the one check.
## The last form calls the core on the region (or cell of regions) @var{A} at each
## time of @var{t}: @var{S} is numel(A) x numel(t); @var{names} (optional,
## a cell of numel(A) strings) names the regions in messages.  "shape": an array of
## the cell's size @var{sz} for one time, of the shape of @var{t} for one
## region, numel x numel(t) otherwise.
## @end deftypefn
function varargout = __holent_time_entropy__ (fn, varargin)
  switch (fn)
    case "timed"
      [bg, regs] = deal (varargin{:});
      ## a dispatch on the state's name only: the gateway checks BG
      tf = isstruct (bg) && isscalar (bg) && isfield (bg, "state") ...
           && ischar (bg.state) && any (strcmp (bg.state, {"tfd", "quench"}));
      for k = 1:numel (regs)
        r = regs{k};
        if (iscell (r))
          tf = tf || __holent_time_entropy__ ("timed", bg, r);
        else
          tf = tf || (isstruct (r) && isscalar (r) ...
                      && (isfield (r, "left") || isfield (r, "right"))) ...
                  || (isnumeric (r) && columns (r) == 4);
        endif
      endfor
      varargout{1} = tf;
    case "times"
      [f, o] = deal (varargin{:});
      t = 0;
      if (isfield (o, "t"))
        t = __holent_array__ (f, "t", o.t);
        if (isempty (t))
          error ("holent:empty", "%s: t must not be empty", f);
        endif
      endif
      varargout{1} = t;
    case "timelike"
      [f, o] = deal (varargin{:});
      tl = false;
      if (isfield (o, "timelike"))
        tl = o.timelike;
        if (! ((islogical (tl) || isnumeric (tl)) && isscalar (tl) && isreal (tl)
               && (tl == 0 || tl == 1)))
          error ("holent:option", "%s: 'timelike' must be true or false", f);
        endif
      endif
      varargout{1} = logical (full (tl));
    case "broadcast"
      [f, nm] = deal (varargin{1:2});
      a = varargin(3:end);
      varargout = a;
      if (! all (cellfun ("isreal", a) & cellfun (@(x) isa (x, "double"), a)))
        return;   # the gateway names the argument of the wrong type
      endif
      ## The common size from the sizes alone, and only the arrays of
      ## another size expanded: no pass over large arrays that already
      ## have it (each would be a pause Ctrl-C cannot cut short).
      nd = max (cellfun ("ndims", a));
      S = cell2mat (cellfun (@(x) [size(x), ones(1, nd - ndims (x))], a(:),
                             "uniformoutput", false));
      sz = max (S, [], 1);
      sz(any (S == 0, 1)) = 0;
      if (any ((S != 1 & S != sz)(:)))
        sz = cellfun (@(x) mat2str (size (x)), a, "uniformoutput", false);
        error ("holent:size", "%s: %s do not broadcast", f,
               strjoin (strcat (nm, " (", sz, ")"), ", "));
      endif
      for k = find (any (S != sz, 2))'
        if (isscalar (a{k}))
          varargout{k} = repmat (a{k}, sz);   # one pass, not two
        else
          varargout{k} = a{k} + zeros (sz);
        endif
      endfor
    case "double"
      x = varargin{1};
      if (isnumeric (x))
        x = full (double (x));
      endif
      varargout{1} = x;
    case "shape"
      [R, sz, t] = deal (varargin{:});
      if (numel (t) == 1)
        R = reshape (R, sz);
      elseif (prod (sz) == 1)
        R = reshape (R, size (t));
      endif
      varargout{1} = R;
    otherwise
      [bg, A, t] = deal (varargin{1:3});
      A = to_double (fn, A);
      [varargout{1:max (nargout, 1)}] = __holent_time__ ("entropy", fn, bg, A, t(:),
                                                         varargin{4:end});
  endswitch
endfunction

## Regions as full doubles (in cells and struct fields too).
function A = to_double (fn, A)
  if (iscell (A))
    if (isempty (A))
      error ("holent:empty", "%s: A is an empty cell array", fn);
    endif
    A = cellfun (@(a) to_double (fn, a), A, "uniformoutput", false);
  elseif (isstruct (A))
    if (isscalar (A))
      for f = fieldnames (A)'
        A.(f{1}) = to_double (fn, A.(f{1}));
      endfor
    endif
  elseif (isnumeric (A) && ! islogical (A) && isreal (A))
    A = full (double (A));
  else
    error ("holent:type",
           "%s: a region must be a real n x 2 or n x 4 matrix (or a struct with fields left and right), got %s",
           fn, class (A));
  endif
endfunction

%!test
%! bg = ads3_background ("vacuum", "line");
%! assert (__holent_time_entropy__ ("timed", bg, {[0 1]}), false);
%! assert (__holent_time_entropy__ ("timed", bg, {[0 1 0 0.5]}), true);
%! assert (__holent_time_entropy__ ("timed", bg, {{[0 1], struct("right", [0 1])}}), true);
%! assert (__holent_time_entropy__ ("shape", [1 2 3], [1 1], [0 1 2]'), [1 2 3]');
%! assert (__holent_time_entropy__ ("times", "f", struct ()), 0);
%! assert (__holent_time_entropy__ ("timelike", "f", struct ("timelike", 1)), true);
%! assert (__holent_time_entropy__ ("double", sparse (single (2))), 2);
%! assert (__holent_time_entropy__ ("double", true), true);
%! [a, b] = __holent_time_entropy__ ("broadcast", "f", {"a", "b"}, [1; 2], [3 4]);
%! assert ({a, b}, {[1 1; 2 2], [3 4; 3 4]});
%!error <f: a \(\[1 2\]\), b \(\[1 3\]\) do not broadcast> __holent_time_entropy__ ("broadcast", "f", {"a", "b"}, [1 2], [1 2 3])
%!error <'timelike' must be true or false> __holent_time_entropy__ ("timelike", "f", struct ("timelike", 2))
%!error <t must not be empty> __holent_time_entropy__ ("times", "f", struct ("t", []))
