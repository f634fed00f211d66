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
    private double[] _r = new double[1024], _w = new double[1024], _wu = new double[1024], _wv = new double[1024], _wuv = new double[1024];
    private int _points;

    // Frozen arrays for the hot loop.
    internal int[] P = [], Q = [], Start = [], Count = [];
    internal bool[] Image = [], Subtracted = [];
    internal double[] TangentDot = [], S00 = [], S10 = [], S01 = [], S11 = [];
    internal double[] R = [], W = [], WU = [], WV = [], WUV = [];
    internal double[] InverseR = [], StaticOffset = [];

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
        Vector3 qc = 0.5 * (q0 + q1);
        double bound = Vector3.Distance(sp.Centre, qc) - 0.5 * (sp.LengthM + sq.LengthM);
        // Far beyond every threshold below: the exact distance cannot change the rule.
        double dmin = bound >= 3 * lmax ? bound : Geometry3.SegmentDistance(sp.Start, sp.End, q0, q1);
        if (dmin < lmax)
            Add(segs, p, q, image, GaussLegendre.EndClustered(dmin < 0.1 * lmax ? 12 : 8), GaussLegendre.OnUnitInterval(4), true);
        else
            Add(segs, p, q, image, GaussLegendre.OnUnitInterval(FarOrder(sp.LengthM, dmin)), GaussLegendre.OnUnitInterval(FarOrder(sq.LengthM, dmin)), false);
    }

    /// <summary>
    /// Gauss–Legendre points along a segment of length L seen from distance d ≥ L (nearer pairs are
    /// singularity-subtracted). An n-point rule integrates 1/R over the segment with a relative error of
    /// order (L/2d)^(2n) (the error term of Gauss–Legendre, Abramowitz and Stegun 25.4.30): at most
    /// about 4e-3 for 4 points at d = L, 1.4e-3 for 3 at 1.5 L and 8e-4 for 2 at 3 L.
    /// </summary>
    internal static int FarOrder(double lengthM, double distanceM) =>
        distanceM >= 3 * lengthM ? 2 : distanceM >= 1.5 * lengthM ? 3 : 4;

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
        _start.Add(_points);
        int needed = _points + outer.Nodes.Length * inner.Nodes.Length;
        if (needed > _r.Length) Grow(Math.Max(needed, 2 * _r.Length));
        double lq = sq.LengthM;
        double s00 = 0, s10 = 0, s01 = 0, s11 = 0;
        for (int i = 0; i < outer.Nodes.Length; i++)
        {
            double u = outer.Nodes[i], wi = outer.Weights[i];
            Vector3 r = sp.PointAt(u);
            if (subtract)
            {
                var (c0, c1) = StaticLineIntegrals.Over(r, q0, tq, lq, a2);
                s00 += wi * c0; s10 += wi * u * c0; s01 += wi * c1; s11 += wi * u * c1;
            }
            for (int j = 0; j < inner.Nodes.Length; j++)
            {
                double v = inner.Nodes[j], w = wi * inner.Weights[j];
                Vector3 rq = q0 + (v * lq) * tq;
                double dist = Math.Sqrt((r - rq).LengthSquared + a2);
                _r[_points] = dist; _w[_points] = w; _wu[_points] = w * u; _wv[_points] = w * v; _wuv[_points] = w * u * v;
                _points++;
            }
        }
        _count.Add(_points - _start[^1]);
        _s00.Add(s00); _s10.Add(s10); _s01.Add(s01); _s11.Add(s11);
    }

    private void Grow(int size)
    {
        Array.Resize(ref _r, size); Array.Resize(ref _w, size); Array.Resize(ref _wu, size);
        Array.Resize(ref _wv, size); Array.Resize(ref _wuv, size);
    }

    private void Freeze()
    {
        P = _p.ToArray(); Q = _q.ToArray(); Image = _image.ToArray(); Subtracted = _subtracted.ToArray();
        TangentDot = _tangentDot.ToArray(); Start = _start.ToArray(); Count = _count.ToArray();
        S00 = _s00.ToArray(); S10 = _s10.ToArray(); S01 = _s01.ToArray(); S11 = _s11.ToArray();
        R = _r[.._points]; W = _w[.._points]; WU = _wu[.._points]; WV = _wv[.._points]; WUV = _wuv[.._points];
        InverseR = new double[_points];
        for (int i = 0; i < _points; i++) InverseR[i] = 1 / R[i];
        StaticOffset = new double[R.Length];
        for (int e = 0; e < P.Length; e++)
            if (Subtracted[e]) Array.Fill(StaticOffset, 1.0, Start[e], Count[e]);
    }

    public int PointCount => R.Length;

    /// <summary>
    /// Kernel value at every quadrature point at wavenumber k: g = (e^{−jkR} − s)/R with s = 1 where the
    /// static part was taken out. Scalar Math.SinCos on purpose: the SIMD sine and cosine of the runtime
    /// may fuse multiply-adds differently before and after the JIT re-optimizes a method, which made two
    /// solves of the same frequency differ in the last bits; results here must be bit-reproducible.
    /// </summary>
    public void KernelValues(double k, Span<double> real, Span<double> imaginary)
    {
        int n = R.Length, i = 0;
        for (; i < n; i++)
        {
            var (sin, cos) = Math.SinCos(k * R[i]);
            real[i] = (cos - StaticOffset[i]) * InverseR[i];
            imaginary[i] = -sin * InverseR[i];
        }
    }

    /// <summary>The four kernel moments of pair <paramref name="e"/> from precomputed kernel values.</summary>
    public void Moments(int e, ReadOnlySpan<double> gr, ReadOnlySpan<double> gi, out Complex i00, out Complex i10, out Complex i01, out Complex i11)
    {
        double r00 = 0, x00 = 0, r10 = 0, x10 = 0, r01 = 0, x01 = 0, r11 = 0, x11 = 0;
        int end = Start[e] + Count[e];
        double[] w = W, wu = WU, wv = WV, wuv = WUV;
        for (int i = Start[e]; i < end; i++)
        {
            double a = gr[i], b = gi[i];
            r00 += w[i] * a; x00 += w[i] * b;
            r10 += wu[i] * a; x10 += wu[i] * b;
            r01 += wv[i] * a; x01 += wv[i] * b;
            r11 += wuv[i] * a; x11 += wuv[i] * b;
        }
        if (Subtracted[e]) { r00 += S00[e]; r10 += S10[e]; r01 += S01[e]; r11 += S11[e]; }
        i00 = new Complex(r00, x00); i10 = new Complex(r10, x10); i01 = new Complex(r01, x01); i11 = new Complex(r11, x11);
    }

    /// <summary>The four kernel moments of pair <paramref name="e"/> at wavenumber k (rad/m), plain scalar reference.</summary>
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
