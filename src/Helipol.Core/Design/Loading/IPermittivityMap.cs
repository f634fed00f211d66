namespace Helipol.Design.Loading;

/// <summary>Relative permittivity at a point of a wire's cross-section (metres, wire centre at the
/// origin); the field solve samples it and never needs to know what the materials are.</summary>
public interface IPermittivityMap
{
    double At(double xM, double yM);
}

/// <summary>A concentric sleeve a ≤ r ≤ b of permittivity εr around the wire, air beyond: the case
/// with a closed form (Richmond and Newman, Radio Science 11(1), 1976).</summary>
public sealed record ConcentricSleeve(double OuterRadiusM, double RelativePermittivity) : IPermittivityMap
{
    public double At(double xM, double yM) => xM * xM + yM * yM <= OuterRadiusM * OuterRadiusM ? RelativePermittivity : 1;
}

/// <summary>Vacuum everywhere.</summary>
public sealed class Vacuum : IPermittivityMap
{
    public static Vacuum Instance { get; } = new();
    public double At(double xM, double yM) => 1;
}
