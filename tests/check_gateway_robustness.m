## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Robustness of every compiled gateway: whatever it is given (wrong
## types, complex, sparse, empty, integer classes, logical, NaN/Inf, huge
## values, malformed background structs, wrong arity), a gateway must raise
## an Octave error or return; it must never crash the session.  A crash
## aborts this file, and tests/run_all.sh then reports the run as failed.
## This is common practice for MEX code, not a published check.

%!function names = gateway_names ()
%!  d = fileparts (which ("__holent_interval__"));
%!  f = [dir(fullfile (d, "__holent_*__.mex")); dir(fullfile (d, "__holent_*__.oct"))];
%!  names = unique (regexprep ({f.name}, '\.(mex|oct)$', ''));
%!endfunction

%!function vals = bad_values ()
%!  bg = ads3_background ("thermal", "circle", "beta", 1);
%!  b1 = bg;  b1.bulk = 7;
%!  b2 = bg;  b2.cutoff = "x";
%!  b3 = bg;  b3.beta_L = NaN;
%!  b4 = rmfield (bg, "alpha");
%!  b5 = bg;  b5.bulk = "no_such_bulk";
%!  b6 = bg;  b6.cutoff = -1;
%!  b7 = bg;  b7.circumference = [1 2];
%!  b8 = bg;  b8.bulk = repmat ("x", 1, 5000);
%!  vals = {[], zeros(0, 3), 1, -1, 0, NaN, Inf, -Inf, 1e308, realmin, ...
%!          [1 2; 3 4], rand(3, 2, 2), 1 + 2i, sparse([1 0 2]), int8(3), ...
%!          uint64(7), single(0.5), true, [true false], "abc", "", {}, {1, 2}, ...
%!          struct(), struct("a", {1, 2}), @sin, bg, [bg, bg], b1, b2, b3, ...
%!          b4, b5, b6, b7, b8, [0 1; 0.5 2], [0 7], 1:1e5, -(1:10)};
%!endfunction

%!test
%! names = gateway_names ();
%! assert (numel (names) >= 2);
%! vals = bad_values ();
%! bg = ads3_background ("vacuum", "circle");
%! ncalls = 0;
%! for k = 1:numel (names)
%!   g = str2func (names{k});
%!   for nargs = 0:6
%!     try, g (vals{1:min (nargs, end)}); catch, end_try_catch
%!   endfor
%!   for i = 1:numel (vals)
%!     for j = [1, 3, 5, 9, 13, 18, 20, 27, 37, numel(vals)]
%!       for args = {{vals{i}}, {vals{i}, vals{j}}, {bg, vals{i}, vals{j}}, ...
%!                   {vals{i}, vals{j}, vals{j}, vals{i}}, {bg, vals{i}, vals{j}, vals{i}, vals{j}}}
%!         try
%!           [~] = g (args{1}{:});
%!         catch
%!         end_try_catch
%!         try
%!           [~, ~, ~] = g (args{1}{:});
%!         catch
%!         end_try_catch
%!         ncalls += 2;
%!       endfor
%!     endfor
%!   endfor
%! endfor
%! assert (ncalls > 1000);

%!test
%! ## Errors from the gateways carry holent: identifiers.
%! try
%!   __holent_interval__ ("entropy", "f", 1, 2);
%!   error ("no error raised");
%! catch err
%!   assert (strncmp (err.identifier, "holent:", 7), err.identifier);
%! end_try_catch
%! try
%!   __holent_geodesic__ ("length", "f", ads3_background ("vacuum", "line"), 1i, 1, 0);
%!   error ("no error raised");
%! catch err
%!   assert (err.identifier, "holent:type");
%! end_try_catch

## Large results are Octave arrays handed back without a copy
## (src/holent_gw_array.cc); each must be released with the variable that
## holds it.  Forty calls on 2e6 values (16 MB a result) that leaked would
## raise the resident size by 640 MB; the bound allows for the allocator's
## slack.  Linux only (/proc); common practice, not a published check.
## The values read back are checked against the thermal interval entropy
## (c/3) log((beta/(pi eps)) sinh(pi l/beta) (Calabrese and Cardy 2004,
## J. Stat. Mech. P06002) and the length 6/c times it (Ryu and Takayanagi
## 2006, PRL 96, 181602).
%!test
%! if (exist ("/proc/self/statm", "file"))
%!   bg = ads3_background ("thermal", "line", "beta", 0.7);
%!   l = linspace (0.1, 3, 2e6).';
%!   rss = @() 4096 * str2double (strsplit (strtrim (fileread ("/proc/self/statm"))){2});
%!   S = interval_entropy (bg, l);
%!   G = geodesic_length (bg, zeros (size (l)), l);
%!   r0 = rss ();
%!   for k = 1:20
%!     S = interval_entropy (bg, l);
%!     G = geodesic_length (bg, zeros (size (l)), l);
%!   endfor
%!   assert (rss () - r0 < 160e6);
%!   ## the results are the values written by the core, not shared blanks
%!   assert (S(end), (bg.c / 3) * log ((0.7 / (pi * bg.cutoff)) * sinh (pi * 3 / 0.7)), 1e-12 * S(end));
%!   assert (G, (6 / bg.c) * S, 1e-12 * max (abs (G)));
%! endif
