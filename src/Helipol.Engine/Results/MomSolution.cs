using System.Numerics;

namespace Helipol.Engine;

/// <summary>
/// The solved currents of a <see cref="MeshedModel"/> at one frequency, and everything derived from
/// them: input impedances, powers, far field, directivity, gain and polarization. Angles are in
/// radians, θ from +z and φ from +x towards +y. Safe to read from several threads.
/// </summary>
public sealed class MomSolution
{
    private readonly MeshedModel _mesh;
    private readonly Complex[] _basisCurrents;
    private readonly SegmentCurrent[] _currents;
    private readonly Radiators _radiators;
    private readonly Lazy<double> _radiated;

    internal MomSolution(MeshedModel mesh, double frequencyHz, Complex[] basisCurrents)
    {
        _mesh = mesh;
        FrequencyHz = frequencyHz;
        _basisCurrents = basisCurrents;
        double k = 2 * Math.PI * frequencyHz / PhysicalConstants.SpeedOfLight;
        var segs = mesh.Segments;
        _currents = new SegmentCurrent[segs.Length];
        for (int s = 0; s < segs.Length; s++)
        {
            Complex i0 = 0, i1 = 0;
            for (int ip = mesh.PieceStart[s]; ip < mesh.PieceStart[s + 1]; ip++)
            {
                var piece = mesh.PiecesBySegment[ip];
                if (piece.Rising) i1 += piece.Sign * basisCurrents[piece.Basis];
                else i0 += piece.Sign * basisCurrents[piece.Basis];
            }
            _currents[s] = new SegmentCurrent(segs[s].WireIndex, segs[s].Start, segs[s].End, i0, i1);
        }
        _radiators = new Radiators(_currents, k, mesh.HasGround);

        double omega = 2 * Math.PI * frequencyHz;
        double input = 0;
        for (int i = 0; i < mesh.SourceBases.Length; i++)
            input += 0.5 * (mesh.SourceVolts[i] * Complex.Conjugate(mesh.GapCurrent(i, basisCurrents))).Real;
        InputPowerW = input;
        double loss = 0;
        for (int s = 0; s < segs.Length; s++)
        {
            if (segs[s].Impedance.IsZero) continue;
            double r = segs[s].Impedance.PerMetreOhm(omega).Real * segs[s].LengthM;
            Complex a = _currents[s].StartCurrentA, b = _currents[s].EndCurrentA;
            // ∫₀¹ |a(1−u) + b u|² du = (|a|² + |b|² + Re(a b*))/3
            loss += 0.5 * r * (a.Magnitude * a.Magnitude + b.Magnitude * b.Magnitude + (a * Complex.Conjugate(b)).Real) / 3;
        }
        for (int i = 0; i < mesh.LoadBases.Length; i++)
        {
            double m = basisCurrents[mesh.LoadBases[i]].Magnitude;
            loss += 0.5 * mesh.LoadImpedances[i].Real * m * m;
        }
        OhmicLossW = loss;
        _radiated = new Lazy<double>(_radiators.RadiatedPowerW, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>Frequency of this solution, Hz.</summary>
    public double FrequencyHz { get; }

    /// <summary>Number of voltage sources, in the order of <see cref="WireModel.Sources"/>.</summary>
    public int SourceCount => _mesh.SourceBases.Length;

    /// <summary>Current through source <paramref name="sourceIndex"/> in its reference direction, A.</summary>
    public Complex InputCurrentA(int sourceIndex = 0)
    {
        SourceBasis(sourceIndex);
        return _mesh.GapCurrent(sourceIndex, _basisCurrents);
    }

    /// <summary>
    /// Input impedance V/I at source <paramref name="sourceIndex"/>, Ω. With several sources this is
    /// the active impedance, with all of them driving.
    /// </summary>
    public Complex InputImpedanceOhm(int sourceIndex = 0)
    {
        Complex i = InputCurrentA(sourceIndex);
        if (i == Complex.Zero) return new Complex(double.PositiveInfinity, 0);
        return _mesh.SourceVolts[sourceIndex] / i;
    }

    /// <summary>Power delivered by all sources, ½ Σ Re(V I*), W.</summary>
    public double InputPowerW { get; }

    /// <summary>Power radiated, by integrating the far field over the sphere (half-space above a ground), W.</summary>
    public double RadiatedPowerW => _radiated.Value;

    /// <summary>Power dissipated in the wires' skin-effect resistance and in resistive lumped loads, W.</summary>
    public double OhmicLossW { get; }

    /// <summary>Radiation efficiency P_rad / (P_rad + P_loss), 0 … 1.</summary>
    public double Efficiency
    {
        get
        {
            double total = RadiatedPowerW + OhmicLossW;
            return total > 0 ? RadiatedPowerW / total : 0;
        }
    }

    /// <summary>Far field r·E (volts) in direction (θ, φ); zero below a perfect ground.</summary>
    public FarField FarFieldAt(double thetaRad, double phiRad)
    {
        if (!double.IsFinite(thetaRad) || !double.IsFinite(phiRad))
            throw new ArgumentOutOfRangeException(nameof(thetaRad), FormattableString.Invariant($"direction: found θ = {thetaRad}, φ = {phiRad} rad, allowed finite angles"));
        return _radiators.At(thetaRad, phiRad);
    }

    /// <summary>Directivity 4πU/P_rad (ratio, not dB).</summary>
    public double DirectivityAt(double thetaRad, double phiRad)
    {
        double prad = RadiatedPowerW;
        return prad > 0 ? 4 * Math.PI * FarFieldAt(thetaRad, phiRad).IntensityWPerSr / prad : 0;
    }

    /// <summary>Gain referred to the accepted input power, split into circular parts, with the polarization.</summary>
    public PolarizedGain GainAt(double thetaRad, double phiRad)
    {
        var f = FarFieldAt(thetaRad, phiRad);
        double scale = InputPowerW > 0 ? 4 * Math.PI / (2 * PhysicalConstants.Eta0 * InputPowerW) : 0;
        double r = f.RightHandV.Magnitude, l = f.LeftHandV.Magnitude;
        return new PolarizedGain(
            Db(scale * r * r), Db(scale * l * l), Db(scale * (r * r + l * l)),
            Polarization.AxialRatioDb(f), Polarization.TiltRad(f), Polarization.Sense(f));
    }

    /// <summary>Current on every segment, in segment order (wire by wire, first point to last).</summary>
    public IReadOnlyList<SegmentCurrent> Currents => _currents;

    private int SourceBasis(int sourceIndex)
    {
        if (sourceIndex < 0 || sourceIndex >= _mesh.SourceBases.Length)
            throw new ArgumentOutOfRangeException(nameof(sourceIndex), sourceIndex, $"allowed 0 … {_mesh.SourceBases.Length - 1}");
        return _mesh.SourceBases[sourceIndex];
    }

    private static double Db(double ratio) => ratio > 1e-30 ? 10 * Math.Log10(ratio) : -300;
}
