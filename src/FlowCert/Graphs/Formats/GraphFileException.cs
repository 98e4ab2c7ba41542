namespace FlowCert.Graphs.Formats;

/// <summary>
/// A graph file that cannot be used as asked, independent of its contents: an extension no format has,
/// a format that cannot be read or written, or inputs and outputs that do not fit the file.
/// </summary>
public sealed class GraphFileException(string message) : Exception(message);
