using System.Globalization;
using System.Text.RegularExpressions;
using FlowCert.Algebra;

namespace FlowCert.Graphs;

/// <summary>Reads the line-oriented <c>.ograph</c> text format (docs/formats.md).</summary>
public static partial class OgraphReader
{
    [GeneratedRegex(@"^[A-Za-z_][A-Za-z0-9_.:\-]*\z")]
    private static partial Regex NamePattern();
    [GeneratedRegex(@"^-?[0-9]{1,9}(\.[0-9]{1,9})?\z")]
    private static partial Regex CoordinatePattern();

    /// <summary>True when the text is a valid node name.</summary>
    public static bool IsValidName(string name) => NamePattern().IsMatch(name);

    /// <summary>Reads a file; errors name the file as given.</summary>
    public static OpenGraph ReadFile(string path) => Parse(File.ReadAllText(path), path);

    private readonly record struct Token(string Text, int Column);

    /// <summary>Parses <c>.ograph</c> text. Throws <see cref="GraphFormatException"/> on the first error.</summary>
    public static OpenGraph Parse(string text, string fileName)
    {
        var nodes = new List<string>();
        var known = new HashSet<string>(StringComparer.Ordinal);
        var edges = new List<(string, string, Rational)>();
        var edgeLines = new Dictionary<(string, string), int>();
        var inputs = new Dictionary<string, int>(StringComparer.Ordinal);
        var outputs = new Dictionary<string, int>(StringComparer.Ordinal);
        var references = new List<(string Name, int Line, int Column, string Keyword)>();
        var positions = new Dictionary<string, PositionHint>(StringComparer.Ordinal);

        var lines = text.Split('\n');
        for (int ln = 0; ln < lines.Length; ln++)
        {
            int lineNo = ln + 1;
            var tokens = Tokenize(lines[ln]);
            if (tokens.Count == 0) continue;
            GraphFormatException Error(Token t, string problem) => new(fileName, lineNo, t.Column, problem);
            string Name(Token t)
            {
                if (!IsValidName(t.Text))
                    throw Error(t, $"bad node name '{t.Text}': a name starts with a letter or '_' and continues with letters, digits, '_', '.', ':' or '-'");
                return t.Text;
            }
            void Declare(string n) { if (known.Add(n)) nodes.Add(n); }

            var kw = tokens[0];
            switch (kw.Text)
            {
                case "input":
                case "output":
                    var target = kw.Text == "input" ? inputs : outputs;
                    foreach (var t in tokens.Skip(1))
                    {
                        var n = Name(t);
                        if (target.TryGetValue(n, out var first))
                            throw Error(t, $"node {n} is listed twice as {kw.Text} (lines {first} and {lineNo})");
                        target[n] = lineNo;
                        references.Add((n, lineNo, t.Column, kw.Text));
                    }
                    break;
                case "node":
                    if (tokens.Count < 2) throw Error(kw, "'node' needs at least one node name");
                    foreach (var t in tokens.Skip(1)) Declare(Name(t));
                    break;
                case "edge":
                {
                    if (tokens.Count is < 3 or > 4)
                        throw Error(tokens.Count > 4 ? tokens[4] : kw, "'edge' takes two node names and an optional weight");
                    var (u, v) = (Name(tokens[1]), Name(tokens[2]));
                    if (u == v) throw Error(tokens[2], $"self-loop on node {u}: a graph state has no edge from a node to itself");
                    var w = Rational.One;
                    if (tokens.Count == 4)
                    {
                        if (!Rational.TryParse(tokens[3].Text, out w))
                            throw Error(tokens[3], $"bad weight '{tokens[3].Text}': write an integer, a/b or a decimal such as 0.25");
                        if (w.IsZero) throw Error(tokens[3], $"weight of edge {u} {v} is zero: leave the edge out instead");
                    }
                    var key = string.CompareOrdinal(u, v) < 0 ? (u, v) : (v, u);
                    if (edgeLines.TryGetValue(key, out var firstLine))
                        throw Error(tokens[1], $"edge {u} {v} appears twice (lines {firstLine} and {lineNo})");
                    edgeLines[key] = lineNo;
                    Declare(u); Declare(v);
                    edges.Add((u, v, w));
                    break;
                }
                case "at":
                {
                    if (tokens.Count != 4) throw Error(tokens.Count > 4 ? tokens[4] : kw, "'at' takes a node name and two coordinates");
                    var n = Name(tokens[1]);
                    var coords = new decimal[2];
                    for (int k = 0; k < 2; k++)
                    {
                        var t = tokens[2 + k];
                        if (!CoordinatePattern().IsMatch(t.Text) || !decimal.TryParse(t.Text, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out coords[k]))
                            throw Error(t, $"bad coordinate '{t.Text}': write a decimal such as 2 or -1.5, at most 9 digits on each side of the point");
                    }
                    references.Add((n, lineNo, tokens[1].Column, "at"));
                    positions[n] = new PositionHint(coords[0], coords[1]);
                    break;
                }
                case "plane":
                    throw Error(kw, "'plane' is reserved for a later version of the format");
                default:
                    throw Error(kw, $"unknown keyword '{kw.Text}': expected input, output, node, edge or at");
            }
        }
        foreach (var (name, line, column, keyword) in references)
            if (!known.Contains(name))
                throw new GraphFormatException(fileName, line, column, $"unknown node {name} in '{keyword}': declare it with an 'edge' or 'node' line");
        return new OpenGraph(nodes, edges, inputs.Keys, outputs.Keys, positions);
    }

    private static List<Token> Tokenize(string line)
    {
        var tokens = new List<Token>();
        int i = 0;
        while (i < line.Length)
        {
            char c = line[i];
            if (c == '#') break;
            if (c is ' ' or '\t' or '\r') { i++; continue; }
            int start = i;
            while (i < line.Length && line[i] is not (' ' or '\t' or '\r' or '#')) i++;
            tokens.Add(new Token(line[start..i], start + 1));
        }
        return tokens;
    }
}
