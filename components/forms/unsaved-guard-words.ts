export const LEAVE_QUESTION = 'You have changes on this page that are not saved. Leave without saving them?';
