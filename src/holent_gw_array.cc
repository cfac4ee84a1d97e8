// holent_gw_array.cc: result arrays that Octave takes over without a copy.
// Octave 7 built without std::pmr (Debian's) copies every numeric mxArray
// a MEX file returns into a new Octave array and frees the original: two
// fresh blocks and a copy per result column, which for many large columns
// (btz_thermodynamics: 14 of 10^6) costs more than the arithmetic
// (doc/fast_paths.md).  An Octave array wrapped as an mxArray is handed
// back as it is.  C++ because the wrapping constructor is Octave's own
// (mxarray.h); the gateways stay plain C.
// The elements are taken from operator new without being touched: an
// NDArray of a size (Array's own allocator) zero-fills every element,
// one pass over fresh memory before the core starts, which for 1e8
// elements is a pause of seconds that no poll can interrupt; untouched,
// the pages are first written inside the core's polled slabs.
// SPDX-License-Identifier: GPL-3.0-or-later
#include <memory>

#include <octave/oct.h>
#include <octave/mxarray.h>

// Octave's C MEX API (mexproto.h cannot be included beside mxarray.h)
extern "C" int mexCallMATLAB (int, mxArray **, int, mxArray **, const char *);
extern "C" mxArray *mxCreateNumericArray (mwSize, const mwSize *, mxClassID,
                                          mxComplexity);

#include "holent_gw_array.h"

extern "C" mxArray *
holent_gw_result_like (const mxArray *a)
{
  mwSize nd = a->get_number_of_dimensions ();
  const mwSize *d = a->get_dimensions ();
  // Small results: a registered plain mxArray, whose copy on return costs
  // less than the call below (the fixed cost of a scalar call counts).
  if (a->get_number_of_elements () <= 4096)
    return mxCreateNumericArray (nd, d, mxDOUBLE_CLASS, mxREAL);
  dim_vector dv = dim_vector::alloc (nd < 2 ? 2 : nd);
  dv(0) = dv(1) = 1;
  for (mwSize k = 0; k < nd; k++)
    dv(k) = d[k];
  // Array adopts a block from operator new (std::allocator) and frees it
  // the same way; elements left unset: the caller writes every one.
  double *p = std::allocator<double> ().allocate (dv.safe_numel ());
  NDArray x (Array<double> (p, dv));
  // The gateways use the separate-complex API (mxGetPr): not interleaved.
  // An mxArray made with new is unknown to the MEX call's bookkeeping, so
  // it would outlive the call and keep the block: a leak of every result.
  // mxDuplicateArray would register a copy.  Octave's identity "double"
  // called through mexCallMATLAB returns a registered mxArray that shares
  // the value (a reference, no copy of the data); the MEX call frees it
  // once Octave holds the value.
  mxArray *w = new mxArray (false, octave_value (x));
  mxArray *r = NULL;
  try
    {
      mexCallMATLAB (1, &r, 1, &w, "double");
    }
  catch (...)   // e.g. a pending Ctrl-C: the wrapper must not leak
    {
      delete w;
      throw;
    }
  delete w;
  return r;
}
