using System.Text.RegularExpressions;

namespace FlowCheck;

/// <summary>Reads the .ograph text format of docs/formats.md into a sorted <see cref="OpenGraph"/>.</summary>
public static class OgraphReader
{
    static readonly Regex Coordinate = new(@"^-?[0-9]{1,9}(\.[0-9]{1,9})?\z");

    public static OpenGraph Read(string path)
    {
        string text;
        try { text = File.ReadAllText(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { throw new UnreadableInput($"{path}: {e.Message}"); }
        var nodes = new HashSet<string>();
        var (inputs, outputs) = (new Dictionary<string, int>(), new Dictionary<string, int>());
        var edges = new Dictionary<(string, string), (Rational W, int Line)>();
        var mentions = new List<(string Name, int Line, int Column)>();
        var labels = new Dictionary<string, (string Label, int Line, int Column)>();
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = i + 1;
            var tokens = Tokens(lines[i].TrimEnd('\r'));
            if (tokens.Count == 0) continue;
            Exception Error(int k, string what) => new UnreadableInput($"{path}:{line}:{tokens[k].Column}: {what}");
            string NameAt(int k) => OpenGraph.IsName(tokens[k].Text) ? tokens[k].Text : throw Error(k, $"bad name \"{tokens[k].Text}\"");
            switch (tokens[0].Text)
            {
                case "input" or "output":
                    var seen = tokens[0].Text == "input" ? inputs : outputs;
                    for (var k = 1; k < tokens.Count; k++)
                        mentions.Add((seen.TryAdd(NameAt(k), line) ? tokens[k].Text
                            : throw Error(k, $"{tokens[k].Text} listed twice as {tokens[0].Text} (lines {seen[tokens[k].Text]} and {line})"), line, tokens[k].Column));
                    break;
                case "node":
                    for (var k = 1; k < tokens.Count; k++) nodes.Add(NameAt(k));
                    break;
                case "edge":
                    if (tokens.Count is not (3 or 4)) throw Error(0, "wrong number of tokens: edge U V [W]");
                    var (u, v) = (NameAt(1), NameAt(2));
                    if (u == v) throw Error(2, $"self-loop on {u}");
                    var w = tokens.Count == 4 ? Rational.ParseWeight(tokens[3].Text) : Rational.One;
                    if (w is not { } weight || weight.Num.IsZero) throw Error(3, $"bad or zero weight \"{tokens[3].Text}\"");
                    // Stryker disable once Equality: u and v differ here (a self-loop is refused above)
                    var key = string.CompareOrdinal(u, v) < 0 ? (u, v) : (v, u);
                    if (edges.TryGetValue(key, out var first)) throw Error(0, $"edge {u} {v} given twice (lines {first.Line} and {line})");
                    edges[key] = (weight, line);
                    nodes.UnionWith([u, v]);
                    break;
                case "at":
                    if (tokens.Count != 4) throw Error(0, "wrong number of tokens: at NODE X Y");
                    mentions.Add((NameAt(1), line, tokens[1].Column));
                    for (var k = 2; k < 4; k++)
                        if (!Coordinate.IsMatch(tokens[k].Text)) throw Error(k, $"bad coordinate \"{tokens[k].Text}\"");
                    break;
                case "measure":
                    if (tokens.Count != 3) throw Error(0, "wrong number of tokens: measure NODE LABEL");
                    var node = NameAt(1);
                    if (!OpenGraph.LabelNames.Contains(tokens[2].Text)) throw Error(2, $"unknown label \"{tokens[2].Text}\"");
                    if (labels.TryGetValue(node, out var had)) throw Error(1, $"{node} has two labels (lines {had.Line} and {line})");
                    labels[node] = (tokens[2].Text, line, tokens[1].Column);
                    mentions.Add((node, line, tokens[1].Column));
                    break;
                case "plane":
                    throw Error(0, "plane is reserved for a later version");
                default:
                    throw Error(0, $"unknown keyword \"{tokens[0].Text}\"");
            }
        }
        foreach (var (name, line, column) in mentions.Where(m => !nodes.Contains(m.Name)))
            throw new UnreadableInput($"{path}:{line}:{column}: unknown node {name}");
        var edgeList = edges.Select(e => new Edge(e.Key.Item1, e.Key.Item2, e.Value.W))
            .OrderBy(e => e.U, StringComparer.Ordinal).ThenBy(e => e.V, StringComparer.Ordinal).ToList();
        var graph = new OpenGraph(Sorted(inputs.Keys), Sorted(outputs.Keys), Sorted(nodes), edgeList);
        foreach (var (node, (_, line, column)) in labels.Where(l => outputs.ContainsKey(l.Key))) throw new UnreadableInput($"{path}:{line}:{column}: label on output {node}");
        foreach (var (node, (label, _, _)) in labels.Where(l => l.Value.Label != "XY")) graph.Labels[node] = label;
        return graph;
    }

    static List<string> Sorted(IEnumerable<string> names) => names.Order(StringComparer.Ordinal).ToList();

    /// <summary>Splits a line at spaces and tabs, dropping a '#' comment; columns count from 1.</summary>
    static List<(string Text, int Column)> Tokens(string line)
    {
        var hash = line.IndexOf('#');
        return Regex.Matches(hash >= 0 ? line[..hash] : line, @"[^ \t]+").Select(m => (m.Value, m.Index + 1)).ToList();
    }
}
