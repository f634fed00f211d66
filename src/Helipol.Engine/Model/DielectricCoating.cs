namespace Helipol.Engine;

/// <summary>
/// A dielectric sleeve around a wire (insulation, tape, glue), modelled as a series inductance per
/// unit length (Richmond and Newman's coated thin-wire model). <paramref name="OuterRadiusM"/> is the
/// coating's outer radius b, which must exceed the wire radius. <paramref name="InductanceScale"/>
/// multiplies the added inductance so a measured build can calibrate a partial coating; 1 = the
/// model as published.
/// </summary>
public sealed record DielectricCoating(double RelativePermittivity, double OuterRadiusM, double InductanceScale = 1.0);
