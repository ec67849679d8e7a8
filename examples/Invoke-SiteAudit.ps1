<#
.SYNOPSIS
    Audits an inventory at the stations of a site: by default the Marrowby Heath Field Laboratory (an invented site).
.DESCRIPTION
    Reads the site file (-SitePath, read as data by Import-HazardSite) and the inventory (-InventoryPath, a CSV
    whose Station column names where each item is used), assesses every row at its station with
    Test-InductionHazard -Site, and writes two files to -OutputDirectory: <name>-audit.csv (one row per item, for
    further processing) and <name>-audit.md (the report). Rows that cannot be assessed are listed in the report
    with the reason; the audit goes on without them.
.EXAMPLE
    ./examples/Invoke-SiteAudit.ps1 -OutputDirectory ./out/demo
.EXAMPLE
    ./examples/Invoke-SiteAudit.ps1 -SitePath ./my-site.psd1 -InventoryPath ./my-inventory.csv -Name my-site
#>
[CmdletBinding()]
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'),
    [string] $OutputDirectory = (Join-Path $PSScriptRoot '../out/demo'),
    [string] $SitePath = (Join-Path $PSScriptRoot 'marrowby-heath-site.psd1'),
    [string] $InventoryPath = (Join-Path $PSScriptRoot 'marrowby-heath-inventory.csv'),
    [string] $Name = 'marrowby-heath'
)

$ErrorActionPreference = 'Stop'
Import-Module $ModulePath -Force
$null = New-Item -ItemType Directory -Path $OutputDirectory -Force
$site = Import-HazardSite -Path $SitePath
$inventory = @(Import-Csv $InventoryPath)

Write-Host "Assessing $($inventory.Count) items at the $($site.Stations.Count) stations of $($site.Name)"
$assessments = @($inventory | Test-InductionHazard -Site $site -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed)
$rowErrors = @($failed | ForEach-Object { [pscustomobject]@{ Station = $_.TargetObject.Station; Error = $_.Exception.Message } })

function Write-Atomically {
    param([string] $Path, [scriptblock] $Write)
    $temp = "$Path.tmp"
    & $Write $temp
    Move-Item -LiteralPath $temp -Destination $Path -Force
}

$csvPath = Join-Path $OutputDirectory "$Name-audit.csv"
Write-Atomically $csvPath {
    param($file)
    $assessments | Select-Object @{ n = 'Station'; e = { $inventory[$_.RowNumber - 1].Station } }, SourceName, RowNumber, ItemName, Verdict, GoverningMechanism, MinimumMargin,
        ShockMargin, ArcMargin, BurnMargin, OverheatMargin, ForceMargin, TorqueMargin, AttractionMargin, PeakEmfVolts, GapVoltageVolts, PeakCurrentAmperes, PeakForceNewtons,
        PeakTemperatureCelsius, EnergyDissipatedJoules, PolicyName, ModuleVersion, AssessedUtc |
        Export-Csv -Path $file -NoTypeInformation -Encoding utf8
}

function Format-Si([object] $value, [string] $unit) { [InductionHazard.Quantities.SiFormat]::Format($value, $unit, 3) }
function Format-Margin([double] $value) { [InductionHazard.Quantities.SiFormat]::Margin($value) }

$first = $assessments | Select-Object -First 1
$md = [System.Text.StringBuilder]::new()
$null = $md.AppendLine("# Induction hazard audit: $($site.Name)")
$null = $md.AppendLine()
$null = $md.AppendLine("Assessed $($inventory.Count) inventory items at the $($site.Stations.Count) stations they name, on $((Get-Date).ToUniversalTime().ToString('yyyy-MM-dd HH:mm')) UTC with InductionHazard $($first.ModuleVersion), policy: $($first.PolicyName), safety factor $($first.SafetyFactor).")
$null = $md.AppendLine()
$null = $md.AppendLine('## Cautions')
$null = $md.AppendLine()
foreach ($c in ($assessments | ForEach-Object Cautions | Where-Object { $_ -notlike 'Limits from:*' } | Select-Object -Unique)) { $null = $md.AppendLine("- $c") }
$null = $md.AppendLine('- Limits and factors applied in this audit:')
foreach ($s in ($assessments | ForEach-Object Standards | Select-Object -Unique)) { $null = $md.AppendLine("  - $s") }
$null = $md.AppendLine()
$null = $md.AppendLine('## Summary')
$null = $md.AppendLine()
$null = $md.AppendLine('| Station | Clear | Caution | Hazard | Indeterminate | Not assessed |')
$null = $md.AppendLine('|---|---:|---:|---:|---:|---:|')
function Get-StationAssessment([string] $station) { @($assessments | Where-Object { $inventory[$_.RowNumber - 1].Station -eq $station }) }

foreach ($station in $site.Stations) {
    $here = Get-StationAssessment $station.Name
    $count = { param($v) @($here | Where-Object Verdict -EQ $v).Count }
    $missing = @($rowErrors | Where-Object Station -EQ $station.Name).Count
    $null = $md.AppendLine("| $($station.Name) | $(& $count 'Clear') | $(& $count 'Caution') | $(& $count 'Hazard') | $(& $count 'Indeterminate') | $missing |")
}
$null = $md.AppendLine()

foreach ($station in $site.Stations) {
    $here = Get-StationAssessment $station.Name
    $null = $md.AppendLine("## $($station.Name)")
    $null = $md.AppendLine()
    $terms = ($station.Source.Terms | ForEach-Object { $_.Geometry.Describe() + ', ' + $_.Waveform.Describe() }) -join ' + '
    $stayText = if ($null -ne $station.ExposureSeconds) { " Time in the field: $(Format-Si $station.ExposureSeconds 's'), then the cooling that follows." } else { '' }
    $null = $md.AppendLine("$($station.Description) Field: $terms. Item centred at $($station.Placement.Centre) m.$stayText")
    $null = $md.AppendLine()
    $null = $md.AppendLine('| Row | Item | Verdict | Governing | Margin | Emf | Gap voltage | Current | Peak temperature |')
    $null = $md.AppendLine('|---:|---|---|---|---:|---:|---:|---:|---:|')
    foreach ($a in $here) {
        $null = $md.AppendLine("| $($a.RowNumber) | $($a.ItemName) | **$($a.Verdict)** | $($a.GoverningMechanism) | $(Format-Margin $a.MinimumMargin) | $(Format-Si $a.PeakEmfVolts 'V') | $(Format-Si $a.GapVoltageVolts 'V') | $(Format-Si $a.PeakCurrentAmperes 'A') | $([InductionHazard.Quantities.SiFormat]::Celsius($a.PeakTemperatureCelsius)) |")
    }
    $null = $md.AppendLine()
    $flagged = @($here | Where-Object Verdict -NE 'Clear')
    if ($flagged.Count) {
        $null = $md.AppendLine('Findings:')
        $null = $md.AppendLine()
        foreach ($a in $flagged) { $null = $md.AppendLine("- Row $($a.RowNumber), $($a.ItemName): $($a.Summary) Action: $($a.Action)") }
        $null = $md.AppendLine()
    }
}

if ($rowErrors.Count) {
    $null = $md.AppendLine('## Rows not assessed')
    $null = $md.AppendLine()
    foreach ($e in $rowErrors) { $null = $md.AppendLine("- $($e.Station): $($e.Error)") }
    $null = $md.AppendLine()
}

$reportPath = Join-Path $OutputDirectory "$Name-audit.md"
Write-Atomically $reportPath { param($file) Set-Content -Path $file -Value $md.ToString() -Encoding utf8 }

foreach ($group in $assessments | Group-Object Verdict | Sort-Object Name) { Write-Host ('{0,-14} {1,4}' -f $group.Name, $group.Count) }
Write-Host "Report written to $((Resolve-Path $reportPath).Path)"
Write-Host "Assessments written to $((Resolve-Path $csvPath).Path)"
