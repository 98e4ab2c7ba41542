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
    /// <summary>
    /// Parses the text against the certificate's graph; throws <see cref="GraphFormatException"/> with file,
    /// line and column for a malformed line, an unknown node, an output (never measured) or a repeated node.
    /// </summary>
    public static IReadOnlyDictionary<int, Rational> Parse(string text, string fileName, OpenGraph graph)
    {
        var phases = new SortedDictionary<int, Rational>();
        var firstLine = new Dictionary<int, int>();
        var lines = text.Split('\n');
        for (int n = 0; n < lines.Length; n++)
        {
            var line = lines[n].TrimEnd('\r');
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            var tokens = Tokens(line);
            if (tokens.Count == 0) continue;
            GraphFormatException Bad(int token, string problem) => new(fileName, n + 1, tokens[token].Column, problem);
            if (tokens.Count != 2)
                throw Bad(tokens.Count > 2 ? 2 : 0, "a phase line is NODE t: a node name and an exact rational");
            var (name, _) = tokens[0];
            if (!graph.Contains(name)) throw Bad(0, $"unknown node '{Excerpt.Of(name)}'");
            int v = graph.IndexOf(name);
            if (graph.Outputs.Contains(v)) throw Bad(0, $"{name} is an output: it is never measured, so it has no phase");
            if (!Rational.TryParse(tokens[1].Text, out var t))
                throw Bad(1, $"'{Excerpt.Of(tokens[1].Text)}' is not an exact rational (write an integer, a/b or a decimal such as 0.25)");
            if (firstLine.TryGetValue(v, out var first)) throw Bad(0, $"{name} has a phase already (line {first})");
            firstLine[v] = n + 1;
            phases[v] = t;
        }
        return phases;
    }

    private static List<(string Text, int Column)> Tokens(string line)
    {
        var list = new List<(string, int)>();
        int i = 0;
        while (i < line.Length)
        {
            while (i < line.Length && line[i] is ' ' or '\t') i++;
            int start = i;
            while (i < line.Length && line[i] is not (' ' or '\t')) i++;
            if (i > start) list.Add((line[start..i], start + 1));
        }
        return list;
    }
}
