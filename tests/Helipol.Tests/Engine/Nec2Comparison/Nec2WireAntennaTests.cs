using Helipol.Engine;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// Plain wire antennas solved by the engine and by NEC-2 (Debian nec2c 1.3) from the same geometry,
/// both at 40 segments per wavelength. Decks per the NEC-2 user's guide (GW, GS, GE, GN 1, EX 0,
/// LD 5, FR, RP). The two codes differ on purpose: NEC-2 expands the current in constant + sine +
/// cosine per segment with point matching at segment centres and feeds a segment's centre; the
/// engine uses triangle bases, Galerkin testing and a gap at a node. Both use a reduced thin-wire
/// kernel. Agreement is therefore a few per cent in R and a few ohms in X near resonance, and the
/// feed-region reactance (a short dipole, a thick wire) differs most.
/// </summary>
public class Nec2WireAntennaTests
{
    private const double Density = 40;
    private static readonly SegmentationOptions Options = new(Density);

    // Free-space dipoles, λ = 1 m. Observed (engine vs NEC, Ω): 0.5 λ, a = 1e-4: 79.6 + j43.3 vs
    // 79.7 + j45.1; a = 1e-3: 84.6 + j44.1 vs 84.8 + j48.0; 0.47 λ: 68.5 − j11.8 vs 69.7 − j8.4;
    // 0.4 λ: 41.6 − j137.8 vs 44.0 − j138.0; 0.6 λ: 176.4 + j254.1 vs 166.2 + j253.2; 0.3 λ:
    // 19.3 − j325.8 vs 21.6 − j339.9. Off resonance R is a small part of |Z| and NEC's R still
    // falls as its segments shorten (0.3 λ: 22.95, 21.63, 20.74 Ω at 20, 40, 80 per λ), so the
    // allowed R difference grows there; X is then allowed a share of |X|.
    [SkippableTheory]
    [InlineData(0.50, 1e-4, 0.03, 4.0)]
    [InlineData(0.50, 1e-3, 0.03, 6.0)]
    [InlineData(0.47, 1e-3, 0.03, 6.0)]
    [InlineData(0.40, 1e-3, 0.08, 0.03 * 138)]
    [InlineData(0.60, 1e-3, 0.08, 0.03 * 254)]
    [InlineData(0.30, 1e-3, 0.15, 0.06 * 330)]
    public void DipoleImpedanceAgreesWithNec2(double lengthM, double radiusM, double relativeR, double absoluteXOhm)
    {
        Nec2c.Require();
        var model = Antennas.Dipole(lengthM, radiusM);
        var engine = Antennas.Solve(model, Antennas.OneMetreWavelengthHz, Options).InputImpedanceOhm();
        var nec = Nec2c.Run(Nec2Deck.Write(model, Antennas.OneMetreWavelengthHz, [], Density)).ImpedanceOhm;
        Assert.InRange(engine.Real, nec.Real * (1 - relativeR), nec.Real * (1 + relativeR));
        Assert.InRange(engine.Imaginary, nec.Imaginary - absoluteXOhm, nec.Imaginary + absoluteXOhm);
    }

    // A thick half-wave dipole (length 100 radii): R agrees within 3 %, but X differs by about 10 Ω
    // (engine 96.3 + j41.0, NEC 97.3 + j50.5): NEC's segments here are only 5 radii long, where the
    // NEC-2 user's guide warns the reduced kernel loses accuracy, and the engine's README states its own
    // drift for wires under ~100 radii. We hold the X gap to 15 Ω so growth is noticed.
    [SkippableFact]
    public void ThickDipoleResistanceAgreesAndReactanceDriftsAsDocumented()
    {
        Nec2c.Require();
        var model = Antennas.Dipole(0.5, 5e-3);
        var engine = Antennas.Solve(model, Antennas.OneMetreWavelengthHz, Options).InputImpedanceOhm();
        var nec = Nec2c.Run(Nec2Deck.Write(model, Antennas.OneMetreWavelengthHz, [], Density)).ImpedanceOhm;
        Assert.InRange(engine.Real, nec.Real * 0.97, nec.Real * 1.03);
        Assert.InRange(engine.Imaginary, nec.Imaginary - 15, nec.Imaginary + 15);
    }

    // Quarter-wave monopole on a perfect ground (GE 1, GN 1; NEC fed on its first segment, the engine
    // at the base node). Observed: engine 42.3 + j22.1 Ω, NEC 42.0 + j24.5 Ω; horizon gain 5.19 dBi in
    // both (NEC prints two decimals).
    [SkippableFact]
    public void QuarterWaveMonopoleOnPerfectGroundAgreesWithNec2()
    {
        Nec2c.Require();
        var model = Antennas.Monopole(0.25, 1e-3);
        var engine = Antennas.Solve(model, Antennas.OneMetreWavelengthHz, Options);
        var nec = Nec2c.Run(Nec2Deck.Write(model, Antennas.OneMetreWavelengthHz, [new Nec2Cut(90, 1, 0, 0, 1, 0)], Density));
        var z = engine.InputImpedanceOhm();
        Assert.InRange(z.Real, nec.ImpedanceOhm.Real * 0.97, nec.ImpedanceOhm.Real * 1.03);
        Assert.InRange(z.Imaginary, nec.ImpedanceOhm.Imaginary - 5, nec.ImpedanceOhm.Imaginary + 5);
        Assert.Equal(nec.At(90, 0).GainTotalDb, engine.GainAt(Math.PI / 2, 0).GainTotalDbi, 0.05);
    }

    // Lossy dipoles (0.48 λ): NEC's LD 5 wire conductivity against the engine's skin-effect surface
    // impedance. Steel is given to NEC as σ/μr (see Nec2Deck); both cases keep the radius many skin
    // depths thick (copper at 3 GHz: δ = 1.2 µm, a = 20 µm; steel at 5.8 GHz: δ of the σ/μr equivalent
    // 27 µm, a = 0.4 mm), where the two loss models should coincide. Observed: copper efficiency 96.19 %
    // vs 96.20 %, gain 1.97 vs 1.96 dBi. The lost fraction (1 − efficiency) must agree within 5 % and
    // the broadside gain within 0.05 dB. Conductivities: copper 5.8e7 S/m (Pozar, Microwave
    // Engineering, appendix); steel σ = 6e6 S/m, μr = 100 (from memory: a typical mild-steel wire).
    [SkippableTheory]
    [InlineData(3e9, 2e-5, 5.8e7, 1.0)]
    [InlineData(5.8e9, 4e-4, 6e6, 100.0)]
    public void LossyDipoleEfficiencyAndGainAgreeWithNec2(double frequencyHz, double radiusM, double sigma, double mu)
    {
        Nec2c.Require();
        double lambda = PhysicalConstants.SpeedOfLight / frequencyHz;
        var model = Antennas.Dipole(0.48 * lambda, radiusM, new LossyConductor(sigma, mu));
        var engine = Antennas.Solve(model, frequencyHz, Options);
        var nec = Nec2c.Run(Nec2Deck.Write(model, frequencyHz, [new Nec2Cut(90, 1, 0, 0, 1, 0)], Density));
        double necLost = 1 - nec.EfficiencyPercent / 100, engineLost = 1 - engine.Efficiency;
        Assert.True(necLost > 0.01, $"NEC loses {necLost:P2}: too little to compare");
        Assert.InRange(engineLost, necLost * 0.95, necLost * 1.05);
        Assert.Equal(nec.At(90, 0).GainTotalDb, engine.GainAt(Math.PI / 2, 0).GainTotalDbi, 0.05);
    }
}
