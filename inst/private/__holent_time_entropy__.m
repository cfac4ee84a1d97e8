## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn  {} {@var{tf} =} __holent_time_entropy__ ("timed", @var{bg}, @var{regions})
## @deftypefnx {} {@var{t} =} __holent_time_entropy__ ("times", @var{fn}, @var{o})
## @deftypefnx {} {[@var{S}, @var{ncross}, @var{horizon}] =} __holent_time_entropy__ (@var{fn}, @var{bg}, @var{A}, @var{t})
## @deftypefnx {} {@var{S} =} __holent_time_entropy__ ("shape", @var{R}, @var{sz}, @var{t})
## The time path of the entropy functions.  "timed": true when @var{bg} is a
## thermofield double or a quench, or a region of the cell @var{regions} is
## a struct or has four columns (endpoint times).  "times": the option
## @qcode{"t"} of @var{o} as a real finite vector (0 when absent).  The third
## form calls the core on the region (or cell of regions) @var{A} at each
## time of @var{t}: @var{S} is numel(A) x numel(t).  "shape": an array of
## the cell's size @var{sz} for one time, of the shape of @var{t} for one
## region, numel x numel(t) otherwise.
## @end deftypefn
function varargout = __holent_time_entropy__ (fn, varargin)
  switch (fn)
    case "timed"
      [bg, regs] = deal (varargin{:});
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
    case "shape"
      [R, sz, t] = deal (varargin{:});
      if (numel (t) == 1)
        R = reshape (R, sz);
      elseif (prod (sz) == 1)
        R = reshape (R, size (t));
      endif
      varargout{1} = R;
    otherwise
      [bg, A, t] = deal (varargin{:});
      if (! isstruct (bg) || ! isscalar (bg) || ! isfield (bg, "state"))
        error ("holent:background",
               "%s: BG must be a background struct made by ads3_background", fn);
      endif
      A = to_double (fn, A);
      try
        [varargout{1:max (nargout, 1)}] = __holent_time__ ("entropy", bg, A, t(:));
      catch err
        __holent_rethrow__ (err, "__holent_time__", fn);
      end_try_catch
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
%!error <t must not be empty> __holent_time_entropy__ ("times", "f", struct ("t", []))
