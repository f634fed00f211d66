using System.Globalization;
using Complex = System.Numerics.Complex;

namespace Helipol.Design;

/// <summary>One reflection reading: frequency and S11 referred to the file's reference impedance.</summary>
public sealed record ReflectionPoint(double FrequencyHz, Complex S11, int Line);

/// <summary>A one-port sweep as read: its points and the reference impedance.</summary>
public sealed record ReflectionSweep(IReadOnlyList<ReflectionPoint> Points, double ReferenceOhm);

/// <summary>
/// Reads one-port Touchstone version 1 files (.s1p) as the format's published specification
/// describes them (Touchstone File Format Specification, version 1.1, IBIS Open Forum): `!` starts
/// a comment; the option line `# [Hz|kHz|MHz|GHz] [S] [MA|DB|RI] [R z0]` (defaults GHz, S, MA,
/// R 50) comes before the data; each data line holds a frequency and two numbers: magnitude and
/// angle in degrees (MA), dB and angle (DB), or real and imaginary parts (RI). Every problem is a
/// one-line error with file:line.
/// </summary>
public static class Touchstone
{
    public const int MinimumPoints = 5;

    public static ReflectionSweep Read(string path, string shownAs)
    {
        double unit = 1e9, z0 = 50;
        string format = "MA";
        bool option = false;
        var points = new List<ReflectionPoint>();
        string[] lines;
        try { lines = File.ReadAllLines(path); }
        catch (IOException ex) { throw new CalibrationException($"{shownAs}:1:1: found a file that cannot be read ({ex.Message}), allowed a Touchstone .s1p file"); }
        catch (UnauthorizedAccessException) { throw new CalibrationException($"{shownAs}:1:1: found a file that cannot be read, allowed a Touchstone .s1p file"); }
        for (int i = 0; i < lines.Length; i++)
        {
            int lineNo = i + 1;
            var text = lines[i];
            int bang = text.IndexOf('!');
            if (bang >= 0) text = text[..bang];
            text = text.Trim();
            if (text.Length == 0) continue;
            if (text.StartsWith('#'))
            {
                if (option) throw new CalibrationException($"{shownAs}:{lineNo}:1: option line: found a second one, allowed one option line");
                if (points.Count > 0) throw new CalibrationException($"{shownAs}:{lineNo}:1: option line: found it after data, allowed it before the first data line");
                option = true;
                var words = text[1..].Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
                for (int w = 0; w < words.Length; w++)
                {
                    switch (words[w].ToUpperInvariant())
                    {
                        case "HZ": unit = 1; break;
                        case "KHZ": unit = 1e3; break;
                        case "MHZ": unit = 1e6; break;
                        case "GHZ": unit = 1e9; break;
                        case "S": break;
                        case "MA": case "DB": case "RI": format = words[w].ToUpperInvariant(); break;
                        case "R":
                            if (w + 1 >= words.Length || !double.TryParse(words[w + 1], NumberStyles.Float, CultureInfo.InvariantCulture, out z0) || !(z0 > 0) || !double.IsFinite(z0))
                                throw new CalibrationException($"{shownAs}:{lineNo}:1: option line: found R without a positive reference impedance, allowed R followed by ohms, e.g. R 50");
                            w++;
                            break;
                        default:
                            throw new CalibrationException($"{shownAs}:{lineNo}:1: option line: found '{words[w]}', allowed Hz, kHz, MHz, GHz, S, MA, DB, RI and R <ohms> (a one-port S-parameter file)");
                    }
                }
                continue;
            }
            if (!option) throw new CalibrationException($"{shownAs}:{lineNo}:1: found data before an option line, allowed an option line such as '# GHz S RI R 50' first");
            var parts = text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
            if (parts.Length != 3) throw new CalibrationException($"{shownAs}:{lineNo}:1: found {parts.Length} values, allowed 3 (frequency and S11 as two numbers) for a one-port file");
            var v = new double[3];
            for (int k = 0; k < 3; k++)
                if (!double.TryParse(parts[k], NumberStyles.Float, CultureInfo.InvariantCulture, out v[k]) || !double.IsFinite(v[k]))
                    throw new CalibrationException($"{shownAs}:{lineNo}:{lines[i].IndexOf(parts[k], StringComparison.Ordinal) + 1}: found '{parts[k]}', allowed a number");
            double f = v[0] * unit;
            if (points.Count > 0 && f <= points[^1].FrequencyHz)
                throw new CalibrationException($"{shownAs}:{lineNo}:1: frequency: found {v[0]} after {points[^1].FrequencyHz / unit}, allowed rising frequencies");
            Complex s = format switch
            {
                "RI" => new Complex(v[1], v[2]),
                "DB" => Complex.FromPolarCoordinates(Math.Pow(10, v[1] / 20), v[2] * Math.PI / 180),
                _ => Complex.FromPolarCoordinates(v[1], v[2] * Math.PI / 180),
            };
            points.Add(new ReflectionPoint(f, s, lineNo));
        }
        if (!option) throw new CalibrationException($"{shownAs}:1:1: found no option line, allowed a Touchstone file with an option line such as '# GHz S RI R 50'");
        if (points.Count < MinimumPoints)
            throw new CalibrationException($"{shownAs}:{Math.Max(1, lines.Length)}:1: found {points.Count} data points, allowed at least {MinimumPoints}");
        return new ReflectionSweep(points, z0);
    }
}
