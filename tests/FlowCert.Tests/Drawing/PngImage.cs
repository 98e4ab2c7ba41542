using System.Buffers.Binary;
using System.IO.Compression;

namespace FlowCert.Tests.Drawing;

/// <summary>
/// Just enough of PNG (the W3C "Portable Network Graphics (PNG) Specification", sections on chunks,
/// filtering and the zlib stream) to read 8-bit RGB or RGBA images such as rsvg-convert writes: the
/// size and the pixels, so that a test can see what a picture holds.
/// </summary>
internal sealed class PngImage
{
    public int Width { get; }
    public int Height { get; }
    /// <summary>Pixels as 0xRRGGBBAA, row by row.</summary>
    public uint[] Pixels { get; }

    private PngImage(int width, int height, uint[] pixels) { Width = width; Height = height; Pixels = pixels; }

    public static PngImage Read(byte[] file)
    {
        byte[] signature = [137, 80, 78, 71, 13, 10, 26, 10];
        Assert.True(file.AsSpan(0, 8).SequenceEqual(signature), "not a PNG file");
        int width = 0, height = 0, channels = 0;
        using var idat = new MemoryStream();
        for (int at = 8; at < file.Length;)
        {
            int length = BinaryPrimitives.ReadInt32BigEndian(file.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(file, at + 4, 4);
            var data = file.AsSpan(at + 8, length);
            if (type == "IHDR")
            {
                width = BinaryPrimitives.ReadInt32BigEndian(data);
                height = BinaryPrimitives.ReadInt32BigEndian(data[4..]);
                Assert.Equal(8, data[8]); // bit depth
                channels = data[9] switch { 2 => 3, 6 => 4, var t => throw new NotSupportedException($"PNG colour type {t}") };
                Assert.Equal(0, data[12]); // not interlaced
            }
            else if (type == "IDAT") idat.Write(data);
            at += 12 + length;
        }
        idat.Position = 0;
        using var z = new ZLibStream(idat, CompressionMode.Decompress);
        using var raw = new MemoryStream();
        z.CopyTo(raw);
        var bytes = raw.ToArray();
        int stride = width * channels;
        Assert.Equal(height * (stride + 1), bytes.Length);
        var previous = new byte[stride];
        var pixels = new uint[width * height];
        for (int y = 0; y < height; y++)
        {
            int filter = bytes[y * (stride + 1)];
            var row = bytes.AsSpan(y * (stride + 1) + 1, stride);
            for (int i = 0; i < stride; i++)
            {
                int a = i >= channels ? row[i - channels] : 0, b = previous[i], c = i >= channels ? previous[i - channels] : 0;
                row[i] = (byte)(row[i] + filter switch
                {
                    0 => 0,
                    1 => a,
                    2 => b,
                    3 => (a + b) / 2,
                    4 => Paeth(a, b, c),
                    _ => throw new NotSupportedException($"PNG filter {filter}"),
                });
            }
            for (int x = 0; x < width; x++)
            {
                var p = row.Slice(x * channels, channels);
                pixels[y * width + x] = (uint)(p[0] << 24 | p[1] << 16 | p[2] << 8 | (channels == 4 ? p[3] : 255));
            }
            row.CopyTo(previous);
        }
        return new PngImage(width, height, pixels);
    }

    private static int Paeth(int a, int b, int c)
    {
        int p = a + b - c, pa = Math.Abs(p - a), pb = Math.Abs(p - b), pc = Math.Abs(p - c);
        return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
    }
}
