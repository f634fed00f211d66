using System.Globalization;
using System.IO.Compression;
using System.Text;
using Helipol.Geometry;

namespace Helipol.Emit.ThreeMf;

/// <summary>
/// A 3MF package per the 3MF Core Specification (3MF Consortium, v1.3): an OPC zip holding
/// [Content_Types].xml, _rels/.rels pointing at the model part, and 3D/3dmodel.model with one mesh
/// object in unit millimeter. Zip entries carry a fixed timestamp and a fixed order so equal meshes
/// give equal bytes.
/// </summary>
public static class ThreeMfPackage
{
    public const string CoreNamespace = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
    private static readonly DateTimeOffset FixedTime = new(1980, 1, 1, 0, 0, 0, TimeSpan.Zero);

    public static byte[] Write(TriangleMesh mesh, string objectName)
    {
        using var buffer = new MemoryStream();
        using (var zip = new ZipArchive(buffer, ZipArchiveMode.Create, leaveOpen: true))
        {
            Add(zip, "[Content_Types].xml", ContentTypes);
            Add(zip, "_rels/.rels", Relationships);
            Add(zip, "3D/3dmodel.model", Model(mesh, objectName));
        }
        return buffer.ToArray();
    }

    private const string ContentTypes =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" +
        "<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\">\n" +
        " <Default Extension=\"rels\" ContentType=\"application/vnd.openxmlformats-package.relationships+xml\"/>\n" +
        " <Default Extension=\"model\" ContentType=\"application/vnd.ms-package.3dmanufacturing-3dmodel+xml\"/>\n" +
        "</Types>\n";

    private const string Relationships =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" +
        "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\">\n" +
        " <Relationship Target=\"/3D/3dmodel.model\" Id=\"rel0\" Type=\"http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel\"/>\n" +
        "</Relationships>\n";

    private static string Model(TriangleMesh mesh, string name)
    {
        var ci = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        sb.Append("<model unit=\"millimeter\" xml:lang=\"en-US\" xmlns=\"").Append(CoreNamespace).Append("\">\n");
        sb.Append(" <resources>\n  <object id=\"1\" type=\"model\" name=\"").Append(System.Security.SecurityElement.Escape(name)).Append("\">\n   <mesh>\n    <vertices>\n");
        // Float32 precision, as in the STL, so both files describe the same solid.
        foreach (var v in mesh.Vertices)
            sb.Append("     <vertex x=\"").Append(((float)v.X).ToString("R", ci))
              .Append("\" y=\"").Append(((float)v.Y).ToString("R", ci))
              .Append("\" z=\"").Append(((float)v.Z).ToString("R", ci)).Append("\"/>\n");
        sb.Append("    </vertices>\n    <triangles>\n");
        foreach (var (a, b, c) in mesh.Triangles)
            sb.Append("     <triangle v1=\"").Append(a.ToString(ci)).Append("\" v2=\"").Append(b.ToString(ci))
              .Append("\" v3=\"").Append(c.ToString(ci)).Append("\"/>\n");
        sb.Append("    </triangles>\n   </mesh>\n  </object>\n </resources>\n <build>\n  <item objectid=\"1\"/>\n </build>\n</model>\n");
        return sb.ToString();
    }

    private static void Add(ZipArchive zip, string name, string text)
    {
        var entry = zip.CreateEntry(name, CompressionLevel.Optimal);
        entry.LastWriteTime = FixedTime;
        using var s = entry.Open();
        var bytes = new UTF8Encoding(false).GetBytes(text);
        s.Write(bytes);
    }
}
