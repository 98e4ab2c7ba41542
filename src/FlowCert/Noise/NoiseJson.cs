using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Noise;

/// <summary>
/// The JSON report of <c>flowcert noise --json</c>: exact matrices as rational strings (S, L, the
/// anti-squeezed K, the covariance L L^T in units of e^(-2r)/2), then floating-point figures.
/// </summary>
public static class NoiseJson
{
    /// <summary>Formats a report as one indented JSON object, keys in a fixed order.</summary>
    public static string Write(NoiseReport report, NoiseRequest request)
    {
        var g = report.Flow.Graph;
        JRaw Nodes(IEnumerable<int> nodes) => new(new JArray(nodes.Select(v => g.Names[v])).ToString(Formatting.None));
        var rows = Enumerable.Range(0, report.Rows).ToArray();
        var o = new JObject
        {
            ["flow"] = FlowKinds.Name(report.Flow.Kind),
            ["field"] = "Q",
            ["graphSha256"] = CanonicalForm.Sha256(g),
            ["inputs"] = Nodes(report.Inputs),
            ["outputs"] = Nodes(report.Outputs),
            ["squeezed"] = Nodes(report.Squeezed),
            ["phases"] = new JObject(report.Phases.Select(p => new JProperty(g.Names[p.Key], p.Value.ToString()))),
            ["valid"] = report.Valid,
            ["rows"] = new JRaw(new JArray(rows.Select(report.RowName)).ToString(Formatting.None)),
            ["columnsS"] = new JRaw(new JArray(Enumerable.Range(0, report.S.GetLength(1)).Select(k => NoiseText.InputName(report, k))).ToString(Formatting.None)),
            ["S"] = Matrix(report.S),
            ["unit"] = "e^(-2r)/2",
            ["L"] = Matrix(report.L),
            ["covariance"] = Matrix(report.Covariance),
            ["addedVariance"] = new JObject(rows.Select(row => new JProperty(report.RowName(row), report.AddedVariance(row).ToString()))),
            ["antiSqueezed"] = Matrix(report.K),
            ["leaks"] = new JArray(report.Leaks.Select(l => new JObject
            {
                ["node"] = g.Names[l.Node], [report.IsEmbedding ? "direction" : "row"] = report.DirectionName(l.Row), ["coefficient"] = l.Coefficient.ToString(),
            })),
        };
        if (report.IsEmbedding)
        {
            var directions = Enumerable.Range(0, report.DirectionCount).ToArray();
            o["finite"] = new JObject
            {
                ["directions"] = new JRaw(new JArray(directions.Select(report.DirectionName)).ToString(Formatting.None)),
                ["kinds"] = new JRaw(new JArray(directions.Select(j => report.IsNullifier(j) ? "nullifier" : "logical")).ToString(Formatting.None)),
                ["D"] = Matrix(report.Directions),
                ["DS"] = Matrix(report.DirectionS),
                ["DL"] = Matrix(report.DirectionL),
                ["covariance"] = Matrix(report.DirectionCovariance),
                ["addedVariance"] = new JObject(directions.Select(j => new JProperty(report.DirectionName(j), report.DirectionVariance(j).ToString()))),
                ["DK"] = Matrix(report.DirectionK),
            };
        }
        if (request.Decibels is { } db) o["at"] = Level(report, db);
        if (request.Sweep is { } levels) o["sweep"] = new JArray(levels.Select(level => Level(report, level)));
        if (request.Target is { } target)
            o["target"] = new JObject
            {
                ["vacuumUnits"] = target.ToString(),
                ["dB"] = NoiseFigures.TargetDecibels(report, target) is { } need ? Round(need) : JValue.CreateNull(),
            };
        return o.ToString(Formatting.Indented) + "\n";
    }

    private static JObject Level(NoiseReport report, double db)
    {
        double r = NoiseFigures.SqueezingParameter(db);
        return new JObject
        {
            ["dB"] = Round(db),
            ["r"] = Round(r),
            ["addedVarianceVacuumUnits"] = report.IsEmbedding
                ? new JObject(Enumerable.Range(0, report.DirectionCount)
                    .Select(j => new JProperty(report.DirectionName(j), Round(NoiseFigures.DirectionAddedVariance(report, j, r)))))
                : new JObject(Enumerable.Range(0, report.Rows)
                    .Select(row => new JProperty(report.RowName(row), Round(NoiseFigures.AddedVariance(report, row, r))))),
            ["fidelity"] = report.IsEmbedding ? JValue.CreateNull() : Round(NoiseFigures.CoherentStateFidelity(report, r)),
        };
    }

    // Twelve significant digits: the same text on every machine even if the last bits of exp differ.
    private static JValue Round(double x) => new(double.Parse(x.ToString("G12", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture));

    // One matrix row per line: each row is written compactly and kept raw inside the indented object.
    private static JArray Matrix(Rational[,] m)
        => new(Enumerable.Range(0, m.GetLength(0)).Select(i =>
            new JRaw(new JArray(Enumerable.Range(0, m.GetLength(1)).Select(j => m[i, j].ToString())).ToString(Formatting.None))));
}
