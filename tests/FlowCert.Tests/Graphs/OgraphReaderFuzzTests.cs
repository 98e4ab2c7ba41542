using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// Random near-miss files: the reader either returns a graph or throws <see cref="GraphFormatException"/>
/// with a position inside the file, never any other exception (common practice for parsers of user input).
/// </summary>
public class OgraphReaderFuzzTests
{
    [Fact]
    public void RandomLinesGiveAGraphOrAPositionedError()
    {
        var rng = new Random(777);
        string[] keywords = ["input", "output", "node", "edge", "edge", "edge", "at", "plane", "Edge", "#", ""];
        string[] tokens = ["a", "b", "c", "_", "a.b", "1", "-1/2", "0", "0.5", "1/0", "x y", "é", "a#b", "-", "1e3", "\t", "\r", "99999999999999999999999999999999", "..", "/", "-0", "b:"];
        int graphs = 0, errors = 0;
        for (int t = 0; t < 4000; t++)
        {
            var lines = Enumerable.Range(0, rng.Next(0, 8)).Select(_ =>
                keywords[rng.Next(keywords.Length)] + string.Concat(Enumerable.Range(0, rng.Next(0, 5)).Select(_ => (rng.Next(3) == 0 ? "\t" : " ") + tokens[rng.Next(tokens.Length)])))
                .ToArray();
            var text = string.Join(rng.Next(2) == 0 ? "\n" : "\r\n", lines);
            try
            {
                var g = OgraphReader.Parse(text, "fuzz.ograph");
                Assert.Equal(CanonicalForm.Write(g), CanonicalForm.Write(OgraphReader.Parse(CanonicalForm.Write(g), "c.ograph")));
                graphs++;
            }
            catch (GraphFormatException e)
            {
                Assert.InRange(e.Line, 1, Math.Max(1, lines.Length));
                var line = lines[e.Line - 1];
                Assert.InRange(e.Column, 1, line.Length);
                // A carriage return inside a line is refused where it stands; any other error starts at a token.
                if (line[e.Column - 1] == '\r') Assert.Contains("carriage return", e.Message);
                else Assert.False(char.IsWhiteSpace(line[e.Column - 1]), $"column {e.Column} of '{line}' is not the start of a token");
                errors++;
            }
        }
        Assert.True(graphs > 100 && errors > 100, $"{graphs} graphs, {errors} errors");
    }
}
