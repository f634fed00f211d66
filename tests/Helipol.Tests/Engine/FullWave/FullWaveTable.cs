using System.Globalization;

namespace Helipol.Tests.Engine.FullWave;

/// <summary>
/// Reads the committed full-wave tables in docs/fullwave (written by `make validate` with openEMS;
/// format in docs/fullwave/README.md): `#` comment lines, one header line, comma-separated rows.
/// </summary>
internal static class FullWaveTable
{
    public static string Folder => Path.Combine(TestPaths.RepositoryRoot, "docs", "fullwave");

    public static IReadOnlyList<IReadOnlyDictionary<string, string>> Read(string fileName)
    {
        var lines = File.ReadAllLines(Path.Combine(Folder, fileName)).Where(l => l.Length > 0 && !l.StartsWith('#')).ToArray();
        var header = lines[0].Split(',');
        return lines.Skip(1).Select(l =>
        {
            var cells = l.Split(',');
            if (cells.Length != header.Length) throw new FormatException($"{fileName}: row '{l}' has {cells.Length} cells, the header {header.Length}");
            return (IReadOnlyDictionary<string, string>)header.Zip(cells).ToDictionary(p => p.First, p => p.Second);
        }).ToArray();
    }

    public static double Number(this IReadOnlyDictionary<string, string> row, string column) =>
        double.Parse(row[column], NumberStyles.Float, CultureInfo.InvariantCulture);

    /// <summary>The row on the finest mesh actually run for <paramref name="caseName"/> (cell_mm &gt; 0).</summary>
    public static IReadOnlyDictionary<string, string> Finest(IEnumerable<IReadOnlyDictionary<string, string>> rows, string caseName) =>
        rows.Where(r => r["case"] == caseName && r.Number("cell_mm") > 0).MinBy(r => r.Number("cell_mm"))
        ?? throw new InvalidOperationException($"no mesh row for {caseName}");

    /// <summary>The extrapolation to zero cell size for <paramref name="caseName"/>.</summary>
    public static IReadOnlyDictionary<string, string> Extrapolated(IEnumerable<IReadOnlyDictionary<string, string>> rows, string caseName) =>
        rows.Single(r => r["case"] == caseName && r.Number("cell_mm") == 0);
}
