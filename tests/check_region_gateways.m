## SPDX-License-Identifier: GPL-3.0-or-later
## The compiled gateways of the region and wedge functions fed bad input
## directly, modes included: they return or raise a holent: error, never
## crash (common practice for MEX code).

%!test
%! ## The gateways of rt_entropy (modes "entropy" and "parties") and of
%! ## wedge_cross_section, called directly with bad input in every slot:
%! ## they must return or raise a holent: error, never crash.
%! bgc = ads3_background ("thermal", "circle", "beta", 1);
%! bgl = ads3_background ("vacuum", "line");
%! bad = {[], zeros(0, 2), zeros(3, 0), 1, NaN, Inf, [0 NaN], [0 Inf], ...
%!        [1e308 -1e308], [0 1; 0.5 2], [2 1], [1 1], [0 1 2], rand(2, 2, 2), ...
%!        1 + 2i, [0 1i], sparse([0 1]), int8([0 1]), single([0 1]), ...
%!        true(1, 2), "ab", "", {}, {[0 1], "x"}, {[0 1], {[2 3]}}, {NaN}, ...
%!        {zeros(0, 2)}, {[0 1]; [2 1]}, struct(), struct("a", {1, 2}), @sin, ...
%!        setfield(bgc, "bulk", 7), setfield(bgc, "cutoff", -1), ...
%!        setfield(bgc, "circumference", NaN), rmfield(bgc, "beta_L"), [bgc, bgc]};
%! ids = {};
%! calls = 0;
%! for i = 1:numel (bad)
%!   x = bad{i};
%!   args = {{"entropy", "fn", "A", bgc, x}, {"entropy", "fn", "A", bgl, x}, ...
%!           {"entropy", "fn", "A", x, [0 1]}, {"entropy", x, "A", bgl, [0 1]}, ...
%!           {"entropy", "fn", x, bgl, [0 1]}, {"parties", "fn", {"A"}, false, 2 * pi, {x}}, ...
%!           {"parties", "fn", {"A"}, false, x, {[0 1]}}, {x, bgl, [0 1]}, {"entropy", "fn", "A", bgl}, ...
%!           {"parties", "fn", {"A"}, x, 2 * pi, {[0 1]}}};
%!   for a = 1:numel (args)
%!     try
%!       [~, ~, ~] = __holent_rt__ (args{a}{:});
%!     catch err
%!       ids{end+1} = err.identifier;
%!     end_try_catch
%!     calls++;
%!   endfor
%!   for a = {{bgl, x, [2 3]}, {bgl, [0 1], x}, {x, [0 1], [2 3]}, {bgc, x, x}}
%!     try
%!       [~, ~, ~, ~, ~, ~, ~] = __holent_ewcs__ ("pairs", "fn", a{1}{:});
%!     catch err
%!       ids{end+1} = err.identifier;
%!     end_try_catch
%!     calls++;
%!   endfor
%! endfor
%! assert (calls > 400);
%! assert (numel (ids) > 300);
%! ok = strncmp (ids, "holent:", 7);
%! assert (all (ok), "non-holent identifiers: %s", strjoin (unique (ids(! ok)), ", "));
