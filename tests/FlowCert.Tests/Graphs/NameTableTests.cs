using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>The reader's name table against a plain dictionary (common practice): ids in order of first sight, across growth.</summary>
public class NameTableTests
{
    [Fact]
    public void IdsFollowFirstSightAndEveryNameIsFoundAfterGrowth()
    {
        var table = new NameTable();
        var reference = new Dictionary<string, int>(StringComparer.Ordinal);
        var rng = new Random(3);
        for (int n = 0; n < 50_000; n++)
        {
            var name = "v" + rng.Next(30_000).ToString(System.Globalization.CultureInfo.InvariantCulture);
            int found = table.Find(name);
            if (reference.TryGetValue(name, out var id)) Assert.Equal(id, found);
            else
            {
                Assert.Equal(-1, found);
                Assert.Equal(reference.Count, table.Add(name));
                reference[name] = reference.Count;
            }
        }
        Assert.Equal(reference.Count, table.Count);
        foreach (var (name, id) in reference)
        {
            Assert.Equal(id, table.Find(name));
            Assert.Equal(name, table.Names[id]);
        }
        Assert.Equal(-1, table.Find("w1"));
        Assert.Equal(-1, table.Find(""));
    }
}
