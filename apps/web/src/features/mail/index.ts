export { mailKeys, messagesQuery, useMessages } from './api/messages';
export { textKeys, textsQuery, useTexts } from './api/texts';
export { FailedMessagesNotice, MessagesPanel } from './components/messages-panel';
export { SendReportButton } from './components/send-report-button';
export { TextsPanel, TextStatusBadge } from './components/texts-panel';
