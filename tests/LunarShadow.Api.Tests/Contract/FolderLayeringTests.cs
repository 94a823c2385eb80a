using System.Text.RegularExpressions;

namespace LunarShadow.Api.Tests.Contract;

/// <summary>
/// The API's folders depend one way only (DEVELOPERS.md): features → Common → Validation → Formatting, Hosting wires
/// them all, and feature folders never use each other. Read from the source text, so a stray using fails here.
/// </summary>
public partial class FolderLayeringTests
{
    private static readonly string[] Features = ["Eclipses", "Ephemeris", "Sites", "Photography", "Craters", "Observations"];

    // What each folder may use, besides itself.
    private static readonly Dictionary<string, string[]> Allowed = new()
    {
        ["Formatting"] = [],
        ["Validation"] = ["Formatting"],
        ["Common"] = ["Validation", "Formatting"],
        ["Eclipses"] = ["Common", "Validation", "Formatting"],
        ["Ephemeris"] = ["Common", "Validation", "Formatting"],
        ["Sites"] = ["Common", "Validation", "Formatting"],
        ["Photography"] = ["Common", "Validation", "Formatting"],
        ["Craters"] = ["Common", "Validation", "Formatting"],
        ["Observations"] = ["Common", "Validation", "Formatting"],
        ["Hosting"] = ["Common", "Validation", "Formatting", .. Features],
    };

    [Fact]
    public void Api_folders_depend_one_way_and_features_meet_only_through_common_seams()
    {
        var root = Path.Combine(RepositoryRoot(), "src", "LunarShadow.Api");
        var violations = new List<string>();
        var files = 0;
        foreach (var (folder, allowed) in Allowed)
        {
            foreach (var file in Directory.GetFiles(Path.Combine(root, folder), "*.cs", SearchOption.AllDirectories))
            {
                files++;
                var text = File.ReadAllText(file);
                foreach (Match m in ApiReference().Matches(text))
                {
                    var used = m.Groups["folder"].Value;
                    if (used != folder && !allowed.Contains(used)) violations.Add($"{Path.GetRelativePath(root, file)} uses {used}");
                }
            }
        }
        Assert.True(files > 40, $"only {files} files read");
        Assert.Empty(violations);
    }

    private static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LunarShadow.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("LunarShadow.sln not found above the test output.");
    }

    // "using LunarShadow.Api.X", or a partly qualified "X.Type" reference (the form that once hid a cycle).
    [GeneratedRegex(@"LunarShadow\.Api\.(?<folder>Formatting|Validation|Common|Eclipses|Ephemeris|Sites|Photography|Craters|Observations|Hosting)\b|(?<![\w.])(?<folder>Formatting|Validation|Common|Eclipses|Ephemeris|Sites|Photography|Craters|Observations|Hosting)\.[A-Z]")]
    private static partial Regex ApiReference();
}
