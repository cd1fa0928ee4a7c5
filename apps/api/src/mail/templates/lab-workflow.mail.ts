import { renderMail, type MailContent } from './layout.js';

interface TestMailContext {
  testReference: string;
  projectName: string;
  sampleLabel: string;
  url: string;
}

export function testSubmittedMail(input: TestMailContext & { technicianName: string; warningCount: number }): MailContent {
  return renderMail({
    subject: `For review: test ${input.testReference} (${input.projectName})`,
    paragraphs: [
      'Hello,',
      `${input.technicianName} submitted consolidation test ${input.testReference} on ${input.sampleLabel} of ${input.projectName} for review.`,
      input.warningCount === 0 ? 'The analysis raised no warnings.' : `The analysis raised ${input.warningCount} warning${input.warningCount === 1 ? '' : 's'}; they are listed on the test page.`,
    ],
    action: { label: 'Review the test', url: input.url },
    footer: 'You receive this because you are a lab manager of the organisation.',
  });
}

export function testApprovedMail(input: TestMailContext & { reviewerName: string; version: number; comment: string | null }): MailContent {
  return renderMail({
    subject: `Approved: test ${input.testReference} (${input.projectName})`,
    paragraphs: [
      'Hello,',
      `${input.reviewerName} approved consolidation test ${input.testReference} on ${input.sampleLabel}. Its parameters are now soil record version ${input.version}.`,
      ...(input.comment ? [`Comment: ${input.comment}`] : []),
    ],
    action: { label: 'Open the test', url: input.url },
    footer: 'You receive this because you ran this test.',
  });
}

export function changesRequestedMail(input: TestMailContext & { reviewerName: string; comment: string }): MailContent {
  return renderMail({
    subject: `Changes requested: test ${input.testReference} (${input.projectName})`,
    paragraphs: [
      'Hello,',
      `${input.reviewerName} sent consolidation test ${input.testReference} on ${input.sampleLabel} back for changes:`,
      input.comment,
      'Make the changes, re-run the analysis and submit it again.',
    ],
    action: { label: 'Open the test', url: input.url },
    footer: 'You receive this because you ran this test.',
  });
}

export function newSoilRecordVersionMail(
  input: TestMailContext & { version: number; supersedes: number | null; summary: string },
): MailContent {
  return renderMail({
    subject: `New soil record: ${input.sampleLabel} (${input.projectName}), version ${input.version}`,
    paragraphs: [
      'Hello,',
      input.supersedes === null
        ? `Parameters from consolidation test ${input.testReference} on ${input.sampleLabel} were approved as soil record version ${input.version}.`
        : `Version ${input.version} of the soil record for ${input.sampleLabel} was approved and replaces version ${input.supersedes}. Check any design that used the earlier values.`,
      input.summary,
    ],
    action: { label: 'Open the soil record', url: input.url },
    footer: 'You receive this because you are a designer on this project.',
  });
}
