using Helipol.Geometry;

namespace Helipol.Emit;

/// <summary>
/// Writes a rendered fabrication set into a folder. Everything is rendered before the first byte
/// is written, and each file goes through <see cref="AtomicFile"/>, so a failure (bad input, a
/// renderer error) leaves the folder's earlier files as they were.
/// </summary>
public static class FabricationWriter
{
    public static IReadOnlyList<string> Write(PolarizerBuildInput input, string folder) =>
        Write(FabricationSet.Render(input), folder);

    public static IReadOnlyList<string> Write(IReadOnlyList<FabricationFile> files, string folder)
    {
        var written = new List<string>();
        foreach (var f in files)
        {
            var path = Path.Combine(folder, f.FileName);
            AtomicFile.WriteAllBytes(path, f.Bytes);
            written.Add(path);
        }
        return written;
    }
}
