using Newtonsoft.Json;
using Newtonsoft.Json.Linq;
using Xunit.Abstractions;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>The corruption test. From valid certificates (the hand-written examples, the solver's demo and
/// seeded random graphs) it derives at least <see cref="Required"/> spoiled certificates per run and runs
/// flowcheck on each through its entry point.
///
/// A corruption can happen to yield another valid certificate: moving a node to a round where its
/// corrections still work, changing a weight on an edge no correction uses, deleting a space. Such a case
/// is not a miss. Every corrupted certificate is therefore also judged by <see cref="Oracle"/>, an
/// independent brute-force re-check written in the tests from flows.md with the Fractions package, and
/// the checker must agree with it both ways: rejected (exit 1 or 2) when the oracle finds a fault,
/// accepted when the oracle finds none (such certificates are counted apart and not towards the total).
/// Text that is not one JSON document must give exit 2; parseable JSON of the wrong shape exit 1.
/// The lemma of flows.md section 6 is checked on the side: a made-up proof of the opposite verdict for the
/// same graph, field and kind is never valid.</summary>
public class CorruptionTests(ITestOutputHelper output)
{
    const int Required = 10_000;

    static List<(string Name, JObject Cert)> Seeds() =>
        Examples.AllValid()
            .Concat(SolverCertificates.Demo().Concat(SolverCertificates.Random(graphs: 25, seed: 7))
                .Select(p => (p.Name, JObject.Parse(p.Json))))
            .ToList();

    [Fact]
    public void EveryCorruptedCertificateIsRejectedUnlessTheOracleProvesItValid()
    {
        var seeds = Seeds();
        foreach (var (name, cert) in seeds) Assert.True(Oracle.Reason(cert) is null, $"seed {name} is not valid: {Oracle.Reason(cert)}");
        var rng = new Random(20250602);
        var rejected = new Dictionary<string, int>();
        var valid = new Dictionary<string, int>();
        var failures = new List<string>();
        int accidentallyValid = 0, unchanged = 0, attempts = 0;
        while (rejected.Values.Sum() < Required && attempts++ < 4 * Required)
        {
            var (seedName, seed) = seeds[rng.Next(seeds.Count)];
            var original = seed.ToString(Formatting.Indented);
            string kind;
            string? text;
            if (rng.Next(8) == 0)
            {
                var c = Corruptions.OnText[rng.Next(Corruptions.OnText.Length)];
                (kind, text) = (c.Name, c.Apply(original, rng));
            }
            else
            {
                var c = Corruptions.OnObjects[rng.Next(Corruptions.OnObjects.Length)];
                (kind, text) = (c.Name, c.Apply((JObject)seed.DeepClone(), rng)?.ToString(Formatting.Indented));
            }
            if (text is null) continue;
            if (text == original) { unchanged++; continue; }
            var result = CheckText(text);
            var token = ParseLikeAReferee(text);
            var oracle = token is null ? "not one JSON document" : Oracle.Reason(token);
            string? failure = null;
            if (oracle is null && result.Code != 0) failure = $"rejected although valid: {result.First}{result.Err}";
            else if (oracle is not null && result.Code == 0) failure = $"accepted although the oracle says: {oracle}";
            else if (token is null && result.Code != 2) failure = $"not JSON but exit {result.Code}";
            else if (token is not null && result.Code == 2) failure = $"JSON but exit 2: {result.Err}";
            else if (kind.StartsWith("swap the verdict") && oracle is null) failure = "a made-up opposite proof is valid: the lemma of section 6 fails";
            if (failure is not null)
            {
                if (failures.Count < 10) failures.Add($"{kind} on {seedName}: {failure}\n{text}");
                continue;
            }
            if (oracle is null) { accidentallyValid++; valid[kind] = valid.GetValueOrDefault(kind) + 1; continue; }
            rejected[kind] = rejected.GetValueOrDefault(kind) + 1;
        }
        output.WriteLine($"{rejected.Values.Sum()} corrupted certificates rejected, {accidentallyValid} corruptions that are valid " +
                         $"certificates (accepted, confirmed by the oracle), {unchanged} no-ops, {seeds.Count} seeds, {attempts} attempts");
        foreach (var (kind, count) in rejected.OrderBy(k => k.Key))
            output.WriteLine($"  {count,6} rejected, {valid.GetValueOrDefault(kind),5} valid after all: {kind}");
        Assert.True(failures.Count == 0, string.Join("\n\n", failures));
        Assert.True(rejected.Values.Sum() >= Required, $"only {rejected.Values.Sum()} corrupted certificates");
        // These can never give a valid certificate (flows.md section 3 condition 1, the hash, the key rules,
        // the depth rule, the partition of M): the oracle must have found each of them invalid.
        foreach (var name in new[] { "put an input in a support", "put an earlier node in a support", "alter the hash",
                     "add an unknown key", "duplicate a key", "swap only the verdict string", "swap the verdict with a made-up proof",
                     "change the depth", "drop a correction vector", "drop a node from its round", "duplicate a node in another round" })
            Assert.True(valid.GetValueOrDefault(name) == 0, $"\"{name}\" gave a certificate the oracle calls valid");
        foreach (var name in Corruptions.OnObjects.Select(c => c.Name).Concat(Corruptions.OnText.Select(c => c.Name)))
            Assert.True(rejected.GetValueOrDefault(name) > 0, $"corruption \"{name}\" never produced a rejected certificate");
    }

    /// <summary>One JSON document without duplicate keys or trailing content, numbers kept exact; null otherwise.
    /// Strict RFC 8259 syntax is judged by System.Text.Json (no comments, trailing commas or single quotes,
    /// which Newtonsoft.Json would let through), duplicate keys by Newtonsoft.Json.</summary>
    static JToken? ParseLikeAReferee(string text)
    {
        try
        {
            using (System.Text.Json.JsonDocument.Parse(text)) { }
            using var reader = new JsonTextReader(new StringReader(text)) { DateParseHandling = DateParseHandling.None, FloatParseHandling = FloatParseHandling.Decimal };
            var token = JToken.ReadFrom(reader, new JsonLoadSettings { DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error });
            return reader.Read() ? null : token;
        }
        catch (Exception e) when (e is JsonReaderException or System.Text.Json.JsonException) { return null; }
    }
}
