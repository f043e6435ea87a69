using SkiaSharp;

namespace FilterQA.Reports.Pdf;

/// <summary>Face, size (points) and colour of a run of text.</summary>
public sealed record TextStyle(FontFace Face, float SizePt, SKColor Colour)
{
    public static readonly SKColor Ink = new(0x1a, 0x1a, 0x1a);
    public static readonly SKColor Muted = new(0x55, 0x5b, 0x62);
    public static readonly SKColor Alarm = new(0xa8, 0x10, 0x22);
    public static readonly SKColor Good = new(0x1b, 0x6e, 0x2a);

    public static TextStyle Body { get; } = new(FontFace.Regular, 9, Ink);

    public static TextStyle BodyBold { get; } = new(FontFace.Bold, 9, Ink);

    public static TextStyle Small { get; } = new(FontFace.Regular, 7.5f, Muted);

    public static TextStyle Title { get; } = new(FontFace.Bold, 16, Ink);

    public static TextStyle Heading { get; } = new(FontFace.Bold, 11.5f, Ink);

    public static TextStyle Mono { get; } = new(FontFace.Mono, 8.5f, Ink);

    public TextStyle WithColour(SKColor colour) => this with { Colour = colour };
}
