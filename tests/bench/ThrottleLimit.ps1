<#
.SYNOPSIS
    Times the demo inventory (eight copies, each row at its station) through Test-InductionHazard serially and
    with -ThrottleLimit 2, in the same process, three rounds; prints the speed-up of each round.
#>
param([string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'))
$root = Join-Path $PSScriptRoot '../..'
Import-Module $ModulePath
$site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
$rows = 1..8 | ForEach-Object { Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv') }
$null = $rows | Select-Object -First 30 | Test-InductionHazard -Site $site -WarningAction SilentlyContinue
foreach ($round in 1..3) {
  $s = Measure-Command { $null = $rows | Test-InductionHazard -Site $site -WarningAction SilentlyContinue }
  $p = Measure-Command { $null = $rows | Test-InductionHazard -Site $site -ThrottleLimit 2 -WarningAction SilentlyContinue }
  '{0} rows: serial {1:F2} s, -ThrottleLimit 2 {2:F2} s, speed-up {3:F2}' -f $rows.Count, $s.TotalSeconds, $p.TotalSeconds, ($s.TotalSeconds / $p.TotalSeconds)
}
