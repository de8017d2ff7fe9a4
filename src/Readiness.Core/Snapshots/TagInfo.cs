namespace Readiness.Core.Snapshots;

/// <summary>A git tag as read from the repository.</summary>
/// <param name="Name">Short name, e.g. <c>v2.4.0</c>.</param>
/// <param name="TargetCommit">The commit the tag (peeled) points at.</param>
/// <param name="IsAnnotated">True for a tag object; false for a lightweight tag.</param>
/// <param name="TaggerDate">The tagger date of an annotated tag.</param>
/// <param name="Tagger">The tagger's name and address of an annotated tag.</param>
/// <param name="Message">The tag message without its signature block.</param>
/// <param name="Signature">The signature block, when the tag carries one.</param>
public sealed record TagInfo(
    string Name,
    string TargetCommit,
    bool IsAnnotated,
    DateTimeOffset? TaggerDate,
    string? Tagger,
    string? Message,
    SignatureBlock? Signature);
