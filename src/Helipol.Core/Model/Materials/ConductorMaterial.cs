namespace Helipol.Model.Materials;

/// <summary>
/// A wire metal. Conductivity in S/m (null for a perfect electric conductor) and relative
/// permeability feed the skin-effect surface impedance Z' = (1+j)/(2πa)·sqrt(ωμ/(2σ)).
/// </summary>
public sealed record ConductorMaterial(string Key, string Name, SourcedValue? ConductivitySPerM, SourcedValue RelativePermeability)
{
    public bool IsPerfect => ConductivitySPerM is null;
}
