using System.Security.Cryptography;
using System.Text;
using FlowCert.Cli;

namespace FlowCert.Tests.Cli;

/// <summary>The result of one flowcert run: exit code and everything written to stdout and stderr.</summary>
public sealed record CliRun(int ExitCode, string Stdout, string Stderr)
{
    public override string ToString() => $"exit {ExitCode}\n--- stdout\n{Stdout}--- stderr\n{Stderr}";
}

/// <summary>Runs the flowcert command in-process (CliApp.Run) or as a real `dotnet FlowCert.Cli.dll` process.</summary>
public static class Flowcert
{
    /// <summary>Runs in-process with <paramref name="standardInput"/> as standard input (for "-" as a file name).</summary>
    public static CliRun WithInput(string standardInput, params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr, new StringReader(standardInput));
        return new CliRun(code, stdout.ToString(), stderr.ToString());
    }

    public static CliRun InProcess(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        int code = CliApp.Run(args, stdout, stderr);
        return new CliRun(code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>The CLI assembly built beside the tests (the test project references FlowCert.Cli).</summary>
    public static string CliAssembly => Path.Combine(AppContext.BaseDirectory, "FlowCert.Cli.dll");

    /// <summary>The dotnet host running these tests (so the same runtime runs the CLI).</summary>
    private static string DotnetHost
    {
        get
        {
            var self = Environment.ProcessPath;
            if (self is not null && Path.GetFileNameWithoutExtension(self) == "dotnet") return self;
            return Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") ?? "dotnet";
        }
    }

    public static CliRun AsProcess(string workingDirectory, params string[] args)
    {
        Assert.True(File.Exists(CliAssembly), $"{CliAssembly} was not built beside the tests");
        var run = ExternalProgram.Run(DotnetHost, "dotnet-sdk-10.0 (or the .NET 10 SDK from Microsoft)", [CliAssembly, .. args], workingDirectory);
        return new CliRun(run.ExitCode, run.Stdout, run.Stderr);
    }
}

/// <summary>
/// A private temporary folder for one test, deleted afterwards. <see cref="AssertExactly"/> lists every
/// file in it (hidden ones and sub-folders included), so a left-over temporary file fails the test.
/// </summary>
public sealed class Workspace : IDisposable
{
    public DirectoryInfo Root { get; } = Directory.CreateTempSubdirectory("flowcert-cli-");

    public string PathOf(string relative) => Path.Combine(Root.FullName, relative);

    public string Write(string relative, string text)
    {
        var path = PathOf(relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text, new UTF8Encoding(false));
        return path;
    }

    public string Read(string relative) => File.ReadAllText(PathOf(relative));
    public byte[] Bytes(string relative) => File.ReadAllBytes(PathOf(relative));

    /// <summary>Every file and folder under the root, as relative paths with '/' separators, sorted.</summary>
    public string[] Listing()
        => Root.EnumerateFileSystemInfos("*", new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = 0 })
            .Select(f => Path.GetRelativePath(Root.FullName, f.FullName).Replace('\\', '/') + (f is DirectoryInfo ? "/" : ""))
            .Order(StringComparer.Ordinal).ToArray();

    /// <summary>Asserts the folder holds exactly these entries (folders end in '/'): no temporary files, nothing partial.</summary>
    public void AssertExactly(params string[] entries)
        => Assert.Equal(entries.Order(StringComparer.Ordinal).ToArray(), Listing());

    public void Dispose()
    {
        try { Root.Delete(true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}

/// <summary>Hashing for expected values computed outside the library.</summary>
public static class Hashes
{
    public static string Sha256Hex(string text) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
}
