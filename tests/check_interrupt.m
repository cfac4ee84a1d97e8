## SPDX-License-Identifier: GPL-3.0-or-later
## Ctrl-C and progress on long calls, checked on a real octave-cli
## session: SIGINT is sent to it (tests/interrupt_session.sh) while a long
## call runs, as Ctrl-C at the prompt does: a batch of rt_entropy regions,
## and one large region minimised by the cubic DP (the general path, polled
## inside its table), which has no batch boundary to stop at.

%!function [lat, out] = session (setup, long, after, delay)
%! sh = file_in_loadpath ("interrupt_session.sh");
%! q = @(s) ["'" strrep(s, "'", "'\\''") "'"];   # for the shell
%! cmd = sprintf ("bash %s %s %s %s %s %g", sh, q (pkg ("local_list")),
%!                q (setup), q (long), q (after), delay);
%! [st, out] = system (cmd);
%! assert (st, 0, out);
%! lat = number_after (out, "LATENCY");
%!endfunction

%!function v = number_after (out, word)
%! ## the numbers printed after WORD (first occurrence); [] if none
%! t = regexp (out, [word ' ([-+.\deE ]+)'], "tokens", "once");
%! v = [];
%! if (! isempty (t))
%!   v = sscanf (t{1}, "%f")';
%! endif
%!endfunction

%!function setup = calibrated (seconds)
%! ## a batch of BTZ regions of 400 intervals, as many as make the call
%! ## last about SECONDS uninterrupted (measured on 16 of them first)
%! setup = sprintf (["bg = ads3_background ('thermal', 'circle', 'beta', 1); " ...
%!   "rand ('seed', 1); A = reshape (sort (rand (800, 1)) * 2 * pi, 2, [])'; " ...
%!   "t = tic (); rt_entropy (bg, repmat ({A}, 1, 16)); per = toc (t) / 16; " ...
%!   "K = min (4e5, ceil (%g / per)); C = repmat ({A}, 1, K); keep = 42; " ...
%!   "printf ('READY %%g %%d\\n', per * K, K);"], seconds);
%!endfunction

%!test
%! ## Ctrl-C 3 s into a batch that would run about 60 s: the prompt is back
%! ## within a fraction of a second (the limit below is generous for a
%! ## loaded machine), the call left no result, the workspace is intact,
%! ## and the same session computes again.  The interactive session shows
%! ## a progress line, erased when the call stops.
%! [lat, out] = session (calibrated (60), "S = rt_entropy (bg, C);",
%!   "printf ('AGAIN %d %d %.15g %.15g\\n', keep, exist ('S', 'var'), rt_entropy (bg, [0 1]), interval_entropy (bg, 1));", 3);
%! est = number_after (out, "READY")(1);
%! assert (est > 20, "the batch is too short to test an interrupt: %g s", est);
%! printf ("  Ctrl-C latency %.3f s (call would take %.0f s)\n", lat, est);
%! assert (lat < 3, out);
%! back = number_after (out, "BACK");
%! assert (back < 10, out);
%! again = number_after (out, "AGAIN");
%! assert (again(1:2), [42 0]);
%! assert (again(3), again(4), 1e-12 * abs (again(4)));
%! ## the progress line was shown (after 2 s) and erased with blanks
%! assert (! isempty (regexp (out, "rt_entropy: +\\d+% done")), out);
%! assert (! isempty (regexp (out, "\r +\r")), out);

%!test
%! ## Progress: never in a non-interactive run by default, always with
%! ## holent_progress ("on").
%! oct = [OCTAVE_HOME() "/bin/octave-cli"];
%! run = @(pre) system (sprintf ("%s --norc --no-history --quiet --eval \"%s\" 2>&1", oct,
%!   ["pkg ('local_list', '" pkg("local_list") "'); pkg load holent; " pre " " ...
%!    strrep(calibrated (9), "READY", "N") " S = rt_entropy (bg, C); disp (numel (S))"]));
%! [st, out] = run ("");
%! assert (st, 0, out);
%! assert (isempty (strfind (out, "% done")), out);
%! [st, out] = run ("holent_progress ('on');");
%! assert (st, 0, out);
%! assert (! isempty (regexp (out, "rt_entropy: +\\d+% done, about \\d+ s left")), out);

%!function setup = calibrated_dp (seconds)
%! ## one region on the BTZ circle for the cubic DP (the method "dp" of the
%! ## region gateway), with as many intervals as make it last about SECONDS:
%! ## n = 400 is timed first and n scaled as the DP's n^3 (an underestimate
%! ## once the table leaves the cache); at most 2000 intervals (~200 MB of
%! ## tables).  Endpoints on a jittered grid, far above the cutoff.
%! setup = sprintf (["bg = ads3_background ('thermal', 'circle', 'beta', 1, 'cutoff', 1e-7); " ...
%!   "dp = @(A) __holent_rt__ ('entropy', 'rt_entropy', 'A', bg, A, 'dp'); " ...
%!   "rand ('seed', 2); mk = @(n) reshape (((0:2*n-1)' + 0.5 + 0.4 * (rand (2*n, 1) - 0.5)) * pi / n, 2, [])'; " ...
%!   "A0 = mk (400); dp (A0); t = tic (); dp (A0); per = toc (t); " ...
%!   "n = min (2000, ceil (400 * (%g / per)^(1/3))); A = mk (n); keep = 42; " ...
%!   "printf ('READY %%g %%d\\n', per * (n / 400)^3, n);"], seconds);
%!endfunction

%!test
%! ## Ctrl-C 1.5 s into ONE region minimised by the cubic DP (issue 10: a
%! ## single long region, not only a batch, must stop): the prompt is back
%! ## within a fraction of a second, the call left no result, the workspace
%! ## is intact, and the same session's DP agrees with the O(n^2) sweep on
%! ## a smaller region afterwards (doc/rt_fast.md).
%! [lat, out] = session (calibrated_dp (30), "S = dp (A);",
%!   "printf ('AGAIN %d %d %.15g %.15g\\n', keep, exist ('S', 'var'), dp (A0), rt_entropy (bg, A0));", 1.5);
%! ready = number_after (out, "READY");
%! assert (numel (ready), 2, out);
%! assert (ready(1) > 3, "the DP region is too short to test an interrupt: %g s (n = %d)", ready);
%! printf ("  Ctrl-C latency %.3f s (one DP region of %d intervals, about %.0f s)\n",
%!         lat, ready(2), ready(1));
%! assert (lat < 3, out);
%! ## the call ran until the interrupt (it did not fail at once) and stopped
%! back = number_after (out, "BACK");
%! assert (back > 1 && back < 10, out);
%! again = number_after (out, "AGAIN");
%! assert (again(1:2), [42 0]);
%! assert (again(3), again(4), 1e-12 * abs (again(4)));

%!test
%! ## Ctrl-C 1.5 s into the min-cuts of a graph model (a 60 x 60 lattice,
%! ## thirteen parties on its boundary: 8191 cuts, several seconds even on
%! ## an idle machine): the prompt is back quickly,
%! ## no result, the workspace intact, and the session computes again (a
%! ## single cut of the lattice against its value by hand: the shortest
%! ## separating set of unit edges, common practice).
%! setup = ["k = 60; id = reshape (1:k*k, k, k); " ...
%!   "E = [reshape(id(1:end-1,:), [], 1), reshape(id(2:end,:), [], 1); reshape(id(:,1:end-1), [], 1), reshape(id(:,2:end), [], 1)]; " ...
%!   "w = ones (rows (E), 1); b = [id(1,:), id(2:end,end)', id(end,end-1:-1:1), id(end-1:-1:2,1)']; " ...
%!   "lab = zeros (k*k, 1); lab(b) = 1 + floor ((0:numel(b)-1) * 13 / numel (b)); " ...
%!   "l4 = lab; l4(l4 > 4) = 0; mincut_entropy_vector (E, w, l4); t = tic (); mincut_entropy_vector (E, w, l4); " ...
%!   "est = toc (t) / 15 * 8191; keep = 42; printf ('READY %g %d\\n', est, sum (lab == 1));"];
%! [lat, out] = session (setup, "S = mincut_entropy_vector (E, w, lab);",
%!   "l1 = lab; l1(l1 > 1) = 2; printf ('AGAIN %d %d %.15g\\n', keep, exist ('S', 'var'), mincut_entropy_vector (E, w, l1)(1));", 1.5);
%! ready = number_after (out, "READY");
%! assert (numel (ready), 2, out);
%! [est, m] = deal (ready(1), ready(2));
%! assert (est > 3, "the min-cuts are too short to test an interrupt: %g s", est);
%! printf ("  Ctrl-C latency %.3f s (8191 min-cuts, about %.0f s)\n", lat, est);
%! assert (lat < 3, out);
%! back = number_after (out, "BACK");
%! assert (back > 1 && back < 10, out);
%! again = number_after (out, "AGAIN");
%! assert (again(1:2), [42 0]);
%! ## party 1 is the first m vertices of the top row (m = 19 here); cutting
%! ## it off from the rest of the boundary takes the m edges below it and
%! ## the one edge after its last vertex: 1 + m unit edges
%! assert (m, 19);
%! assert (again(3), m + 1);

%!function setup = calibrated_vectorised (seconds)
%! ## Three long vectorised calls, each sized to last about SECONDS
%! ## uninterrupted, from the faster of two timed runs of a smaller one
%! ## (fresh result memory included; the faster run, so that a burst of
%! ## load during the timing does not shorten the long call below the
%! ## interrupt): interval_entropy on the BTZ circle (the static kernel,
%! ## at most 1e8 lengths: 0.8 GB in, 0.8 GB out), geodesic_length with
%! ## times after a global quench (the slowest covariant kernel of the time
%! ## path, at most 2e7 pairs) and find_transition over many separations
%! ## (one root find each, at most 1e7).
%! setup = sprintf (["bg = ads3_background ('thermal', 'circle', 'beta', 1); " ...
%!   "q = ads3_background ('quench', 'circle', 'beta', 1); vac = ads3_background ('vacuum', 'line'); " ...
%!   "l = linspace (1e-3, 2*pi, 4e6); interval_entropy (bg, l(1:1e3)); " ...
%!   "t = tic (); interval_entropy (bg, l); a = toc (t); t = tic (); interval_entropy (bg, l); per = min (a, toc (t)) / 4e6; " ...
%!   "n1 = min (1e8, ceil (%g / per)); est1 = per * n1; l = linspace (1e-3, 2*pi, n1); " ...
%!   "x = linspace (0.05, 3, 2e5); x0 = zeros (size (x)); geodesic_length (q, 0, 1, 't', 0.3); " ...
%!   "t = tic (); geodesic_length (q, x0, x, 't', 0.3); a = toc (t); t = tic (); geodesic_length (q, x0, x, 't', 0.3); per = min (a, toc (t)) / 2e5; " ...
%!   "n2 = min (2e7, ceil (%g / per)); est2 = per * n2; x = linspace (0.05, 3, n2); x0 = zeros (size (x)); " ...
%!   "d = linspace (0.1, 1, 5000); find_transition ('mutual_information', vac, 1, 1); " ...
%!   "t = tic (); find_transition ('mutual_information', vac, d, d); a = toc (t); t = tic (); find_transition ('mutual_information', vac, d, d); per = min (a, toc (t)) / 5000; " ...
%!   "n3 = min (1e7, ceil (%g / per)); est3 = per * n3; d = linspace (0.1, 1, n3); " ...
%!   "keep = 42; printf ('READY %%g %%g %%g %%d %%d %%d\\n', est1, est2, est3, n1, n2, n3);"],
%!   seconds, seconds, seconds);
%!endfunction

%!test
%! ## Ctrl-C 1 s into each of three long vectorised calls in one session:
%! ## the static interval kernel over up to 1e8 lengths (polled between
%! ## slabs of 2^20 values), the time path's geodesic kernel on a quench
%! ## (slabs of 4096 pairs) and a vector of root finds (slabs of 8).  Each prompt is back
%! ## within a fraction of a second (the limit below is generous for a
%! ## loaded machine), no result was assigned, the workspace is intact, and
%! ## the same session computes again, against closed forms: the BTZ
%! ## interval entropy (c/3) log((beta/(pi eps)) sinh(pi l/beta)) below the
%! ## plateau (Ryu and Takayanagi 2006, PRL 96, 181602), the boosted BTZ
%! ## geodesic log((beta/(pi eps))^2 (sinh^2(pi x/beta) - sinh^2(pi t/beta)))
%! ## (Hubeny, Rangamani and Takayanagi 2007, JHEP 07, 062), and the vacuum
%! ## mutual-information transition of two intervals of length l at the
%! ## separation (sqrt(2) - 1) l (Headrick 2010, PRD 82, 126010).
%! long = sprintf ("%s\n", "S = interval_entropy (bg, l);",
%!   "G = geodesic_length (q, x0, x, 't', 0.3);",
%!   "X = find_transition ('mutual_information', vac, d, d);");
%! after = ["printf ('AGAIN %d %d %d %d', keep, exist ('S', 'var'), exist ('G', 'var'), exist ('X', 'var')); " ...
%!   "r = [0.1 0.5 1.5]; printf (' %.15g', interval_entropy (bg, r), bg.c / 3 * log (bg.beta / (pi * bg.cutoff) * sinh (pi * r / bg.beta)), " ...
%!   "geodesic_length (bg, [0 0], [0.3 1.2], 't1', 0, 't2', 0.1), log ((bg.beta / (pi * bg.cutoff))^2 * (sinh (pi * [0.3 1.2] / bg.beta).^2 - sinh (pi * 0.1 / bg.beta)^2)), " ...
%!   "find_transition ('mutual_information', vac, [0.3 2], [0.3 2]), [0.3 2] * (sqrt (2) - 1)); printf ('\\n');"];
%! [lat, out] = session (calibrated_vectorised (6), long, after, 1);
%! ready = number_after (out, "READY");
%! assert (numel (ready), 6, out);
%! est = ready(1:3);
%! printf ("  Ctrl-C latency %.3f %.3f %.3f s (calls of about %.1f %.1f %.1f s: %d lengths, %d pairs, %d root finds)\n",
%!         lat, ready);
%! ## the interval kernel is capped at 1e8 lengths (memory): on an idle
%! ## machine that is about 3 s, still well past the interrupt at 1 s
%! assert (all (est > 1.8), "the vectorised calls are too short to test an interrupt: %g %g %g s", est);
%! assert (numel (lat), 3, out);
%! assert (all (lat < 3), out);
%! ## each call ran until its interrupt (it did not fail at once) and stopped
%! back = cellfun (@str2double, regexp (out, 'BACK ([\d.]+)', "tokens"));
%! assert (numel (back), 3, out);
%! assert (all (back > 0.9 & back < est - 0.5), out);
%! again = number_after (out, "AGAIN");
%! assert (again(1:4), [42 0 0 0]);
%! v = again(5:end);
%! assert (v(1:3), v(4:6), 1e-12 * max (abs (v(4:6))));
%! assert (v(7:8), v(9:10), 1e-12 * max (abs (v(9:10))));
%! assert (v(11:12), v(13:14), 1e-10);
