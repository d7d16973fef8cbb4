namespace MotionSpec.Cli.Tests;

/// <summary>
/// emit -o, derive -o and plot -o made to fail (spec errors, a folder that refuses the file, a failure in the
/// middle of writing): an existing target keeps every byte, nothing new appears, no temporary file is left.
/// </summary>
public sealed class OutputFailureTests : IDisposable
{
    private static readonly byte[] OldBytes = "previous output, must survive\n"u8.ToArray();

    private readonly TempFolder _folder = new();

    public void Dispose()
    {
        AtomicFileWriter.OpenTemporary.Value = null;
        _folder.Dispose();
    }

    /// <summary>The command, the target's name, and the prefix of its messages.</summary>
    public static TheoryData<string, string> Writers() => new()
    {
        { "emit", "Slide.cs" },
        { "derive", "slide.md" },
        { "plot", "slide.svg" },
    };

    private static string[] Args(string command, string spec, string target) => command switch
    {
        "plot" => ["plot", spec, "--t", "0:0.5s:2s", "-o", target],
        _ => [command, spec, "-o", target],
    };

    private string Target(string name)
    {
        var target = Path.Combine(_folder.Path, name);
        File.WriteAllBytes(target, OldBytes);
        return target;
    }

    /// <summary>Every file in the folder, hidden temporaries included.</summary>
    private void AssertFiles(params string[] names) =>
        Assert.Equal(names.Order(StringComparer.Ordinal), Directory.GetFiles(_folder.Path).Select(f => Path.GetFileName(f)!).Order(StringComparer.Ordinal));

    [Theory]
    [MemberData(nameof(Writers))]
    public void Success_replaces_the_target_and_leaves_no_temporary(string command, string name)
    {
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var target = Target(name);

        var run = CliRun.Of(Args(command, spec, target));

        Assert.Equal(0, run.ExitCode);
        Assert.NotEqual(OldBytes, File.ReadAllBytes(target));
        AssertFiles("slide.motion", name);
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Spec_errors_leave_the_existing_target_byte_identical(string command, string name)
    {
        var spec = _folder.Write("slide.motion", Specs.UnknownFrame);
        var target = Target(name);

        var run = CliRun.Of(Args(command, spec, target));

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.StartsWith(spec + "(4,16): error MOT2203: ", run.Stderr, StringComparison.Ordinal);
        Assert.Equal(OldBytes, File.ReadAllBytes(target));
        AssertFiles("slide.motion", name);
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Spec_errors_write_nothing(string command, string name)
    {
        var spec = _folder.Write("slide.motion", Specs.UnknownFrame);

        var run = CliRun.Of(Args(command, spec, Path.Combine(_folder.Path, name)));

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        AssertFiles("slide.motion");
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Folder_that_refuses_the_file_leaves_the_target_and_names_it(string command, string name)
    {
        // What the operating system does for a folder without write permission (tests may run as root, for
        // whom chmod does not refuse anything, so the refusal is injected where the file is opened).
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var target = Target(name);
        AtomicFileWriter.OpenTemporary.Value = _ => throw new UnauthorizedAccessException("Access to the path is denied.");

        var run = CliRun.Of(Args(command, spec, target));

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal($"motionspec {command}: cannot write '{target}': permission denied", Assert.Single(run.StderrLines));
        Assert.Equal(string.Empty, run.Stdout);
        Assert.Equal(OldBytes, File.ReadAllBytes(target));
        AssertFiles("slide.motion", name);
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Disk_full_in_the_middle_of_writing_leaves_the_target_and_no_temporary(string command, string name)
    {
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var target = Target(name);
        FailingStream? opened = null;
        AtomicFileWriter.OpenTemporary.Value = path => opened = new FailingStream(path, failAfter: 100, () => new IOException("No space left on device"));

        var run = CliRun.Of(Args(command, spec, target));

        Assert.NotNull(opened);
        Assert.True(opened!.Written > 0, "the failure must come after part of the file was written");
        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal($"motionspec {command}: cannot write '{target}': No space left on device", Assert.Single(run.StderrLines));
        Assert.Equal(OldBytes, File.ReadAllBytes(target));
        AssertFiles("slide.motion", name);
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Defect_in_the_middle_of_writing_is_MOT5999_and_leaves_the_target_and_no_temporary(string command, string name)
    {
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var target = Target(name);
        AtomicFileWriter.OpenTemporary.Value = path => new FailingStream(path, failAfter: 100, () => new InvalidOperationException("writer broke"));

        var run = CliRun.Of(Args(command, spec, target));

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.StartsWith("motionspec: error MOT5999: internal error (InvalidOperationException: writer broke)", Assert.Single(run.StderrLines), StringComparison.Ordinal);
        Assert.Equal(OldBytes, File.ReadAllBytes(target));
        AssertFiles("slide.motion", name);
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Target_below_a_file_is_refused_by_the_system_and_the_file_keeps_its_bytes(string command, string name)
    {
        // No injection: the operating system refuses a path whose folder is a regular file, even for root.
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var blocker = Target("not-a-folder");

        var run = CliRun.Of(Args(command, spec, Path.Combine(blocker, name)));

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.StartsWith($"motionspec {command}: cannot write '{Path.Combine(blocker, name)}': ", Assert.Single(run.StderrLines), StringComparison.Ordinal);
        Assert.Equal(OldBytes, File.ReadAllBytes(blocker));
        AssertFiles("not-a-folder", "slide.motion");
    }

    /// <summary>A real temporary file that fails once more than <c>failAfter</c> bytes would have been written.</summary>
    private sealed class FailingStream(string path, int failAfter, Func<Exception> failure) : Stream
    {
        private readonly FileStream _file = new(path, FileMode.CreateNew, FileAccess.Write, FileShare.None);

        public long Written { get; private set; }

        public override bool CanRead => false;

        public override bool CanSeek => false;

        public override bool CanWrite => true;

        public override long Length => Written;

        public override long Position { get => Written; set => throw new NotSupportedException(); }

        // Stream's span and single-byte writes come here too.
        public override void Write(byte[] buffer, int offset, int count)
        {
            var room = (int)Math.Max(0, failAfter - Written);
            if (count > room)
            {
                _file.Write(buffer, offset, room);
                _file.Flush();
                Written += room;
                throw failure();
            }

            _file.Write(buffer, offset, count);
            Written += count;
        }

        public override void Flush() => _file.Flush();

        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();

        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

        public override void SetLength(long value) => throw new NotSupportedException();

        protected override void Dispose(bool disposing)
        {
            if (disposing)
            {
                _file.Dispose();
            }

            base.Dispose(disposing);
        }
    }
}
