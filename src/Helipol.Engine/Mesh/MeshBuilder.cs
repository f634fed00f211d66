using System.Globalization;
using System.Numerics;

namespace Helipol.Engine.Mesh;

/// <summary>
/// Checks a <see cref="WireModel"/>, cuts its wires into segments, finds nodes and junctions and lays
/// the triangle bases. Every refusal is a <see cref="ModelException"/> raised before any solve.
/// </summary>
internal static class MeshBuilder
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public sealed record Result(
        Segment[] Segments,
        Vector3[] Nodes,
        BasisPiece[] Pieces,
        int BasisCount,
        int[] SourceBases,
        Complex[] SourceVolts,
        int[][] SourceGapBases,
        double[][] SourceGapWeights,
        int[] LoadBases,
        Complex[] LoadImpedances);

    public static Result Build(WireModel model, double maxFrequencyHz, SegmentationOptions options)
    {
        if (model is null) throw new ModelException("model: missing");
        if (!(double.IsFinite(maxFrequencyHz) && maxFrequencyHz > 0))
            throw new ModelException(F($"frequency: found {maxFrequencyHz} Hz, allowed a finite value > 0"));
        if (!(options.SegmentsPerWavelength >= 1 && double.IsFinite(options.SegmentsPerWavelength)))
            throw new ModelException(F($"segmentation: found {options.SegmentsPerWavelength} segments per wavelength, allowed ≥ 1"));
        if (options.MinimumSegmentsPerWire < 1)
            throw new ModelException(F($"segmentation: found {options.MinimumSegmentsPerWire} minimum segments per wire, allowed ≥ 1"));
        if (!(double.IsFinite(options.MinimumLengthInRadii) && options.MinimumLengthInRadii > 0))
            throw new ModelException(F($"segmentation: found {options.MinimumLengthInRadii} minimum segment length in radii, allowed a finite value > 0"));
        if (model.Wires is null || model.Wires.Count == 0) throw new ModelException("wires: none given, allowed one or more");
        if (model.Sources is null || model.Sources.Count == 0) throw new ModelException("sources: none given, allowed one or more voltage sources");

        bool ground = model.Ground == GroundPlane.PerfectAtZ0;
        double minRadius = double.MaxValue;
        for (int w = 0; w < model.Wires.Count; w++)
        {
            CheckWire(model.Wires[w], w, ground);
            minRadius = Math.Min(minRadius, model.Wires[w].RadiusM);
        }
        double tol = 1e-3 * minRadius;
        double wavelength = PhysicalConstants.SpeedOfLight / maxFrequencyHz;

        var nodes = new List<Vector3>();
        var segments = new List<Segment>();
        for (int w = 0; w < model.Wires.Count; w++)
            Segmentize(EndCaps.Extended(model.Wires, w, ground, tol), model.Wires[w], w, wavelength, options, ground, tol, nodes, segments);

        var segArray = segments.ToArray();
        CheckClearances(segArray, ground, tol);

        var (pieces, basisCount, nodeBases) = LayBases(segArray, nodes, ground, tol);
        if (basisCount == 0) throw new ModelException("wires: no segment node carries current (every wire is a single segment with free ends)");

        var sourceBases = new int[model.Sources.Count];
        var volts = new Complex[model.Sources.Count];
        for (int i = 0; i < model.Sources.Count; i++)
        {
            var s = model.Sources[i];
            if (s is null || !s.AtM.IsFinite || !double.IsFinite(s.Volts.Real) || !double.IsFinite(s.Volts.Imaginary))
                throw new ModelException(F($"sources[{i}]: found a missing or non-finite position or voltage, allowed finite values"));
            if (s.GapM is { } gap && !(double.IsFinite(gap) && gap >= 0))
                throw new ModelException(F($"sources[{i}].gap: found {gap} m, allowed a finite width ≥ 0 (0: a delta gap)"));
            sourceBases[i] = BasisAt(s.AtM, $"sources[{i}]", segArray, nodes, nodeBases);
            if (Array.IndexOf(sourceBases, sourceBases[i], 0, i) >= 0)
                throw new ModelException(F($"sources[{i}]: found a second source on the node at {nodes[NodeOfBasis(pieces, segArray, sourceBases[i])]}, allowed one source per node"));
            volts[i] = s.Volts;
        }

        var loads = model.Loads ?? Array.Empty<LumpedLoad>();
        var loadBases = new int[loads.Count];
        var loadZ = new Complex[loads.Count];
        for (int i = 0; i < loads.Count; i++)
        {
            var l = loads[i];
            if (l is null || !l.AtM.IsFinite || !double.IsFinite(l.ImpedanceOhm.Real) || !double.IsFinite(l.ImpedanceOhm.Imaginary))
                throw new ModelException(F($"loads[{i}]: found a missing or non-finite position or impedance, allowed finite values"));
            if (l.ImpedanceOhm.Real < 0)
                throw new ModelException(F($"loads[{i}]: found resistance {l.ImpedanceOhm.Real} Ω, allowed ≥ 0 (a passive load)"));
            loadBases[i] = BasisAt(l.AtM, $"loads[{i}]", segArray, nodes, nodeBases);
            loadZ[i] = l.ImpedanceOhm;
        }

        var gapBases = new int[sourceBases.Length][];
        var gapWeights = new double[sourceBases.Length][];
        for (int i = 0; i < sourceBases.Length; i++)
            (gapBases[i], gapWeights[i]) = FeedGap.Spread(sourceBases[i], pieces, segArray, model.Sources[i].GapM ?? FeedGap.DefaultGapM(sourceBases[i], pieces, segArray));
        return new Result(segArray, nodes.ToArray(), pieces, basisCount, sourceBases, volts, gapBases, gapWeights, loadBases, loadZ);
    }

    private static void CheckWire(Wire wire, int w, bool ground)
    {
        string at = $"wires[{w}]";
        if (wire is null) throw new ModelException($"{at}: missing");
        if (!(double.IsFinite(wire.RadiusM) && wire.RadiusM > 0))
            throw new ModelException(F($"{at}.radius: found {wire.RadiusM} m, allowed a finite value > 0"));
        if (wire.PointsM is null || wire.PointsM.Count < 2)
            throw new ModelException($"{at}.points: found {wire.PointsM?.Count ?? 0} points, allowed 2 or more");
        for (int i = 0; i < wire.PointsM.Count; i++)
        {
            var p = wire.PointsM[i];
            if (!p.IsFinite) throw new ModelException(F($"{at}.points[{i}]: found {p}, allowed finite coordinates"));
            if (ground && p.Z < -1e-3 * wire.RadiusM)
                throw new ModelException(F($"{at}.points[{i}]: found z = {p.Z} m below the ground plane, allowed z ≥ 0"));
            if (ground && Math.Abs(p.Z) <= 1e-3 * wire.RadiusM && i != 0 && i != wire.PointsM.Count - 1)
                throw new ModelException(F($"{at}.points[{i}]: found an interior point on the ground plane, allowed only a wire end on the ground"));
            if (i > 0 && Vector3.Distance(p, wire.PointsM[i - 1]) <= 1e-3 * wire.RadiusM)
                throw new ModelException(F($"{at}.points[{i}]: found a repeated point {p}, allowed distinct consecutive points"));
        }
        switch (wire.Conductor)
        {
            case null: throw new ModelException($"{at}.conductor: missing, allowed PerfectConductor or LossyConductor");
            case LossyConductor c when !(double.IsFinite(c.ConductivitySPerM) && c.ConductivitySPerM > 0):
                throw new ModelException(F($"{at}.conductor.conductivity: found {c.ConductivitySPerM} S/m, allowed a finite value > 0"));
            case LossyConductor c when !(double.IsFinite(c.RelativePermeability) && c.RelativePermeability >= 1):
                throw new ModelException(F($"{at}.conductor.relative_permeability: found {c.RelativePermeability}, allowed a finite value ≥ 1"));
        }
        if (wire.Coating is { } coat)
        {
            if (!(double.IsFinite(coat.RelativePermittivity) && coat.RelativePermittivity >= 1))
                throw new ModelException(F($"{at}.coating.relative_permittivity: found {coat.RelativePermittivity}, allowed a finite value ≥ 1"));
            if (!(double.IsFinite(coat.OuterRadiusM) && coat.OuterRadiusM > wire.RadiusM))
                throw new ModelException(F($"{at}.coating.outer_radius: found {coat.OuterRadiusM} m, allowed more than the wire radius {wire.RadiusM} m"));
            if (!(double.IsFinite(coat.InductanceScale) && coat.InductanceScale >= 0))
                throw new ModelException(F($"{at}.coating.inductance_scale: found {coat.InductanceScale}, allowed a finite value ≥ 0"));
        }
    }

    private static void Segmentize(Wire wire, Wire given, int w, double wavelength, SegmentationOptions o, bool ground, double tol,
        List<Vector3> nodes, List<Segment> segments)
    {
        var pts = wire.PointsM;
        double total = 0;
        for (int i = 1; i < pts.Count; i++) total += Vector3.Distance(pts[i], pts[i - 1]);
        double target = wavelength / o.SegmentsPerWavelength;
        double shortest = o.MinimumLengthInRadii * wire.RadiusM;
        var impedance = WireImpedance.For(wire.RadiusM, wire.Conductor, wire.Coating);
        for (int i = 1; i < pts.Count; i++)
        {
            Vector3 a = pts[i - 1], b = pts[i];
            if (ground && Math.Abs(a.Z) <= tol) a = a with { Z = 0 };
            if (ground && Math.Abs(b.Z) <= tol) b = b with { Z = 0 };
            double len = Vector3.Distance(a, b);
            int n = (int)Math.Ceiling(len / target - 1e-9);
            n = Math.Max(n, (int)Math.Ceiling(o.MinimumSegmentsPerWire * len / total - 1e-9));
            n = Math.Max(n, 1);
            if (len / n < shortest) n = (int)Math.Floor(len / shortest);
            if (n < 1)
            {
                double own = Vector3.Distance(given.PointsM[i - 1], given.PointsM[i]);
                string caps = Math.Abs(own - len) > tol ? F($" ({own * 1e3:0.###} mm and its end cap allowance of half a radius per free end)") : "";
                throw new ModelException(F($"wires[{w}].points[{i}]: found an edge {len * 1e3:0.###} mm long{caps}, allowed at least {o.MinimumLengthInRadii} wire radii ({shortest * 1e3:0.###} mm) for the thin-wire model"), w);
            }
            if (len / n > wavelength / 10 * 1.000001 && n * 1.0 < len / target)
                throw new ModelException(F($"wires[{w}]: found radius {wire.RadiusM * 1e3:0.###} mm, too thick for the thin-wire model at this frequency (segments would be {len / n / wavelength:0.###} λ long, allowed ≤ 0.1 λ with length ≥ {o.MinimumLengthInRadii} radii)"), w);
            int prev = NodeIndex(a, nodes, tol);
            for (int k = 1; k <= n; k++)
            {
                Vector3 p0 = a + ((k - 1) / (double)n) * (b - a);
                Vector3 p1 = k == n ? b : a + (k / (double)n) * (b - a);
                int next = NodeIndex(p1, nodes, tol);
                segments.Add(new Segment
                {
                    Start = nodes[prev], End = nodes[next], RadiusM = wire.RadiusM, WireIndex = w,
                    StartNode = prev, EndNode = next, Impedance = impedance,
                });
                prev = next;
            }
        }
    }

    private static int NodeIndex(Vector3 p, List<Vector3> nodes, double tol)
    {
        for (int i = 0; i < nodes.Count; i++)
            if (Vector3.Distance(nodes[i], p) <= tol) return i;
        nodes.Add(p);
        return nodes.Count - 1;
    }

    private static void CheckClearances(Segment[] segs, bool ground, double tol)
    {
        // Arc length along the segment list: a wire's segments are consecutive, so the wire between
        // segments p < q of one wire is the segments p+1 … q−1. Segments shorter than the wire's
        // diameter come closer than the sum of radii to their second neighbours without any crossing.
        var along = new double[segs.Length + 1];
        for (int s = 0; s < segs.Length; s++) along[s + 1] = along[s] + segs[s].LengthM;
        for (int p = 0; p < segs.Length; p++)
        {
            var sp = segs[p];
            if (ground)
            {
                bool touches = sp.Start.Z == 0 || sp.End.Z == 0;
                double lowest = touches ? Math.Max(sp.Start.Z, sp.End.Z) : Math.Min(sp.Start.Z, sp.End.Z);
                if (lowest < sp.RadiusM)
                    throw new ModelException(F($"wires[{sp.WireIndex}]: found a segment {lowest * 1e3:0.###} mm above the ground plane near {sp.Centre}, allowed at least one wire radius ({sp.RadiusM * 1e3:0.###} mm) except a wire end standing on the ground"), sp.WireIndex);
            }
            for (int q = p + 1; q < segs.Length; q++)
            {
                var sq = segs[q];
                if (sp.StartNode == sq.StartNode || sp.StartNode == sq.EndNode || sp.EndNode == sq.StartNode || sp.EndNode == sq.EndNode)
                    continue;
                if (Geometry3.DistanceLowerBound(sp, sq) >= sp.RadiusM + sq.RadiusM) continue;
                if (sp.WireIndex == sq.WireIndex && along[q] - along[p + 1] < sp.RadiusM + sq.RadiusM) continue;
                double d = Geometry3.SegmentDistance(sp.Start, sp.End, sq.Start, sq.End);
                if (d < sp.RadiusM + sq.RadiusM)
                    throw new ModelException(F($"wires[{sp.WireIndex}] and wires[{sq.WireIndex}]: found surfaces touching or crossing near {sp.Centre} (axes {d * 1e3:0.###} mm apart), allowed at least the sum of radii ({(sp.RadiusM + sq.RadiusM) * 1e3:0.###} mm) unless joined at a shared point"), sp.WireIndex, sq.WireIndex);
            }
        }
    }

    private readonly record struct End(int Segment, bool AtSegmentEnd);

    private static (BasisPiece[] Pieces, int Count, List<int>[] NodeBases) LayBases(Segment[] segs, List<Vector3> nodes, bool ground, double tol)
    {
        var ends = new List<End>[nodes.Count];
        for (int i = 0; i < nodes.Count; i++) ends[i] = new List<End>();
        for (int s = 0; s < segs.Length; s++)
        {
            ends[segs[s].StartNode].Add(new End(s, false));
            ends[segs[s].EndNode].Add(new End(s, true));
        }
        var pieces = new List<BasisPiece>();
        var nodeBases = new List<int>[nodes.Count];
        int basis = 0;
        for (int node = 0; node < nodes.Count; node++)
        {
            nodeBases[node] = new List<int>();
            // Incoming ends (the node is the segment's end) first, so that along a wire the
            // reference current flows in the wire's own direction.
            var list = ends[node].OrderBy(e => e.AtSegmentEnd ? 0 : 1).ThenBy(e => e.Segment).ToList();
            if (ground && nodes[node].Z == 0)
            {
                // A wire end on a perfect ground: a half basis whose other half is its image
                // (image theory); reference current flows up out of the ground.
                foreach (var e in list)
                {
                    pieces.Add(Outgoing(basis, e));
                    nodeBases[node].Add(basis++);
                }
                continue;
            }
            // Two ends: one basis. Three or more: pair the first end with each other end, so that
            // the currents at the junction always sum to zero (Kirchhoff's current law).
            for (int k = 1; k < list.Count; k++)
            {
                pieces.Add(Incoming(basis, list[0]));
                pieces.Add(Outgoing(basis, list[k]));
                nodeBases[node].Add(basis++);
            }
        }
        return (pieces.ToArray(), basis, nodeBases);
    }

    private static BasisPiece Incoming(int basis, End e) =>
        e.AtSegmentEnd ? new BasisPiece(basis, e.Segment, +1, true) : new BasisPiece(basis, e.Segment, -1, false);

    private static BasisPiece Outgoing(int basis, End e) =>
        e.AtSegmentEnd ? new BasisPiece(basis, e.Segment, -1, true) : new BasisPiece(basis, e.Segment, +1, false);

    private static int BasisAt(Vector3 at, string field, Segment[] segs, List<Vector3> nodes, List<int>[] nodeBases)
    {
        int best = -1;
        double bestD = double.MaxValue;
        for (int i = 0; i < nodes.Count; i++)
        {
            double d = Vector3.Distance(nodes[i], at);
            if (d < bestD) { bestD = d; best = i; }
        }
        double reach = 0;
        foreach (var s in segs)
            if (s.StartNode == best || s.EndNode == best) reach = Math.Max(reach, 0.5 * s.LengthM + s.RadiusM);
        if (bestD > reach)
            throw new ModelException(F($"{field}: found {at}, {bestD * 1e3:0.###} mm from the nearest segment node, allowed a point on a wire"));
        return nodeBases[best].Count switch
        {
            1 => nodeBases[best][0],
            0 => throw new ModelException(F($"{field}: found the free wire end {nodes[best]}, allowed a node between two segments or a wire end on the ground")),
            _ => throw new ModelException(F($"{field}: found a junction of several wire ends at {nodes[best]}, allowed a node between two segments or a single wire end on the ground")),
        };
    }

    private static int NodeOfBasis(BasisPiece[] pieces, Segment[] segs, int basis)
    {
        var p = pieces.First(x => x.Basis == basis);
        var s = segs[p.Segment];
        return p.Rising ? s.EndNode : s.StartNode;
    }

    private static string F(FormattableString s) => s.ToString(Inv);
}
