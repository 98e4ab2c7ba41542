using System.Runtime.InteropServices;

namespace FlowCert.Cli;

/// <summary>
/// Writes output files whole or not at all: a temporary file beside the target, then a rename. Only an
/// absent target or a regular file is written; a symbolic link, a device, a FIFO or a socket is refused
/// (renaming over one would replace it with a regular file). A temporary file is removed on failure, on
/// SIGINT and SIGTERM, and a stale one of the same target left by a killed run is removed on the next write.
/// </summary>
public static class SafeFile
{
    private const string TempSuffix = ".flowcert-tmp";
    private static readonly HashSet<string> Pending = new(StringComparer.Ordinal);
    private static readonly object Gate = new();
    private static PosixSignalRegistration[]? signals;

    /// <summary>Writes text to path atomically; refuses to write over any of the protected paths.</summary>
    public static void WriteAllText(string path, string text, params string[] protectedPaths)
        => Write(path, w => w.Write(text), protectedPaths);

    /// <summary>Writes what <paramref name="write"/> writes (UTF-8, no byte order mark) to path atomically, streaming
    /// it into the temporary file; refuses to write over any of the protected paths.</summary>
    public static void Write(string path, Action<TextWriter> write, params string[] protectedPaths)
    {
        var full = Path.GetFullPath(path);
        foreach (var p in protectedPaths)
            if (string.Equals(Path.GetFullPath(p), full, StringComparison.Ordinal))
                throw new UserInputException($"refusing to write {path}: it is an input of this command");
        if (Directory.Exists(full)) throw new UserInputException($"cannot write {path}: it is a folder");
        var dir = Path.GetDirectoryName(full)!;
        if (!Directory.Exists(dir)) throw new UserInputException($"cannot write {path}: folder {dir} does not exist");
        if (FileKind.Of(full) is { } kind && kind != FileKind.Regular)
            throw new UserInputException($"refusing to write {path}: it is {FileKind.Describe(kind)}, not a regular file (remove it or choose another name)");
        RemoveStale(dir, Path.GetFileName(full));
        var tmp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}{TempSuffix}");
        Track(tmp);
        try
        {
            using (var stream = new FileStream(tmp, FileMode.CreateNew, FileAccess.Write))
            using (var writer = new StreamWriter(stream, new System.Text.UTF8Encoding(false), 1 << 16))
                write(writer);
            File.Move(tmp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new UserInputException($"cannot write {path}: {e.Message.Replace(tmp, full)}");
        }
        finally
        {
            if (File.Exists(tmp)) File.Delete(tmp);
            lock (Gate) Pending.Remove(tmp);
        }
    }

    private static void Track(string tmp)
    {
        lock (Gate)
        {
            Pending.Add(tmp);
            if (signals is null && !OperatingSystem.IsWindows() && !OperatingSystem.IsBrowser())
                signals = [PosixSignalRegistration.Create(PosixSignal.SIGINT, OnSignal), PosixSignalRegistration.Create(PosixSignal.SIGTERM, OnSignal)];
        }
    }

    // Remove what is being written, then let the signal end the process as it would have.
    private static void OnSignal(PosixSignalContext context)
    {
        lock (Gate)
            foreach (var tmp in Pending)
                try { File.Delete(tmp); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }

    // Temporaries of this target whose process is gone were left by a killed run.
    private static void RemoveStale(string dir, string name)
    {
        var prefix = "." + name + ".";
        foreach (var file in Directory.EnumerateFiles(dir, prefix + "*" + TempSuffix))
        {
            var middle = Path.GetFileName(file)[prefix.Length..^TempSuffix.Length];
            if (!int.TryParse(middle, out var pid) || pid == Environment.ProcessId || IsAlive(pid)) continue;
            if (FileKind.Of(file) != FileKind.Regular) continue;
            try { File.Delete(file); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        }
    }

    private static bool IsAlive(int pid)
    {
        try { using var p = System.Diagnostics.Process.GetProcessById(pid); return !p.HasExited; }
        catch (ArgumentException) { return false; }
        catch (InvalidOperationException) { return false; }
    }
}

/// <summary>The type of a directory entry, read without following a symbolic link.</summary>
internal static class FileKind
{
    public const int Fifo = 0x1000, CharDevice = 0x2000, Directory = 0x4000, BlockDevice = 0x6000,
        Regular = 0x8000, SymbolicLink = 0xA000, Socket = 0xC000;

    /// <summary>The S_IFMT bits of the entry at path, or null when there is none.</summary>
    public static int? Of(string path)
    {
        if (OperatingSystem.IsWindows())
        {
            var info = new FileInfo(path);
            if (!info.Exists && !System.IO.Directory.Exists(path)) return null;
            return info.LinkTarget is not null ? SymbolicLink : info.Attributes.HasFlag(FileAttributes.Directory) ? Directory : Regular;
        }
        // The .NET runtime's own lstat wrapper: its status record starts with two 32-bit fields, flags and mode.
        var status = new byte[256];
        if (LStat(path, status) != 0) return null;
        return BitConverter.ToInt32(status, 4) & 0xF000;
    }

    public static string Describe(int kind) => kind switch
    {
        Fifo => "a FIFO",
        CharDevice => "a character device",
        BlockDevice => "a block device",
        SymbolicLink => "a symbolic link",
        Socket => "a socket",
        Directory => "a folder",
        _ => "a special file",
    };

    [DllImport("libSystem.Native", EntryPoint = "SystemNative_LStat", CharSet = CharSet.Ansi, SetLastError = true)]
    private static extern int LStat(string path, byte[] status);
}
