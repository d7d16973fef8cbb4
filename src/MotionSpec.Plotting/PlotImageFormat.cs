namespace MotionSpec.Plotting;

/// <summary>The image formats a plot can be written in.</summary>
public enum PlotImageFormat
{
    /// <summary>Scalable vector graphics, byte-for-byte reproducible.</summary>
    Svg,

    /// <summary>Portable network graphics.</summary>
    Png,
}

/// <summary>Chooses the image format from an output path's extension.</summary>
public static class PlotImageFormats
{
    /// <summary>The format for <c>.svg</c> or <c>.png</c> (any letter case); null for any other extension.</summary>
    public static PlotImageFormat? FromPath(string path)
    {
        var extension = Path.GetExtension(path);
        if (string.Equals(extension, ".svg", StringComparison.OrdinalIgnoreCase))
        {
            return PlotImageFormat.Svg;
        }

        if (string.Equals(extension, ".png", StringComparison.OrdinalIgnoreCase))
        {
            return PlotImageFormat.Png;
        }

        return null;
    }
}
