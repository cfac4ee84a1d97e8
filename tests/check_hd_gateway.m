## Cross-checks of the __holent_hd__ gateway: bad input must raise an
## error, never crash Octave (common practice for MEX gateways).

%!shared bg, bt
%! bg = ads_background (4, "black_brane", "zh", 1);
%! z = linspace (0, 1.2, 200)';
%! bt = ads_background (4, "tabulated", "z", z, "f", 1 - z.^4);

%!error <OP must be> __holent_hd__ (1, bg, 1, 1)
%!error <unknown OP> __holent_hd__ ("area", bg, 1, 1)
%!error <wrong number of inputs> __holent_hd__ ("strip", bg)
%!error <wrong number of inputs> __holent_hd__ ("velocity", bg, 1)
%!error <no horizon> __holent_hd__ ("velocity", ads_background (4, "vacuum"))
%!error <wrong number of inputs> __holent_hd__ ("ball", bg, 1, 1)
%!error <real, full, double> __holent_hd__ ("strip", bg, 1i, 1)
%!error <real, full, double> __holent_hd__ ("strip", bg, sparse (1), 1)
%!error <real, full, double> __holent_hd__ ("strip", bg, int8 (1), 1)
%!error <real, full, double> __holent_hd__ ("ball", bg, true)
%!error <LPERP must be a scalar> __holent_hd__ ("strip", bg, 1, [1 2])
%!error <scalar struct> __holent_hd__ ("strip", [bg bg], 1, 1)
%!error <field 'kind' is missing> __holent_hd__ ("strip", rmfield (bg, "kind"), 1, 1)
%!error <unknown BG.kind> __holent_hd__ ("strip", setfield (bg, "kind", "foam"), 1, 1)
%!error <BG.dimension must be an integer> __holent_hd__ ("strip", setfield (bg, "dimension", 1e6), 1, 1)
%!error <inconsistent parameters> __holent_hd__ ("strip", setfield (bg, "zh", -1), 1, 1)
%!error <differ in length> __holent_hd__ ("strip", setfield (bt, "spline", setfield (bt.spline, "g", bt.spline.g(1:end-1))), 1, 1)
%!error <from BG.spline.z> __holent_hd__ ("strip", setfield (bt, "spline", setfield (bt.spline, "z", flipud (bt.spline.z))), 1, 1)
%!error <inconsistent parameters> __holent_hd__ ("strip", setfield (bt, "spline", setfield (bt.spline, "g2", NaN * bt.spline.g2)), 1, 1)
%!error <be the background's horizon> __holent_hd__ ("strip", setfield (bt, "zh", 0.9), 1, 1)
%!error <L\(2\)> __holent_hd__ ("strip", bg, [1 -1], 1)
%!error <beyond the largest radius> __holent_hd__ ("ball", bt, 1e3)
%!error <unknown OP> __holent_hd__ ("tabulated", 4, [0 1 2 3 4])

%!test
%! ## empty input, and outputs of the input's shape
%! [S, fin] = __holent_hd__ ("strip", bg, zeros (3, 0), 1);
%! assert (size (S), [3 0]);
%! [S, fin, del, zs, reach] = __holent_hd__ ("ball", bg, [0.1; 0.2]);
%! assert (size (zs), [2 1]);
%! assert (reach > 0.2);

## a huge dimension is refused before any conversion to int (the cast
## used to overflow: undefined behaviour, flagged by UBSan)
%!error <D must be an integer> __holent_hdbg__ (1e300, "vacuum", 1, 1, 1e-3)
%!error <D must be an integer> __holent_hdbg__ (-1e300, "vacuum", 1, 1, 1e-3)
%!error <D must be an integer> __holent_hdbg__ (2^31, "vacuum", 1, 1, 1e-3)
