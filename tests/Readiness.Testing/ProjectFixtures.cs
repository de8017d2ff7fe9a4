using Readiness.Core.Projects;

namespace Readiness.Testing;

/// <summary>
/// Hand-made <see cref="ProjectInfo"/> records for check tests that need no project files: each declaration gets
/// the next line of its file, so evidence can be asserted as <c>path:line</c>.
/// </summary>
/// <example>
/// <code>
/// var plugin = ProjectFixtures.Project("src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj")
///     .Property("TargetFrameworks", "net8.0;net10.0")
///     .Reference("Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "all"))
///     .Build();
/// </code>
/// </example>
public static class ProjectFixtures
{
    public static Builder Project(string path) => new(path);

    public static ProjectModel Model(params ProjectInfo[] projects) => new(projects, []);

    /// <summary>A case-insensitive metadata dictionary, as the static reader produces.</summary>
    public static IReadOnlyDictionary<string, string> Meta(params (string Name, string Value)[] metadata)
    {
        var result = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (var (name, value) in metadata)
        {
            result[name] = value;
        }

        return result;
    }

    public sealed class Builder(string path)
    {
        private readonly Dictionary<string, PropertyValue> properties = new(StringComparer.OrdinalIgnoreCase);
        private readonly List<PackageReferenceItem> references = [];
        private readonly List<ProjectReferenceItem> projectReferences = [];
        private readonly List<PackItem> packItems = [];
        private readonly List<CentralPackageVersion> central = [];
        private readonly List<string> imports = [];
        private readonly List<string> unevaluated = [];
        private readonly Dictionary<string, int> lines = new(StringComparer.Ordinal);

        public string Path => path;

        /// <summary>The next free line of <paramref name="file"/> (the project file by default).</summary>
        public SourceLocation Next(string? file = null)
        {
            file ??= path;
            lines[file] = lines.GetValueOrDefault(file, 2) + 1;
            return new SourceLocation(file, lines[file]);
        }

        public Builder Property(string name, string value, SourceLocation? at = null, string? unevaluated = null)
        {
            properties[name] = new PropertyValue(name, value, at ?? Next(), unevaluated);
            return this;
        }

        /// <summary>A property declared in another file (Directory.Build.props, say).</summary>
        public Builder PropertyIn(string file, string name, string value)
        {
            AddImport(file);
            return Property(name, value, Next(file));
        }

        public Builder Reference(string id, string? version, params (string Name, string Value)[] metadata) =>
            ReferenceAt(Next(), id, version, null, metadata);

        /// <summary>A reference with its own location and (for central management) the location of its version.</summary>
        public Builder ReferenceAt(SourceLocation at, string id, string? version, SourceLocation? versionAt, params (string Name, string Value)[] metadata)
        {
            if (at.Path != path)
            {
                AddImport(at.Path);
            }

            references.Add(new PackageReferenceItem(id, version, versionAt ?? (version is null ? null : at), Meta(metadata), at));
            return this;
        }

        /// <summary>A reference conditioned on one target framework.</summary>
        public Builder ReferenceFor(string targetFramework, string id, string version, params (string Name, string Value)[] metadata)
        {
            var at = Next();
            references.Add(new PackageReferenceItem(id, version, at, Meta(metadata), at, targetFramework));
            return this;
        }

        /// <summary>A central <c>PackageVersion</c> item; returns its location through <paramref name="at"/>.</summary>
        public Builder Central(string file, string id, string version, out SourceLocation at, params (string Name, string Value)[] metadata)
        {
            AddImport(file);
            at = Next(file);
            central.Add(new CentralPackageVersion(id, version, Meta(metadata), at));
            return this;
        }

        public Builder ProjectReference(string target, params (string Name, string Value)[] metadata)
        {
            projectReferences.Add(new ProjectReferenceItem(target, Meta(metadata), Next()));
            return this;
        }

        public Builder Pack(string include, string? file, string? packagePath)
        {
            packItems.Add(new PackItem(include, file, packagePath, Next()));
            return this;
        }

        public Builder Unevaluated(string what)
        {
            unevaluated.Add(what);
            return this;
        }

        public ProjectInfo Build() => new(
            path,
            new Dictionary<string, PropertyValue>(properties, StringComparer.OrdinalIgnoreCase),
            new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(StringComparer.OrdinalIgnoreCase),
            references.ToArray(),
            projectReferences.ToArray(),
            packItems.ToArray(),
            central.ToArray(),
            imports.ToArray(),
            unevaluated.ToArray());

        private void AddImport(string file)
        {
            if (!imports.Contains(file))
            {
                imports.Add(file);
            }
        }
    }
}
