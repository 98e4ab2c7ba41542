using System.Diagnostics;
using System.Globalization;
using FlowCert.Algebra;

namespace FlowCert.Bench;

/// <summary>
/// The C# side of <c>bench/compare</c>: writes seeded random matrices as Matrix Market files (the same
/// files the anchor program reads) and times the solver's elimination kernel on one of them with a
/// stopwatch, printing the median of several runs. Timed: the block elimination as the flow search runs it
/// (<see cref="Elimination.Run"/>, then the unit-vector solutions and the left kernel).
/// </summary>
public static class KernelRunner
{
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

    /// <summary>Times the kernel on one file: prints "median-seconds rank".</summary>
    public static void Time(string fieldName, string file, int reps)
    {
        var (rows, _, entries) = Read(file);
        var (seconds, rank) = FieldSpec.Parse(fieldName).Accept(new Timer(rows, entries, reps));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{seconds:F6} {rank}"));
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
                var sw = Stopwatch.StartNew();
                var e = Elimination.Run(f, matrix);
                var solutions = e.SolveUnitVectors();
                var kernel = e.LeftKernel();
                sw.Stop();
                rank = e.Rank;
                if (solutions.Count + kernel.Count < 0) throw new InvalidOperationException();
                if (r > 0) times.Add(sw.Elapsed.TotalSeconds); // the first run warms the JIT up
            }
            times.Sort();
            return (times[times.Count / 2], rank);
        }
    }

    /// <summary>Times FlowSolver.Solve (generalized flow) on a band graph: prints "median-seconds depth".</summary>
    public static void TimeBand(int n, int bandwidth, string fieldName, int reps)
    {
        var graph = Workloads.Band(n, bandwidth);
        var field = FieldSpec.Parse(fieldName);
        var times = new List<double>();
        int depth = 0;
        for (int r = 0; r < reps + 1; r++)
        {
            var sw = Stopwatch.StartNew();
            var result = FlowCert.Flows.FlowSolver.Solve(graph, field, FlowCert.Flows.FlowKind.General);
            sw.Stop();
            depth = result.HasFlow ? result.Depth : -1;
            if (r > 0) times.Add(sw.Elapsed.TotalSeconds);
        }
        times.Sort();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{times[times.Count / 2]:F6} {depth}"));
    }
}
