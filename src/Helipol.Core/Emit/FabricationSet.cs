using Helipol.Emit.Dxf;
using Helipol.Emit.Sheet;
using Helipol.Emit.Stl;
using Helipol.Emit.ThreeMf;
using Helipol.Geometry;

namespace Helipol.Emit;

/// <summary>
/// The fabrication set for one design: every file rendered in memory, in a fixed order, from the
/// build input alone. Rendering is pure and deterministic: the same input gives the same bytes.
/// </summary>
public static class FabricationSet
{
    public static readonly IReadOnlyList<string> FileNames =
        ["rings.dxf", "drill.dxf", "former.stl", "former.3mf", "jig.stl", "bend-sheet.png", "bend-sheet.pdf", "packet.pdf", "assembly.png"];

    public static IReadOnlyList<FabricationFile> Render(PolarizerBuildInput input)
    {
        var g = new PolarizerGeometry(input);
        var sleeve = FormerSleeve.From(g);
        var former = FormerMesh.Build(sleeve, input.ElementCount);
        var jig = BendingJig.From(g).Mesh();
        return
        [
            new("rings.dxf", RingsDxf.Write(g)),
            new("drill.dxf", DrillDxf.Write(g)),
            new("former.stl", BinaryStl.Write(former, "former " + input.DesignName)),
            new("former.3mf", ThreeMfPackage.Write(former, "former " + input.DesignName)),
            new("jig.stl", BinaryStl.Write(jig, "bending jig " + input.DesignName)),
            new("bend-sheet.png", BendSheetPng.Write(g)),
            new("bend-sheet.pdf", BendSheetPdf.Write(g)),
            new("packet.pdf", PacketPdf.Write(g)),
            new("assembly.png", Sheet.Assembly.AssemblyPng.Write(g)),
        ];
    }
}
