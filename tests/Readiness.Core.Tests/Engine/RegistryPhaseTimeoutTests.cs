using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Tests.Checks.Registry;

namespace Readiness.Core.Tests.Engine;

public class RegistryPhaseTimeoutTests
{
    [Fact]
    public void NoSetting_KeepsTheFallback()
    {
        Assert.Equal(TimeSpan.FromSeconds(10), RegistryPhase.TimeoutFrom(RepositoryConfig.Empty, TimeSpan.FromSeconds(10)));
    }

    [Theory]
    [InlineData("registry-timeout: 2.5\n", 2.5)]
    [InlineData("registry-timeout: 4s\n", 4)]
    [InlineData("registry-timeout: 0.01\n", 1)]
    [InlineData("registry-timeout: 600\n", 60)]
    public void Setting_IsReadWithinBounds(string yaml, double seconds)
    {
        var config = RegistryCheckContexts.Config(yaml);

        Assert.Equal(TimeSpan.FromSeconds(seconds), RegistryPhase.TimeoutFrom(config, TimeSpan.FromSeconds(10)));
    }

    [Fact]
    public void NotANumber_IsAConfigurationErrorWithItsLine()
    {
        var config = RegistryCheckContexts.Config("checklist: library\nregistry-timeout: soon\n");

        var error = Assert.Throws<ConfigurationException>(() => RegistryPhase.TimeoutFrom(config, TimeSpan.FromSeconds(10)));

        Assert.Equal(2, error.Mark.Line);
    }

    [Theory]
    [InlineData(null, "", 10)]
    [InlineData(null, "registry-timeout: 4\n", 4)]
    [InlineData(2.0, "registry-timeout: 4\n", 2)]
    [InlineData(300.0, "", 60)]
    [InlineData(0.2, "", 1)]
    public void CommandLine_BeatsTheRepositoryFile_WhichBeatsTheDefault_AllWithinOneBound(double? given, string yaml, double seconds)
    {
        var config = yaml.Length == 0 ? RepositoryConfig.Empty : RegistryCheckContexts.Config(yaml);
        var explicitTimeout = given is { } g ? TimeSpan.FromSeconds(g) : (TimeSpan?)null;

        Assert.Equal(TimeSpan.FromSeconds(seconds), RegistryPhase.Resolve(explicitTimeout, config));
    }
}
