<#
.SYNOPSIS
    Times items through Test-InductionHazard serially and with -ThrottleLimit 2, in the same process, three
    rounds; prints the speed-up of each round. By default the demo inventory (eight copies, each row at its
    station; each copy writes its sizes with more zeros after the point, the same sizes in text of its own, so that no
    row repeats an earlier one and takes its result); with -Heavy, 40 items of the filament model (thick bands, discs,
    rods and closed tubes of several sizes) at the induction furnace's 9.6 kHz coil mouth. -Rounds sets how many
    rounds (each a serial run and a -ThrottleLimit 2 run, alternately); the median speed-up is printed last.
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [switch] $Heavy,
    [int] $Rounds = 3
)
$root = Join-Path $PSScriptRoot '../..'
Import-Module $ModulePath
$site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
if ($Heavy) {
    $station = 'Induction furnace F1 coil mouth'
    $rows = foreach ($k in 1..10) {
        [pscustomobject]@{ Name = "Band $k"; Shape = 'Ring'; Material = 'Gold'; InnerDiameter = "$(16 + $k) mm"; Width = "$(3 + ($k % 4)) mm"; Thickness = '2 mm'; Contact = 'Skin'; Station = $station }
        [pscustomobject]@{ Name = "Disc $k"; Shape = 'Disc'; Material = 'Aluminium'; Diameter = "$(30 + 2 * $k) mm"; Thickness = '3 mm'; Contact = 'Held'; Station = $station }
        [pscustomobject]@{ Name = "Rod $k"; Shape = 'Cylinder'; Material = 'Brass'; Diameter = "$(6 + $k) mm"; Length = '60 mm'; Contact = 'Held'; Station = $station }
        [pscustomobject]@{ Name = "Sleeve $k"; Shape = 'Tube'; Material = 'Copper'; Diameter = "$(20 + $k) mm"; WallThickness = '1 mm'; Length = '40 mm'; ClosedEnds = 'yes'; Contact = 'Free'; Station = $station }
    }
}
else {
    $sizes = 'Diameter', 'InnerDiameter', 'WireDiameter', 'Width', 'Thickness', 'Height', 'Length', 'WallThickness', 'Gap'
    $rows = foreach ($copy in 0..7) {
        foreach ($row in Import-Csv (Join-Path $root 'examples/marrowby-heath-inventory.csv')) {
            foreach ($size in $sizes) {
                if ($copy -gt 0 -and $row.$size -match '^(\d+)(\.\d+)?(\s*\S+)$') {
                    $row.$size = $Matches[1] + $(if ($Matches[2]) { $Matches[2] } else { '.' }) + ('0' * $copy) + $Matches[3]
                }
            }
            $row
        }
    }
}

$null = $rows | Select-Object -First 8 | Test-InductionHazard -Site $site -WarningAction SilentlyContinue
$speedUps = foreach ($round in 1..$Rounds) {
    $s = Measure-Command { $null = $rows | Test-InductionHazard -Site $site -WarningAction SilentlyContinue }
    $p = Measure-Command { $null = $rows | Test-InductionHazard -Site $site -ThrottleLimit 2 -WarningAction SilentlyContinue }
    '{0} rows: serial {1:F2} s, -ThrottleLimit 2 {2:F2} s, speed-up {3:F2}' -f @($rows).Count, $s.TotalSeconds, $p.TotalSeconds, ($s.TotalSeconds / $p.TotalSeconds) | Out-Host
    $s.TotalSeconds / $p.TotalSeconds
}
$sorted = @($speedUps | Sort-Object)
'median speed-up of {0} rounds: {1:F2}' -f $Rounds, $(if ($sorted.Count % 2) { $sorted[($sorted.Count - 1) / 2] } else { ($sorted[$sorted.Count / 2 - 1] + $sorted[$sorted.Count / 2]) / 2 })
