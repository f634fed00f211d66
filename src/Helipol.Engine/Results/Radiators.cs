using System.Numerics;

namespace Helipol.Engine;

/// <summary>
/// The solved currents as straight radiators with current linear along each, plus their images in a
/// perfect ground. The radiation integral of one segment has a closed form:
///   N = Σ t̂ L e^{jk r̂·r₀} [I₀ F₀(β) + (I₁ − I₀) F₁(β)],  β = kL (r̂·t̂),
///   F₀ = ∫₀¹ e^{jβu} du,  F₁ = ∫₀¹ u e^{jβu} du,
/// and r·E = −j(kη0/4π)(N − r̂(r̂·N)) (far-zone vector potential, e^{jωt}; Balanis, *Antenna Theory*, §6.6).
/// </summary>
internal sealed class Radiators
{
    private readonly double[] _x0, _y0, _z0, _tx, _ty, _tz, _len;
    private readonly Complex[] _i0, _i1;
    private readonly double _k;
    private readonly bool _ground;

    public Radiators(SegmentCurrent[] currents, double k, bool ground)
    {
        _k = k;
        _ground = ground;
        int n = currents.Length * (ground ? 2 : 1);
        _x0 = new double[n]; _y0 = new double[n]; _z0 = new double[n];
        _tx = new double[n]; _ty = new double[n]; _tz = new double[n]; _len = new double[n];
        _i0 = new Complex[n]; _i1 = new Complex[n];
        int i = 0;
        foreach (var c in currents)
        {
            Put(i++, c.StartM, c.EndM, c.StartCurrentA, c.EndCurrentA);
            // Image in a perfect ground: mirrored segment, current reversed along the mirrored direction.
            if (ground) Put(i++, c.StartM.MirroredInGround, c.EndM.MirroredInGround, -c.StartCurrentA, -c.EndCurrentA);
        }
        MaxRadiusM = 0;
        foreach (var c in currents) MaxRadiusM = Math.Max(MaxRadiusM, Math.Max(c.StartM.Length, c.EndM.Length));
    }

    /// <summary>Largest distance of any current from the origin, m.</summary>
    public double MaxRadiusM { get; }

    private void Put(int i, Vector3 a, Vector3 b, Complex ia, Complex ib)
    {
        Vector3 d = b - a;
        double len = d.Length;
        _x0[i] = a.X; _y0[i] = a.Y; _z0[i] = a.Z;
        _tx[i] = d.X / len; _ty[i] = d.Y / len; _tz[i] = d.Z / len; _len[i] = len;
        _i0[i] = ia; _i1[i] = ib;
    }

    public FarField At(double theta, double phi)
    {
        if (_ground && theta > Math.PI / 2) return default; // below a perfect ground there is no field
        var (st, ct) = Math.SinCos(theta);
        var (sp, cp) = Math.SinCos(phi);
        double rx = st * cp, ry = st * sp, rz = ct;
        double nxr = 0, nxi = 0, nyr = 0, nyi = 0, nzr = 0, nzi = 0;
        for (int i = 0; i < _len.Length; i++)
        {
            double beta = _k * _len[i] * (rx * _tx[i] + ry * _ty[i] + rz * _tz[i]);
            var (f0, f1) = Shape(beta);
            Complex amp = _i0[i] * f0 + (_i1[i] - _i0[i]) * f1;
            var (s, c) = Math.SinCos(_k * (rx * _x0[i] + ry * _y0[i] + rz * _z0[i]));
            double ar = (amp.Real * c - amp.Imaginary * s) * _len[i];
            double ai = (amp.Real * s + amp.Imaginary * c) * _len[i];
            nxr += _tx[i] * ar; nxi += _tx[i] * ai;
            nyr += _ty[i] * ar; nyi += _ty[i] * ai;
            nzr += _tz[i] * ar; nzi += _tz[i] * ai;
        }
        // θ̂ = (cosθ cosφ, cosθ sinφ, −sinθ), φ̂ = (−sinφ, cosφ, 0).
        double thr = ct * cp * nxr + ct * sp * nyr - st * nzr;
        double thi = ct * cp * nxi + ct * sp * nyi - st * nzi;
        double phr = -sp * nxr + cp * nyr;
        double phi2 = -sp * nxi + cp * nyi;
        double scale = _k * PhysicalConstants.Eta0 / (4 * Math.PI);
        // −j·scale·(x + jy) = scale·(y − jx)
        return new FarField(new Complex(scale * thi, -scale * thr), new Complex(scale * phi2, -scale * phr));
    }

    /// <summary>F₀(β) = ∫₀¹ e^{jβu} du and F₁(β) = ∫₀¹ u e^{jβu} du, by series for small β.</summary>
    internal static (Complex F0, Complex F1) Shape(double beta)
    {
        if (Math.Abs(beta) < 0.05)
        {
            double b2 = beta * beta, b4 = b2 * b2;
            return (new Complex(1 - b2 / 6 + b4 / 120, beta / 2 - beta * b2 / 24),
                    new Complex(0.5 - b2 / 8 + b4 / 144, beta / 3 - beta * b2 / 30));
        }
        var (s, c) = Math.SinCos(beta);
        var e = new Complex(c, s);
        var jb = new Complex(0, beta);
        Complex f0 = (e - 1) / jb;
        Complex f1 = e / jb + (e - 1) / (beta * beta);
        return (f0, f1);
    }

    /// <summary>
    /// Radiated power, W: (1/2η0) ∯ |rE|² dΩ by Gauss–Legendre in θ (over the upper half space above a
    /// ground) and the trapezoidal rule in φ (exact for the periodic band-limited pattern).
    /// </summary>
    public double RadiatedPowerW()
    {
        int nTheta = 24 + (int)Math.Ceiling(2 * _k * MaxRadiusM);
        int nPhi = 2 * nTheta;
        double top = _ground ? Math.PI / 2 : Math.PI;
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(0, top, nTheta);
        double sum = 0;
        for (int i = 0; i < nTheta; i++)
        {
            double theta = rule.Abscissas[i];
            double ring = 0;
            for (int j = 0; j < nPhi; j++)
                ring += At(theta, 2 * Math.PI * j / nPhi).IntensityWPerSr;
            sum += rule.Weights[i] * Math.Sin(theta) * ring * (2 * Math.PI / nPhi);
        }
        return sum;
    }
}
