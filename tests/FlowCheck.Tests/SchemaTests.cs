using Newtonsoft.Json.Linq;
using NJsonSchema;

namespace FlowCheck.Tests;

/// <summary>docs/certificate.schema.json (JSON Schema draft-07, validated with NJsonSchema) accepts every
/// valid certificate and rejects certificates of the wrong shape. The schema is about shape only; the
/// mathematics is the checker's job, which the last test shows.</summary>
public class SchemaTests
{
    static readonly JsonSchema Schema = JsonSchema.FromFileAsync(Path.Combine(AppContext.BaseDirectory, "certificate.schema.json")).Result;

    static int Errors(JToken cert) => Schema.Validate(cert.ToString()).Count;

    [Fact]
    public void SchemaDeclaresDraft07() =>
        Assert.Equal("http://json-schema.org/draft-07/schema#",
            (string?)JObject.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "certificate.schema.json")))["$schema"]);

    [Fact]
    public void EveryValidCertificateMatchesTheSchema()
    {
        var all = Examples.AllValid().Select(e => (e.Name, Cert: (JToken)e.Cert))
            .Concat(SolverCertificates.Demo().Concat(SolverCertificates.Random(graphs: 15, seed: 3)).Select(p => (p.Name, Cert: JToken.Parse(p.Json))));
        foreach (var (name, cert) in all)
            Assert.True(Errors(cert) == 0, $"{name}: {string.Join("; ", Schema.Validate(cert.ToString()))}");
    }

    public static TheoryData<string, string> WrongShapes() => new()
    {
        { "unknown top-level key", "c['extra'] = 1" },
        { "format", "c['format'] = 'other'" },
        { "version", "c['version'] = 3" },
        { "version 2 for a causal flow", "c['version'] = 2" },
        { "flow", "c['flow'] = 'pauli'" },
        { "field", "c['field'] = 'F04'" },
        { "hash", "c['graphSha256'] = 'ABC'" },
        { "verdict", "c['verdict'] = 'unknown'" },
        { "missing graph", "remove graph" },
        { "depth type", "c['depth'] = '2'" },
        { "empty round", "c['rounds'] = [['a'], []]" },
        { "zero entry", "c['corrections'] = {'a': {'b': '0'}, 'b': {'c': '1'}}" },
        { "bad name", "c['corrections'] = {'a': {'1b': '1'}, 'b': {'c': '1'}}" },
        { "obstruction in a flow", "c['obstruction'] = {'blocked': ['a']}" },
        { "edge of two", "c['graph']['edges'] = [['a', 'b']]" },
        { "edge of four", "c['graph']['edges'] = [['a', 'b', '1', '2']]" },
        { "producer key", "c['producer'] = {'name': 'x', 'version': '1', 'os': 'y'}" },
    };

    [Theory]
    [MemberData(nameof(WrongShapes))]
    public void WrongShapesFailTheSchema(string what, string edit)
    {
        var cert = Examples.WireCausal();
        Assert.Equal(0, Errors(cert));
        if (edit.StartsWith("remove ")) cert.Remove(edit[7..]);
        else
        {
            var (path, value) = (edit[..edit.IndexOf(" = ")], edit[(edit.IndexOf(" = ") + 3)..]);
            var keys = path[1..].Split("][").Select(k => k.Trim('[', ']', '\'')).ToList();
            JToken target = cert;
            foreach (var k in keys.SkipLast(1)) target = target[k]!;
            target[keys[^1]] = JToken.Parse(value);
        }
        Assert.True(Errors(cert) > 0, what);
    }

    [Fact]
    public void NoFlowShapes()
    {
        Assert.Equal(0, Errors(Examples.FanGeneralNoFlow()));
        Assert.Equal(0, Errors(Examples.FanCausalNoFlow()));
        var generalWithoutWitnesses = Support.Edit(Examples.FanGeneralNoFlow(), c => ((JObject)c["obstruction"]!).Remove("witnesses"));
        Assert.True(Errors(generalWithoutWitnesses) > 0);
        var causalWithWitnesses = Support.Edit(Examples.FanCausalNoFlow(), c => c["obstruction"]!["witnesses"] = JArray.Parse("[{'a':'1'}]"));
        Assert.True(Errors(causalWithWitnesses) > 0);
        var emptyBlocked = Support.Edit(Examples.FanCausalNoFlow(), c => c["obstruction"]!["blocked"] = new JArray());
        Assert.True(Errors(emptyBlocked) > 0);
        var roundsInNoFlow = Support.Edit(Examples.FanCausalNoFlow(), c => c["rounds"] = new JArray());
        Assert.True(Errors(roundsInNoFlow) > 0);
    }

    [Fact]
    public void SchemaIsShapeOnlyTheCheckerDoesTheMathematics()
    {
        // Right shape, wrong coefficient: the schema passes it, flowcheck does not.
        var wrong = Support.Edit(Examples.WireCausal(), c => c["corrections"]!["a"]!["b"] = "2");
        Assert.Equal(0, Errors(wrong));
        Assert.Equal(1, Support.Check(wrong).Code);
    }
}
