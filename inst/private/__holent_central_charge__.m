## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.
## -*- texinfo -*-
## @deftypefn {} {[@var{c}, @var{G}, @var{ell}] =} __holent_central_charge__ (@var{fn}, @var{opts})
## Central charge, Newton constant and AdS radius from the options struct
## @var{opts} (fields @code{c}, @code{G}, @code{ell}, each optional):
## ell defaults to 1, c to 1 unless G is given; Brown-Henneaux
## c = 3 ell/(2G).  Giving c and G that disagree raises
## @code{holent:inconsistent}.
## @end deftypefn
function [c, G, ell] = __holent_central_charge__ (fn, o)
  ell = 1;
  if (isfield (o, "ell"))
    ell = __holent_scalar__ (fn, "ell", o.ell, "positive");
  endif
  if (isfield (o, "G"))
    G = __holent_scalar__ (fn, "G", o.G, "positive");
    c = 3 * ell / (2 * G);
    if (isfield (o, "c"))
      cc = __holent_scalar__ (fn, "c", o.c, "positive");
      if (abs (cc - c) > 1e-12 * c)
        error ("holent:inconsistent",
               "%s: c = %g disagrees with 3 ell/(2G) = %g (Brown-Henneaux)",
               fn, cc, c);
      endif
    endif
  else
    c = 1;
    if (isfield (o, "c"))
      c = __holent_scalar__ (fn, "c", o.c, "positive");
    endif
    G = 3 * ell / (2 * c);
  endif
endfunction
