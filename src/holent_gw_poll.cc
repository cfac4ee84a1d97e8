// holent_gw_poll.cc: Ctrl-C check and progress line for the core's poll
// callback (see holent_gw_poll.h).  C++ because the check is Octave's
// own octave_quit (liboctave's quit.h), which the MEX API does not offer.
// SPDX-License-Identifier: GPL-3.0-or-later
#include <atomic>
#include <cmath>
#include <cstdio>
#include <string>
#include <ctime>
#include <pthread.h>

#include <octave/oct.h>
#include <octave/quit.h>
#include <octave/interpreter.h>
#include <octave/pager.h>
#include <octave/parse.h>

#include "holent_gw_poll.h"

namespace
{
  // Progress appears only for calls that have already run this long and
  // are not about to finish, and is redrawn at most this often.
  const double SHOW_AFTER = 2.0, SHOW_IF_LEFT = 1.0, REDRAW = 0.5;

  struct poll_state
  {
    pthread_t main;
    std::atomic<int> stop;
    int mode;          // progress: -1 not decided yet, 0 off, 1 on
    int shown;         // a progress line is on screen
    size_t width;      // its length, for clearing it
    double t0, last;
    char label[48];
  };

  poll_state state;

  double
  now (void)
  {
    struct timespec ts;
    clock_gettime (CLOCK_MONOTONIC, &ts);
    return ts.tv_sec + 1e-9 * ts.tv_nsec;
  }

  // holent_progress () answers "on", "off" or "auto"; "auto" (or no
  // answer) means: only in interactive sessions.  Asked only when a call
  // has run long enough to show progress.
  int
  progress_mode (void)
  {
    octave::interpreter *interp = octave::interpreter::the_interpreter ();
    if (interp == nullptr)
      return 0;
    try
      {
        octave_value_list r = octave::feval ("holent_progress",
                                             octave_value_list (), 1);
        if (r.length () > 0 && r(0).is_string ())
          {
            std::string m = r(0).string_value ();
            if (m == "on")
              return 1;
            if (m == "off")
              return 0;
          }
      }
    catch (const octave::interrupt_exception&)
      {
        state.stop.store (1);
        return 0;
      }
    catch (const octave::execution_exception&)
      {
        // not on the path (a gateway called alone): keep "auto"
      }
    return interp->interactive ();
  }

  void
  show (poll_state *s, double t, double done, double total)
  {
    double frac = done / total, el = t - s->t0;
    if (! (frac > 0.0 && frac <= 1.0))
      return;
    double left = el * (1.0 - frac) / frac;
    if (! s->shown && left < SHOW_IF_LEFT)
      return;
    if (s->mode < 0)
      s->mode = progress_mode ();
    if (s->mode == 0)
      return;
    char line[160];
    int k = std::snprintf (line, sizeof line,
                           "\r%s: %3.0f%% done, about %.0f s left (Ctrl-C "
                           "stops)  ", s->label, 100.0 * frac, std::ceil (left));
    if (k <= 0)
      return;
    octave_stdout << line;
    octave_stdout.flush ();
    s->shown = 1;
    s->width = (size_t) k;
    s->last = t;
  }

  int
  poll_fn (void *ctx, double done, double total)
  {
    poll_state *s = static_cast<poll_state *> (ctx);
    if (s->stop.load (std::memory_order_relaxed))
      return 1;
    // Only the thread that entered the gateway may talk to Octave.
    if (! pthread_equal (pthread_self (), s->main))
      return 0;
    if (octave_signal_caught)
      {
        try
          {
            octave_quit ();
          }
        catch (const octave::interrupt_exception&)
          {
            s->stop.store (1);
            return 1;
          }
        catch (...)
          {
            // Anything else Octave's signal handling raises also ends the
            // call; the gateway reports it as an interrupt.
            s->stop.store (1);
            return 1;
          }
      }
    if (s->mode != 0 && total > 0.0)
      {
        double t = now ();
        if (t - s->t0 >= SHOW_AFTER && t - s->last >= REDRAW)
          show (s, t, done, total);
      }
    return s->stop.load () != 0;
  }

  holent_poll poll_obj = { poll_fn, &state };
}

extern "C" const holent_poll *
holent_gw_poll (const char *label)
{
  holent_gw_poll_end ();
  state.main = pthread_self ();
  state.stop.store (0);
  state.mode = -1;
  state.shown = 0;
  state.width = 0;
  state.t0 = now ();
  state.last = 0.0;
  std::snprintf (state.label, sizeof state.label, "%s",
                 label != NULL && *label ? label : "holent");
  return &poll_obj;
}

extern "C" int
holent_gw_poll_stopped (void)
{
  return state.stop.load () != 0;
}

extern "C" void
holent_gw_poll_end (void)
{
  if (! state.shown)
    return;
  state.shown = 0;
  std::string blank (state.width, ' ');
  octave_stdout << '\r' << blank << '\r';
  octave_stdout.flush ();
}

extern "C" void
holent_gw_interrupt (void)
{
  holent_gw_poll_end ();
  // As octave_handle_signal does: mark the interrupt as being handled and
  // unwind to the prompt (or to the caller's unwind_protect).
  octave_interrupt_state = -1;
  throw octave::interrupt_exception ();
}
