## SPDX-License-Identifier: GPL-3.0-or-later
## bench_scalar_calls (): the per-call overhead a user feels in a loop of
## scalar calls: building an AdS3 background (ads3_background, circle,
## thermal with the dominant saddle: the path that decides Hawking-Page and
## fills M, J) and one scalar interval_entropy call on a built background
## (the background is unpacked and re-checked on every call).  Prints the
## median time per call in microseconds; compare a run of the same file on
## an older checkout (doc/fast_paths.md keeps the figures).  The peer is
## the plain Octave closed form of the same entropy, for scale.
function bench_scalar_calls ()
  n = 300;
  reps = 5;
  bg = ads3_background ("thermal", "circle", "beta", 0.7, "c", 12, "circumference", 3);
  cases = {"ads3_background (thermal, circle)", ...
           @() build_loop (n);
           "ads3_background (vacuum, line)", ...
           @() build_vacuum_loop (n);
           "interval_entropy (scalar L)", ...
           @() entropy_loop (bg, n);
           "peer: (c/3) log(...) in Octave", ...
           @() peer_loop (n)};
  printf ("%-36s %14s\n", sprintf ("case (%d calls in a loop)", n), "per call [us]");
  for k = 1:rows (cases)
    t = median_time (cases{k,2}, reps);
    printf ("%-36s %14.1f\n", cases{k,1}, 1e6 * t / n);
  endfor
  printf ("(median of %d runs of the loop)\n", reps);
endfunction

function s = build_loop (n)
  s = 0;
  for i = 1:n
    b = ads3_background ("thermal", "circle", "beta", 0.5 + i / n, "c", 12,
                         "circumference", 3);
    s += b.S_BH;
  endfor
endfunction

function s = build_vacuum_loop (n)
  s = 0;
  for i = 1:n
    b = ads3_background ("vacuum", "line", "cutoff", 1e-6 * (1 + i / n));
    s += b.cutoff;
  endfor
endfunction

function s = entropy_loop (bg, n)
  s = 0;
  for i = 1:n
    s += interval_entropy (bg, 0.1 + i / n);
  endfor
endfunction

function s = peer_loop (n)
  ## BTZ on a circle of circumference 3 at beta = 0.7, c = 12, eps = 1e-6:
  ## S = (c/3) log((beta/(pi eps)) sinh(pi l/beta)) (Calabrese and Cardy
  ## 2004, J. Stat. Mech. P06002).
  s = 0;
  for i = 1:n
    l = 0.1 + i / n;
    s += 12 / 3 * log (0.7 / (pi * 1e-6) * sinh (pi * l / 0.7));
  endfor
endfunction
