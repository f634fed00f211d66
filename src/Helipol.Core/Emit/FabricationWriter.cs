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
        var staged = files.Select(f => (Path.Combine(folder, f.FileName), f.Bytes)).ToList();
        AtomicFile.WriteAll(staged);
        return staged.Select(s => s.Item1).ToList();
    }
}
