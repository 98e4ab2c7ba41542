using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Noise;

/// <summary>
/// Reads a phases file: one <c>NODE t</c> a line (t an exact rational: integer, a/b or exact decimal), the
/// Gaussian phase exp(i t q^2/2) applied before a node's p measurement; <c>#</c> starts a comment, blank
/// lines are ignored, a node absent from the file has t = 0.
/// </summary>
public static class PhaseFile
{
    private const string Rationals = "an integer, a/b or a decimal such as 0.25";
    private static readonly NodeValueFile Syntax = new("a phases file", $"NODE t, t an exact rational ({Rationals})", "phase");

    /// <summary>Reads the phases file at <paramref name="path"/> as <see cref="Parse"/> does.</summary>
    public static IReadOnlyDictionary<int, Rational> Read(string path, OpenGraph graph) => FromLines(Syntax.Read(path, graph));

    /// <summary>
    /// Parses the text against the certificate's graph; throws <see cref="GraphFormatException"/> with file,
    /// line and column for a malformed line, an unknown node, an output (never measured) or a repeated node.
    /// </summary>
    public static IReadOnlyDictionary<int, Rational> Parse(string text, string fileName, OpenGraph graph) => FromLines(Syntax.Lines(text, fileName, graph));

    private static SortedDictionary<int, Rational> FromLines(IEnumerable<NodeValueLine> lines)
    {
        var phases = new SortedDictionary<int, Rational>();
        foreach (var line in lines)
        {
            if (!Rational.TryParse(line.Value, out var t))
                throw line.Error(0, $"'{Excerpt.Of(line.Value)}' is not an exact rational (write {Rationals})");
            phases[line.Node] = t;
        }
        return phases;
    }
}
