using System.Globalization;

namespace Helipol.Design;

/// <summary>One spin reading: the axial ratio at a frequency, dB (max − min while a linear source rotates).</summary>
public sealed record SpinPoint(double FrequencyHz, double AxialRatioDb, int Line);

/// <summary>
/// Reads a spin-test CSV: header <c>frequency_mhz,level_min_db,level_max_db</c>, then one row per
/// frequency. Rotating a linearly polarized source in front of the antenna, the received level
/// swings between the ellipse's minor and major axes, so max − min is the axial ratio
/// (IEEE Std 145, the polarization ellipse; the rotating-source method is the usual quick test).
/// </summary>
public static class SpinReadings
{
    public const string Header = "frequency_mhz,level_min_db,level_max_db";

    public static IReadOnlyList<SpinPoint> Read(string path, string shownAs)
    {
        string[] lines;
        try { lines = File.ReadAllLines(path); }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException) { throw new CalibrationException($"{shownAs}:1:1: found a file that cannot be read, allowed a CSV with header {Header}"); }
        var points = new List<SpinPoint>();
        bool header = false;
        for (int i = 0; i < lines.Length; i++)
        {
            int lineNo = i + 1;
            var text = lines[i].Trim();
            if (text.Length == 0 || text.StartsWith('#')) continue;
            if (!header)
            {
                if (!string.Equals(text.Replace(" ", ""), Header, StringComparison.OrdinalIgnoreCase))
                    throw new CalibrationException($"{shownAs}:{lineNo}:1: header: found '{text}', allowed '{Header}'");
                header = true;
                continue;
            }
            var parts = text.Split(',');
            if (parts.Length != 3) throw new CalibrationException($"{shownAs}:{lineNo}:1: found {parts.Length} values, allowed 3 ({Header})");
            var v = new double[3];
            int col = 1;
            for (int k = 0; k < 3; k++)
            {
                if (!double.TryParse(parts[k].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out v[k]) || !double.IsFinite(v[k]))
                    throw new CalibrationException($"{shownAs}:{lineNo}:{col}: found '{parts[k].Trim()}', allowed a number");
                col += parts[k].Length + 1;
            }
            if (v[2] < v[1]) throw new CalibrationException($"{shownAs}:{lineNo}:1: level_max_db: found {v[2]} below level_min_db {v[1]}, allowed max ≥ min");
            points.Add(new SpinPoint(v[0] * 1e6, v[2] - v[1], lineNo));
        }
        if (!header) throw new CalibrationException($"{shownAs}:1:1: found no header, allowed a CSV with header {Header}");
        if (points.Count < Touchstone.MinimumPoints)
            throw new CalibrationException($"{shownAs}:{Math.Max(1, lines.Length)}:1: found {points.Count} data points, allowed at least {Touchstone.MinimumPoints}");
        return points;
    }
}
