using System.Globalization;
using System.Numerics;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>One row of the "ANTENNA INPUT PARAMETERS" table: the source on segment <paramref name="Segment"/> of wire <paramref name="Tag"/>.</summary>
internal sealed record Nec2Feed(int Tag, int Segment, Complex VoltageV, Complex CurrentA, Complex ImpedanceOhm);

/// <summary>
/// One row of the "RADIATION PATTERNS" table (RP card with X = 1: vertical and horizontal parts).
/// Gains in dB referred to input power (power gain); <paramref name="AxialRatio"/> is NEC's
/// minor/major ratio, 0 (linear) … 1 (circular); <paramref name="TiltDeg"/> and <paramref name="Sense"/>
/// ("RIGHT", "LEFT", "LINEAR" or empty for no field) as NEC prints them; far field r·E in volts
/// (magnitude and phase columns).
/// </summary>
internal sealed record Nec2PatternPoint(
    double ThetaDeg, double PhiDeg,
    double GainVerticalDb, double GainHorizontalDb, double GainTotalDb,
    double AxialRatio, double TiltDeg, string Sense,
    Complex EThetaV, Complex EPhiV)
{
    /// <summary>Axial ratio in dB, major over minor; 100 dB for a linear field (the engine's cap).</summary>
    public double AxialRatioDb => AxialRatio > 1e-5 ? -20 * Math.Log10(AxialRatio) : 100;

    /// <summary>
    /// Co- and cross-circular gains from NEC's total gain and axial ratio. An ellipse of axis ratio
    /// r = minor/major splits into counter-rotating circular parts with amplitude ratio (1 + r)/(1 − r)
    /// (polarization ellipse, IEEE Std 145; Balanis, Antenna Theory, §2.12), so the co-rotating part
    /// carries (1 + r)²/(2(1 + r²)) of the power. nec2c 1.3 prints no circular gain columns.
    /// </summary>
    public (double CoDbic, double CrossDbic) CircularGainsDb
    {
        get
        {
            double r = AxialRatio, total = Math.Pow(10, GainTotalDb / 10);
            double co = (1 + r) * (1 + r) / (2 * (1 + r * r));
            return (Db(total * co), Db(total * (1 - co)));
        }
    }

    public double GainRhcpDbic => Sense == "LEFT" ? CircularGainsDb.CrossDbic : CircularGainsDb.CoDbic;

    public double GainLhcpDbic => Sense == "LEFT" ? CircularGainsDb.CoDbic : CircularGainsDb.CrossDbic;

    private static double Db(double ratio) => ratio > 1e-30 ? 10 * Math.Log10(ratio) : -300;
}

/// <summary>What the tests read from a nec2c output file (one frequency).</summary>
internal sealed record Nec2Output(
    IReadOnlyList<Nec2Feed> Feeds,
    double InputPowerW, double RadiatedPowerW, double StructureLossW, double EfficiencyPercent,
    IReadOnlyList<Nec2PatternPoint> Pattern)
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public Complex ImpedanceOhm => Feeds.Single().ImpedanceOhm;

    public Nec2PatternPoint At(double thetaDeg, double phiDeg) =>
        Pattern.Single(p => Math.Abs(p.ThetaDeg - thetaDeg) < 1e-6 && Math.Abs(p.PhiDeg - phiDeg) < 1e-6);

    /// <summary>Parses the tables of nec2c's printed output (nec2c 1.3 layout: numbers separated by spaces).</summary>
    public static Nec2Output Parse(string text)
    {
        var lines = text.Split('\n');
        var feeds = new List<Nec2Feed>();
        var pattern = new List<Nec2PatternPoint>();
        double pin = double.NaN, prad = double.NaN, ploss = double.NaN, eff = double.NaN;
        for (int i = 0; i < lines.Length; i++)
        {
            string line = lines[i];
            if (line.Contains("ANTENNA INPUT PARAMETERS"))
            {
                for (int j = i + 3; j < lines.Length && Numbers(lines[j]) is { Length: 11 } n; j++)
                    feeds.Add(new Nec2Feed((int)n[0], (int)n[1], new(n[2], n[3]), new(n[4], n[5]), new(n[6], n[7])));
            }
            else if (line.Contains("INPUT POWER   =")) pin = Value(line);
            else if (line.Contains("RADIATED POWER=")) prad = Value(line);
            else if (line.Contains("STRUCTURE LOSS=")) ploss = Value(line);
            else if (line.Contains("EFFICIENCY    =")) eff = Value(line);
            else if (line.Contains("RADIATION PATTERNS"))
            {
                for (int j = i + 5; j < lines.Length && Row(lines[j]) is { } p; j++) pattern.Add(p);
            }
        }
        if (feeds.Count == 0) throw new FormatException("nec2c output: no ANTENNA INPUT PARAMETERS table");
        return new Nec2Output(feeds, pin, prad, ploss, eff, pattern);
    }

    // θ φ vert horiz total AR tilt [sense] |Eθ| ∠Eθ |Eφ| ∠Eφ; the sense is blank where there is no field.
    private static Nec2PatternPoint? Row(string line)
    {
        var t = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (t.Length is not (11 or 12)) return null;
        string sense = t.Length == 12 ? t[7] : "";
        var n = t.Where((_, k) => t.Length == 11 || k != 7).Select(Number).ToArray();
        if (n.Any(double.IsNaN)) return null;
        return new Nec2PatternPoint(n[0], n[1], n[2], n[3], n[4], n[5], n[6], sense,
            Complex.FromPolarCoordinates(n[7], n[8] * Math.PI / 180), Complex.FromPolarCoordinates(n[9], n[10] * Math.PI / 180));
    }

    private static double[]? Numbers(string line)
    {
        var n = line.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(Number).ToArray();
        return n.Length == 0 || n.Any(double.IsNaN) ? null : n;
    }

    private static double Value(string line) => Number(line[(line.IndexOf('=') + 1)..].Trim().Split(' ')[0]);

    private static double Number(string s) =>
        double.TryParse(s, NumberStyles.Float, Inv, out var v) ? v : double.NaN;
}
