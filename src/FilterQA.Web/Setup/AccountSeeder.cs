using System.Globalization;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using Microsoft.AspNetCore.Identity;

namespace FilterQA.Web.Setup;

/// <summary>
/// First-start accounts: the roles, one administrator "admin" with a random one-time password, and (with
/// demo data) the scenario's inspectors with random passwords and badge PINs. Secrets are printed once.
/// </summary>
internal sealed class AccountSeeder(UserManager<FilterQaUser> users, RoleManager<IdentityRole> roles, IPasswordHasher<FilterQaUser> hasher,
    FilterQaDbContext context, SetupConsole console, TimeProvider clock, ILogger<AccountSeeder> log)
{
    public const string AdministratorUserName = "admin";

    internal static readonly DemoPerson[] DemoPeople =
    [
        new("rhaldane", "R. Haldane", RoleNames.Operator, "1001"),
        new("mokafor", "M. Okafor", RoleNames.Operator, "1002"),
        new("jlindqvist", "J. Lindqvist", RoleNames.QualityEngineer, "1003"),
        new("spetrova", "S. Petrova", RoleNames.Approver, "1004"),
    ];

    public async Task EnsureRolesAsync()
    {
        foreach (string role in RoleNames.All)
        {
            if (!await roles.RoleExistsAsync(role).ConfigureAwait(false))
            {
                Check(await roles.CreateAsync(new IdentityRole(role)).ConfigureAwait(false), $"role {role}");
            }
        }
    }

    public async Task EnsureAdministratorAsync(CancellationToken cancellationToken)
    {
        if (await SetupSteps.IsDoneAsync(context, SetupSteps.Administrator, cancellationToken).ConfigureAwait(false))
        {
            return;
        }
        if (await users.FindByNameAsync(AdministratorUserName).ConfigureAwait(false) is null)
        {
            string password = OneTimeSecret.Password();
            var admin = new FilterQaUser { UserName = AdministratorUserName, DisplayName = "Administrator", MustChangePassword = true };
            Check(await users.CreateAsync(admin, password).ConfigureAwait(false), "the administrator account");
            Check(await users.AddToRoleAsync(admin, RoleNames.Administrator).ConfigureAwait(false), "the administrator role");
            await console.Out.WriteLineAsync($"""

                FilterQA first start: administrator account created.
                  user name: {AdministratorUserName}
                  one-time password: {password}
                This password is shown this once and is marked to be changed; note it now.

                """).ConfigureAwait(false);
            await console.Out.FlushAsync(cancellationToken).ConfigureAwait(false);
            log.LogWarning("First start: created administrator {UserName} with a one-time password (printed once to the console, not logged)", AdministratorUserName);
        }
        await SetupSteps.MarkDoneAsync(context, SetupSteps.Administrator, clock, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The demo inspectors, with their accounts' ids for the demo records.</summary>
    public async Task<IReadOnlyDictionary<string, FilterQaUser>> EnsureDemoPeopleAsync(CancellationToken cancellationToken)
    {
        bool done = await SetupSteps.IsDoneAsync(context, SetupSteps.DemoAccounts, cancellationToken).ConfigureAwait(false);
        var created = new List<(DemoPerson Person, string Password, string Pin)>();
        var found = new Dictionary<string, FilterQaUser>(StringComparer.Ordinal);
        foreach (DemoPerson person in DemoPeople)
        {
            FilterQaUser? user = await users.FindByNameAsync(person.UserName).ConfigureAwait(false);
            if (user is null && !done)
            {
                string password = OneTimeSecret.Password(), pin = OneTimeSecret.Pin();
                user = new FilterQaUser { UserName = person.UserName, DisplayName = person.DisplayName, BadgeNumber = person.Badge, MustChangePassword = true };
                user.PinHash = hasher.HashPassword(user, pin);
                Check(await users.CreateAsync(user, password).ConfigureAwait(false), $"the demo account {person.UserName}");
                Check(await users.AddToRoleAsync(user, person.Role).ConfigureAwait(false), $"the role of {person.UserName}");
                created.Add((person, password, pin));
            }
            if (user is not null)
            {
                found[person.UserName] = user;
            }
        }
        if (created.Count > 0)
        {
            var text = new System.Text.StringBuilder();
            text.AppendLine().AppendLine("FilterQA first start: demo accounts (invented people) created; shown this once.");
            text.AppendLine("  user name     name           role              badge  PIN     one-time password");
            foreach ((DemoPerson p, string password, string pin) in created)
            {
                text.AppendLine(CultureInfo.InvariantCulture, $"  {p.UserName,-13} {p.DisplayName,-14} {p.Role,-17} {p.Badge,-6} {pin,-7} {password}");
            }
            await console.Out.WriteLineAsync(text.ToString()).ConfigureAwait(false);
            await console.Out.FlushAsync(cancellationToken).ConfigureAwait(false);
            log.LogWarning("First start: created {Count} demo accounts (passwords and PINs printed once to the console, not logged)", created.Count);
        }
        if (!done)
        {
            await SetupSteps.MarkDoneAsync(context, SetupSteps.DemoAccounts, clock, cancellationToken).ConfigureAwait(false);
        }
        return found;
    }

    private static void Check(IdentityResult result, string what)
    {
        if (!result.Succeeded)
        {
            throw new InvalidOperationException($"first start could not create {what}: {string.Join("; ", result.Errors.Select(e => e.Description))}");
        }
    }
}
