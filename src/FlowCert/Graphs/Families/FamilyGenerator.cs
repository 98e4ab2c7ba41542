using System.Globalization;
using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Graphs.Families;

/// <summary>
/// Generates a member of a standard family (docs/families.md). The same request gives the same graph,
/// byte for byte, on every machine: the seed starts a <see cref="SplitMix64"/> whose first two outputs
/// seed one stream for the structure and one for the weights, so changing the weights never changes
/// the structure.
/// </summary>
public static class FamilyGenerator
{
    /// <summary>The most nodes a generated graph may have.</summary>
    public const long MaxNodes = 4_000_000;
    /// <summary>The most nodes of G(n, q), which draws once per pair of nodes.</summary>
    public const int MaxBinomialNodes = 20_000;
    /// <summary>The most edges (n d / 2) of a random d-regular graph, whose pairing holds n d points at once.</summary>
    public const long MaxRegularEdges = 8_000_000;

    /// <summary>The families the generator knows, with their size forms, lattice directions and descriptions.</summary>
    public static readonly IReadOnlyList<FamilyInfo> Catalog =
    [
        new("line", "N", ["h"], true, "a path of N nodes; periodic: a ring"),
        new("square", "RxC", ["h", "v"], true, "R rows by C columns"),
        new("hexagonal", "RxC", ["rise", "fall", "v"], true, "honeycomb as a brick wall of R zigzag rows of C nodes"),
        new("triangular", "RxC", ["h", "dl", "dr"], true, "R rows of C nodes, odd rows shifted half a step"),
        new("brickwork", "RxC", ["h", "v"], false, "the brickwork state of R rows and C columns (C = 5 mod 8 in the original)"),
        new("cubic", "XxYxZ", ["x", "y", "z"], true, "X by Y by Z nodes, inputs on the face x = 0, outputs on x = X - 1"),
        new("random", "N", [], false, "G(N, q): each pair is an edge with probability q"),
        new("regular", "N", [], false, "a random d-regular graph on N nodes"),
    ];

    /// <summary>The graph of a request; throws <see cref="FamilyParameterException"/> on any parameter that does not fit.</summary>
    public static OpenGraph Generate(FamilyRequest r)
    {
        var info = Catalog.FirstOrDefault(f => f.Name == r.Family)
            ?? throw new FamilyParameterException($"unknown family '{r.Family}': choose one of {string.Join(", ", Catalog.Select(f => f.Name))}");
        bool isRandom = info.Name is "random" or "regular";
        void Refuse(bool given, string what)
        {
            if (given) throw new FamilyParameterException($"{info.Name} takes no {what}");
        }
        Refuse(r.Periodic && !info.CanBePeriodic, "periodic option");
        Refuse(r.Probability is not null && info.Name != "random", "probability");
        Refuse(r.Degree is not null && info.Name != "regular", "degree");
        Refuse(!isRandom && (r.InputCount is not null || r.OutputCount is not null), "input or output count (its inputs and outputs are fixed: see docs/families.md)");

        var size = ParseSize(r.Size, info);
        var master = new SplitMix64(r.Seed);
        var structure = new SplitMix64(master.Next());
        var weights = new SplitMix64(master.Next());
        var draft = info.Name switch
        {
            "line" => PlanarLattices.Line(size[0], r.Periodic),
            "square" => PlanarLattices.Square(size[0], size[1], r.Periodic),
            "hexagonal" => PlanarLattices.Hexagonal(size[0], size[1], r.Periodic),
            "triangular" => PlanarLattices.Triangular(size[0], size[1], r.Periodic),
            "brickwork" => PlanarLattices.Brickwork(size[0], size[1]),
            "cubic" => CubicLattice.Build(size[0], size[1], size[2], r.Periodic),
            "random" => RandomGraphs.Binomial(CheckBinomialSize(size[0]), ParseProbability(r.Probability), structure),
            _ => RandomGraphs.Regular(size[0], CheckDegree(size[0], r.Degree), structure),
        };
        if (isRandom) ChooseTerminals(draft, size[0], r.InputCount ?? 0, r.OutputCount ?? 0);
        return draft.Build(r.Weights, weights);
    }

    /// <summary>Parses <c>N</c>, <c>RxC</c> or <c>XxYxZ</c> as the family's size form asks; every part at least 1.</summary>
    public static int[] ParseSize(string text, FamilyInfo info)
    {
        int parts = info.SizeForm.Count(c => c == 'x') + 1;
        var items = text.Split('x', 'X');
        var size = new int[items.Length];
        for (int k = 0; k < items.Length; k++)
            if (!int.TryParse(items[k], NumberStyles.None, CultureInfo.InvariantCulture, out size[k]) || size[k] < 1)
                throw new FamilyParameterException($"bad size '{text}' for {info.Name}: write {info.SizeForm} with whole numbers of at least 1");
        if (items.Length != parts)
            throw new FamilyParameterException($"bad size '{text}' for {info.Name}: write {info.SizeForm}");
        // Exact: three sizes below 2^31 can multiply past 2^64, where a 64-bit product would wrap round.
        var total = size.Aggregate(BigInteger.One, (a, b) => a * b);
        if (total > MaxNodes) throw new FamilyParameterException($"{text} makes {total} nodes, more than the {MaxNodes} the generator writes");
        return size;
    }

    /// <summary>Parses an exact probability: <c>1/3</c>, <c>0.25</c>, <c>0</c> or <c>1</c>.</summary>
    public static Rational ParseProbability(string? text)
    {
        if (text is null) throw new FamilyParameterException("random needs an edge probability, such as 1/10 or 0.1");
        if (!Rational.TryParse(text.Trim(), out var q) || q.Sign < 0 || q.CompareTo(Rational.One) > 0)
            throw new FamilyParameterException($"bad probability '{text}': write a fraction or decimal from 0 to 1, such as 1/10 or 0.1");
        return q;
    }

    private static int CheckBinomialSize(int n)
        => n <= MaxBinomialNodes ? n : throw new FamilyParameterException($"random draws once per pair of nodes: at most {MaxBinomialNodes} nodes");

    private static int CheckDegree(int n, int? degree)
    {
        if (degree is not { } d) throw new FamilyParameterException("regular needs a degree");
        if (d < 0 || d >= n) throw new FamilyParameterException($"a {d}-regular graph on {n} nodes needs 0 <= degree < {n}");
        if ((long)n * d % 2 != 0) throw new FamilyParameterException($"no {d}-regular graph on {n} nodes exists: n times the degree must be even");
        long edges = (long)n * d / 2; // n <= MaxNodes and d < n: far below 2^63
        if (edges > MaxRegularEdges)
            throw new FamilyParameterException($"a {d}-regular graph on {n} nodes has {edges} edges, more than the {MaxRegularEdges} the generator draws: choose a smaller size or degree");
        return d;
    }

    private static void ChooseTerminals(GraphDraft d, int n, int inputs, int outputs)
    {
        if (inputs < 0 || inputs > n || outputs < 0 || outputs > n)
            throw new FamilyParameterException($"input and output counts must be from 0 to the {n} nodes");
        for (int v = 0; v < inputs; v++) d.Inputs.Add(RandomGraphs.Name(v));
        for (int v = n - outputs; v < n; v++) d.Outputs.Add(RandomGraphs.Name(v));
    }
}
