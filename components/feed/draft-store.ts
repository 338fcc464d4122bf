// Comment drafts, by sketch (a new comment) or by comment (an edit): a draft outlives the
// composer, so a page that reloads its data or is left and reopened keeps what was typed. UI
// state only, never persisted; a draft ends when it is posted or the edit is cancelled.
import { create } from 'zustand';

type Drafts = { drafts: Record<string, string>; setDraft: (key: string, body: string) => void; clearDraft: (key: string) => void };

export const useCommentDrafts = create<Drafts>((set) => ({
  drafts: {},
  setDraft: (key, body) => set((s) => ({ drafts: { ...s.drafts, [key]: body } })),
  clearDraft: (key) => set((s) => {
    const { [key]: _gone, ...rest } = s.drafts;
    return { drafts: rest };
  }),
}));
