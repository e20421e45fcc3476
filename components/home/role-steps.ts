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
      body: 'Review what engineers have added or corrected before the shop sizes pipe from it. Coming soon.',
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
      body: 'Enter expansion coefficients, temperature limits and densities for the stainless and nickel grades you run. Coming soon.',
    },
    {
      title: 'Attach data sheets',
      body: 'Keep the supplier’s certified sheet beside each alloy so anyone can check where a number came from. Coming soon.',
    },
    {
      title: 'Hand changes to an admin',
      body: 'Your edits reach the shop floor once an admin publishes them. Coming soon.',
    },
  ],
  fabricator: [
    {
      title: 'Pick an alloy for a run',
      body: 'Compare grades by service temperature and growth per metre before you cut. Coming with the catalogue.',
    },
    {
      title: 'Size flex sections and slip joints',
      body: 'Work out how far a downpipe or manifold grows from cold to operating heat and how much travel a joint needs. Coming soon.',
    },
    {
      title: 'Print a job sheet',
      body: 'Take the lengths, allowances and material for a job to the bench on paper. Coming soon.',
    },
  ],
  sales: [
    {
      title: 'Build a quote',
      body: 'Put a customer’s job together with two or three material options side by side. Coming soon.',
    },
    {
      title: 'Explain the material choice',
      body: 'Show a customer why a nickel alloy costs more and where a 300-series stainless is enough. Coming with the catalogue.',
    },
  ],
};
