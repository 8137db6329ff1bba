/* Speed reference only (never part of the product): one period of the Hairer–Nørsett–Wanner test orbit
 * (Solving ODEs I, 1993, §II.0) with GSL's rk8pd (Prince–Dormand 8(7)) at epsabs = epsrel = 1e-12, state only
 * and with the planar variational equations. Prints one line per case: label, RHS evaluations, median µs.
 * Built and run by bench/gsl-comparison.ts when libgsl-dev is installed. */
#include <gsl/gsl_errno.h>
#include <gsl/gsl_odeiv2.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

static const double MU = 0.012277471;
static const double PERIOD = 17.0652165601579625588917206249;
static long rhs_calls = 0;

static int planar(double t, const double s[], double d[], void *params) {
  (void)t; (void)params;
  rhs_calls++;
  const double m1 = 1 - MU, x = s[0], y = s[1], vx = s[2], vy = s[3];
  const double dx1 = x + MU, dx2 = x - m1, y2 = y * y;
  const double r1sq = dx1 * dx1 + y2, r2sq = dx2 * dx2 + y2;
  const double a1 = m1 / (r1sq * sqrt(r1sq)), a2 = MU / (r2sq * sqrt(r2sq));
  d[0] = vx; d[1] = vy;
  d[2] = x + 2 * vy - a1 * dx1 - a2 * dx2;
  d[3] = y - 2 * vx - (a1 + a2) * y;
  return GSL_SUCCESS;
}

static int planar_stm(double t, const double s[], double d[], void *params) {
  planar(t, s, d, params);
  const double m1 = 1 - MU, x = s[0], y = s[1];
  const double dx1 = x + MU, dx2 = x - m1, y2 = y * y;
  const double r1sq = dx1 * dx1 + y2, r2sq = dx2 * dx2 + y2;
  const double a1 = m1 / (r1sq * sqrt(r1sq)), a2 = MU / (r2sq * sqrt(r2sq));
  const double b1 = 3 * a1 / r1sq, b2 = 3 * a2 / r2sq, sum = a1 + a2;
  const double uxx = 1 - sum + b1 * dx1 * dx1 + b2 * dx2 * dx2;
  const double uyy = 1 - sum + (b1 + b2) * y2;
  const double uxy = (b1 * dx1 + b2 * dx2) * y;
  for (int j = 0; j < 4; j++) {
    const double p0 = s[4 + j], p1 = s[8 + j], p2 = s[12 + j], p3 = s[16 + j];
    d[4 + j] = p2; d[8 + j] = p3;
    d[12 + j] = uxx * p0 + uxy * p1 + 2 * p3;
    d[16 + j] = uxy * p0 + uyy * p1 - 2 * p2;
  }
  return GSL_SUCCESS;
}

static int compare(const void *a, const void *b) {
  const double x = *(const double *)a, y = *(const double *)b;
  return (x > y) - (x < y);
}

static void run(const char *label, size_t n, int (*f)(double, const double[], double[], void *)) {
  enum { REPS = 1000 };
  static double micros[REPS];
  gsl_odeiv2_system sys = {f, NULL, n, NULL};
  double y[20], closure = 0;
  long calls = 0;
  for (int rep = 0; rep < REPS; rep++) {
    for (size_t i = 0; i < n; i++) y[i] = 0;
    y[0] = 0.994; y[3] = -2.00158510637908252240537862224;
    if (n == 20) y[4] = y[9] = y[14] = y[19] = 1;
    gsl_odeiv2_driver *driver = gsl_odeiv2_driver_alloc_y_new(&sys, gsl_odeiv2_step_rk8pd, 1e-3, 1e-12, 1e-12);
    double t = 0;
    rhs_calls = 0;
    struct timespec t0, t1;
    clock_gettime(CLOCK_MONOTONIC, &t0);
    if (gsl_odeiv2_driver_apply(driver, &t, PERIOD, y) != GSL_SUCCESS) { fprintf(stderr, "gsl failed\n"); exit(1); }
    clock_gettime(CLOCK_MONOTONIC, &t1);
    micros[rep] = (t1.tv_sec - t0.tv_sec) * 1e6 + (t1.tv_nsec - t0.tv_nsec) * 1e-3;
    calls = rhs_calls;
    gsl_odeiv2_driver_free(driver);
  }
  closure = fmax(fmax(fabs(y[0] - 0.994), fabs(y[1])), fmax(fabs(y[2]), fabs(y[3] + 2.00158510637908252240537862224)));
  double minimum = micros[0];
  for (int rep = 1; rep < REPS; rep++) minimum = fmin(minimum, micros[rep]);
  qsort(micros, REPS, sizeof(double), compare);
  printf("%s %zu %ld %.1f %.1f %.2e\n", label, n, calls, micros[REPS / 2], minimum, closure);
}

int main(void) {
  run("state-only", 4, planar);
  run("planar-stm", 20, planar_stm);
  return 0;
}
