using System.Globalization;
using System.Text;
using Helipol.Engine;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>A radiation-pattern request: <paramref name="ThetaCount"/> × <paramref name="PhiCount"/> directions, degrees.</summary>
internal sealed record Nec2Cut(double ThetaStartDeg, int ThetaCount, double ThetaStepDeg, double PhiStartDeg, int PhiCount, double PhiStepDeg)
{
    /// <summary>The horizon (θ = 90°) every <paramref name="stepDeg"/> degrees of azimuth round the full circle.</summary>
    public static Nec2Cut Horizon(double stepDeg) => new(90, 1, 0, 0, (int)Math.Round(360 / stepDeg), stepDeg);

    public IEnumerable<(double ThetaDeg, double PhiDeg)> Directions =>
        from j in Enumerable.Range(0, PhiCount)
        from i in Enumerable.Range(0, ThetaCount)
        select (ThetaStartDeg + i * ThetaStepDeg, PhiStartDeg + j * PhiStepDeg);
}

/// <summary>
/// Writes the same structure as an engine <see cref="WireModel"/> as a NEC-2 input deck (card
/// formats per the NEC-2 user's guide, Burke and Poggio, part III): CM/CE comments; one GW card per
/// straight run of each polyline (collinear edges merged), coordinates in millimetres and scaled to
/// metres by GS; GE with the ground flag (1 = wire ends at z = 0 join their image); GN 1 for a perfect
/// ground; EX 0 voltage sources; LD 5 wire conductivity; FR; RP (or XQ); EN.
/// NEC-2 puts a source at the centre of a segment, the engine at a node between two segments, so a
/// source must sit at the middle of a straight run (the run then gets an odd segment count) or at
/// a run's end on the ground (NEC's first segment, the usual NEC monopole feed).
/// </summary>
internal static class Nec2Deck
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <param name="segmentsPerWavelength">NEC segment density at <paramref name="frequencyHz"/>.</param>
    /// <param name="minimumLengthInRadii">Shortest NEC segment allowed, in wire radii (fewer segments rather than shorter ones).</param>
    public static string Write(WireModel model, double frequencyHz, IEnumerable<Nec2Cut> cuts,
        double segmentsPerWavelength = 20, double minimumLengthInRadii = 2, string title = "helipol engine comparison",
        double laterWiresInductanceHPerM = 0)
    {
        bool ground = model.Ground == GroundPlane.PerfectAtZ0;
        double target = PhysicalConstants.SpeedOfLight / frequencyHz / segmentsPerWavelength;
        var sb = new StringBuilder();
        sb.Append("CM ").Append(title).Append('\n').Append("CE\n");
        var sources = new (int Tag, int Segment)?[model.Sources.Count];
        var loads = new List<string>();
        int tag = 0, wireIndex = -1;
        foreach (var wire in model.Wires)
        {
            wireIndex++;
            if (wire.Coating is not null) throw new NotSupportedException("NEC-2 has no dielectric coating model");
            foreach (var (a, b) in StraightRuns(wire.PointsM))
            {
                tag++;
                double len = Vector3.Distance(a, b);
                int n = Math.Max(1, (int)Math.Ceiling(len / target - 1e-9));
                n = Math.Min(n, Math.Max(1, (int)Math.Floor(len / (minimumLengthInRadii * wire.RadiusM))));
                var mid = 0.5 * (a + b);
                int? feedSegment = null;
                for (int s = 0; s < model.Sources.Count; s++)
                {
                    var at = model.Sources[s].AtM;
                    double tol = 1e-3 * wire.RadiusM;
                    if (Vector3.Distance(at, mid) <= tol)
                    {
                        if (n % 2 == 0) n = n + 1 <= len / (minimumLengthInRadii * wire.RadiusM) ? n + 1 : n - 1;
                        feedSegment = (n + 1) / 2;
                    }
                    else if (ground && at.Z == 0 && Vector3.Distance(at, a) <= tol) feedSegment = 1;
                    else if (ground && at.Z == 0 && Vector3.Distance(at, b) <= tol) feedSegment = -1;
                    else continue;
                    sources[s] = (tag, feedSegment == -1 ? n : feedSegment.Value);
                }
                sb.Append(Inv, $"GW {tag} {n} {Mm(a.X)} {Mm(a.Y)} {Mm(a.Z)} {Mm(b.X)} {Mm(b.Y)} {Mm(b.Z)} {Mm(wire.RadiusM)}\n");
                // A distributed series inductance on every wire after the first (LD 2: series R, L, C
                // per unit length; C = 0 leaves the capacitor out, NEC-2 user's guide, part III, LD card).
                if (wireIndex > 0 && laterWiresInductanceHPerM > 0)
                    loads.Add(string.Create(Inv, $"LD 2 {tag} 0 0 0 {laterWiresInductanceHPerM:R} 0\n"));
                if (wire.Conductor is LossyConductor metal)
                {
                    // NEC-2's LD 5 knows only σ (μr = 1). The skin-effect surface impedance depends on
                    // σ and μr only through σ/μr (Z_s = (1 + j)·sqrt(ωμ0μr/2σ)), so a magnetic wire is
                    // given its equivalent conductivity σ/μr (valid while the skin depth ≪ radius).
                    loads.Add(string.Create(Inv, $"LD 5 {tag} 0 0 {(metal.ConductivitySPerM / metal.RelativePermeability):R}\n"));
                }
            }
        }
        for (int s = 0; s < sources.Length; s++)
            if (sources[s] is null) throw new NotSupportedException($"source {s} is neither at the middle of a straight run nor at a wire end on the ground");
        sb.Append("GS 0 0 0.001\n");
        sb.Append(ground ? "GE 1\n" : "GE 0\n");
        if (ground) sb.Append("GN 1\n");
        for (int s = 0; s < sources.Length; s++)
        {
            var v = model.Sources[s].Volts;
            sb.Append(Inv, $"EX 0 {sources[s]!.Value.Tag} {sources[s]!.Value.Segment} 0 {v.Real:R} {v.Imaginary:R}\n");
        }
        foreach (var l in loads) sb.Append(l);
        sb.Append(Inv, $"FR 0 1 0 0 {frequencyHz / 1e6:R} 0\n");
        int patterns = 0;
        foreach (var c in cuts)
        {
            sb.Append(Inv, $"RP 0 {c.ThetaCount} {c.PhiCount} 1000 {c.ThetaStartDeg:R} {c.PhiStartDeg:R} {c.ThetaStepDeg:R} {c.PhiStepDeg:R}\n");
            patterns++;
        }
        // Without a pattern request nothing executes the solution: XQ does.
        if (patterns == 0) sb.Append("XQ\n");
        sb.Append("EN\n");
        return sb.ToString();
    }

    /// <summary>The polyline as straight runs: consecutive collinear edges merged.</summary>
    internal static IEnumerable<(Vector3 From, Vector3 To)> StraightRuns(IReadOnlyList<Vector3> points)
    {
        var start = points[0];
        for (int i = 1; i < points.Count; i++)
        {
            bool last = i == points.Count - 1;
            if (!last)
            {
                var d1 = points[i] - start;
                var d2 = points[i + 1] - points[i];
                double sin = Vector3.Cross(d1, d2).Length / (d1.Length * d2.Length);
                if (sin < 1e-9 && Vector3.Dot(d1, d2) > 0) continue;
            }
            yield return (start, points[i]);
            start = points[i];
        }
    }

    private static string Mm(double metres) => (metres * 1e3).ToString("R", Inv);
}
