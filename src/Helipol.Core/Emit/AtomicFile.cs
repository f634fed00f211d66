namespace Helipol.Emit;

/// <summary>
/// Writes a file so that a reader sees either the old bytes or the new bytes, never a mix:
/// the bytes go to a temporary file in the same folder, are flushed to disk, then renamed over
/// the target (rename within one file system is atomic on POSIX).
/// </summary>
public static class AtomicFile
{
    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes)
    {
        var full = Path.GetFullPath(path);
        var folder = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(folder);
        var temp = Path.Combine(folder, "." + Path.GetFileName(full) + ".partial-" + Environment.ProcessId);
        try
        {
            using (var stream = new FileStream(temp, FileMode.Create, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            File.Move(temp, full, overwrite: true);
        }
        catch
        {
            TryDelete(temp);
            throw;
        }
    }

    public static void WriteAllText(string path, string text) =>
        WriteAllBytes(path, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));

    private static void TryDelete(string path)
    {
        try { File.Delete(path); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}
