namespace Helipol.Engine;

/// <summary>Everything the engine needs to know about a structure: wires, ground, sources and lumped loads.</summary>
public sealed record WireModel(
    IReadOnlyList<Wire> Wires,
    GroundPlane Ground,
    IReadOnlyList<VoltageSource> Sources,
    IReadOnlyList<LumpedLoad>? Loads = null);
