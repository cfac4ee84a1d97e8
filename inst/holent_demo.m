## Copyright (C) 2026 The holent developers.  GPL-3.0-or-later; see COPYING.

## -*- texinfo -*-
## @deftypefn {} {} holent_demo ()
## Run the built-in demonstration scenario and print its tables.
##
## The scenario (invented for the demonstration): a CFT with c = 24 on a
## circle of circumference 2 pi, cutoff 1e-4, heated from below to above
## the Hawking-Page temperature T = 1/(2 pi); for each state the
## single-interval entropies across the circle, with the entanglement
## plateau of the BTZ black hole.
## @end deftypefn
function holent_demo ()
  c = 24;  L = 2 * pi;  eps = 1e-4;
  printf ("holent demo: c = %g, circle of circumference %.4g, cutoff %g\n\n", c, L, eps);
  states = {
    "vacuum",  {};
    "heavy",   {"h", 0.5};
    "thermal", {"T", 0.1};
    "thermal", {"T", 0.5};
    "rotating", {"T", 0.5, "Omega", 0.6}};
  printf ("%-10s %-22s %-14s %10s %10s\n", "state", "parameters", "bulk", "S_BH", "alpha");
  bgs = cell (rows (states), 1);
  for k = 1:rows (states)
    bgs{k} = ads3_background (states{k,1}, "circle", "c", c, "cutoff", eps, states{k,2}{:});
    p = states{k,2};
    ps = "";
    for j = 1:2:numel (p)
      ps = [ps sprintf("%s=%g ", p{j}, p{j+1})];
    endfor
    printf ("%-10s %-22s %-14s %10.4f %10.4f\n", states{k,1}, ps, bgs{k}.bulk,
            bgs{k}.S_BH, bgs{k}.alpha);
  endfor

  l = L * [0.05 0.25 0.5 0.75 0.9 0.95 1.0];
  printf ("\nSingle-interval RT entropy S(l) (* = complement + horizon wins)\n");
  printf ("%-24s", "l / L");
  printf ("%9.2f ", l / L);
  printf ("\n");
  for k = 1:numel (bgs)
    [S, br] = interval_entropy (bgs{k}, l);
    printf ("%-24s", sprintf ("%s %s", states{k,1}, bgs{k}.bulk));
    for j = 1:numel (l)
      printf ("%8.3f%s ", S(j), ifelse_ (br(j), "*", " "));
    endfor
    printf ("\n");
  endfor

  bg = bgs{4};
  printf ("\nGeodesic lengths in %s between x1 = 0 and x2, both homotopy classes\n", bg.bulk);
  x2 = [0.5 1 2 3 4];
  printf ("%-12s", "x2");  printf ("%10.3f", x2);  printf ("\n");
  printf ("%-12s", "positive");  printf ("%10.3f", geodesic_length (bg, 0, x2, "class", "positive"));  printf ("\n");
  printf ("%-12s", "negative");  printf ("%10.3f", geodesic_length (bg, 0, x2, "class", "negative"));  printf ("\n");
endfunction

function r = ifelse_ (c, a, b)
  if (c) r = a; else r = b; endif
endfunction

%!test
%! s = evalc ("holent_demo ()");
%! assert (! isempty (strfind (s, "btz")));
%! assert (! isempty (strfind (s, "thermal_ads")));
