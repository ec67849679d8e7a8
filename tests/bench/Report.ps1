<#
.SYNOPSIS
    Times Export-HazardReport in each format for an inventory of N copper rings (ten sizes, worn) assessed in a 1 T ramp
    over 10 ms, where every one is Hazard (the wearer's own exposure): the report of a whole inventory at a dangerous
    place. Prints the time and the file's size for each format.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/Report.ps1 -Rows 20000
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rows = 20000
)
Import-Module $ModulePath
$pulse = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource -Name 'Pulse'
$rings = foreach ($k in 1..$Rows) { [pscustomobject]@{ Name = "Ring $k"; Material = 'Copper'; Diameter = "$(18 + ($k % 10)) mm"; WireDiameter = '2 mm'; Contact = 'Skin'; AssetTag = "T-$k" } }
$assessed = $rings | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue
$folder = Join-Path ([IO.Path]::GetTempPath()) ('induction-hazard-report-' + [guid]::NewGuid().ToString('N').Substring(0, 8))
$null = New-Item -ItemType Directory $folder
try {
    foreach ($format in 'Csv', 'Markdown', 'Html', 'Json') {
        $path = Join-Path $folder ('report.' + $format.ToLowerInvariant())
        $t = Measure-Command { $assessed | Export-HazardReport -Path $path -Format $format -Force }
        '{0} items, {1} Hazard: {2} {3:F2} s, {4:F1} MB' -f @($assessed).Count, @($assessed | Where-Object Verdict -EQ 'Hazard').Count, $format, $t.TotalSeconds, ((Get-Item $path).Length / 1MB)
    }
}
finally {
    Remove-Item $folder -Recurse -Force
}
