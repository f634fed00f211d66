using Helipol.Model.Materials;

namespace Helipol.Model;

/// <summary>
/// A checked design in SI units (metres, hertz, radians, S/m), materials resolved, ready for the
/// solver. Fabrication settings stay in millimetres: they only ever feed fabrication files.
/// Built by <see cref="DesignResolver"/>; nothing here knows about YAML.
/// </summary>
public sealed record PolarizerDesign(
    string Name,
    string SourceFile,
    Band Band,
    Whip Whip,
    Polarizer Polarizer,
    FabricationSettings Fabrication,
    SolveOptions Solve,
    ToleranceOptions Tolerance,
    CalibrationReference? Calibration)
{
    /// <summary>Practice-scaling values for this band and former (never a solved result).</summary>
    public ElementLayout Practice => Polarizer.PracticeLayout(Band.CenterHz);
}

/// <summary>Band edges in Hz. <see cref="EdgesGiven"/> is false when low/high were defaulted to ±1.5 % of center.</summary>
public sealed record Band(double CenterHz, double LowHz, double HighHz, bool EdgesGiven)
{
    /// <summary>Default half-width of the band when the file gives only the center (the project's stated default).</summary>
    public const double DefaultHalfWidthFraction = 0.015;

    /// <summary>Speed of light in vacuum, exact by the SI definition of the metre (SI Brochure, 9th ed., 2019).
    /// Held here too because the model layer comes before the engine and may not use it.</summary>
    public const double SpeedOfLightMPerS = 299_792_458.0;

    /// <summary>Free-space wavelength at the centre, λ = c/f.</summary>
    public double WavelengthM => SpeedOfLightMPerS / CenterHz;
}

public sealed record Whip(WhipKind Kind, double LengthM, double DiameterM, double? CoverDiameterM)
{
    public double RadiusM => DiameterM / 2;
}

public sealed record ElementWire(double DiameterM, ConductorMaterial Material, SourcedValue? ConductivitySPerM, SourcedValue RelativePermeability)
{
    public double RadiusM => DiameterM / 2;
    public bool IsPerfectConductor => ConductivitySPerM is null;
}

/// <summary>Former; <see cref="OuterDiameterM"/> is null when the file says <c>auto</c>.</summary>
public sealed record Former(DielectricMaterial Material, double? OuterDiameterM, double BoreM, double HeightM,
    SourcedValue RelativePermittivity, SourcedValue LossTangent);

public sealed record Wrap(DielectricMaterial Material, SourcedValue LayerThicknessM, int Layers, SourcedValue RelativePermittivity, SourcedValue LossTangent)
{
    public double TotalThicknessM => LayerThicknessM.Value * Layers;

    /// <summary>Distance from the wire axis where the tape meets the former; null = hugging the wire's side.</summary>
    public double? TentDistanceM { get; init; }
}

public sealed record Glue(DielectricMaterial Material, double ThicknessM, SourcedValue RelativePermittivity, SourcedValue LossTangent);

/// <summary>
/// The polarizer as asked for. Null <see cref="ElementCount"/>, <see cref="ElementLengthM"/> or
/// <see cref="ElementRiseM"/> means <c>auto</c>: the solver chooses, starting from practice scaling.
/// </summary>
public sealed record Polarizer(
    Sense Sense,
    Winding Winding,
    int? ElementCount,
    double? ElementLengthM,
    double? ElementRiseM,
    double CentreHeightM,
    ElementWire Wire,
    Former Former,
    Wrap? Wrap,
    Glue? Glue)
{
    /// <summary>
    /// Smallest former wall we size an auto diameter to: twice the wire diameter or 2 mm,
    /// whichever is more (common practice, no source: foam thinner than that tears).
    /// </summary>
    public double MinimumWallM => Math.Max(2e-3, 2 * Wire.DiameterM);

    /// <summary>Pinned outer diameter, or the practice one (never thinner than the minimum wall) when auto.</summary>
    public double OuterDiameterOrPracticeM(double centerHz) =>
        Former.OuterDiameterM ?? Math.Max(PracticeScaling.FormerOuterDiameterM(centerHz), Former.BoreM + 2 * MinimumWallM);

    /// <summary>Pinned values where given, practice scaling for the rest.</summary>
    public ElementLayout PracticeLayout(double centerHz) => new(
        ElementCount ?? PracticeScaling.ElementCount,
        ElementLengthM ?? PracticeScaling.ElementLengthM(centerHz),
        ElementRiseM ?? Math.Min(PracticeScaling.ElementRiseM(centerHz), Former.HeightM),
        OuterDiameterOrPracticeM(centerHz),
        Wire.DiameterM);
}

/// <summary>
/// Where the elements lie, by the geometry convention: the wire axis at radius
/// outer_diameter/2 + wire_diameter/2; element k starts at azimuth 360°·k/N; each is a helical arc
/// of wire length L climbing <see cref="RiseM"/>, so its arc angle is sqrt(L² − rise²)/radius.
/// </summary>
public sealed record ElementLayout(int Count, double LengthM, double RiseM, double OuterDiameterM, double WireDiameterM)
{
    public double AxisRadiusM => OuterDiameterM / 2 + WireDiameterM / 2;

    /// <summary>Length of the element's projection on the horizontal plane (the unrolled arc).</summary>
    public double ArcLengthM => HelixArc.Run(LengthM, RiseM);

    public double ArcAngleRad => ArcLengthM / AxisRadiusM;

    /// <summary>Angle of the wire above the horizontal: atan(rise / arc length).</summary>
    public double PitchAngleRad => HelixArc.PitchAngleRad(RiseM, ArcLengthM);

    /// <summary>Azimuth where element k (0-based) starts.</summary>
    public double StartAzimuthRad(int k) => 2 * Math.PI * k / Count;
}

/// <summary>Fabrication settings, in millimetres: they only ever feed cut, print and paper files.</summary>
public sealed record FabricationSettings(double KerfMm, int Rings, double BoardWidthMm, double BoardHeightMm, double BoardThicknessMm,
    double PrintClearanceMm, Paper Paper, int Dpi);

public sealed record SearchOptions(int ElementCountMin, int ElementCountMax,
    double ElementLengthMinM, double ElementLengthMaxM,
    double ElementRiseMinM, double ElementRiseMaxM,
    double OuterDiameterMinM, double OuterDiameterMaxM,
    int GridPoints);

public sealed record SweepOptions(int Points, double SpanFraction);

/// <summary>How the solver judges a design: axial ratio over a window of elevations, azimuths and frequencies.</summary>
public sealed record SolveOptions(Objective Objective, double ElevationFromRad, double ElevationToRad, double ElevationStepRad,
    double AzimuthStepRad, int FrequencyCount, double GainWeight, SearchOptions Search, SweepOptions Sweep)
{
    /// <summary>Azimuth span of the coverage window, rad (2π = all round), centred on azimuth 0.</summary>
    public double AzimuthSpanRad { get; init; } = 2 * Math.PI;

    /// <summary>Largest wanted-sense axial ratio that counts as circular, dB.</summary>
    public double AxialRatioLimitDb { get; init; } = 3;

    /// <summary>Resistance of the radio port that VSWR and realized gain refer to, Ω.</summary>
    public double ReceiverOhm { get; init; } = 50;
}

/// <summary>Uniform ± spreads for the Monte Carlo yield; <see cref="WrapThicknessFraction"/> is relative (0.3 = ±30 %).</summary>
public sealed record ToleranceOptions(int Builds, double ElementLengthM, double ElementRiseM, double AzimuthRad, double WrapThicknessFraction, int Seed);

/// <summary>A calibration file named by the design: the path as written and the resolved full path (it exists).</summary>
public sealed record CalibrationReference(string Written, string FullPath);
