namespace Helipol.Tests;

/// <summary>Locations the tests read from: the copied data folder and the repository's designs.</summary>
internal static class TestPaths
{
    public static string Data => Path.Combine(AppContext.BaseDirectory, "data");

    public static string RepositoryRoot
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Helipol.sln"))) dir = dir.Parent;
            return dir?.FullName ?? throw new InvalidOperationException("Helipol.sln not found above the test folder");
        }
    }

    public static string Designs => Path.Combine(RepositoryRoot, "designs");

    public static IEnumerable<string> DemoDesigns => Directory.GetFiles(Designs, "*.yaml").OrderBy(p => p, StringComparer.Ordinal);

    /// <summary>Demo design file names, for [MemberData] theories.</summary>
    public static TheoryData<string> DemoDesignNames()
    {
        var data = new TheoryData<string>();
        foreach (var d in DemoDesigns) data.Add(Path.GetFileName(d));
        return data;
    }

    public static string NewTempFolder()
    {
        var path = Path.Combine(Path.GetTempPath(), "helipol-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(path);
        return path;
    }
}
