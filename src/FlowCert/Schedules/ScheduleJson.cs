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
    public const string Format = "flowcert-schedule";
    public const int Version = 1;

    public static string Write(FeedForwardSchedule s)
    {
        var g = s.Graph;
        var st = s.Statistics;
        var text = new StringWriter { NewLine = "\n" };
        using (var w = new JsonTextWriter(text) { Formatting = Formatting.Indented, Indentation = 2 })
        {
            void Names(IEnumerable<int> nodes) { w.WriteStartArray(); foreach (var v in nodes) w.WriteValue(g.Names[v]); w.WriteEndArray(); }
            void Form(LinearForm f) { w.WriteStartObject(); foreach (var (v, c) in f.Terms) { w.WritePropertyName(g.Names[v]); w.WriteValue(c); } w.WriteEndObject(); }

            w.WriteStartObject();
            w.WritePropertyName("format"); w.WriteValue(Format);
            w.WritePropertyName("version"); w.WriteValue(Version);
            w.WritePropertyName("flow"); w.WriteValue(CertificateWriter.KindName(s.Kind));
            w.WritePropertyName("field"); w.WriteValue(s.Field.Name);
            w.WritePropertyName("graphSha256"); w.WriteValue(CanonicalForm.Sha256(g));
            w.WritePropertyName("depth"); w.WriteValue(st.Depth);
            w.WritePropertyName("rounds"); w.WriteStartArray(); foreach (var r in s.Rounds) Names(r); w.WriteEndArray();
            w.WritePropertyName("outputs"); Names(g.SortedOutputs);
            w.WritePropertyName("corrections");
            w.WriteStartArray();
            foreach (var c in s.Corrections)
            {
                w.WriteStartObject();
                w.WritePropertyName("outcome"); w.WriteValue(g.Names[c.Source]);
                w.WritePropertyName("node"); w.WriteValue(g.Names[c.Target]);
                w.WritePropertyName("x"); w.WriteValue(c.X);
                w.WritePropertyName("z"); w.WriteValue(c.Z);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WritePropertyName("frames");
            w.WriteStartArray();
            foreach (var fr in s.Frames)
            {
                w.WriteStartObject();
                w.WritePropertyName("node"); w.WriteValue(g.Names[fr.Node]);
                w.WritePropertyName("round"); if (fr.IsOutput) w.WriteNull(); else w.WriteValue(fr.Round);
                w.WritePropertyName("x"); Form(fr.X);
                w.WritePropertyName("z"); Form(fr.Z);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WritePropertyName("statistics");
            w.WriteStartObject();
            w.WritePropertyName("depth"); w.WriteValue(st.Depth);
            w.WritePropertyName("nodesPerRound"); w.WriteStartArray(); foreach (var k in st.NodesPerRound) w.WriteValue(k); w.WriteEndArray();
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
