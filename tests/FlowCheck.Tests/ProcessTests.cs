using System.Diagnostics;

namespace FlowCheck.Tests;

/// <summary>A few runs of the built flowcheck as a real process, as a referee would run it.</summary>
public class ProcessTests
{
    static (int Code, string Out, string Err) Flowcheck(params string[] args)
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "flowcheck.dll");
        Assert.True(File.Exists(dll), dll);
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true };
        start.ArgumentList.Add(dll);
        foreach (var a in args) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEnd();
        Assert.True(p.WaitForExit(60_000), "flowcheck did not finish within a minute");
        return (p.ExitCode, stdout.Result, stderr);
    }

    [Fact]
    public void ValidCertificateExitsZero()
    {
        var cert = Support.Write(Examples.SquareF3().ToString(), ".json");
        var graph = Support.Write("edge a x\nedge a y\nedge b x\nedge b y -1\noutput x y\n", ".ograph");
        var (code, stdout, stderr) = Flowcheck(cert, "--graph", graph);
        Assert.Equal("", stderr);
        Assert.StartsWith("valid: generalized flow over F3, depth 1, graph sha256 ", stdout);
        Assert.Equal(0, code);
    }

    [Fact]
    public void InvalidCertificateExitsOne()
    {
        var cert = Support.Write(Support.Edit(Examples.WireCausal(), c => c["depth"] = 3).ToString(), ".json");
        var (code, stdout, _) = Flowcheck(cert);
        Assert.Equal("invalid: depth is 3 but there are 2 rounds", stdout.TrimEnd());
        Assert.Equal(1, code);
    }

    [Fact]
    public void UnreadableInputExitsTwo()
    {
        var (code, stdout, stderr) = Flowcheck("/nonexistent/certificate.json");
        Assert.Equal("", stdout);
        Assert.StartsWith("unreadable: /nonexistent/certificate.json", stderr);
        Assert.Equal(2, code);
    }
}
