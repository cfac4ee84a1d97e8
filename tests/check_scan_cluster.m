## SPDX-License-Identifier: GPL-3.0-or-later
## parameter_scan over "several machines": the parallel package's cluster
## mode with one server on the loopback address (started and stopped here
## by tests/loopback_pserver.sh, which also kills it after 120 s at the
## latest), against the serial scan: the same numbers in the same places.
## Skipped, with a message, when the package or its server is missing or
## the cluster ports are taken.

%!test
%! have = ! isempty (pkg ("list", "parallel"));
%! sh = fullfile (fileparts (which ("check_scan_cluster")), "loopback_pserver.sh");
%! pid = "";
%! if (have)
%!   [st, pid] = system (sprintf ("bash '%s' start 120", sh));
%!   pid = strtrim (pid);
%!   have = st == 0 && ! isempty (pid);
%! endif
%! if (! have)
%!   printf ("check_scan_cluster: no loopback server (parallel package, octave-pserver or free ports missing): skipped\n");
%! else
%!   unwind_protect
%!     pkg load parallel
%!     c = pconnect ({"127.0.0.1"}, struct ("use_tls", false));
%!     unwind_protect
%!       ## the server loads holent from where this session has it
%!       p = unique ({fileparts(which ("rt_entropy")), fileparts(which ("__holent_rt__"))});
%!       reval (sprintf ("addpath ('%s');", strjoin (p, pathsep ())), c(2));
%!       f = @(a, b) rt_entropy (ads3_background ("thermal", "circle", "beta", b), [0 a; a + 1, 2*a + 1]);
%!       g1 = linspace (0.2, 2, 6);  g2 = [0.7 1.5 3];
%!       R0 = parameter_scan (f, g1, g2, "progress", false);
%!       R1 = parameter_scan (f, g1, g2, "cluster", c, "progress", false);
%!       assert (isequal (R0, R1));
%!       assert (size (R1), [6 3]);
%!     unwind_protect_cleanup
%!       sclose (c);
%!     end_unwind_protect
%!   unwind_protect_cleanup
%!     system (sprintf ("bash '%s' stop %s", sh, pid));
%!   end_unwind_protect
%! endif
