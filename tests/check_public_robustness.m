## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## Robustness of every public function (all of INDEX but holent_demo):
## whatever it is given, a call must either return or raise an error whose
## identifier starts with "holent:" (or is Octave's "Octave:invalid-fun-call"
## for a wrong number of arguments), and a call given a value that is
## plainly invalid for that argument must raise such an error, with a
## message that starts with the function's name and names the argument.
## A crash of Octave aborts this file and tests/run_all.sh reports the run
## as failed.  Validating every argument is common practice, not a
## published check.
##
## Data-driven: rob_table lists, per function, valid argument lists and
## the kind of each argument; rob_values is a table of labelled bad values
## and rob_mustfail says, per kind, which labels must be rejected.  Every
## labelled value is put in every argument position of every valid call.

%!function V = rob_values ()
%!  ## {label, value}: the values put in every argument position.
%!  b = ads3_background ("thermal", "circle", "beta", 1);
%!  h = ads_background (4, "black_brane", "zh", 1);
%!  z = linspace (0, 1.2, 40)';
%!  t = ads_background (4, "tabulated", "z", z, "f", 1 - z.^4);
%!  V = {"char", "abc"; "emptystr", ""; "char2", ["ab"; "cd"]; ...
%!       "cell", {1, 2}; "emptycell", {}; "cellcell", {{[0 1]}}; ...
%!       "cellbad", {[0 1], "ab"}; "cellnan", {[0 1], [0 NaN]}; ...
%!       "cell3d", {[0 1]; 0.1 + rand(1, 2, 2)}; "cellcplx", {[0 1i]}; ...
%!       "struct", struct("a", 1); "emptystruct", struct(); ...
%!       "structarr", struct("a", {1, 2}); "fh", @sin; ...
%!       "logical", true; "logicalvec", [true false]; ...
%!       "int8", int8(3); "uint64", uint64(7); "single", single(0.5); ...
%!       "int8neg", int8(-3); "singlevec", single([0.1 0.2]); ...
%!       "complex", 1 + 2i; "complexvec", [0.5, 1+1i]; ...
%!       "sparse", sparse(0.5); "sparsevec", sparse([1 0 2]); ...
%!       "e00", []; "e02", zeros(0, 2); "e20", zeros(2, 0); ...
%!       "nan", NaN; "nanvec", [0.5 NaN]; "inf", Inf; "ninf", -Inf; ...
%!       "infvec", [0.5 Inf]; "neg", -1; "zero", 0; ...
%!       "huge", 1e308; "hugevec", [1e308 -1e308]; "tiny", 1e-308; ...
%!       "nd3", 0.1 + rand(2, 2, 2); "col3", [0 0.1 0.2; 0.3 0.4 0.5]; ...
%!       "vec", [0.1 0.2 0.3]; "rev", [0.5 0.2]; "overlap", [0 1; 0.5 2]; ...
%!       "bg3", b; "bghd", h; "bgtab", t; ...
%!       "bg3arr", [b, b]; "bg3miss", rmfield(b, "alpha"); ...
%!       "bg3bulk", setfield(b, "bulk", 7); ...
%!       "bg3unk", setfield(b, "bulk", "no_such_bulk"); ...
%!       "bg3long", setfield(b, "bulk", repmat ("x", 1, 5000)); ...
%!       "bg3cut", setfield(b, "cutoff", "x"); ...
%!       "bg3negcut", setfield(b, "cutoff", -1); ...
%!       "bg3nan", setfield(b, "beta_L", NaN); ...
%!       "bg3vec", setfield(b, "circumference", [1 2]); ...
%!       "bg3cplx", setfield(b, "c", 1i); ...
%!       "bg3bnd", setfield(b, "boundary", 3); ...
%!       "bg3line", setfield(b, "boundary", "line"); ...
%!       "bg3hor", setfield(b, "horizon", "yes"); ...
%!       "bg3sbh", setfield(b, "S_BH", {1}); ...
%!       "bg3single", setfield(b, "cutoff", single(1e-6)); ...
%!       "bg3alpha", setfield(b, "alpha", 2); ...
%!       "bg3pure", rmfield(b, "pure"); ...
%!       "hdarr", [h, h]; "hdmiss", rmfield(h, "kind"); ...
%!       "hdkind", setfield(h, "kind", 3); ...
%!       "hdunk", setfield(h, "kind", "foam"); ...
%!       "hddim", setfield(h, "dimension", 2.5); ...
%!       "hdzh", setfield(h, "zh", -1); ...
%!       "hdcut", setfield(h, "cutoff", "x"); ...
%!       "hdell", setfield(h, "ell", [1 2]); ...
%!       "hdG", setfield(h, "G", NaN); ...
%!       "hdz", setfield(t, "table", setfield(t.table, "samples", setfield(t.table.samples, "z", flipud(t.table.samples.z)))); ...
%!       "hdf", setfield(t, "table", setfield(t.table, "samples", setfield(t.table.samples, "f", t.table.samples.f(1:end-1))))};
%!endfunction

%!function F = rob_mustfail (kind, labels)
%!  ## Logical mask over LABELS: which values an argument of KIND must reject.
%!  bgs = labels(strncmp (labels, "bg", 2) | strncmp (labels, "hd", 2));
%!  nonnum = [{"char", "emptystr", "char2", "cell", "emptycell", "cellcell", ...
%!             "cellbad", "cellnan", "cell3d", "cellcplx", ...
%!             "struct", "emptystruct", "structarr", "fh", "logical", ...
%!             "logicalvec"}, bgs];
%!  bad = {"complex", "complexvec", "nan", "nanvec"};
%!  infs = {"inf", "ninf", "infvec"};
%!  nonscal = {"e00", "e02", "e20", "nd3", "col3", "vec", "rev", "overlap", ...
%!             "sparsevec", "logicalvec", "singlevec", "nanvec", "infvec", ...
%!             "complexvec", "hugevec"};
%!  scal = [nonnum, bad, infs, nonscal];
%!  nonpos = {"neg", "zero", "int8neg", "ninf", "sparsevec", "hugevec"};
%!  switch (kind)
%!    case {"word", "optname", "names"}
%!      f = labels;
%!    case "bg3"
%!      f = setdiff (labels, {"bg3"});
%!    case "bghd"
%!      f = setdiff (labels, {"bghd", "bgtab"});
%!    case "pos"          # a positive finite scalar
%!      f = [scal, nonpos];
%!    case "nonneg"       # a nonnegative finite scalar
%!      f = [scal, {"neg", "int8neg", "ninf"}];
%!    case "open11"       # a scalar in (-1, 1)
%!      f = [scal, {"neg", "huge", "int8", "uint64", "int8neg"}];
%!    case "unit"         # a scalar in (0, 1]
%!      f = [scal, nonpos, {"huge", "int8", "uint64"}];
%!    case "weight"       # h in [0, c/24)
%!      f = [scal, {"neg", "int8neg", "huge", "int8", "uint64"}];
%!    case "dim"          # an integer from 2 to 12
%!      f = [scal, nonpos, {"huge", "tiny", "single", "sparse"}];
%!    case "bool"         # true, false, 0 or 1
%!      f = [setdiff(scal, {"logical"}), {"neg", "int8neg", "huge", "tiny", ...
%!           "int8", "uint64", "single"}];
%!    case "coords"       # a finite real array
%!      f = [nonnum, bad, infs];
%!    case "lens"         # a positive finite array
%!      f = [nonnum, bad, infs, nonpos];
%!    case "reals"        # a finite real array (may be negative)
%!      f = [nonnum, bad, infs];
%!    case "omegas"       # an array in (-1, 1)
%!      f = [nonnum, bad, infs, {"neg", "huge", "hugevec", "int8", "uint64", "int8neg"}];
%!    case "betas"        # a positive array, Inf (zero temperature) allowed
%!      f = [nonnum, bad, nonpos];
%!    case "temps"        # a nonnegative finite array (0: an extremal sector)
%!      f = [nonnum, bad, infs, {"neg", "int8neg", "hugevec"}];
%!    case "region"       # an n x 2 region or a cell of them
%!      f = [setdiff(nonnum, {"emptycell", "cellcell"}), bad, infs, ...
%!           {"neg", "zero", "huge", "tiny", "int8", "uint64", "int8neg", ...
%!            "single", "sparse", "sparsevec", "hugevec", ...
%!            "nd3", "col3", "vec", "overlap", "e20"}];
%!    case "parties"      # a non-empty cell of regions
%!      f = setdiff (labels, {"cellcell"});
%!    case "radiation"    # an n x 2 matrix of rows on x >= 0; an end may be Inf
%!      f = [nonnum, bad, {"inf", "ninf"}, ...
%!           {"neg", "zero", "huge", "tiny", "int8", "uint64", "int8neg", ...
%!            "single", "sparse", "sparsevec", "hugevec", "e00", "e02", ...
%!            "nd3", "col3", "vec", "overlap", "e20"}];
%!    case "pairs"        # one interval [start, end] or a cell of them (an
%!                        # empty cell: an empty batch, doc/conventions.md)
%!      f = [setdiff(nonnum, {"emptycell"}), bad, infs, {"neg", "zero", "huge", ...
%!           "tiny", "int8", "uint64", "int8neg", "single", "sparse", "sparsevec", ...
%!           "hugevec", "nd3", "col3", "vec", "e00", "e02", "e20", "overlap"}];
%!    case "edges"        # the 2 x 2 edge list of the valid call: nothing else fits
%!      f = labels;
%!    case "weights2"     # two nonnegative finite weights
%!      f = setdiff (labels, {"rev", "singlevec"});
%!    case "labels3"      # three integer labels 0 .. N+1 using parties 1, 2
%!      f = setdiff (labels, {"sparsevec"});
%!    case "all"          # nothing else fits (a 1 x 7 matrix, a certificate)
%!      f = labels;
%!    case "side"         # a cell of regions of parties 1..4, or 7 coefficients
%!      f = setdiff (labels, {"cell", "emptycell"});
%!    case "svec"         # an entropy vector of 2^N - 1 entries
%!      f = [nonnum, bad, infs, {"e00", "e02", "e20", "nd3", "col3", "hugevec"}];
%!    otherwise
%!      error ("rob_mustfail: unknown kind %s", kind);
%!  endswitch
%!  F = ismember (labels, f);
%!endfunction

%!function T = rob_table ()
%!  ## {function, arguments, kinds ("kind:NAME" per argument, "" = leave)}
%!  bc = ads3_background ("thermal", "circle", "beta", 1, "c", 12);
%!  bl = ads3_background ("vacuum", "line");
%!  bp = ads3_background ("vacuum", "line", "cutoff", 1e-3);
%!  bh = ads_background (4, "black_brane", "zh", 1);
%!  bv = ads_background (3, "vacuum");
%!  z = linspace (0, 1.2, 40)';
%!  Sv = entropy_vector (bc, {[0 1], [2 3], [4 4.5]});
%!  bb = ads3_background ("bcft", "half_line", "tension", 0.3);
%!  bi = ads3_background ("bcft", "interval", "length", 5, "tension", [0.1 0.3], "beta", 1);
%!  bt = ads3_background ("bcft_tfd", "half_line", "beta", 2, "tension", 0.5);
%!  [~, cert] = contraction_proof ({[1 2], [2 3], [1 3]}, {1, 2, 3, [1 2 3]}, 3);
%!  ## time-dependent states: a thermofield double (with a shock from an
%!  ## energy), a quench, a boosted vacuum; a two-sided region
%!  bf = ads3_background ("tfd", "line", "beta", 1);
%!  bs = ads3_background ("tfd", "line", "beta", 1, "shock_energy", 1e-3, "shock_time", 1);
%!  bq = ads3_background ("quench", "circle", "beta", 1);
%!  bg = ads3_background ("vacuum", "circle");
%!  A2 = struct ("left", [0 1], "right", [0 1]);
%!  ## figures draw into hidden axes (the gnuplot toolkit works headless)
%!  ax = findobj (0, "tag", "holent_rob_axes");
%!  if (isempty (ax))
%!    ax = axes ("parent", figure ("visible", "off"), "tag", "holent_rob_axes");
%!  endif
%!  T = {
%!   "ads3_background", {"thermal", "circle", "beta", 2, "c", 12, "cutoff", 1e-4}, ...
%!     {"word:STATE", "word:BOUNDARY", "optname:", "pos:beta", "optname:", "pos:c", "optname:", "pos:cutoff"};
%!   "ads3_background", {"rotating", "circle", "beta", 1, "Omega", 0.2, "saddle", "btz", "circumference", 3}, ...
%!     {"", "", "", "pos:beta", "", "open11:Omega", "", "word:saddle", "", "pos:circumference"};
%!   "ads3_background", {"rotating", "line", "beta_L", 1, "beta_R", 2, "G", 0.1, "ell", 2}, ...
%!     {"", "", "", "pos:beta_L", "", "pos:beta_R", "", "pos:G", "", "pos:ell"};
%!   "ads3_background", {"heavy", "circle", "alpha", 0.5}, {"", "", "", "unit:alpha"};
%!   "ads3_background", {"heavy", "circle", "h", 0.01}, {"", "", "", "weight:h"};
%!   "ads3_background", {"thermal", "line", "T", 2}, {"", "", "", "pos:T"};
%!   "geodesic_length", {bc, 0.1, [0.5 1], "class", "positive"}, ...
%!     {"bg3:BG", "coords:X1", "coords:X2", "optname:", "word:class"};
%!   "geodesic_length", {bl, [0 1], [2 3]}, {"bg3:BG", "coords:X1", "coords:X2"};
%!   "interval_entropy", {bc, [0.5 1]}, {"bg3:BG", "lens:L"};
%!   "interval_entropy", {bl, 2}, {"bg3:BG", "lens:L"};
%!   "rt_entropy", {bc, [0 1; 2 3]}, {"bg3:BG", "region:A"};
%!   "rt_entropy", {bl, {[0 1], [0 1; 2 3]}}, {"bg3:BG", "region:A"};
%!   "mutual_information", {bc, [0 1], [2 3]}, {"bg3:BG", "region:A", "region:B"};
%!   "conditional_entropy", {bl, [0 1], {[2 3]; [4 5]}}, {"bg3:BG", "region:A", "region:B"};
%!   "tripartite_information", {bc, [0 1], [2 3], [4 5]}, ...
%!     {"bg3:BG", "region:A", "region:B", "region:C"};
%!   "entropy_vector", {bc, {[0 1], [2 3]}, "purifier", true}, ...
%!     {"bg3:BG", "parties:PARTIES", "optname:", "bool:purifier"};
%!   "entropy_inequalities", {Sv, "tol", 1e-9, "names", {"a", "b", "c"}, "complete", true}, ...
%!     {"svec:SVEC", "optname:", "nonneg:tol", "optname:", "names:names", "optname:", "bool:complete"};
%!   "wedge_cross_section", {bp, [0 1], [2 3], "reflected", true}, ...
%!     {"bg3:BG", "pairs:A", "pairs:B", "optname:", "bool:reflected"};
%!   "btz_thermodynamics", {"T", [0.5 1], "Omega", 0.2, "c", 12, "circumference", 3}, ...
%!     {"optname:", "lens:T", "optname:", "omegas:Omega", "optname:", "pos:c", "optname:", "lens:circumference"};
%!   "btz_thermodynamics", {"r_plus", [1 2], "r_minus", 0.5, "G", 0.1, "ell", 2}, ...
%!     {"optname:", "lens:r_plus", "optname:", "reals:r_minus", "optname:", "pos:G", "optname:", "pos:ell"};
%!   "btz_thermodynamics", {"beta_L", 1, "beta_R", 2}, {"", "betas:beta_L", "", "betas:beta_R"};
%!   "btz_thermodynamics", {"T_L", 1, "T_R", 2}, {"", "temps:T_L", "", "temps:T_R"};
%!   "btz_thermodynamics", {"M", 1, "J", 0.5}, {"", "reals:M", "", "reals:J"};
%!   "hawking_page", {"circumference", 3, "Omega", 0.2, "T", 0.5}, ...
%!     {"optname:", "lens:circumference", "optname:", "omegas:Omega", "optname:", "lens:T"};
%!   "hawking_page", {"beta_L", 1, "beta_R", [2 3], "c", 6}, ...
%!     {"optname:", "lens:beta_L", "optname:", "lens:beta_R", "optname:", "pos:c"};
%!   "hawking_page", {"beta", 2, "G", 0.1, "ell", 2}, ...
%!     {"optname:", "lens:beta", "optname:", "pos:G", "optname:", "pos:ell"};
%!   "ads_background", {4, "black_brane", "zh", 1, "cutoff", 1e-4}, ...
%!     {"dim:D", "word:KIND", "optname:", "pos:zh", "optname:", "pos:cutoff"};
%!   "ads_background", {3, "vacuum", "ell", 2, "G", 0.5}, {"", "", "", "pos:ell", "", "pos:G"};
%!   "ads_background", {5, "black_brane", "T", 0.3}, {"", "", "", "pos:T"};
%!   "ads_background", {4, "tabulated", "z", z, "f", 1 - z.^4}, ...
%!     {"", "", "optname:", "coords:z", "optname:", "coords:f"};
%!   "strip_entropy", {bh, [0.5 1], "length", 2}, {"bghd:BG", "lens:L", "optname:", "pos:length"};
%!   "strip_entropy", {bv, 0.5}, {"bghd:BG", "lens:L"};
%!   "ball_entropy", {bh, [0.5 1]}, {"bghd:BG", "lens:R"};
%!   "ball_entropy", {bv, 0.5}, {"bghd:BG", "lens:R"};
%!   "holent_progress", {"auto"}, {"word:MODE"};
%!   "strip_mutual_information", {bh, 0.5, 0.1, 0.5, "length", 2}, ...
%!     {"bghd:BG", "lens:L1", "lens:S", "lens:L2", "optname:", "pos:length"};
%!   "entanglement_velocity", {bh}, {"bghd:BG"};
%!   "butterfly_velocity", {bh}, {"bghd:BG"};
%!   "ads3_background", {"bcft", "half_line", "tension", 0.3, "beta", 1, "cutoff", 1e-4}, ...
%!     {"", "", "", "open11:tension", "", "pos:beta", "", "pos:cutoff"};
%!   "ads3_background", {"bcft", "interval", "length", 2, "log_g", [0.1 0.2], "T", 3}, ...
%!     {"", "", "", "pos:length", "", "", "", "pos:T"};
%!   "rt_entropy", {bb, [0 1; 2 3]}, {"bg3:BG", "region:A"};
%!   "rt_entropy", {bi, {[0 1], [2 3; 4 5]}}, {"bg3:BG", "region:A"};
%!   "interval_entropy", {bi, [0.5 1], "at", 1}, {"bg3:BG", "lens:L", "", ""};
%!   "mutual_information", {bb, [0 1], [2 3]}, {"bg3:BG", "region:A", "region:B"};
%!   "page_curve", {bt, [1 2; 3 Inf], [0 1]}, {"bg3:BG", "radiation:R", "reals:t"};
%!   "brane_profile", {bb, [0.1 0.2]}, {"bg3:BG", "lens:Z"};
%!   "mincut_entropy_vector", {[1 2; 2 3], [1 2], [1 0 2], "parties", 2}, ...
%!     {"edges:EDGES", "weights2:WEIGHTS", "labels3:LABELS", "optname:", "dim:parties"};
%!   "contraction_proof", {{[1 2], [2 3], [1 3]}, {1, 2, 3, [1 2 3]}, 3, "max_nodes", 1e5}, ...
%!     {"side:LHS", "side:RHS", "dim:N", "optname:", "nonneg:max_nodes"};
%!   "contraction_check", {cert}, {"all:CERT"};
%!   "entropy_cone_test", {Sv, "tol", 1e-9, "inequalities", ones(1, 7), "rays", eye(7)}, ...
%!     {"svec:S", "optname:", "nonneg:tol", "optname:", "all:inequalities", "optname:", "all:rays"};
%!   "rt_surface", {bc, [0 1; 2 3], "tol", 1e-3, "configuration", "runner_up"}, ...
%!     {"bg3:BG", "region:A", "optname:", "pos:tol", "optname:", "word:configuration"};
%!   "rt_surface", {bt, [1 2; 3 Inf], "t", 0.5}, {"bg3:BG", "radiation:A", "optname:", "reals:t"};
%!   "surface_profile", {bh, "ball", [0.5 1], "tol", 1e-3}, ...
%!     {"bghd:BG", "word:SHAPE", "lens:SIZES", "optname:", "pos:tol"};
%!   "plot_rt_surface", {ax, bc, [0 1; 2 3], "runner_up", true, "tol", 1e-3}, ...
%!     {"", "bg3:BG", "region:A", "optname:", "bool:runner_up", "optname:", "pos:tol"};
%!   "plot_surface_profile", {ax, bh, "strip", [0.5 1], "tol", 1e-3}, ...
%!     {"", "bghd:BG", "word:SHAPE", "lens:SIZES", "optname:", "pos:tol"};
%!   "plot_phase_diagram", {ax, [1 2], [1 2 3], [1 2 2; 2 2 1], "labels", {"a", "b"}}, ...
%!     {"", "coords:X", "coords:Y", "", "optname:", ""};
%!   "parameter_scan", {@(a, b) a + b, [1 2], [3 4], "workers", 1, "progress", false}, ...
%!     {"", "", "", "optname:", "pos:workers", "optname:", "bool:progress"};
%!   "find_transition", {"plateau", bc}, {"word:KIND", "bg3:BG"};
%!   "find_transition", {"mutual_information", bl, [1 2], [1 1]}, {"", "bg3:BG", "lens:L1", "lens:L2"};
%!   "find_transition", {"hawking_page", "Omega", [0 0.2], "circumference", 3}, ...
%!     {"", "optname:", "omegas:Omega", "optname:", "lens:circumference"};
%!   "find_transition", {"strip_pair", bh, 0.5, 0.5}, {"", "bghd:BG", "lens:L1", "lens:L2"};
%!   "find_transition", {"page_time", bt, [1 Inf]}, {"", "bg3:BG", "radiation:R"};
%!   "geodesic_curve", {bc, [0.5 0], [2 0.1], "tol", 1e-3}, ...
%!     {"bg3:BG", "coords:P1", "coords:P2", "optname:", "pos:tol"};
%!   "bulk_light_time", {bc, 0.1, [0.5 1], "tol", 1e-6}, ...
%!     {"bg3:BG", "coords:X1", "coords:X2", "optname:", "nonneg:tol"};
%!   "bulk_light_time", {bg, [0 1], 2}, {"bg3:BG", "coords:X1", "coords:X2"};
%!   "mi_vanishing_time", {bf, A2, "tmax", 5}, {"bg3:BG", "all:A", "optname:", "pos:tmax"};
%!   "scrambling_time", {bs, A2}, {"bg3:BG", "all:A"};
%!   "geodesic_length", {bf, 0.1, [0.5 1], "side1", "left", "t1", 0.2, "timelike", false}, ...
%!     {"bg3:BG", "coords:X1", "coords:X2", "optname:", "word:side1", "optname:", "coords:t1", "optname:", "bool:timelike"};
%!   "interval_entropy", {bq, [0.5 1], "t", [0 1]}, {"bg3:BG", "lens:L", "optname:", "coords:t"};
%!   "rt_entropy", {bf, A2, "t", [0 1]}, {"bg3:BG", "", "optname:", "coords:t"}};
%!endfunction

%!function [ok, why] = rob_try (fn, args, mustfail, argname)
%!  ## Call FN(ARGS{:}) with all its outputs; OK is false when it failed
%!  ## the wrong way.
%!  ok = true;  why = "";
%!  try
%!    out = cell (1, max (1, nargout (fn)));
%!    [out{:}] = feval (fn, args{:});
%!    if (mustfail)
%!      ok = false;  why = "returned";
%!    endif
%!  catch err
%!    id = err.identifier;
%!    if (! (strncmp (id, "holent:", 7) || strcmp (id, "Octave:invalid-fun-call")))
%!      ok = false;  why = sprintf ("id '%s': %s", id, err.message);
%!    elseif (strncmp (id, "holent:", 7) && ! strncmp (err.message, [fn ":"], numel (fn) + 1))
%!      ok = false;  why = sprintf ("message does not start with '%s:': %s", fn, err.message);
%!    elseif (mustfail && ! isempty (argname)
%!            && isempty (regexp (err.message, ['(^|\W)' regexptranslate("escape", argname) '(\W|$)'], "once")))
%!      ok = false;  why = sprintf ("message does not name %s: %s", argname, err.message);
%!    endif
%!  end_try_catch
%!endfunction

%!function s = rob_show (v)
%!  if (ischar (v) && rows (v) <= 1 && numel (v) < 30)
%!    s = ['"' v '"'];
%!  elseif (isstruct (v) || iscell (v) || isa (v, "function_handle") || numel (v) > 6)
%!    s = sprintf ("<%s %s>", class (v), mat2str (size (v)));
%!  else
%!    try
%!      s = mat2str (v);
%!    catch
%!      s = sprintf ("<%s %s>", class (v), mat2str (size (v)));
%!    end_try_catch
%!  endif
%!endfunction

%!test
%! ## Every labelled bad value in every argument position of every valid call.
%! ws = warning ("off", "all");
%! unwind_protect
%!   V = rob_values ();
%!   labels = V(:,1)';
%!   T = rob_table ();
%!   bad = {};  ncalls = 0;
%!   for r = 1:rows (T)
%!     [fn, args, kinds] = T{r,:};
%!     ## the valid call returns
%!     try
%!       [~] = feval (fn, args{:});
%!     catch err
%!       bad{end+1} = sprintf ("%s: valid call (row %d) raised: %s", fn, r, err.message);
%!     end_try_catch
%!     for p = 1:numel (args)
%!       if (isempty (kinds{p}))
%!         continue;
%!       endif
%!       kn = strsplit (kinds{p}, ":");
%!       mf = rob_mustfail (kn{1}, labels);
%!       for j = 1:numel (labels)
%!         a = args;  a{p} = V{j,2};
%!         [ok, why] = rob_try (fn, a, mf(j), kn{2});
%!         ncalls += 1;
%!         if (! ok)
%!           bad{end+1} = sprintf ("%s (row %d) arg %d (%s) = %s [%s]: %s", fn, r,
%!                                 p, kinds{p}, rob_show (V{j,2}), labels{j}, why);
%!         endif
%!       endfor
%!     endfor
%!   endfor
%! unwind_protect_cleanup
%!   warning (ws);
%! end_unwind_protect
%! assert (ncalls > 5000);
%! if (! isempty (bad))
%!   error ("%d bad calls:\n  %s", numel (bad), strjoin (bad(1:min (end, 60)), "\n  "));
%! endif

%!test
%! ## Wrong arity: too few positional arguments, one argument too many,
%! ## too many outputs; and malformed option lists.
%! ws = warning ("off", "all");
%! unwind_protect
%!   T = rob_table ();
%!   bad = {};
%!   [~, first] = unique (T(:,1), "first");
%!   for r = first'
%!     [fn, args, kinds] = T{r,:};
%!     npos = find (strncmp (kinds, "optname", 7), 1) - 1;
%!     if (isempty (npos))
%!       npos = numel (args);
%!     endif
%!     if (any (strcmp (fn, {"btz_thermodynamics", "hawking_page", "holent_progress"})))
%!       npos = 0;
%!     endif
%!     nopt = numel (args) - npos;
%!     tries = {};
%!     for k = 0:npos-1
%!       tries(end+1,:) = {args(1:k), sprintf("%d inputs", k)};
%!     endfor
%!     if (strcmp (fn, "btz_thermodynamics"))
%!       tries(end+1,:) = {{}, "no inputs"};
%!     endif
%!     tries(end+1,:) = {[args, {1}], "one input too many"};
%!     tries(end+1,:) = {[args(1:npos), {"no_such_option", 1}], "an unknown option"};
%!     tries(end+1,:) = {[args(1:npos), {1, 2}], "a numeric option name"};
%!     tries(end+1,:) = {[args(1:npos), {{"x"}, 2}], "a cell option name"};
%!     tries(end+1,:) = {[args(1:npos), {["ab"; "cd"], 2}], "a 2-row option name"};
%!     tries(end+1,:) = {[args(1:npos), {"x"}], "a lone option name"};
%!     if (nopt >= 2)
%!       tries(end+1,:) = {[args, args(npos+1:npos+2)], "a repeated option"};
%!       tries(end+1,:) = {[args, {upper(args{npos+1}), args{npos+2}}], "a repeated option in upper case"};
%!     endif
%!     for t = 1:rows (tries)
%!       [ok, why] = rob_try (fn, tries{t,1}, true, "");
%!       if (! ok)
%!         bad{end+1} = sprintf ("%s with %s: %s", fn, tries{t,2}, why);
%!       endif
%!     endfor
%!     ## too many outputs
%!     try
%!       [o1, o2, o3, o4, o5, o6] = feval (fn, args{:});
%!       bad{end+1} = sprintf ("%s: six outputs accepted", fn);
%!     catch err
%!       if (! strcmp (err.identifier, "Octave:invalid-fun-call"))
%!         bad{end+1} = sprintf ("%s with six outputs: id '%s': %s", fn, err.identifier, err.message);
%!       endif
%!     end_try_catch
%!   endfor
%! unwind_protect_cleanup
%!   warning (ws);
%! end_unwind_protect
%! if (! isempty (bad))
%!   error ("%d bad calls:\n  %s", numel (bad), strjoin (bad, "\n  "));
%! endif

%!test
%! ## Every function of INDEX (but the demo) is covered by the table.
%! T = rob_table ();
%! idx = fullfile (fileparts (which ("ads3_background")), "packinfo", "INDEX");
%! if (exist (idx, "file"))
%!   txt = fileread (idx);
%!   fns = regexp (txt, '(?m)^ (\w+)\s*$', "tokens");
%!   fns = setdiff ([fns{:}], {"holent_demo"});
%!   assert (setdiff (fns, T(:,1)'), cell (1, 0));
%! endif

%!test
%! ## The gateways behind the wrappers, with a valid MODE and each labelled
%! ## value in each later position: an error or a return, never a crash,
%! ## and an error always carries a holent: identifier.
%! ws = warning ("off", "all");
%! unwind_protect
%!   V = rob_values ();
%!   bc = ads3_background ("thermal", "circle", "beta", 1);
%!   bh = ads_background (4, "black_brane", "zh", 1);
%!   z = linspace (0, 1.2, 40)';
%!   Sv = [1 1 1.5 1 1.5 1.5 1.2];
%!   btf = ads3_background ("tfd", "line", "beta", 1, "shock_alpha", 0.5);
%!   [~, fmap] = __holent_cone__ ("prove", "contraction_proof", 3, [3; 6; 5], ones(3, 1), [1; 2; 4; 7], ones(4, 1), 0);
%!   G = {"__holent_geodesic__", {"length", "f", bc, 0.1, 0.5, 0}, 3;
%!        "__holent_interval__", {"entropy", "f", bc, [0.5 1]}, 3;
%!        "__holent_rt__", {"entropy", "rt_entropy", "A", bc, [0 1; 2 3]}, 2;
%!        "__holent_rt__", {"entropy", "rt_entropy", "A", bc, {[0 1], [2 3]}}, 2;
%!        "__holent_rt__", {"parties", "f", {"A"; "B"}, [false; false], 2 * pi, {[0 1]; [2 3]}}, 2;
%!        "__holent_ewcs__", {"pairs", "f", ads3_background("vacuum", "line"), [0 1], [2 3]}, 3;
%!        "__holent_ineq__", {"eval", "f", Sv, "cyclic", 3, 1, 1e-10}, 3;
%!        "__holent_thermo__", {"state", "btz_thermodynamics", "T_Omega", 0.5, 0.2, 2*pi, struct("c", 12)}, 2;
%!        "__holent_thermo__", {"state", "btz_thermodynamics", "M_J", [1 2], [0.5 1], [], struct("c", 12, "ell", 1)}, 2;
%!        "__holent_thermo__", {"hawking_page", "hawking_page", "Omega", [], 0.2, 2*pi, struct()}, 2;
%!        "__holent_thermo__", {"hawking_page", "hawking_page", "beta_LR", [1 2], 3, [], struct("G", 0.1)}, 2;
%!        "__holent_background__", {"ads3", "ads3_background", "rotating", "circle", struct("beta", 1, "Omega", 0.2)}, 2;
%!        "__holent_background__", {"check", "rt_entropy", bc}, 2;
%!        "__holent_background__", {"units", "hawking_page", struct("c", 6, "ell", 2)}, 2;
%!        "__holent_hd__", {"strip", "f", bh, [0.5 1], 1}, 3;
%!        "__holent_hd__", {"ball", "f", bh, 0.5}, 3;
%!        "__holent_hdbg__", {"tabulated", "f", 4, 1, 1, 1e-6, z, 1 - z.^4, 0}, 3;
%!        "__holent_cone__", {"mincut", "mincut_entropy_vector", [1 2; 2 3], [1; 2], [1; 0; 2], 2}, 2;
%!        "__holent_bcft__", {"bg", "f", "bcft", "interval", "length", 2, "cutoff", 1e-6, "beta", 1, "tension", [0.1 0.2], "c", 1, "ell", 1, "saddle", "dominant"}, 2;
%!        "__holent_bcft__", {"entropy", "rt_entropy", "A", ads3_background("bcft", "half_line"), [0 1; 2 3]}, 2;
%!        "__holent_bcft__", {"check", "f", ads3_background("bcft", "half_line"), [0 1; 2 3]}, 2;
%!        "__holent_bcft__", {"page", "f", ads3_background("bcft_tfd", "half_line", "beta", 1), [1 Inf], [0 1]}, 2;
%!        "__holent_bcft__", {"profile", "f", ads3_background("bcft", "half_line"), [0.1 0.2], 0}, 2;
%!        "__holent_cone__", {"prove", "contraction_proof", 3, [3; 6; 5], ones(3, 1), [1; 2; 4; 7], ones(4, 1), 0}, 2;
%!        "__holent_cone__", {"check", "contraction_check", 3, [3; 6; 5], ones(3, 1), [1; 2; 4; 7], ones(4, 1), fmap}, 2;
%!        "__holent_cone__", {"facets", "entropy_cone_test", 3}, 2;
%!        "__holent_time__", {"background", "f", "tfd", "circle", 1, 1.5, 1, 1e-6, 2*pi, 1, [], 1e-3, 2}, 3;
%!        "__holent_time__", {"geodesic", "f", btf, 0, 0, 0, 1, 0.5, 1, 0, 0}, 3;
%!        "__holent_time__", {"entropy", "f", btf, {struct("left", [0 1], "right", [0 1 0 0.2])}, [0 1], {"A"}}, 3;
%!        "__holent_time__", {"entropy", "f", ads3_background("quench", "line", "beta", 1), [0 1; 2 3], 1}, 3;
%!        "__holent_time__", {"light", "f", ads3_background("heavy", "circle", "alpha", 0.5), 0, [1 2], 1e-6}, 3;
%!        "__holent_time__", {"mi_zero", "f", btf, struct("left", [0 1], "right", [0 1]), 5}, 3;
%!        "__holent_time__", {"interval", "f", btf, [0.5; 1], [0; 0.1], [0 1], 1}, 3;
%!        "__holent_time__", {"scramble", "f", btf, struct("left", [0 1], "right", [0 1])}, 3};
%!   bad = {};
%!   for r = 1:rows (G)
%!     [gw, args, p0] = G{r,:};
%!     [~] = feval (gw, args{:});     # the valid call returns
%!     for p = p0:numel (args)
%!       for j = 1:rows (V)
%!         a = args;  a{p} = V{j,2};
%!         for nout = [1 5]
%!           try
%!             [o{1:nout}] = feval (gw, a{:});
%!           catch err
%!             if (! strncmp (err.identifier, "holent:", 7))
%!               bad{end+1} = sprintf ("%s row %d arg %d = [%s], %d outputs: id '%s': %s",
%!                                     gw, r, p, V{j,1}, nout, err.identifier, err.message);
%!             endif
%!           end_try_catch
%!         endfor
%!       endfor
%!     endfor
%!   endfor
%! unwind_protect_cleanup
%!   warning (ws);
%! end_unwind_protect
%! if (! isempty (bad))
%!   error ("%d bad gateway calls:\n  %s", numel (bad), strjoin (bad(1:min (end, 60)), "\n  "));
%! endif
