using System.Globalization;
using FlowCert.Algebra;

namespace FlowCert.Graphs;

/// <summary>Reads the line-oriented <c>.ograph</c> text format (docs/formats.md).</summary>
/// <remarks>
/// The text is scanned in place: a line is a span, a token is a (start, length) pair in it, and only node
/// names are turned into strings, each once, through one name table. A name already in the table was
/// checked when it was first seen, so the name pattern runs once per distinct name.
/// </remarks>
public static class OgraphReader
{
    /// <summary>
    /// Reads a coordinate of an <c>at</c> line: <c>-?[0-9]{1,9}(\.[0-9]{1,9})?</c>, as the decimal
    /// <see cref="decimal.Parse(string)"/> gives (same value and scale), without a regular expression or the
    /// general parser (a lattice file has an <c>at</c> line for every node).
    /// </summary>
    internal static bool TryParseCoordinate(ReadOnlySpan<char> t, out decimal value)
    {
        value = 0;
        int i = t.Length > 0 && t[0] == '-' ? 1 : 0, start = i;
        long mantissa = 0;
        while (i < t.Length && t[i] is >= '0' and <= '9') mantissa = mantissa * 10 + (t[i++] - '0');
        int whole = i - start, scale = 0;
        if (whole is < 1 or > 9) return false;
        if (i < t.Length && t[i] == '.')
        {
            int fraction = ++i;
            while (i < t.Length && t[i] is >= '0' and <= '9') mantissa = mantissa * 10 + (t[i++] - '0');
            scale = i - fraction;
            if (scale is < 1 or > 9) return false;
        }
        if (i != t.Length) return false;
        if (mantissa == 0) return decimal.TryParse(t, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out value); // the sign of a zero as the parser has it
        value = new decimal((int)(uint)mantissa, (int)(uint)(mantissa >> 32), 0, start == 1, (byte)scale);
        return true;
    }

    /// <summary>True when the text is a valid node name (<see cref="NodeNameRule"/>).</summary>
    public static bool IsValidName(string name) => NodeNameRule.IsValid(name);

    /// <summary>Reads a file as a stream (the whole text is never held at once); errors name the file as given.</summary>
    public static OpenGraph ReadFile(string path)
    {
        using var reader = new StreamReader(path, detectEncodingFromByteOrderMarks: true);
        return Read(reader, path);
    }

    /// <summary>The longest line read, in characters; a longer one is an input error, not an exhausted memory.</summary>
    public const int MaxLineLength = 1 << 24;

    /// <summary>Cap on distinct weight texts remembered with their parsed value.</summary>
    private const int WeightCacheLimit = 4096;

    /// <summary>Parses <c>.ograph</c> text. Throws <see cref="GraphFormatException"/> on the first error.</summary>
    public static OpenGraph Parse(string text, string fileName) => Read(new StringReader(text), fileName);

    /// <summary>Parses <c>.ograph</c> text from a reader, a line at a time. Throws <see cref="GraphFormatException"/> on the first error.</summary>
    public static OpenGraph Read(TextReader reader, string fileName)
    {
        var state = new ParseState(reader, fileName);
        state.Run();
        return state.Build();
    }

    /// <summary>The mutable state of one parse; names are interned to ids in order of first sight.</summary>
    private sealed class ParseState
    {
        private readonly NameTable ids = new();
        private IReadOnlyList<string> names => ids.Names;
        private bool[] declared = new bool[16];
        private readonly List<int> edgeU = new(), edgeV = new();
        // Each edge's weight as an index into weightTable (a file has few distinct weights; often only 1).
        private readonly List<int> weightIds = new();
        private readonly List<Rational> weightTable = [Rational.One];
        // Where each edge's first name is (line, column), for the repeated-edge error found in Build.
        private readonly List<int> edgeLines = new(), edgeColumns = new();
        private readonly Dictionary<int, int> inputs = new(), outputs = new();
        // Names used before their declaration may come: checked in Build.
        private readonly List<(int Id, int Line, int Column, string Keyword)> references = new();
        // Every 'at' line in file order (a later line for the same node wins).
        private readonly List<(int Id, PositionHint Hint)> positions = new();
        private readonly Dictionary<int, (MeasurementLabel Label, int Line, int Column)> labels = new();
        private readonly Dictionary<string, int> weightCache;
        private readonly Dictionary<string, int>.AlternateLookup<ReadOnlySpan<char>> weightLookup;

        public ParseState(TextReader reader, string fileName)
        {
            this.reader = reader;
            this.fileName = fileName;
            weightCache = new Dictionary<string, int>(StringComparer.Ordinal);
            weightLookup = weightCache.GetAlternateLookup<ReadOnlySpan<char>>();
        }

        private readonly TextReader reader;
        private readonly string fileName;
        // The reader's text arrives in chunks; a line that spans two chunks is assembled in lineBuffer.
        private readonly char[] chunk = new char[1 << 16];
        private int chunkPos, chunkLen;
        private char[] lineBuffer = new char[256];

        // Tokens of the current line: start (in the line) and length.
        private int[] starts = new int[8], lengths = new int[8];
        private int count, lineNo;
        // The current line: lineLength characters of lineArray from lineStart.
        private char[] lineArray = [];
        private int lineStart, lineLength;

        private ReadOnlySpan<char> Tok(int k) => new(lineArray, lineStart + starts[k], lengths[k]);
        private string TokText(int k) => Tok(k).ToString();
        private GraphFormatException Error(int k, string problem) => new(fileName, lineNo, starts[k] + 1, problem);

        public void Run()
        {
            lineNo = 0;
            bool more = true;
            while (more)
            {
                lineNo++;
                more = NextLine();
                Tokenize();
                if (count > 0) Line();
            }
        }

        /// <summary>Reads up to the next LF (not included) as the current line (<see cref="lineArray"/> from <see cref="lineStart"/>, <see cref="lineLength"/> characters); false when the text ended.</summary>
        private bool NextLine()
        {
            int length = 0;
            while (true)
            {
                if (chunkPos == chunkLen)
                {
                    chunkLen = reader.Read(chunk, 0, chunk.Length);
                    chunkPos = 0;
                    if (chunkLen == 0) { (lineArray, lineStart, lineLength) = (lineBuffer, 0, length); return false; }
                }
                int nl = Array.IndexOf(chunk, '\n', chunkPos, chunkLen - chunkPos);
                int end = nl < 0 ? chunkLen : nl;
                int take = end - chunkPos;
                if (nl >= 0 && length == 0 && take <= MaxLineLength)
                {
                    // The whole line is in this chunk, which stays unchanged until the next call: no copy.
                    (lineArray, lineStart, lineLength) = (chunk, chunkPos, take);
                    chunkPos = nl + 1;
                    return true;
                }
                if (length + take > MaxLineLength)
                    throw new GraphFormatException(fileName, lineNo, 1, $"line {lineNo} is longer than {MaxLineLength} characters");
                if (length + take > lineBuffer.Length) Array.Resize(ref lineBuffer, Math.Max(length + take, lineBuffer.Length * 2));
                Array.Copy(chunk, chunkPos, lineBuffer, length, take);
                length += take;
                chunkPos = end;
                if (nl >= 0) { chunkPos++; (lineArray, lineStart, lineLength) = (lineBuffer, 0, length); return true; }
            }
        }

        private void Tokenize()
        {
            var s = new ReadOnlySpan<char>(lineArray, lineStart, lineLength);
            count = 0;
            int i = 0;
            while (i < s.Length)
            {
                char c = s[i];
                if (c == '#') break;
                if (c == '\r' && i + 1 < s.Length)
                    throw new GraphFormatException(fileName, lineNo, i + 1,
                        "carriage return inside a line: line ends are LF or CR LF (convert a file with CR-only line ends first)");
                if (c is ' ' or '\t' or '\r') { i++; continue; }
                int start = i;
                while (i < s.Length && s[i] is not (' ' or '\t' or '\r' or '#')) i++;
                if (count == starts.Length)
                {
                    Array.Resize(ref starts, count * 2);
                    Array.Resize(ref lengths, count * 2);
                }
                starts[count] = start;
                lengths[count] = i - start;
                count++;
            }
        }

        /// <summary>The id of token k as a node name; checks the name the first time it is seen.</summary>
        private int Name(int k)
        {
            var span = Tok(k);
            int id = ids.Find(span);
            if (id >= 0) return id;
            if (!NodeNameRule.IsValid(span)) throw Error(k, NodeNameRule.Problem(span.ToString()));
            id = ids.Add(span.ToString());
            if (id == declared.Length) Array.Resize(ref declared, id * 2);
            return id;
        }

        private void Line()
        {
            switch (Tok(0))
            {
                case "edge": Edge(); break;
                case "at": At(); break;
                case "input": Terminals(inputs, "input"); break;
                case "output": Terminals(outputs, "output"); break;
                case "node":
                    if (count < 2) throw Error(0, "'node' needs at least one node name");
                    for (int k = 1; k < count; k++)
                    {
                        int id = Name(k); // before indexing: Name may grow the declared array
                        declared[id] = true;
                    }
                    break;
                case "measure": Measure(); break;
                case "plane": throw Error(0, "'plane' is reserved for a later version of the format");
                default: throw Error(0, $"unknown keyword '{Formats.Excerpt.Of(TokText(0))}': expected input, output, node, edge, at or measure");
            }
        }

        private void Terminals(Dictionary<int, int> target, string keyword)
        {
            for (int k = 1; k < count; k++)
            {
                int n = Name(k);
                if (target.TryGetValue(n, out var first))
                    throw Error(k, $"node {names[n]} is listed twice as {keyword} (lines {first} and {lineNo})");
                target[n] = lineNo;
                references.Add((n, lineNo, starts[k] + 1, keyword));
            }
        }

        private void Edge()
        {
            if (count is < 3 or > 4)
                throw Error(count > 4 ? 4 : 0, "'edge' takes two node names and an optional weight");
            int u = Name(1), v = Name(2);
            if (u == v) throw Error(2, $"self-loop on node {names[u]}: a graph state has no edge from a node to itself");
            int w = count == 4 ? Weight(u, v) : 0;
            edgeLines.Add(lineNo); edgeColumns.Add(starts[1] + 1); // repeats are found in Build, by sorting
            declared[u] = true; declared[v] = true;
            edgeU.Add(u); edgeV.Add(v); weightIds.Add(w);
        }

        /// <summary>The weight of token 3 as an index into <see cref="weightTable"/>.</summary>
        private int Weight(int u, int v)
        {
            var span = Tok(3);
            if (weightLookup.TryGetValue(span, out var cached)) return cached;
            var s = span.ToString();
            if (!Rational.TryParse(s, out var w))
                throw Error(3, Formats.ExactDecimal.ExponentTooLarge(s)
                    ? $"bad weight '{Formats.Excerpt.Of(s)}': its exponent is beyond ±{Formats.ExactDecimal.MaxExponent}; weights are exact, so such a number would have thousands of digits"
                    : $"bad weight '{Formats.Excerpt.Of(s)}': write an integer, a/b or a decimal such as 0.25");
            if (w.IsZero) throw Error(3, $"weight of edge {names[u]} {names[v]} is zero: leave the edge out instead");
            weightTable.Add(w);
            if (weightCache.Count < WeightCacheLimit) weightCache[s] = weightTable.Count - 1;
            return weightTable.Count - 1;
        }

        private void At()
        {
            if (count != 4) throw Error(count > 4 ? 4 : 0, "'at' takes a node name and two coordinates");
            int n = Name(1);
            Span<decimal> coords = stackalloc decimal[2];
            for (int k = 0; k < 2; k++)
            {
                var t = Tok(2 + k);
                if (!TryParseCoordinate(t, out coords[k]))
                    throw Error(2 + k, $"bad coordinate '{Formats.Excerpt.Of(t.ToString())}': write a decimal such as 2 or -1.5, at most 9 digits on each side of the point");
            }
            references.Add((n, lineNo, starts[1] + 1, "at"));
            positions.Add((n, new PositionHint(coords[0], coords[1])));
        }

        private void Measure()
        {
            if (count != 3) throw Error(count > 3 ? 3 : 0, $"'measure' takes a node name and a label ({MeasurementLabels.Choices})");
            int n = Name(1);
            if (!MeasurementLabels.TryParse(Tok(2), out var label))
                throw Error(2, $"unknown label '{Formats.Excerpt.Of(TokText(2))}': write {MeasurementLabels.Choices}");
            if (labels.TryGetValue(n, out var first))
                throw Error(1, $"node {names[n]} has two labels (lines {first.Line} and {lineNo})");
            labels[n] = (label, lineNo, starts[1] + 1);
            references.Add((n, lineNo, starts[1] + 1, "measure"));
        }

        /// <summary>
        /// The error a line-by-line check would have given: among repeated edges, the one whose second
        /// occurrence comes first in the file, naming both lines.
        /// </summary>
        private void RefuseRepeatedEdges(long[] sortedKeys, int[] byKey)
        {
            int worst = -1, worstFirst = -1;
            for (int start = 0, end; start < sortedKeys.Length; start = end)
            {
                end = start + 1;
                int first = byKey[start], second = int.MaxValue;
                while (end < sortedKeys.Length && sortedKeys[end] == sortedKeys[start])
                {
                    int e = byKey[end++];
                    if (e < first) (first, e) = (e, first);
                    if (e < second) second = e;
                }
                if (second != int.MaxValue && (worst < 0 || second < worst)) (worst, worstFirst) = (second, first);
            }
            if (worst < 0) return;
            throw new GraphFormatException(fileName, edgeLines[worst], edgeColumns[worst],
                $"edge {names[edgeU[worst]]} {names[edgeV[worst]]} appears twice (lines {edgeLines[worstFirst]} and {edgeLines[worst]})");
        }

        /// <summary>
        /// The edges as keys (U &lt;&lt; 32) | V with U &lt; V node indices, sorted, and the edge each came from:
        /// a counting sort by U (linear in nodes and edges), then each run of one U sorted by V (short runs
        /// in a sparse graph).
        /// </summary>
        private (long[] Keys, int[] ByKey) SortedEdgeKeys(int[] rank, int nodeCount)
        {
            int m = edgeU.Count;
            var start = new int[nodeCount + 1];
            for (int e = 0; e < m; e++) start[Math.Min(rank[edgeU[e]], rank[edgeV[e]]) + 1]++;
            for (int i = 0; i < nodeCount; i++) start[i + 1] += start[i];
            var keys = new long[m];
            var byKey = new int[m];
            for (int e = 0; e < m; e++)
            {
                int a = rank[edgeU[e]], b = rank[edgeV[e]], low = Math.Min(a, b);
                int pos = start[low]++;
                keys[pos] = ((long)low << 32) | (uint)Math.Max(a, b);
                byKey[pos] = e;
            }
            // start[i] is now the end of run i, which begins at start[i - 1] (0 for the first).
            for (int i = 0, begin = 0; i < nodeCount; begin = start[i++])
                if (start[i] - begin > 1) Array.Sort(keys, byKey, begin, start[i] - begin);
            return (keys, byKey);
        }

        public OpenGraph Build()
        {
            // Declared names in ordinal order; rank maps a name id to its node index.
            var order = new List<int>(names.Count);
            for (int id = 0; id < names.Count; id++) if (declared[id]) order.Add(id);
            var sortedIds = order.ToArray();
            var sortedNames = new string[sortedIds.Length];
            for (int i = 0; i < sortedIds.Length; i++) sortedNames[i] = names[sortedIds[i]];
            Array.Sort(sortedNames, sortedIds, StringComparer.Ordinal);
            var rank = new int[names.Count];
            for (int i = 0; i < sortedIds.Length; i++) rank[sortedIds[i]] = i;

            // Edges sorted by (U, V) of node indices; equal neighbours in that order are a repeated edge.
            var (keys, byKey) = SortedEdgeKeys(rank, sortedIds.Length);
            RefuseRepeatedEdges(keys, byKey);

            foreach (var (id, line, column, keyword) in references)
                if (!declared[id])
                    throw new GraphFormatException(fileName, line, column, $"unknown node {names[id]} in '{keyword}': declare it with an 'edge' or 'node' line");
            foreach (var (id, (_, line, column)) in labels)
                if (outputs.TryGetValue(id, out var outputLine))
                    throw new GraphFormatException(fileName, line, column, $"node {names[id]} is an output (line {outputLine}): outputs are never measured and carry no label");
            var sortedWeights = new Rational[keys.Length];
            for (int k = 0; k < keys.Length; k++) sortedWeights[k] = weightTable[weightIds[byKey[k]]];
            var inputIndices = new List<int>(inputs.Count);
            foreach (var id in inputs.Keys) inputIndices.Add(rank[id]);
            var outputIndices = new List<int>(outputs.Count);
            foreach (var id in outputs.Keys) outputIndices.Add(rank[id]);
            var hints = new Dictionary<int, PositionHint>(positions.Count);
            foreach (var (id, hint) in positions) hints[rank[id]] = hint;
            var graph = OpenGraph.FromSortedEdges(sortedNames, keys, sortedWeights, inputIndices, outputIndices, hints);
            if (labels.Count == 0) return graph;
            var byIndex = new Dictionary<int, MeasurementLabel>(labels.Count);
            foreach (var (id, entry) in labels) byIndex[rank[id]] = entry.Label;
            return graph.WithLabels(byIndex);
        }
    }
}
