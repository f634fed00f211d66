using System.Globalization;

namespace Helipol.Emit;

/// <summary>
/// Writes a file so that a reader sees either the old bytes or the new bytes, never a mix:
/// the bytes go to a temporary file in the same folder, are flushed to disk, then renamed over
/// the target (rename within one file system is atomic on POSIX, rename(2)). A failed write
/// (full disk, no permission) removes the temporary file and raises <see cref="OutputWriteException"/>.
/// </summary>
public static class AtomicFile
{
    /// <summary>
    /// Test seam: runs after every temporary file of a set is complete and before any is renamed over
    /// its target, for the whole process. A test holds a child build here to kill it mid-write.
    /// </summary>
    internal static Action? BeforeRenames;

    private static readonly AsyncLocal<Func<Stream, Stream>?> WrapStream = new();

    /// <summary>
    /// Test hook: wraps the temporary file's stream for the calling flow only (e.g. with a stream
    /// that fails like a full disk). Dispose the result to remove the hook.
    /// </summary>
    public static IDisposable InterceptWrites(Func<Stream, Stream> wrap)
    {
        var previous = WrapStream.Value;
        WrapStream.Value = wrap;
        return new Restore(() => WrapStream.Value = previous);
    }

    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes) => WriteAll([(path, bytes.ToArray())]);

    /// <summary>
    /// Writes a set of files in two phases: every temporary file is written and flushed first, and
    /// only when all are on disk are they renamed over their targets. A failure in the first phase
    /// (full disk, no permission) removes the temporary files and leaves every target as it was.
    /// </summary>
    public static void WriteAll(IReadOnlyList<(string Path, byte[] Bytes)> files)
    {
        var staged = new List<(string Temp, string Full)>();
        string current = "";
        try
        {
            foreach (var (path, bytes) in files)
            {
                current = Path.GetFullPath(path);
                var folder = Path.GetDirectoryName(current) ?? ".";
                var temp = Path.Combine(folder, "." + Path.GetFileName(current) + ".partial-" + Environment.ProcessId);
                Directory.CreateDirectory(folder);
                RemoveStaleTemporaries(folder, Path.GetFileName(current));
                staged.Add((temp, current));
                using (var file = new FileStream(temp, FileMode.Create, FileAccess.Write, FileShare.None))
                using (var stream = WrapStream.Value?.Invoke(file) ?? file)
                {
                    stream.Write(bytes);
                    stream.Flush();
                    file.Flush(flushToDisk: true);
                }
            }
            BeforeRenames?.Invoke();
            foreach (var (temp, full) in staged)
            {
                current = full;
                File.Move(temp, full, overwrite: true);
            }
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            foreach (var (temp, _) in staged) TryDelete(temp);
            throw new OutputWriteException(current, ex);
        }
    }

    public static void WriteAllText(string path, string text) =>
        WriteAllBytes(path, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));

    /// <summary>
    /// A run killed between its two phases leaves ".NAME.partial-PID" beside NAME. They never stand
    /// under a final name, but they would pile up: the next write of NAME removes those whose process
    /// is gone (a live process may still be writing its own).
    /// </summary>
    private static void RemoveStaleTemporaries(string folder, string name)
    {
        var prefix = "." + name + ".partial-";
        foreach (var temp in Directory.EnumerateFiles(folder, prefix + "*"))
        {
            var pidText = Path.GetFileName(temp)[prefix.Length..];
            if (!int.TryParse(pidText, NumberStyles.None, CultureInfo.InvariantCulture, out var pid) || pid == Environment.ProcessId) continue;
            if (!IsAlive(pid)) TryDelete(temp);
        }
    }

    private static bool IsAlive(int pid)
    {
        try
        {
            using var process = System.Diagnostics.Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (ArgumentException) { return false; }
        catch (InvalidOperationException) { return false; }
    }

    private static void TryDelete(string path)
    {
        try { File.Delete(path); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }

    private sealed class Restore(Action undo) : IDisposable
    {
        public void Dispose() => undo();
    }
}

/// <summary>An output file could not be written (full disk, no permission, a file where a folder should be).</summary>
public sealed class OutputWriteException(string path, Exception inner)
    : IOException($"cannot write {path}: {Reason(inner)}", inner)
{
    public string Path { get; } = path;

    /// <summary>The system's reason without the path it repeats (the path is already in front).</summary>
    private static string Reason(Exception ex)
    {
        var message = ex.Message;
        var cut = message.IndexOf(" : '", StringComparison.Ordinal);
        if (cut < 0) cut = message.IndexOf(" '", StringComparison.Ordinal) is var c && c > 0 && message.EndsWith('\'') ? c : -1;
        return (cut > 0 ? message[..cut] : message).TrimEnd('.', ' ');
    }
}
