using System.Buffers.Binary;

namespace Helipol.Emit.Sheet;

/// <summary>
/// Puts a pHYs chunk (PNG Specification, 2nd ed., §11.3.5.3) right after IHDR so the image prints
/// at true size: pixels per metre on both axes, unit specifier 1 (metre). Any pHYs already present
/// is replaced. Chunk CRCs follow the specification's Annex D (CRC-32, polynomial 0xEDB88320).
/// </summary>
public static class PngPhysicalSize
{
    private static readonly byte[] Signature = [137, 80, 78, 71, 13, 10, 26, 10];

    public static uint PixelsPerMetre(int dpi) => (uint)Math.Round(dpi / 0.0254);

    public static byte[] SetDpi(byte[] png, int dpi)
    {
        if (!png.AsSpan(0, 8).SequenceEqual(Signature)) throw new ArgumentException("not a PNG stream");
        using var output = new MemoryStream();
        output.Write(Signature);
        var at = 8;
        while (at < png.Length)
        {
            var length = (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(png, at + 4, 4);
            var whole = 12 + length;
            if (type != "pHYs") output.Write(png, at, whole);
            if (type == "IHDR")
            {
                var data = new byte[9];
                var ppm = PixelsPerMetre(dpi);
                BinaryPrimitives.WriteUInt32BigEndian(data, ppm);
                BinaryPrimitives.WriteUInt32BigEndian(data.AsSpan(4), ppm);
                data[8] = 1;
                WriteChunk(output, "pHYs", data);
            }
            at += whole;
        }
        return output.ToArray();
    }

    private static void WriteChunk(Stream s, string type, byte[] data)
    {
        Span<byte> len = stackalloc byte[4];
        BinaryPrimitives.WriteUInt32BigEndian(len, (uint)data.Length);
        s.Write(len);
        var typeBytes = System.Text.Encoding.ASCII.GetBytes(type);
        s.Write(typeBytes);
        s.Write(data);
        var crc = Crc32.Update(Crc32.Update(0xFFFFFFFFu, typeBytes), data) ^ 0xFFFFFFFFu;
        BinaryPrimitives.WriteUInt32BigEndian(len, crc);
        s.Write(len);
    }
}
