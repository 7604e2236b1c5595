using System.Buffers.Binary;
using System.IO.Compression;

namespace SpecLint.Reporting.Tests.Plots;

/// <summary>
/// A minimal PNG reader for test assertions: 8-bit greyscale, RGB or RGBA, non-interlaced (what Chromium writes).
/// System.Drawing does not run on Linux, and a whole imaging package is more than a screenshot check needs.
/// </summary>
internal sealed class PngImage
{
    private PngImage(int width, int height, int channels, byte[] pixels)
    {
        Width = width;
        Height = height;
        Channels = channels;
        Pixels = pixels;
    }

    public int Width { get; }

    public int Height { get; }

    public int Channels { get; }

    /// <summary>Unfiltered rows, <see cref="Channels"/> bytes per pixel.</summary>
    public byte[] Pixels { get; }

    public static PngImage Read(byte[] file)
    {
        ReadOnlySpan<byte> signature = [137, 80, 78, 71, 13, 10, 26, 10];
        if (!file.AsSpan(0, 8).SequenceEqual(signature))
        {
            throw new InvalidDataException("not a PNG");
        }

        int width = 0, height = 0, channels = 0;
        using var idat = new MemoryStream();
        var at = 8;
        while (at + 8 <= file.Length)
        {
            var length = BinaryPrimitives.ReadInt32BigEndian(file.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(file, at + 4, 4);
            var data = file.AsSpan(at + 8, length);
            switch (type)
            {
                case "IHDR":
                    width = BinaryPrimitives.ReadInt32BigEndian(data);
                    height = BinaryPrimitives.ReadInt32BigEndian(data[4..]);
                    var depth = data[8];
                    var colour = data[9];
                    var interlace = data[12];
                    if (depth != 8 || interlace != 0)
                    {
                        throw new NotSupportedException($"bit depth {depth}, interlace {interlace}");
                    }

                    channels = colour switch { 0 => 1, 2 => 3, 4 => 2, 6 => 4, _ => throw new NotSupportedException($"colour type {colour}") };
                    break;
                case "IDAT":
                    idat.Write(data);
                    break;
            }

            at += 12 + length;
            if (type == "IEND")
            {
                break;
            }
        }

        idat.Position = 0;
        using var z = new ZLibStream(idat, CompressionMode.Decompress);
        using var raw = new MemoryStream();
        z.CopyTo(raw);
        return new PngImage(width, height, channels, Unfilter(raw.ToArray(), width, height, channels));
    }

    public (byte R, byte G, byte B) Pixel(int x, int y)
    {
        var i = ((y * Width) + x) * Channels;
        return Channels >= 3 ? (Pixels[i], Pixels[i + 1], Pixels[i + 2]) : (Pixels[i], Pixels[i], Pixels[i]);
    }

    private static byte[] Unfilter(byte[] raw, int width, int height, int bpp)
    {
        var stride = width * bpp;
        var output = new byte[stride * height];
        for (var y = 0; y < height; y++)
        {
            var filter = raw[y * (stride + 1)];
            var src = (y * (stride + 1)) + 1;
            var row = y * stride;
            var prev = row - stride;
            for (var x = 0; x < stride; x++)
            {
                int a = x >= bpp ? output[row + x - bpp] : 0;
                int b = y > 0 ? output[prev + x] : 0;
                int c = x >= bpp && y > 0 ? output[prev + x - bpp] : 0;
                var predictor = filter switch
                {
                    0 => 0,
                    1 => a,
                    2 => b,
                    3 => (a + b) / 2,
                    4 => Paeth(a, b, c),
                    _ => throw new InvalidDataException($"filter {filter}"),
                };
                output[row + x] = (byte)(raw[src + x] + predictor);
            }
        }

        return output;
    }

    private static int Paeth(int a, int b, int c)
    {
        var p = a + b - c;
        var pa = Math.Abs(p - a);
        var pb = Math.Abs(p - b);
        var pc = Math.Abs(p - c);
        return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
    }
}
