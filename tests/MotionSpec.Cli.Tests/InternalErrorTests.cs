namespace MotionSpec.Cli.Tests;

/// <summary>An escaped exception becomes one line with its own code and no stack trace.</summary>
public sealed class InternalErrorTests
{
    [Fact]
    public void Report_is_one_line_without_a_stack_trace_and_exits_non_zero()
    {
        Exception caught;
        try
        {
            throw new InvalidOperationException("matrix of rank 2\nat frame boom");
        }
        catch (InvalidOperationException e)
        {
            caught = e;
        }

        using var stderr = new StringWriter();
        var exitCode = InternalError.Report(stderr, caught);

        Assert.Equal(ExitCodes.SpecErrors, exitCode);
        var line = Assert.Single(stderr.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("motionspec: error MOT5999: internal error (InvalidOperationException: matrix of rank 2 at frame boom)", line, StringComparison.Ordinal);
        Assert.DoesNotContain(" at MotionSpec.", line, StringComparison.Ordinal);
    }
}
