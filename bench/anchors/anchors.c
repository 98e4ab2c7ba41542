/* Anchor timings for bench/compare: reduced row echelon form of one Matrix Market matrix with the
 * reference libraries (M4RI over F_2, FLINT nmod_mat over F_p, FLINT fmpq_mat over Q), timing only the
 * elimination (reading and copying are outside the clock). Written for FlowCert; see README.md.
 *
 * usage: anchors FIELD FILE.mtx REPS [aug]
 *   FIELD  2, a prime below 2^62, or Q
 *   aug    eliminate [B | I] (the transform the solver needs) instead of B alone
 * prints: median-seconds rank
 * The clock is the thread's CPU time, or wall-clock time when the environment has FLOWCERT_CLOCK=wall.
 */
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include <m4ri/m4ri.h>
#include <flint/flint.h>
#include <flint/nmod_mat.h>
#include <flint/fmpq_mat.h>

typedef struct { long rows, cols, count; long *i, *j, *v; } entries_t;

static void die(const char *msg, const char *file) { fprintf(stderr, "anchors: %s: %s\n", file, msg); exit(2); }

static entries_t read_mtx(const char *file)
{
    FILE *f = fopen(file, "r");
    if (!f) die("cannot open", file);
    char line[4096];
    entries_t e = {0};
    int header = 0;
    while (fgets(line, sizeof line, f)) {
        if (line[0] == '%') continue;
        if (!header) {
            if (sscanf(line, "%ld %ld %ld", &e.rows, &e.cols, &e.count) != 3) die("bad size line", file);
            e.i = malloc(sizeof(long) * (e.count + 1));
            e.j = malloc(sizeof(long) * (e.count + 1));
            e.v = malloc(sizeof(long) * (e.count + 1));
            header = 1; e.count = 0;
            continue;
        }
        long a, b, c;
        if (sscanf(line, "%ld %ld %ld", &a, &b, &c) != 3) die("bad entry line", file);
        e.i[e.count] = a - 1; e.j[e.count] = b - 1; e.v[e.count] = c; e.count++;
    }
    fclose(f);
    if (!header) die("no size line", file);
    return e;
}

static double now(void)
{
    static int wall = -1;
    if (wall < 0) { const char *c = getenv("FLOWCERT_CLOCK"); wall = c && strcmp(c, "wall") == 0; }
    struct timespec t;
    clock_gettime(wall ? CLOCK_MONOTONIC : CLOCK_THREAD_CPUTIME_ID, &t);
    return t.tv_sec + t.tv_nsec * 1e-9;
}

static int cmp(const void *a, const void *b)
{
    double x = *(const double *)a, y = *(const double *)b;
    return x < y ? -1 : x > y;
}

int main(int argc, char **argv)
{
    if (argc < 4) { fprintf(stderr, "usage: anchors FIELD FILE.mtx REPS [aug]\n"); return 2; }
    const char *field = argv[1], *file = argv[2];
    int reps = atoi(argv[3]);
    int aug = argc > 4 && strcmp(argv[4], "aug") == 0;
    entries_t e = read_mtx(file);
    long cols = e.cols + (aug ? e.rows : 0);
    double *times = malloc(sizeof(double) * reps);
    long rank = -1;
    for (int r = 0; r < reps; r++) {
        double t0 = 0, t1 = 0;
        if (strcmp(field, "2") == 0) {
            mzd_t *a = mzd_init(e.rows, cols);
            for (long k = 0; k < e.count; k++) if (e.v[k] & 1) mzd_write_bit(a, e.i[k], e.j[k], 1);
            if (aug) for (long k = 0; k < e.rows; k++) mzd_write_bit(a, k, e.cols + k, 1);
            t0 = now(); rank = mzd_echelonize(a, 1); t1 = now();
            mzd_free(a);
        } else if (strcmp(field, "Q") == 0) {
            fmpq_mat_t a, b;
            fmpq_mat_init(a, e.rows, cols); fmpq_mat_init(b, e.rows, cols);
            for (long k = 0; k < e.count; k++) fmpz_set_si(fmpq_mat_entry_num(a, e.i[k], e.j[k]), e.v[k]);
            if (aug) for (long k = 0; k < e.rows; k++) fmpz_one(fmpq_mat_entry_num(a, k, e.cols + k));
            t0 = now(); rank = fmpq_mat_rref(b, a); t1 = now();
            fmpq_mat_clear(a); fmpq_mat_clear(b);
        } else {
            mp_limb_t p = strtoull(field, NULL, 10);
            nmod_mat_t a;
            nmod_mat_init(a, e.rows, cols, p);
            for (long k = 0; k < e.count; k++) {
                long v = e.v[k] % (long)p; if (v < 0) v += p;
                nmod_mat_set_entry(a, e.i[k], e.j[k], (mp_limb_t)v);
            }
            if (aug) for (long k = 0; k < e.rows; k++) nmod_mat_set_entry(a, k, e.cols + k, 1);
            t0 = now(); rank = nmod_mat_rref(a); t1 = now();
            nmod_mat_clear(a);
        }
        times[r] = t1 - t0;
    }
    qsort(times, reps, sizeof(double), cmp);
    printf("%.6f %ld\n", times[reps / 2], rank);
    return 0;
}
