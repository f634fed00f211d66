namespace Helipol.Engine;

/// <summary>Physical constants in SI units.</summary>
public static class PhysicalConstants
{
    /// <summary>Speed of light in vacuum, m/s (exact, SI definition of the metre).</summary>
    public const double SpeedOfLight = 299_792_458.0;

    /// <summary>Vacuum permeability μ0, H/m (CODATA 2018: 1.25663706212e-6).</summary>
    public const double Mu0 = 1.25663706212e-6;

    /// <summary>Vacuum permittivity ε0, F/m, from ε0 = 1/(μ0 c²).</summary>
    public const double Epsilon0 = 1.0 / (Mu0 * SpeedOfLight * SpeedOfLight);

    /// <summary>Wave impedance of free space η0 = μ0 c, Ω (≈ 376.73).</summary>
    public const double Eta0 = Mu0 * SpeedOfLight;
}
