/* holent_strip.c: RT strips in planar AdS_{d+1}.  See holent_strip.h and
 * doc/higher_dimensional.md.  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include "holent_strip.h"
#include "holent_hd_size.h"

#define QAG_LIMIT 1000
#define QAG_EPSREL 1e-12
#define QAG_EPSABS 1e-15

/* The series (fast) path: see holent_strip.h and doc/fast_paths.md.  */
#define FIT_N0 16         /* first degree tried on a piece                */
#define FIT_NMAX 32       /* largest degree; beyond it the piece is split */
#define FIT_PMAX 48       /* most pieces                                  */
#define FIT_TOL 1e-12     /* tail of each series, relative to its scale   */
#define FIT_YSPAN 4.0     /* first piece at most this long in y          */
#define FIT_YMIN -35.0    /* z* >= 6e-16 Z: z*^d stays a normal number    */
#define FIT_NOISE 1e-12   /* tabulated data noisier than this: exact path */

/* One piece y in [a, b], x = (2y - a - b)/(b - a): Chebyshev series of
   g_K = dK/s^d, g_J = dJ/s^d (the width's and the finite area's excess
   over the vacuum at the same z*, s = z* / Z) and r = (d-2) del^(d-2) i0
   (the cutoff term, del = eps/z*), and of dg_K/dx.  */
typedef struct
{
  double a, b, la, lb;  /* y range, widths at its ends */
  int n;                /* degree */
  double c[3][FIT_NMAX + 1], dc[FIT_NMAX + 1];
  double ln[FIT_NMAX + 1];  /* widths at the nodes x_j = cos(pi j/n) */
  double dln[FIT_NMAX + 1]; /* and dl/dx there                         */
} fpiece;

typedef struct
{
  size_t np;
  double err;           /* largest tail estimate (relative) */
  fpiece p[FIT_PMAX];
} sfit;

struct holent_strip_workspace
{
  gsl_integration_workspace *iw;
  holent_hd_size_workspace *size;
  const holent_poll *poll;  /* the caller's, or NULL */
  holent_strip_method method;
  size_t nseries;           /* last call: widths taken from the series  */
  double series_err;        /* and the series' estimated error          */
  sfit *fit;
};

void
holent_strip_workspace_set_method (holent_strip_workspace *w,
                                   holent_strip_method m)
{
  if (w)
    w->method = m == HOLENT_STRIP_EXACT || m == HOLENT_STRIP_SERIES
                    ? m
                    : HOLENT_STRIP_AUTO;
}

double
holent_strip_series_error (const holent_strip_workspace *w, size_t *count)
{
  if (count)
    *count = w ? w->nseries : 0;
  return w && w->nseries ? w->series_err : NAN;
}

void
holent_strip_workspace_set_poll (holent_strip_workspace *w,
                                 const holent_poll *poll)
{
  if (w)
    w->poll = poll;
}

double
holent_strip_uv (int d, double z)
{
  /* d = 2: the limit d -> 2 of (z^(2-d) - 1)/(d - 2) */
  return d == 2 ? -log (z) : pow (z, 2 - d) / (d - 2);
}

double
holent_strip_divergence (const holent_hd_bg *bg, double Lperp)
{
  int d = bg->d;
  return 2 * pow (bg->ell, d - 1) * pow (Lperp, d - 2)
         * holent_strip_uv (d, bg->eps) / (4 * bg->G);
}

holent_strip_workspace *
holent_strip_workspace_alloc (void)
{
  holent_strip_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->iw = gsl_integration_workspace_alloc (QAG_LIMIT);
  w->size = holent_hd_size_workspace_alloc ();
  w->fit = malloc (sizeof *w->fit);
  if (!w->iw || !w->size || !w->fit)
    {
      holent_strip_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_strip_workspace_free (holent_strip_workspace *w)
{
  if (w == NULL)
    return;
  if (w->iw)
    gsl_integration_workspace_free (w->iw);
  holent_hd_size_workspace_free (w->size);
  free (w->fit);
  free (w);
}

double
holent_strip_ratio (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  return 2 * sqrt (M_PI) * gsl_sf_gamma (d * a) / gsl_sf_gamma (a);
}

double
holent_strip_vacuum_j (int d)
{
  double a = 1.0 / (2.0 * (d - 1));
  if (d == 2)  /* int_0^1 (1/sqrt(1 - u^2) - 1) du/u */
    return M_LN2;
  return sqrt (M_PI) * gsl_sf_gamma ((2.0 - d) * a)
         / (2.0 * (d - 1) * gsl_sf_gamma (a));
}

double
holent_strip_vacuum_fin (int d, double zs)
{
  /* d = 2: J is scale-free and the log of the cutoff leaves log(zs) */
  double jv = holent_strip_vacuum_j (d);
  return d == 2 ? jv + log (zs) : jv * pow (zs, 2 - d);
}


/* ------------------------------------------------------------------ */
/* Strips                                                              */

typedef struct
{
  const holent_hd_bg *bg;
  double zs, w, a, sa;
  double ftip;  /* f at the turning point */
  int pw;
  int excess;  /* weigh by 1 - sqrt(f): the integrand minus the vacuum's */
} spar;

/* The turning-point end in the variable v = 1 - u = a sinh^2(tau): the
   1/sqrt(v (v + a)) behaviour of 1/sqrt(f(z* u) (1 - u^(2d-2))) becomes
   a smooth integrand in tau (a ~ f(z*)/(|f'(z*)| z*) tracks the horizon).  */
static double
tau_integrand (double tau, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  double em = expm1 (tau), e = em + 1;
  double sh = em * (em + 2) / (2 * e), ch = 0.5 * (e + 1 / e);
  double v = q->a * sh * sh;
  if (v > 1)
    v = 1;
  double u = 1 - v, qv = 1;
  for (int k = 1; k <= 2 * bg->d - 3; k++)   /* (1 - u^(2d-2))/(1 - u) */
    qv = 1 + u * qv;
  double f = holent_hd_bg_fval (bg, q->zs * u, q->w + q->zs * v);
  if (!(f > 0))
    return NAN;
  double r = 2 * q->sa * ch / sqrt (f * qv) * gsl_pow_int (u, q->pw);
  if (q->excess)  /* 1/sqrt(f) - 1 = (1 - f)/(sqrt f (1 + sqrt f)) */
    r *= holent_hd_bg_omf (bg, q->zs * u) / (1 + sqrt (f));
  return r;
}

/* u^(1-d) (1/sqrt(f) - 1)/sqrt(1 - u^(2d-2)) on [0, 1/2]: the excess of the
   area integrand over the vacuum's at the same z*.  */
static double
u_excess (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u, f = 1 - holent_hd_bg_omf (bg, z), sf = sqrt (f);
  double up = gsl_pow_int (u, d - 1);
  if (!(f > 0))
    return NAN;
  return gsl_pow_int (q->zs, d) * u * holent_hd_bg_mcoef (bg, z)
         / (sqrt (1 - up * up) * sf * (1 + sf));
}

/* u^(1-d) (1/sqrt(f (1 - u^(2d-2))) - 1) with no cancellation near u = 0.  */
static double
u_integrand (double u, void *p)
{
  const spar *q = p;
  const holent_hd_bg *bg = q->bg;
  int d = bg->d;
  double z = q->zs * u;
  double om = holent_hd_bg_omf (bg, z), f = 1 - om, up = gsl_pow_int (u, d - 1);
  double qq = f * (1 - up * up), sq = sqrt (qq);
  if (!(qq > 0))
    return NAN;
  double num = gsl_pow_int (q->zs, d) * u * holent_hd_bg_mcoef (bg, z) + f * up;
  return num / (sq * (1 + sq));
}

static int
qag (holent_strip_workspace *w, double (*fn) (double, void *), spar *p,
     double a, double b, double *out)
{
  gsl_function F = { fn, p };
  double err;
  if (!(b > a))
    {
      *out = 0;
      return HOLENT_SUCCESS;
    }
  /* A tabulated f is a spline through data of accuracy noise: asking
     more of the quadrature than the data holds only costs subdivisions
     on the spline's knots (and fails on noisy data).  */
  double rel = fmax (QAG_EPSREL, p->bg->noise);
  int st = gsl_integration_qag (&F, a, b, QAG_EPSABS, rel, QAG_LIMIT,
                                GSL_INTEG_GAUSS21, w->iw, out, &err);
  /* Roundoff in f (tabulated, next to a horizon) can stop QAG short of
     its goal (roundoff detected, or the subdivision limit reached);
     accept what it reached if its error estimate is still within 1e-9,
     or within 100 times the data's relative accuracy where f is least:
     noise sigma in f is sigma/f(z*) relative at the tip, where the
     integrand ~ f^(-1/2) peaks (a tip near a noisy double zero).  Only
     for f(z*) >= 1e-3: closer to a horizon a failure ends the table of
     sizes instead (holent_hd_size.c), as it always did.  */
  double ft = p->ftip;
  double acc = 100 * p->bg->noise / (ft >= 1e-3 ? fmin (1.0, ft) : 1.0);
  if ((st == GSL_EROUND || st == GSL_EMAXITER)
      && err <= fmax (1e-9, acc) * fabs (*out) + QAG_EPSABS)
    st = GSL_SUCCESS;
  if (st || !isfinite (*out))
    return HOLENT_ENOCONV;
  return HOLENT_SUCCESS;
}

static int
strip_setup (const holent_hd_bg *bg, double zs, double w, spar *p)
{
  double f, fp;
  p->bg = bg;
  p->zs = zs;
  p->w = w;
  p->excess = 0;
  if (zs > bg->zmax)
    return HOLENT_EDOM;
  if (holent_hd_bg_f (bg, zs, &f, &fp))
    return HOLENT_EDOM;
  f = holent_hd_bg_fval (bg, zs, w);
  if (!(f > 0))
    return HOLENT_EDOM;
  p->ftip = f;
  p->a = 1;
  if (fp < 0)
    p->a = fmin (1.0, f / (-fp * zs));
  p->sa = sqrt (p->a);
  return HOLENT_SUCCESS;
}

/* Width l of the strip turning at zs (w = Z - zs).  */
static int
strip_width (const holent_hd_bg *bg, holent_strip_workspace *ws, double zs,
             double w, double *l)
{
  spar p;
  double K;
  int st = strip_setup (bg, zs, w, &p);
  if (st)
    return st;
  p.pw = bg->d - 1;
  st = qag (ws, tau_integrand, &p, 0, asinh (sqrt (1 / p.a)), &K);
  *l = 2 * zs * K;
  return st;
}

/* Area integrals J (finite: eps -> 0; cut: at the cutoff) with
   A = 2 ell^(d-1) Lperp^(d-2) zs^(2-d) J, written as the vacuum's J plus
   the excess dJ of the integrand at the same z* (no cancellation), and
   *ddel = zs^(d-2) (A_fin - A_fin,vac(same width)) / (2 ell^(d-1) Lperp^(d-2)),
   using the width's excess dK: l = 2 zs (K_vac + dK).  */
/* The excess of the width integral (dK: l = 2 zs (K_vac + dK)) and of
   the finite area integral (dJ: J = J_vac + dJ) over the vacuum's at the
   same z*, with no cancellation (P set up by strip_setup).  */
static int
strip_excess (holent_strip_workspace *ws, spar *p, double *dK, double *dJ)
{
  double jt, ju;
  int st;
  p->excess = 1;
  p->pw = 1 - p->bg->d;
  if ((st = qag (ws, tau_integrand, p, 0, asinh (sqrt (0.5 / p->a)), &jt)))
    return st;
  if ((st = qag (ws, u_excess, p, 0, 0.5, &ju)))
    return st;
  p->pw = p->bg->d - 1;
  if ((st = qag (ws, tau_integrand, p, 0, asinh (sqrt (1 / p->a)), dK)))
    return st;
  p->excess = 0;
  *dJ = jt + ju;
  return HOLENT_SUCCESS;
}

/* delta (per unit 2 ell^(d-1) Lperp^(d-2) zs^(2-d)) from the excesses:
   the finite part minus the vacuum's at the same width.  */
static double
strip_ddel (int d, double dK, double dJ)
{
  double jv = holent_strip_vacuum_j (d), kv = 0.5 * holent_strip_ratio (d);
  /* d = 2: the vacuum of the same width has log(l) = log(2 zs) +
     log1p(dK/kv) in place of the power */
  return d == 2 ? dJ - log1p (dK / kv)
                : dJ - jv * expm1 ((2 - d) * log1p (dK / kv));
}

/* Area integrals J (finite: eps -> 0; cut: at the cutoff) with
   A = 2 ell^(d-1) Lperp^(d-2) zs^(2-d) J, written as the vacuum's J plus
   the excess dJ of the integrand at the same z* (no cancellation), and
   *ddel = zs^(d-2) (A_fin - A_fin,vac(same width)) / (2 ell^(d-1) Lperp^(d-2)),
   using the width's excess dK: l = 2 zs (K_vac + dK).  */
static int
strip_area (const holent_hd_bg *bg, holent_strip_workspace *ws, double zs,
            double w, double *jfin, double *jcut, double *ddel)
{
  spar p;
  int d = bg->d, st = strip_setup (bg, zs, w, &p);
  double i0 = 0, dK, dJ, del = bg->eps / zs;
  if (st || (st = strip_excess (ws, &p, &dK, &dJ)))
    return st;
  *jfin = holent_strip_vacuum_j (d) + dJ;
  *ddel = strip_ddel (d, dK, dJ);
  if (del < 0.5)
    {
      if ((st = qag (ws, u_integrand, &p, 0, del, &i0)))
        return st;
      *jcut = *jfin + holent_strip_uv (d, del) - i0;
    }
  else if (del < 1)
    {
      p.pw = 1 - d;
      st = qag (ws, tau_integrand, &p, 0, asinh (sqrt ((1 - del) / p.a)),
                jcut);
    }
  else
    *jcut = 0;
  return st;
}

typedef struct
{
  const holent_hd_bg *bg;
  holent_strip_workspace *ws;
} sctx;

static int
strip_size (void *ctx, double zs, double w, double *l)
{
  const sctx *c = ctx;
  return strip_width (c->bg, c->ws, zs, w, l);
}

static int
strip_eval (void *ctx, double zs, double w, double *fin, double *cut,
            double *extra)
{
  const sctx *c = ctx;
  int st = strip_area (c->bg, c->ws, zs, w, fin, cut, extra);
  if (st)
    return st;
  /* per unit 2 ell^(d-1) Lperp^(d-2)/(4G) */
  int d = c->bg->d;
  double sc = pow (zs, 2 - d);
  /* the cutoff's divergence holent_strip_uv (eps) taken off: in d = 2
     uv(eps/zs) = uv(eps) + log(zs) leaves log(zs) */
  *fin = *fin * sc + (d == 2 ? log (zs) : 0);
  *cut *= sc;
  *extra *= sc;
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Series path                                                         */

/* The fitted functions at y (z* = Z/(1 + e^-y)).  */
static int
fit_node (const holent_hd_bg *bg, holent_strip_workspace *ws, double y,
          double v[3])
{
  int d = bg->d;
  double zs = bg->Z / (1 + exp (-y)), w = bg->Z / (1 + exp (y));
  double sd = gsl_pow_int (zs / bg->Z, d), del = bg->eps / zs;
  double dK, dJ, i0;
  spar p;
  int st = strip_setup (bg, zs, w, &p);
  if (st || (st = strip_excess (ws, &p, &dK, &dJ))
      || (st = qag (ws, u_integrand, &p, 0, del, &i0)))
    return st;
  v[0] = dK / sd;
  v[1] = dJ / sd;
  v[2] = (d - 2) * gsl_pow_int (del, d - 2) * i0;
  return isfinite (v[0]) && isfinite (v[1]) && isfinite (v[2])
             ? HOLENT_SUCCESS
             : HOLENT_ENOCONV;
}

/* Chebyshev coefficients of the interpolant through values v[j] at the
   Chebyshev-Lobatto points x_j = cos(pi j/n).  */
static void
cheb_coefs (int n, const double *v, double *c)
{
  for (int k = 0; k <= n; k++)
    {
      double t = 0.5 * (v[0] + (k % 2 ? -v[n] : v[n]));
      for (int j = 1; j < n; j++)
        t += v[j] * cos (M_PI * (double) ((j * k) % (2 * n)) / n);
      c[k] = 2 * t / n;
    }
  c[0] *= 0.5;
  c[n] *= 0.5;
}

static double
cheb_eval (int n, const double *c, double x)
{
  double b1 = 0, b2 = 0, x2 = 2 * x;
  for (int k = n; k >= 1; k--)
    {
      double t = c[k] + x2 * b1 - b2;
      b2 = b1;
      b1 = t;
    }
  return c[0] + x * b1 - b2;
}

/* Two series, of degrees nc and ne (>= 1), at x in one pass.  */
static void
cheb_eval2 (int nc, const double *c, int ne, const double *e, double x,
            double *vc, double *ve)
{
  double b1 = 0, b2 = 0, d1 = 0, d2 = 0, x2 = 2 * x;
  for (int k = nc > ne ? nc : ne; k >= 1; k--)
    {
      double t = (k <= nc ? c[k] : 0) + x2 * b1 - b2;
      double u = (k <= ne ? e[k] : 0) + x2 * d1 - d2;
      b2 = b1;
      b1 = t;
      d2 = d1;
      d1 = u;
    }
  *vc = c[0] + x * b1 - b2;
  *ve = e[0] + x * d1 - d2;
}

/* The width on piece P at x, and dl/dx (may be NULL).  */
static double
fit_width (const holent_hd_bg *bg, const fpiece *pc, double x, double *dl)
{
  int d = bg->d;
  double h = 0.5 * (pc->b - pc->a), y = 0.5 * (pc->a + pc->b) + h * x;
  double s = 1 / (1 + exp (-y)), s1 = 1 / (1 + exp (y)), sd = gsl_pow_int (s, d);
  double kv = 0.5 * holent_strip_ratio (d), g, gp;
  if (dl == NULL)
    g = cheb_eval (pc->n, pc->c[0], x);
  else
    {
      cheb_eval2 (pc->n, pc->c[0], pc->n - 1, pc->dc, x, &g, &gp);
      double ds = s * s1;  /* ds/dy */
      *dl = 2 * bg->Z * (ds * (kv + sd * g) + s * (d * sd / s * ds * g + sd * gp / h)) * h;
    }
  return 2 * bg->Z * s * (kv + sd * g);
}

/* The fitted functions at the nodes j = j0, j0 + dj, ... <= n of the
   Chebyshev-Lobatto points of degree n on y = m + h x, into v[f][j];
   each node costs one unit of *left (ENOCONV when it runs out).  */
static int
fit_nodes (const holent_hd_bg *bg, holent_strip_workspace *ws, double m,
           double h, int n, int j0, int dj, double v[3][FIT_NMAX + 1],
           long *left)
{
  double node[3];
  int st;
  for (int j = j0; j <= n; j += dj)
    {
      if (--*left < 0)
        return HOLENT_ENOCONV;
      if ((st = fit_node (bg, ws, m + h * cos (M_PI * j / n), node)))
        return st;
      for (int f = 0; f < 3; f++)
        v[f][j] = node[f];
    }
  return HOLENT_SUCCESS;
}

/* One piece on [a, b]: degrees FIT_N0, 2 FIT_N0, ... FIT_NMAX on nested
   Chebyshev-Lobatto points until the last three coefficients of every
   series are below FIT_TOL times its scale.  *ok = 0 when FIT_NMAX is
   not enough (the caller splits the piece).  *left counts down the node
   budget (ENOCONV when it runs out).  */
static int
fit_piece (const holent_hd_bg *bg, holent_strip_workspace *ws, double a,
           double b, fpiece *pc, int *ok, long *left)
{
  static const int nf = 3;
  double v[3][FIT_NMAX + 1], u[3][FIT_NMAX + 1];
  double scale0[3] = { 0.5 * holent_strip_ratio (bg->d),
                       fabs (holent_strip_vacuum_j (bg->d)), 1.0 };
  int st, n = FIT_N0;
  double m = 0.5 * (a + b), h = 0.5 * (b - a);
  *ok = 0;
  if ((st = fit_nodes (bg, ws, m, h, n, 0, 1, v, left)))
    return st;
  for (;;)
    {
      double err = 0;
      for (int f = 0; f < nf; f++)
        {
          double sc = scale0[f], tail;
          cheb_coefs (n, v[f], pc->c[f]);
          for (int k = 0; k <= n; k++)
            sc = fmax (sc, fabs (pc->c[f][k]));
          tail = (fabs (pc->c[f][n - 2]) + fabs (pc->c[f][n - 1])
                  + fabs (pc->c[f][n])) / sc;
          err = fmax (err, tail);
        }
      if (err <= FIT_TOL)
        {
          pc->a = a;
          pc->b = b;
          pc->n = n;
          ws->fit->err = fmax (ws->fit->err, err);
          *ok = 1;
          break;
        }
      if (2 * n > FIT_NMAX)
        return HOLENT_SUCCESS;
      /* double the degree: the old points are the even ones */
      for (int f = 0; f < nf; f++)
        for (int j = 0; j <= n; j++)
          u[f][2 * j] = v[f][j];
      n *= 2;
      if ((st = fit_nodes (bg, ws, m, h, n, 1, 2, u, left)))
        return st;
      for (int f = 0; f < nf; f++)
        for (int j = 0; j <= n; j++)
          v[f][j] = u[f][j];
    }
  /* derivative of the g_K series (coefficients of T_0 .. T_(n-1)) */
  double *c = pc->c[0], *dc = pc->dc;
  dc[n - 1] = 2 * n * c[n];
  if (n >= 2)
    dc[n - 2] = 2 * (n - 1) * c[n - 1];
  for (int k = n - 3; k >= 0; k--)
    dc[k] = dc[k + 2] + 2 * (k + 1) * c[k + 1];
  dc[0] *= 0.5;
  for (int j = 0; j <= n; j++)
    pc->ln[j] = fit_width (bg, pc, cos (M_PI * j / n), pc->dln + j);
  pc->la = pc->ln[n];
  pc->lb = pc->ln[0];
  return HOLENT_SUCCESS;
}

/* Pieces covering [ya, yb] in y, left to right: a piece that needs
   more than FIT_NMAX is halved, one that FIT_N0 fits lets the next be
   twice as long (near a horizon the series are nearly linear in y);
   ENOCONV when the series cannot reach FIT_TOL within FIT_PMAX pieces
   and the node budget, or the fitted width is not increasing.  */
static int
fit_build (const holent_hd_bg *bg, holent_strip_workspace *ws, double ya,
           double yb, long *budget)
{
  sfit *F = ws->fit;
  double a = ya, len = FIT_YSPAN;
  int ok, st;
  F->np = 0;
  F->err = 0;
  while (a < yb)
    {
      double b = yb - a < 1.5 * len ? yb : a + len;
      fpiece *pc = F->p + F->np;
      if (F->np >= FIT_PMAX || len < 1e-3)
        return HOLENT_ENOCONV;
      if (ws->poll && ws->poll->fn && ws->poll->fn (ws->poll->ctx, 0, 1))
        return HOLENT_EINTR;
      if ((st = fit_piece (bg, ws, a, b, pc, &ok, budget)))
        return st;
      if (!ok)
        {
          len = 0.5 * (b - a);
          continue;
        }
      if (!(pc->lb > pc->la) || (F->np > 0 && !(pc->la >= F->p[F->np - 1].la)))
        return HOLENT_ENOCONV;
      F->np++;
      if (pc->n == FIT_N0)
        len = 2 * (b - a);
      a = b;
    }
  return HOLENT_SUCCESS;
}

/* Width l from the series (l within the fitted range): safeguarded
   Newton on the piece's x, then every output.  */
static void
fit_solve (const holent_hd_bg *bg, const sfit *F, double l, double *jfin,
           double *jcut, double *ddel, double *zs)
{
  size_t lo = 0, hi = F->np - 1;
  int d = bg->d;
  while (lo < hi)  /* first piece with lb >= l */
    {
      size_t mid = (lo + hi) / 2;
      if (F->p[mid].lb < l)
        lo = mid + 1;
      else
        hi = mid;
    }
  const fpiece *pc = F->p + lo;
  double xl = -1, xh = 1, x, dl;
  if (l <= pc->la)
    x = -1;
  else if (l >= pc->lb)
    x = 1;
  else
    {
      /* start: linear between the nodes around l (ln decreasing in j) */
      int j0 = 0, j1 = pc->n;
      while (j1 - j0 > 1)
        {
          int jm = (j0 + j1) / 2;
          if (pc->ln[jm] >= l)
            j0 = jm;
          else
            j1 = jm;
        }
      /* cubic Hermite interpolation of the inverse x(l) between them:
         two Newton steps then reach the last digit */
      double x0 = cos (M_PI * j0 / pc->n), x1 = cos (M_PI * j1 / pc->n);
      double L = pc->ln[j0] - pc->ln[j1], t = (l - pc->ln[j1]) / L;
      double m1 = L / pc->dln[j1], m0 = L / pc->dln[j0], t2 = t * t;
      xl = x1;
      xh = x0;
      x = x1 * (1 - 3 * t2 + 2 * t2 * t) + x0 * (3 * t2 - 2 * t2 * t)
          + m1 * t * (1 - t) * (1 - t) - m0 * t2 * (1 - t);
      if (!(x > xl && x < xh))
        x = x1 + (x0 - x1) * t;
      for (int it = 0; it < 100; it++)
        {
          double r = fit_width (bg, pc, x, &dl) - l, xn;
          if (r == 0)
            break;
          if (r < 0)
            xl = x;
          else
            xh = x;
          xn = x - r / dl;
          if (!(xn >= xl && xn <= xh))
            xn = 0.5 * (xl + xh);
          /* quadratic convergence: a step below 1e-8 leaves an error
             below 1e-16 after it */
          if (fabs (xn - x) <= 1e-8 || xh - xl <= 1e-15)
            {
              x = xn;
              break;
            }
          x = xn;
        }
    }
  double h = 0.5 * (pc->b - pc->a), y = 0.5 * (pc->a + pc->b) + h * x;
  double s = 1 / (1 + exp (-y)), sd = gsl_pow_int (s, d);
  double gK = cheb_eval (pc->n, pc->c[0], x), gJ, r;
  cheb_eval2 (pc->n, pc->c[1], pc->n, pc->c[2], x, &gJ, &r);
  double dK = sd * gK, dJ = sd * gJ;
  double z = bg->Z * s, del = bg->eps / z;
  *zs = z;
  *jfin = holent_strip_vacuum_j (d) + dJ;
  *jcut = *jfin + pow (del, 2 - d) / (d - 2) * (1 - r);
  *ddel = strip_ddel (d, dK, dJ);
}

/* Set up the series for widths [lmin, lmax] (the table of ws->size
   built): *ok = 1 and the fitted range [*la, *lb] when the series path
   applies.  Failure to fit is not an error: the exact path takes over.  */
static int
fit_setup (const holent_hd_bg *bg, holent_strip_workspace *ws, size_t n,
           double lmax, double *la, double *lb, int *ok)
{
  size_t nt;
  const double *ty, *tv;
  int mono;
  *ok = 0;
  if (ws->method == HOLENT_STRIP_EXACT
      || (ws->method == HOLENT_STRIP_AUTO && n < HOLENT_STRIP_SERIES_MIN)
      || bg->kind == HOLENT_HD_VACUUM || bg->noise > FIT_NOISE
      || bg->d < 3)  /* d = 2 (intervals): not validated for the series */
    return HOLENT_SUCCESS;
  long budget;
  holent_hd_size_table_get (ws->size, &nt, &ty, &tv, &mono);
  if (!mono || nt < 2 || !(bg->Z > 2 * bg->eps))
    return HOLENT_SUCCESS;
  double ya = fmax (fmax (ty[0], FIT_YMIN),
                    log (2 * bg->eps / (bg->Z - 2 * bg->eps)) + 1e-9);
  size_t j = 0;
  while (j + 1 < nt && tv[j] < lmax)
    j++;
  double yb = ty[j];
  if (!(yb > ya))
    return HOLENT_SUCCESS;
  /* the node budget: a failing fit costs at most about what the exact
     path costs for the widths (a node ~ a third of an exact width) */
  budget = ws->method == HOLENT_STRIP_SERIES ? 100000 : (long) (3 * n);
  int st = fit_build (bg, ws, ya, yb, &budget);
  if (st == HOLENT_EINTR || st == HOLENT_ENOMEM)
    return st;
  if (st)
    return HOLENT_SUCCESS;
  *la = ws->fit->p[0].la;
  *lb = ws->fit->p[ws->fit->np - 1].lb;
  *ok = 1;
  return HOLENT_SUCCESS;
}

int
holent_strip_entropy (const holent_hd_bg *bg, holent_strip_workspace *ws,
                      double Lperp, size_t n, const double *l, double *S,
                      double *fin, double *delta, double *zstar, size_t *bad,
                      double *reach)
{
  double lmin, lmax, rch = INFINITY;
  int st;
  sctx ctx = { bg, ws };
  holent_hd_size_problem pb = { strip_size, strip_eval, &ctx, 0, 0 };
  if (bg == NULL || ws == NULL || (n > 0 && (l == NULL || S == NULL))
      || isnan (Lperp))
    return HOLENT_EINVAL;
  if (!(Lperp > 0) || !isfinite (Lperp))
    return HOLENT_EDOM;
  if ((st = holent_hd_size_check (n, l, bad, &lmin, &lmax)))
    return st;
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = bg->d;
  double ratio = holent_strip_ratio (d);
  double pref = 2 * pow (bg->ell, d - 1) * pow (Lperp, d - 2) / (4 * bg->G);
  if (bg->kind != HOLENT_HD_VACUUM)
    {
      pb.fine = bg->kind == HOLENT_HD_TABULATED;
      st = holent_hd_size_table (bg, ws->size, &pb, lmin, lmax, ratio,
                                 bg->wmin, &rch);
      if (st)
        return st;
    }
  if (reach)
    *reach = rch;
  int series = 0;
  double la = 0, lb = 0;
  ws->nseries = 0;
  ws->series_err = NAN;
  if (bg->kind != HOLENT_HD_VACUUM
      && (st = fit_setup (bg, ws, n, fmin (lmax, rch), &la, &lb, &series)))
    return st;
  for (size_t i = 0; i < n; i++)
    {
      double jf, jc, zs, extra;
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) i, (double) n))
        return HOLENT_EINTR;
      if (l[i] > rch)
        {
          if (bad)
            *bad = i;
          return HOLENT_EDOM;
        }
      if (bg->kind == HOLENT_HD_VACUUM)
        {
          zs = l[i] / ratio;
          if ((st = strip_area (bg, ws, zs, 0, &jf, &jc, &extra)))
            return st;
          jf = holent_strip_vacuum_fin (d, zs);
          jc *= pow (zs, 2 - d);
          extra = 0;
        }
      else if (series && l[i] >= la && l[i] <= lb)
        {
          fit_solve (bg, ws->fit, l[i], &jf, &jc, &extra, &zs);
          double sc = pow (zs, 2 - d);
          jf *= sc;
          jc *= sc;
          extra *= sc;
          ws->nseries++;
        }
      else if ((st = holent_hd_size_solve (bg, ws->size, &pb, l[i], &jf, &jc,
                                           &extra, &zs)))
        {
          if (bad)
            *bad = i;
          return st;
        }
      S[i] = pref * jc;
      if (!isfinite (S[i]) || !isfinite (pref * jf)
          || !isfinite (pref * extra))
        {
          if (bad)
            *bad = i;
          return HOLENT_ERANGE;  /* a tiny width or cutoff: too large */
        }
      if (fin)
        fin[i] = pref * jf;
      if (delta)
        delta[i] = pref * extra;
      if (zstar)
        zstar[i] = zs;
    }
  if (ws->nseries)
    ws->series_err = ws->fit->err;
  return HOLENT_SUCCESS;
}


typedef struct
{
  holent_strip_workspace *ws;
  double Lperp;
} actx;

static int
strip_fin (const holent_hd_bg *bg, void *ctx, size_t n, const double *l,
           double *S, double *fin)
{
  const actx *c = ctx;
  return holent_strip_entropy (bg, c->ws, c->Lperp, n, l, S, fin, NULL, NULL,
                               NULL, NULL);
}

int
holent_strip_accuracy (const holent_hd_bg *bg, holent_strip_workspace *ws,
                       double Lperp, size_t n, const double *l,
                       const double *fin, double *acc)
{
  actx c = { ws, Lperp };
  if (ws == NULL)
    return HOLENT_EINVAL;
  /* the statistics of the caller's last call survive this one */
  size_t ns = ws->nseries;
  double se = ws->series_err;
  int st = holent_hd_size_accuracy (bg, strip_fin, &c, n, l, fin, acc);
  ws->nseries = ns;
  ws->series_err = se;
  return st;
}
