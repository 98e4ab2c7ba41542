namespace FlowCert.Graphs.Formats;

/// <summary>
/// Reads a whole input file as text for the formats that are parsed in one piece (JSON, graph6, sparse6,
/// Matrix Market, certificates). A file above <see cref="MaxBytes"/> is refused as an input error, before
/// anything is read, rather than exhausting memory (.ograph files are streamed and have no such limit).
/// </summary>
public static class InputText
{
    /// <summary>The largest file read whole: 1,000,000,000 bytes (a .NET string holds at most about 2^30 characters).</summary>
    public const long MaxBytes = 1_000_000_000;

    /// <summary>The text of the file; <see cref="GraphFileException"/> when it is larger than <see cref="MaxBytes"/>.</summary>
    public static string ReadAll(string path)
    {
        var info = new FileInfo(path);
        if (info.Exists && info.Length > MaxBytes)
            throw new GraphFileException($"{path}: the file has {info.Length} bytes; files in this format are read whole and may have at most {MaxBytes} bytes");
        return File.ReadAllText(path);
    }
}
