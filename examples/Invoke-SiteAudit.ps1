<#
.SYNOPSIS
    Audits the inventory of the Marrowby Heath Field Laboratory (an invented site) at each of its stations.
.DESCRIPTION
    Reads the site's inventory (marrowby-heath-inventory.csv) and its stations (marrowby-heath-stations.psd1),
    assesses every item at every station with Test-InductionHazard, and writes two files to -OutputDirectory:
    marrowby-heath-audit.csv (one row per item and station, for further processing) and
    marrowby-heath-audit.md (the report). Rows that cannot be assessed are listed in the report with the
    reason; the audit goes on without them.
.EXAMPLE
    ./examples/Invoke-SiteAudit.ps1 -OutputDirectory ./out/demo
#>
[CmdletBinding()]
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'),
    [string] $OutputDirectory = (Join-Path $PSScriptRoot '../out/demo')
)

$ErrorActionPreference = 'Stop'
Import-Module $ModulePath -Force
$null = New-Item -ItemType Directory -Path $OutputDirectory -Force
$site = Import-PowerShellDataFile (Join-Path $PSScriptRoot 'marrowby-heath-stations.psd1')
$inventory = @(Import-Csv (Join-Path $PSScriptRoot 'marrowby-heath-inventory.csv'))

$assessments = [System.Collections.Generic.List[object]]::new()
$rowErrors = [System.Collections.Generic.List[object]]::new()
foreach ($station in $site.Stations) {
    $shape = @{}
    foreach ($key in $station.Keys) { if ($key -notin 'Name', 'Form', 'Why', 'ExposureTime') { $shape[$key] = $station[$key] } }
    $shape[$station.Form] = $true
    $source = New-FieldWaveform @shape | New-FieldSource -Uniform -Name $station.Name
    $stay = @{}
    if ($station.ContainsKey('ExposureTime')) { $stay.ExposureTime = $station.ExposureTime }
    Write-Host "Assessing $($inventory.Count) items at $($station.Name)"
    $inventory | Test-InductionHazard -Source $source @stay -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed |
        ForEach-Object { $assessments.Add($_) }
    foreach ($e in $failed) { $rowErrors.Add([pscustomobject]@{ Station = $station.Name; Error = $e.Exception.Message }) }
}

function Write-Atomically {
    param([string] $Path, [scriptblock] $Write)
    $temp = "$Path.tmp"
    & $Write $temp
    Move-Item -LiteralPath $temp -Destination $Path -Force
}

$csvPath = Join-Path $OutputDirectory 'marrowby-heath-audit.csv'
Write-Atomically $csvPath {
    param($file)
    $assessments | Select-Object SourceName, RowNumber, ItemName, Verdict, GoverningMechanism, MinimumMargin,
        ShockMargin, BurnMargin, OverheatMargin, PeakEmfVolts, GapVoltageVolts, PeakCurrentAmperes,
        PeakTemperatureCelsius, EnergyDissipatedJoules, PolicyName, ModuleVersion, AssessedUtc |
        Export-Csv -Path $file -NoTypeInformation -Encoding utf8
}

function Format-Si([object] $value, [string] $unit) { [InductionHazard.Quantities.SiFormat]::Format($value, $unit, 3) }
function Format-Margin([double] $value) { [InductionHazard.Quantities.SiFormat]::Plain($value, 3) }

$first = $assessments | Select-Object -First 1
$md = [System.Text.StringBuilder]::new()
$null = $md.AppendLine("# Induction hazard audit: $($site.Site)")
$null = $md.AppendLine()
$null = $md.AppendLine("Assessed $($inventory.Count) inventory items at $($site.Stations.Count) stations on $((Get-Date).ToUniversalTime().ToString('yyyy-MM-dd HH:mm')) UTC with InductionHazard $($first.ModuleVersion), policy: $($first.PolicyName), safety factor $($first.SafetyFactor).")
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
foreach ($station in $site.Stations) {
    $here = @($assessments | Where-Object SourceName -EQ $station.Name)
    $count = { param($v) @($here | Where-Object Verdict -EQ $v).Count }
    $missing = @($rowErrors | Where-Object Station -EQ $station.Name).Count
    $null = $md.AppendLine("| $($station.Name) | $(& $count 'Clear') | $(& $count 'Caution') | $(& $count 'Hazard') | $(& $count 'Indeterminate') | $missing |")
}
$null = $md.AppendLine()

foreach ($station in $site.Stations) {
    $here = @($assessments | Where-Object SourceName -EQ $station.Name)
    $null = $md.AppendLine("## $($station.Name)")
    $null = $md.AppendLine()
    $terms = ($here[0].Response.Scenario.Source.Terms | ForEach-Object { $_.Geometry.Describe() + ', ' + $_.Waveform.Describe() }) -join ' + '
    $stayText = if ($station.ContainsKey('ExposureTime')) { " Time in the field: $($station.ExposureTime), then the cooling that follows." } else { '' }
    $null = $md.AppendLine("$($station.Why) Field: $terms.$stayText")
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
        foreach ($a in $flagged) { $null = $md.AppendLine("- Row $($a.RowNumber), $($a.ItemName): $($a.Summary)") }
        $null = $md.AppendLine()
    }
}

if ($rowErrors.Count) {
    $null = $md.AppendLine('## Rows not assessed')
    $null = $md.AppendLine()
    foreach ($e in $rowErrors) { $null = $md.AppendLine("- $($e.Station): $($e.Error)") }
    $null = $md.AppendLine()
}

$reportPath = Join-Path $OutputDirectory 'marrowby-heath-audit.md'
Write-Atomically $reportPath { param($file) Set-Content -Path $file -Value $md.ToString() -Encoding utf8 }

foreach ($group in $assessments | Group-Object Verdict | Sort-Object Name) { Write-Host ('{0,-14} {1,4}' -f $group.Name, $group.Count) }
Write-Host "Report written to $((Resolve-Path $reportPath).Path)"
Write-Host "Assessments written to $((Resolve-Path $csvPath).Path)"
