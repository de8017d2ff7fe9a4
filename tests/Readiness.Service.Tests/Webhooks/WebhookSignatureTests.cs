using System.Text;
using Readiness.Service.Webhooks;

namespace Readiness.Service.Tests.Webhooks;

public sealed class WebhookSignatureTests
{
    // GitHub docs, "Validating webhook deliveries", test values (standards.md oracle 8).
    private const string Secret = "It's a Secret to Everybody";
    private const string Payload = "Hello, World!";
    private const string Expected = "sha256=757107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e17";

    [Fact]
    public void PublishedTestVector_ComputesPublishedSignature() =>
        Assert.Equal(Expected, WebhookSignature.Compute(Secret, Encoding.UTF8.GetBytes(Payload)));

    [Fact]
    public void PublishedTestVector_Verifies() =>
        Assert.True(WebhookSignature.Verify(Secret, Encoding.UTF8.GetBytes(Payload), Expected));

    [Fact]
    public void UppercaseHex_Verifies() =>
        Assert.True(WebhookSignature.Verify(Secret, Encoding.UTF8.GetBytes(Payload), "sha256=" + Expected["sha256=".Length..].ToUpperInvariant()));

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("757107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e17")]
    [InlineData("sha1=757107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e17")]
    [InlineData("sha256=757107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e18")]
    [InlineData("sha256=757107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e1")]
    [InlineData("sha256=zz7107ea0eb2509fc211221cce984b8a37570b6d7586c22c46f4379c8b043e17")]
    public void MissingMalformedOrWrongSignature_IsRefused(string? header) =>
        Assert.False(WebhookSignature.Verify(Secret, Encoding.UTF8.GetBytes(Payload), header));

    [Fact]
    public void OtherBody_IsRefused() =>
        Assert.False(WebhookSignature.Verify(Secret, Encoding.UTF8.GetBytes(Payload + " "), Expected));

    [Fact]
    public void OtherSecret_IsRefused() =>
        Assert.False(WebhookSignature.Verify("another secret", Encoding.UTF8.GetBytes(Payload), Expected));
}
