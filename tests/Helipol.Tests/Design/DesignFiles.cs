using Helipol.Model;

namespace Helipol.Tests.Design;

/// <summary>Design files kept beside the tests (tests/Helipol.Tests/data/designs).</summary>
internal static class DesignFiles
{
    public static string PathOf(string name) => Path.Combine(AppContext.BaseDirectory, "data", "designs", name + ".yaml");

    public static PolarizerDesign Load(string name) => DesignResolver.ReadFile(PathOf(name), name + ".yaml");
}
