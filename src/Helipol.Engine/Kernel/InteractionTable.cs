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
/// Near pairs (closer than half the longer segment) split g into the static 1/R part, integrated over v in
/// closed form (asinh, <see cref="StaticLineIntegrals"/>), and the smooth remainder (e^{−jkR} − 1)/R,
/// integrated by Gauss–Legendre; the outer integral uses end-clustered nodes. Farther pairs use plain
/// Gauss–Legendre whose order on each segment falls with its length over the distance (4, 3, then 2 points).
/// </summary>
internal sealed class InteractionTable
{
    private readonly List<int> _p = new(), _q = new();
    private readonly List<bool> _image = new(), _subtracted = new();
    private readonly List<double> _tangentDot = new();
    private readonly List<double> _s00 = new(), _s10 = new(), _s01 = new(), _s11 = new();
    private readonly List<int> _start = new(), _count = new();
    private readonly List<double> _r = new(), _w = new(), _wu = new(), _wv = new(), _wuv = new();

    // Frozen arrays for the hot loop.
    internal int[] P = [], Q = [], Start = [], Count = [];
    internal bool[] Image = [], Subtracted = [];
    internal double[] TangentDot = [], S00 = [], S10 = [], S01 = [], S11 = [];
    internal double[] R = [], W = [], WU = [], WV = [], WUV = [];

    public int PairCount => P.Length;

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
        var outer = GaussLegendre.EndClustered(16);
        var inner = GaussLegendre.OnUnitInterval(8);
        for (int p = 0; p < segs.Length; p++)
            for (int q = 0; q < segs.Length; q++)
            {
                t.Add(segs, p, q, false, outer, inner, true);
                if (ground) t.Add(segs, p, q, true, outer, inner, true);
            }
        t.Freeze();
        return t;
    }

    private void AddAdaptive(Segment[] segs, int p, int q, bool image)
    {
        Segment sp = segs[p], sq = segs[q];
        Vector3 q0 = image ? sq.Start.MirroredInGround : sq.Start;
        Vector3 q1 = image ? sq.End.MirroredInGround : sq.End;
        double lmax = Math.Max(sp.LengthM, sq.LengthM);
        double dmin = Geometry3.SegmentDistance(sp.Start, sp.End, q0, q1);
        if (dmin < 0.5 * lmax)
            Add(segs, p, q, image, GaussLegendre.EndClustered(dmin < 0.1 * lmax ? 12 : 8), GaussLegendre.OnUnitInterval(4), true);
        else
            Add(segs, p, q, image, GaussLegendre.OnUnitInterval(FarOrder(sp.LengthM, dmin)), GaussLegendre.OnUnitInterval(FarOrder(sq.LengthM, dmin)), false);
    }

    /// <summary>
    /// Gauss–Legendre points along a segment of length L seen from distance d. An n-point rule
    /// integrates 1/R over the segment with a relative error of order (L/2d)^(2n) (the error term of
    /// Gauss–Legendre, Abramowitz and Stegun 25.4.30), so 2 points reach about 1e-3 at d = 2L.
    /// </summary>
    internal static int FarOrder(double lengthM, double distanceM) =>
        distanceM >= 2 * lengthM ? 2 : distanceM >= lengthM ? 3 : 4;

    private void Add(Segment[] segs, int p, int q, bool image,
        (double[] Nodes, double[] Weights) outer, (double[] Nodes, double[] Weights) inner, bool subtract)
    {
        Segment sp = segs[p], sq = segs[q];
        Vector3 q0 = image ? sq.Start.MirroredInGround : sq.Start;
        Vector3 q1 = image ? sq.End.MirroredInGround : sq.End;
        Vector3 tq = (1.0 / sq.LengthM) * (q1 - q0);
        double a2 = 0.5 * (sp.RadiusM * sp.RadiusM + sq.RadiusM * sq.RadiusM);

        _p.Add(p); _q.Add(q); _image.Add(image); _subtracted.Add(subtract);
        _tangentDot.Add(Vector3.Dot(sp.Direction, tq));
        _start.Add(_r.Count);
        double s00 = 0, s10 = 0, s01 = 0, s11 = 0;
        for (int i = 0; i < outer.Nodes.Length; i++)
        {
            double u = outer.Nodes[i], wi = outer.Weights[i];
            Vector3 r = sp.PointAt(u);
            if (subtract)
            {
                var (c0, c1) = StaticLineIntegrals.Over(r, q0, tq, sq.LengthM, a2);
                s00 += wi * c0; s10 += wi * u * c0; s01 += wi * c1; s11 += wi * u * c1;
            }
            for (int j = 0; j < inner.Nodes.Length; j++)
            {
                double v = inner.Nodes[j], w = wi * inner.Weights[j];
                Vector3 rq = q0 + (v * sq.LengthM) * tq;
                double dist = Math.Sqrt((r - rq).LengthSquared + a2);
                _r.Add(dist); _w.Add(w); _wu.Add(w * u); _wv.Add(w * v); _wuv.Add(w * u * v);
            }
        }
        _count.Add(_r.Count - _start[^1]);
        _s00.Add(s00); _s10.Add(s10); _s01.Add(s01); _s11.Add(s11);
    }

    private void Freeze()
    {
        P = _p.ToArray(); Q = _q.ToArray(); Image = _image.ToArray(); Subtracted = _subtracted.ToArray();
        TangentDot = _tangentDot.ToArray(); Start = _start.ToArray(); Count = _count.ToArray();
        S00 = _s00.ToArray(); S10 = _s10.ToArray(); S01 = _s01.ToArray(); S11 = _s11.ToArray();
        R = _r.ToArray(); W = _w.ToArray(); WU = _wu.ToArray(); WV = _wv.ToArray(); WUV = _wuv.ToArray();
    }

    /// <summary>The four kernel moments of pair <paramref name="e"/> at wavenumber k (rad/m).</summary>
    public void Moments(int e, double k, out Complex i00, out Complex i10, out Complex i01, out Complex i11)
    {
        double r00 = 0, x00 = 0, r10 = 0, x10 = 0, r01 = 0, x01 = 0, r11 = 0, x11 = 0;
        int end = Start[e] + Count[e];
        bool sub = Subtracted[e];
        double[] rr = R, w = W, wu = WU, wv = WV, wuv = WUV;
        for (int i = Start[e]; i < end; i++)
        {
            double dist = rr[i];
            var (sin, cos) = Math.SinCos(k * dist);
            double inv = 1.0 / dist;
            double gr = (sub ? cos - 1 : cos) * inv;
            double gi = -sin * inv;
            r00 += w[i] * gr; x00 += w[i] * gi;
            r10 += wu[i] * gr; x10 += wu[i] * gi;
            r01 += wv[i] * gr; x01 += wv[i] * gi;
            r11 += wuv[i] * gr; x11 += wuv[i] * gi;
        }
        if (sub) { r00 += S00[e]; r10 += S10[e]; r01 += S01[e]; r11 += S11[e]; }
        i00 = new Complex(r00, x00); i10 = new Complex(r10, x10); i01 = new Complex(r01, x01); i11 = new Complex(r11, x11);
    }
}
