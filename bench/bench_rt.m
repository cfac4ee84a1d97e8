## bench_rt (): time rt_entropy on a BTZ circle for n = 10, 100, 300 and
## 1000 intervals, print the measured scaling exponent, and time a
## straightforward Octave implementation of the same dynamic programme
## (written here) for n = 10 and 100, printing the ratio.
function bench_rt ()
  bg = ads3_background ("thermal", "circle", "beta", 0.5, "cutoff", 1e-6);
  L = bg.circumference;
  ns = [10 100 300 1000];
  t = zeros (size (ns));
  S = zeros (size (ns));
  rand ("seed", 1);
  regions = cell (size (ns));
  for k = 1:numel (ns)
    n = ns(k);
    ## n intervals, one in each of n equal cells, random position and length
    x = L * ((0:n-1)' + 0.1 * rand (n, 1)) / n;
    regions{k} = [x, x + L / n * (0.2 + 0.6 * rand (n, 1))];
    reps = max (1, round (3 / k));
    tic ();
    for r = 1:reps
      S(k) = rt_entropy (bg, regions{k});
    endfor
    t(k) = toc () / reps;
    printf ("rt_entropy  n = %4d  (N = %4d endpoints)  %9.4f s   S = %.6f\n",
            n, 2 * n, t(k), S(k));
  endfor
  p = polyfit (log (ns(2:end)), log (t(2:end)), 1);
  e2 = log (t(end) / t(end-1)) / log (ns(end) / ns(end-1));
  printf ("measured scaling exponent: t ~ n^%.2f (fit over n = 100..1000), n^%.2f (300 -> 1000); the DP is O(n^3)\n",
          p(1), e2);
  printf ("target n = 1000 under 1 s (the table filling runs on one core): %s (%.3f s)\n",
          ifelse_ (t(end) < 1, "met", "NOT met"), t(end));

  for k = 1:2
    n = ns(k);
    tic ();
    Sp = plain_dp (bg, regions{k});
    tp = toc ();
    printf ("plain Octave DP  n = %4d  %9.4f s  (rt_entropy %.4f s)  ratio %.0f   |dS| = %.2g\n",
            n, tp, t(k), tp / t(k), abs (Sp - S(k)));
  endfor
endfunction

## The same programme in plain Octave: endpoints on two turns of the
## circle, T(s, m+1) = least length pairing the 2m points from s, the
## pairing of s with s + 2t + 1 splitting it into (s+1, t) and
## (s+2t+2, m-1-t); the full run from g+1 is the best candidate whose
## horizon face touches the gap g; S = min(Sigma(A), Sigma(A^c) + S_BH).
function S = plain_dp (bg, A)
  L = bg.circumference;
  n = rows (A);
  s0 = mod (A(:,1), L);
  [s0, o] = sort (s0);
  e0 = s0 + mod (A(o,2) - A(o,1), L);
  q = reshape ([s0, e0]', [], 1);           # start, end, start, end ...
  N = 2 * n;
  q2 = [q; q + L];                          # two turns (ends may pass L)
  P = 2 * N;
  K = n;
  len = @(l) log (bg.beta_L * bg.beta_R / (pi^2 * bg.cutoff^2) ...
                  * sinh (pi * l / bg.beta_L) .* sinh (pi * l / bg.beta_R));
  T = Inf (P + 1, K + 1);
  T(:, 1) = 0;
  for s = P:-1:1
    mmax = min (K, floor ((P - s + 1) / 2));
    for m = 1:mmax
      tt = 0:m-1;
      j = s + 2 * tt + 1;                     # partners of s
      w = len (q2(j) - q2(s))';
      inner = T(s + 1, tt + 1);
      rest = T(sub2ind (size (T), s + 2 * tt + 2, m - tt));
      T(s, m + 1) = min (w + inner + rest);
    endfor
  endfor
  ## segment g runs from q(g) to q(g+1); odd g lie in A (q(1) is a start)
  full = T(2:N+1, K + 1);                   # run from g+1, g = 1..N
  inA = mod ((1:N)', 2) == 1;
  c6 = bg.c / 6;
  S = min (c6 * min (full(! inA)), c6 * min (full(inA)) + bg.S_BH);
endfunction

function r = ifelse_ (c, a, b)
  if (c) r = a; else r = b; endif
endfunction
