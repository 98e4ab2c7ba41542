using System.Globalization;
using System.Numerics;
using System.Text;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using MathNet.Numerics.LinearAlgebra;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Simulation;

/// <summary>
/// The implemented map as text and as JSON (format "flowcert-map", version 1), and claimed matrices read
/// back (docs/circuits.md, "Maps and claims"). Entries are decimals such as 0.707107 or -0.5+0.866025i,
/// which the claim grammar (<see cref="ComplexExpression"/>) reads, so a written map can serve as a claim.
/// </summary>
public static class MapFiles
{
    /// <summary>The value of the <c>format</c> key.</summary>
    public const string Format = "flowcert-map";

    /// <summary>A complex number with the given number of decimals; parts that round to 0 are left out.</summary>
    public static string Entry(Complex z, int decimals)
    {
        string D(double x) => x.ToString("0." + new string('#', decimals), CultureInfo.InvariantCulture);
        double re = Math.Round(z.Real, decimals), im = Math.Round(z.Imaginary, decimals);
        if (re == 0) re = 0;
        if (im == 0) im = 0;
        if (im == 0) return D(re);
        var imaginary = (Math.Abs(im) == 1 ? "" : D(Math.Abs(im))) + "i";
        if (re == 0) return (im < 0 ? "-" : "") + imaginary;
        return D(re) + (im < 0 ? "-" : "+") + imaginary;
    }

    /// <summary>The map as an aligned table with basis-state labels, entries to 6 decimals.</summary>
    public static string Text(ImplementedMap map)
    {
        var m = map.Matrix;
        int p = map.Dimension;
        var columns = Enumerable.Range(0, m.ColumnCount).Select(c => ImplementedMap.BasisLabel(p, map.Inputs.Count, c)).ToArray();
        var rows = Enumerable.Range(0, m.RowCount).Select(r => ImplementedMap.BasisLabel(p, map.Outputs.Count, r)).ToArray();
        var cells = new string[m.RowCount, m.ColumnCount];
        var width = columns.Select(c => c.Length).ToArray();
        for (int r = 0; r < m.RowCount; r++)
            for (int c = 0; c < m.ColumnCount; c++)
            {
                cells[r, c] = Entry(m[r, c], 6);
                width[c] = Math.Max(width[c], cells[r, c].Length);
            }
        int head = Math.Max(rows.Max(x => x.Length), "out\\in".Length);
        var text = new StringBuilder();
        text.Append("out\\in".PadRight(head));
        for (int c = 0; c < columns.Length; c++) text.Append("  ").Append(columns[c].PadLeft(width[c]));
        text.Append('\n');
        for (int r = 0; r < rows.Length; r++)
        {
            text.Append(rows[r].PadRight(head));
            for (int c = 0; c < columns.Length; c++) text.Append("  ").Append(cells[r, c].PadLeft(width[c]));
            text.Append('\n');
        }
        return text.ToString();
    }

    /// <summary>The map as JSON: format, version, field, inputs, outputs, matrix (rows of entry strings, 12 decimals).</summary>
    public static string Json(ImplementedMap map, string fieldName)
    {
        static string Names(IEnumerable<string> names) => "[" + string.Join(", ", names.Select(n => JsonConvert.ToString(n))) + "]";
        var m = map.Matrix;
        var text = new StringBuilder();
        text.Append("{\n");
        text.Append($"  \"format\": \"{Format}\",\n  \"version\": 1,\n  \"field\": {JsonConvert.ToString(fieldName)},\n");
        text.Append($"  \"inputs\": {Names(map.Inputs)},\n  \"outputs\": {Names(map.Outputs)},\n  \"matrix\": [\n");
        for (int r = 0; r < m.RowCount; r++)
        {
            text.Append("    [").Append(string.Join(", ", Enumerable.Range(0, m.ColumnCount).Select(c => "\"" + Entry(m[r, c], 12) + "\"")));
            text.Append(r + 1 < m.RowCount ? "],\n" : "]\n");
        }
        text.Append("  ]\n}\n");
        return text.ToString();
    }

    /// <summary>
    /// Reads a claimed matrix: a JSON array of rows, or an object whose <c>matrix</c> key holds one (as
    /// <see cref="Json"/> writes). Entries are strings in the grammar of <see cref="ComplexExpression"/>
    /// or JSON numbers. Throws <see cref="GraphFormatException"/> (file, line, column) when the rows are
    /// ragged, the shape is not rows x columns, or an entry is malformed.
    /// </summary>
    public static Matrix<Complex> ReadClaim(string text, string fileName, int p, int rows, int columns)
    {
        var source = JsonSource.Load(text, fileName);
        var root = source.Root;
        if (root is JObject o)
        {
            if (o["matrix"] is not { } inner) throw source.At(root, "a claimed matrix is an array of rows, or an object with a \"matrix\" key");
            root = inner;
        }
        if (root is not JArray array || array.Any(row => row is not JArray))
            throw source.At(root, "a claimed matrix is an array of rows, each an array of entries");
        if (array.Count != rows)
            throw source.At(root, $"the claim has {Graphs.Formats.Counted.Of(array.Count, "row")}; the map has {rows} (p^|O| rows, one per output basis state, by {Graphs.Formats.Counted.Of(columns, "column")})");
        var m = Matrix<Complex>.Build.Dense(rows, columns);
        for (int r = 0; r < rows; r++)
        {
            var row = (JArray)array[r];
            if (row.Count != columns)
                throw source.At(row, $"row {r + 1} has {row.Count} entries; the map has {Graphs.Formats.Counted.Of(columns, "column")} (p^|I|, one per input basis state)");
            for (int c = 0; c < columns; c++)
            {
                var entry = row[c];
                if (entry.Type is JTokenType.Integer or JTokenType.Float) { m[r, c] = new Complex((double)entry, 0); continue; }
                if (entry.Type != JTokenType.String) throw source.At(entry, "an entry is a string such as \"1/sqrt(2)\" or \"-i/2\", or a number");
                try { m[r, c] = ComplexExpression.Parse((string)entry!, p); }
                catch (ExpressionException e)
                {
                    var (line, column) = source.Position(entry);
                    throw new GraphFormatException(fileName, line, column + 1 + e.Offset, $"entry ({r + 1}, {c + 1}): {e.Message}");
                }
            }
        }
        return m;
    }
}
