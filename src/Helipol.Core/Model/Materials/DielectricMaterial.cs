namespace Helipol.Model.Materials;

/// <summary>A former, tape or glue material: relative permittivity, loss tangent and (for tapes) a typical layer thickness in metres.</summary>
public sealed record DielectricMaterial(string Key, string Name, SourcedValue RelativePermittivity, SourcedValue LossTangent, SourcedValue? TypicalThicknessM = null);
