using BenchmarkDotNet.Running;

namespace FlowCert.Bench;

/// <summary>
/// Runs the benchmarks: <c>dotnet run -c Release --project bench/FlowCert.Bench -- --filter '*'</c>.
/// Two plain stopwatch modes serve <c>bench/compare</c>: <c>matrices DIR</c> writes the kernel matrices,
/// <c>kernel FIELD FILE REPS</c> times the elimination kernel on one of them.
/// </summary>
public static class Program
{
    public static void Main(string[] args)
    {
        if (args is ["matrices", var dir]) KernelRunner.WriteMatrices(dir);
        else if (args is ["kernel", var field, var file, var reps]) KernelRunner.Time(field, file, int.Parse(reps, System.Globalization.CultureInfo.InvariantCulture));
        else BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
