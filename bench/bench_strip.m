## bench_strip (): 1000 strip widths in the d = 4 black brane (zh = 1,
## cutoff 1e-3), holent's strip_entropy against a plain Octave script built
## on integral and fzero (below), both aiming at 1e-10 relative accuracy.
## The script is slow, so it is timed on every 100th width and its time
## scaled to 1000; the printout says so.
function bench_strip ()
  d = 4;  zh = 1;  eps = 1e-3;
  bg = ads_background (d, "black_brane", "zh", zh, "cutoff", eps);
  l = linspace (0.05, 4, 1000);

  strip_entropy (bg, l(1:10));            # load the MEX file
  t0 = tic ();
  [S, info] = strip_entropy (bg, l);
  t_ours = toc (t0);

  sub = 1:100:numel (l);
  t0 = tic ();
  [Sp, zp] = plain_strip (d, zh, eps, l(sub));
  t_sub = toc (t0);
  t_plain = t_sub * numel (l) / numel (sub);

  err_S = max (abs (S(sub) - Sp) ./ Sp);
  err_z = max (abs (info.z_star(sub) - zp) ./ zp);
  printf ("strip_entropy, d = 4 brane, %d widths in [%g, %g]\n", numel (l), l(1), l(end));
  printf ("  holent (GSL core)           : %8.4f s\n", t_ours);
  printf ("  plain integral + fzero      : %8.4f s for %d widths, scaled to %d: %8.2f s\n",
          t_sub, numel (sub), numel (l), t_plain);
  printf ("  ratio plain/holent          : %8.0f\n", t_plain / t_ours);
  printf ("  max relative difference     : S %.2g, z* %.2g (on the %d common widths)\n",
          err_S, err_z, numel (sub));
endfunction

## The peer: for each width, fzero on z* of the width integral, then the
## area above the cutoff, both by integral after u = 1 - t^2 (which removes
## the 1/sqrt(1 - u) singularity at the turning point).
function [S, zs] = plain_strip (d, zh, eps, l)
  f = @(z) 1 - (z / zh).^d;
  o = {"RelTol", 1e-11, "AbsTol", 0};   # enough for 1e-10 in S
  width = @(x) 2 * x * integral (@(t) 2 * t .* (1 - t.^2).^(d-1) ./ ...
                 sqrt (f (x * (1 - t.^2)) .* (1 - (1 - t.^2).^(2*d-2))), 0, 1, o{:});
  S = zeros (size (l));  zs = S;
  for k = 1:numel (l)
    zs(k) = fzero (@(x) width (x) - l(k), [1e-3, zh * (1 - 1e-12)],
                   optimset ("TolX", 1e-15));
    x = zs(k);
    A = integral (@(t) 2 * t .* (1 - t.^2).^(1-d) ./ ...
                  sqrt (f (x * (1 - t.^2)) .* (1 - (1 - t.^2).^(2*d-2))), ...
                  0, sqrt (1 - eps / x), o{:});
    S(k) = 2 * x^(2-d) * A / 4;
  endfor
endfunction
