namespace FlowCert.Tests.Graphs.Formats;

/// <summary>Runs Debian's nauty programs and reads what nauty-showg -e prints.</summary>
internal static class NautyTools
{
    public const string Package = "nauty";

    /// <summary>Runs a nauty program on a file of graphs; returns its standard output.</summary>
    public static string Run(string program, params string[] arguments)
    {
        var outcome = ExternalProgram.Run(program, Package, arguments);
        Assert.True(outcome.ExitCode == 0, $"{program} failed: {outcome.Stderr}");
        return outcome.Stdout;
    }

    /// <summary>Writes lines to a temporary file, runs the action on its path, deletes it.</summary>
    public static T WithFile<T>(IEnumerable<string> lines, Func<string, T> action)
    {
        var path = Path.GetTempFileName();
        try
        {
            File.WriteAllText(path, string.Concat(lines.Select(l => l.TrimEnd('\n') + "\n")));
            return action(path);
        }
        finally { File.Delete(path); }
    }

    /// <summary>
    /// The graphs of <c>nauty-showg -e</c> output ("Graph k, order n." then "n m" then the m edges as
    /// vertex pairs): for each graph its order and its edges as (smaller, larger) pairs, sorted.
    /// </summary>
    public static List<(int N, List<(int, int)> Edges)> ShowEdges(string file)
    {
        var text = Run("nauty-showg", "-e", file);
        var graphs = new List<(int, List<(int, int)>)>();
        var blocks = text.Split("Graph ", StringSplitOptions.RemoveEmptyEntries);
        foreach (var block in blocks.Where(b => b.Contains(", order ")))
        {
            var lines = block.Split('\n');
            var header = lines[1].Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(int.Parse).ToArray();
            var numbers = string.Join(' ', lines.Skip(2)).Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(int.Parse).ToArray();
            var edges = new List<(int, int)>();
            for (int k = 0; k + 1 < numbers.Length; k += 2) edges.Add((Math.Min(numbers[k], numbers[k + 1]), Math.Max(numbers[k], numbers[k + 1])));
            Assert.Equal(header[1], edges.Count);
            graphs.Add((header[0], edges.Order().ToList()));
        }
        return graphs;
    }

    /// <summary>The edges of a graph read from graph6 or sparse6, as vertex-number pairs sorted.</summary>
    public static List<(int, int)> Edges(FlowCert.Graphs.OpenGraph g)
    {
        int Number(int v) => int.Parse(g.Names[v][1..]);
        return g.Edges.Select(e => (Math.Min(Number(e.U), Number(e.V)), Math.Max(Number(e.U), Number(e.V)))).Order().ToList();
    }
}
