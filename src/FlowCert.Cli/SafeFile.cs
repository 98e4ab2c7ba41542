namespace FlowCert.Cli;

/// <summary>Writes output files whole or not at all: a temporary file beside the target, then a rename.</summary>
public static class SafeFile
{
    /// <summary>Writes text to path atomically; refuses to write over any of the protected paths.</summary>
    public static void WriteAllText(string path, string text, params string[] protectedPaths)
    {
        var full = Path.GetFullPath(path);
        foreach (var p in protectedPaths)
            if (string.Equals(Path.GetFullPath(p), full, StringComparison.Ordinal))
                throw new UserInputException($"refusing to write {path}: it is an input of this command");
        if (Directory.Exists(full)) throw new UserInputException($"cannot write {path}: it is a folder");
        var dir = Path.GetDirectoryName(full)!;
        if (!Directory.Exists(dir)) throw new UserInputException($"cannot write {path}: folder {dir} does not exist");
        var tmp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.tmp");
        try
        {
            File.WriteAllText(tmp, text, new System.Text.UTF8Encoding(false));
            File.Move(tmp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new UserInputException($"cannot write {path}: {e.Message.Replace(tmp, full)}");
        }
        finally
        {
            if (File.Exists(tmp)) File.Delete(tmp);
        }
    }
}
