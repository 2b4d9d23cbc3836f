using System.IO.Compression;
using System.Reflection;
using System.Xml.Linq;

namespace Integrable.Tests.Packaging;

/// <summary>Packs the library as CI built it, installs the package into a throw-away console project
/// from a local folder feed, builds and runs that project (proves the package works, not only the
/// project reference).</summary>
public sealed class PackageTests : IDisposable
{
    private readonly string _work = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "integrable-package-" + Guid.NewGuid().ToString("N")[..12])).FullName;

    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(180);

    private static string Version =>
        typeof(Integrable.Numbers.Rational).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()!.InformationalVersion.Split('+')[0];

    public void Dispose()
    {
        try { Directory.Delete(_work, recursive: true); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }

    private string Pack(string project)
    {
        string feed = Path.Combine(_work, "feed");
        var (code, output) = DotnetProcess.Run(DotnetProcess.RepositoryRoot, Limit,
            "pack", Path.Combine("src", project, project + ".csproj"), "-c", DotnetProcess.Configuration, "--no-build", "-o", feed, "--disable-build-servers");
        Assert.True(code == 0, "dotnet pack failed:\n" + output);
        return feed;
    }

    [Fact]
    public void Package_InstalledFromLocalFeed_RunsAComputation()
    {
        string feed = Pack("Integrable");
        string id = $"Integrable.{Version}";
        Assert.True(File.Exists(Path.Combine(feed, id + ".nupkg")));
        Assert.True(File.Exists(Path.Combine(feed, id + ".snupkg")));
        using (var zip = ZipFile.OpenRead(Path.Combine(feed, id + ".nupkg")))
        {
            var names = zip.Entries.Select(e => e.FullName).ToHashSet();
            Assert.Contains("lib/net10.0/Integrable.dll", names);
            Assert.Contains("lib/net10.0/Integrable.xml", names);
            Assert.Contains("README.md", names);
            var nuspec = XDocument.Load(zip.Entries.Single(e => e.FullName.EndsWith(".nuspec", StringComparison.Ordinal)).Open());
            Assert.Equal("MIT", nuspec.Descendants().Single(e => e.Name.LocalName == "license").Value);
            Assert.Equal(Version, nuspec.Descendants().Single(e => e.Name.LocalName == "version").Value);
        }

        string app = Directory.CreateDirectory(Path.Combine(_work, "app")).FullName;
        // stop MSBuild from looking for Directory.Build.* files above the temporary folder
        File.WriteAllText(Path.Combine(app, "Directory.Build.props"), "<Project />");
        File.WriteAllText(Path.Combine(app, "Directory.Build.targets"), "<Project />");
        // the local feed is added to the machine's sources (no <clear/>), which serve everything else
        File.WriteAllText(Path.Combine(app, "nuget.config"), $"""
            <?xml version="1.0" encoding="utf-8"?>
            <configuration>
              <packageSources>
                <add key="integrable-local" value="{feed}" />
              </packageSources>
            </configuration>
            """);
        // a private package folder, so a stale copy of the same version in the user's cache is never used
        File.WriteAllText(Path.Combine(app, "App.csproj"), $"""
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <OutputType>Exe</OutputType>
                <TargetFramework>net10.0</TargetFramework>
                <Nullable>enable</Nullable>
                <ImplicitUsings>enable</ImplicitUsings>
                <RestorePackagesPath>{Path.Combine(_work, "packages")}</RestorePackagesPath>
              </PropertyGroup>
              <ItemGroup>
                <PackageReference Include="Integrable" Version="{Version}" />
              </ItemGroup>
            </Project>
            """);
        File.WriteAllText(Path.Combine(app, "Program.cs"), """
            using Integrable.Algebra;
            using Integrable.Numbers;
            using Integrable.Polynomials;
            using Integrable.Recursions;

            var rule = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1");
            var terms = rule.Iterate(RationalField.Instance, new[] { Rational.One, Rational.One }, 4);
            Console.WriteLine("terms: " + string.Join(", ", terms));
            var ring = new LaurentPolynomialRing("x");
            var p = LaurentPolynomial.Parse(ring, "x + 1/x");
            Console.WriteLine("square: " + (p * p));
            """);
        var (code, output) = DotnetProcess.Run(app, Limit, "build", "-c", "Release", "--disable-build-servers", "-nologo");
        Assert.True(code == 0, "building the consumer failed:\n" + output);
        (code, output) = DotnetProcess.Run(app, Limit, Path.Combine(app, "bin", "Release", "net10.0", "App.dll"));
        Assert.True(code == 0, "running the consumer failed:\n" + output);
        // 1, 1, 5, 41, 361, 3205: worked out by hand from the rule (x_4 = (41^2 + 3*41 + 1)/5 = 1805/5, x_5 = 131405/41)
        Assert.Contains("terms: 1, 1, 5, 41, 361, 3205", output);
        Assert.Contains("square: x^2 + 2 + x^-2", output);
        // the assembly came from the package (the dependency manifest says so), restored into the private folder
        var deps = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Path.Combine(app, "bin", "Release", "net10.0", "App.deps.json")));
        Assert.Equal("package", deps.RootElement.GetProperty("libraries").GetProperty($"Integrable/{Version}").GetProperty("type").GetString());
        Assert.True(File.Exists(Path.Combine(_work, "packages", "integrable", Version.ToLowerInvariant(), "lib", "net10.0", "Integrable.dll")));
    }

    [Fact]
    public void NotebooksPackage_Packed_ShipsKernelExtensionAndDependsOnTheLibrary()
    {
        string feed = Pack("Integrable.Notebooks");
        string id = $"Integrable.Notebooks.{Version}";
        Assert.True(File.Exists(Path.Combine(feed, id + ".snupkg")));
        using var zip = ZipFile.OpenRead(Path.Combine(feed, id + ".nupkg"));
        var names = zip.Entries.Select(e => e.FullName).ToHashSet();
        Assert.Contains("lib/net10.0/Integrable.Notebooks.dll", names);
        Assert.Contains("lib/net10.0/Integrable.Notebooks.xml", names);
        Assert.Contains("interactive-extensions/dotnet/Integrable.Notebooks.dll", names);
        Assert.Contains("interactive-extensions/dotnet/extension.dib", names);
        var nuspec = XDocument.Load(zip.Entries.Single(e => e.FullName.EndsWith(".nuspec", StringComparison.Ordinal)).Open());
        var dependency = nuspec.Descendants().Single(e => e.Name.LocalName == "dependency" && (string?)e.Attribute("id") == "Integrable");
        Assert.Equal(Version, (string?)dependency.Attribute("version"));
    }
}
