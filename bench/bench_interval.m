## bench_interval (): interval_entropy on 10^6 lengths against the same
## closed form written as one vectorised Octave expression, in one run.
## Prints both times and the ratio ours/peer (target <= 1).
function bench_interval ()
  n = 1e6;
  reps = 5;
  names = {"thermal line (planar BTZ)", "BTZ circle with plateau"};
  bgs = {ads3_background("thermal", "line", "beta", 0.7, "c", 12, "cutoff", 1e-6), ...
         ads3_background("thermal", "circle", "beta", 0.7, "c", 12, "cutoff", 1e-6)};
  sgeo = @(l, bg) (bg.c / 3) * log ((bg.beta / (pi * bg.cutoff)) * sinh (pi * l / bg.beta));
  peers = {sgeo, @(l, bg) min (sgeo (l, bg), sgeo (bg.circumference - l, bg) + bg.S_BH)};
  printf ("%-28s %12s %12s %8s %12s\n", "case (10^6 lengths)", "holent [s]", "octave [s]", "ratio", "max rel diff");
  for k = 1:numel (names)
    bg = bgs{k};
    peer = peers{k};
    L = min (bg.circumference, 5);
    l = L * (0.001 + 0.998 * rand (n, 1));
    S = interval_entropy (bg, l);  Sp = peer (l, bg);  # warm up
    t_ours = inf;  t_peer = inf;
    for r = 1:reps
      t0 = tic ();  S = interval_entropy (bg, l);  t_ours = min (t_ours, toc (t0));
      t0 = tic ();  Sp = peer (l, bg);  t_peer = min (t_peer, toc (t0));
    endfor
    printf ("%-28s %12.4f %12.4f %8.2f %12.2e\n", names{k}, t_ours, t_peer,
            t_ours / t_peer, max (abs (S - Sp) ./ abs (Sp)));
  endfor
  printf ("(best of %d runs each; ratio = holent / plain Octave, target <= 1)\n", reps);
endfunction
