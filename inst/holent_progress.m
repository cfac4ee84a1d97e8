## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn  {} {@var{mode} =} holent_progress ()
## @deftypefnx {} {@var{old} =} holent_progress (@var{mode})
## Query or set when long holent calls show a progress line.
##
## @var{mode} is one of
## @table @asis
## @item @qcode{"auto"} (the default)
## only in interactive sessions (never in scripts run with @code{octave
## --eval} or from a file, nor in test runs);
## @item @qcode{"on"}
## always, also in non-interactive runs;
## @item @qcode{"off"}
## never.
## @end table
##
## A call shows the line once it has run for 2 s and is expected to need
## at least 1 s more; the line (percentage done and an estimate of the
## time left) is redrawn in place at most twice a second and erased when
## the call ends.  The setting holds for the session; to make it a
## standing preference put e.g. @code{holent_progress ("off")} in
## @file{~/.octaverc}.  Every long call can be stopped with Ctrl-C
## whatever the setting: it returns to the prompt with the workspace as
## it was.  Which calls poll is listed in @file{doc/conventions.md}.
##
## Without input, return the current mode; with one, set it and return
## the previous one (to restore it later).
## @end deftypefn

function mode = holent_progress (varargin)
  ## The gateways ask this function (through the interpreter) only when a
  ## call has already run long enough to show progress.
  persistent current = "auto";
  if (nargin > 1)
    print_usage ();
  endif
  mode = current;
  if (nargin == 0)
    return;
  endif
  m = varargin{1};
  if (! (ischar (m) && isrow (m) && any (strcmp (m, {"auto", "on", "off"}))))
    error ("holent:option", "holent_progress: MODE must be \"auto\", \"on\" or \"off\"");
  endif
  current = m;
  mlock ();  # keep the choice through "clear functions"
endfunction

%!test
%! old = holent_progress ();
%! unwind_protect
%!   holent_progress ("off");
%!   assert (holent_progress (), "off");
%!   holent_progress ("on");
%!   assert (holent_progress (), "on");
%!   assert (holent_progress ("auto"), "on");
%!   assert (holent_progress (), "auto");
%! unwind_protect_cleanup
%!   holent_progress (old);
%! end_unwind_protect

%!error <Invalid call> holent_progress ("on", 1)
%!error <MODE must be> holent_progress ("yes")
%!error <MODE must be> holent_progress (1)
