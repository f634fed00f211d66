namespace Helipol.Model.Materials;

/// <summary>
/// The built-in materials. Every number carries its source; "from memory" marks a value recalled
/// rather than looked up, to be replaced by a measurement or a design-file override when it matters.
/// Keys match the words accepted in the design file (see Spec/DesignKeys.cs).
/// </summary>
public static class MaterialTable
{
    private const string Pozar = "Pozar, Microwave Engineering, 4th ed., appendix (conductivities / dielectric constants)";
    private const string NonMagnetic = "non-magnetic metal, relative permeability 1 (from memory)";
    private const string Printed = "Zechmeister & Láčík, dielectric properties of 3D-printed materials up to 10 GHz: 2.55-2.95 at 100 % infill";

    public static readonly IReadOnlyList<ConductorMaterial> Conductors = new[]
    {
        new ConductorMaterial("pec", "perfect electric conductor", null, new SourcedValue(1.0, "ideal conductor, by definition")),
        new ConductorMaterial("copper", "copper", new SourcedValue(5.813e7, Pozar), new SourcedValue(1.0, NonMagnetic)),
        new ConductorMaterial("brass", "brass", new SourcedValue(2.56e7, Pozar + "; alloys range about 1.5e7-2.6e7 (from memory)"), new SourcedValue(1.0, NonMagnetic)),
        new ConductorMaterial("steel", "carbon steel (paper-clip or music wire)", new SourcedValue(6e6, "from memory: about 6e6-1e7 S/m"),
            new SourcedValue(100.0, "stated assumption (from memory): steel is strongly magnetic at DC and its permeability falls at GHz; override when known")),
        new ConductorMaterial("stainless", "stainless steel, 300 series", new SourcedValue(1.1e6, Pozar + "; 1.1e6-1.4e6 (from memory)"), new SourcedValue(1.0, "austenitic stainless is nearly non-magnetic (from memory)")),
    };

    public static readonly IReadOnlyList<DielectricMaterial> Formers = new[]
    {
        new DielectricMaterial("air", "air (no former)", new SourcedValue(1.0006, "dry air at sea level (from memory)"), new SourcedValue(0.0, "lossless (from memory)")),
        new DielectricMaterial("eps-foam", "expanded polystyrene foam", new SourcedValue(1.03, Pozar + ": 1.03 at 3 GHz"), new SourcedValue(1e-4, Pozar)),
        new DielectricMaterial("xps-foam", "extruded polystyrene foam board", new SourcedValue(1.07, "from memory: about 1.05-1.1"), new SourcedValue(2e-4, "from memory")),
        new DielectricMaterial("pla", "PLA, 100 % infill", new SourcedValue(2.75, Printed), new SourcedValue(0.01, "from memory: about 0.005-0.02")),
        new DielectricMaterial("petg", "PETG, 100 % infill", new SourcedValue(2.7, Printed), new SourcedValue(0.01, "from memory: about 0.005-0.02")),
    };

    public static readonly IReadOnlyList<DielectricMaterial> Wraps = new[]
    {
        new DielectricMaterial("pvc-tape", "PVC electrical tape",
            new SourcedValue(3.2, "rigid PVC 2.71 at 11 GHz (Riddle, Baker-Jarvis, Krupka, IEEE T-MTT 51(3), 2003); plasticised tape higher, about 3-3.5 (from memory)"),
            new SourcedValue(0.02, "from memory"), new SourcedValue(0.15e-3, "from memory: 0.13-0.18 mm")),
        new DielectricMaterial("packing-tape", "polypropylene packing tape",
            new SourcedValue(2.25, "from memory: polypropylene about 2.2-2.3"), new SourcedValue(5e-4, "from memory"), new SourcedValue(0.05e-3, "from memory: 0.04-0.06 mm")),
        new DielectricMaterial("masking-tape", "paper masking tape",
            new SourcedValue(2.5, "from memory: paper about 2-3, rises with humidity"), new SourcedValue(0.05, "from memory"), new SourcedValue(0.12e-3, "from memory: 0.1-0.15 mm")),
    };

    public static readonly IReadOnlyList<DielectricMaterial> Glues = new[]
    {
        new DielectricMaterial("hot-melt", "hot-melt glue (EVA)", new SourcedValue(2.5, "from memory: 2.3-2.8"), new SourcedValue(0.01, "from memory")),
        new DielectricMaterial("epoxy", "two-part epoxy", new SourcedValue(3.6, "from memory: about 3-4"), new SourcedValue(0.02, "from memory")),
    };

    public static ConductorMaterial Conductor(string key) => Conductors.Single(m => m.Key == key);
    public static DielectricMaterial Former(string key) => Formers.Single(m => m.Key == key);
    public static DielectricMaterial Wrap(string key) => Wraps.Single(m => m.Key == key);
    public static DielectricMaterial Glue(string key) => Glues.Single(m => m.Key == key);
}
