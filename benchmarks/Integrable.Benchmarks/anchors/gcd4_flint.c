/* Gcd workload, FLINT reference: gcd(f*g, f*h) in Z[x,y,z,t] with fmpz_mpoly_gcd.
   f, g, h are read from gcd4_input.txt (one polynomial per line, written by the C# workload:
   dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- Gcd --write <dir>).
   Only the gcd is timed: median of 3 after one warm-up, wall clock and process CPU.
   build: gcc -O2 gcd4_flint.c -o gcd4_flint -lflint -lgmp      run: ./gcd4_flint [gcd4_input.txt] */
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include <flint/flint.h>
#include <flint/fmpz_mpoly.h>

static double now(clockid_t c) { struct timespec t; clock_gettime(c, &t); return t.tv_sec + 1e-9 * t.tv_nsec; }
static int cmp(const void * a, const void * b) { double x = *(const double *) a, y = *(const double *) b; return (x > y) - (x < y); }

static char line[1 << 20];

static void read_poly(FILE * fp, fmpz_mpoly_t p, const char ** vars, const fmpz_mpoly_ctx_t ctx)
{
    if (!fgets(line, sizeof line, fp)) { fprintf(stderr, "input too short\n"); exit(1); }
    line[strcspn(line, "\n")] = 0;
    if (fmpz_mpoly_set_str_pretty(p, line, vars, ctx)) { fprintf(stderr, "cannot parse input\n"); exit(1); }
}

int main(int argc, char ** argv)
{
    const char * path = argc > 1 ? argv[1] : "gcd4_input.txt";
    const char * vars[] = {"x", "y", "z", "t"};
    fmpz_mpoly_ctx_t ctx;
    fmpz_mpoly_t f, g, h, a, b, r;
    double wall[3], cpu[3];
    FILE * fp = fopen(path, "r");
    if (!fp) { fprintf(stderr, "cannot open %s\n", path); return 1; }
    flint_set_num_threads(1);
    fmpz_mpoly_ctx_init(ctx, 4, ORD_LEX);
    fmpz_mpoly_init(f, ctx); fmpz_mpoly_init(g, ctx); fmpz_mpoly_init(h, ctx);
    fmpz_mpoly_init(a, ctx); fmpz_mpoly_init(b, ctx); fmpz_mpoly_init(r, ctx);
    read_poly(fp, f, vars, ctx); read_poly(fp, g, vars, ctx); read_poly(fp, h, vars, ctx);
    fclose(fp);
    fmpz_mpoly_mul(a, f, g, ctx);
    fmpz_mpoly_mul(b, f, h, ctx);
    fmpz_mpoly_gcd(r, a, b, ctx); /* warm-up */
    for (int i = 0; i < 3; i++)
    {
        double w0 = now(CLOCK_MONOTONIC), c0 = now(CLOCK_PROCESS_CPUTIME_ID);
        if (!fmpz_mpoly_gcd(r, a, b, ctx)) { fprintf(stderr, "gcd failed\n"); return 1; }
        wall[i] = now(CLOCK_MONOTONIC) - w0; cpu[i] = now(CLOCK_PROCESS_CPUTIME_ID) - c0;
    }
    qsort(wall, 3, sizeof(double), cmp); qsort(cpu, 3, sizeof(double), cmp);
    printf("RESULT tool=flint-fmpz_mpoly workload=Gcd terms=%ld seconds=%.6f cpu=%.6f reps=3\n",
           (long) fmpz_mpoly_length(r, ctx), wall[1], cpu[1]);
    return 0;
}
