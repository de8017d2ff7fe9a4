using System.Globalization;
using System.IO.Compression;
using System.Text;

namespace Readiness.Testing.Hostile;

/// <summary>
/// Hostile and unusual repositories for <c>readiness check</c>: broken refs, unreadable or oversized files, deep
/// nesting, growing values, symlinks out of the repository, secrets and control characters in every place that reaches
/// a report. Every case starts from <see cref="SampleLibrary.ReadyRelease"/> (a release that is READY) and changes
/// one thing. The secret is invented (a NuGet API key's shape, common practice, no published source) and the marker
/// lives only outside the repository: neither may ever appear in output.
/// </summary>
public static class HostileCorpus
{
    /// <summary>An invented key of the NuGet API key shape (oy2 + 43 lower-case alphanumerics).</summary>
    public const string Secret = "oy2" + "hostilecorpusfixtureonlynotakey" + "a1b2c3d4e5f6";

    /// <summary>Text only files outside the repository hold.</summary>
    public const string Marker = "HOSTILE-OUTSIDE-MARKER-7Q";

    /// <summary>A line that a file name tries to forge in a report.</summary>
    public const string ForgedLine = "FORGED-LINE";

    public const string ProjectPath = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    private const string Esc = "\u001b";

    private static readonly string EscapeJunk = Esc + "[2J" + Esc + "]0;pwned\u0007" + Esc + "[31m";

    public static IReadOnlyList<HostileCase> All { get; } = [.. GitCases(), .. ProjectCases(), .. LicenseCases(), .. ConfigurationCases(),
        .. ChangelogCases(), .. TreeCases(), .. SecretCases(), .. TextCases()];

    public static HostileCase Find(string name) => All.Single(c => c.Name == name);

    private static IEnumerable<HostileCase> GitCases()
    {
        yield return new("tag-dangling-annotated", HostileExpectation.Ready, b =>
        {
            var blob = b.Repository.GitWithInput("junk\n", "hash-object", "-w", "--stdin").Trim();
            b.Repository.Git("tag", "-a", "junk-1", "-m", "points at a blob", blob);
            File.Delete(LooseObject(b.Repository, blob));
        });
        yield return new("tag-dangling-commit", HostileExpectation.Ready, b =>
        {
            var head = b.Repository.Head;
            b.Repository.Write("extra.txt", "x\n").Commit("Side work");
            var lost = b.Repository.Head;
            b.Repository.Git("tag", "-a", "v0.9.0", "-m", "0.9.0", lost);
            b.Repository.Git("reset", "-q", "--hard", head);
            File.Delete(LooseObject(b.Repository, lost));
        });
        yield return new("tag-ref-missing-object", HostileExpectation.Ready, b =>
            WriteGitFile(b, "refs/tags/ghost", "0123456789abcdef0123456789abcdef01234567\n"));
        yield return new("refs-garbage-text", HostileExpectation.Ready, b => WriteGitFile(b, "refs/tags/junk", "not a sha at all\n"));
        yield return new("refs-garbage-binary", HostileExpectation.Ready, b =>
            File.WriteAllBytes(Path.Combine(b.Repository.GitDirectory, "refs", "heads", "binary"), [0, 1, 2, 0xff, 0xfe, 10, 0x1b, 0x5b]));
        yield return new("packed-refs-garbage", HostileExpectation.AnyAnswer, b =>
            File.AppendAllText(Path.Combine(b.Repository.GitDirectory, "packed-refs"), "garbage line\n^^^^\nzzzz refs/tags/zz\n"));
        yield return new("head-outside-refs", HostileExpectation.NotReady, b => WriteGitFile(b, "HEAD", "ref: elsewhere/main\n"));
        yield return new("head-detached-missing", HostileExpectation.NotReady, b =>
            WriteGitFile(b, "HEAD", "0123456789abcdef0123456789abcdef01234567\n"));
        yield return new("tags-many-lightweight", HostileExpectation.Ready, b => ManyTags(b, b.Size(20_000, 2_000), i => $"build-{i}"));
        yield return new("tags-many-release-like", HostileExpectation.AnyAnswer, b => ManyTags(b, b.Size(20_000, 2_000), i => $"v0.{i}.0"));
        yield return new("tags-many-annotated", HostileExpectation.AnyAnswer, b =>
        {
            var stream = new StringBuilder();
            for (var i = 0; i < b.Size(20_000, 2_000); i++)
            {
                stream.Append(CultureInfo.InvariantCulture, $"tag v0.{i}.0\nfrom {b.Repository.Head}\ntagger Bramblecote Dev <dev@bramblecote.example> 1795000000 +0000\ndata 6\n0.{i % 10}.0\n\n");
            }

            b.Repository.GitWithInput(stream.ToString(), "fast-import", "--quiet");
        });
        yield return new("tag-of-tag-chain", HostileExpectation.AnyAnswer, b =>
        {
            var previous = "v1.2.0";
            for (var i = 0; i < 40; i++)
            {
                b.Repository.Git("tag", "-a", $"chain-{i}", "-m", "chain", previous);
                previous = $"chain-{i}";
            }
        });
        yield return new("commit-corrupt", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("later.txt", "later\n");
            var sha = b.Repository.Commit("Later");
            var file = LooseObject(b.Repository, sha);
            File.SetAttributes(file, FileAttributes.Normal);
            File.WriteAllBytes(file, Deflate("commit 12\0not a commit"));
        });
        yield return new("repository-without-commits", HostileExpectation.NotReady, b =>
        {
            Directory.Delete(b.Repository.GitDirectory, recursive: true);
            GitCli.Run(b.Repository.Path, ["init", "-q", "-b", "main"]);
        });
        yield return new("submodule-gitlink", HostileExpectation.Ready, b =>
        {
            b.Repository.Git("update-index", "--add", "--cacheinfo", $"160000,{b.Repository.Head},vendor/lanternfly");
            b.Repository.Git("commit", "-q", "-m", "Add a submodule");
            Retag(b);
        })
        { MustMention = "vendor/lanternfly" };
    }

    private static IEnumerable<HostileCase> ProjectCases()
    {
        yield return Project("condition-and-chain", HostileExpectation.AnyAnswer, b => Conditioned(Chain("'a' == 'a'", " and ", b.Size(60_000, 60_000))));
        yield return Project("condition-or-chain", HostileExpectation.AnyAnswer, b => Conditioned(Chain("'a' == 'b'", " or ", b.Size(60_000, 60_000))));
        yield return Project("condition-nested-parens", HostileExpectation.AnyAnswer, b =>
            Conditioned(new string('(', b.Size(30_000, 30_000)) + "'a' == 'a'" + new string(')', b.Size(30_000, 30_000))));
        yield return Project("condition-not-chain", HostileExpectation.AnyAnswer, b => Conditioned(new string('!', b.Size(60_000, 60_000)) + "true"));
        yield return Project("property-doubling", HostileExpectation.AnyAnswer, b =>
            Properties("<P>x</P>" + string.Concat(Enumerable.Repeat("<P>$(P)$(P)</P>", 64))));
        yield return Project("property-replace-growth", HostileExpectation.AnyAnswer, b =>
            Properties($"<P>{new string('x', 60_000)}</P><Q>{new string('x', 60_000)}</Q><R>$(P.Replace('x', '$(Q)'))</R><Description>$(R)</Description>"));
        yield return Project("property-function-nesting", HostileExpectation.AnyAnswer, b =>
            Properties("<P>" + string.Concat(Enumerable.Repeat("$([MSBuild]::ValueOrDefault('', ", 5_000)) + "x" + new string(')', 10_000) + "</P>"));
        yield return Project("project-dtd", HostileExpectation.NotReady, _ =>
            "<?xml version=\"1.0\"?>\n<!DOCTYPE Project [ <!ENTITY v \"1.2.0\"> ]>\n" + SampleLibrary.Project) with
        { MustMention = "DTD" };
        yield return Project("project-xxe", HostileExpectation.NotReady, b =>
        {
            File.WriteAllText(Path.Combine(b.Outside, "marker.txt"), Marker);
            return $"<?xml version=\"1.0\"?>\n<!DOCTYPE Project [ <!ENTITY x SYSTEM \"file://{b.Outside}/marker.txt\"> ]>\n"
                + SampleLibrary.Project.Replace("Streaming quantile", "&x; quantile", StringComparison.Ordinal);
        });
        yield return Project("project-billion-laughs", HostileExpectation.NotReady, _ =>
        {
            var entities = new StringBuilder("<!ENTITY l0 \"lol\">");
            for (var i = 1; i < 10; i++)
            {
                entities.Append(CultureInfo.InvariantCulture, $"<!ENTITY l{i} \"&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};&l{i - 1};\">");
            }

            return $"<?xml version=\"1.0\"?>\n<!DOCTYPE Project [ {entities} ]>\n" + SampleLibrary.Project.Replace("Streaming quantile", "&l9;", StringComparison.Ordinal);
        });
        yield return ProjectBytes("project-over-size", HostileExpectation.NotReady, _ =>
            Encoding.UTF8.GetBytes(SampleLibrary.Project.Replace("</Project>", "<!--" + new string('x', 5 * 1024 * 1024) + "-->\n</Project>", StringComparison.Ordinal)));
        yield return ProjectBytes("project-invalid-utf8", HostileExpectation.NotReady, _ =>
        {
            var text = Encoding.UTF8.GetBytes(SampleLibrary.Project);
            var at = Array.IndexOf(text, (byte)'S');
            text[at] = 0xC3;
            text[at + 1] = 0x28;
            return text;
        });
        yield return ProjectBytes("project-utf16-odd-length", HostileExpectation.NotReady, _ => [.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes(SampleLibrary.Project), 0x41]);
        yield return ProjectBytes("project-utf16-without-bom", HostileExpectation.AnyAnswer, _ => Encoding.Unicode.GetBytes(SampleLibrary.Project));
        yield return ProjectBytes("project-utf8-bom", HostileExpectation.Ready, _ => [.. Encoding.UTF8.GetPreamble(), .. Encoding.UTF8.GetBytes(SampleLibrary.Project)]);
        yield return Project("project-malformed", HostileExpectation.NotReady, _ => SampleLibrary.Project.Replace("</PropertyGroup>", "<Broken></PropertyGroup>", StringComparison.Ordinal))
            with
        { MustMention = "Bramble.Sketches.csproj:" };
        yield return Project("project-deep-elements", HostileExpectation.AnyAnswer, b =>
            Properties(string.Concat(Enumerable.Repeat("<a>", b.Size(100_000, 20_000))) + string.Concat(Enumerable.Repeat("</a>", b.Size(100_000, 20_000)))));
        yield return Project("import-outside-relative", HostileExpectation.AnyAnswer, b =>
        {
            File.WriteAllText(Path.Combine(b.Outside, "evil.props"), $"<Project><PropertyGroup><Description>{Marker}</Description></PropertyGroup></Project>");
            return SampleLibrary.Project.Replace("</Project>", $"<Import Project=\"../../../{Path.GetFileName(b.Outside)}/evil.props\" />\n</Project>", StringComparison.Ordinal);
        }) with
        { MustMention = "outside" };
        yield return Project("import-absolute", HostileExpectation.AnyAnswer, _ => SampleLibrary.Project.Replace("</Project>", "<Import Project=\"/etc/passwd\" />\n</Project>", StringComparison.Ordinal));
        yield return Project("import-self", HostileExpectation.AnyAnswer, _ => SampleLibrary.Project.Replace("</Project>", "<Import Project=\"$(MSBuildThisFile)\" />\n</Project>", StringComparison.Ordinal));
        yield return new("import-cycle", HostileExpectation.AnyAnswer, b =>
        {
            b.Repository.Write("build/a.props", "<Project><Import Project=\"b.props\" /></Project>")
                .Write("build/b.props", "<Project><Import Project=\"a.props\" /></Project>")
                .Write(ProjectPath, SampleLibrary.Project.Replace("</Project>", "<Import Project=\"../../build/a.props\" />\n</Project>", StringComparison.Ordinal));
            Retag(b);
        });
        yield return new("import-glob-many", HostileExpectation.AnyAnswer, b =>
        {
            for (var i = 0; i < b.Size(2_000, 300); i++)
            {
                b.Repository.Write($"build/imports/p{i}.props", $"<Project><PropertyGroup><P{i}>{i}</P{i}></PropertyGroup></Project>");
            }

            b.Repository.Write(ProjectPath, SampleLibrary.Project.Replace("</Project>", "<Import Project=\"../../build/imports/*.props\" />\n</Project>", StringComparison.Ordinal));
            Retag(b);
        });
        yield return Project("many-properties", HostileExpectation.AnyAnswer, b =>
            Properties(string.Concat(Enumerable.Range(0, b.Size(100_000, 20_000)).Select(i => $"<P{i}>$(P{Math.Max(0, i - 1)})v</P{i}>"))));
        yield return Project("long-property-name", HostileExpectation.AnyAnswer, _ => Properties($"<P{new string('x', 1_000_000)}>1</P{new string('x', 1_000_000)}>"));
        yield return Project("choose-deep", HostileExpectation.AnyAnswer, b =>
            Properties("</PropertyGroup>" + string.Concat(Enumerable.Repeat("<Choose><When Condition=\"true\">", b.Size(5_000, 1_000)))
                + "<PropertyGroup><Q>1</Q></PropertyGroup>" + string.Concat(Enumerable.Repeat("</When></Choose>", b.Size(5_000, 1_000))) + "<PropertyGroup>"));
        yield return new("project-reference-cycle", HostileExpectation.AnyAnswer, b =>
        {
            b.Repository.Write("src/Lanternfly/Lanternfly.csproj", SampleLibrary.Project.Replace("Bramble.Sketches", "Lanternfly", StringComparison.Ordinal)
                    .Replace("</Project>", "<ItemGroup><ProjectReference Include=\"../Bramble.Sketches/Bramble.Sketches.csproj\" /></ItemGroup></Project>", StringComparison.Ordinal))
                .Write(ProjectPath, SampleLibrary.Project.Replace("</Project>", "<ItemGroup><ProjectReference Include=\"../Lanternfly/Lanternfly.csproj\" /></ItemGroup></Project>", StringComparison.Ordinal));
            Retag(b);
        });
        yield return new("many-projects", HostileExpectation.AnyAnswer, b =>
        {
            for (var i = 0; i < b.Size(2_000, 150); i++)
            {
                b.Repository.Write($"src/Lanternfly.P{i}/Lanternfly.P{i}.csproj", SampleLibrary.Project.Replace("Bramble.Sketches", $"Lanternfly.P{i}", StringComparison.Ordinal));
            }

            Retag(b);
        });
        yield return new("project-symlink-inside", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("real/Bramble.Sketches.xml", SampleLibrary.Project).Delete(ProjectPath).Symlink(ProjectPath, "../../real/Bramble.Sketches.xml");
            Retag(b);
        })
        { MustMention = "symlink" };
        yield return new("props-symlink-outside", HostileExpectation.NotReady, b =>
        {
            File.WriteAllText(Path.Combine(b.Outside, "evil.props"), $"<Project><PropertyGroup><Version>{Marker}</Version></PropertyGroup></Project>");
            b.Repository.Delete("Directory.Build.props").Symlink("Directory.Build.props", Path.Combine(b.Outside, "evil.props"));
            Retag(b);
        })
        { MustMention = "symlink" };
    }

    private static IEnumerable<HostileCase> LicenseCases()
    {
        yield return Props("license-nested-parens", HostileExpectation.NotReady, b => new string('(', b.Size(30_000, 30_000)) + "MIT" + new string(')', b.Size(30_000, 30_000)));
        yield return Props("license-or-chain", HostileExpectation.AnyAnswer, b => Chain("MIT", " OR ", b.Size(60_000, 60_000)));
        yield return Props("license-and-with-chain", HostileExpectation.AnyAnswer, b => Chain("Apache-2.0 WITH LLVM-exception", " AND ", b.Size(30_000, 30_000)));
        yield return Props("license-secret", HostileExpectation.NotReady, _ => Secret);
        yield return Props("license-escapes", HostileExpectation.NotReady, _ => "MIT" + EscapeJunk);
        yield return new("license-symlink-outside", HostileExpectation.NotReady, b =>
        {
            File.WriteAllText(Path.Combine(b.Outside, "LICENSE"), SampleLibrary.MitLicense + Marker);
            b.Repository.Delete("LICENSE").Symlink("LICENSE", Path.Combine(b.Outside, "LICENSE"));
            Retag(b);
        })
        { MustMention = "symlink" };
        yield return new("license-symlink-relative-outside", HostileExpectation.NotReady, b =>
        {
            File.WriteAllText(Path.Combine(b.Outside, "LICENSE"), SampleLibrary.MitLicense + Marker);
            b.Repository.Delete("LICENSE").Symlink("LICENSE", $"../{Path.GetFileName(b.Outside)}/LICENSE");
            Retag(b);
        })
        { MustMention = "symlink" };
        yield return new("license-symlink-loop", HostileExpectation.NotReady, b =>
        {
            b.Repository.Delete("LICENSE").Symlink("LICENSE", "LICENSE.txt").Symlink("LICENSE.txt", "LICENSE");
            Retag(b);
        });
    }

    private static IEnumerable<HostileCase> ConfigurationCases()
    {
        yield return Config("config-over-size", HostileExpectation.ConfigurationError, b => "checklist: library\n# " + new string('x', 5 * 1024 * 1024) + "\n");
        yield return Config("config-alias-bomb", HostileExpectation.ConfigurationError, _ =>
            "a: &a [x, x, x, x, x, x, x, x, x]\nb: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a]\nc: &c [*b, *b, *b, *b, *b, *b, *b, *b, *b]\nd: [*c, *c, *c, *c, *c, *c, *c, *c, *c]\n");
        yield return Config("config-deep-flow", HostileExpectation.ConfigurationError, b => "checks: " + new string('[', b.Size(50_000, 50_000)) + "\n");
        yield return Config("config-deep-block", HostileExpectation.ConfigurationError, b =>
            string.Concat(Enumerable.Range(0, b.Size(5_000, 2_000)).Select(i => new string(' ', i) + "k:\n")));
        yield return Config("config-unknown-key-secret", HostileExpectation.ConfigurationError, _ => $"{Secret}: 1\n");
        yield return Config("config-value-secret", HostileExpectation.ConfigurationError, _ => $"checklist: {Secret}\n");
        yield return Config("config-unknown-key-escapes", HostileExpectation.ConfigurationError, _ => $"\"x{EscapeJunk}\": 1\n");
        yield return ConfigBytes("config-utf8-bom", HostileExpectation.Ready, _ => [.. Encoding.UTF8.GetPreamble(), .. "checklist: library\n"u8.ToArray()]);
        yield return ConfigBytes("config-invalid-utf8", HostileExpectation.ConfigurationError, _ => [.. "checklist: lib"u8.ToArray(), 0xC3, 0x28, .. "\n"u8.ToArray()]);
        yield return Config("config-trailing-spaces", HostileExpectation.Ready, b => "checklist: library" + new string(' ', b.Size(100_000, 100_000)) + "\n");
        yield return Config("config-long-value", HostileExpectation.AnyAnswer, _ => "tag-pattern: v" + new string('*', 3_000_000) + "\n");
        yield return ConfigBytes("config-nul-bytes", HostileExpectation.AnyAnswer, _ => [.. "checklist: library\n"u8.ToArray(), 0, 0, 0, .. "\n"u8.ToArray()]);
    }

    private static IEnumerable<HostileCase> ChangelogCases()
    {
        yield return Changelog("changelog-deep-list", HostileExpectation.AnyAnswer, b =>
            Entry(string.Concat(Enumerable.Range(0, b.Size(10_000, 2_000)).Select(i => new string(' ', i * 2) + "- item\n"))));
        yield return Changelog("changelog-deep-quote", HostileExpectation.AnyAnswer, b => Entry(new string('>', b.Size(50_000, 50_000)) + " quote\n"));
        yield return Changelog("changelog-deep-brackets", HostileExpectation.AnyAnswer, b => Entry(new string('[', b.Size(50_000, 50_000)) + "x" + new string(']', b.Size(50_000, 50_000)) + "\n"));
        yield return Changelog("changelog-many-headings", HostileExpectation.AnyAnswer, b =>
            SampleLibrary.Changelog([("1.2.0", "2026-11-20"), .. Enumerable.Range(0, b.Size(100_000, 10_000)).Select(i => ($"0.{i}.0", "2026-01-01"))]));
        yield return Changelog("changelog-date-secret", HostileExpectation.NotReady, _ => SampleLibrary.Changelog(("1.2.0", Secret)));
        yield return Changelog("changelog-escapes", HostileExpectation.AnyAnswer, _ => SampleLibrary.Changelog(("1.2.0", "2026-11-20" + EscapeJunk)));
        yield return Changelog("changelog-bidi", HostileExpectation.AnyAnswer, _ => SampleLibrary.Changelog(("1.2.0", "2026-11-20 \u202Egnp.exe\u200B")));
        yield return Changelog("changelog-over-size", HostileExpectation.NotReady, _ => SampleLibrary.Changelog(("1.2.0", "2026-11-20")) + new string('x', 5 * 1024 * 1024));
        yield return new("changelog-invalid-utf8", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("CHANGELOG.md", [.. Encoding.UTF8.GetBytes(SampleLibrary.Changelog(("1.2.0", "2026-11-20"))), 0xC3, 0x28]);
            Retag(b);
        });
    }

    private static IEnumerable<HostileCase> TreeCases()
    {
        yield return new("folders-deep", HostileExpectation.AnyAnswer, b => FastImport(b, Enumerable.Repeat(string.Join('/', Enumerable.Repeat("d", b.Size(50_000, 3_000))) + "/f.txt", 1)));
        yield return new("files-over-cap", HostileExpectation.AnyAnswer, b => FastImport(b, Enumerable.Range(0, 200_100).Select(i => $"many/{i % 100}/f{i}.txt")))
        { MustMention = "200" };
        yield return new("name-newline-forges-line", HostileExpectation.AnyAnswer, b =>
        {
            b.Repository.Write($"src/Bramble.Sketches\n{ForgedLine} READY\n/Bramble.Sketches.Extra.csproj", SampleLibrary.Project.Replace("Bramble.Sketches<", "Bramble.Extra<", StringComparison.Ordinal));
            Retag(b);
        });
        yield return new("name-escapes-project", HostileExpectation.AnyAnswer, b =>
        {
            b.Repository.Write($"src/Evil{EscapeJunk}/Evil{EscapeJunk}.csproj", SampleLibrary.Project.Replace("<PackageId>Bramble.Sketches</PackageId>", "", StringComparison.Ordinal));
            Retag(b);
        });
        yield return new("name-bidi-project", HostileExpectation.AnyAnswer, b =>
        {
            b.Repository.Write("src/Lantern\u202Efly\u200B/Lantern\u202Efly\u200B.csproj", SampleLibrary.Project.Replace("<PackageId>Bramble.Sketches</PackageId>", "", StringComparison.Ordinal));
            Retag(b);
        });
        yield return new("name-escapes-license", HostileExpectation.NotReady, b =>
        {
            b.Repository.Delete("LICENSE").Write($"LICENSE{EscapeJunk}", "not a license\n");
            Retag(b);
        });
        yield return new("blob-huge", HostileExpectation.Ready, b =>
        {
            var path = Path.Combine(b.Repository.Path, "data", "blob.bin");
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            using (var file = File.Create(path))
            {
                file.SetLength(b.Size(300, 40) * 1024L * 1024);
            }

            Retag(b);
        });
        yield return new("symlink-loop-folder", HostileExpectation.Ready, b =>
        {
            b.Repository.Symlink("loop/a", "b").Symlink("loop/b", "a").Symlink("loop/up", "..");
            Retag(b);
        });
        yield return new("symlink-to-root", HostileExpectation.Ready, b =>
        {
            b.Repository.Symlink("root", "/");
            Retag(b);
        });
    }

    private static IEnumerable<HostileCase> SecretCases()
    {
        yield return new("secret-in-oversized-file", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("data/settings.txt", new string('x', 3 * 1024 * 1024) + "\nkey=" + Secret + "\n");
            Retag(b);
        })
        { MustMention = "data/settings.txt" };
        yield return new("nuget-config-unparseable", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("nuget.config", "<configuration><packageSourceCredentials><feed><add key=\"ClearTextPassword\" value=\"hunter2-hostile\" /></feed>\n");
            Retag(b);
        })
        { MustMention = "nuget.config" };
        yield return new("nuget-config-bom", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("nuget.config", [.. Encoding.UTF8.GetPreamble(), .. Encoding.UTF8.GetBytes(
                "<configuration><packageSourceCredentials><feed><add key=\"Username\" value=\"dev\" /><add key=\"ClearTextPassword\" value=\"hunter2-hostile\" /></feed></packageSourceCredentials></configuration>\n")]);
            Retag(b);
        })
        { MustMention = "nuget.config" };
        yield return new("secret-utf16-without-bom", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("tools/publish.ps1", Encoding.Unicode.GetBytes($"$key = '{Secret}'\r\n"));
            Retag(b);
        })
        { MustMention = "tools/publish.ps1" };
        yield return new("secret-utf16-with-bom", HostileExpectation.NotReady, b =>
        {
            b.Repository.Write("tools/publish.ps1", [.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes($"$key = '{Secret}'\r\n")]);
            Retag(b);
        })
        { MustMention = "tools/publish.ps1" };
        yield return Project("secret-in-package-id", HostileExpectation.NotReady, _ => SampleLibrary.Project.Replace("<PackageId>Bramble.Sketches</PackageId>", $"<PackageId>{Secret}</PackageId>", StringComparison.Ordinal));
        yield return Project("secret-in-description", HostileExpectation.NotReady, _ => SampleLibrary.Project.Replace("Streaming quantile", Secret, StringComparison.Ordinal));
        yield return Project("secret-in-version", HostileExpectation.NotReady, _ => Properties($"<Version>{Secret}</Version>"));
    }

    private static IEnumerable<HostileCase> TextCases()
    {
        yield return Project("escapes-in-package-id", HostileExpectation.AnyAnswer, _ => SampleLibrary.Project.Replace("<PackageId>Bramble.Sketches</PackageId>", $"<PackageId>Bramble{EscapeJunk}</PackageId>", StringComparison.Ordinal));
        yield return Project("escapes-in-description", HostileExpectation.AnyAnswer, _ => SampleLibrary.Project.Replace("Streaming quantile", "Streaming" + EscapeJunk, StringComparison.Ordinal));
        yield return Project("newline-in-version", HostileExpectation.NotReady, _ => Properties($"<Version>1.2.0&#10;{ForgedLine} READY&#10;</Version>"));
        yield return Project("bidi-in-version", HostileExpectation.NotReady, _ => Properties("<Version>1.2.0\u202E\u200B</Version>"));
        yield return new("escapes-in-tag-message", HostileExpectation.AnyAnswer, b =>
            b.Repository.Git("tag", "-f", "-a", "v1.2.0", "-m", $"Bramble.Sketches 1.2.0 {EscapeJunk}\n{ForgedLine} READY\n"));
        yield return new("escapes-in-ref-argument", HostileExpectation.NotReady, _ => { }, ["--ref", $"v1.2.0{EscapeJunk}"]);
        yield return new("escapes-in-checklist-argument", HostileExpectation.ConfigurationError, _ => { }, ["--checklist", $"lib{EscapeJunk}\n{ForgedLine} READY"]);
    }

    private static HostileCase Project(string name, HostileExpectation expect, Func<HostileBuild, string> text) =>
        ProjectBytes(name, expect, b => Encoding.UTF8.GetBytes(text(b)));

    private static HostileCase ProjectBytes(string name, HostileExpectation expect, Func<HostileBuild, byte[]> bytes) =>
        new(name, expect, b =>
        {
            b.Repository.Write(ProjectPath, bytes(b));
            Retag(b);
        });

    private static HostileCase Props(string name, HostileExpectation expect, Func<HostileBuild, string> license) =>
        new(name, expect, b =>
        {
            b.Repository.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.0").Replace("<PackageLicenseExpression>MIT<", $"<PackageLicenseExpression>{license(b)}<", StringComparison.Ordinal));
            Retag(b);
        });

    private static HostileCase Config(string name, HostileExpectation expect, Func<HostileBuild, string> text) =>
        ConfigBytes(name, expect, b => Encoding.UTF8.GetBytes(text(b)));

    private static HostileCase ConfigBytes(string name, HostileExpectation expect, Func<HostileBuild, byte[]> bytes) =>
        new(name, expect, b =>
        {
            b.Repository.Write(".readiness.yml", bytes(b));
            Retag(b);
        });

    private static HostileCase Changelog(string name, HostileExpectation expect, Func<HostileBuild, string> text) =>
        new(name, expect, b =>
        {
            b.Repository.Write("CHANGELOG.md", text(b));
            Retag(b);
        });

    private static string Entry(string body) =>
        SampleLibrary.Changelog(("1.2.0", "2026-11-20")).Replace("### Added\n", "### Added\n" + body, StringComparison.Ordinal);

    private static string Properties(string inner) =>
        SampleLibrary.Project.Replace("</PropertyGroup>", inner + "\n  </PropertyGroup>", StringComparison.Ordinal);

    private static string Conditioned(string condition) =>
        SampleLibrary.Project.Replace("</Project>", $"  <PropertyGroup Condition=\"{condition}\"><Authors>Bramblecote Software</Authors></PropertyGroup>\n</Project>", StringComparison.Ordinal);

    private static string Chain(string term, string separator, int count) => string.Join(separator, Enumerable.Repeat(term, count));

    /// <summary>Commits the working tree and moves the release tag to the new commit.</summary>
    private static void Retag(HostileBuild b)
    {
        b.Repository.Git("add", "-A");
        b.Repository.Git("commit", "-q", "--allow-empty", "-m", "Hostile change");
        b.Repository.Git("tag", "-f", "-a", "v1.2.0", "-m", "Bramble.Sketches 1.2.0\n");
    }

    private static void WriteGitFile(HostileBuild b, string path, string text)
    {
        var full = Path.Combine(b.Repository.GitDirectory, path);
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        File.WriteAllText(full, text);
    }

    private static void ManyTags(HostileBuild b, int count, Func<int, string> name)
    {
        var head = b.Repository.Head;
        b.Repository.Git("pack-refs", "--all");
        var lines = new StringBuilder();
        for (var i = 0; i < count; i++)
        {
            lines.Append(CultureInfo.InvariantCulture, $"{head} refs/tags/{name(i)}\n");
        }

        File.AppendAllText(Path.Combine(b.Repository.GitDirectory, "packed-refs"), lines.ToString());
    }

    /// <summary>Adds one commit holding <paramref name="paths"/> (one shared blob) on top of HEAD with git fast-import(1), then retags.</summary>
    private static void FastImport(HostileBuild b, IEnumerable<string> paths)
    {
        var stream = new StringBuilder("blob\nmark :1\ndata 2\nx\n\ncommit refs/heads/main\ncommitter Bramblecote Dev <dev@bramblecote.example> 1795000000 +0000\ndata 5\nmany\n");
        stream.Append(CultureInfo.InvariantCulture, $"from {b.Repository.Head}\n");
        foreach (var path in paths)
        {
            stream.Append(CultureInfo.InvariantCulture, $"M 100644 :1 {path}\n");
        }

        stream.Append('\n');
        b.Repository.GitWithInput(stream.ToString(), "fast-import", "--quiet");

        // The working tree stays as it was: a path this deep cannot be checked out; the check reads the commit.
        b.Repository.Git("tag", "-f", "-a", "v1.2.0", "-m", "Bramble.Sketches 1.2.0\n");
    }

    private static string LooseObject(TestRepository repository, string sha) =>
        Path.Combine(repository.GitDirectory, "objects", sha[..2], sha[2..]);

    private static byte[] Deflate(string content)
    {
        using var output = new MemoryStream();
        using (var zlib = new ZLibStream(output, CompressionLevel.Fastest))
        {
            zlib.Write(Encoding.ASCII.GetBytes(content));
        }

        return output.ToArray();
    }
}
