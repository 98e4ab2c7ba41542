namespace FlowCert.Graphs;

/// <summary>A malformed graph file: carries the file, the 1-based line and column, and what is wrong.</summary>
public sealed class GraphFormatException(string file, int line, int column, string problem)
    : Exception($"{file}:{line}:{column}: {problem}")
{
    /// <summary>The file name the problem is reported against.</summary>
    public string File { get; } = file;
    /// <summary>The 1-based line of the problem.</summary>
    public int Line { get; } = line;
    /// <summary>The 1-based column of the problem.</summary>
    public int Column { get; } = column;
    /// <summary>What is wrong, without the location.</summary>
    public string Problem { get; } = problem;
}
