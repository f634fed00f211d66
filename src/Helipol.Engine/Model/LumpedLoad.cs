namespace Helipol.Engine;

/// <summary>A series impedance R + jX (ohms) inserted at the segment node nearest <paramref name="AtM"/>.</summary>
public sealed record LumpedLoad(Vector3 AtM, System.Numerics.Complex ImpedanceOhm);
