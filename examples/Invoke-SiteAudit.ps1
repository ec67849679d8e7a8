<#
.SYNOPSIS
    Audits an inventory at the stations of a site: by default the Marrowby Heath Field Laboratory (an invented site).
.DESCRIPTION
    Reads the site file (-SitePath, read as data by Import-HazardSite) and the inventory (-InventoryPath, a CSV
    whose Station column names where each item is used), assesses every row at its station with
    Test-InductionHazard -Site, and writes the report with Export-HazardReport to -OutputDirectory:
    <name>-audit.html (the report to file), <name>-audit.md (the same as text, for a wiki or a ticket) and
    <name>-audit.csv (one row per item, for a spreadsheet). Rows that cannot be assessed are listed in every
    report with the reason; the audit goes on without them. Existing reports are replaced only with -Force.
.EXAMPLE
    ./examples/Invoke-SiteAudit.ps1 -OutputDirectory ./out/demo -Force
.EXAMPLE
    ./examples/Invoke-SiteAudit.ps1 -SitePath ./my-site.psd1 -InventoryPath ./my-inventory.csv -Name my-site
#>
[CmdletBinding()]
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'),
    [string] $OutputDirectory = (Join-Path $PSScriptRoot '../out/demo'),
    [string] $SitePath = (Join-Path $PSScriptRoot 'marrowby-heath-site.psd1'),
    [string] $InventoryPath = (Join-Path $PSScriptRoot 'marrowby-heath-inventory.csv'),
    [string] $Name = 'marrowby-heath',
    [switch] $Force
)

$ErrorActionPreference = 'Stop'
Import-Module $ModulePath -Force
$null = New-Item -ItemType Directory -Path $OutputDirectory -Force
$site = Import-HazardSite -Path $SitePath
$inventory = @(Import-Csv $InventoryPath)

Write-Host "Assessing $($inventory.Count) items at the $($site.Stations.Count) stations of $($site.Name)"
$assessments = @($inventory | Test-InductionHazard -Site $site -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed)

$written = foreach ($extension in 'html', 'md', 'csv') {
    $assessments | Export-HazardReport -Path (Join-Path $OutputDirectory "$Name-audit.$extension") -Site $site -NotAssessed $failed -Force:$Force -PassThru
}

foreach ($group in $assessments | Group-Object Verdict | Sort-Object Name) { Write-Host ('{0,-14} {1,4}' -f $group.Name, $group.Count) }
if ($failed.Count) { Write-Host ('{0,-14} {1,4}' -f 'Not assessed', $failed.Count) }
foreach ($file in $written) { Write-Host "Written: $($file.FullName)" }
