## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## run_benchmarks (): run every bench/bench_*.m in turn.  Each benchmark
## times holent against a peer (a plain Octave implementation of the same
## computation) in one run and prints both times and their ratio.
function run_benchmarks ()
  d = fileparts (mfilename ("fullpath"));
  files = dir (fullfile (d, "bench_*.m"));
  for k = 1:numel (files)
    nm = files(k).name(1:end-2);
    printf ("\n== %s\n", nm);
    fflush (stdout);
    feval (nm);
  endfor
endfunction
