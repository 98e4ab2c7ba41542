using System.Diagnostics;
using System.Globalization;
using System.Runtime.InteropServices;
using FlowCert.Algebra;

namespace FlowCert.Bench;

/// <summary>
/// The C# side of <c>bench/compare</c>: writes seeded random matrices as Matrix Market files (the same
/// files the anchor program reads) and times the solver's elimination kernel on one of them with a
/// clock (<see cref="Clock"/>), printing the median of several runs. Timed: the block elimination as the flow search runs it
/// (<see cref="Elimination.Run"/>, then the unit-vector solutions and the left kernel).
/// </summary>
public static class KernelRunner
{
    /// <summary>
    /// The clock of every timing here and in the anchor program: the calling thread's CPU time
    /// (clock_gettime with CLOCK_THREAD_CPUTIME_ID), or wall-clock time when FLOWCERT_CLOCK=wall. On a
    /// shared, busy machine wall-clock time of a run of a few milliseconds is mostly time spent waiting
    /// for a core, and longer runs wait more often, which distorts ratios; CPU time does not wait.
    /// </summary>
    private static class Clock
    {
        private static readonly bool Wall = Environment.GetEnvironmentVariable("FLOWCERT_CLOCK") == "wall";

        [StructLayout(LayoutKind.Sequential)]
        private struct Timespec { public long Seconds, Nanoseconds; }

        [DllImport("libc", EntryPoint = "clock_gettime")]
        private static extern int ClockGetTime(int clock, out Timespec t);

        public static double Now()
        {
            if (Wall || !OperatingSystem.IsLinux()) return Stopwatch.GetTimestamp() / (double)Stopwatch.Frequency;
            ClockGetTime(3, out var t); // CLOCK_THREAD_CPUTIME_ID
            return t.Seconds + t.Nanoseconds * 1e-9;
        }
    }

    /// <summary>The shapes of issue 11: (file stem, field, rows, columns).</summary>
    public static readonly (string Name, string Field, int Rows, int Columns)[] Shapes =
    [
        ("f2_400x500", "2", 400, 500),
        ("f2_800x1000", "2", 800, 1000),
        ("fp1000003_400x500", "1000003", 400, 500),
        ("fp2305843009213693951_400x500", "2305843009213693951", 400, 500),
        ("q_120x150", "Q", 120, 150),
    ];

    /// <summary>Writes every shape into <paramref name="dir"/> (seed 11; entries 0/1 of density 1/2 over F_2 and Q, uniform residues over F_p).</summary>
    public static void WriteMatrices(string dir)
    {
        Directory.CreateDirectory(dir);
        foreach (var (name, field, rows, cols) in Shapes)
        {
            var rng = new Random(11);
            var p = field == "Q" ? 0UL : ulong.Parse(field, CultureInfo.InvariantCulture);
            var entries = new List<(int I, int J, ulong V)>();
            for (int i = 0; i < rows; i++)
                for (int j = 0; j < cols; j++)
                {
                    ulong v = p is 0 or 2 ? (ulong)rng.Next(2) : (ulong)rng.NextInt64(0, (long)p);
                    if (v != 0) entries.Add((i, j, v));
                }
            using var w = new StreamWriter(Path.Combine(dir, name + ".mtx"));
            w.Write("%%MatrixMarket matrix coordinate integer general\n");
            w.Write($"% FlowCert bench matrix over {(p == 0 ? "Q" : "F_" + field)}, seed 11\n");
            w.Write($"{rows} {cols} {entries.Count}\n");
            foreach (var (i, j, v) in entries) w.Write($"{i + 1} {j + 1} {v}\n");
        }
    }

    /// <summary>Reads a coordinate Matrix Market file into sparse rows over the field.</summary>
    private static (int Rows, int Columns, List<(int I, int J, long V)> Entries) Read(string file)
    {
        var entries = new List<(int, int, long)>();
        int rows = -1, cols = -1;
        foreach (var line in File.ReadLines(file))
        {
            if (line.StartsWith('%') || line.Length == 0) continue;
            var t = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (rows < 0) { rows = int.Parse(t[0], CultureInfo.InvariantCulture); cols = int.Parse(t[1], CultureInfo.InvariantCulture); continue; }
            entries.Add((int.Parse(t[0], CultureInfo.InvariantCulture) - 1, int.Parse(t[1], CultureInfo.InvariantCulture) - 1, long.Parse(t[2], CultureInfo.InvariantCulture)));
        }
        return (rows, cols, entries);
    }

    /// <summary>
    /// Times the kernel on one file: prints "median-seconds rref-median-seconds rank", the first for the
    /// block elimination as the solver runs it, the second for the reduced echelon form of [B | I] alone
    /// on the kernel's own array (what the anchor's [B | I] column does; over Q the whole multi-modular run).
    /// </summary>
    public static void Time(string fieldName, string file, int reps)
    {
        var (rows, _, entries) = Read(file);
        var (seconds, rank) = FieldSpec.Parse(fieldName).Accept(new Timer(rows, entries, reps));
        var rref = FieldSpec.Parse(fieldName).Accept(new RrefTimer(rows, entries, reps));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{seconds:F6} {rref:F6} {rank}"));
    }

    private sealed class RrefTimer(int rows, List<(int I, int J, long V)> entries, int reps) : IFieldVisitor<double>
    {
        public double Visit<T, TField>(TField f) where T : struct where TField : struct, IField<T>
        {
            int n = entries.Count == 0 ? 0 : entries.Max(e => e.J) + 1, w = n + rows;
            var times = new List<double>();
            for (int r = 0; r < reps + 1; r++)
            {
                double t0;
                if (f is BinaryField)
                {
                    int s = (w + 63) >> 6;
                    var a = new ulong[rows * s];
                    foreach (var (i, j, v) in entries) if ((v & 1) != 0) a[i * s + (j >> 6)] |= 1UL << (j & 63);
                    for (int i = 0; i < rows; i++) a[i * s + ((n + i) >> 6)] |= 1UL << ((n + i) & 63);
                    t0 = Clock.Now();
                    BitElimination.Rref(a, rows, w);
                }
                else if (f is PrimeField pf)
                {
                    var a = new ulong[rows * w];
                    foreach (var (i, j, v) in entries) a[i * w + j] = pf.FromRational(v);
                    for (int i = 0; i < rows; i++) a[i * w + n + i] = 1;
                    t0 = Clock.Now();
                    ModularElimination.Rref(pf.P, a, rows, w);
                }
                else
                {
                    var lists = new List<(int, Rational)>[rows];
                    for (int i = 0; i < rows; i++) lists[i] = [];
                    foreach (var (i, j, v) in entries) lists[i].Add((j, v));
                    var matrix = lists.Select(l => new SparseVector<Rational>(l.Select(e => e.Item1).ToArray(), l.Select(e => e.Item2).ToArray())).ToList();
                    t0 = Clock.Now();
                    _ = MultiModularElimination.TryRun(matrix);
                }
                double t1 = Clock.Now();
                if (r > 0) times.Add(t1 - t0);
            }
            times.Sort();
            return times[times.Count / 2];
        }
    }

    private sealed class Timer(int rows, List<(int I, int J, long V)> entries, int reps) : IFieldVisitor<(double, int)>
    {
        public (double, int) Visit<T, TField>(TField f) where T : struct where TField : struct, IField<T>
        {
            var lists = new List<(int, T)>[rows];
            for (int i = 0; i < rows; i++) lists[i] = [];
            foreach (var (i, j, v) in entries)
            {
                var x = f.FromRational(v);
                if (!f.IsZero(x)) lists[i].Add((j, x));
            }
            var matrix = lists.Select(l => new SparseVector<T>(l.Select(e => e.Item1).ToArray(), l.Select(e => e.Item2).ToArray())).ToList();
            var times = new List<double>();
            int rank = 0;
            for (int r = 0; r < reps + 1; r++)
            {
                double t0 = Clock.Now();
                var e = Elimination.Run(f, matrix);
                var solutions = e.SolveUnitVectors();
                var kernel = e.LeftKernel();
                double t1 = Clock.Now();
                rank = e.Rank;
                if (solutions.Count + kernel.Count < 0) throw new InvalidOperationException();
                if (r > 0) times.Add(t1 - t0); // the first run warms the JIT up
            }
            times.Sort();
            return (times[times.Count / 2], rank);
        }
    }

    /// <summary>Times FlowSolver.Solve (generalized flow) on a band graph: prints "median-seconds depth".</summary>
    public static void TimeBand(int n, int bandwidth, string fieldName, int reps, bool hub = false, int hubs = 0, bool fresh = false)
    {
        var graph = Workloads.Band(n, bandwidth, hub, hubs);
        var field = FieldSpec.Parse(fieldName);
        var times = new List<double>();
        int depth = 0;
        for (int r = 0; r < reps + 1; r++)
        {
            double t0 = Clock.Now();
            var result = FlowCert.Flows.FlowSolver.Solve(graph, field, FlowCert.Flows.FlowKind.General, null,
                fresh ? FlowCert.Flows.CarryRule.Never : FlowCert.Flows.CarryRule.Default);
            double t1 = Clock.Now();
            depth = result.HasFlow ? result.Depth : -1;
            if (r > 0) times.Add(t1 - t0);
        }
        times.Sort();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{times[times.Count / 2]:F6} {depth}"));
    }
}
