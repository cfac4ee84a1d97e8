## SPDX-License-Identifier: GPL-3.0-or-later
## Regressions for the region tolerances (one touching tolerance used to
## be taken from the largest coordinate of the whole region): the exact
## calls of the report, against the single-interval formula of Calabrese
## and Cardy 2004 (J. Stat. Mech. P06002), S = (c/3) log(l/eps) on the
## vacuum line, and the two-interval phases of Headrick 2010 (Phys. Rev. D
## 82, 126010).

%!shared vac, S1
%! vac = ads3_background ("vacuum", "line", "c", 3, "cutoff", 1e-9);
%! S1 = @(l) log (l / 1e-9);          # (c/3) log (l/eps) with c = 3

%!test
%! ## a 1e-6 interval (1000 cutoffs) next to one at 1e10 is not zero-length
%! assert (rt_entropy (vac, [0 1e-6; 1e10 1e10+1]), S1 (1e-6) + S1 (1), 1e-12 * 30);

%!test
%! ## A = two unit intervals 1e-6 apart: the connected phase (Headrick
%! ## 2010: cross ratio near 1) S = S1(2) + S1(1e-6), the geodesics over
%! ## the outer ends and over the gap; far away parties change nothing
%! A = [0 1; 1+1e-6 2];
%! SA = S1 (2) + S1 ((1 + 1e-6) - 1);    # the gap as the doubles hold it
%! assert (rt_entropy (vac, A), SA, 1e-12 * 30);
%! assert (rt_entropy (vac, [A; 1e10 1e10+1]), SA + S1 (1), 1e-12 * 60);
%! ## mutual information with a party 1e10 away: the disconnected phase,
%! ## I = 0 (Headrick 2010: cross ratio ~ 1e-20); it was 6.9078
%! assert (mutual_information (vac, A, [1e10 1e10+1]), 0, 1e-10);
%! ## monogamy (Hayden, Headrick and Maloney 2013, Phys. Rev. D 87,
%! ## 046003): I3 <= 0; here every pair is far apart, so I3 = 0; it was
%! ## +6.9078
%! I3 = tripartite_information (vac, A, [1e10 1e10+1], [-1e10-1 -1e10]);
%! assert (I3, 0, 1e-10);

%!test
%! ## the same call that raised "A(1,:) and A(0,:) overlap" now works
%! assert (mutual_information (vac, [0 1e-6], [1e10 1e10+1]), 0, 1e-10);

%!test
%! ## messages name the right rows and the right reason
%! try
%!   mutual_information (vac, [0 1; 5 6], [7 8; 5.5 6.5]);
%!   error ("no error");
%! catch e
%!   assert (e.identifier, "holent:overlap");
%!   assert (! isempty (strfind (e.message, "A(2,:) and B(2,:) overlap")), e.message);
%! end_try_catch
%! try
%!   rt_entropy (vac, [0 1; 3 3; 1e10 1e10+1]);
%!   error ("no error");
%! catch e
%!   assert (e.identifier, "holent:empty");
%!   assert (! isempty (strfind (e.message, "A: row 2 is a zero-length interval")), e.message);
%! end_try_catch

%!test
%! ## touching is decided at the scale of the two coordinates compared:
%! ## rows touching to rounding merge next to a far row, a true gap of
%! ## 1e-12 at 1 is kept whatever else the region holds
%! A = [0 0.1+0.2; 0.3 1];              # 0.1 + 0.2 != 0.3 in doubles
%! assert (rt_entropy (vac, [A; 1e12 1e12+1]), S1 (1) + S1 (1), 1e-11);
%! ws = warning ("off", "holent:cutoff");    # the 1e-12 gap is below the cutoff
%! [~, conf] = rt_entropy (vac, [0 1; 1+1e-12 2; 1e12 1e12+1]);
%! warning (ws);
%! assert (rows (conf.intervals), 3);

%!test
%! ## a party and the union of parties normalise the same points the same
%! ## way: I(A:B) from S(A) + S(B) - S(AB) is 0 for parties that only
%! ## touch far-away rows (Headrick 2010: distance >> lengths)
%! for k = 0:14
%!   x = 10^k;  w = max (1e-6, 1e-9 * x);
%!   I = mutual_information (vac, [0 1e-6; x x+w], [-x-2*w -x-w]);
%!   assert (I, 0, 1e-9);
%! endfor
