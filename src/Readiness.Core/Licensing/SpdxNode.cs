namespace Readiness.Core.Licensing;

/// <summary>A parsed SPDX license expression (SPDX 3.0.1 annex, "SPDX license expressions").</summary>
public abstract record SpdxNode
{
    /// <summary>Every license leaf, left to right.</summary>
    public abstract IEnumerable<License> Licenses { get; }

    /// <summary>A license id, <c>id+</c>, or a <c>[DocumentRef-x:]LicenseRef-y</c>.</summary>
    public sealed record License(string Id, bool OrLater) : SpdxNode
    {
        public bool IsReference => Id.Contains("LicenseRef-", StringComparison.OrdinalIgnoreCase);

        public override IEnumerable<License> Licenses => [this];

        public override string ToString() => OrLater ? Id + "+" : Id;
    }

    /// <summary><c>license WITH addition</c>.</summary>
    public sealed record With(License Subject, string Addition) : SpdxNode
    {
        public override IEnumerable<License> Licenses => [Subject];

        public override string ToString() => $"{Subject} WITH {Addition}";
    }

    /// <summary><c>left AND right</c>: both apply.</summary>
    public sealed record And(SpdxNode Left, SpdxNode Right) : SpdxNode
    {
        public override IEnumerable<License> Licenses => Left.Licenses.Concat(Right.Licenses);

        public override string ToString() => $"({Left} AND {Right})";
    }

    /// <summary><c>left OR right</c>: the recipient chooses.</summary>
    public sealed record Or(SpdxNode Left, SpdxNode Right) : SpdxNode
    {
        public override IEnumerable<License> Licenses => Left.Licenses.Concat(Right.Licenses);

        public override string ToString() => $"({Left} OR {Right})";
    }
}
