namespace Helipol.Engine;

/// <summary>The metal a wire is made of; decides its skin-effect loss.</summary>
public abstract record Conductor;

/// <summary>A lossless conductor: no surface impedance.</summary>
public sealed record PerfectConductor : Conductor
{
    public static PerfectConductor Instance { get; } = new();

    private PerfectConductor() { }
}

/// <summary>
/// A real metal. Conductivity σ in S/m (copper 5.8e7); relative permeability μr matters for steel
/// wire, whose skin-effect resistance grows as sqrt(μr).
/// </summary>
public sealed record LossyConductor(double ConductivitySPerM, double RelativePermeability = 1) : Conductor;
