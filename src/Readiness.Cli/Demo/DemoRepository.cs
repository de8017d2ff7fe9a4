using System.Security.Cryptography;
using System.Text;
using Readiness.Git;

namespace Readiness.Cli.Demo;

/// <summary>Builds the invented demo repository with real commits and tags (three releases, the last one flawed).</summary>
public static class DemoRepository
{
    /// <summary>Writes the repository into <paramref name="folder"/> and returns the release tag's name.</summary>
    public static string Create(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        using var writer = RepositoryWriter.Init(folder);
        var files = new Dictionary<string, byte[]?>
        {
            ["README.md"] = Text(DemoFiles.Readme),
            ["LICENSE"] = Text(DemoFiles.License),
            ["CHANGELOG.md"] = Text(DemoFiles.Changelog230),
            ["Directory.Build.props"] = Text(DemoFiles.DirectoryBuildProps("2.3.0")),
            ["Directory.Packages.props"] = Text(DemoFiles.DirectoryPackagesProps),
            [".readiness.yml"] = Text(DemoFiles.Config),
            [".github/allowed_signers"] = Text(DemoFiles.AllowedSigners),
            [".github/workflows/ci.yml"] = Text(DemoFiles.Workflow),
            ["src/Bramble.Sketches/Bramble.Sketches.csproj"] = Text(DemoFiles.SketchesProject),
            ["src/Bramble.Sketches/QuantileSketch.cs"] = Text(DemoFiles.QuantileSketch),
            ["tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj"] = Text(DemoFiles.TestProject),
        };
        var first = writer.Commit(files, "Bramble.Sketches 2.3.0", DemoFiles.Author, DemoFiles.Email, Date(2026, 6, 2));
        writer.AnnotatedTag("v2.3.0", first, "Bramble.Sketches 2.3.0\n", DemoFiles.Author, DemoFiles.Email, Date(2026, 6, 2));

        var second = writer.Commit(
            new Dictionary<string, byte[]?>
            {
                ["CHANGELOG.md"] = Text(DemoFiles.Changelog231),
                ["Directory.Build.props"] = Text(DemoFiles.DirectoryBuildProps("2.3.1")),
            },
            "Fix the top rank of QuantileSketch",
            DemoFiles.Author,
            DemoFiles.Email,
            Date(2026, 8, 19));
        writer.AnnotatedTag("v2.3.1", second, "Bramble.Sketches 2.3.1\n", DemoFiles.Author, DemoFiles.Email, Date(2026, 8, 19));

        // The release candidate, with the scenario's typical mistakes: entries left under Unreleased, the version
        // not bumped, the host runtime referenced at run time, net6.0 still targeted, a key file committed, and a
        // lightweight (unsigned) tag.
        var third = writer.Commit(
            new Dictionary<string, byte[]?>
            {
                ["CHANGELOG.md"] = Text(DemoFiles.Changelog240),
                ["src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj"] = Text(DemoFiles.PluginProject),
                ["src/Bramble.Sketches.Lanternfly3/SketchFunctions.cs"] = Text(DemoFiles.PluginSource),
                ["signing/release.pfx"] = FakeKeyContainer(),
            },
            "Add the Lanternfly 3 plugin",
            DemoFiles.Author,
            DemoFiles.Email,
            Date(2026, 11, 24));
        writer.LightweightTag("v2.4.0", third);
        return "v2.4.0";
    }

    private static byte[] Text(string text) => Encoding.UTF8.GetBytes(text);

    private static DateTimeOffset Date(int year, int month, int day) => new(year, month, day, 10, 30, 0, TimeSpan.Zero);

    // Random bytes behind a DER SEQUENCE header: shaped like a PKCS#12 container, holding no key at all.
    private static byte[] FakeKeyContainer()
    {
        var bytes = new byte[1200];
        RandomNumberGenerator.Fill(bytes);
        bytes[0] = 0x30;
        bytes[1] = 0x82;
        bytes[2] = 0x04;
        bytes[3] = 0xAC;
        return bytes;
    }
}
