## Copyright (C) 2026 The holent developers.
## SPDX-License-Identifier: GPL-3.0-or-later

## -*- texinfo -*-
## @deftypefn {} {@var{th} =} btz_thermodynamics (@var{name}, @var{value}, @dots{})
## Thermodynamics of the BTZ black hole and the CFT data of its state.
##
## The state is given by exactly one pair of name/value options, each value
## an array (the two, and the circumference, broadcast against each other):
## @table @asis
## @item @qcode{"r_plus"}, @qcode{"r_minus"}
## outer and inner horizon radii in units of ell, r_plus > 0,
## |r_minus| <= r_plus (the sign of r_minus is the sense of rotation);
## @item @qcode{"T"}, @qcode{"Omega"}
## temperature T > 0 and boundary velocity |Omega| < 1;
## @item @qcode{"T_L"}, @qcode{"T_R"}
## temperatures of the L0 and Lbar0 sectors, >= 0 and not both 0;
## @item @qcode{"beta_L"}, @qcode{"beta_R"}
## their inverses, > 0; Inf for a sector at zero temperature;
## @item @qcode{"M"}, @qcode{"J"}
## energy on the boundary circle and angular momentum, |J| <= M ell
## (|J| <= M L/(2 pi) on a circle of circumference L).
## @end table
##
## Other options: @qcode{"c"} (central charge, default 1 unless @qcode{"G"}
## is given), @qcode{"G"} and @qcode{"ell"} (Newton constant and AdS radius,
## default ell = 1; Brown-Henneaux c = 3 ell/(2G)), @qcode{"circumference"}
## (circumference L of the boundary circle, default 2 pi ell; an array
## broadcasts with the pair).
##
## Conventions (ell = 1, L = 2 pi):
## @example
## M = (r_+^2 + r_-^2)/(8G),  J = r_+ r_-/(4G),  S = pi r_+/(2G),
## T = (r_+^2 - r_-^2)/(2 pi r_+),  Omega = r_-/r_+,
## T_L = (r_+ + r_-)/(2 pi),  T_R = (r_+ - r_-)/(2 pi),
## beta_L = beta (1 - Omega),  beta_R = beta (1 + Omega).
## @end example
## On a circle of circumference L the radii (in units of ell), J, S, Omega,
## L0, Lbar0 and the heat capacities are unchanged while M, T, T_L, T_R and
## F scale as 2 pi ell/L; see @file{doc/btz_thermodynamics.md}.
##
## @var{th} is a struct with fields, each of the broadcast size:
## @code{r_plus}, @code{r_minus}, @code{M}, @code{J}, @code{T}, @code{Omega},
## @code{Omega_J} (= 2 pi Omega/L, the angular velocity conjugate to J),
## @code{T_L}, @code{T_R}, @code{S} (Bekenstein-Hawking entropy), @code{F}
## (grand potential M - T S - Omega_J J, which is M - T S - Omega J for
## ell = 1, L = 2 pi), @code{C_Omega}, @code{C_J} (heat capacities
## T dS/dT at fixed Omega and fixed J), @code{horizon_length} (2 pi r_+, in
## units of ell), @code{L0}, @code{Lbar0} (M L/(2 pi) = L0 + Lbar0 - c/12,
## J = L0 - Lbar0), @code{F_thermal_ads} (thermal AdS at the same T and
## Omega: -pi c/(6 L)), @code{saddle} (@qcode{"btz"} when F < F_thermal_ads,
## else @qcode{"thermal_ads"}; a cell array unless the input is scalar) and
## the scalars @code{c}, @code{G}, @code{ell} and @code{circumference} (of
## the broadcast size when an array was given, else scalar).
##
## Extremal states (T = 0, |Omega| = 1, |J| = M ell) are returned without
## NaN.  Errors: over-rotation |J| > M ell (@code{holent:overrotating}),
## M < -1/(8G) (@code{holent:below_vacuum}), -1/(8G) <= M < 0
## (@code{holent:conical_defect}: a conical defect, not a black hole),
## |Omega| >= 1, T <= 0 and other out-of-range values
## (@code{holent:domain}), no pair, a half pair or more than one pair
## (@code{holent:option}).
##
## @seealso{hawking_page, ads3_background, interval_entropy}
## @end deftypefn

function th = btz_thermodynamics (varargin)
  fn = "btz_thermodynamics";
  if (nargin == 0)
    print_usage ();
  endif
  pairs = {"r_plus", "r_minus", "radii";
           "T", "Omega", "T_Omega";
           "T_L", "T_R", "T_LR";
           "beta_L", "beta_R", "beta_LR";
           "M", "J", "M_J"};
  names = [pairs(:, 1)', pairs(:, 2)', {"c", "G", "ell", "circumference"}];
  o = __holent_opts__ (fn, names, varargin);

  ## Exactly one complete pair.
  touched = find (isfield (o, pairs(:, 1)) | isfield (o, pairs(:, 2)));
  if (isempty (touched))
    error ("holent:option",
           "%s: give the state by one pair: (r_plus, r_minus), (T, Omega), (T_L, T_R), (beta_L, beta_R) or (M, J)",
           fn);
  elseif (numel (touched) > 1)
    txt = arrayfun (@(k) sprintf ("(%s, %s)", pairs{k, 1:2}), touched,
                    "uniformoutput", false);
    error ("holent:option", "%s: give exactly one pair, not %s", fn,
           strjoin (txt', " and "));
  endif
  k = touched;
  [na, nb] = deal (pairs{k, 1:2});
  if (! isfield (o, na) || ! isfield (o, nb))
    given = merge (isfield (o, na), na, nb);
    other = merge (isfield (o, na), nb, na);
    error ("holent:option", "%s: '%s' needs its partner '%s'%s", fn, given,
           other, merge (strcmp (other, "Omega"), " (Omega = 0: no rotation)", ""));
  endif

  if (k == 4)
    a = __holent_array__ (fn, na, o.(na), "allow_inf");
    b = __holent_array__ (fn, nb, o.(nb), "allow_inf");
  else
    a = __holent_array__ (fn, na, o.(na));
    b = __holent_array__ (fn, nb, o.(nb));
  endif
  L = {};
  if (isfield (o, "circumference"))
    L = {__holent_array__(fn, "circumference", o.circumference)};
  endif
  sz = broadcast_size (a, b, L{:});
  if (isempty (sz))
    error ("holent:size", "%s: %s, %s and circumference must have compatible sizes",
           fn, na, nb);
  endif
  ## Scalars and arrays of the full size go to the core as they are; no
  ## circumference: 2 pi ell there.
  a = expand (a, sz);  b = expand (b, sz);  L = cellfun (@(x) expand (x, sz), L, "uniformoutput", false);

  t = __holent_thermo__ ("state", fn, pairs{k, 3}, a, b, [L{:}], o);
  ## The pair's own fields are the inputs (the core echoes them exactly;
  ## the gateway leaves them out to spare fresh memory, doc/fast_paths.md),
  ## shared with the caller, not copied; so is S for C_Omega (S is linear
  ## in T at fixed Omega) and the circumference when given.
  if (k != 4)
    t.(na) = full_size (a, sz);
    t.(nb) = full_size (b, sz);
  endif
  t.C_Omega = t.S;
  if (! isempty (L))
    t.circumference = L{1};
  endif

  th = struct ();
  for f = {"r_plus", "r_minus", "M", "J", "T", "Omega", "Omega_J", "T_L", ...
           "T_R", "S", "F", "C_Omega", "C_J", "horizon_length", "L0", ...
           "Lbar0", "F_thermal_ads"}
    th.(f{1}) = t.(f{1});
  endfor
  if (prod (sz) == 1)
    th.saddle = merge (t.btz_dominates, "btz", "thermal_ads");
  else
    ## one indexing builds the cell (no cell per state filled one by one)
    saddles = {"thermal_ads", "btz"};
    th.saddle = reshape (saddles(1 + t.btz_dominates), sz);
  endif
  th.c = t.c;
  th.G = t.G;
  th.ell = t.ell;
  th.circumference = t.circumference;
endfunction

## The size arrays broadcast to, or [] when they do not.
function sz = broadcast_size (varargin)
  nd = max (cellfun (@ndims, varargin));
  sz = ones (1, nd);
  for k = 1:numel (varargin)
    s = size (varargin{k});
    s(end+1:nd) = 1;
    for d = 1:nd
      if (s(d) != 1)
        if (sz(d) != 1 && sz(d) != s(d))
          sz = [];
          return;
        endif
        sz(d) = s(d);
      endif
    endfor
  endfor
endfunction

## X of size SZ, its elements bit for bit (repmat, not arithmetic: -0 stays).
function x = full_size (x, sz)
  if (! isequal (size (x), sz))
    x = repmat (x, sz);
  endif
endfunction

function x = expand (x, sz)
  if (! isscalar (x) && ! isequal (size (x), sz))
    x = x + zeros (sz);
  endif
endfunction

%!test
%! ## Banados, Teitelboim and Zanelli 1992 (PRL 69, 1849), ell = 1:
%! ## M = (r_+^2 + r_-^2)/(8G), J = r_+ r_-/(4G), S = 2 pi r_+/(4G),
%! ## T = (r_+^2 - r_-^2)/(2 pi r_+), Omega = r_-/r_+ (from memory).
%! G = 0.01;  rp = [1.5 2 3];  rm = [0.5 -1 0];
%! th = btz_thermodynamics ("r_plus", rp, "r_minus", rm, "G", G);
%! assert (th.c, 150, 1e-12);
%! assert (th.M, (rp.^2 + rm.^2) / (8 * G), 1e-12);
%! assert (th.J, rp .* rm / (4 * G), 1e-12);
%! assert (th.S, pi * rp / (2 * G), 1e-12);
%! assert (th.T, (rp.^2 - rm.^2) ./ (2 * pi * rp), 1e-14);
%! assert (th.Omega, rm ./ rp, 1e-15);
%! assert (th.T_L, (rp + rm) / (2 * pi), 1e-15);
%! assert (th.T_R, (rp - rm) / (2 * pi), 1e-15);
%! assert (th.horizon_length, 2 * pi * rp, 1e-14);
%! assert (th.F, th.M - th.T .* th.S - th.Omega .* th.J, 1e-10);
%! assert (th.saddle, {"btz", "btz", "btz"});

%!test
%! ## Every pair gives the same state (ell = 2, circumference 5).
%! o = {"c", 24, "ell", 2, "circumference", 5};
%! a = btz_thermodynamics ("r_plus", 1.3, "r_minus", -0.4, o{:});
%! b = btz_thermodynamics ("T", a.T, "Omega", a.Omega, o{:});
%! c = btz_thermodynamics ("T_L", a.T_L, "T_R", a.T_R, o{:});
%! d = btz_thermodynamics ("beta_L", 1 / a.T_L, "beta_R", 1 / a.T_R, o{:});
%! e = btz_thermodynamics ("M", a.M, "J", a.J, o{:});
%! for s = {b, c, d, e}
%!   for f = {"r_plus", "r_minus", "M", "J", "T", "Omega", "S", "F", "C_J", "L0", "Lbar0"}
%!     assert (s{1}.(f{1}), a.(f{1}), 1e-12 * max (1, abs (a.(f{1}))));
%!   endfor
%! endfor
%! ## beta_L = beta (1 - Omega), beta_R = beta (1 + Omega) (doc/conventions.md)
%! assert (1 / a.T_L, (1 - a.Omega) / a.T, 1e-13);
%! assert (1 / a.T_R, (1 + a.Omega) / a.T, 1e-13);

%!test
%! ## Extremal: T = 0, |J| = M ell, no NaN.
%! th = btz_thermodynamics ("M", [0.3 0.3], "J", [0.3 -0.3], "c", 12);
%! assert (th.T, [0 0]);
%! assert (th.Omega, [1 -1]);
%! assert (th.C_J, [0 0]);
%! v = struct2cell (rmfield (th, "saddle"));
%! assert (! any (isnan ([v{:}])));
%! assert (th.saddle, {"thermal_ads", "thermal_ads"});
%! th = btz_thermodynamics ("beta_L", 2, "beta_R", Inf);
%! assert ([th.T, th.T_R, th.Omega], [0 0 1]);

%!test
%! ## Broadcasting and shapes; scalar saddle is a string.
%! th = btz_thermodynamics ("T", [0.1; 0.2; 0.5], "Omega", [0 0.5]);
%! assert (size (th.S), [3 2]);
%! assert (iscellstr (th.saddle) && isequal (size (th.saddle), [3 2]));
%! th = btz_thermodynamics ("T", 1, "Omega", 0);
%! assert (ischar (th.saddle));
%! th = btz_thermodynamics ("T", zeros (0, 3), "Omega", 0);
%! assert (size (th.M), [0 3]);

%!error <Invalid call> btz_thermodynamics ()
%!error <one pair> btz_thermodynamics ("c", 2)
%!error <exactly one pair, not \(T, Omega\) and \(M, J\)> btz_thermodynamics ("T", 1, "Omega", 0, "M", 1, "J", 0)
%!error <'T' needs its partner 'Omega'> btz_thermodynamics ("T", 1)
%!error <'J' needs its partner 'M'> btz_thermodynamics ("J", 1)
%!error id=holent:overrotating btz_thermodynamics ("M", 1, "J", 1.1)
%!error id=holent:conical_defect btz_thermodynamics ("M", -0.01, "J", 0)
%!error id=holent:below_vacuum btz_thermodynamics ("M", -1, "J", 0, "c", 3)
%!error id=holent:domain btz_thermodynamics ("T", 1, "Omega", -1)
%!error id=holent:option btz_thermodynamics ("T", 1, "Omega", 0, "r_plus", 1)
%!error <^btz_thermodynamics: J\(2\) = 1.1 is over-rotating> btz_thermodynamics ("M", [1 1], "J", [0 1.1])
%!error <conical defect> btz_thermodynamics ("M", -0.01, "J", 0, "c", 12)
%!error <below the AdS3 vacuum> btz_thermodynamics ("M", -2, "J", 0, "c", 12)
%!error <massless BTZ> btz_thermodynamics ("M", 0, "J", 0)
%!error <Omega\(1\) = 1 must lie in \(-1, 1\)> btz_thermodynamics ("T", 1, "Omega", 1)
%!error <T\(1\) = 0 must be positive> btz_thermodynamics ("T", 0, "Omega", 0)
%!error <T\(1\) = -1 must be positive> btz_thermodynamics ("T", -1, "Omega", 0)
%!error <must be nonnegative> btz_thermodynamics ("T_L", -1, "T_R", 1)
%!error <r_minus\(1\) = 2 exceeds r_plus> btz_thermodynamics ("r_plus", 1, "r_minus", 2)
%!error <r_plus\(1\) = 0 must be positive> btz_thermodynamics ("r_plus", 0, "r_minus", 0)
%!error <beta_L\(1\) = 0 and beta_R\(1\) = 1 must be positive> btz_thermodynamics ("beta_L", 0, "beta_R", 1)
%!error <NaN> btz_thermodynamics ("beta_L", NaN, "beta_R", 1)
%!error <NaN> btz_thermodynamics ("M", NaN, "J", 0)
%!error <finite> btz_thermodynamics ("M", Inf, "J", 0)
%!error <complex> btz_thermodynamics ("T", 1i, "Omega", 0)
%!error <numeric array> btz_thermodynamics ("T", "1", "Omega", 0)
%!error <numeric array> btz_thermodynamics ("beta_L", true, "beta_R", 1)
%!error <compatible sizes> btz_thermodynamics ("T", [1 2], "Omega", [0 0 0])
%!error <circumference must be positive> btz_thermodynamics ("T", 1, "Omega", 0, "circumference", 0)
%!error <disagrees> btz_thermodynamics ("T", 1, "Omega", 0, "c", 1, "G", 1)
%!error <unknown option> btz_thermodynamics ("T", 1, "Omega", 0, "beta", 1)
%!error <overflows> btz_thermodynamics ("r_plus", 1e200, "r_minus", 0)
