using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace FilterQA.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class Initial : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "AspNetRoles",
                columns: table => new
                {
                    Id = table.Column<string>(type: "text", nullable: false),
                    Name = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    ConcurrencyStamp = table.Column<string>(type: "text", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetRoles", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUsers",
                columns: table => new
                {
                    Id = table.Column<string>(type: "text", nullable: false),
                    DisplayName = table.Column<string>(type: "text", nullable: false),
                    BadgeNumber = table.Column<string>(type: "text", nullable: false),
                    UserName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedUserName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    Email = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedEmail = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    EmailConfirmed = table.Column<bool>(type: "boolean", nullable: false),
                    PasswordHash = table.Column<string>(type: "text", nullable: true),
                    SecurityStamp = table.Column<string>(type: "text", nullable: true),
                    ConcurrencyStamp = table.Column<string>(type: "text", nullable: true),
                    PhoneNumber = table.Column<string>(type: "text", nullable: true),
                    PhoneNumberConfirmed = table.Column<bool>(type: "boolean", nullable: false),
                    TwoFactorEnabled = table.Column<bool>(type: "boolean", nullable: false),
                    LockoutEnd = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    LockoutEnabled = table.Column<bool>(type: "boolean", nullable: false),
                    AccessFailedCount = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUsers", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "parts",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    PartNumber = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Description = table.Column<string>(type: "character varying(400)", maxLength: 400, nullable: false),
                    DeviceKind = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    MaxRetests = table.Column<int>(type: "integer", nullable: false),
                    RetestCounts = table.Column<bool>(type: "boolean", nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_parts", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "stations",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    Name = table.Column<string>(type: "character varying(80)", maxLength: 80, nullable: false),
                    Description = table.Column<string>(type: "character varying(400)", maxLength: 400, nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_stations", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AspNetRoleClaims",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    RoleId = table.Column<string>(type: "text", nullable: false),
                    ClaimType = table.Column<string>(type: "text", nullable: true),
                    ClaimValue = table.Column<string>(type: "text", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetRoleClaims", x => x.Id);
                    table.ForeignKey(
                        name: "FK_AspNetRoleClaims_AspNetRoles_RoleId",
                        column: x => x.RoleId,
                        principalTable: "AspNetRoles",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserClaims",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    UserId = table.Column<string>(type: "text", nullable: false),
                    ClaimType = table.Column<string>(type: "text", nullable: true),
                    ClaimValue = table.Column<string>(type: "text", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserClaims", x => x.Id);
                    table.ForeignKey(
                        name: "FK_AspNetUserClaims_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserLogins",
                columns: table => new
                {
                    LoginProvider = table.Column<string>(type: "text", nullable: false),
                    ProviderKey = table.Column<string>(type: "text", nullable: false),
                    ProviderDisplayName = table.Column<string>(type: "text", nullable: true),
                    UserId = table.Column<string>(type: "text", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserLogins", x => new { x.LoginProvider, x.ProviderKey });
                    table.ForeignKey(
                        name: "FK_AspNetUserLogins_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserRoles",
                columns: table => new
                {
                    UserId = table.Column<string>(type: "text", nullable: false),
                    RoleId = table.Column<string>(type: "text", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserRoles", x => new { x.UserId, x.RoleId });
                    table.ForeignKey(
                        name: "FK_AspNetUserRoles_AspNetRoles_RoleId",
                        column: x => x.RoleId,
                        principalTable: "AspNetRoles",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                    table.ForeignKey(
                        name: "FK_AspNetUserRoles_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserTokens",
                columns: table => new
                {
                    UserId = table.Column<string>(type: "text", nullable: false),
                    LoginProvider = table.Column<string>(type: "text", nullable: false),
                    Name = table.Column<string>(type: "text", nullable: false),
                    Value = table.Column<string>(type: "text", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserTokens", x => new { x.UserId, x.LoginProvider, x.Name });
                    table.ForeignKey(
                        name: "FK_AspNetUserTokens_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "template_revisions",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    PartId = table.Column<long>(type: "bigint", nullable: false),
                    Revision = table.Column<int>(type: "integer", nullable: false),
                    Status = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Text = table.Column<string>(type: "text", nullable: false),
                    ContentHash = table.Column<string>(type: "character varying(71)", maxLength: 71, nullable: false),
                    DecisionRule = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Author = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    ReleaseDate = table.Column<DateOnly>(type: "date", nullable: true),
                    RegisteredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    RegisteredBy = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    ReleasedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    ReleasedBy = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    WithdrawnAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    WithdrawnBy = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_template_revisions", x => x.Id);
                    table.ForeignKey(
                        name: "FK_template_revisions_parts_PartId",
                        column: x => x.PartId,
                        principalTable: "parts",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "thru_references",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    StationId = table.Column<long>(type: "bigint", nullable: false),
                    MeasuredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    OperatorId = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    OperatorName = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    FlatnessDb = table.Column<double>(type: "double precision", nullable: false),
                    Sweep_FileName = table.Column<string>(type: "character varying(260)", maxLength: 260, nullable: false),
                    Sweep_Format = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Sweep_Path = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Sweep_PointCount = table.Column<int>(type: "integer", nullable: false),
                    Sweep_RawCompressed = table.Column<byte[]>(type: "bytea", nullable: false),
                    Sweep_RawLength = table.Column<long>(type: "bigint", nullable: false),
                    Sweep_RawSha256 = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Sweep_StartHz = table.Column<double>(type: "double precision", nullable: false),
                    Sweep_StopHz = table.Column<double>(type: "double precision", nullable: false),
                    Sweep_Trace = table.Column<byte[]>(type: "bytea", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_thru_references", x => x.Id);
                    table.ForeignKey(
                        name: "FK_thru_references_stations_StationId",
                        column: x => x.StationId,
                        principalTable: "stations",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "lots",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    LotNumber = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    PartId = table.Column<long>(type: "bigint", nullable: false),
                    TemplateRevisionId = table.Column<long>(type: "bigint", nullable: false),
                    Supplier = table.Column<string>(type: "character varying(120)", maxLength: 120, nullable: false),
                    SupplierLot = table.Column<string>(type: "character varying(120)", maxLength: 120, nullable: true),
                    DateCode = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    QuantityReceived = table.Column<int>(type: "integer", nullable: false),
                    PurchaseOrder = table.Column<string>(type: "character varying(80)", maxLength: 80, nullable: true),
                    Customer = table.Column<string>(type: "character varying(120)", maxLength: 120, nullable: true),
                    Status = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    CreatedBy = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    SampleDecision = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    DispositionAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    DispositionBy = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    DispositionReason = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true),
                    DispositionIsOverride = table.Column<bool>(type: "boolean", nullable: false),
                    HoldReason = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true),
                    Version = table.Column<int>(type: "integer", nullable: false),
                    Counters_Defectives = table.Column<int>(type: "integer", nullable: false),
                    Counters_FirstPassGo = table.Column<int>(type: "integer", nullable: false),
                    Counters_Go = table.Column<int>(type: "integer", nullable: false),
                    Counters_Measurements = table.Column<int>(type: "integer", nullable: false),
                    Counters_NoGo = table.Column<int>(type: "integer", nullable: false),
                    Counters_NotVerifiable = table.Column<int>(type: "integer", nullable: false),
                    Counters_UnitsRetested = table.Column<int>(type: "integer", nullable: false),
                    Counters_UnitsTested = table.Column<int>(type: "integer", nullable: false),
                    Plan_AcceptanceNumber = table.Column<int>(type: "integer", nullable: false),
                    Plan_AqlPercent = table.Column<double>(type: "double precision", nullable: true),
                    Plan_Confidence = table.Column<double>(type: "double precision", nullable: true),
                    Plan_IsFullInspection = table.Column<bool>(type: "boolean", nullable: false),
                    Plan_Kind = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Plan_LetterUsed = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Plan_Level = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Plan_LotSize = table.Column<int>(type: "integer", nullable: false),
                    Plan_LtpdFraction = table.Column<double>(type: "double precision", nullable: true),
                    Plan_RejectionNumber = table.Column<int>(type: "integer", nullable: false),
                    Plan_SampleSize = table.Column<int>(type: "integer", nullable: false),
                    Plan_Severity = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Plan_SeverityReason = table.Column<string>(type: "character varying(1000)", maxLength: 1000, nullable: false),
                    Plan_StandardName = table.Column<string>(type: "character varying(120)", maxLength: 120, nullable: false),
                    Plan_TableLetter = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Plan_TableSampleSize = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_lots", x => x.Id);
                    table.ForeignKey(
                        name: "FK_lots_parts_PartId",
                        column: x => x.PartId,
                        principalTable: "parts",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_lots_template_revisions_TemplateRevisionId",
                        column: x => x.TemplateRevisionId,
                        principalTable: "template_revisions",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "audit_entries",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    At = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    ActorId = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    ActorName = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    Action = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Subject = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    SubjectKey = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    LotId = table.Column<long>(type: "bigint", nullable: true),
                    Detail = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Reason = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_audit_entries", x => x.Id);
                    table.ForeignKey(
                        name: "FK_audit_entries_lots_LotId",
                        column: x => x.LotId,
                        principalTable: "lots",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "measurements",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    UnitId = table.Column<long>(type: "bigint", nullable: false),
                    LotId = table.Column<long>(type: "bigint", nullable: false),
                    Attempt = table.Column<int>(type: "integer", nullable: false),
                    SupersedesMeasurementId = table.Column<long>(type: "bigint", nullable: true),
                    CountsForLot = table.Column<bool>(type: "boolean", nullable: false),
                    TemplateRevisionId = table.Column<long>(type: "bigint", nullable: false),
                    TemplateHash = table.Column<string>(type: "character varying(71)", maxLength: 71, nullable: false),
                    StationId = table.Column<long>(type: "bigint", nullable: false),
                    ThruReferenceId = table.Column<long>(type: "bigint", nullable: true),
                    OperatorId = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    OperatorName = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    MeasuredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    StoredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Verdict = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Warnings = table.Column<string>(type: "text", nullable: false),
                    RetestReason = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true),
                    IdempotencyKey = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: true),
                    Sweep_FileName = table.Column<string>(type: "character varying(260)", maxLength: 260, nullable: false),
                    Sweep_Format = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Sweep_Path = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Sweep_PointCount = table.Column<int>(type: "integer", nullable: false),
                    Sweep_RawCompressed = table.Column<byte[]>(type: "bytea", nullable: false),
                    Sweep_RawLength = table.Column<long>(type: "bigint", nullable: false),
                    Sweep_RawSha256 = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Sweep_StartHz = table.Column<double>(type: "double precision", nullable: false),
                    Sweep_StopHz = table.Column<double>(type: "double precision", nullable: false),
                    Sweep_Trace = table.Column<byte[]>(type: "bytea", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_measurements", x => x.Id);
                    table.ForeignKey(
                        name: "FK_measurements_lots_LotId",
                        column: x => x.LotId,
                        principalTable: "lots",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_measurements_measurements_SupersedesMeasurementId",
                        column: x => x.SupersedesMeasurementId,
                        principalTable: "measurements",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_measurements_stations_StationId",
                        column: x => x.StationId,
                        principalTable: "stations",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_measurements_template_revisions_TemplateRevisionId",
                        column: x => x.TemplateRevisionId,
                        principalTable: "template_revisions",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_measurements_thru_references_ThruReferenceId",
                        column: x => x.ThruReferenceId,
                        principalTable: "thru_references",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "rule_results",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    MeasurementId = table.Column<long>(type: "bigint", nullable: false),
                    Ordinal = table.Column<int>(type: "integer", nullable: false),
                    RuleId = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Kind = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Title = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    Unit = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    MeasuredValue = table.Column<double>(type: "double precision", nullable: true),
                    LimitValue = table.Column<double>(type: "double precision", nullable: true),
                    Sense = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Margin = table.Column<double>(type: "double precision", nullable: true),
                    GuardBand = table.Column<double>(type: "double precision", nullable: false),
                    Outcome = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    IsLowerBound = table.Column<bool>(type: "boolean", nullable: false),
                    AtHz = table.Column<double>(type: "double precision", nullable: true),
                    Message = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_rule_results", x => x.Id);
                    table.ForeignKey(
                        name: "FK_rule_results_measurements_MeasurementId",
                        column: x => x.MeasurementId,
                        principalTable: "measurements",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "units",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    LotId = table.Column<long>(type: "bigint", nullable: false),
                    Serial = table.Column<string>(type: "character varying(80)", maxLength: 80, nullable: false),
                    SamplePosition = table.Column<int>(type: "integer", nullable: false),
                    Attempts = table.Column<int>(type: "integer", nullable: false),
                    FirstVerdict = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    LatestVerdict = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    CountedVerdict = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    CountedMeasurementId = table.Column<long>(type: "bigint", nullable: true),
                    LatestMeasurementId = table.Column<long>(type: "bigint", nullable: true),
                    FirstTestedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    LastTestedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Version = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_units", x => x.Id);
                    table.ForeignKey(
                        name: "FK_units_lots_LotId",
                        column: x => x.LotId,
                        principalTable: "lots",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_units_measurements_CountedMeasurementId",
                        column: x => x.CountedMeasurementId,
                        principalTable: "measurements",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_units_measurements_LatestMeasurementId",
                        column: x => x.LatestMeasurementId,
                        principalTable: "measurements",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "IX_AspNetRoleClaims_RoleId",
                table: "AspNetRoleClaims",
                column: "RoleId");

            migrationBuilder.CreateIndex(
                name: "RoleNameIndex",
                table: "AspNetRoles",
                column: "NormalizedName",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserClaims_UserId",
                table: "AspNetUserClaims",
                column: "UserId");

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserLogins_UserId",
                table: "AspNetUserLogins",
                column: "UserId");

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserRoles_RoleId",
                table: "AspNetUserRoles",
                column: "RoleId");

            migrationBuilder.CreateIndex(
                name: "EmailIndex",
                table: "AspNetUsers",
                column: "NormalizedEmail");

            migrationBuilder.CreateIndex(
                name: "UserNameIndex",
                table: "AspNetUsers",
                column: "NormalizedUserName",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_audit_entries_At",
                table: "audit_entries",
                column: "At");

            migrationBuilder.CreateIndex(
                name: "IX_audit_entries_LotId_At",
                table: "audit_entries",
                columns: new[] { "LotId", "At" });

            migrationBuilder.CreateIndex(
                name: "IX_lots_CreatedAt",
                table: "lots",
                column: "CreatedAt");

            migrationBuilder.CreateIndex(
                name: "IX_lots_LotNumber",
                table: "lots",
                column: "LotNumber",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_lots_PartId_CreatedAt",
                table: "lots",
                columns: new[] { "PartId", "CreatedAt" });

            migrationBuilder.CreateIndex(
                name: "IX_lots_PartId_Supplier_DispositionAt",
                table: "lots",
                columns: new[] { "PartId", "Supplier", "DispositionAt" });

            migrationBuilder.CreateIndex(
                name: "IX_lots_Status_CreatedAt",
                table: "lots",
                columns: new[] { "Status", "CreatedAt" });

            migrationBuilder.CreateIndex(
                name: "IX_lots_Supplier_CreatedAt",
                table: "lots",
                columns: new[] { "Supplier", "CreatedAt" });

            migrationBuilder.CreateIndex(
                name: "IX_lots_TemplateRevisionId",
                table: "lots",
                column: "TemplateRevisionId");

            migrationBuilder.CreateIndex(
                name: "IX_measurements_IdempotencyKey",
                table: "measurements",
                column: "IdempotencyKey",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_measurements_LotId_UnitId",
                table: "measurements",
                columns: new[] { "LotId", "UnitId" });

            migrationBuilder.CreateIndex(
                name: "IX_measurements_StationId_MeasuredAt",
                table: "measurements",
                columns: new[] { "StationId", "MeasuredAt" });

            migrationBuilder.CreateIndex(
                name: "IX_measurements_SupersedesMeasurementId",
                table: "measurements",
                column: "SupersedesMeasurementId",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_measurements_TemplateRevisionId",
                table: "measurements",
                column: "TemplateRevisionId");

            migrationBuilder.CreateIndex(
                name: "IX_measurements_ThruReferenceId",
                table: "measurements",
                column: "ThruReferenceId");

            migrationBuilder.CreateIndex(
                name: "IX_measurements_UnitId_Attempt",
                table: "measurements",
                columns: new[] { "UnitId", "Attempt" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_parts_PartNumber",
                table: "parts",
                column: "PartNumber",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_rule_results_MeasurementId_Ordinal",
                table: "rule_results",
                columns: new[] { "MeasurementId", "Ordinal" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_stations_Name",
                table: "stations",
                column: "Name",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_template_revisions_ContentHash",
                table: "template_revisions",
                column: "ContentHash");

            migrationBuilder.CreateIndex(
                name: "IX_template_revisions_PartId_Revision",
                table: "template_revisions",
                columns: new[] { "PartId", "Revision" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_thru_references_StationId_MeasuredAt",
                table: "thru_references",
                columns: new[] { "StationId", "MeasuredAt" });

            migrationBuilder.CreateIndex(
                name: "IX_units_CountedMeasurementId",
                table: "units",
                column: "CountedMeasurementId");

            migrationBuilder.CreateIndex(
                name: "IX_units_LatestMeasurementId",
                table: "units",
                column: "LatestMeasurementId");

            migrationBuilder.CreateIndex(
                name: "IX_units_LotId_SamplePosition",
                table: "units",
                columns: new[] { "LotId", "SamplePosition" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_units_LotId_Serial",
                table: "units",
                columns: new[] { "LotId", "Serial" },
                unique: true);

            migrationBuilder.AddForeignKey(
                name: "FK_measurements_units_UnitId",
                table: "measurements",
                column: "UnitId",
                principalTable: "units",
                principalColumn: "Id",
                onDelete: ReferentialAction.Restrict);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropForeignKey(
                name: "FK_measurements_lots_LotId",
                table: "measurements");

            migrationBuilder.DropForeignKey(
                name: "FK_units_lots_LotId",
                table: "units");

            migrationBuilder.DropForeignKey(
                name: "FK_template_revisions_parts_PartId",
                table: "template_revisions");

            migrationBuilder.DropForeignKey(
                name: "FK_measurements_template_revisions_TemplateRevisionId",
                table: "measurements");

            migrationBuilder.DropForeignKey(
                name: "FK_measurements_stations_StationId",
                table: "measurements");

            migrationBuilder.DropForeignKey(
                name: "FK_thru_references_stations_StationId",
                table: "thru_references");

            migrationBuilder.DropForeignKey(
                name: "FK_measurements_thru_references_ThruReferenceId",
                table: "measurements");

            migrationBuilder.DropForeignKey(
                name: "FK_measurements_units_UnitId",
                table: "measurements");

            migrationBuilder.DropTable(
                name: "AspNetRoleClaims");

            migrationBuilder.DropTable(
                name: "AspNetUserClaims");

            migrationBuilder.DropTable(
                name: "AspNetUserLogins");

            migrationBuilder.DropTable(
                name: "AspNetUserRoles");

            migrationBuilder.DropTable(
                name: "AspNetUserTokens");

            migrationBuilder.DropTable(
                name: "audit_entries");

            migrationBuilder.DropTable(
                name: "rule_results");

            migrationBuilder.DropTable(
                name: "AspNetRoles");

            migrationBuilder.DropTable(
                name: "AspNetUsers");

            migrationBuilder.DropTable(
                name: "lots");

            migrationBuilder.DropTable(
                name: "parts");

            migrationBuilder.DropTable(
                name: "template_revisions");

            migrationBuilder.DropTable(
                name: "stations");

            migrationBuilder.DropTable(
                name: "thru_references");

            migrationBuilder.DropTable(
                name: "units");

            migrationBuilder.DropTable(
                name: "measurements");
        }
    }
}
