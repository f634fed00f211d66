using System.Buffers.Binary;
using System.Text;
using Helipol.Geometry;

namespace Helipol.Emit.Stl;

/// <summary>
/// Binary STL: an 80-byte header, a little-endian uint32 facet count, then per facet the unit
/// normal and three vertices as float32 and a zero uint16 attribute (the format as published with
/// the StereoLithography Interface Specification, 3D Systems, 1989). Units are implicit; ours are mm.
/// </summary>
public static class BinaryStl
{
    public static byte[] Write(TriangleMesh mesh, string title)
    {
        var bytes = new byte[84 + 50 * mesh.Triangles.Count];
        // The header must not begin with "solid", which readers take as the ASCII form.
        var header = Encoding.ASCII.GetBytes(("helipol " + title + " mm").PadRight(80)[..80]);
        header.CopyTo(bytes, 0);
        BinaryPrimitives.WriteUInt32LittleEndian(bytes.AsSpan(80), (uint)mesh.Triangles.Count);
        var at = 84;
        foreach (var (a, b, c) in mesh.Triangles)
        {
            Point3 p = mesh.Vertices[a], q = mesh.Vertices[b], r = mesh.Vertices[c];
            var n = Point3.Cross(q - p, r - p);
            var len = n.Length;
            n = len > 0 ? new Point3(n.X / len, n.Y / len, n.Z / len) : new Point3(0, 0, 0);
            foreach (var v in new[] { n, p, q, r })
            {
                BinaryPrimitives.WriteSingleLittleEndian(bytes.AsSpan(at), (float)v.X);
                BinaryPrimitives.WriteSingleLittleEndian(bytes.AsSpan(at + 4), (float)v.Y);
                BinaryPrimitives.WriteSingleLittleEndian(bytes.AsSpan(at + 8), (float)v.Z);
                at += 12;
            }
            at += 2;
        }
        return bytes;
    }
}
