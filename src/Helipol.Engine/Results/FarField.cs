using System.Numerics;

namespace Helipol.Engine;

/// <summary>
/// Far electric field times distance, r·E in volts, with the phase factor e^{−jkr} removed and the
/// e^{jωt} time convention: components along θ̂ and φ̂ of the usual spherical frame (θ from +z).
/// </summary>
public readonly record struct FarField(Complex EThetaV, Complex EPhiV)
{
    /// <summary>Right-hand circular component per IEEE Std 145: E_R = (E_θ + jE_φ)/√2.</summary>
    public Complex RightHandV => (EThetaV + Complex.ImaginaryOne * EPhiV) / Math.Sqrt(2);

    /// <summary>Left-hand circular component per IEEE Std 145: E_L = (E_θ − jE_φ)/√2.</summary>
    public Complex LeftHandV => (EThetaV - Complex.ImaginaryOne * EPhiV) / Math.Sqrt(2);

    /// <summary>Radiation intensity U = |rE|²/(2η0), W/sr.</summary>
    public double IntensityWPerSr =>
        (EThetaV.Real * EThetaV.Real + EThetaV.Imaginary * EThetaV.Imaginary
         + EPhiV.Real * EPhiV.Real + EPhiV.Imaginary * EPhiV.Imaginary) / (2 * PhysicalConstants.Eta0);
}
