namespace MotionSpec.Cli.Tests;

/// <summary>Small specs the tests share; each written against LANGUAGE.md.</summary>
internal static class Specs
{
    /// <summary>A turntable with a slider on a radial rail: checks clean.</summary>
    public const string Clean = """
        title "Turntable with a radial slide"
        param w = 30 rpm
        coord r : length
        frame ground
        frame table in ground {
            rotate about z by w * t
        }
        point slider in table at [r, 0, 0]
        report slider in ground via table
        """;

    /// <summary>Line 4 names a frame that is not declared; 'trolly' starts at column 16.</summary>
    public const string UnknownFrame = """
        frame quay
        frame trolley in quay
        point hook in trolley at [0, 0, -5 m]
        report hook in trolly
        """;

    /// <summary>Declares 'quay' twice (line 2, column 7) and names an unknown unit (line 3, column 13).</summary>
    public const string TwoErrors = """
        frame quay
        frame quay
        param L = 2 furlong
        """;
}
