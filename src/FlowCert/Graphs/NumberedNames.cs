using System.Globalization;

namespace FlowCert.Graphs;

/// <summary>The names of nodes that arrive as numbers (graph6, sparse6, Matrix Market, random families): v0, v1, ...</summary>
public static class NumberedNames
{
    /// <summary>The name of node number k: <c>v</c> followed by k in decimal.</summary>
    public static string Name(long k) => "v" + k.ToString(CultureInfo.InvariantCulture);
}
