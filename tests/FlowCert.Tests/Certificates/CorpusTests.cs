using FlowCert.Cli;

namespace FlowCert.Tests.Certificates;

/// <summary>certificates/ must be exactly what the current solver writes for the demo: re-solve and compare bytes.</summary>
public class CorpusTests
{
    internal static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "FlowCert.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("FlowCert.sln not found above the test binaries");
    }

    [Fact]
    public void TheCommittedCorpusIsByteForByteWhatTheDemoWritesToday()
    {
        var corpus = Path.Combine(RepositoryRoot(), "certificates");
        var fresh = Directory.CreateTempSubdirectory("flowcert-corpus-").FullName;
        try
        {
            Assert.Equal(0, DemoCommand.Execute(fresh, TextWriter.Null));
            var expected = Directory.GetFiles(fresh).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
            var committed = Directory.GetFiles(corpus).Select(Path.GetFileName).Where(n => n != "README.md").Order(StringComparer.Ordinal).ToList();
            Assert.Equal(expected, committed);
            Assert.True(expected.Count(n => n!.EndsWith(".json")) >= 20, "the demo should certify at least 20 cases");
            foreach (var name in expected)
                Assert.True(File.ReadAllBytes(Path.Combine(fresh, name!)).SequenceEqual(File.ReadAllBytes(Path.Combine(corpus, name!))), $"{name} differs from a fresh solve");
        }
        finally { Directory.Delete(fresh, recursive: true); }
    }
}
