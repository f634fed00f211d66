using Helipol.Emit;
using Helipol.Geometry;
using Helipol.Tests.Geometry;

namespace Helipol.Tests.Emit;

/// <summary>Renders each test input's fabrication set once per test run (rendering rasterises a
/// full page, so the emitter checks share it).</summary>
internal static class RenderedSets
{
    private static readonly Dictionary<string, Lazy<IReadOnlyList<FabricationFile>>> Sets = new()
    {
        ["Typical"] = new(() => FabricationSet.Render(BuildInputs.Typical)),
        ["LeftSixOnLetter"] = new(() => FabricationSet.Render(BuildInputs.LeftSixOnLetter)),
        ["Large"] = new(() => FabricationSet.Render(BuildInputs.Large)),
    };

    public static byte[] File(string inputName, string fileName) =>
        Sets[inputName].Value.Single(f => f.FileName == fileName).Bytes;

    public static PolarizerGeometry Geometry(string inputName) => new(BuildInputs.ByName(inputName));
}
