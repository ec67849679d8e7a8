<#
.SYNOPSIS
    Builds the module's MAML help (InductionHazard.dll-Help.xml) from docs/cmdlets/*.md.
.DESCRIPTION
    Each cmdlet has one Markdown file with the sections: # <Cmdlet>, ## Synopsis, ## Description,
    ## Parameters (### -Name, one per parameter), ## Examples (### Example N: title, a powershell code block,
    then remarks), ## Inputs, ## Outputs, ## Notes, ## Related links. Syntax, types, positions, pipeline input
    and aliases come from the cmdlets themselves, so the help cannot drift from the code. A parameter the
    cmdlet has but the Markdown does not describe (or the other way round) stops the build. A parameter's
    "Default value: ..." line becomes the default value Get-Help shows; a description that speaks of a default
    without that line stops the build too.
#>
[CmdletBinding()]
param(
    [Parameter(Mandatory)] [string] $ModulePath,
    [Parameter(Mandatory)] [string] $MarkdownPath,
    [Parameter(Mandatory)] [string] $OutputPath
)

$ErrorActionPreference = 'Stop'
Set-StrictMode -Version Latest
$module = Import-Module $ModulePath -PassThru -Force
$common = [System.Management.Automation.Cmdlet]::CommonParameters + [System.Management.Automation.Cmdlet]::OptionalCommonParameters

function Read-HelpMarkdown {
    param([string] $Path)
    $doc = [ordered]@{ Sections = [ordered]@{}; Parameters = [ordered]@{}; Examples = [System.Collections.Generic.List[object]]::new() }
    $section = $null
    $sub = $null
    $buffer = [System.Collections.Generic.List[string]]::new()
    $inCode = $false
    $code = [System.Collections.Generic.List[string]]::new()

    $flush = {
        $text = ($buffer -join "`n").Trim()
        $buffer.Clear()
        if ($null -eq $section) { return }
        if ($section -eq 'Parameters' -and $sub) { $doc.Parameters[$sub] = $text }
        elseif ($section -eq 'Examples' -and $sub) { $doc.Examples[$doc.Examples.Count - 1].Remarks = $text }
        elseif (-not $sub) { $doc.Sections[$section] = $text }
    }

    foreach ($line in Get-Content $Path) {
        if ($line -match '^```') {
            if ($inCode) {
                $doc.Examples[$doc.Examples.Count - 1].Code = ($code -join "`n")
                $code.Clear()
                $inCode = $false
            }
            else { $inCode = $true }
            continue
        }
        if ($inCode) { $code.Add($line); continue }
        if ($line -match '^# (.+)$') { $doc.Name = $Matches[1].Trim(); continue }
        if ($line -match '^## (.+)$') { & $flush; $section = $Matches[1].Trim(); $sub = $null; continue }
        if ($line -match '^### (.+)$') {
            & $flush
            $sub = $Matches[1].Trim()
            if ($section -eq 'Parameters') { $sub = $sub.TrimStart('-') }
            if ($section -eq 'Examples') { $doc.Examples.Add([pscustomobject]@{ Title = $sub; Code = ''; Remarks = '' }) }
            continue
        }
        $buffer.Add($line)
    }
    & $flush
    $doc
}

function Add-Paras {
    param([System.Xml.XmlWriter] $W, [string] $Text)
    # Paragraphs are separated by blank lines; each list item ("- ") is a paragraph of its own.
    $text = $Text -replace "`n- ", "`n`n- "
    $paras = @(($text -split "`n\s*`n") | ForEach-Object { ($_ -replace '\s+', ' ').Trim() } | Where-Object { $_ })
    if ($paras.Count -eq 0) { $paras = @('') }
    foreach ($p in $paras) { $W.WriteElementString('maml', 'para', $maml, $p) }
}

function Write-Parameter {
    param([System.Xml.XmlWriter] $W, $Parameter, $Set, [string] $Description)
    $meta = $Parameter
    $attr = if ($Set) { $Set } else { $meta.ParameterSets.Values | Select-Object -First 1 }
    $pipeline = @()
    if ($attr.ValueFromPipeline) { $pipeline += 'ByValue' }
    if ($attr.ValueFromPipelineByPropertyName) { $pipeline += 'ByPropertyName' }
    $pipelineText = if ($pipeline) { 'True (' + ($pipeline -join ', ') + ')' } else { 'False' }
    $position = if ($attr.Position -ge 0) { [string] $attr.Position } else { 'named' }
    $aliases = if ($meta.Aliases.Count) { $meta.Aliases -join ', ' } else { 'none' }
    $globbing = [bool] ($meta.Attributes | Where-Object { $_ -is [System.Management.Automation.SupportsWildcardsAttribute] })
    $typeName = $meta.ParameterType.Name
    if ($meta.ParameterType.IsGenericType -and $meta.ParameterType.GetGenericTypeDefinition() -eq [Nullable`1]) {
        $typeName = $meta.ParameterType.GetGenericArguments()[0].Name
    }

    # The "Default value: ..." line is the help's default value, not part of the description.
    $default = ''
    if ($Description -match '(?m)^Default value: (.+)$') {
        $default = $Matches[1].Trim()
        $Description = ($Description -replace '(?m)^Default value: .+$', '').Trim()
    }

    $W.WriteStartElement('command', 'parameter', $command)
    $W.WriteAttributeString('required', ([string] $attr.IsMandatory).ToLowerInvariant())
    $W.WriteAttributeString('variableLength', ([string] $meta.ParameterType.IsArray).ToLowerInvariant())
    $W.WriteAttributeString('globbing', ([string] $globbing).ToLowerInvariant())
    $W.WriteAttributeString('pipelineInput', $pipelineText)
    $W.WriteAttributeString('position', $position)
    $W.WriteAttributeString('aliases', $aliases)
    $W.WriteElementString('maml', 'name', $maml, $meta.Name)
    $W.WriteStartElement('maml', 'description', $maml); Add-Paras $W $Description; $W.WriteEndElement()
    if ($meta.ParameterType -ne [switch]) {
        $W.WriteStartElement('command', 'parameterValue', $command)
        $W.WriteAttributeString('required', 'true')
        $W.WriteAttributeString('variableLength', ([string] $meta.ParameterType.IsArray).ToLowerInvariant())
        $W.WriteString($typeName)
        $W.WriteEndElement()
    }
    $W.WriteStartElement('dev', 'type', $dev); $W.WriteElementString('maml', 'name', $maml, $meta.ParameterType.FullName); $W.WriteEndElement()
    $W.WriteElementString('dev', 'defaultValue', $dev, $(if ($default) { $default } elseif ($meta.ParameterType -eq [switch]) { 'False' } else { 'None' }))
    $W.WriteEndElement()
}

$maml = 'http://schemas.microsoft.com/maml/2004/10'
$command = 'http://schemas.microsoft.com/maml/dev/command/2004/10'
$dev = 'http://schemas.microsoft.com/maml/dev/2004/10'

$settings = [System.Xml.XmlWriterSettings]::new()
$settings.Indent = $true
$settings.Encoding = [System.Text.UTF8Encoding]::new($false)
$writer = [System.Xml.XmlWriter]::Create($OutputPath, $settings)
$writer.WriteStartDocument()
$writer.WriteStartElement('helpItems', 'http://msh')
$writer.WriteAttributeString('schema', 'maml')
$problems = [System.Collections.Generic.List[string]]::new()

foreach ($cmd in Get-Command -Module $module.Name -CommandType Cmdlet | Sort-Object Name) {
    $file = Join-Path $MarkdownPath ($cmd.Name + '.md')
    if (-not (Test-Path $file)) { $problems.Add("$($cmd.Name): no help file $file"); continue }
    $doc = Read-HelpMarkdown $file
    $parameters = @($cmd.Parameters.Values | Where-Object Name -NotIn $common)
    foreach ($p in $parameters) { if (-not $doc.Parameters.Contains($p.Name)) { $problems.Add("$($cmd.Name): -$($p.Name) is not described") } }
    foreach ($name in $doc.Parameters.Keys) { if ($name -notin $parameters.Name) { $problems.Add("$($cmd.Name): the help describes -$name, which the cmdlet does not have") } }
    foreach ($name in $doc.Parameters.Keys) {
        $text = $doc.Parameters[$name]
        if ($text -match '\bdefaults?\b' -and $text -notmatch '(?m)^Default value: \S') { $problems.Add("$($cmd.Name): -$name speaks of a default but has no 'Default value:' line") }
    }
    foreach ($s in 'Synopsis', 'Description') { if (-not $doc.Sections.Contains($s) -or -not $doc.Sections[$s]) { $problems.Add("$($cmd.Name): no $s") } }

    $writer.WriteStartElement('command', 'command', $command)
    $writer.WriteAttributeString('xmlns', 'maml', $null, $maml)
    $writer.WriteAttributeString('xmlns', 'dev', $null, $dev)
    $writer.WriteStartElement('command', 'details', $command)
    $writer.WriteElementString('command', 'name', $command, $cmd.Name)
    $writer.WriteElementString('command', 'verb', $command, $cmd.Verb)
    $writer.WriteElementString('command', 'noun', $command, $cmd.Noun)
    $writer.WriteStartElement('maml', 'description', $maml); Add-Paras $writer $doc.Sections['Synopsis']; $writer.WriteEndElement()
    $writer.WriteEndElement()
    $writer.WriteStartElement('maml', 'description', $maml); Add-Paras $writer $doc.Sections['Description']; $writer.WriteEndElement()

    $writer.WriteStartElement('command', 'syntax', $command)
    foreach ($set in $cmd.ParameterSets) {
        $writer.WriteStartElement('command', 'syntaxItem', $command)
        $writer.WriteElementString('maml', 'name', $maml, $cmd.Name)
        foreach ($sp in $set.Parameters | Where-Object Name -NotIn $common) {
            $meta = $cmd.Parameters[$sp.Name]
            Write-Parameter $writer $meta $meta.ParameterSets[$set.Name] $doc.Parameters[$sp.Name]
        }
        $writer.WriteEndElement()
    }
    $writer.WriteEndElement()

    $writer.WriteStartElement('command', 'parameters', $command)
    foreach ($p in $parameters) { Write-Parameter $writer $p $null $doc.Parameters[$p.Name] }
    $writer.WriteEndElement()

    foreach ($kind in @(@('Inputs', 'inputTypes', 'inputType'), @('Outputs', 'returnValues', 'returnValue'))) {
        if ($doc.Sections.Contains($kind[0])) {
            $writer.WriteStartElement('command', $kind[1], $command)
            $writer.WriteStartElement('command', $kind[2], $command)
            $lines = @($doc.Sections[$kind[0]] -split "`n" | Where-Object { $_.Trim() })
            $writer.WriteStartElement('dev', 'type', $dev); $writer.WriteElementString('maml', 'name', $maml, $lines[0].Trim()); $writer.WriteEndElement()
            $writer.WriteStartElement('maml', 'description', $maml); Add-Paras $writer (($lines | Select-Object -Skip 1) -join "`n"); $writer.WriteEndElement()
            $writer.WriteEndElement()
            $writer.WriteEndElement()
        }
    }

    if ($doc.Sections.Contains('Notes')) {
        $writer.WriteStartElement('maml', 'alertSet', $maml)
        $writer.WriteStartElement('maml', 'alert', $maml); Add-Paras $writer $doc.Sections['Notes']; $writer.WriteEndElement()
        $writer.WriteEndElement()
    }

    if ($doc.Examples.Count -lt 2) { $problems.Add("$($cmd.Name): fewer than two examples") }
    $writer.WriteStartElement('command', 'examples', $command)
    foreach ($example in $doc.Examples) {
        if (-not $example.Code) { $problems.Add("$($cmd.Name): $($example.Title) has no code") }
        $writer.WriteStartElement('command', 'example', $command)
        $writer.WriteElementString('maml', 'title', $maml, "-------------------------- $($example.Title) --------------------------")
        $writer.WriteElementString('dev', 'code', $dev, $example.Code)
        $writer.WriteStartElement('dev', 'remarks', $dev); Add-Paras $writer $example.Remarks; $writer.WriteEndElement()
        $writer.WriteEndElement()
    }
    $writer.WriteEndElement()

    if ($doc.Sections.Contains('Related links')) {
        $writer.WriteStartElement('command', 'relatedLinks', $command)
        foreach ($link in $doc.Sections['Related links'] -split "`n" | ForEach-Object { $_.Trim().TrimStart('-', ' ') } | Where-Object { $_ }) {
            $writer.WriteStartElement('maml', 'navigationLink', $maml)
            $writer.WriteElementString('maml', 'linkText', $maml, $link)
            $writer.WriteElementString('maml', 'uri', $maml, '')
            $writer.WriteEndElement()
        }
        $writer.WriteEndElement()
    }

    $writer.WriteEndElement()
}

$writer.WriteEndElement()
$writer.WriteEndDocument()
$writer.Close()

if ($problems.Count) {
    $problems | ForEach-Object { Write-Error $_ -ErrorAction Continue }
    exit 1
}
Write-Host "Help written to $OutputPath"
