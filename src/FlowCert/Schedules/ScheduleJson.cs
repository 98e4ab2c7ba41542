using FlowCert.Flows;
using FlowCert.Certificates;
using FlowCert.Graphs;
using Newtonsoft.Json;

namespace FlowCert.Schedules;

/// <summary>
/// The schedule as JSON (docs/schedule.md): format "flowcert-schedule", version 1, keys in a fixed order,
/// two-space indentation, LF line ends, field elements as canonical strings.
/// </summary>
public static class ScheduleJson
{
    /// <summary>The value of the schedule's <c>format</c> key.</summary>
    public const string Format = "flowcert-schedule";
    /// <summary>The value of the schedule's <c>version</c> key.</summary>
    public const int Version = 1;

    /// <summary>The JSON text of a schedule.</summary>
    public static string Write(FeedForwardSchedule s)
    {
        var g = s.Graph;
        var st = s.Statistics;
        var text = new StringWriter { NewLine = "\n" };
        using (var w = new JsonTextWriter(text) { Formatting = Formatting.Indented, Indentation = 2 })
        {
            // Name lists, forms and correction entries are written compactly, one to a line.
            void Names(IEnumerable<int> nodes) => w.WriteRawValue(JsonConvert.SerializeObject(nodes.Select(v => g.Names[v]).ToArray()));
            Dictionary<string, string> Terms(LinearForm f) => f.Terms.ToDictionary(t => g.Names[t.Node], t => t.Coefficient.ToString());

            w.WriteStartObject();
            w.WritePropertyName("format"); w.WriteValue(Format);
            w.WritePropertyName("version"); w.WriteValue(Version);
            w.WritePropertyName("flow"); w.WriteValue(FlowKinds.Name(s.Kind));
            w.WritePropertyName("field"); w.WriteValue(s.Field.Name);
            w.WritePropertyName("graphSha256"); w.WriteValue(CanonicalForm.Sha256(g));
            w.WritePropertyName("vanishedEdges");
            w.WriteRawValue(JsonConvert.SerializeObject(s.VanishedEdges.Select(e => new[] { g.Names[e.U], g.Names[e.V], e.Weight.ToString() }).ToArray()));
            w.WritePropertyName("depth"); w.WriteValue(st.Depth);
            w.WritePropertyName("rounds"); w.WriteStartArray(); foreach (var r in s.Rounds) Names(r); w.WriteEndArray();
            w.WritePropertyName("outputs"); Names(g.SortedOutputs);
            w.WritePropertyName("corrections");
            w.WriteStartArray();
            foreach (var c in s.Corrections)
                w.WriteRawValue(JsonConvert.SerializeObject(new { outcome = g.Names[c.Source], node = g.Names[c.Target], x = c.X.ToString(), z = c.Z.ToString() }));
            w.WriteEndArray();
            w.WritePropertyName("frames");
            w.WriteStartArray();
            foreach (var fr in s.Frames)
                w.WriteRawValue(JsonConvert.SerializeObject(new { node = g.Names[fr.Node], round = fr.IsOutput ? (int?)null : fr.Round, x = Terms(fr.X), z = Terms(fr.Z) }));
            w.WriteEndArray();
            w.WritePropertyName("statistics");
            w.WriteStartObject();
            w.WritePropertyName("depth"); w.WriteValue(st.Depth);
            w.WritePropertyName("nodesPerRound"); w.WriteRawValue(JsonConvert.SerializeObject(st.NodesPerRound));
            w.WritePropertyName("maxAngleDependencies"); w.WriteValue(st.MaxAngleDependencies);
            w.WritePropertyName("maxReadoutDependencies"); w.WriteValue(st.MaxReadoutDependencies);
            w.WritePropertyName("maxOutputDependencies"); w.WriteValue(st.MaxOutputDependencies);
            w.WritePropertyName("nonZeroX"); w.WriteValue(st.NonZeroX);
            w.WritePropertyName("nonZeroZ"); w.WriteValue(st.NonZeroZ);
            w.WritePropertyName("longestChain"); Names(st.LongestChain);
            w.WriteEndObject();
            w.WriteEndObject();
        }
        return text.ToString() + "\n";
    }
}
