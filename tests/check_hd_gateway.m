## SPDX-License-Identifier: GPL-3.0-or-later
## Cross-checks of the __holent_hd__ and __holent_hdbg__ gateways: bad
## input must raise an error naming the public function (FN, the second
## input), never crash Octave (common practice for MEX gateways).

%!shared bg, bt
%! bg = ads_background (4, "black_brane", "zh", 1);
%! z = linspace (0, 1.2, 200)';
%! bt = ads_background (4, "tabulated", "z", z, "f", 1 - z.^4);

%!error <MODE must be> __holent_hd__ (1, "f", bg, 1, 1)
%!error <FN must be> __holent_hd__ ("strip", 1, bg, 1, 1)
%!error <^f: MODE: unknown mode 'area'> __holent_hd__ ("area", "f", bg, 1, 1)
%!error <expected 5 to 7 inputs> __holent_hd__ ("strip", "f", bg)
%!error <f: method: must be "auto", "exact" or "series"> __holent_hd__ ("strip", "f", bg, 1, 1, [], "fast")
%!error <expected 3 to 3 inputs> __holent_hd__ ("velocity", "f", bg, 1)
%!error <^f: BG: has no horizon> __holent_hd__ ("velocity", "f", ads_background (4, "vacuum"))
%!error <expected 4 to 5 inputs> __holent_hd__ ("ball", "f", bg, 1, {"R"}, 1)
%!error <real, full, double> __holent_hd__ ("strip", "f", bg, 1i, 1)
%!error <real, full, double> __holent_hd__ ("strip", "f", bg, sparse (1), 1)
%!error <real, full, double> __holent_hd__ ("strip", "f", bg, int8 (1), 1)
%!error <real, full, double> __holent_hd__ ("ball", "f", bg, true)
%!error <length must be a scalar> __holent_hd__ ("strip", "f", bg, 1, [1 2])
%!error <scalar struct> __holent_hd__ ("strip", "f", [bg bg], 1, 1)
%!error <field 'kind' is missing> __holent_hd__ ("strip", "f", rmfield (bg, "kind"), 1, 1)
%!error <unknown kind 'foam'> __holent_hd__ ("strip", "f", setfield (bg, "kind", "foam"), 1, 1)
%!error <BG.dimension: must be an integer> __holent_hd__ ("strip", "f", setfield (bg, "dimension", 1e6), 1, 1)
%!error <inconsistent parameters> __holent_hd__ ("strip", "f", setfield (bg, "zh", -1), 1, 1)
%!error <differ in length> __holent_hd__ ("strip", "f", setfield (bt, "table", setfield (bt.table, "spline", setfield (bt.table.spline, "g", bt.table.spline.g(1:end-1)))), 1, 1)
%!error <from BG.table.spline.z> __holent_hd__ ("strip", "f", setfield (bt, "table", setfield (bt.table, "spline", setfield (bt.table.spline, "z", flipud (bt.table.spline.z)))), 1, 1)
%!error <inconsistent parameters> __holent_hd__ ("strip", "f", setfield (bt, "table", setfield (bt.table, "spline", setfield (bt.table.spline, "g2", NaN * bt.table.spline.g2))), 1, 1)
%!error <be the background's horizon> __holent_hd__ ("strip", "f", setfield (bt, "zh", 0.9), 1, 1)
%!error <^f: L\(2\) = -1 must be positive> __holent_hd__ ("strip", "f", bg, [1 -1], 1)
%!error <^f: B\(1\) = -1 must be positive> __holent_hd__ ("strip", "f", bg, [1 2 -1 4], 1, {"A", "B"})
%!error <beyond the largest radius> __holent_hd__ ("ball", "f", bt, 1e3)
%!error <unknown mode 'tabulated'> __holent_hd__ ("tabulated", "f", 4, [0 1 2 3 4])
%!test
%! ## the identifier of a status (the protocol's one table)
%! try
%!   __holent_hd__ ("ball", "f", bt, 1e3);
%! catch err
%!   assert (err.identifier, "holent:reach");
%!   assert (strncmp (err.message, "f: R(1) = 1000 is beyond", 24));
%! end_try_catch

%!test
%! ## empty input, and outputs of the input's shape
%! [S, fin] = __holent_hd__ ("strip", "f", bg, zeros (3, 0), 1);
%! assert (size (S), [3 0]);
%! [S, fin, del, zs, reach] = __holent_hd__ ("ball", "f", bg, [0.1; 0.2]);
%! assert (size (zs), [2 1]);
%! assert (reach > 0.2);

## a huge dimension is refused before any conversion to int (the cast
## used to overflow: undefined behaviour, flagged by UBSan)
%!error <f: D: must be an integer> __holent_hdbg__ ("vacuum", "f", 1e300, 1, 1, 1e-3)
%!error <f: D: must be an integer> __holent_hdbg__ ("vacuum", "f", -1e300, 1, 1, 1e-3)
%!error <f: D: must be an integer> __holent_hdbg__ ("vacuum", "f", 2^31, 1, 1, 1e-3)
%!error <unknown kind 'foam'> __holent_hdbg__ ("foam", "f", 4, 1, 1, 1e-3)
%!error <shell_width: must be .= 0 and finite> __holent_hdbg__ ("vaidya", "f", 4, 1, 1, 1e-3, -1, "black_brane", "zh", 1)
