import type { Href } from 'expo-router';
import type { Role } from '../../shared/schemas/auth';

export interface NextStep {
  title: string;
  body: string;
  /** A screen that exists today; steps without one say plainly that they are coming. */
  href?: Href;
  linkLabel?: string;
}

export const ROLE_INTROS: Record<Role, string> = {
  admin: 'You look after who works in Dilato and what goes into the shop’s catalogue.',
  engineer: 'You keep the alloy data right, so every run of pipe is sized from numbers you trust.',
  fabricator: 'You turn alloy data into pipe that fits hot and cold: runs, flex sections and slip joints.',
  sales: 'You turn material choices into quotes a customer can compare.',
};

export const ROLE_STEPS: Record<Role, NextStep[]> = {
  admin: [
    {
      title: 'Set up your team',
      body: 'Create an account for each person, give them the role that matches their work, and switch off accounts for people who have left.',
      href: '/users',
      linkLabel: 'Manage users',
    },
    {
      title: 'Publish catalogue changes',
      body: 'Review what engineers have added or corrected before the shop sizes pipe from it: open an alloy with a draft and review it.',
      href: '/alloys',
      linkLabel: 'Open the catalogue',
    },
    {
      title: 'Check the demo data',
      body: 'If this shop started with the demo accounts, deactivate them before real work begins: they share one published password.',
      href: '/users',
      linkLabel: 'Review accounts',
    },
  ],
  engineer: [
    {
      title: 'Add and correct alloys',
      body: 'Enter expansion coefficients, temperature limits and densities for the stainless and nickel grades you run.',
      href: '/alloys',
      linkLabel: 'Open the catalogue',
    },
    {
      title: 'Attach data sheets',
      body: 'Keep the supplier’s certified sheet beside each alloy so anyone can check where a number came from: open the alloy and upload the PDF.',
      href: '/alloys',
      linkLabel: 'Choose an alloy',
    },
    {
      title: 'Hand changes to an admin',
      body: 'Your edits reach the shop floor once an admin publishes them. Coming soon.',
    },
  ],
  fabricator: [
    {
      title: 'Pick an alloy for a run',
      body: 'Compare grades by service temperature and growth per metre before you cut.',
      href: '/alloys',
      linkLabel: 'Open the catalogue',
    },
    {
      title: 'Size flex sections and slip joints',
      body: 'Work out how far a downpipe or manifold grows from cold to operating heat and how much travel a joint needs: open a job and a run.',
      href: '/jobs',
      linkLabel: 'Open the jobs',
    },
    {
      title: 'Print a job sheet',
      body: 'Take the lengths, allowances and material for a job to the bench on paper: open the job, then its job sheet.',
      href: '/jobs',
      linkLabel: 'Choose a job',
    },
  ],
  sales: [
    {
      title: 'Build a quote',
      body: 'Put a customer’s job together with two to four material options side by side, then e-mail it.',
      href: '/quotes/new',
      linkLabel: 'New quote',
    },
    {
      title: 'Follow your quotes',
      body: 'See which quotes customers have opened, accepted or declined, and read the e-mails in the outbox.',
      href: '/quotes',
      linkLabel: 'Open quotes',
    },
    {
      title: 'Explain the material choice',
      body: 'Show a customer why a nickel alloy costs more and where a 300-series stainless is enough.',
      href: '/alloys',
      linkLabel: 'Compare alloys',
    },
  ],
};
