using System.Text;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// A JSON text loaded strictly (RFC 8259 only, checked by StrictJsonSyntax: no comments, single quotes,
/// unquoted keys, trailing commas or NUL; no duplicate keys, nothing after the value) with the line and
/// column of every token, so readers of graphs and certificates can name where a problem starts.
/// </summary>
public sealed class JsonSource
{
    private readonly string[] lines;
    /// <summary>The file name used in messages.</summary>
    public string FileName { get; }
    /// <summary>The parsed JSON value.</summary>
    public JToken Root { get; }

    private JsonSource(string fileName, string[] lines, JToken root) { FileName = fileName; this.lines = lines; Root = root; }

    /// <summary>Parses the text; a syntax error is a <see cref="GraphFormatException"/> with line and column.</summary>
    public static JsonSource Load(string text, string fileName)
    {
        StrictJsonSyntax.Check(text, fileName);
        try
        {
            using var reader = new JsonTextReader(new StringReader(text)) { DateParseHandling = DateParseHandling.None, FloatParseHandling = FloatParseHandling.Decimal };
            var root = JToken.ReadFrom(reader, new JsonLoadSettings
            {
                DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error,
                LineInfoHandling = LineInfoHandling.Load,
                CommentHandling = CommentHandling.Ignore,
            });
            while (reader.Read())
                throw new GraphFormatException(fileName, reader.LineNumber, Math.Max(reader.LinePosition, 1), "text after the JSON value");
            return new JsonSource(fileName, text.Split('\n'), root);
        }
        catch (JsonReaderException e)
        {
            throw new GraphFormatException(fileName, Math.Max(e.LineNumber, 1), Math.Max(e.LinePosition, 1), e.Message.Split(" Path")[0].TrimEnd('.'));
        }
    }

    /// <summary>The 1-based line and column where a token starts (Json.NET reports where it ends).</summary>
    public (int Line, int Column) Position(JToken t)
    {
        var info = (IJsonLineInfo)t;
        if (!info.HasLineInfo()) return (1, 1);
        int line = info.LineNumber - 1, end = info.LinePosition;
        if (line < 0 || line >= lines.Length) return (info.LineNumber, Math.Max(end, 1));
        var text = lines[line];
        if (t is JProperty) end = text.LastIndexOf(':', Math.Clamp(end - 1, 0, Math.Max(text.Length - 1, 0))) + 1;
        if (t.Type == JTokenType.String || t is JProperty)
        {
            int close = text.LastIndexOf('"', Math.Clamp(end - 1, 0, Math.Max(text.Length - 1, 0)));
            for (int i = close - 1; i >= 0; i--)
                if (text[i] == '"' && (i == 0 || text[i - 1] != '\\')) return (info.LineNumber, i + 1);
        }
        return (info.LineNumber, Math.Max(end, 1));
    }

    /// <summary>A graph error at the start of a token.</summary>
    public GraphFormatException At(JToken t, string problem)
    {
        var (line, column) = Position(t);
        return new GraphFormatException(FileName, line, column, problem);
    }

    /// <summary>Writes the string as the JSON string literal <see cref="Quote"/> makes (most names need no escape and are copied as they are).</summary>
    public static void WriteQuoted(TextWriter w, string s)
    {
        foreach (var c in s)
            if (c == '"' || c == '\\' || c < 0x20 || c > 0x7e) { w.Write(Quote(s)); return; }
        w.Write('"');
        w.Write(s);
        w.Write('"');
    }

    /// <summary>A JSON string literal: quotes and backslashes escaped, anything outside printable ASCII as \uXXXX.</summary>
    public static string Quote(string s)
    {
        var sb = new StringBuilder(s.Length + 2).Append('"');
        foreach (var c in s)
        {
            if (c == '"' || c == '\\') sb.Append('\\').Append(c);
            else if (c < 0x20 || c > 0x7e) sb.Append($"\\u{(int)c:x4}");
            else sb.Append(c);
        }
        return sb.Append('"').ToString();
    }
}
