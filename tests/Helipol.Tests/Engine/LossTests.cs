using Complex = System.Numerics.Complex;
using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class LossTests
{
    // Balanis, Antenna Theory, 3rd ed., §2.14, eq. 2-90b: ohmic resistance of a wire of length l and
    // perimeter P = 2πa, R_L = (l/P)·sqrt(ωμ0/(2σ)), times 1/2 for the sinusoidal current of a
    // half-wave dipole (Balanis example 2.13). Copper σ = 5.8e7 S/m (Pozar, Microwave Engineering,
    // appendix). The fraction of input power lost is then R_L/R_in. A wire of finite radius carries a
    // current that departs from the sinusoid by a term of relative order 1/Ω, Ω = 2 ln(l/a) ≈ 15.6 here
    // (King and Middleton's two-term theory), so we allow 10 %.
    [Fact]
    public void CopperHalfWaveDipoleLossMatchesTextbookOhmicResistance()
    {
        const double f = 3e9, sigma = 5.8e7;
        double lambda = PhysicalConstants.SpeedOfLight / f, l = lambda / 2, a = 2e-5;
        var s = Antennas.Solve(Antennas.Dipole(l, a, new LossyConductor(sigma)), f, new SegmentationOptions(40));
        double omega = 2 * Math.PI * f;
        double rl = l / (2 * Math.PI * a) * Math.Sqrt(omega * PhysicalConstants.Mu0 / (2 * sigma)) / 2;
        double expectedLossFraction = rl / s.InputImpedanceOhm().Real;
        Assert.InRange(s.OhmicLossW / s.InputPowerW, expectedLossFraction * 0.90, expectedLossFraction * 1.10);
        Assert.InRange(s.Efficiency, 1 - expectedLossFraction * 1.10, 1 - expectedLossFraction * 0.90);
        // Gain = directivity × efficiency (IEEE Std 145), within the 1 % power-integration tolerance.
        var g = s.GainAt(Math.PI / 2, 0);
        Assert.Equal(10 * Math.Log10(s.DirectivityAt(Math.PI / 2, 0) * s.Efficiency), g.GainTotalDbi, 0.05);
    }

    // Surface resistance grows as sqrt(μr/σ) (skin effect, any EM handbook, e.g. Ramo, Whinnery and Van
    // Duzer): for the same feed current a magnetic steel wire (μr = 100) dissipates ten times what the
    // same wire with μr = 1 does; the current shape changes slightly with the loss, so we allow 3 %.
    [Fact]
    public void MagneticWireLossScalesWithSquareRootOfPermeability()
    {
        static double Loss(double mu)
        {
            var s = Antennas.Solve(Antennas.Dipole(0.48, 1e-3, new LossyConductor(6e6, mu)));
            return s.OhmicLossW / Math.Pow(s.InputCurrentA().Magnitude, 2);
        }
        Assert.InRange(Loss(100) / Loss(1), 10 * 0.97, 10 * 1.03);
    }

    // Surface resistance of copper at 1 GHz, R_s = sqrt(ωμ0/2σ) ≈ 8.2 mΩ (Pozar, Microwave Engineering,
    // surface resistance of good conductors; figure from memory), spread round a 1 mm radius wire:
    // R' = R_s/(2πa) ≈ 1.31 Ω/m, with an equal internal reactance (good-conductor surface impedance).
    [Fact]
    public void CopperSurfaceImpedanceMatchesHandbook()
    {
        var perMetre = Helipol.Engine.Mesh.WireImpedance.For(1e-3, new LossyConductor(5.8e7), null).PerMetreOhm(2 * Math.PI * 1e9);
        Assert.Equal(8.2e-3 / (2 * Math.PI * 1e-3), perMetre.Real, 0.01);
        Assert.Equal(perMetre.Real, perMetre.Imaginary, 12);
    }

    // Circuit theory: a lumped series impedance at the feed node of a dipole adds to its input impedance
    // exactly (the load and the gap are in series at the same node). That holds for a delta gap, which
    // drives the node's basis alone as the load loads it; a finite gap spreads over the neighbours.
    [Fact]
    public void LumpedLoadAtTheFeedAddsInSeries()
    {
        var dipole = Antennas.Dipole(0.5, 1e-3) with { Sources = [new VoltageSource(new Vector3(0, 0, 0), 1, GapM: 0)] };
        var bare = Antennas.Solve(dipole).InputImpedanceOhm();
        var zl = new Complex(22, -47);
        var model = dipole with { Loads = new[] { new LumpedLoad(new Vector3(0, 0, 0), zl) } };
        var s = Antennas.Solve(model);
        Assert.True((s.InputImpedanceOhm() - (bare + zl)).Magnitude < 1e-6 * bare.Magnitude);
        // The load's resistance dissipates ½ R |I|².
        Assert.Equal(0.5 * 22 * Math.Pow(s.InputCurrentA().Magnitude, 2), s.OhmicLossW, 12);
    }

    // Richmond and Newman (dielectric-coated wire antennas, Radio Science 11(1), 1976): a coating adds
    // L' = (μ0/2π)(1 − 1/εr) ln(b/a) per metre, which slows the wave and lowers resonance. For εr = 3 and
    // b = 2a, L' = 2e-7·(2/3)·ln 2 = 9.24e-8 H/m. A transmission-line estimate of the resonance shift
    // is sqrt(L0/(L0 + L')), with L0 = (μ0/2π)(ln(2h/a) − 1) the wire's own inductance per metre (Schelkunoff's
    // average characteristic impedance of a dipole, from memory); we check the model's shift within 30 % of it.
    [Fact]
    public void CoatingLowersResonanceByItsInductance()
    {
        const double a = 1e-3;
        var coat = new DielectricCoating(3, 2 * a);
        var perMetre = Helipol.Engine.Mesh.WireImpedance.For(a, PerfectConductor.Instance, coat);
        Assert.Equal(9.2420e-8, perMetre.CoatingInductanceHPerM, 11);
        Assert.Equal(0.5 * 9.2420e-8, Helipol.Engine.Mesh.WireImpedance.For(a, PerfectConductor.Instance, coat with { InductanceScale = 0.5 }).CoatingInductanceHPerM, 11);
        double bare = ResonantFrequency(null), coated = ResonantFrequency(coat);
        double l0 = 2e-7 * (Math.Log(0.48 / a) - 1), lc = 2e-7 * (2.0 / 3) * Math.Log(2);
        double expectedShift = 1 - Math.Sqrt(l0 / (l0 + lc));
        double shift = 1 - coated / bare;
        Assert.InRange(shift, expectedShift * 0.7, expectedShift * 1.3);
        // A calibration factor of 0 removes the coating's effect entirely.
        Assert.Equal(bare, ResonantFrequency(coat with { InductanceScale = 0 }), 6);

        static double ResonantFrequency(DielectricCoating? c)
        {
            var wire = new Wire(new Vector3[] { new(0, 0, -0.24), new(0, 0, 0), new(0, 0, 0.24) }, a, PerfectConductor.Instance, c);
            var model = new WireModel(new[] { wire }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, 0), 1) });
            var mesh = MeshedModel.Create(model, 3.5e8);
            double lo = 2.5e8, hi = 3.5e8;
            for (int i = 0; i < 30; i++)
            {
                double mid = 0.5 * (lo + hi);
                if (MomSolver.Solve(mesh, mid).InputImpedanceOhm().Imaginary > 0) hi = mid; else lo = mid;
            }
            return 0.5 * (lo + hi);
        }
    }
}
