using System.Text.RegularExpressions;
using FlowCert.Algebra;

namespace FlowCert.Graphs.Formats;

/// <summary>The kind of numbers a Matrix Market file holds (its "field" word).</summary>
public enum MatrixMarketField
{
    /// <summary>Decimal numbers, read exactly.</summary>
    Real,
    /// <summary>Integers.</summary>
    Integer,
    /// <summary>No values: every entry is 1.</summary>
    Pattern,
}

/// <summary>One stored entry: 1-based row and column, its exact value, and where it was written.</summary>
public sealed record MatrixMarketEntry(long Row, long Column, Rational Value, int Line, int Column1);

/// <summary>A Matrix Market coordinate matrix as written in the file, before it is read as a graph.</summary>
public sealed record MatrixMarketMatrix(long Rows, long Columns, MatrixMarketField Field, bool Symmetric, IReadOnlyList<MatrixMarketEntry> Entries, int SizeLine);

/// <summary>
/// Reads Matrix Market coordinate files ("The Matrix Market Exchange Formats: Initial Design", NISTIR 5935):
/// the header <c>%%MatrixMarket matrix coordinate FIELD SYMMETRY</c>, comment lines starting with <c>%</c>,
/// the size line <c>M N NZ</c> and NZ entry lines <c>I J [VALUE]</c>. Fields real (read exactly, exponent
/// allowed), integer and pattern; symmetry symmetric (each off-diagonal entry stored once, in either
/// triangle) or general (accepted when the entries are symmetric). As an adjacency matrix: nodes v1..vN,
/// a diagonal entry must be zero, an off-diagonal entry must not be.
/// </summary>
public static partial class MatrixMarketReader
{
    /// <summary>The header's first word.</summary>
    public const string Banner = "%%MatrixMarket";

    [GeneratedRegex(@"^[+-]?[0-9]+\z")]
    private static partial Regex IntegerPattern();

    private readonly record struct Token(string Text, int Column);

    /// <summary>Parses the file into its entries, checking the header, the size line and every entry line.</summary>
    public static MatrixMarketMatrix ParseMatrix(string text, string fileName)
    {
        var lines = text.Split('\n');
        GraphFormatException Error(int line, int column, string problem) => new(fileName, line, column, problem);
        var header = Tokenize(lines[0]);
        if (header.Count == 0 || header[0].Text != Banner)
            throw Error(1, 1, $"the first line must start with {Banner} (the Matrix Market header)");
        if (header.Count != 5)
            throw Error(1, header.Count > 5 ? header[5].Column : 1, $"the header is {Banner} matrix coordinate FIELD SYMMETRY (five words)");
        string Word(int k) => header[k].Text.ToLowerInvariant();
        if (Word(1) != "matrix") throw Error(1, header[1].Column, $"object '{header[1].Text}' is not read: only 'matrix'");
        if (Word(2) == "array") throw Error(1, header[2].Column, "dense 'array' files are not read: write the matrix in 'coordinate' form");
        if (Word(2) != "coordinate") throw Error(1, header[2].Column, $"unknown format '{header[2].Text}': expected coordinate");
        var field = Word(3) switch
        {
            "real" => MatrixMarketField.Real,
            "integer" => MatrixMarketField.Integer,
            "pattern" => MatrixMarketField.Pattern,
            "complex" => throw Error(1, header[3].Column, "complex entries are not read: edge weights are rational numbers"),
            _ => throw Error(1, header[3].Column, $"unknown field '{header[3].Text}': expected real, integer or pattern"),
        };
        bool symmetric = Word(4) switch
        {
            "symmetric" => true,
            "general" => false,
            "skew-symmetric" or "hermitian" => throw Error(1, header[4].Column, $"{Word(4)} matrices are not adjacency matrices: expected symmetric or general"),
            _ => throw Error(1, header[4].Column, $"unknown symmetry '{header[4].Text}': expected symmetric or general"),
        };

        long rows = 0, columns = 0, count = -1;
        int sizeLine = 0;
        var entries = new List<MatrixMarketEntry>();
        for (int ln = 1; ln < lines.Length; ln++)
        {
            int lineNo = ln + 1;
            var tokens = Tokenize(lines[ln]);
            if (tokens.Count == 0 || tokens[0].Text.StartsWith('%')) continue;
            long Index(Token t, string what, long max)
            {
                if (!IntegerPattern().IsMatch(t.Text) || !long.TryParse(t.Text, out var k) || k < 1 || k > max)
                    throw Error(lineNo, t.Column, $"bad {what} '{t.Text}': expected an integer from 1 to {max}");
                return k;
            }
            if (count < 0)
            {
                if (tokens.Count != 3) throw Error(lineNo, tokens.Count > 3 ? tokens[3].Column : 1, "the size line is M N NZ (three integers)");
                rows = Count(tokens[0], "row count");
                columns = Count(tokens[1], "column count");
                count = Count(tokens[2], "entry count");
                sizeLine = lineNo;
                continue;
            }
            long Count(Token t, string what)
            {
                if (!IntegerPattern().IsMatch(t.Text) || t.Text[0] is '-' or '+' || !long.TryParse(t.Text, out var k))
                    throw Error(lineNo, t.Column, $"bad {what} '{t.Text}': expected a non-negative integer");
                return k;
            }
            int expected = field == MatrixMarketField.Pattern ? 2 : 3;
            if (entries.Count == count)
                throw Error(lineNo, tokens[0].Column, $"more entries than the {count} announced on line {sizeLine}");
            if (tokens.Count != expected)
                throw Error(lineNo, tokens.Count > expected ? tokens[expected].Column : tokens[^1].Column,
                    $"an entry of a {Word(3)} file is {(expected == 2 ? "I J" : "I J VALUE")}");
            long i = Index(tokens[0], "row", rows), j = Index(tokens[1], "column", columns);
            Rational value = Rational.One;
            if (expected == 3)
            {
                var t = tokens[2];
                bool ok = field == MatrixMarketField.Integer
                    ? IntegerPattern().IsMatch(t.Text) && Rational.TryParse(t.Text.TrimStart('+'), out value)
                    : ExactDecimal.TryParse(t.Text, out value);
                if (!ok)
                    throw Error(lineNo, t.Column, $"bad {Word(3)} value '{Excerpt.Of(t.Text)}': " + (field == MatrixMarketField.Integer ? "expected an integer such as -3"
                        : ExactDecimal.ExponentTooLarge(t.Text) ? $"its exponent is beyond ±{ExactDecimal.MaxExponent}; values are read exactly, so such a number would have thousands of digits"
                        : "expected a decimal such as -0.25, 3 or 1.5e-3"));
            }
            entries.Add(new MatrixMarketEntry(i, j, value, lineNo, tokens[expected - 1].Column));
        }
        if (count < 0) throw Error(lines.Length, 1, "the file ends before the size line M N NZ");
        if (entries.Count < count)
            throw Error(lines.Length, 1, $"the file ends after {entries.Count} of the {count} entries announced on line {sizeLine}");
        return new MatrixMarketMatrix(rows, columns, field, symmetric, entries, sizeLine);
    }

    /// <summary>Reads a file as an open graph with nodes v1..vN and no inputs or outputs.</summary>
    public static OpenGraph Parse(string text, string fileName) => ToGraph(ParseMatrix(text, fileName), fileName);

    /// <summary>Node name of row and column k (1-based, as in the file).</summary>
    public static string NodeName(long k) => NumberedNames.Name(k);

    /// <summary>Reads a parsed matrix as an adjacency matrix.</summary>
    public static OpenGraph ToGraph(MatrixMarketMatrix m, string fileName)
    {
        GraphFormatException Error(MatrixMarketEntry e, string problem) => new(fileName, e.Line, e.Column1, problem);
        if (m.Rows != m.Columns)
            throw new GraphFormatException(fileName, m.SizeLine, 1,
                $"an adjacency matrix is square, and this one has {m.Rows} rows and {m.Columns} columns");
        if (m.Rows > SixBitText.MaxNodesRead)
            throw new GraphFormatException(fileName, m.SizeLine, 1, $"{m.Rows} nodes is more than FlowCert reads from one file ({SixBitText.MaxNodesRead})");
        var stored = new Dictionary<(long, long), MatrixMarketEntry>();
        foreach (var e in m.Entries)
        {
            if (e.Row == e.Column)
            {
                if (!e.Value.IsZero) throw Error(e, $"diagonal entry ({e.Row},{e.Column}) is {e.Value}: an open graph has no self-loops");
                continue;
            }
            if (e.Value.IsZero) throw Error(e, $"entry ({e.Row},{e.Column}) is zero: leave it out instead");
            if (stored.TryGetValue((e.Row, e.Column), out var twin))
                throw Error(e, $"entry ({e.Row},{e.Column}) appears twice (lines {twin.Line} and {e.Line})");
            if (m.Symmetric && stored.TryGetValue((e.Column, e.Row), out var mirror))
                throw Error(e, $"entry ({e.Row},{e.Column}) repeats entry ({e.Column},{e.Row}) of line {mirror.Line}: a symmetric file stores each pair once");
            stored[(e.Row, e.Column)] = e;
        }
        var edges = new List<(string, string, Rational)>();
        foreach (var e in m.Entries)
        {
            if (e.Row == e.Column) continue;
            if (!m.Symmetric)
            {
                if (!stored.TryGetValue((e.Column, e.Row), out var mirror))
                    throw Error(e, $"entry ({e.Row},{e.Column}) has no mirror entry ({e.Column},{e.Row}): a general file must hold a symmetric matrix to be a graph");
                if (mirror.Value != e.Value)
                    throw Error(mirror.Line > e.Line ? mirror : e, $"entries ({e.Row},{e.Column}) = {e.Value} and ({e.Column},{e.Row}) = {mirror.Value} differ (lines {e.Line} and {mirror.Line}): the matrix is not symmetric");
                if (e.Row < e.Column) continue;
            }
            edges.Add((NodeName(e.Row), NodeName(e.Column), e.Value));
        }
        var names = new string[m.Rows];
        for (long k = 0; k < m.Rows; k++) names[k] = NodeName(k + 1);
        return new OpenGraph(names, edges, [], []);
    }

    private static List<Token> Tokenize(string line)
    {
        var tokens = new List<Token>();
        int i = 0;
        while (i < line.Length)
        {
            if (line[i] is ' ' or '\t' or '\r') { i++; continue; }
            int start = i;
            while (i < line.Length && line[i] is not (' ' or '\t' or '\r')) i++;
            tokens.Add(new Token(line[start..i], start + 1));
        }
        return tokens;
    }
}
