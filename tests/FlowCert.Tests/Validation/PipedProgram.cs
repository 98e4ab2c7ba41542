using System.ComponentModel;
using System.Diagnostics;

namespace FlowCert.Tests.Validation;

/// <summary>
/// Runs an external program by name (z3, nauty-geng, nauty-showg) and feeds it standard input: the
/// piped sibling of <see cref="FlowCert.Tests.ExternalProgram"/>. A missing program fails the test with a
/// message naming the Debian package that provides it; it never passes silently.
/// </summary>
public static class PipedProgram
{
    /// <summary>Runs the program with the arguments and standard input; returns standard output. Fails on a non-zero exit.</summary>
    public static string Run(string program, string debianPackage, IEnumerable<string> arguments, string? standardInput = null)
    {
        var info = new ProcessStartInfo(program)
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var a in arguments) info.ArgumentList.Add(a);
        Process process;
        try
        {
            if (DebianTools.IsHidden(program)) throw new Win32Exception("hidden by FLOWCERT_TEST_HIDE_PROGRAMS");
            process = Process.Start(info) ?? throw new InvalidOperationException($"could not start {program}");
        }
        catch (Win32Exception e)
        {
            throw new Xunit.Sdk.XunitException($"'{program}' is not installed ({e.Message}): install the Debian package '{debianPackage}' (apt-get install {debianPackage})");
        }
        using (process)
        {
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            if (standardInput is not null) process.StandardInput.Write(standardInput);
            process.StandardInput.Close();
            process.WaitForExit();
            if (process.ExitCode != 0)
                throw new Xunit.Sdk.XunitException($"{program} {string.Join(' ', info.ArgumentList)} exited with {process.ExitCode}: {stderr.Result}{stdout.Result}");
            return stdout.Result;
        }
    }
}
