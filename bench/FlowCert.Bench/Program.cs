using BenchmarkDotNet.Running;

namespace FlowCert.Bench;

/// <summary>
/// Runs the benchmarks: <c>dotnet run -c Release --project bench/FlowCert.Bench -- --filter '*'</c>.
/// Two plain stopwatch modes serve <c>bench/compare</c>: <c>matrices DIR</c> writes the kernel matrices,
/// <c>kernel FIELD FILE REPS</c> times the elimination kernel on one of them, <c>band N WIDTH FIELD REPS [hub | hubs K] [fresh]</c>
/// times a whole solve on a random band graph, with a hub output joined to every node or K hub outputs joined to random halves if asked,
/// and with every layer's block eliminated afresh (never carried) if asked (bench/layers), <c>bandfile N WIDTH OUT [hubs K]</c> writes that graph.
/// </summary>
public static class Program
{
    public static void Main(string[] args)
    {
        if (args is ["matrices", var dir]) KernelRunner.WriteMatrices(dir);
        else if (args is ["kernel", var field, var file, var reps]) KernelRunner.Time(field, file, int.Parse(reps, System.Globalization.CultureInfo.InvariantCulture));
        else if (args is ["bandfile", var fn, var fwidth, var outFile, .. var more] && more is [] or ["hubs", _])
            File.WriteAllText(outFile, FlowCert.Graphs.CanonicalForm.Write(Workloads.Band(int.Parse(fn, System.Globalization.CultureInfo.InvariantCulture), int.Parse(fwidth, System.Globalization.CultureInfo.InvariantCulture),
                hubs: more is ["hubs", var fk] ? int.Parse(fk, System.Globalization.CultureInfo.InvariantCulture) : 0)));
        else if (args is ["band", var n, var width, var bandField, var bandReps, .. var rest]
                 && (rest is [.. var shape, "fresh"] ? shape : rest) is [] or ["hub"] or ["hubs", _])
            KernelRunner.TimeBand(int.Parse(n, System.Globalization.CultureInfo.InvariantCulture), int.Parse(width, System.Globalization.CultureInfo.InvariantCulture),
                bandField, int.Parse(bandReps, System.Globalization.CultureInfo.InvariantCulture), hub: rest is ["hub", ..],
                hubs: rest is ["hubs", var k, ..] ? int.Parse(k, System.Globalization.CultureInfo.InvariantCulture) : 0, fresh: rest is [.., "fresh"]);
        else BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
