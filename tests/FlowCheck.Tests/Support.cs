using System.Security.Cryptography;
using System.Text;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCheck.Tests;

/// <summary>Builds certificates for tests and runs the checker on them through its entry point.
/// The canonical form here is written again from docs/formats.md, not taken from the checker; the test
/// CanonicalFormHashMatchesCoreutils pins it to a hash computed outside the project.</summary>
public static class Support
{
    /// <summary>A certificate from its parts; JSON may use single quotes. The hash is filled in.</summary>
    public static JObject Cert(string flow, string field, string graph, string body)
    {
        var cert = JObject.Parse($"{{'format':'flowcert-certificate','version':1,'flow':'{flow}','field':'{field}'," +
                                 $"'graphSha256':'','graph':{graph},{body},'producer':{{'name':'tests','version':'0'}}}}");
        return Rehash(cert);
    }

    /// <summary>Sets graphSha256 to the hash of the graph as it now stands (left alone when the graph is
    /// too malformed to have a canonical form: the checker must reject it before looking at the hash).</summary>
    public static JObject Rehash(JObject cert)
    {
        try { cert["graphSha256"] = Sha256Hex(Canonical((JObject)cert["graph"]!)); }
        catch (Exception e) when (e is InvalidCastException or IndexOutOfRangeException or ArgumentException or NullReferenceException) { }
        return cert;
    }

    /// <summary>The canonical form of docs/formats.md, from a well-formed embedded graph object.</summary>
    public static string Canonical(JObject graph)
    {
        var edges = graph["edges"]!.Select(e => e.Select(x => (string)x!).ToArray()).ToList();
        var lines = new List<string>
        {
            string.Join(" ", new[] { "input" }.Concat(graph["inputs"]!.Select(x => (string)x!))),
            string.Join(" ", new[] { "output" }.Concat(graph["outputs"]!.Select(x => (string)x!))),
        };
        foreach (var n in graph["nodes"]!.Select(x => (string)x!))
            if (!edges.Any(e => e[0] == n || e[1] == n)) lines.Add("node " + n);
        lines.AddRange(edges.Select(e => $"edge {e[0]} {e[1]} {e[2]}"));
        if (graph["labels"] is JObject labels) // version 2: one measure line per label, sorted by node
            lines.AddRange(labels.Properties().OrderBy(p => p.Name, StringComparer.Ordinal).Select(p => $"measure {p.Name} {p.Value}"));
        return string.Concat(lines.Select(l => l + "\n"));
    }

    public static string Sha256Hex(string text) =>
        string.Concat(SHA256.HashData(Encoding.UTF8.GetBytes(text)).Select(b => b.ToString("x2")));

    /// <summary>Checker output of one run: exit code, standard output, standard error.</summary>
    public sealed record Result(int Code, string Out, string Err)
    {
        public string First => Out.Split('\n')[0].TrimEnd('\r');
    }

    static readonly string Folder = Directory.CreateTempSubdirectory("flowcheck-tests-").FullName;

    /// <summary>Writes the certificate (and a graph file) to fresh temporary files and runs Program.Run.</summary>
    public static Result Check(JToken cert, string? ograph = null) =>
        CheckText(cert.ToString(Formatting.Indented), ograph);

    public static Result CheckText(string certText, string? ograph = null)
    {
        var certPath = Write(certText, ".json");
        var graphPath = ograph is null ? null : Write(ograph, ".ograph");
        try { return graphPath is null ? Run(certPath) : Run(certPath, "--graph", graphPath); }
        finally
        {
            File.Delete(certPath);
            if (graphPath is not null) File.Delete(graphPath);
        }
    }

    public static string Write(string text, string extension)
    {
        var path = Path.Combine(Folder, Guid.NewGuid().ToString("N") + extension);
        File.WriteAllText(path, text);
        return path;
    }

    public static Result Run(params string[] args)
    {
        var (stdout, stderr) = (new StringWriter(), new StringWriter());
        var code = Program.Run(args, stdout, stderr);
        return new Result(code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>Asserts rejection with exit code 1 and a first line containing every fragment.</summary>
    public static void AssertInvalid(JToken cert, params string[] fragments) => AssertInvalid(Check(cert), fragments);

    public static void AssertInvalid(Result r, params string[] fragments)
    {
        Assert.Equal(1, r.Code);
        Assert.StartsWith("invalid: ", r.First);
        foreach (var f in fragments) Assert.True(r.First.Contains(f), $"expected \"{f}\" in \"{r.First}\"");
        Assert.Equal("", r.Err);
    }

    public static void AssertValid(JToken cert, string expectedFirstLine)
    {
        var r = Check(cert);
        Assert.Equal("", r.Err);
        Assert.Equal(expectedFirstLine + ", graph sha256 " + cert["graphSha256"], r.First);
        Assert.Equal(0, r.Code);
    }

    /// <summary>A copy of a certificate changed by <paramref name="edit"/>, hash recomputed unless told not to.</summary>
    public static JObject Edit(JObject cert, Action<JObject> edit, bool rehash = true)
    {
        var copy = (JObject)cert.DeepClone();
        edit(copy);
        return rehash ? Rehash(copy) : copy;
    }
}
