namespace MotionSpec.Cli.Tests;

/// <summary>`check` runs the kinematics stage too, so a report across a spin link is caught before eval.</summary>
public sealed class KinematicsDiagnosticTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    // A chassis known only by its gyro rates; the lens is fine in chassis axes but not in the site's.
    private const string Rover = """
        coord roll : angle
        coord pitch : angle
        coord yaw : angle
        frame site
        frame chassis in site {
            spin [roll', pitch', yaw']
        }
        point lens in chassis at [0.5 m, 0, 1.4 m]
        report lens in site basis chassis
        report lens in site
        """;

    [Fact]
    public void Report_needing_a_spin_frame_orientation_is_a_MOT4001_error_at_that_report()
    {
        var spec = _folder.Write("rover.motion", Rover);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith(spec + "(10,1): error MOT4001: ", line, StringComparison.Ordinal);
        Assert.Contains("'chassis'", line, StringComparison.Ordinal);
    }

    [Fact]
    public void The_same_report_in_chassis_axes_alone_checks_clean()
    {
        var legalOnly = Rover[..Rover.LastIndexOf("report lens in site", StringComparison.Ordinal)];
        var spec = _folder.Write("rover.motion", legalOnly);

        var run = CliRun.Of("check", spec);

        Assert.Equal(string.Empty, run.Stderr);
        Assert.Equal(ExitCodes.Success, run.ExitCode);
    }
}
