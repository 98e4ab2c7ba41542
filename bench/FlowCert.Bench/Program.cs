using BenchmarkDotNet.Running;

namespace FlowCert.Bench;

/// <summary>Runs the benchmarks: <c>dotnet run -c Release --project bench/FlowCert.Bench -- --filter '*'</c>.</summary>
public static class Program
{
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
