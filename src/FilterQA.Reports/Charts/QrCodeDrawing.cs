using QRCoder;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>A QR code (error correction level M, quiet zone of 4 modules) drawn as vector rectangles, one per run of dark modules in a row.</summary>
public static class QrCodeDrawing
{
    /// <summary>The quiet zone on each side, in modules (ISO/IEC 18004 asks for 4).</summary>
    public const int QuietZoneModules = 4;

    /// <summary>The module matrix of <paramref name="text"/> with its quiet zone: true = dark.</summary>
    public static bool[,] Modules(string text)
    {
        ArgumentException.ThrowIfNullOrEmpty(text);
        using var generator = new QRCodeGenerator();
        using QRCodeData data = generator.CreateQrCode(text, QRCodeGenerator.ECCLevel.M);
        // QRCoder's matrix already carries a 4-module quiet zone on each side.
        int size = data.ModuleMatrix.Count;
        var modules = new bool[size, size];
        for (int row = 0; row < size; row++)
        {
            for (int column = 0; column < size; column++)
            {
                modules[row, column] = data.ModuleMatrix[row][column];
            }
        }
        return modules;
    }

    /// <summary>Draws the code of <paramref name="text"/> into the square of side min(width, height) at the top left of <paramref name="rect"/>.</summary>
    public static void Draw(SKCanvas canvas, SKRect rect, string text)
    {
        ArgumentNullException.ThrowIfNull(canvas);
        bool[,] modules = Modules(text);
        int size = modules.GetLength(0);
        float side = Math.Min(rect.Width, rect.Height);
        float module = side / size;
        using var white = new SKPaint { Color = SKColors.White, IsStroke = false };
        canvas.DrawRect(SKRect.Create(rect.Left, rect.Top, side, side), white);
        using var dark = new SKPaint { Color = SKColors.Black, IsStroke = false, IsAntialias = false };
        for (int row = 0; row < size; row++)
        {
            int column = 0;
            while (column < size)
            {
                if (!modules[row, column])
                {
                    column++;
                    continue;
                }
                int start = column;
                while (column < size && modules[row, column])
                {
                    column++;
                }
                canvas.DrawRect(SKRect.Create(rect.Left + start * module, rect.Top + row * module, (column - start) * module, module), dark);
            }
        }
    }
}
