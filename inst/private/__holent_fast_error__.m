## SPDX-License-Identifier: GPL-3.0-or-later
## -*- texinfo -*-
## @deftypefn {} {} __holent_fast_error__ (@var{err})
## The static fast paths of the scalar wrappers (@code{geodesic_length},
## @code{rt_entropy}) call their gateway inside @code{try} without testing
## the input's type.  An error of the gateway is the answer and is raised
## again as it is, except @code{holent:type} (not a real full double),
## which returns so that the general path converts or explains; an error
## that is not the gateway's (BG not a struct with a state) returns too.
## Reached only on an error, so it costs the fast path nothing
## (doc/fast_paths.md).
## @end deftypefn
function __holent_fast_error__ (err)
  if (strncmp (err.identifier, "holent:", 7) && ! strcmp (err.identifier, "holent:type"))
    rethrow (err);
  endif
endfunction
