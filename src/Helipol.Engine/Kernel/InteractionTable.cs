using System.Numerics;
using Helipol.Engine.Mesh;

namespace Helipol.Engine.Kernel;

/// <summary>
/// Frequency-independent quadrature for every pair of segments (observation p, source q, and the
/// image of q in a perfect ground), prepared once per mesh so that a frequency only costs one
/// complex exponential per quadrature point.
///
/// For a pair it gives the four moments of the reduced thin-wire kernel g = e^{−jkR}/R,
///   I00 = ∬ g du dv,  I10 = ∬ u g,  I01 = ∬ v g,  I11 = ∬ u v g   (u on p, v on q, both in [0, 1]),
/// with the observation point on p's axis and the source on q's surface, R = sqrt(|r_p(u) − r_q(v)|² + a²)
/// (the reduced kernel; Harrington, *Field Computation by Moment Methods*, ch. 4). For a² we use
/// (a_p² + a_q²)/2, which is the wire's own radius on one wire and keeps the matrix symmetric where
/// wires of different radius meet.
///
/// Near pairs (closer than the longer segment) split g into the static 1/R part, integrated over v in
/// closed form (asinh, <see cref="StaticLineIntegrals"/>), and the smooth remainder (e^{−jkR} − 1)/R,
/// integrated by Gauss–Legendre; the outer integral uses end-clustered nodes. Pairs on one tube
/// (<see cref="UsesTubeKernel"/>) take the static part of the exact tube kernel instead
/// (<see cref="ExactStaticKernel"/>), so that segments down to a radius or two stay accurate; the
/// remainder, bounded and smooth, differs between the two kernels by O((ka)²) and stays reduced. Farther pairs use plain
/// Gauss–Legendre whose order on each segment falls with its length over the distance (4, 3, then 2 points).
/// Weights come from a few shared <see cref="QuadratureRule"/>s; per point only R is stored, which keeps
/// the table small enough to stay in cache while a frequency is filled.
/// </summary>
internal sealed class InteractionTable
{
    private readonly List<int> _p = new(), _q = new(), _rule = new(), _start = new();
    private readonly List<bool> _image = new(), _subtracted = new();
    private readonly List<double> _tangentDot = new();
    private readonly List<double> _s00 = new(), _s10 = new(), _s01 = new(), _s11 = new();
    private readonly List<QuadratureRule> _rules = new();
    private readonly Dictionary<(int, int, bool), int> _ruleIndex = new();
    private double[] _r = new double[4096];
    private int _points;

    // Frozen arrays for the hot loop.
    internal int[] P = [], Q = [], Start = [], Rule = [];
    internal bool[] Image = [], Subtracted = [];
    internal double[] TangentDot = [], S00 = [], S10 = [], S01 = [], S11 = [];
    internal double[] R = [];
    internal QuadratureRule[] Rules = [];

    public int PairCount => P.Length;

    public int PointCount => R.Length;

    /// <summary>Adaptive table over pairs p ≤ q (the kernel is reciprocal; the fill mirrors the rest).</summary>
    public static InteractionTable BuildAdaptive(Segment[] segs, bool ground)
    {
        var t = new InteractionTable();
        for (int p = 0; p < segs.Length; p++)
            for (int q = p; q < segs.Length; q++)
            {
                t.AddAdaptive(segs, p, q, false);
                if (ground) t.AddAdaptive(segs, p, q, true);
            }
        t.Freeze();
        return t;
    }

    /// <summary>
    /// Plain reference table: every ordered pair (p, q), fixed high orders and singularity subtraction
    /// everywhere. Slow; kept for tests that check the adaptive fill and reciprocity.
    /// </summary>
    public static InteractionTable BuildReference(Segment[] segs, bool ground)
    {
        var t = new InteractionTable();
        int rule = t.RuleFor(16, 8, true);
        for (int p = 0; p < segs.Length; p++)
            for (int q = 0; q < segs.Length; q++)
            {
                t.Add(segs, p, q, false, rule, true, UsesTubeKernel(segs, p, q, false, Distance(segs, p, q, false)));
                if (ground) t.Add(segs, p, q, true, rule, true, UsesTubeKernel(segs, p, q, true, Distance(segs, p, q, true)));
            }
        t.Freeze();
        return t;
    }

    private int RuleFor(int outerOrder, int innerOrder, bool nearPair)
    {
        var key = (outerOrder, innerOrder, nearPair);
        if (_ruleIndex.TryGetValue(key, out int index)) return index;
        var outer = nearPair ? GaussLegendre.EndClustered(outerOrder) : GaussLegendre.OnUnitInterval(outerOrder);
        _rules.Add(new QuadratureRule(outer, GaussLegendre.OnUnitInterval(innerOrder)));
        _ruleIndex[key] = _rules.Count - 1;
        return _rules.Count - 1;
    }

    private void AddAdaptive(Segment[] segs, int p, int q, bool image)
    {
        Segment sp = segs[p], sq = segs[q];
        Vector3 q0 = image ? sq.Start.MirroredInGround : sq.Start;
        Vector3 q1 = image ? sq.End.MirroredInGround : sq.End;
        double lmax = Math.Max(sp.LengthM, sq.LengthM);
        Vector3 qc = 0.5 * (q0 + q1);
        double bound = Vector3.Distance(sp.Centre, qc) - 0.5 * (sp.LengthM + sq.LengthM);
        // Far beyond every threshold below: the exact distance cannot change the rule.
        double dmin = bound >= 3 * lmax ? bound : Geometry3.SegmentDistance(sp.Start, sp.End, q0, q1);
        bool tube = UsesTubeKernel(segs, p, q, image, dmin);
        if (dmin < lmax || tube)
            Add(segs, p, q, image, RuleFor(dmin < 0.1 * lmax ? 12 : 8, 4, true), true, tube);
        else
            Add(segs, p, q, image, RuleFor(FarOrder(sp.LengthM, dmin), FarOrder(sq.LengthM, dmin), false), false, false);
    }

    private static double Distance(Segment[] segs, int p, int q, bool image)
    {
        Segment sp = segs[p], sq = segs[q];
        return image
            ? Geometry3.SegmentDistance(sp.Start, sp.End, sq.Start.MirroredInGround, sq.End.MirroredInGround)
            : Geometry3.SegmentDistance(sp.Start, sp.End, sq.Start, sq.End);
    }

    /// <summary>How far, in radii, the tube kernel is used along one wire. Beyond it the two kernels'
    /// static parts differ by about a²/(2z³) (their expansions in a/z: 0.8 % of 1/z at 8 radii), and the
    /// tail beyond adds ∫ a²/(2z³) dz = 1/256 to a potential of order 2 ln(L/a): under 0.1 %.</summary>
    internal const double TubeReachInRadii = 8;

    /// <summary>
    /// Whether a pair takes the exact tube kernel's static part (<see cref="ExactStaticKernel"/>): the
    /// two segments lie on one tube, i.e. on the same wire or meeting at a node, and within
    /// <see cref="TubeReachInRadii"/> radii; an image only where its wire stands on the ground (the
    /// image continues the same tube; either segment touching it keeps the table reciprocal). Other pairs are separate wires, where the observation point on
    /// one axis sees the other tube at sqrt(ρ² + a²) to second order in a/ρ: the reduced kernel.
    /// </summary>
    internal static bool UsesTubeKernel(Segment[] segs, int p, int q, bool image, double dmin)
    {
        Segment sp = segs[p], sq = segs[q];
        if (dmin >= TubeReachInRadii * Math.Max(sp.RadiusM, sq.RadiusM)) return false;
        bool touching = sp.StartNode == sq.StartNode || sp.StartNode == sq.EndNode || sp.EndNode == sq.StartNode || sp.EndNode == sq.EndNode;
        if (image) return sp.WireIndex == sq.WireIndex && (sp.Start.Z == 0 || sp.End.Z == 0 || sq.Start.Z == 0 || sq.End.Z == 0);
        return sp.WireIndex == sq.WireIndex || touching;
    }

    /// <summary>
    /// Gauss–Legendre points along a segment of length L seen from distance d ≥ L (nearer pairs are
    /// singularity-subtracted). An n-point rule integrates 1/R over the segment with a relative error of
    /// order (L/2d)^(2n) (the error term of Gauss–Legendre, Abramowitz and Stegun 25.4.30): at most
    /// about 4e-3 for 4 points at d = L, 1.4e-3 for 3 at 1.5 L and 8e-4 for 2 at 3 L.
    /// </summary>
    internal static int FarOrder(double lengthM, double distanceM) =>
        distanceM >= 3 * lengthM ? 2 : distanceM >= 1.5 * lengthM ? 3 : 4;

    private void Add(Segment[] segs, int p, int q, bool image, int ruleIndex, bool subtract, bool tube)
    {
        var rule = _rules[ruleIndex];
        Segment sp = segs[p], sq = segs[q];
        Vector3 q0 = image ? sq.Start.MirroredInGround : sq.Start;
        Vector3 q1 = image ? sq.End.MirroredInGround : sq.End;
        double lq = sq.LengthM;
        Vector3 tq = (1.0 / lq) * (q1 - q0);
        double a2 = 0.5 * (sp.RadiusM * sp.RadiusM + sq.RadiusM * sq.RadiusM);

        _p.Add(p); _q.Add(q); _image.Add(image); _subtracted.Add(subtract); _rule.Add(ruleIndex);
        _tangentDot.Add(Vector3.Dot(sp.Direction, tq));
        _start.Add(_points);
        if (_points + rule.PointCount > _r.Length) Array.Resize(ref _r, Math.Max(_points + rule.PointCount, 2 * _r.Length));
        var (outerNodes, outerWeights) = rule.Outer;
        var innerNodes = rule.Inner.Nodes;
        double s00 = 0, s10 = 0, s01 = 0, s11 = 0;
        for (int i = 0; i < outerNodes.Length; i++)
        {
            double u = outerNodes[i], wi = outerWeights[i];
            Vector3 r = sp.PointAt(u);
            if (subtract)
            {
                var (c0, c1) = tube ? ExactStaticKernel.Over(r, q0, tq, lq, a2) : StaticLineIntegrals.Over(r, q0, tq, lq, a2);
                s00 += wi * c0; s10 += wi * u * c0; s01 += wi * c1; s11 += wi * u * c1;
            }
            for (int j = 0; j < innerNodes.Length; j++)
            {
                Vector3 rq = q0 + (innerNodes[j] * lq) * tq;
                _r[_points++] = Math.Sqrt((r - rq).LengthSquared + a2);
            }
        }
        _s00.Add(s00); _s10.Add(s10); _s01.Add(s01); _s11.Add(s11);
    }

    private void Freeze()
    {
        P = _p.ToArray(); Q = _q.ToArray(); Image = _image.ToArray(); Subtracted = _subtracted.ToArray();
        Rule = _rule.ToArray(); Rules = _rules.ToArray();
        TangentDot = _tangentDot.ToArray(); Start = _start.ToArray();
        S00 = _s00.ToArray(); S10 = _s10.ToArray(); S01 = _s01.ToArray(); S11 = _s11.ToArray();
        R = _r[.._points];
    }

    /// <summary>
    /// The four kernel moments of pair <paramref name="e"/> at wavenumber k (rad/m). Scalar
    /// Math.SinCos on purpose: the runtime's SIMD sine and cosine may fuse multiply-adds differently
    /// before and after the JIT re-optimizes a method, which made two solves of the same frequency differ
    /// in the last bits; results here must be bit-reproducible.
    /// </summary>
    public void Moments(int e, double k, out Complex i00, out Complex i10, out Complex i01, out Complex i11)
    {
        double r00 = 0, x00 = 0, r10 = 0, x10 = 0, r01 = 0, x01 = 0, r11 = 0, x11 = 0;
        var rule = Rules[Rule[e]];
        double[] w = rule.W, wu = rule.WU, wv = rule.WV, wuv = rule.WUV;
        double offset = Subtracted[e] ? 1.0 : 0.0;
        var distances = R.AsSpan(Start[e], w.Length);
        for (int i = 0; i < distances.Length; i++)
        {
            double dist = distances[i];
            var (sin, cos) = Math.SinCos(k * dist);
            double inv = 1.0 / dist;
            double gr = (cos - offset) * inv;
            double gi = -sin * inv;
            r00 += w[i] * gr; x00 += w[i] * gi;
            r10 += wu[i] * gr; x10 += wu[i] * gi;
            r01 += wv[i] * gr; x01 += wv[i] * gi;
            r11 += wuv[i] * gr; x11 += wuv[i] * gi;
        }
        if (offset != 0) { r00 += S00[e]; r10 += S10[e]; r01 += S01[e]; r11 += S11[e]; }
        i00 = new Complex(r00, x00); i10 = new Complex(r10, x10); i01 = new Complex(r01, x01); i11 = new Complex(r11, x11);
    }
}
