using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using Newtonsoft.Json.Linq;

namespace FlowCert.Certificates;

/// <summary>A certificate that cannot be read; carries the file and, where known, the line and column.</summary>
public sealed class CertificateFormatException(string file, string problem, int line = 0, int column = 0)
    : Exception(line > 0 ? $"{file}:{line}:{column}: {problem}" : $"{file}: {problem}")
{
    /// <summary>The file name the problem is reported against.</summary>
    public string File { get; } = file;
    /// <summary>The 1-based line of the problem, or 0 when unknown.</summary>
    public int Line { get; } = line;
    /// <summary>The 1-based column of the problem, or 0 when unknown.</summary>
    public int Column { get; } = column;
}

/// <summary>
/// Reads a certificate back into a <see cref="FlowResult"/> (for the schedule, simulation and drawing).
/// It enforces the format (docs/formats.md): known keys only, the keys each verdict carries, the depth,
/// node names, and the hash of the embedded graph. It does not re-check the mathematics: that is the
/// independent checker's job (checker/FlowCheck).
/// </summary>
public static class CertificateReader
{
    private static readonly string[] CommonKeys = ["format", "version", "flow", "field", "graphSha256", "graph", "verdict", "producer"];
    private static readonly string[] FlowKeys = ["depth", "rounds", "corrections"];
    private static readonly string[] NoFlowKeys = ["obstruction"];

    /// <summary>Reads a certificate file.</summary>
    public static FlowResult ReadFile(string path) => Parse(InputText.ReadAll(path), path);

    /// <summary>Parses certificate text; throws <see cref="CertificateFormatException"/> naming file, line and column.</summary>
    public static FlowResult Parse(string text, string fileName)
    {
        try { return ParseChecked(text, fileName); }
        catch (GraphFormatException e) { throw new CertificateFormatException(e.File, e.Problem, e.Line, e.Column); }
    }

    // A JSON integer as a long, or null when it does not fit in 64 bits (Json.NET then holds a BigInteger).
    private static long? SmallInteger(JToken t) => ((JValue)t).Value is long l ? l : null;

    // Why a JSON value is not a whole number, for "version" and "depth": a quoted number is a string.
    private static string NotAWholeNumber(string what, JToken t)
    {
        var shown = Excerpt.Of(t.ToString(Newtonsoft.Json.Formatting.None));
        return t.Type == JTokenType.String
            ? $"{what} must be a JSON number such as 3, not the string {shown} (no quotes around numbers)"
            : $"{what} must be a whole number, not {shown}";
    }

    private static FlowResult ParseChecked(string text, string fileName)
    {
        var source = JsonSource.Load(text, fileName);
        CertificateFormatException Bad(JToken? at, string problem)
        {
            if (at is null) return new CertificateFormatException(fileName, problem);
            var (line, column) = source.Position(at);
            return new CertificateFormatException(fileName, problem, line, column);
        }
        if (source.Root is not JObject root) throw Bad(source.Root, "a certificate is one JSON object");
        string Str(JToken? t, string what) => t?.Type == JTokenType.String ? (string)t! : throw Bad(t ?? root, $"{what} must be a string");
        JToken Required(JObject o, string key) => o[key] ?? throw Bad(o, $"key '{key}' is missing");
        void OnlyKeys(JObject o, IEnumerable<string> allowed, string where)
        {
            var set = allowed.ToHashSet();
            foreach (var p in o.Properties())
                if (!set.Contains(p.Name)) throw Bad(p, $"unknown key '{Excerpt.Of(p.Name)}' in {where}");
        }

        if (Str(Required(root, "format"), "format") != CertificateWriter.Format) throw Bad(root["format"], $"unknown format '{Excerpt.Of((string)root["format"]!)}'");
        var version = Required(root, "version");
        if (version.Type != JTokenType.Integer) throw Bad(version, NotAWholeNumber("version", version));
        if (SmallInteger(version) is not { } v) throw Bad(version, "version is a number too large for 64 bits");
        if (v != CertificateWriter.Version) throw Bad(version, $"unknown version {v}: this reader knows version {CertificateWriter.Version}");
        var verdict = Str(Required(root, "verdict"), "verdict");
        var verdictKeys = verdict switch
        {
            "flow" => FlowKeys,
            "noflow" => NoFlowKeys,
            _ => throw Bad(root["verdict"], $"unknown verdict '{Excerpt.Of(verdict)}'"),
        };
        OnlyKeys(root, CommonKeys.Concat(verdictKeys), "the certificate");
        var kindText = Str(Required(root, "flow"), "flow");
        if (!FlowKinds.TryParse(kindText, out var kind)) throw Bad(root["flow"], $"unknown flow '{Excerpt.Of(kindText)}'");
        var fieldName = Str(Required(root, "field"), "field");
        FieldSpec field;
        try { field = fieldName == "Q" ? FieldSpec.Rationals : fieldName.StartsWith('F') ? FieldSpec.Parse(fieldName) : throw new FieldSpecException(""); }
        catch (FieldSpecException e)
        {
            // F followed by digits is a dimension: say why it is refused (composite, 0 or 1, too large)
            bool number = fieldName.Length > 1 && fieldName[1..].All(char.IsAsciiDigit);
            throw Bad(root["field"], !number ? $"unknown field '{Excerpt.Of(fieldName)}': write Q or F followed by a prime, such as F3"
                : fieldName.Length > 20 ? $"field '{Excerpt.Of(fieldName)}': the number is too large: primes below 2^62 are supported"
                : $"field '{fieldName}': {e.Message}");
        }
        if (field.Name != fieldName) throw Bad(root["field"], $"field '{fieldName}' is not written canonically ('{field.Name}')");
        if (Required(root, "producer") is not JObject producer) throw Bad(root["producer"], "producer must be an object");
        OnlyKeys(producer, ["name", "version"], "producer");

        if (Required(root, "graph") is not JObject graphObject) throw Bad(root["graph"], "graph must be an object");
        var graph = GraphJson.FromObject(graphObject, source);
        var hash = Str(Required(root, "graphSha256"), "graphSha256");
        if (hash != CanonicalForm.Sha256(graph)) throw Bad(root["graphSha256"], "graphSha256 is not the SHA-256 of the embedded graph's canonical form");

        int Node(JToken t)
        {
            var name = Str(t, "a node");
            return graph.Contains(name) ? graph.IndexOf(name) : throw Bad(t, $"unknown node '{Excerpt.Of(name)}'");
        }
        int Key(JProperty p) => graph.Contains(p.Name) ? graph.IndexOf(p.Name) : throw Bad(p, $"unknown node '{Excerpt.Of(p.Name)}'");
        int[] Nodes(JToken? t, string what) => t is JArray a ? a.Select(Node).ToArray() : throw Bad(t ?? root, $"{what} must be a list of node names");
        NodeVector Vector(JToken t, string what)
        {
            if (t is not JObject o) throw Bad(t, $"{what} must be an object");
            var props = o.Properties().ToList();
            var nodes = props.Select(Key).ToArray();
            string Text(JProperty p) => Str(p.Value, what);
            Exception NotCanonical(JProperty p) => Bad(p.Value,
                $"{what}: '{Excerpt.Of(Text(p))}' on {Excerpt.Of(p.Name)} is not an element of {field.Name} in canonical form");
            if (field.IsRationals)
            {
                var q = default(RationalField);
                return NodeVector.Create(field, nodes, props.Select(p => q.TryParse(Text(p), out var x) ? x : throw NotCanonical(p)).ToArray());
            }
            var fp = new PrimeField(field.Prime);
            return NodeVector.Create(field, nodes, props.Select(p => fp.TryParse(Text(p), out var x) ? x : throw NotCanonical(p)).ToArray());
        }

        var rounds = new List<IReadOnlyList<int>>();
        var corrections = new Dictionary<int, NodeVector>();
        BlockedSet? obstruction = null;
        if (verdict == "flow")
        {
            foreach (var round in Required(root, "rounds") as JArray ?? throw Bad(root["rounds"], "rounds must be a list"))
                rounds.Add(Nodes(round, "a round"));
            var depth = Required(root, "depth");
            if (depth.Type != JTokenType.Integer) throw Bad(depth, NotAWholeNumber("depth", depth));
            if (SmallInteger(depth) is not { } d) throw Bad(depth, "depth is a number too large for 64 bits");
            if (d != rounds.Count) throw Bad(depth, $"depth {d} is not the number of rounds ({rounds.Count})");
            foreach (var p in (Required(root, "corrections") as JObject ?? throw Bad(root["corrections"], "corrections must be an object")).Properties())
                corrections[Key(p)] = Vector(p.Value, $"the correction of {p.Name}");
        }
        else
        {
            if (Required(root, "obstruction") is not JObject ob) throw Bad(root["obstruction"], "obstruction must be an object");
            OnlyKeys(ob, kind == FlowKind.General ? ["blocked", "witnesses"] : ["blocked"], "obstruction");
            var witnesses = kind == FlowKind.General
                ? (Required(ob, "witnesses") as JArray ?? throw Bad(ob["witnesses"], "witnesses must be a list")).Select(w => Vector(w, "a witness")).ToList()
                : [];
            obstruction = new BlockedSet(Nodes(Required(ob, "blocked"), "blocked"), witnesses);
        }
        return new FlowResult
        {
            Graph = graph, Field = field, Kind = kind, Rounds = rounds, Corrections = corrections,
            Obstruction = obstruction, VanishedEdges = VanishingEdges.In(graph, field),
        };
    }
}
