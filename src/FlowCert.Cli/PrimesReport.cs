using System.Globalization;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Flows.Primes;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using Newtonsoft.Json;

namespace FlowCert.Cli;

/// <summary>The table and the JSON object printed by <c>flowcert primes</c>.</summary>
public static class PrimesReport
{
    private const int MaxEdgesShown = 3;

    /// <summary>The sentence printed once for every prime outside E.</summary>
    public const string OtherPrimes = "every other prime: same verdict and depth as over Q";

    /// <summary>Verdict and depth in words: "flow, depth 3" or "no flow (blocked 4 nodes)".</summary>
    public static string Verdict(FlowResult r)
        => FlowOrNot(r.HasFlow, r.Depth) + (r.HasFlow ? "" : $" (blocked {Counted.Of(r.Obstruction!.Nodes.Count, "node")})");

    // The one wording of a verdict and its depth: "flow, depth 3" or "no flow".
    private static string FlowOrNot(bool hasFlow, int depth) => hasFlow ? $"flow, depth {depth}" : "no flow";

    /// <summary>The short human table.</summary>
    public static void WriteTable(TextWriter o, string source, PrimeSurvey s, AuditResult? audit, IReadOnlyList<string> written)
    {
        var g = s.Graph;
        var q = s.Rational;
        o.WriteLine($"graph     {Escaped.Of(source)}: {Counted.Of(g.NodeCount, "node")}, {Counted.Of(g.Edges.Count, "edge")}, {Counted.Of(g.Inputs.Count, "input")}, {Counted.Of(g.Outputs.Count, "output")}");
        o.WriteLine($"flow      {FlowKinds.Name(s.Kind)}");
        o.WriteLine($"over Q    {Verdict(q)}");
        var origins = s.Kind == FlowKind.Causal ? "weight numerators and denominators (causal flow depends only on which weights vanish)"
            : "weights and the Q run's layer blocks";
        o.WriteLine($"E         {(s.Exceptional.Count == 0 ? "none" : string.Join(" ", s.Exceptional.Select(a => a.Prime)))}: the prime factors of {Counted.Of(s.Integers.Count, "integer")} from {origins}");
        if (s.Exceptional.Count > 0)
        {
            o.WriteLine();
            o.WriteLine($"  {"p",-8} {"answer over F_p (solved directly)",-34} {"vs Q",-8} notes");
            foreach (var a in s.Exceptional)
            {
                string answer, versus, notes;
                if (a.Result is { } r)
                {
                    answer = Verdict(r);
                    versus = SameAsQ(r, q) ? "same" : "DIFFERS";
                    notes = r.VanishedEdges.Count > 0 ? $"vanish: {Few(g, r.VanishedEdges)}" : "";
                }
                else
                {
                    answer = $"undefined at {a.Prime}";
                    versus = "-";
                    notes = $"denominator divisible by {a.Prime}: {Few(g, a.UndefinedEdges)}";
                }
                o.WriteLine($"  {a.Prime,-8} {answer,-34} {versus,-8} {notes}".TrimEnd());
            }
            o.WriteLine();
        }
        foreach (var u in s.Unclassified)
            o.WriteLine($"NOT CLASSIFIED {u.Value}: {u.Reason}");
        o.WriteLine(s.IsComplete
            ? $"{OtherPrimes}: {Short(q)}"
            : $"{OtherPrimes}: {Short(q)}; this does not cover primes dividing the unclassified integers above");
        if (audit is not null)
        {
            o.WriteLine(audit.Disagreements.Count == 0
                ? $"audit     every prime up to {audit.UpTo} solved directly ({Counted.Of(audit.PrimesSolved, "prime")}{(audit.PrimesUnclassified > 0 ? $", {audit.PrimesUnclassified} without a claim" : "")}): all agree with the claim"
                : $"audit     {Counted.Of(audit.Disagreements.Count, "DISAGREEMENT")} up to {audit.UpTo}: a bug in flowcert, please report it with the graph");
            foreach (var d in audit.Disagreements)
                o.WriteLine($"          p = {d.Claim.Prime}: claimed {ClaimText(d.Claim)}, solved {DirectText(d.Direct)}");
        }
        if (written.Count > 0) o.WriteLine($"certificates {written.Count} written: {string.Join(" ", written.Select(f => Escaped.Of(Path.GetFileName(f))))} in {Escaped.Of(Path.GetDirectoryName(written[0]) ?? "")}");
    }

    // A table cell: the first few edges as VanishingEdges writes them, then how many there are (--json lists all).
    private static string Few(OpenGraph g, IReadOnlyList<WeightedEdge> edges)
        => edges.Count <= MaxEdgesShown ? VanishingEdges.Describe(g, edges)
            : $"{VanishingEdges.Describe(g, edges.Take(MaxEdgesShown).ToList())}, ... ({edges.Count} in all)";

    private static string Short(FlowResult r) => FlowOrNot(r.HasFlow, r.Depth);

    private static bool SameAsQ(FlowResult r, FlowResult q) => r.HasFlow == q.HasFlow && (!r.HasFlow || r.Depth == q.Depth);

    private static string DirectText(PrimeAnswer a) => a.Result is { } r ? Verdict(r) : "undefined";

    private static string ClaimText(PrimeClaim c)
        => !c.Defined ? "undefined" : FlowOrNot(c.HasFlow, c.Depth);

    /// <summary>One JSON object: the Q answer, the exceptional primes with their answers, the integers, the unclassified part.</summary>
    public static void WriteJson(TextWriter stdout, string source, PrimeSurvey s, AuditResult? audit, IReadOnlyList<string> written)
    {
        var g = s.Graph;
        using var w = new JsonTextWriter(stdout) { Formatting = Formatting.None, CloseOutput = false };
        w.WriteStartObject();
        w.WritePropertyName("graph"); w.WriteValue(source);
        w.WritePropertyName("graphSha256"); w.WriteValue(CanonicalForm.Sha256(g));
        w.WritePropertyName("flow"); w.WriteValue(FlowKinds.Name(s.Kind));
        w.WritePropertyName("rational"); Answer(w, g, s.Rational);
        w.WritePropertyName("exceptional");
        w.WriteStartArray();
        foreach (var a in s.Exceptional)
        {
            w.WriteStartObject();
            w.WritePropertyName("prime"); w.WriteValue(a.Prime);
            w.WritePropertyName("field"); w.WriteValue("F" + a.Prime.ToString(CultureInfo.InvariantCulture));
            w.WritePropertyName("defined"); w.WriteValue(a.IsDefined);
            w.WritePropertyName("answer"); if (a.Result is { } r) Answer(w, g, r); else w.WriteNull();
            w.WritePropertyName("sameAsRational"); w.WriteValue(a.Result is { } r2 && SameAsQ(r2, s.Rational));
            w.WritePropertyName("undefinedEdges"); Edges(w, g, a.UndefinedEdges);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WritePropertyName("otherPrimes");
        w.WriteStartObject();
        w.WritePropertyName("sameAsRational"); w.WriteValue(true);
        Summary.WriteVerdictJson(w, s.Rational);
        w.WriteEndObject();
        w.WritePropertyName("complete"); w.WriteValue(s.IsComplete);
        w.WritePropertyName("integers");
        w.WriteStartArray();
        foreach (var i in s.Integers)
        {
            w.WriteStartObject();
            w.WritePropertyName("origin"); w.WriteValue(OriginName(i.Origin));
            w.WritePropertyName("layer"); w.WriteValue(i.Layer);
            w.WritePropertyName("where"); w.WriteValue(i.Where);
            w.WritePropertyName("value"); w.WriteValue(i.Value.ToString(CultureInfo.InvariantCulture));
            w.WritePropertyName("primes"); Numbers(w, i.Factors.Primes);
            w.WritePropertyName("probablePrimes"); Numbers(w, i.Factors.ProbablePrimes);
            w.WritePropertyName("unfactored"); Numbers(w, i.Factors.Unfactored);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WritePropertyName("unclassified");
        w.WriteStartArray();
        foreach (var u in s.Unclassified)
        {
            w.WriteStartObject();
            w.WritePropertyName("value"); w.WriteValue(u.Value.ToString(CultureInfo.InvariantCulture));
            w.WritePropertyName("reason"); w.WriteValue(u.Reason);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WritePropertyName("audit");
        if (audit is null) w.WriteNull();
        else
        {
            w.WriteStartObject();
            w.WritePropertyName("upTo"); w.WriteValue(audit.UpTo);
            w.WritePropertyName("primesSolved"); w.WriteValue(audit.PrimesSolved);
            w.WritePropertyName("primesUnclassified"); w.WriteValue(audit.PrimesUnclassified);
            w.WritePropertyName("disagreements");
            w.WriteStartArray();
            foreach (var d in audit.Disagreements)
            {
                w.WriteStartObject();
                w.WritePropertyName("prime"); w.WriteValue(d.Claim.Prime);
                w.WritePropertyName("claim"); w.WriteValue(ClaimText(d.Claim));
                w.WritePropertyName("direct"); w.WriteValue(DirectText(d.Direct));
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WritePropertyName("certificates");
        w.WriteStartArray();
        foreach (var path in written) w.WriteValue(path);
        w.WriteEndArray();
        w.WriteEndObject();
        w.Flush();
        stdout.WriteLine();
    }

    /// <summary>The JSON name of an integer's origin.</summary>
    public static string OriginName(IntegerOrigin o) => o switch
    {
        IntegerOrigin.WeightNumerator => "weightNumerator",
        IntegerOrigin.WeightDenominator => "weightDenominator",
        IntegerOrigin.PivotMinor => "pivotMinor",
        _ => "kernelCoordinate",
    };

    private static void Answer(JsonWriter w, OpenGraph g, FlowResult r)
    {
        w.WriteStartObject();
        w.WritePropertyName("field"); w.WriteValue(r.Field.Name);
        Summary.WriteVerdictJson(w, r);
        w.WritePropertyName("blocked"); if (r.Obstruction is { } b) { w.WriteStartArray(); foreach (var v in b.Nodes) w.WriteValue(g.Names[v]); w.WriteEndArray(); } else w.WriteNull();
        w.WritePropertyName("vanishedEdges"); Edges(w, g, r.VanishedEdges);
        w.WriteEndObject();
    }

    private static void Edges(JsonWriter w, OpenGraph g, IReadOnlyList<WeightedEdge> edges)
    {
        w.WriteStartArray();
        foreach (var e in edges)
        {
            w.WriteStartArray();
            w.WriteValue(g.Names[e.U]); w.WriteValue(g.Names[e.V]); w.WriteValue(e.Weight.ToString());
            w.WriteEndArray();
        }
        w.WriteEndArray();
    }

    private static void Numbers(JsonWriter w, IEnumerable<System.Numerics.BigInteger> values)
    {
        w.WriteStartArray();
        foreach (var v in values) w.WriteValue(v.ToString(CultureInfo.InvariantCulture));
        w.WriteEndArray();
    }
}
