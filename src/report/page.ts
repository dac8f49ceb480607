import { CAUTION } from '../base/caution.js';
import { VERSION } from '../base/version.js';
import { escapeHtml } from './html.js';
import { REPORT_CSS } from './styles.js';

/** The start of a report page up to its title: the head (inline CSS, nothing fetched), the title and its subtitle line. */
export function pageStart(title: string, subtitle: string): string {
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="quakesweep ${escapeHtml(VERSION)}">
<title>${escapeHtml(title)}</title>
<style>${REPORT_CSS}</style>
</head>
<body>
<header class="title">
<h1>${escapeHtml(title)}</h1>
<p>${subtitle}</p>`;
}

/** The caution, first thing under every report's title. */
export const CAUTION_BLOCK = `<div class="caution" role="note" id="caution"><strong>Caution</strong>${escapeHtml(CAUTION)}</div>`;
