param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $inventoryPath = Join-Path $root 'examples/marrowby-heath-inventory.csv'
    $pulse = New-FieldWaveform -Ramp -From '0 T' -To '20 T' -Duration '10 ms' | New-FieldSource -Uniform -Name 'Pulse bore'
}

Describe 'Test-InductionHazard' {
    Context 'an inventory piped from Import-Csv' {
        BeforeAll {
            $rows = @(Import-Csv $inventoryPath)
            $result = @($rows | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue)
        }

        It 'shows item, verdict, governing mechanism, margin and action at 80 columns, and the figures too at 120, with no line too long' {
            foreach ($width in 80, 120) {
                $lines = @(($result | Out-String -Width $width) -split "`r?`n" | Where-Object { $_.Trim() })
                foreach ($line in $lines) { $line.TrimEnd().Length | Should -BeLessOrEqual $width }
                $header = $lines[0]
                foreach ($column in 'Item', 'Verdict', 'Governing', 'Margin', 'Action') { $header | Should -Match "\b$column\b" }
                $lines[1] | Should -Match '^-{4}' -Because 'a header row is followed by its rule, not by a header squeezed one letter per line'
                if ($width -eq 120) { foreach ($column in 'Emf', 'Current', 'Peak T') { $header | Should -Match "\b$column\b" } }
            }

            $result.ActionBrief | Should -BeIn @('None', 'Use with care', 'Take it off', 'Keep it out', 'Keep out or fix down', 'Keep people out', 'Unsafe until assessed')
        }

        It 'shows readable text in its list view, never a type name' {
            ($result[0..3] | Format-List | Out-String -Width 200) | Should -Not -Match 'InductionHazard\.[A-Z]'
        }

        It 'returns one assessment per row, in order' {
            $result.Count | Should -Be $rows.Count
            $result.ItemName | Should -Be $rows.Name
            $result.RowNumber | Should -Be (1..$rows.Count)
        }

        It 'gives every assessment a verdict, a governing mechanism, the source and the cautions' {
            foreach ($a in $result) {
                $a.Verdict | Should -BeIn 'Clear', 'Caution', 'Hazard', 'Indeterminate'
                $a.GoverningMechanism | Should -Not -BeNullOrEmpty
                $a.SourceName | Should -Be 'Pulse bore'
                ($a.Cautions -join ' ') | Should -Match 'engineering estimates'
                ($a.Cautions -join ' ') | Should -Match 'licensed professionals govern'
            }
        }

        It 'judges split rings by Shock and closed rings by Burn and Overheat' {
            $split = $result | Where-Object ItemName -EQ 'Copper wellness bracelet'
            $split.ShockMargin | Should -BeGreaterThan 0
            $split.BurnMargin | Should -BeNullOrEmpty
            $closed = $result | Where-Object ItemName -EQ 'Closed copper bangle'
            $closed.ShockMargin | Should -BeNullOrEmpty
            $closed.BurnMargin | Should -Not -BeNullOrEmpty
            $closed.OverheatMargin | Should -Not -BeNullOrEmpty
        }

        It 'exports to CSV with the numbers in SI' {
            $file = Join-Path $TestDrive 'audit.csv'
            $result | Select-Object RowNumber, ItemName, Verdict, MinimumMargin, PeakEmfVolts, PeakCurrentAmperes, PeakTemperatureCelsius |
                Export-Csv $file -NoTypeInformation
            $back = @(Import-Csv $file)
            $back.Count | Should -Be $rows.Count
            [double] $back[0].PeakEmfVolts | Should -BeGreaterThan 0
        }

        It 'accepts items made by New-ConductiveItem as well as rows (an item object carries no placement of its own)' {
            $unplaced = @($rows | Where-Object { -not $_.NormalX })
            $items = $unplaced | New-ConductiveItem
            $again = @($items | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue)
            $again.Verdict | Should -Be @($result | Where-Object { -not $rows[$_.RowNumber - 1].NormalX }).Verdict
        }

        It 'takes several items given at once to -Item as it takes them piped: each in turn, numbered, a $null its own error' {
            $a = New-ConductiveItem -Name 'A' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm'
            $b = New-ConductiveItem -Name 'B' -Material Copper -Diameter '25 mm' -WireDiameter '2 mm'
            (Test-InductionHazard -Item $a, $b -Source $pulse -WarningAction SilentlyContinue).ItemName | Should -Be @('A', 'B')
            (Test-InductionHazard $a, $b $pulse -WarningAction SilentlyContinue).RowNumber | Should -Be @(1, 2)
            $list = [System.Collections.Generic.List[object]]::new(); $list.Add($b); $list.Add(@{ Name = 'H'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' })
            (Test-InductionHazard -Item $list -Source $pulse -WarningAction SilentlyContinue).ItemName | Should -Be @('B', 'H')
            (Test-InductionHazard -Item @{ Name = 'H'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' } -Source $pulse -WarningAction SilentlyContinue).ItemName | Should -Be 'H' -Because 'a hashtable is one row, not a collection of its entries'
            @(Test-InductionHazard -Item @() -Source $pulse).Count | Should -Be 0
            $out = @(Test-InductionHazard -Item $a, $null, $b -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
            $out.ItemName | Should -Be @('A', 'B')
            $out.RowNumber | Should -Be @(1, 3)
            @($bad).Count | Should -Be 1
            "$($bad[0])" | Should -Match '^row 2: InputObject: is \$null'
            (Get-InductionResponse -Item $a, $b -Source $pulse -WarningAction SilentlyContinue).ItemName | Should -Be @('A', 'B')
        }
    }

    Context 'bare numbers in a spreadsheet' {
        BeforeAll {
            $bare = Join-Path $TestDrive 'bare.csv'
            Set-Content $bare -Value "Name,Material,InnerDiameter,Width,Thickness`nBand,Gold,18,4,1.6`nWire ring,Silver,17,,"
            $headed = Join-Path $TestDrive 'headed.csv'
            Set-Content $headed -Value "Name,Material,InnerDiameter (mm),Width [mm],Thickness_mm`nBand,Gold,18,4,1.6"
            $written = Join-Path $TestDrive 'written.csv'
            Set-Content $written -Value "Name,Material,InnerDiameter,Width,Thickness`nBand,Gold,18 mm,4 mm,1.6 mm"
        }

        It 'refuses every bare dimension row by row, naming the column and both fixes' {
            $out = Import-Csv $bare | Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue -WarningAction SilentlyContinue
            $out | Should -BeNullOrEmpty
            $bad.Count | Should -Be 2
            $bad[0].Exception.Message | Should -BeLike "row 1 ('Band'): InnerDiameter: '18' has no unit; write it with its unit (for example '18 mm')*'InnerDiameter (mm)'*-Unit @{ InnerDiameter = 'mm' }*"
            $bad[0].FullyQualifiedErrorId | Should -BeLike 'MissingUnit,*'
        }

        It 'reads the same inventory the same way with the units in the headers, in a -Unit table, or in the cells' {
            $fromCells = Import-Csv $written | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue
            $fromHeaders = Import-Csv $headed | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue
            $fromTable = Import-Csv $bare | Select-Object -First 1 | Test-InductionHazard -Source $pulse -Unit @{ InnerDiameter = 'mm'; Width = 'mm'; Thickness = 'mm' } -WarningAction SilentlyContinue
            $fromHeaders.Response.Item.MeanDiameterMeters | Should -Be $fromCells.Response.Item.MeanDiameterMeters
            $fromTable.Response.Item.MeanDiameterMeters | Should -Be $fromCells.Response.Item.MeanDiameterMeters
            $fromHeaders.Verdict | Should -Be $fromCells.Verdict
            $fromTable.MinimumMargin | Should -Be $fromCells.MinimumMargin
            [math]::Abs($fromCells.Response.Item.MeanDiameterMeters - 0.0196) | Should -BeLessThan 1e-12
        }
    }

    Context 'inventories as people keep them' {
        It 'says a semicolon-separated file read without -Delimiter is probably that' {
            $semi = Join-Path $TestDrive 'semi.csv'
            Set-Content $semi -Value "Name;Material;Diameter;WireDiameter`nRing;Copper;20 mm;2 mm"
            $null = Import-Csv $semi | Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue
            $bad[0].Exception.Message | Should -BeLike "*semicolon-separated; read it with Import-Csv -Delimiter ';'*"
            @(Import-Csv $semi -Delimiter ';' | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue).Count | Should -Be 1
        }

        It 'reads contact as people say it: <Word> is <Kind>' -TestCases @(
            @{ Word = 'Worn'; Kind = 'Skin' }, @{ Word = 'Loose'; Kind = 'Free' }, @{ Word = 'held'; Kind = 'Held' }, @{ Word = 'Installed'; Kind = 'Fixed' }
        ) {
            $a = [pscustomobject]@{ Name = 'Ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Contact = $Word } |
                Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue
            $a.Response.Item.Contact | Should -Be $Kind
        }
    }

    Context 'row objects of any shape (a custom object is read from the members it holds once its type names are known to add none)' {
        AfterAll { Remove-TypeData -TypeName 'InductionHazardTest.RingRow' -ErrorAction SilentlyContinue }

        It 'reads a column that only a later row of the same type names has' {
            $rows = @(
                [pscustomobject]@{ Name = 'First'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
                [pscustomobject]@{ Name = 'Second'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; AssetTag = 'T-2' }
                [pscustomobject]@{ Name = 'Third'; Material = 'Copper'; Diameter = '22 mm'; WireDiameter = '2 mm'; AssetTag = 'T-3'; Room = 'B4' }
            )
            $out = @($rows | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue)
            $out.Count | Should -Be 3
            $out[1].AssetTag | Should -Be 'T-2'
            $out[2].AssetTag | Should -Be 'T-3'
            $out[2].Room | Should -Be 'B4'
            $out[2].Response.Item.Loop.HalfSpanMeters * 2 | Should -BeGreaterThan 0.0209 -Because 'the third row is its own diameter, not the first row'
        }

        It 'reads a property that the type names add (extended type data) as a column, on every row' {
            Update-TypeData -TypeName 'InductionHazardTest.RingRow' -MemberType ScriptProperty -MemberName WireDiameter -Value { '2 mm' } -Force
            Update-TypeData -TypeName 'InductionHazardTest.RingRow' -MemberType ScriptProperty -MemberName AssetTag -Value { 'E-' + $this.Name } -Force
            $rows = foreach ($k in 1..3) { [pscustomobject]@{ PSTypeName = 'InductionHazardTest.RingRow'; Name = "Ring $k"; Material = 'Copper'; Diameter = '20 mm' } }
            $out = @($rows | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue -ErrorVariable bad -ErrorAction SilentlyContinue)
            $bad.Count | Should -Be 0 -Because 'the wire diameter comes from the type data'
            $out.Count | Should -Be 3
            $out.AssetTag | Should -Be 'E-Ring 1', 'E-Ring 2', 'E-Ring 3'
        }
    }

    Context 'on several threads' {
        It 'gives with -ThrottleLimit 4 the same assessments in the same order as a serial run, bad rows included' {
            $rows = @(Import-Csv $inventoryPath) + @([pscustomobject]@{ Name = 'Bad'; Material = 'Unobtainium'; Diameter = '20 mm'; WireDiameter = '2 mm' }) + @(Import-Csv $inventoryPath)
            $serial = @($rows | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable serialErrors)
            $parallel = @($rows | Test-InductionHazard -Source $pulse -ThrottleLimit 4 -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable parallelErrors)
            $parallel.Count | Should -Be $serial.Count
            $parallel.RowNumber | Should -Be $serial.RowNumber
            $parallel.Verdict | Should -Be $serial.Verdict
            ($parallel.MinimumMargin | ForEach-Object { "$_" }) | Should -Be ($serial.MinimumMargin | ForEach-Object { "$_" }) -Because "NaN (Indeterminate) compares equal only as text"
            $parallelErrors.Count | Should -Be $serialErrors.Count
            $parallelErrors[0].Exception.Message | Should -Be $serialErrors[0].Exception.Message
        }
    }

    Context 'rows that cannot be assessed' {
        BeforeAll {
            $badPath = Join-Path $PSScriptRoot 'data/inventory-with-bad-rows.csv'
            $result = @(Import-Csv $badPath | Test-InductionHazard -Source $pulse -ErrorVariable rowErrors -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
        }

        It 'gives a $null in the pipeline its own error naming the row, and goes on with the rest' {
            $good = [pscustomobject]@{ Name = 'Good ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $results = @($good, $null, $good | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed)
            $results.Count | Should -Be 2
            $failed.Count | Should -Be 1
            $failed[0].FullyQualifiedErrorId | Should -BeLike 'InvalidInput,*'
            $failed[0].Exception.Message | Should -Match '^row 2: InputObject: is \$null'
            { $null | Test-InductionHazard -Source $pulse -ErrorAction Stop } | Should -Throw -ErrorId 'InvalidInput,*'
        }

        It 'still assesses every other row, in order' {
            $result.ItemName | Should -Be @('Good copper ring', 'Good gold band', 'Good split bangle')
            $result.RowNumber | Should -Be @(1, 4, 7)
        }

        It 'writes one error for row <Row> naming the row and the field <Field>' -TestCases @(
            @{ Row = 2; Field = 'Diameter'; Id = 'InvalidInput' }
            @{ Row = 3; Field = 'WireDiameter'; Id = 'InvalidInput' }
            @{ Row = 5; Field = 'Material'; Id = 'UnknownMaterial' }
            @{ Row = 6; Field = 'Diameter'; Id = 'InvalidQuantity' }
        ) {
            $e = @($rowErrors | Where-Object { $_.Exception.Message -like "row $Row *" })
            $e.Count | Should -Be 1
            $e[0].Exception.Message | Should -Match "$($Field):"
            $e[0].FullyQualifiedErrorId | Should -BeLike "$Id,*"
            $e[0].TargetObject.AssetTag | Should -Be "T-0$Row"
            $e[0].CategoryInfo.TargetName | Should -BeLike "row $Row (*"
        }

        It 'writes no other errors' {
            $rowErrors.Count | Should -Be 4
        }
    }

    Context 'failing closed' {
        It 'refuses a field no source can make, rather than carry it into the physics' {
            { New-FieldWaveform -Sine -Amplitude 1e300 -Frequency '50 Hz' | New-FieldSource -Uniform } |
                Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.NewFieldSourceCommand' -ExpectedMessage '*Waveform*1000 T*'
        }

        It 'gives Indeterminate with the reason for an item outside the model, and warns' {
            $field = New-FieldWaveform -Sine -Amplitude '1 uT' -Frequency '50 Hz' | New-FieldSource -Uniform
            # A rectangular loop of wire too thick for the thin-loop formula: no filament model covers its outline yet.
            $thick = New-ConductiveItem -Name 'Thick ring' -Shape RectangularLoop -Material Copper -Width '20 mm' -Height '20 mm' -WireDiameter '6 mm'
            $a = Test-InductionHazard -Item $thick -Source $field -WarningVariable warned -WarningAction SilentlyContinue
            $a.Verdict | Should -Be 'Indeterminate'
            ($a.Reasons -join ' ') | Should -Match 'thin-loop'
            [double]::IsNaN($a.PeakTemperatureCelsius) | Should -BeTrue -Because 'no safe-looking number comes from a model outside its validity'
            ($warned -join ' ') | Should -Match 'Thick ring: Indeterminate'
        }

        It 'judges a ferromagnetic item by its magnetisation, and says the induction model does not apply to it' {
            $ramp = New-FieldWaveform -Ramp -From '3 T' -To '0 T' -Duration '1 s' | New-FieldSource -Uniform
            $a = New-ConductiveItem -Material 'mild steel' -Diameter '25 mm' -WireDiameter '2 mm' -Contact Held |
                Test-InductionHazard -Source $ramp -WarningAction SilentlyContinue
            # A steel keyring in 3 T: its magnetisation twists it far harder than gravity does.
            $a.Verdict | Should -Be 'Hazard'
            $a.GoverningMechanism | Should -Be 'Torque'
            ($a.Mechanisms | Where-Object Mechanism -eq 'Burn').Verdict | Should -Be 'Indeterminate'
            (($a.Mechanisms | Where-Object Mechanism -eq 'Burn').Detail) | Should -Match 'ferromagnetic'
            ($a.Mechanisms | Where-Object Mechanism -eq 'Attraction').Applies | Should -BeFalse -Because 'a uniform field has no gradient to pull it along'
        }
    }

    Context 'hostile input (each a defect that once stopped a run or gave a false Clear)' {
        It 'assesses every other row when one holds digits of another script, and keeps the output already made' {
            $rows = @(
                [pscustomobject]@{ Name = 'First'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
                [pscustomobject]@{ Name = 'Arabic digits'; Material = 'Copper'; Diameter = '١٨ mm'; WireDiameter = '2 mm' }
                [pscustomobject]@{ Name = 'Last'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            )
            $out = $rows | Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue -WarningAction SilentlyContinue
            @($out).ItemName | Should -Be @('First', 'Last')
            $bad.Count | Should -Be 1
            $bad[0].Exception.Message | Should -BeLike "row 2 ('Arabic digits'): Diameter:*digits other than 0-9*"
            $bad[0].TargetObject.Name | Should -Be 'Arabic digits'
        }

        It 'refuses a drive that starts too late to resolve, instead of assessing it as no exposure' {
            { New-FieldWaveform -Ramp -From '0 T' -To '20 T' -Duration '10 ms' -Start '1e17 s' } |
                Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.NewFieldWaveformCommand' -ExpectedMessage 'Start:*'
            { New-FieldWaveform -Sine -Amplitude '1 T' -Frequency '50 Hz' -Start 1e300 } | Should -Throw -ExpectedMessage 'Start:*'
        }

        It 'refuses an exposure too short for anyone to arrange (<Exposure>)' -TestCases @(@{ Exposure = '1e-300 s' }, @{ Exposure = '1 ms' }) {
            { New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' | Test-InductionHazard -Source $pulse -ExposureTime $Exposure } |
                Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.TestInductionHazardCommand' -ExpectedMessage '*ExposureTime*0.1 s*'
        }

        It 'refuses a <Field> of <Value> naming the field' -TestCases @(
            @{ Field = 'Gap'; Value = '1 nm' }
            @{ Field = 'Gap'; Value = 1e-15 }
            @{ Field = 'WireDiameter'; Value = 5e-324 }
            @{ Field = 'WireDiameter'; Value = '5 Å' }
        ) {
            $row = @{ Name = 'Absurd'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $row[$Field] = $Value
            $out = [pscustomobject]$row | Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue
            $out | Should -BeNullOrEmpty
            $bad[0].Exception.Message | Should -BeLike "*$($Field): must be between*"
        }

        It 'refuses a length typed in amperes, naming the field and saying so' {
            $out = [pscustomobject]@{ Name = 'Ampere slip'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '5 A' } |
                Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue
            $out | Should -BeNullOrEmpty
            $bad[0].Exception.Message | Should -BeLike '*WireDiameter*current in amperes*'
        }

        It 'refuses two columns that give one field different values' {
            $row = [pscustomobject]@{ Name = 'Twice'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; 'Wire Diameter' = '9 mm' }
            $out = $row | Test-InductionHazard -Source $pulse -ErrorVariable bad -ErrorAction SilentlyContinue
            $out | Should -BeNullOrEmpty
            $bad[0].Exception.Message | Should -BeLike "*WireDiameter: is given by more than one column*'Wire Diameter' = '9 mm'*"
        }

        It 'names the parameter when a length overflows in conversion' {
            { New-ConductiveItem -Material Copper -Diameter '1e308 km' -WireDiameter '2 mm' } | Should -Throw -ExpectedMessage "*Diameter*'1e308 km' is too large*"
        }

        It 'shows a thick split ring''s zero current and unchanged temperature, never NaN beside a verdict' {
            $heater = New-FieldWaveform -Sine -Amplitude '4 mT' -Frequency '12 kHz' | New-FieldSource -Uniform
            $a = New-ConductiveItem -Material Copper -Diameter '12 mm' -WireDiameter '6 mm' -Gap '1 mm' | Test-InductionHazard -Source $heater
            $a.Verdict | Should -Not -Be 'Indeterminate'
            $a.PeakCurrentAmperes | Should -Be 0
            [double]::IsNaN($a.PeakTemperatureCelsius) | Should -BeFalse
        }
    }

    Context 'a busbar fault, from a CSV with positions' {
        It 'assesses each row where it sits, nearer rows seeing more emf' {
            $bar = New-FieldWaveform -Fault -Current '40 kA' -XOverR 14 -Frequency '50 Hz' -ClearingTime '200 ms' |
                New-FieldSource -Busbar -Width '100 mm' -Thickness '10 mm' -Name 'Busbar B1'
            $csv = Join-Path $TestDrive 'switchroom.csv'
            Set-Content $csv -Value @'
Name,Material,Diameter,WireDiameter,Gap,Contact,X,Y,Z
Near bracelet,Copper,65 mm,4 mm,20 mm,Skin,150 mm,0,0
Far bracelet,Copper,65 mm,4 mm,20 mm,Skin,600 mm,0,0
Closed ring,Copper,20 mm,2 mm,,Skin,200 mm,0,0
'@
            $a = @(Import-Csv $csv | Test-InductionHazard -Source $bar -WarningAction SilentlyContinue)
            $a.Count | Should -Be 3
            $a[0].GapVoltageVolts | Should -BeGreaterThan (2 * $a[1].GapVoltageVolts)
            $a[2].PeakCurrentAmperes | Should -BeGreaterThan 0
            $a.Verdict | Should -Not -Contain 'Indeterminate'
            $a[0].Orientation | Should -BeLike 'facing the largest flux change*'
        }
    }

    Context 'limits from published standards' {
        # Validates: Shock margin 1 through the cmdlets | IEC 61140 | 1e-6
        It 'puts a split ring whose gap sees 50 V rms exactly at the extra-low-voltage limit (IEC 61140)' {
            # 50 V rms across the gap: B = 50 sqrt2 / (omega A) for a 65 mm ring at 50 Hz.
            $area = [math]::PI * 0.065 * 0.065 / 4
            $tesla = 50 * [math]::Sqrt(2) / (2 * [math]::PI * 50 * $area)
            $field = New-FieldWaveform -Sine -Amplitude $tesla -Frequency 50 | New-FieldSource -Uniform
            $a = New-ConductiveItem -Material Titanium -Diameter '65 mm' -WireDiameter '4 mm' -Gap '20 mm' -Contact Loose | Test-InductionHazard -Source $field
            $a.ShockMargin | Should -BeGreaterThan 0.999999
            $a.ShockMargin | Should -BeLessThan 1.000001
            $a.Verdict | Should -Be 'Caution'
        }

        It 'finds a copper ring in a 12 kHz, 4 mT field a burn hazard' {
            $heater = New-FieldWaveform -Sine -Amplitude '4 mT' -Frequency '12 kHz' | New-FieldSource -Uniform
            $a = New-ConductiveItem -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' | Test-InductionHazard -Source $heater
            $a.Verdict | Should -Be 'Hazard'
            $a.BurnMargin | Should -BeLessThan 1
            ($a.Reasons -join ' ') | Should -Match '^Burn: |; Burn: | Burn: '
            # The wearer's own exposure, 2.8 mT rms against 0.1 mT, is a hazard too; the action names the burn as well.
            $a.ExposureMargin | Should -BeLessThan 0.04
            $a.Action | Should -Match 'burn'
        }
    }

    Context 'parameters' {
        It 'refuses an exposure longer than 8 h with an error naming the parameter' {
            { New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' | Test-InductionHazard -Source $pulse -ExposureTime '9 h' } |
                Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.TestInductionHazardCommand' -ExpectedMessage '*ExposureTime*'
        }

        It 'refuses an ambient temperature given in the wrong unit, naming the parameter' {
            { New-ConductiveItem -Material Gold -Diameter '20 mm' -WireDiameter '2 mm' | Test-InductionHazard -Source $pulse -AmbientTemperature '3 T' } |
                Should -Throw -ExpectedMessage '*AmbientTemperature*a temperature*'
        }

        It 'reads rows that name a user-defined material' {
            $alloy = @{ Name = 'Site alloy'; Resistivity = '1e-7 ohm m'; Density = 13000; SpecificHeat = 150; MeltingTemperature = '800 degC' }
            $a = @{ Name = 'Alloy ring'; Material = 'site alloy'; Diameter = '20 mm'; WireDiameter = '2 mm' } |
                Test-InductionHazard -Source $pulse -AdditionalMaterial $alloy -WarningAction SilentlyContinue
            $a.Response.Item.Material.Name | Should -Be 'Site alloy'
        }
    }

    Context 'solid bodies and thick sections near a pulsed coil' {
        BeforeAll {
            $coil = New-FieldWaveform -Discharge -Capacitance '2 mF' -Voltage '5 kV' -Inductance '50 uH' -Resistance '30 mohm' -Crowbar |
                New-FieldSource -Coil -Radius '50 mm' -Turns 20 -Name 'Pulse coil'
            $mixed = @(
                [pscustomobject]@{ Name = 'Fixture disc'; Shape = 'Disc'; Material = 'Aluminium'; Diameter = '60 mm'; Thickness = '4 mm'; Contact = 'Fixed' }
                [pscustomobject]@{ Name = 'Brass rod'; Shape = 'Cylinder'; Material = 'Brass'; Diameter = '10 mm'; Length = '80 mm'; Contact = 'Held' }
                [pscustomobject]@{ Name = 'Copper sleeve'; Shape = 'Tube'; Material = 'Copper'; Diameter = '40 mm'; WallThickness = '2 mm'; Length = '60 mm'; Contact = 'Free' }
                [pscustomobject]@{ Name = 'Bearing ball'; Shape = 'Sphere'; Material = 'SS304'; Diameter = '20 mm'; Contact = 'Free' }
                [pscustomobject]@{ Name = 'Wide gold band'; Shape = 'Ring'; Material = 'Gold'; InnerDiameter = '18 mm'; Width = '8 mm'; Thickness = '2.5 mm'; Contact = 'Skin' }
                [pscustomobject]@{ Name = 'Thin copper ring'; Shape = 'Ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '0.3 mm'; Contact = 'Skin' }
                [pscustomobject]@{ Name = 'Fixture plate'; Shape = 'Plate'; Material = 'Aluminium'; Width = '80 mm'; Height = '60 mm'; Thickness = '3 mm'; Contact = 'Fixed' }
                [pscustomobject]@{ Name = 'Gas cylinder'; Shape = 'Tube'; Material = 'Aluminium'; Diameter = '80 mm'; WallThickness = '3 mm'; Length = '250 mm'; ClosedEnds = 'yes'; Contact = 'Free' }
            )
        }

        It 'assesses a mixed inventory end to end, one assessment per row, in order, each with its model' {
            $results = $mixed | Test-InductionHazard -Source $coil -Position '0, 0, 40 mm' -WarningAction SilentlyContinue
            $results.Count | Should -Be $mixed.Count
            $results.ItemName | Should -Be $mixed.Name
            foreach ($a in $results) {
                $a.Verdict | Should -Not -Be 'Indeterminate' -Because "$($a.ItemName) has a model ($($a.Reasons -join '; '))"
                [double]::IsNaN($a.PeakCurrentAmperes) | Should -BeFalse
                $a.PeakCurrentAmperes | Should -BeGreaterThan 0
            }

            $results[0].Response.PathCount | Should -BeGreaterThan 1 -Because 'a disc is solved with filaments'
            $results[0].Response.Model | Should -Match 'coaxial filaments'
            $results[5].Response.PathCount | Should -Be 1 -Because 'a thin ring is the one-path case'
            $results[6].Response.Model | Should -Match 'mesh currents'
        }

        It 'solves a bar at mains frequency, and refuses one whose skin depth needs more mesh currents than it solves, saying why' {
            $mains = New-FieldWaveform -Sine -Amplitude '20 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
            $bar = New-ConductiveItem -Name 'Tool head' -Shape Bar -Material Brass -Width '20 mm' -Height '20 mm' -Length '60 mm' -Contact Loose
            $solved = Test-InductionHazard -Item $bar -Source $mains -WarningAction SilentlyContinue
            $solved.Verdict | Should -Not -Be 'Indeterminate'
            $solved.Response.Model | Should -Match 'mesh currents'
            $fast = Test-InductionHazard -Item $bar -Source $coil -Position '0, 0, 40 mm' -WarningAction SilentlyContinue
            $fast.Verdict | Should -Be 'Indeterminate'
            ($fast.Reasons -join ' ') | Should -Match 'mesh currents, more than'
        }

        It 'judges a rod given no normal with its axis across the field, where it heats more than along it, and says so' {
            $mains = New-FieldWaveform -Sine -Amplitude '20 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Mains coil'
            $rod = New-ConductiveItem -Name 'Copper rod' -Shape Cylinder -Material Copper -Diameter '10 mm' -Length '150 mm' -Contact Held
            $judged = Test-InductionHazard -Item $rod -Source $mains -WarningAction SilentlyContinue
            $along = Test-InductionHazard -Item $rod -Source $mains -Normal z -WarningAction SilentlyContinue
            $across = Test-InductionHazard -Item $rod -Source $mains -Normal x -WarningAction SilentlyContinue
            $judged.Orientation | Should -Match '^axis across the largest flux change, normal \(1, 0, 0\) \(judged worse than its axis along it, normal \(0, 0, 1\)'
            $judged.BurnMargin | Should -Be $across.BurnMargin
            $judged.BurnMargin | Should -BeLessThan $along.BurnMargin
            $judged.Response.EnergyDissipatedJoules | Should -BeGreaterThan (1.9 * $along.Response.EnergyDissipatedJoules) -Because 'a long cylinder loses twice as much across its axis as along it'
            (Get-InductionResponse -Item $rod -Source $mains).Orientation | Should -Match 'facing the largest flux change, normal \(0, 0, 1\) \(an assessment judges its axis across it too'
        }

        It 'judges a rod given no normal beside a coil also turned where a search on a model of its heating puts the most, and says so' {
            # 100 mm from a 100 mm coil at 1 kHz the field varies by half through the rod: turned between its axis along the
            # largest flux change and across it, the rod heats more than in any of those three.
            $heater = New-FieldWaveform -Sine -Amplitude '1000 A' -Frequency '1 kHz' | New-FieldSource -Coil -Radius '100 mm' -Turns 10 -Name 'Heater H3'
            $rod = New-ConductiveItem -Name 'Copper rod' -Shape Cylinder -Material Copper -Diameter '10 mm' -Length '120 mm' -Contact Held
            $judged = Test-InductionHazard -Item $rod -Source $heater -Position '200 mm, 0, 100 mm' -WarningAction SilentlyContinue
            $judged.Orientation | Should -Match '^axis turned to normal \(.*\), where a search on a low-frequency model of its heating put the most'
            $note = $judged.Response.ModelNotes | Where-Object { $_ -like 'orientation: the field varies through the body*' }
            $note | Should -Match 'turned as a search on a low-frequency model of its heating found worse, normal'
            $note | Should -Match 'the search solves a model, not every orientation'
            $normal = $judged.Response.Scenario.Placement.Normal
            $given = Test-InductionHazard -Item $rod -Source $heater -Position '200 mm, 0, 100 mm' -Normal "$($normal.X), $($normal.Y), $($normal.Z)" -WarningAction SilentlyContinue
            $given.Response.PeakTemperatureCelsius | Should -Be $judged.Response.PeakTemperatureCelsius -Because 'the orientation kept is solved as if it were given'
            foreach ($axis in 'x', 'y', 'z') {
                $other = Test-InductionHazard -Item $rod -Source $heater -Position '200 mm, 0, 100 mm' -Normal $axis -WarningAction SilentlyContinue
                $other.Response.PeakTemperatureCelsius | Should -BeLessThan $judged.Response.PeakTemperatureCelsius
            }
            (Get-InductionResponse -Item $rod -Source $heater -Position '200 mm, 0, 100 mm').Orientation | Should -Match 'and turned to normal \(.*\) as a search found worse, and keeps the worst\)$'
        }

        It 'judges a ring given no normal for the torque it would feel turned from the field, and not one given its normal' {
            $ramp = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource -Uniform -Name 'Ramp bore'
            $ring = New-ConductiveItem -Name 'Loose ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Contact Free
            $chosen = Test-InductionHazard -Item $ring -Source $ramp -WarningAction SilentlyContinue
            $facing = Test-InductionHazard -Item $ring -Source $ramp -Normal z -WarningAction SilentlyContinue
            $chosen.Response.PeakTorqueNewtonMeters | Should -Be 0
            $chosen.Response.PeakTorqueTurnedNewtonMeters | Should -BeGreaterThan 0
            $chosen.TorqueMargin | Should -BeLessThan 1
            ($chosen.Mechanisms | Where-Object Mechanism -EQ 'Torque').Detail | Should -Match 'with the item turned from the orientation that links the largest flux change'
            $facing.Response.PeakTorqueTurnedNewtonMeters | Should -BeNullOrEmpty
            $facing.TorqueMargin | Should -BeNullOrEmpty -Because 'facing the field as given, its moment lies along it'
            (Get-InductionResponse -Item $ring -Source $ramp).PeakTorqueTurnedNewtonMeters | Should -Be $chosen.Response.PeakTorqueTurnedNewtonMeters
        }

        It 'refuses a field that belongs to another shape, naming it' {
            { New-ConductiveItem -Shape Disc -Material Copper -Diameter '50 mm' -Thickness '3 mm' -WireDiameter '2 mm' } |
                Should -Throw -ExpectedMessage '*WireDiameter*does not apply to a disc*'
            { New-ConductiveItem -Shape Tube -Material Copper -Diameter '50 mm' -Length '1 m' } |
                Should -Throw -ExpectedMessage '*WallThickness*'
        }
    }

    Context 'items moved through a static field' {
        It 'reports the braking force on a closed ring and the motional emf across a split one' {
            $coil = New-FieldWaveform -Ramp -From 0 -To '2 kA' -Duration '1 s' | New-FieldSource -Coil -Radius '50 mm' -Turns 10
            $ring = New-ConductiveItem -Name 'Ring' -Material Copper -Diameter '20 mm' -WireDiameter '1 mm' -Contact Held
            $split = New-ConductiveItem -Name 'Split ring' -Material Copper -Diameter '20 mm' -WireDiameter '1 mm' -Gap '2 mm' -Contact Held
            $closed = Get-InductionResponse -Item $ring -Source $coil -Position '0, 0, 30 mm' -Normal z -Velocity '0, 0, 1.5 m/s'
            $closed.BrakingForceNewtons | Should -BeGreaterThan 0
            $closed.SpeedForWeightMetersPerSecond | Should -BeGreaterThan 0
            $open = Get-InductionResponse -Item $split -Source $coil -Position '0, 0, 30 mm' -Normal z -Velocity '0, 0, 1.5 m/s'
            $open.GapVoltageVolts | Should -Be $open.MotionalEmfVolts -Because 'the ramp is slow: the motion gives the larger emf'
        }

        It 'moves a row''s item at its own velocity, over -Velocity, as -Velocity would; a row''s zero velocity places it; a row''s Position and Normal place it as X, Y, Z and NormalX, NormalY, NormalZ do' {
            $coil = New-FieldWaveform -Ramp -From 0 -To '2 kA' -Duration '1 s' | New-FieldSource -Coil -Radius '50 mm' -Turns 10
            $ring = New-ConductiveItem -Name 'Ring' -Material Copper -Diameter '20 mm' -WireDiameter '1 mm' -Contact Held
            $byParameter = Test-InductionHazard -Item $ring -Source $coil -Position '0, 0, 30 mm' -Normal z -Velocity '0, 0, 1.5 m/s'
            $placed = Test-InductionHazard -Item $ring -Source $coil -Position '0, 0, 30 mm' -Normal z
            $rows = @'
Name,Material,Diameter,WireDiameter,Contact,Position,Normal,Velocity,VelocityX,VelocityY,VelocityZ
Ring,Copper,20 mm,1 mm,Held,"0, 0, 30 mm",z,"0, 0, 1.5 m/s",,,
Ring,Copper,20 mm,1 mm,Held,"0, 0, 30 mm","0, 0, 1",,0,0,1.5 m/s
Ring,Copper,20 mm,1 mm,Held,"0, 0, 30 mm",z,"0, 0, 0",,,
Ring,Copper,20 mm,1 mm,Held,"0, 0, 30 mm",z,,,,
'@ | ConvertFrom-Csv
            $out = @($rows | Test-InductionHazard -Source $coil -Velocity '0, 0, 0.5 m/s' -WarningVariable warned -WarningAction SilentlyContinue)
            @($warned).Count | Should -Be 0 -Because 'the rows'' Position, Normal and Velocity columns are read'
            $out[0].Response.BrakingForceNewtons | Should -Be $byParameter.Response.BrakingForceNewtons
            $out[0].MinimumMargin | Should -Be $byParameter.MinimumMargin
            $out[1].Response.BrakingForceNewtons | Should -Be $byParameter.Response.BrakingForceNewtons -Because 'VelocityX, VelocityY, VelocityZ give the same velocity'
            $out[2].Response.BrakingForceNewtons | Should -BeNullOrEmpty -Because 'a row''s zero velocity stands over -Velocity: the item is placed'
            $out[2].MinimumMargin | Should -Be $placed.MinimumMargin
            $out[3].Response.Scenario.Placement.Velocity.Z | Should -Be 0.5 -Because 'a row without a velocity is moved at -Velocity'
            $out[3].Response.BrakingForceNewtons | Should -BeLessThan $out[0].Response.BrakingForceNewtons
            foreach ($r in $out) { $r.Response.Scenario.Placement.Centre.Z | Should -Be 0.03; $r.Inventory.Count | Should -Be 0 }
        }

        It 'refuses a row''s speed no person moves an item at, naming the row and its column, and goes on' {
            $coil = New-FieldWaveform -Ramp -From 0 -To '2 kA' -Duration '1 s' | New-FieldSource -Coil -Radius '50 mm' -Turns 10
            $rows = @(
                [pscustomobject]@{ Name = 'Thrown ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '1 mm'; Velocity = '0, 0, 300 m/s' }
                [pscustomobject]@{ Name = 'Carried ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '1 mm'; Velocity = '0, 0, 1 m/s' }
            )
            $out = @($rows | Test-InductionHazard -Source $coil -Position '0, 0, 30 mm' -ErrorVariable failed -ErrorAction SilentlyContinue)
            $out.ItemName | Should -Be @('Carried ring')
            "$($failed[0])" | Should -Match "^row 1 \('Thrown ring'\): Velocity: the speed must be between 0 m/s and 30 m/s"
        }

        It 'refuses a speed no person moves an item at, naming -Velocity' {
            $coil = New-FieldWaveform -Ramp -From 0 -To '2 kA' -Duration '1 s' | New-FieldSource -Coil -Radius '50 mm' -Turns 10
            { New-ConductiveItem -Material Copper -Diameter '20 mm' -WireDiameter '1 mm' | Test-InductionHazard -Source $coil -Velocity '0, 0, 300 m/s' } |
                Should -Throw -ExpectedMessage '*Velocity*'
        }
    }

    Context 'rows that repeat an item at a place' {
        BeforeAll {
            $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
            $base = @(Import-Csv $inventoryPath)
            $stations = @($base.Station | Select-Object -Unique)
            # Each demo row, then again under another name, tag and holder, then nameless, then at another station (a row
            # that differs from an earlier one only there must not take its result), the copies in another order.
            $rows = [System.Collections.Generic.List[object]]::new()
            foreach ($r in $base) { $rows.Add($r) }
            foreach ($r in $base[($base.Count - 1)..0]) {
                $spare = $r.PSObject.Copy(); $spare.Name = $r.Name + ' (spare)'; $spare.AssetTag = $r.AssetTag + '-S'; $spare.Holder = 'Stores'; $rows.Add($spare)
            }
            foreach ($r in $base) { $nameless = $r.PSObject.Copy(); $nameless.Name = ''; $rows.Add($nameless) }
            foreach ($r in $base) {
                $moved = $r.PSObject.Copy(); $moved.Station = $stations[($stations.IndexOf($r.Station) + 1) % $stations.Count]; $rows.Add($moved)
            }
            # What a result is, less when it was made and its row: its verdict, margins, findings, inventory columns and physics.
            function ConvertTo-ResultText([object] $Assessment) { $Assessment | Select-Object * -ExcludeProperty AssessedUtc, RowNumber | ConvertTo-Json -Depth 8 -Compress }
            $together = @($rows | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
        }

        It 'gives each row what assessing it alone gives, under its own name, row number and inventory columns' {
            $together.Count | Should -Be $rows.Count
            for ($n = 1; $n -le $rows.Count; $n++) {
                $row = $rows[$n - 1].PSObject.Copy()
                # Alone, a nameless row would be "row 1": it is given the name the inventory gives it, "row N".
                if (-not $row.Name) { $row.Name = "row $n" }
                $alone = @($row | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
                $together[$n - 1].RowNumber | Should -Be $n
                $together[$n - 1].ItemName | Should -Be $row.Name
                ConvertTo-ResultText $together[$n - 1] | Should -Be (ConvertTo-ResultText $alone[0]) -Because "row $n ($($row.Name)) against the same row assessed on its own"
            }

            @($together | Where-Object ItemName -Like '* (spare)' | Where-Object AssetTag -NotLike '*-S').Count | Should -Be 0
        }

        It 'gives the same with -ThrottleLimit 2 as a serial run' {
            $threaded = @($rows | Test-InductionHazard -Site $site -ThrottleLimit 2 -WarningAction SilentlyContinue)
            $threaded.Count | Should -Be $together.Count
            for ($k = 0; $k -lt $together.Count; $k++) { ConvertTo-ResultText $threaded[$k] | Should -Be (ConvertTo-ResultText $together[$k]) }
        }

        It 'gives each repeat of a row that cannot be assessed its own error, naming it' {
            $bad = foreach ($name in 'First', 'Second', 'Third') { [pscustomobject]@{ Name = $name; Material = 'Unobtainium'; Diameter = '20 mm'; WireDiameter = '2 mm' } }
            $results = @($bad | Test-InductionHazard -Source $pulse -ThrottleLimit 2 -ErrorAction SilentlyContinue -ErrorVariable failed)
            $results.Count | Should -Be 0
            $failed.Exception.Message | ForEach-Object { $_ -replace ':.*' } | Should -Be @("row 1 ('First')", "row 2 ('Second')", "row 3 ('Third')")
        }

        It 'says in its verbose notes which earlier row a row repeats (a row''s work is kept from its second sight on)' {
            $ring = [pscustomobject]@{ Name = 'Ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $other = [pscustomobject]@{ Name = 'Other'; Material = 'Copper'; Diameter = '22 mm'; WireDiameter = '2 mm' }
            $again = [pscustomobject]@{ Name = 'Ring again'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $more = [pscustomobject]@{ Name = 'Ring once more'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $notes = @($ring, $other, $again, $more, $more | Test-InductionHazard -Source $pulse -Verbose -WarningAction SilentlyContinue 4>&1 | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] } | ForEach-Object Message)
            $notes.Count | Should -Be 5
            $notes[0..2] | Should -Not -Match 'same item'
            $notes[3] | Should -Match "^row 4 \('Ring once more'\): the same item and place as row 3, whose result it takes; "
            $notes[4] | Should -Match "^row 5 \('Ring once more'\): the same item and place as row 3, whose result it takes; "
            ($notes[3] -replace '^.*whose result it takes; ') | Should -Be ($notes[0] -replace '^row 1 \(''Ring''\): ')
        }

        It 'refuses a row whose two name columns disagree, even after a row with the same item that it would repeat' {
            $agreeing = [pscustomobject]@{ Name = 'Spanner'; Description = 'Spanner'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $disagreeing = [pscustomobject]@{ Name = 'Spanner'; Description = '13 mm spanner'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm' }
            $results = @($agreeing, $agreeing, $disagreeing | Test-InductionHazard -Source $pulse -WarningAction SilentlyContinue -ErrorAction SilentlyContinue -ErrorVariable failed)
            $results.Count | Should -Be 2
            $failed.Count | Should -Be 1
            $failed[0].Exception.Message | Should -Match '^row 3\b.*Name: is given by more than one column'
        }

        It 'gives Get-InductionResponse each repeated row under its own name and inventory columns' {
            $ring = [pscustomobject]@{ Name = 'Ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; AssetTag = 'R-1' }
            $again = [pscustomobject]@{ Name = 'Same ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; AssetTag = 'R-2' }
            $third = [pscustomobject]@{ Name = 'Third ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; AssetTag = 'R-3' }
            $all = @($ring, $again, $third | Get-InductionResponse -Source $pulse -Verbose 4>&1)
            $notes = @($all | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] } | ForEach-Object Message)
            $notes[1] | Should -Not -Match 'same item'
            $notes[2] | Should -Match "^row 3 \('Third ring'\): the same item and place as row 2, whose result it takes"
            $responses = @($all | Where-Object { $_ -isnot [System.Management.Automation.VerboseRecord] })
            $responses.ItemName | Should -Be @('Ring', 'Same ring', 'Third ring')
            $responses[2].Scenario.Inventory['AssetTag'] | Should -Be 'R-3'
            $alone = @($third | Get-InductionResponse -Source $pulse)[0]
            ($responses[2] | ConvertTo-Json -Depth 8 -Compress) | Should -Be ($alone | ConvertTo-Json -Depth 8 -Compress)
        }
    }

    Context 'a visitor among workers, named by the row' {
        BeforeAll {
            # 3 kA rms in a long line: 240 uT rms at 2.5 m (Ampere's law), between the public's 0.2 mT and the workers' 1 mT.
            $line = New-FieldWaveform -Sine -Amplitude ([math]::Sqrt(2) * 3000) -Frequency '50 Hz' | New-FieldSource -Conductor -Name 'Line'
            $visitors = @'
Name,Material,Diameter,WireDiameter,Contact,ExposureGroup,Holder
Worker ring,Copper,20 mm,2 mm,Skin,,tech A
Visitor ring,Copper,20 mm,2 mm,Skin,Public,guest B
Second visitor,Copper,20 mm,2 mm,Skin,Public,guest C
Third visitor,Copper,20 mm,2 mm,Skin,Public,guest D
Named worker,Copper,20 mm,2 mm,Skin,Occupational,tech E
Loose loop,Copper,20 mm,2 mm,Free,Public,stores
'@ | ConvertFrom-Csv
        }

        # Validates: a visitor named by the row among workers, 240 uT rms at 50 Hz, margins 0.2 mT / 240 uT and 1 mT / 240 uT through Test-InductionHazard | ICNIRP 2010, Health Phys 99:818, tables 3 and 4; Ampere's law | 1e-6
        It 'judges a row''s visitor at the public''s level and its workers at theirs, serially and on two threads alike' {
            foreach ($threads in 1, 2) {
                $out = @($visitors | Test-InductionHazard -Source $line -Position '2.5 m, 0, 0' -ThrottleLimit $threads -WarningAction SilentlyContinue)
                $out.ExposureGroup | Should -Be @('Occupational', 'Public', 'Public', 'Public', 'Occupational', 'Public')
                [math]::Abs($out[0].ExposureMargin / (1e-3 / 240e-6) - 1) | Should -BeLessThan 1e-6
                [math]::Abs($out[1].ExposureMargin / (2e-4 / 240e-6) - 1) | Should -BeLessThan 1e-6
                # The third visitor's row repeats the second's (the first's result is kept from its second sight) and takes it.
                $out[3].ExposureMargin | Should -Be $out[1].ExposureMargin
                $out[3].InputHash | Should -Be (@($visitors[3] | Test-InductionHazard -Source $line -Position '2.5 m, 0, 0')[0].InputHash) -Because 'the result taken carries the visitor''s inputs, as one assessed alone'
                $out.Verdict | Should -Be @('Clear', 'Hazard', 'Hazard', 'Hazard', 'Clear', 'Clear')
                $out[1].Inventory.Keys | Should -Be @('Holder') -Because 'the group is a field of the row, not one of the inventory''s own columns'
                (($out[1].Mechanisms | Where-Object Mechanism -EQ 'Exposure').Sources -join '; ') | Should -Match "inventory row: ExposureGroup = Public"
                $out[5].ExposureMargin | Should -BeNullOrEmpty -Because 'a loose loop puts no one at its place, visitor or not'
            }
        }

        It 'warns, and judges the public''s level all the same, where a row names a worker under a policy that judges the public' {
            $out = @($visitors[4] | Test-InductionHazard -Source $line -Position '2.5 m, 0, 0' -Policy @{ Name = 'Gallery'; ExposureGroup = 'Public' } -WarningVariable warned -WarningAction SilentlyContinue)
            $out[0].ExposureGroup | Should -Be 'Public'
            $out[0].Verdict | Should -Be 'Hazard'
            @($warned).Count | Should -Be 1
            "$($warned[0])" | Should -Match "^Named worker: ExposureGroup 'Occupational' is not applied: the policy 'Gallery' judges the public's exposure"
        }

        It 'refuses a group it does not know, naming the row, the field and the groups, and goes on' {
            $bad = $visitors[1].PSObject.Copy(); $bad.ExposureGroup = 'Visitor'
            $out = @($visitors[0], $bad, $visitors[1] | Test-InductionHazard -Source $line -Position '2.5 m, 0, 0' -ErrorVariable failed -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
            $out.ItemName | Should -Be @('Worker ring', 'Visitor ring')
            @($failed).Count | Should -Be 1
            "$($failed[0])" | Should -Match "^row 2 \('Visitor ring'\): ExposureGroup: 'Visitor' is not one of Occupational, Public"
        }

        # Validates: a visitor's safe distance from a line named by the row, five times a worker's | ICNIRP 2010, Health Phys 99:818, tables 3 and 4 (0.2 mT against 1 mT at 50 Hz); Ampere's law (B proportional to 1/r) | 1e-2
        It 'finds a visitor''s safe distance from the row''s group: five times a worker''s from the line, as 1/r and the two levels give' {
            $worker = @($visitors[0] | Find-SafeDistance -Source $line -From '0.2 m, 0, 0' -Direction x -MaxDistance '30 m')[0]
            $visitor = @($visitors[1] | Find-SafeDistance -Source $line -From '0.2 m, 0, 0' -Direction x -MaxDistance '30 m')[0]
            $visitor.Assessment.ExposureGroup | Should -Be 'Public'
            $worker.GoverningMechanism | Should -Be 'Exposure'
            $visitor.GoverningMechanism | Should -Be 'Exposure'
            # From the line's axis: 1.2 m for a worker (240 uT x 2.5 m / (1 mT / 2)), 6 m for a visitor (/ (0.2 mT / 2)).
            [math]::Abs(($visitor.Position.X) / ($worker.Position.X) - 5) | Should -BeLessThan 5e-2
            [math]::Abs($visitor.Position.X - 6.0) | Should -BeLessThan 1e-2
        }
    }

    Context 'a loop turned from the worst orientation' {
        It 'takes -Tilt, or a row''s Tilt, in place of a normal: in a uniform field the emf falls as the cosine of the tilt' {
            $coil = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Coil'
            $ring = New-ConductiveItem -Name 'Ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Contact Skin
            $facing = Test-InductionHazard -Item $ring -Source $coil
            $tilted = Test-InductionHazard -Item $ring -Source $coil -Tilt '60 deg'
            [math]::Abs($tilted.PeakEmfVolts / $facing.PeakEmfVolts - 0.5) | Should -BeLessThan 1e-9
            $tilted.Response.Orientation | Should -BeLike 'tilted 60 degrees from the largest flux change*'
            $rows = @'
Name,Material,Diameter,WireDiameter,Contact,Tilt,Normal
Ring,Copper,20 mm,2 mm,Skin,60 deg,
Ring,Copper,20 mm,2 mm,Skin,,x
Ring,Copper,20 mm,2 mm,Skin,,
'@ | ConvertFrom-Csv
            $out = @($rows | Test-InductionHazard -Source $coil -Tilt '30 deg')
            $out[0].PeakEmfVolts | Should -Be $tilted.PeakEmfVolts -Because 'the row''s own tilt stands over -Tilt'
            $out[1].PeakEmfVolts | Should -BeLessThan (1e-9 * $facing.PeakEmfVolts) -Because 'the row''s own normal, edge-on to the field, stands over -Tilt'
            [math]::Abs($out[2].PeakEmfVolts / $facing.PeakEmfVolts - [math]::Cos([math]::PI / 6)) | Should -BeLessThan 1e-9
            $out[0].InputHash | Should -Not -Be $out[2].InputHash
        }

        It 'refuses a tilt with a normal, or beyond a quarter turn, naming it' {
            $coil = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Coil'
            $ring = New-ConductiveItem -Name 'Ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm'
            { Test-InductionHazard -Item $ring -Source $coil -Tilt '30 deg' -Normal z } | Should -Throw -ExpectedMessage '*Tilt*not both*'
            { Test-InductionHazard -Item $ring -Source $coil -Tilt '100 deg' } | Should -Throw -ExpectedMessage '*Tilt*must be between 0 degrees and 90 degrees*'
            $row = [pscustomobject]@{ Name = 'Ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Tilt = '30 deg'; NormalX = '0'; NormalY = '0'; NormalZ = '1' }
            $null = $row | Test-InductionHazard -Source $coil -ErrorVariable failed -ErrorAction SilentlyContinue
            "$($failed[0])" | Should -BeLike "row 1 ('Ring'): Tilt: give a normal*or a tilt from the worst orientation, not both*"
        }

        It 'takes a station''s Tilt, under a row''s normal or tilt and under -Normal or -Tilt' {
            $siteFile = Join-Path $TestDrive 'tilted-site.psd1'
            @'
@{
    Site = 'Tilt bench'
    Stations = @(
        @{ Name = 'Slanted rack'; Tilt = '60 deg'; Sources = @( @{ Form = 'Uniform'; Name = 'Coil'; Waveform = @{ Form = 'Sine'; Amplitude = '10 mT'; Frequency = '50 Hz' } } ) }
    )
}
'@ | Set-Content -LiteralPath $siteFile
            $site = Import-HazardSite $siteFile
            ($site.Stations[0] | Format-List | Out-String) | Should -BeLike '*tilted 60 degrees from the orientation that links the largest flux change*'
            $coil = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Coil'
            $ring = New-ConductiveItem -Name 'Ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Contact Skin
            $facing = Test-InductionHazard -Item $ring -Source $coil
            $tilted = Test-InductionHazard -Item $ring -Source $coil -Tilt '60 deg'
            $rows = @'
Name,Material,Diameter,WireDiameter,Contact,Station,Tilt,Normal
Ring,Copper,20 mm,2 mm,Skin,Slanted rack,,
Ring,Copper,20 mm,2 mm,Skin,Slanted rack,30 deg,
Ring,Copper,20 mm,2 mm,Skin,Slanted rack,,x
'@ | ConvertFrom-Csv
            $out = @($rows | Test-InductionHazard -Site $site)
            $out[0].PeakEmfVolts | Should -Be $tilted.PeakEmfVolts -Because 'the station''s tilt is taken as -Tilt is'
            $out[0].Response.Orientation | Should -BeLike 'tilted 60 degrees from the largest flux change*'
            [math]::Abs($out[1].PeakEmfVolts / $facing.PeakEmfVolts - [math]::Cos([math]::PI / 6)) | Should -BeLessThan 1e-9 -Because 'the row''s own tilt stands over the station''s'
            $out[2].PeakEmfVolts | Should -BeLessThan (1e-9 * $facing.PeakEmfVolts) -Because 'the row''s own normal, edge-on to the field, stands over the station''s tilt'
            $overNormal = @($rows[0] | Test-InductionHazard -Site $site -Normal x)
            $overNormal[0].PeakEmfVolts | Should -BeLessThan (1e-9 * $facing.PeakEmfVolts) -Because '-Normal stands over the station''s tilt'
            $overTilt = @($rows[0] | Test-InductionHazard -Site $site -Tilt '0 deg')
            $overTilt[0].PeakEmfVolts | Should -Be $facing.PeakEmfVolts -Because '-Tilt stands over the station''s'
            (Get-InductionResponse -Item $ring -Site $site -Station 'Slanted rack').PeakEmfVolts | Should -Be $tilted.Response.PeakEmfVolts
        }

        It 'faces a large loop beside a coil the way that links the most flux, and is Indeterminate where that way runs into the winding' {
            $coil = New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz' | New-FieldSource -Coil -Radius '100 mm' -Turns 10 -Name 'Heater coil'
            $loop = New-ConductiveItem -Name 'Cable loop' -Material Copper -Diameter '300 mm' -WireDiameter '4 mm' -Gap '5 mm' -Contact Free
            # 50 mm above the coil, on its axis: turned some 21 degrees the loop links 2.6 % more than facing the axis.
            $above = Test-InductionHazard -Item $loop -Source $coil -Position '0, 0, 50 mm'
            $facing = Test-InductionHazard -Item $loop -Source $coil -Position '0, 0, 50 mm' -Normal z
            $above.PeakEmfVolts | Should -BeGreaterThan (1.02 * $facing.PeakEmfVolts)
            # 30 mm above the winding, off the axis: the flux grows as the loop turns toward the winding until it cannot be found.
            $near = Test-InductionHazard -Item $loop -Source $coil -Position '120 mm, 0, 30 mm' -WarningAction SilentlyContinue
            $near.Verdict | Should -Be 'Indeterminate'
            ($near.Reasons -join ' ') | Should -BeLike '*orientation that links the largest flux change cannot be found this near the source*give how the item sits (-Normal*'
            (Test-InductionHazard -Item $loop -Source $coil -Position '120 mm, 0, 30 mm' -Normal z).Verdict | Should -Not -Be 'Indeterminate' -Because 'given how it sits, it is judged'
        }

        It 'refuses a station''s tilt beside its normal, or beyond a quarter turn, naming the station' {
            foreach ($case in @(
                    @{ Values = "Tilt = '30 deg'; Normal = 'z'"; Message = "*station 'Rack'*Tilt*give a normal (Normal) or a tilt from the worst orientation, not both*" },
                    @{ Values = "Tilt = '120 deg'"; Message = "*station 'Rack'*Tilt*must be between 0 degrees and 90 degrees*" },
                    @{ Values = "Tilt = '30'"; Message = "*station 'Rack'*Tilt*" })) {
                $siteFile = Join-Path $TestDrive 'bad-tilt.psd1'
                "@{ Site = 'Bench'; Stations = @( @{ Name = 'Rack'; $($case.Values); Sources = @( @{ Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = '10 mT'; Frequency = '50 Hz' } } ) } ) }" | Set-Content -LiteralPath $siteFile
                { Import-HazardSite $siteFile } | Should -Throw -ExpectedMessage $case.Message
            }
        }
    }

    Context 'the air around a station or a row' {
        BeforeAll {
            $siteFile = Join-Path $TestDrive 'furnace-site.psd1'
            Set-Content $siteFile @"
@{
    Site = 'Furnace hall'
    Stations = @(
        @{ Name = 'Coil mouth'; Sources = @( @{ Form = 'Uniform'; Name = 'Coil'; Waveform = @{ Form = 'Sine'; Amplitude = '1.5 mT'; Frequency = '9.6 kHz' } } ); ExposureTime = '2 min'; AmbientTemperature = '38 degC' }
        @{ Name = 'Hall door'; Sources = @( @{ Form = 'Uniform'; Name = 'Coil'; Waveform = @{ Form = 'Sine'; Amplitude = '1.5 mT'; Frequency = '9.6 kHz' } } ); ExposureTime = '2 min' }
    )
}
"@
            $site = Import-HazardSite $siteFile
            $rows = @'
Name,Material,Diameter,WireDiameter,Contact,Station,AmbientTemperature
Band at the coil,Silver,20 mm,2 mm,Skin,Coil mouth,
Band at the door,Silver,20 mm,2 mm,Skin,Hall door,
Band at the coil in a cool draught,Silver,20 mm,2 mm,Skin,Coil mouth,25 degC
'@ | ConvertFrom-Csv
            $band = New-ConductiveItem -Name 'Band' -Material Silver -Diameter '20 mm' -WireDiameter '2 mm' -Contact Skin
            $coil = New-FieldWaveform -Sine -Amplitude '1.5 mT' -Frequency '9.6 kHz' | New-FieldSource -Uniform -Name 'Coil'
        }

        It 'assesses a station''s rows in its own air, a row in its own, and the rest at 20 degC, as -AmbientTemperature would' {
            foreach ($threads in 1, 2) {
                $out = @($rows | Test-InductionHazard -Site $site -ThrottleLimit $threads -WarningVariable warned -WarningAction SilentlyContinue)
                @($warned).Count | Should -Be 0 -Because 'the AmbientTemperature column is read'
                $out.Response.Scenario.Environment.AmbientCelsius | Should -Be @(38, 20, 25)
                foreach ($k in 0..2) {
                    $alone = Test-InductionHazard -Item $band -Source $coil -ExposureTime '2 min' -AmbientTemperature "$($out[$k].Response.Scenario.Environment.AmbientCelsius) degC"
                    $out[$k].BurnMargin | Should -Be $alone.BurnMargin
                    $out[$k].PeakTemperatureCelsius | Should -Be $alone.PeakTemperatureCelsius
                }

                $out[0].BurnMargin | Should -BeLessThan $out[1].BurnMargin -Because 'skin already warm in the furnace''s air has less rise to spare'
                $out[0].Inventory.Count | Should -Be 0
            }
        }

        It 'takes -AmbientTemperature over the station''s air, saying so, and a row''s own over both' {
            $out = @($rows | Test-InductionHazard -Site $site -AmbientTemperature '30 degC' -WarningVariable warned -WarningAction SilentlyContinue)
            $out.Response.Scenario.Environment.AmbientCelsius | Should -Be @(30, 30, 25)
            @($warned).Count | Should -Be 1 -Because 'one station gives air of its own'
            "$($warned[0])" | Should -Be "-AmbientTemperature replaces the air of station 'Coil mouth' (38.0 °C): its items are assessed in air at 30.0 °C, unless a row gives its own."
            $null = Find-SafeDistance -Item $band -Site $site -Station 'Coil mouth' -Direction x -MaxDistance '100 mm' -AmbientTemperature '30 degC' -WarningVariable searched -WarningAction SilentlyContinue
            @($searched) -like '-AmbientTemperature replaces the air of station*' | Should -HaveCount 1
            $null = @($rows[1]) | Test-InductionHazard -Site $site -Station 'Hall door' -AmbientTemperature '30 degC' -WarningVariable none -WarningAction SilentlyContinue
            @($none).Count | Should -Be 0 -Because 'the door gives no air of its own'
        }

        It 'searches a safe distance in a row''s or the station''s air, as -AmbientTemperature would' {
            $lead = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '9.6 kHz' | New-FieldSource -Conductor -Name 'Coil lead'
            $byParameter = Find-SafeDistance -Item $band -Source $lead -From '30 mm, 0, 0' -Direction x -ExposureTime '2 min' -AmbientTemperature '38 degC'
            $byParameter.Found | Should -BeTrue
            (Find-SafeDistance -Item $band -Site $site -Station 'Coil mouth' -Direction x -MaxDistance '1 m' -WarningAction SilentlyContinue).Assessment.Response.Scenario.Environment.AmbientCelsius | Should -Be 38
            $row = [pscustomobject]@{ Name = 'Band'; Material = 'Silver'; Diameter = '20 mm'; WireDiameter = '2 mm'; Contact = 'Skin'; AmbientTemperature = '38 degC' }
            $found = $row | Find-SafeDistance -Source $lead -From '30 mm, 0, 0' -Direction x -ExposureTime '2 min'
            $found.DistanceMeters | Should -Be $byParameter.DistanceMeters
            $found.Assessment.Response.Scenario.Environment.AmbientCelsius | Should -Be 38
        }
    }

    Context 'a row''s own exposure time, and columns a row does not give' {
        BeforeAll {
            $heater = New-FieldWaveform -Sine -Amplitude '4 mT' -Frequency '12 kHz' | New-FieldSource -Uniform -Name 'Heater coil'
            $timed = @'
Name,Material,Diameter,WireDiameter,Contact,ExposureTime,LeaveTime,Policy,Holder
Brief ring,Copper,20 mm,2 mm,Skin,10 s,2 s,site rules,cleaner
All-day ring,Copper,20 mm,2 mm,Skin,,,site rules,technician
'@ | ConvertFrom-Csv
        }

        It 'assesses a row for its own ExposureTime and LeaveTime, as -ExposureTime and -LeaveTime would, and the others for the run''s' {
            $out = @($timed | Test-InductionHazard -Source $heater -ExposureTime '1 h' -WarningAction SilentlyContinue)
            $brief = Test-InductionHazard -Item (New-ConductiveItem -Name 'Brief ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm') -Source $heater -ExposureTime '10 s' -LeaveTime '2 s'
            $long = Test-InductionHazard -Item (New-ConductiveItem -Name 'All-day ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm') -Source $heater -ExposureTime '1 h'
            $out[0].BurnMargin | Should -Be $brief.BurnMargin
            $out[0].Response.Scenario.LeaveSeconds | Should -Be 2
            $out[1].BurnMargin | Should -Be $long.BurnMargin
            $out[0].BurnMargin | Should -BeGreaterThan $out[1].BurnMargin -Because '10 s in the field heats the skin less than an hour'
            $out[0].Inventory.Keys | Should -Be @('Policy', 'Holder') -Because 'the times are the row''s fields; Policy is not read per row'
        }

        It 'warns once a run that a column named like a parameter it does not read per row is kept as the inventory''s own' {
            $null = $timed | Test-InductionHazard -Source $heater -WarningVariable warned -WarningAction SilentlyContinue
            @($warned).Count | Should -Be 1
            "$($warned[0])" | Should -BeLike "The column 'Policy' is not read per row: it is kept as one of the inventory's own columns, and every row is judged by -Policy or its station's; an ExposureGroup column names a visitor among workers."
            # A later row with columns of its own is looked at afresh: its new column is named once, the old one not again.
            $moving = @{ Name = 'Sourced ring'; Material = 'Copper'; Diameter = '20 mm'; WireDiameter = '2 mm'; Policy = 'site rules'; Source = 'Heater coil' }
            $null = @($timed[0], $moving, $timed[1], $moving) | Test-InductionHazard -Source $heater -WarningVariable again -WarningAction SilentlyContinue
            @($again).Count | Should -Be 2
            "$($again[1])" | Should -BeLike "The column 'Source' is not read per row*"
        }

        It 'refuses a row''s time without its unit or out of range, naming the row and the field, and goes on' {
            $bad = $timed[0].PSObject.Copy(); $bad.ExposureTime = '30'
            $far = $timed[0].PSObject.Copy(); $far.ExposureTime = '9 h'
            $out = @($bad, $far, $timed[1] | Test-InductionHazard -Source $heater -ErrorVariable failed -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
            $out.ItemName | Should -Be @('All-day ring')
            "$($failed[0])" | Should -Match "^row 1 \('Brief ring'\): ExposureTime: '30' has no unit"
            "$($failed[1])" | Should -Match "^row 2 \('Brief ring'\): ExposureTime: must be between 100 ms and 28800 s = 8 h"
        }
    }

    Context 'a stay longer than the drive' {
        It 'judges an 8 h stay no milder than leaving as soon as a ramp ends, and says which stay it kept' {
            $ring = New-ConductiveItem -Name 'Ring at the bore' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm'
            $ramp = New-FieldWaveform -Ramp -From '0 T' -To '3 T' -Duration '1 s' | New-FieldSource -Uniform -Name 'Bore ramp'
            $long = Test-InductionHazard -Item $ring -Source $ramp -ExposureTime '8 h'
            $once = Test-InductionHazard -Item $ring -Source $ramp
            $long.BurnMargin | Should -Be $once.BurnMargin -Because 'leaving as the ramp ends adds its heat to the ramp''s before the ring cools'
            $long.Response.ExposureSeconds | Should -Be 1
            ($long.Response.ModelNotes -join "`n") | Should -Match 'stay: judged as given \(28\.8 ks\) and leaving as soon as the drive stops changing \(1 s\).*this is the shorter stay'
            $long.InputHash | Should -Not -Be $once.InputHash -Because 'the inputs gave 8 h, whichever stay was kept'
            $long | Export-HazardReport -Path (Join-Path $TestDrive 'stay.md')
            Get-Content (Join-Path $TestDrive 'stay.md') -Raw | Should -Match '\| Time in the field \| 1 s, leaving as soon as the drive stops changing, judged worse than the stay given \(28\.8 ks\)'
        }
    }

    Context 'the demo site as a person reads it' {
        It 'shows every margin in the table as a plain figure between 0.001 and 1000, or as a bound' {
            $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
            $assessed = @(Import-Csv $inventoryPath | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
            $table = $assessed | Format-Table | Out-String -Width 200
            $table | Should -Not -Match '\d\.?\d*E[+-]\d' -Because 'no margin or figure is shown in exponent form'
            $shown = $assessed | ForEach-Object { [InductionHazard.Quantities.SiFormat]::Margin($_.MinimumMargin) }
            foreach ($text in $shown | Where-Object { $_ -notin '> 1000', '< 0.001', 'not judged' }) {
                [double] $text | Should -BeGreaterOrEqual 0.001
                [double] $text | Should -BeLessThan 1000
            }
            ($assessed | Where-Object MinimumMargin -GE 1000).Count | Should -BeGreaterThan 0 -Because 'the demo has items with huge margins, shown as "> 1000"'
            $table | Should -Match '> 1000'
        }

        It 'shows an item that could not be judged with its margin "not judged", never as a number' {
            $site = Import-HazardSite (Join-Path $root 'examples/marrowby-heath-site.psd1')
            $assessed = @(Import-Csv $inventoryPath | Test-InductionHazard -Site $site -WarningAction SilentlyContinue)
            $open = @($assessed | Where-Object Verdict -EQ 'Indeterminate')
            $open.Count | Should -BeGreaterThan 0 -Because 'the demo has an item the model cannot judge'
            $lines = ($open | Format-Table | Out-String -Width 200) -split [Environment]::NewLine | Where-Object { $_ -match 'Indeterminate' }
            $lines.Count | Should -Be $open.Count
            foreach ($line in $lines) {
                $line | Should -Match 'Indeterminate\s+\w+\s+not judged\s' -Because 'the margin column says the item was not judged'
            }
            ($open[0].Mechanisms | Where-Object Verdict -EQ 'Indeterminate' | Format-Table | Out-String -Width 200) | Should -Match 'Indeterminate\s+not judged'
        }
    }
}
