using System.Text;
using Readiness.Core.Changelogs;
using Readiness.Core.Licensing;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Changelog parsing and license recognition: a typical file, and inputs at the size bound.</summary>
public sealed class ChangelogLicenseBench : IBench
{
    public string Name => "changelog-license";

    public string Description => "parse changelogs (typical and at the 4 MiB bound), recognise license texts";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var typical = Changelog(40);
        var bounded = Changelog(4_000);
        while (Encoding.UTF8.GetByteCount(bounded) < FileLimits.DefaultMaxBytes - 100_000)
        {
            bounded += Changelog(1_000);
        }

        var sections = 0;
        Console.WriteLine($"changelog, 40 releases ({typical.Length / 1024} KiB):  {Stats.Describe(Stats.Time(200, () => sections = ChangelogParser.Parse(typical).Sections.Count))}");
        Console.WriteLine($"changelog near the bound ({bounded.Length / 1024} KiB): {Stats.Describe(Stats.Time(10, () => sections = ChangelogParser.Parse(bounded).Sections.Count))} ({sections} sections)");

        var license = SampleLibrary.MitLicense;
        var noise = new StringBuilder();
        while (noise.Length < FileLimits.DefaultMaxBytes - 100_000)
        {
            noise.Append("Lorem ipsum dolor sit amet, consectetur adipiscing elit; \"quoted\" - dashed.\n");
        }

        var big = noise + license;
        Console.WriteLine($"license text (MIT, {license.Length} chars):     {Stats.Describe(Stats.Time(500, () => LicenseTextRecognizer.Recognize(license)))}");
        Console.WriteLine($"license text near the bound ({big.Length / 1024} KiB):  {Stats.Describe(Stats.Time(10, () => LicenseTextRecognizer.Recognize(big)))}");
        Console.WriteLine($"license expression (NuGet + SPDX):   {Stats.Describe(Stats.Time(1_000, () => LicenseExpressionJudge.Judge("LGPL-2.1-only OR BSD-3-Clause AND MIT")))}");
        return Task.CompletedTask;
    }

    private static string Changelog(int releases)
    {
        var text = new StringBuilder("# Changelog\n\n## [Unreleased]\n\n");
        for (var i = releases; i > 0; i--)
        {
            text.Append($"## [{i / 100}.{i % 100}.0] - 2026-01-{1 + (i % 28):00}\n\n### Added\n\n- Sketch feature {i}.\n- Another change for {i}.\n\n### Fixed\n\n- Fix {i}.\n\n");
        }

        for (var i = releases; i > 0; i--)
        {
            text.Append($"[{i / 100}.{i % 100}.0]: https://git.example/bramblecote/bramble-sketches/compare/v{i / 100}.{i % 100}.0\n");
        }

        return text.ToString();
    }
}
