using System.Globalization;
using System.Text;
using Helipol.Engine;
using Complex = System.Numerics.Complex;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// A straight wire along z lit broadside by a plane wave polarized along it, the resonance being the
/// frequency where the current at the wire's centre peaks. Broadside the incident field is the same
/// all along the wire, so it is given to each solver as a voltage on every testing function equal to
/// the field times that function's length: in the engine a source on every node between two segments
/// of (left + right)/2 volts per V/m (the Galerkin right-hand side ∫ f_m·E dl of a triangle), in NEC-2 an
/// EX 0 source on every segment of one segment length (NEC-2 user's guide, part III: an applied-field
/// source sets the tangential field V/Δ at the segment's match point). Both are then exactly a uniform
/// 1 V/m incident field.
/// </summary>
internal static class LoneElement
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static WireModel Wire(double lengthM, double radiusM, IReadOnlyList<VoltageSource> sources, WireEnds ends = WireEnds.Flat) =>
        // A vertex at the centre, so that a node (where the current is read) sits there.
        new([new Helipol.Engine.Wire([new Vector3(0, 0, -lengthM / 2), new Vector3(0, 0, 0), new Vector3(0, 0, lengthM / 2)], radiusM, PerfectConductor.Instance, null, ends)],
            GroundPlane.None, sources);

    /// <summary>The wire meshed for <paramref name="maxFrequencyHz"/> with the uniform-field sources on every interior node.</summary>
    public static (MeshedModel Mesh, int Centre) Mesh(double lengthM, double radiusM, double maxFrequencyHz, SegmentationOptions? options = null, WireEnds ends = WireEnds.Flat)
    {
        // A first mesh tells where the nodes fall (a dummy source at the centre), the second carries the field.
        var probe = MeshedModel.Create(Wire(lengthM, radiusM, [new VoltageSource(new Vector3(0, 0, 0), 1)], ends), maxFrequencyHz, options);
        var segs = probe.Segments;
        var sources = new List<VoltageSource>();
        int centre = -1;
        for (int s = 0; s + 1 < segs.Length; s++)
        {
            var node = segs[s].End;
            if (Math.Abs(node.Z) < 1e-3 * radiusM) centre = sources.Count;
            sources.Add(new VoltageSource(node, 0.5 * (segs[s].LengthM + segs[s + 1].LengthM), GapM: 0));
        }
        return (MeshedModel.Create(Wire(lengthM, radiusM, sources, ends), maxFrequencyHz, options), centre);
    }

    /// <summary>The engine's resonance: golden-section search of |I(centre)| between the bounds.</summary>
    public static double EngineResonanceHz(double lengthM, double radiusM, double loHz, double hiHz, SegmentationOptions? options = null,
        WireEnds ends = WireEnds.Flat)
    {
        var (mesh, centre) = Mesh(lengthM, radiusM, hiHz, options, ends);
        double Current(double f) => MomSolver.Solve(mesh, f).InputCurrentA(centre).Magnitude;
        return GoldenMaximum(Current, loHz, hiHz, 1e4);
    }

    internal static double GoldenMaximum(Func<double, double> f, double lo, double hi, double tolerance)
    {
        double g = (Math.Sqrt(5) - 1) / 2;
        double a = hi - g * (hi - lo), b = lo + g * (hi - lo);
        double fa = f(a), fb = f(b);
        while (hi - lo > tolerance)
        {
            if (fa > fb) { hi = b; b = a; fb = fa; a = hi - g * (hi - lo); fa = f(a); }
            else { lo = a; a = b; fa = fb; b = lo + g * (hi - lo); fb = f(b); }
        }
        return 0.5 * (lo + hi);
    }

    /// <summary>
    /// NEC-2's resonance with its extended thin-wire kernel (EK card) on <paramref name="segments"/>
    /// segments (odd, so one sits at the centre): a frequency sweep, then a parabola through the
    /// largest |I| and its neighbours.
    /// </summary>
    public static double Nec2ResonanceHz(double lengthM, double radiusM, int segments, double loHz, double hiHz, double stepHz, bool extendedKernel = true)
    {
        if (segments % 2 == 0) throw new ArgumentException("odd segment count needed", nameof(segments));
        int count = (int)Math.Round((hiHz - loHz) / stepHz) + 1;
        var deck = new StringBuilder();
        deck.Append("CM lone wire in a uniform broadside field\nCE\n");
        deck.Append(Inv, $"GW 1 {segments} 0 0 {-lengthM / 2 * 1e3:R} 0 0 {lengthM / 2 * 1e3:R} {radiusM * 1e3:R}\n");
        deck.Append("GS 0 0 0.001\nGE 0\n");
        if (extendedKernel) deck.Append("EK\n");
        double dz = lengthM / segments;
        for (int s = 1; s <= segments; s++) deck.Append(Inv, $"EX 0 1 {s} 0 {dz:R} 0\n");
        deck.Append(Inv, $"FR 0 {count} 0 0 {loHz / 1e6:R} {stepHz / 1e6:R}\nXQ\nEN\n");
        var feeds = Nec2c.Run(deck.ToString()).Feeds;
        if (feeds.Count != count * segments) throw new FormatException($"nec2c printed {feeds.Count} source rows, expected {count * segments}");
        var current = new double[count];
        for (int i = 0; i < count; i++)
            current[i] = feeds[i * segments + (segments - 1) / 2].CurrentA.Magnitude;
        int best = Array.IndexOf(current, current.Max());
        if (best == 0 || best == count - 1) throw new InvalidOperationException("the peak is at the sweep's edge: widen it");
        double y0 = current[best - 1], y1 = current[best], y2 = current[best + 1];
        double shift = 0.5 * (y0 - y2) / (y0 - 2 * y1 + y2);
        return loHz + (best + shift) * stepHz;
    }
}
