namespace MotionSpec.Cli.Tests;

/// <summary>Outputs appear whole or not at all, and a failure leaves the previous file as it was.</summary>
public sealed class AtomicFileWriterTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string[] Leftovers() => Directory.GetFiles(_folder.Path, "*.tmp");

    [Fact]
    public void Writes_a_new_file_and_leaves_no_temporary_behind()
    {
        var target = Path.Combine(_folder.Path, "Crane.cs");

        var problem = AtomicFileWriter.TryWriteText(target, "// generated\n");

        Assert.Null(problem);
        Assert.Equal("// generated\n", File.ReadAllText(target));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void Replaces_an_existing_file_completely()
    {
        var target = _folder.Write("derivation.md", new string('x', 10_000));

        var problem = AtomicFileWriter.TryWriteText(target, "short");

        Assert.Null(problem);
        Assert.Equal("short", File.ReadAllText(target));
    }

    [Fact]
    public void A_writer_that_fails_halfway_leaves_the_old_file_and_no_temporary()
    {
        var target = _folder.Write("plot.svg", "<svg>old</svg>");

        Assert.Throws<InvalidOperationException>(() => AtomicFileWriter.TryWrite(target, stream =>
        {
            stream.Write("<svg>half"u8);
            throw new InvalidOperationException("emitter failed");
        }));

        Assert.Equal("<svg>old</svg>", File.ReadAllText(target));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void Missing_folder_is_a_message_naming_the_path_as_given()
    {
        var target = Path.Combine(_folder.Path, "no-such-folder", "out.cs");

        var problem = AtomicFileWriter.TryWriteText(target, "x");

        Assert.Equal($"cannot write '{target}': the folder does not exist", problem);
        Assert.False(File.Exists(target));
    }

    [Fact]
    public void Directory_as_target_is_a_message()
    {
        var problem = AtomicFileWriter.TryWriteText(_folder.Path, "x");

        Assert.Equal($"cannot write '{_folder.Path}': it is a directory", problem);
    }

    [Fact]
    public void Writes_utf8_without_a_byte_order_mark()
    {
        var target = Path.Combine(_folder.Path, "out.md");

        AtomicFileWriter.TryWriteText(target, "ω");

        Assert.Equal(new byte[] { 0xCF, 0x89 }, File.ReadAllBytes(target));
    }
}
