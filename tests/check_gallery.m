## SPDX-License-Identifier: GPL-3.0-or-later
## Every figure of the README gallery rendered headless (hidden figures,
## print -dpng), then read back: each PNG has the size asked for and shows
## the palette's roles (common practice for checking rendered figures:
## look for the drawn colours).

%!test
%! d = fileparts (which ("check_gallery"));
%! addpath (fullfile (d, "..", "doc", "gallery"));
%! out = tempname ();
%! unwind_protect
%!   files = render_gallery (out);
%!   assert (numel (files), 15);
%!   teal = [5 110 120];  amber = [230 143 31];
%!   for k = 1:numel (files)
%!     img = double (imread (files{k}));
%!     assert (size (img)(1:2), [400 480]);
%!     px = reshape (img(:,:,1:3), [], 3);
%!     near = @(c) any (sum (abs (px - c), 2) < 60);
%!     ## every picture but the phase diagram draws a surface and regions
%!     if (isempty (strfind (files{k}, "phase")))
%!       assert (near (teal), files{k});
%!       assert (near (amber), files{k});
%!       if (! isempty (strfind (files{k}, "bcft")))
%!         assert (near ([92 112 51]), files{k});    # olive: the brane
%!       endif
%!     else
%!       assert (near ([140 189 179]) && near ([242 204 140]), files{k});
%!     endif
%!   endfor
%! unwind_protect_cleanup
%!   confirm_recursive_rmdir (false, "local");
%!   if (exist (out, "dir"))
%!     rmdir (out, "s");
%!   endif
%! end_unwind_protect
