namespace FlowCert.Graphs;

/// <summary>A malformed graph file: carries the file, the 1-based line and column, and what is wrong.</summary>
public sealed class GraphFormatException(string file, int line, int column, string problem)
    : Exception($"{file}:{line}:{column}: {problem}")
{
    public string File { get; } = file;
    public int Line { get; } = line;
    public int Column { get; } = column;
    public string Problem { get; } = problem;
}
